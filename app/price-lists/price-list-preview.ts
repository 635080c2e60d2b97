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

export function summarisePreview(
  rows: readonly PriceListRow[],
  errors: readonly LineError[],
): PriceListPreview {
  return {
    rows: rows.slice(0, previewRowCount),
    valid: rows.length,
    invalid: [...errors]
      .sort((a, b) => a.line - b.line)
      .map(({ line, message }) => ({ line, message })),
  };
}
