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
  const text = Papa.unparse(
    { fields: [...fields], data: rows.map((row) => [...row]) },
    { newline: "\r\n", escapeFormulae: formulaStart },
  );
  return `\uFEFF${text}\r\n`;
}
