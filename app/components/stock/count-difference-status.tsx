/** What a count changes in the books, shown as the count is typed. */
import { formatSignedStockQuantity } from "~/stock/stock-quantity-text";

export function CountDifferenceStatus({
  difference,
  unit,
}: {
  /** Counted − on hand of the chosen lot and location. */
  difference: number;
  unit: string;
}) {
  return (
    <p role="status" className="rounded-md bg-graphite-50 px-4 py-3">
      Difference to the books:{" "}
      <strong>{formatSignedStockQuantity(difference, unit)}</strong>
    </p>
  );
}
