/**
 * The CSV files Turnledger hands out (the stock list, a design's BOM, a purchase
 * request): written by papaparse, with a byte-order mark so spreadsheet programs read
 * UTF-8 (sizes carry × and Ø), CRLF line ends as RFC 4180 has them, and text that a
 * spreadsheet would run as a formula ("CSV injection") started with an apostrophe by
 * papaparse's `escapeFormulae`. Only text cells are escaped: numbers, negative ones
 * too, stay numbers. Pure: runs in Node and in the browser.
 */
import Papa from "papaparse";

/**
 * A cell a spreadsheet reads as a formula starts with =, +, -, @, a tab or a carriage
 * return (OWASP's "CSV Injection" page, from memory). papaparse's own pattern for
 * `escapeFormulae: true` is `/^[=+\-@\t\r].*$/`, which lets text with a line break
 * through ("=1+2\nx"); this one escapes it too.
 */
export const formulaStart = /^[=+\-@\t\r]/;

export type CsvCell = string | number | boolean | null;

/** The file's text: the header row, then one row per entry of `rows`. */
export function csvFile(
  fields: readonly string[],
  rows: readonly (readonly CsvCell[])[],
): string {
  return `${csvFileStart(fields)}${csvLines(rows)}`;
}

/**
 * The start of a file written a part at a time (a long export streamed to the browser):
 * the byte-order mark and the header row. `csvLines` writes the rows after it.
 */
export function csvFileStart(fields: readonly string[]): string {
  return `\uFEFF${csvLines([fields])}`;
}

/** Rows of a file, each ended by CRLF; "" for none. */
export function csvLines(rows: readonly (readonly CsvCell[])[]): string {
  if (rows.length === 0) return "";
  const text = Papa.unparse(
    rows.map((row) => [...row]),
    { newline: "\r\n", escapeFormulae: formulaStart },
  );
  return `${text}\r\n`;
}
