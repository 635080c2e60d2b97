/**
 * The dry-run answer of a price-list import: what the buyer sees before
 * committing. It is also the JSON body of the API's dry run:
 * `{ rows, valid, invalid: [{ line, message }], invalidCount, invalidTruncated }`. Pure.
 */
import { mergeLineErrors, type ListedLineErrors } from "./line-errors";
import type { LineError } from "./parse-price-list";
import type { PriceListRow } from "./price-list-rows";

/** How many good rows the preview shows. */
export const previewRowCount = 20;

export interface PriceListPreview<Row extends PriceListRow = PriceListRow> {
  /** The first {@link previewRowCount} good rows, in file order. */
  rows: Row[];
  /** How many rows would be imported (exact repeats counted once). */
  valid: number;
  /** The first 1,000 lines that would not be imported, in file order. */
  invalid: LineError[];
  /** Every line that would not be imported, listed or not. */
  invalidCount: number;
  /** True when `invalid` lists only the first of them. */
  invalidTruncated: boolean;
}

/** Builds a preview row by row, keeping only the rows it shows (a row may carry more, such as its match). */
export class PriceListPreviewCollector<
  Row extends PriceListRow = PriceListRow,
> {
  private readonly shown: Row[] = [];
  private counted = 0;

  add(row: Row): void {
    if (this.shown.length < previewRowCount) this.shown.push(row);
    this.counted += 1;
  }

  preview(lineErrors: ListedLineErrors): PriceListPreview<Row> {
    const { errors, errorCount } = mergeLineErrors(lineErrors);
    return {
      rows: this.shown,
      valid: this.counted,
      invalid: errors.map(({ line, message }) => ({ line, message })),
      invalidCount: errorCount,
      invalidTruncated: errorCount > errors.length,
    };
  }
}

export function summarisePreview(
  rows: readonly PriceListRow[],
  errors: readonly LineError[],
): PriceListPreview {
  const collector = new PriceListPreviewCollector();
  for (const row of rows) collector.add(row);
  return collector.preview({ errors, errorCount: errors.length });
}
