/**
 * The dry-run answer of a price-list import: what the buyer sees before
 * committing. It is also the JSON body of the API's dry run:
 * `{ rows, valid, invalid: [{ line, message }] }`. Pure.
 */
import type { LineError } from "./parse-price-list";
import type { PriceListRow } from "./price-list-rows";

/** How many good rows the preview shows. */
export const previewRowCount = 20;

export interface PriceListPreview {
  /** The first {@link previewRowCount} good rows, in file order. */
  rows: PriceListRow[];
  /** How many rows would be imported (exact repeats counted once). */
  valid: number;
  /** Every line that would not be imported, in file order. */
  invalid: LineError[];
}

/** Builds a preview row by row, keeping only the rows it shows. */
export class PriceListPreviewCollector {
  private readonly shown: PriceListRow[] = [];
  private counted = 0;

  add(row: PriceListRow): void {
    if (this.shown.length < previewRowCount) this.shown.push(row);
    this.counted += 1;
  }

  preview(errors: readonly LineError[]): PriceListPreview {
    return {
      rows: this.shown,
      valid: this.counted,
      invalid: [...errors]
        .sort((a, b) => a.line - b.line)
        .map(({ line, message }) => ({ line, message })),
    };
  }
}

export function summarisePreview(
  rows: readonly PriceListRow[],
  errors: readonly LineError[],
): PriceListPreview {
  const collector = new PriceListPreviewCollector();
  for (const row of rows) collector.add(row);
  return collector.preview(errors);
}
