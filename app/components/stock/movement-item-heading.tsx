/** The item a movement is recorded for: its SKU (a link to its page), name, size or grade, on hand and available. */
import { Link } from "react-router";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function MovementItemHeading({
  item,
}: {
  item: {
    sku: string;
    name: string;
    sizeOrGrade: string | null;
    unit: string;
    onHand: number;
    available: number;
  };
}) {
  return (
    <div>
      <p className="text-lg font-semibold">
        <Link
          to={`/stock/items/${encodeURIComponent(item.sku)}`}
          className="text-copper-700 underline underline-offset-2"
        >
          {item.sku}
        </Link>{" "}
        · {item.name}
      </p>
      <p className="text-sm text-graphite-500">
        {item.sizeOrGrade ? `${item.sizeOrGrade} · ` : ""}on hand{" "}
        {formatStockQuantity(item.onHand, item.unit)}, available{" "}
        {formatStockQuantity(item.available, item.unit)}
      </p>
    </div>
  );
}
