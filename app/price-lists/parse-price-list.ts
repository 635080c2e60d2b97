/**
 * Reads the rows of a price-list CSV: finds the column separator (comma,
 * semicolon or tab) and the header row, then hands the data rows over one at a
 * time, each with the line it starts on as a person counts lines in the file
 * (the header is line 1 in a plain file).
 *
 * Broken rows (a quotation mark that is never closed, a row with more or fewer
 * columns than the header) come back as per-line errors (the first 1,000
 * listed, all counted: see line-errors.ts); problems with the file
 * as a whole (no header, header only, one column) as one file-level message.
 * Nothing here throws for bad data.
 *
 * Rows are produced by Papa Parse's `step` callback, so a large file is never
 * held as a whole array of rows here unless the caller collects them
 * ({@link parsePriceList} does, for previews and tests).
 *
 * Pure: runs in Node and in the browser.
 */
import Papa, { type ParseError } from "papaparse";
import { countCsvDataRows } from "./count-csv-rows";
import { emptyFileMessage } from "./decode-csv";
import { LineErrorList } from "./line-errors";

export type CsvDelimiter = "," | ";" | "\t";

/** The separators tried, in the order that wins a tie. */
export const csvDelimiters: readonly CsvDelimiter[] = [",", ";", "\t"];

/** What the file looks like, found from its first rows. */
export interface CsvLayout {
  delimiter: CsvDelimiter;
  /**
   * A decimal comma ("12,50") is accepted in numbers. True only for files
   * separated by semicolons, where a comma cannot be a column separator.
   */
  decimalComma: boolean;
  /** The header cells, trimmed, in file order. An unnamed column is "". */
  headers: string[];
  /** The line the header row is on (1 unless blank lines or a "sep=" line come first). */
  headerLine: number;
}

/** One data row: the trimmed cells, as many as the header has columns. */
export interface CsvDataRow {
  line: number;
  cells: string[];
}

/** A problem with one line of the file. `message` starts with "Line N:" and reads on its own. */
export interface LineError {
  line: number;
  message: string;
}

export type FileProblem = { ok: false; message: string };

/** The result of reading all data rows. */
export type CsvRowsOutcome =
  | {
      ok: true;
      /** Data rows read, the good ones and the ones with errors. */
      dataRowCount: number;
      /** The first broken rows (see line-errors.ts), in file order. */
      errors: LineError[];
      /** Every broken row, listed or not. */
      errorCount: number;
    }
  | FileProblem;

/** An opened price-list CSV: its layout, and a way to visit its data rows once or more. */
export interface OpenedPriceListCsv {
  ok: true;
  layout: CsvLayout;
  /** Calls `onRow` for each well-formed data row, in file order; broken rows become errors. */
  forEachRow(onRow: (row: CsvDataRow) => void): CsvRowsOutcome;
  /**
   * The same rows handed over in batches of up to `batchRows` file rows, each
   * awaited before the next is parsed: a large file is never a whole array of rows.
   * Each batch comes with the bad lines and the data rows (good and bad) read so far.
   */
  forEachBatch(
    batchRows: number,
    onBatch: (
      rows: CsvDataRow[],
      lineErrorsSoFar: number,
      dataRowsSoFar: number,
    ) => Promise<void>,
  ): Promise<CsvRowsOutcome>;
  /** How many data rows the file has (the `dataRowCount` a full reading ends with), counted without reading them. */
  countDataRows(): number;
}

export const noDataRowsMessage =
  "The file has a header row but no price rows below it.";

/** A per-line error whose message starts with "Line N:", e.g. "Line 14: the price \"-3\" is negative." */
export function lineError(line: number, message: string): LineError {
  return { line, message: `Line ${line}: ${message}` };
}

/** How many rows are looked at to decide the separator. */
const layoutSampleRows = 50;

/**
 * Finds the separator and the header row. File-level problems (nothing but
 * blank lines, one column only, a header row that is broken or names a column
 * twice, no data rows in the sample) come back as `{ ok: false, message }`.
 */
export function openPriceListCsv(
  text: string,
): OpenedPriceListCsv | FileProblem {
  const normalised = normaliseLineBreaks(text);
  const declared = declaredSeparator(normalised);
  const candidates = declared ? [declared] : csvDelimiters;
  const skipFirstLine = declared !== undefined;

  const samples = candidates.map((delimiter) =>
    sampleLayout(normalised, delimiter, skipFirstLine),
  );
  if (samples.every((sample) => sample.headerIndex === -1)) {
    return { ok: false, message: emptyFileMessage };
  }
  const best = bestLayoutSample(samples);
  const brokenHeader = samples.find((sample) => sample.headerQuoteProblem);
  if (!best && brokenHeader) {
    return headerQuoteProblem(brokenHeader, skipFirstLine);
  }
  if (!best) {
    return {
      ok: false,
      message:
        "The header row has only one column. Separate the columns with commas, semicolons or tabs.",
    };
  }

  if (best.headerQuoteProblem) return headerQuoteProblem(best, skipFirstLine);
  const headerLine = headerLineOf(best, skipFirstLine);
  const headers = best.headerCells.map((cell) => cell.trim());
  const repeated = firstRepeatedHeader(headers);
  if (repeated) {
    return {
      ok: false,
      message: `The header row names the column "${repeated}" twice. Each column needs its own name.`,
    };
  }
  if (best.sampleComplete && best.dataRows === 0) {
    return { ok: false, message: noDataRowsMessage };
  }

  const layout: CsvLayout = {
    delimiter: best.delimiter,
    decimalComma: best.delimiter === ";",
    headers,
    headerLine,
  };
  return {
    ok: true,
    layout,
    forEachRow: (onRow) => readDataRows(normalised, layout, onRow),
    forEachBatch: (batchRows, onBatch) =>
      readDataRowsInBatches(normalised, layout, batchRows, onBatch),
    countDataRows: () =>
      countCsvDataRows(normalised, layout.delimiter, layout.headerLine),
  };
}

/** Parses the whole file and collects its rows: for previews, small files and tests. */
export function parsePriceList(text: string):
  | {
      ok: true;
      layout: CsvLayout;
      rows: CsvDataRow[];
      errors: LineError[];
      errorCount: number;
    }
  | FileProblem {
  const opened = openPriceListCsv(text);
  if (!opened.ok) return opened;
  const rows: CsvDataRow[] = [];
  const outcome = opened.forEachRow((row) => rows.push(row));
  if (!outcome.ok) return outcome;
  return {
    ok: true,
    layout: opened.layout,
    rows,
    errors: outcome.errors,
    errorCount: outcome.errorCount,
  };
}

// ---------------------------------------------------------------------------
// Reading the data rows
// ---------------------------------------------------------------------------

/**
 * Turns Papa Parse's steps into data rows and line errors. Fed by one parse of
 * the whole text, or by several parses of consecutive slices of it
 * (`rowStart` is always an offset in the whole text).
 */
class DataRowReader {
  readonly errors = new LineErrorList();
  dataRowCount = 0;
  /** A quotation mark that is never closed swallows the rest of the file: stop there. */
  stopped = false;
  private readonly lines: LineCounter;

  constructor(
    text: string,
    private readonly layout: CsvLayout,
  ) {
    this.lines = new LineCounter(text);
  }

  /** Reads one parsed row that starts at `rowStart`; answers the data row, or null. */
  step(
    result: Papa.ParseStepResult<string[]>,
    rowStart: number,
  ): CsvDataRow | null {
    const line = this.lines.lineAt(rowStart);
    if (line <= this.layout.headerLine) return null;
    const cells = result.data;
    if (isBlankRow(cells) && result.errors.length === 0) return null;
    this.dataRowCount += 1;

    const quoteProblem = describeQuoteErrors(result.errors);
    if (quoteProblem) {
      this.errors.add(lineError(line, quoteProblem.message));
      if (quoteProblem.readsToEnd) this.stopped = true;
      return null;
    }
    const fitted = fitToHeader(cells, this.layout.headers.length);
    if (!fitted) {
      this.errors.add(
        lineError(
          line,
          `the row has ${columnCount(cells)} but the header has ${this.layout.headers.length}.`,
        ),
      );
      return null;
    }
    return { line, cells: fitted };
  }

  outcome(): CsvRowsOutcome {
    if (this.dataRowCount === 0)
      return { ok: false, message: noDataRowsMessage };
    return {
      ok: true,
      dataRowCount: this.dataRowCount,
      errors: this.errors.errors,
      errorCount: this.errors.errorCount,
    };
  }
}

/**
 * Parses up to `maxRows` rows of `text` from `offset`, handing each data row
 * to `onRow`; answers the offset after the last row read, or null at the end.
 */
function parseRowsFrom(
  text: string,
  offset: number,
  maxRows: number,
  reader: DataRowReader,
  onRow: (row: CsvDataRow) => void,
  delimiter: CsvDelimiter,
): number | null {
  let rowStart = offset;
  let steps = 0;
  Papa.parse<string[]>(offset === 0 ? text : text.slice(offset), {
    delimiter,
    newline: "\n",
    skipEmptyLines: false,
    // A batch must not make Papa Parse split the whole rest of the file into lines (its
    // fast mode does, before looking at `preview`): parse character by character instead.
    ...(Number.isFinite(maxRows) ? { preview: maxRows, fastMode: false } : {}),
    step: (result, parser) => {
      steps += 1;
      const row = reader.step(result, rowStart);
      rowStart = offset + result.meta.cursor;
      if (reader.stopped) parser.abort();
      else if (row) onRow(row);
    },
  });
  if (reader.stopped || steps < maxRows || rowStart >= text.length) return null;
  return rowStart;
}

function readDataRows(
  text: string,
  layout: CsvLayout,
  onRow: (row: CsvDataRow) => void,
): CsvRowsOutcome {
  const reader = new DataRowReader(text, layout);
  parseRowsFrom(text, 0, Infinity, reader, onRow, layout.delimiter);
  return reader.outcome();
}

async function readDataRowsInBatches(
  text: string,
  layout: CsvLayout,
  batchRows: number,
  onBatch: (
    rows: CsvDataRow[],
    lineErrorsSoFar: number,
    dataRowsSoFar: number,
  ) => Promise<void>,
): Promise<CsvRowsOutcome> {
  const reader = new DataRowReader(text, layout);
  let offset: number | null = 0;
  while (offset !== null) {
    const batch: CsvDataRow[] = [];
    offset = parseRowsFrom(
      text,
      offset,
      batchRows,
      reader,
      (row) => batch.push(row),
      layout.delimiter,
    );
    if (batch.length > 0)
      await onBatch(batch, reader.errors.errorCount, reader.dataRowCount);
  }
  return reader.outcome();
}

/**
 * The row's cells trimmed, when it has the header's number of columns. Extra
 * columns at the end are tolerated when they are blank (some programs end every
 * data row with a separator); a row with fewer columns is refused.
 */
function fitToHeader(cells: string[], width: number): string[] | null {
  if (cells.length < width) return null;
  if (cells.length === width) {
    // The parser's own array, trimmed in place: one array less per row.
    for (let index = 0; index < width; index += 1)
      cells[index] = cells[index]!.trim();
    return cells;
  }
  if (cells.slice(width).some((cell) => cell.trim() !== "")) return null;
  return cells.slice(0, width).map((cell) => cell.trim());
}

function columnCount(cells: readonly string[]): string {
  return cells.length === 1 ? "1 column" : `${cells.length} columns`;
}

function describeQuoteErrors(
  errors: readonly ParseError[],
): { message: string; readsToEnd: boolean } | null {
  const textAfterQuote = errors.some((error) => error.code === "InvalidQuotes");
  const readsToEnd = errors.some((error) => error.code === "MissingQuotes");
  if (!textAfterQuote && !readsToEnd) return null;
  const problem = textAfterQuote
    ? 'a quoted value has text after its closing quotation mark (a quotation mark inside a quoted value is written twice: "")'
    : "a quotation mark opens a value that is never closed";
  return {
    message: readsToEnd
      ? `${problem}, so the file cannot be read from here on.`
      : `${problem}.`,
    readsToEnd,
  };
}

function isBlankRow(cells: readonly string[]): boolean {
  return cells.every((cell) => cell.trim() === "");
}

// ---------------------------------------------------------------------------
// Finding the layout
// ---------------------------------------------------------------------------

interface LayoutSample {
  delimiter: CsvDelimiter;
  /** Index of the header among the sampled rows, -1 when all were blank. */
  headerIndex: number;
  headerCells: string[];
  headerQuoteProblem: boolean;
  /** Non-blank rows after the header in the sample. */
  dataRows: number;
  /** Of those, the ones with the header's number of columns. */
  consistentRows: number;
  /** The sample reached the end of the file. */
  sampleComplete: boolean;
}

/**
 * The separator that splits the most sampled data rows into the header's
 * number of columns; on a tie, the one giving more columns, then the first in
 * {@link csvDelimiters}. A separator that leaves the header as one column
 * does not count.
 */
function bestLayoutSample(
  samples: readonly LayoutSample[],
): LayoutSample | undefined {
  let best: LayoutSample | undefined;
  for (const sample of samples) {
    if (sample.headerCells.length < 2) continue;
    const better =
      !best ||
      sample.consistentRows > best.consistentRows ||
      (sample.consistentRows === best.consistentRows &&
        sample.headerCells.length > best.headerCells.length);
    if (better) best = sample;
  }
  return best;
}

function sampleLayout(
  text: string,
  delimiter: CsvDelimiter,
  skipFirstLine: boolean,
): LayoutSample {
  const body = skipFirstLine ? text.slice(text.indexOf("\n") + 1) : text;
  const parsed = Papa.parse<string[]>(body, {
    delimiter,
    newline: "\n",
    skipEmptyLines: false,
    preview: layoutSampleRows,
  });
  // Only blank lines can come before the header, one row each, so the
  // header's row index is also its line index.
  const rows = parsed.data;
  const headerIndex = rows.findIndex((cells) => !isBlankRow(cells));
  const headerCells = headerIndex === -1 ? [] : rows[headerIndex]!;
  const dataRows = rows
    .slice(headerIndex + 1)
    .filter((cells) => !isBlankRow(cells));
  return {
    delimiter,
    headerIndex,
    headerCells,
    headerQuoteProblem: parsed.errors.some(
      (error) => error.row === headerIndex && error.type === "Quotes",
    ),
    dataRows: headerIndex === -1 ? 0 : dataRows.length,
    consistentRows: dataRows.filter(
      (cells) => fitToHeader(cells, headerCells.length) !== null,
    ).length,
    sampleComplete: rows.length < layoutSampleRows,
  };
}

function headerLineOf(sample: LayoutSample, skipFirstLine: boolean): number {
  return sample.headerIndex + 1 + (skipFirstLine ? 1 : 0);
}

function headerQuoteProblem(
  sample: LayoutSample,
  skipFirstLine: boolean,
): FileProblem {
  return {
    ok: false,
    message: `The header row (line ${headerLineOf(sample, skipFirstLine)}) has a quotation mark that is not closed properly.`,
  };
}

/** A first line "sep=;" (written by some spreadsheet programs) names the separator. */
function declaredSeparator(text: string): CsvDelimiter | undefined {
  const match = /^sep=([,;\t])\n/i.exec(text);
  return match ? (match[1] as CsvDelimiter) : undefined;
}

function firstRepeatedHeader(headers: readonly string[]): string | undefined {
  const seen = new Set<string>();
  for (const header of headers) {
    if (header === "") continue;
    if (seen.has(header)) return header;
    seen.add(header);
  }
  return undefined;
}

/** CR LF and lone CR become LF, so Papa Parse and the line counter agree on what a line is. */
function normaliseLineBreaks(text: string): string {
  return text.includes("\r") ? text.replace(/\r\n?/g, "\n") : text;
}

/**
 * Turns character offsets into line numbers. Offsets must be asked for in
 * increasing order; each character is looked at once.
 */
class LineCounter {
  private offset = 0;
  private line = 1;

  constructor(private readonly text: string) {}

  lineAt(offset: number): number {
    for (; this.offset < offset; this.offset += 1) {
      if (this.text.charCodeAt(this.offset) === 0x0a) this.line += 1;
    }
    return this.line;
  }
}
