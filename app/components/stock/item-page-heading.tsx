/**
 * The item page's heading: kind and SKU, name, size or grade, whether it is archived or
 * below its reorder point, and the way to its journal and to record a movement.
 */
import { Link } from "react-router";
import { BelowReorderMark } from "~/components/below-reorder-mark";
import { itemKindLabel } from "~/stock/stock-quantity-text";

export function ItemPageHeading({
  item,
  canRecord,
}: {
  item: {
    sku: string;
    name: string;
    kind: string;
    sizeOrGrade: string | null;
    active: boolean;
    belowReorder: boolean;
  };
  canRecord: boolean;
}) {
  const sku = encodeURIComponent(item.sku);
  return (
    <div className="flex flex-wrap items-start justify-between gap-4">
      <div>
        <p className="text-sm font-medium text-graphite-500">
          {itemKindLabel(item.kind)} · SKU{" "}
          <span className="text-graphite-900">{item.sku}</span>
        </p>
        <h1 className="mt-1 text-2xl font-semibold">{item.name}</h1>
        <p className="mt-1 flex flex-wrap items-center gap-2 text-graphite-700">
          {item.sizeOrGrade || null}
          {item.active ? null : (
            <span className="rounded border border-graphite-300 px-1.5 py-0.5 text-xs font-medium text-graphite-700">
              Archived
            </span>
          )}
          {item.belowReorder ? <BelowReorderMark /> : null}
        </p>
      </div>
      <div className="flex flex-wrap gap-2">
        <Link to={`/stock/journal?sku=${sku}`} className="button-quiet">
          Journal for this item
        </Link>
        {canRecord ? (
          <Link to={`/stock/record?sku=${sku}`} className="button-primary">
            Record movement
          </Link>
        ) : null}
      </div>
    </div>
  );
}
