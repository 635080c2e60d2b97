/**
 * The whole reading of a price list, from uploaded bytes to typed rows:
 * decode → find separator and header → check the column mapping → read and
 * check each row as the CSV reader produces it. Nothing is written anywhere;
 * the caller previews the result or commits it all at once.
 *
 * File-level problems come back as `{ ok: false, messages }`; per-line
 * problems as `errors`, in file order: the first 1,000 lines with errors, and
 * `errorCount` for all of them (line-errors.ts). Pure: runs in Node and in the
 * browser.
 */
import { checkColumnMapping, type ColumnMapping } from "./column-mapping";
import type { CurrencyCode } from "./currencies";
import { decodePriceListBytes } from "./decode-csv";
import { mergeLineErrors } from "./line-errors";
import {
  openPriceListCsv,
  type CsvLayout,
  type LineError,
  type OpenedPriceListCsv,
} from "./parse-price-list";
import { PriceListRowCollector, type PriceListRow } from "./price-list-rows";

export interface PriceListReadOptions {
  mapping: ColumnMapping;
  /** The day of the import, YYYY-MM-DD: the start of prices without a date. */
  importDay: string;
  /** Magnet grade names and aliases in lower case. */
  knownGrades: ReadonlySet<string>;
  /** The supplier's default currency, for rows without one. */
  supplierCurrency?: CurrencyCode | null;
}

export type PriceListReading =
  | {
      ok: true;
      layout: CsvLayout;
      rows: PriceListRow[];
      errors: LineError[];
      errorCount: number;
    }
  | { ok: false; messages: string[] };

/** Reads an uploaded file: decoding first, then {@link readPriceListText}. */
export function readPriceListFile(
  bytes: Uint8Array,
  options: PriceListReadOptions,
): PriceListReading {
  const decoded = decodePriceListBytes(bytes);
  if (!decoded.ok) return { ok: false, messages: [decoded.message] };
  return readPriceListText(decoded.text, options);
}

/**
 * The rows of an opened price list, CSV or workbook: its header, whether
 * numbers may have a decimal comma, and a way to visit its data rows.
 */
export interface OpenedPriceListRows<Layout extends RowsLayout = RowsLayout> {
  layout: Layout;
  forEachRow: OpenedPriceListCsv["forEachRow"];
  forEachBatch: OpenedPriceListCsv["forEachBatch"];
  countDataRows: OpenedPriceListCsv["countDataRows"];
}

export interface RowsLayout {
  headers: string[];
  decimalComma: boolean;
}

/** Opens the text and checks the mapping: a row collector ready to be fed, or file-level problems. */
function openReading(
  text: string,
  options: PriceListReadOptions,
):
  | {
      ok: true;
      opened: OpenedPriceListCsv;
      collector: PriceListRowCollector;
    }
  | { ok: false; messages: string[] } {
  const opened = openPriceListCsv(text);
  if (!opened.ok) return { ok: false, messages: [opened.message] };
  const collector = collectorFor(opened, options);
  if (!collector.ok) return collector;
  return { ok: true, opened, collector: collector.collector };
}

/** Checks the mapping against the opened file's header: a row collector, or file-level problems. */
function collectorFor(
  opened: OpenedPriceListRows,
  options: PriceListReadOptions,
):
  | { ok: true; collector: PriceListRowCollector }
  | { ok: false; messages: string[] } {
  const mapping = checkColumnMapping(options.mapping, opened.layout.headers, {
    supplierCurrency: options.supplierCurrency,
  });
  if (!mapping.ok) return { ok: false, messages: mapping.messages };
  return {
    ok: true,
    collector: new PriceListRowCollector({
      columns: mapping.columns,
      headers: opened.layout.headers,
      decimalComma: opened.layout.decimalComma,
      importDay: options.importDay,
      knownGrades: options.knownGrades,
      supplierCurrency: options.supplierCurrency,
    }),
  };
}

/** Reads price-list text with a mapping into typed rows and per-line errors. */
export function readPriceListText(
  text: string,
  options: PriceListReadOptions,
): PriceListReading {
  const reading = openReading(text, options);
  if (!reading.ok) return reading;
  const { opened, collector } = reading;
  const outcome = opened.forEachRow((row) => collector.add(row));
  if (!outcome.ok) return { ok: false, messages: [outcome.message] };

  return {
    ok: true,
    layout: opened.layout,
    rows: collector.rows,
    ...mergeLineErrors(outcome, collector),
  };
}

/** Takes one batch of good rows; awaited before the next batch is read. */
export type BatchHandler = (
  rows: PriceListRow[],
  lineErrorsSoFar: number,
  dataRowsSoFar: number,
) => Promise<void>;

/** The end of a reading in batches: the good rows' count and the errors, or file-level problems. */
export type BatchReading<Layout> =
  | {
      ok: true;
      layout: Layout;
      goodRows: number;
      errors: LineError[];
      errorCount: number;
    }
  | { ok: false; messages: string[] };

/**
 * Reads an uploaded file and hands its good rows over in batches (each awaited
 * before the next is read), keeping none of them: for imports of large files.
 * Each batch comes with the number of bad lines found so far and of the file's
 * data rows read so far (good and bad: see `countDataRows`); the errors come
 * back at the end, in file order (the first 1,000 lines, and the count of all).
 */
export async function readPriceListInBatches(
  bytes: Uint8Array,
  options: PriceListReadOptions,
  batchRows: number,
  onBatch: BatchHandler,
): Promise<BatchReading<CsvLayout>> {
  const decoded = decodePriceListBytes(bytes);
  if (!decoded.ok) return { ok: false, messages: [decoded.message] };
  const opened = openPriceListCsv(decoded.text);
  if (!opened.ok) return { ok: false, messages: [opened.message] };
  return readOpenedPriceListInBatches(opened, options, batchRows, onBatch);
}

/**
 * {@link readPriceListInBatches} for a file already opened: a CSV, or a sheet
 * of a workbook (read-workbook.server.ts).
 */
export async function readOpenedPriceListInBatches<Layout extends RowsLayout>(
  opened: OpenedPriceListRows<Layout>,
  options: PriceListReadOptions,
  batchRows: number,
  onBatch: BatchHandler,
): Promise<BatchReading<Layout>> {
  const started = collectorFor(opened, options);
  if (!started.ok) return started;
  const { collector } = started;
  const outcome = await opened.forEachBatch(
    batchRows,
    async (batch, csvErrorsSoFar, dataRowsSoFar) => {
      for (const row of batch) collector.add(row);
      const rows = collector.takeRows();
      if (rows.length > 0)
        await onBatch(
          rows,
          csvErrorsSoFar + collector.errorCount,
          dataRowsSoFar,
        );
    },
  );
  if (!outcome.ok) return { ok: false, messages: [outcome.message] };
  return {
    ok: true,
    layout: opened.layout,
    goodRows: collector.goodRowCount,
    ...mergeLineErrors(outcome, collector),
  };
}
