/** A line's unit price with where it came from: the price list (wire: base + adder per kg and when the base is fixed), or the buyer's own with its reason. */
import type { PurchaseOrderView } from "~/purchase-orders/purchase-order-details.server";
import { formatMoney } from "~/pricing/money";
import { perUnitWord } from "~/lib/unit-text";

type Line = PurchaseOrderView["lines"][number];

const fixedAtWords = {
  order: "base fixed at order",
  delivery: "base fixed at delivery",
} as const;

export function OrderLinePrice({
  line,
  currency,
}: {
  line: Line;
  currency: string;
}) {
  const per = perUnitWord(line.unit);
  return (
    <div className="text-right">
      <div className="whitespace-nowrap">
        {formatMoney(line.unitPrice, currency, { per })}
      </div>
      {line.priceSource === "override" ? (
        <div className="text-xs text-caution">
          Your price
          {line.overrideReason ? `: ${line.overrideReason}` : ""}
        </div>
      ) : line.metalBasePerKg !== null && line.adderPerKg !== null ? (
        <div className="text-xs text-graphite-500">
          base {formatMoney(line.metalBasePerKg, currency, { per: "kg" })} +
          adder {formatMoney(line.adderPerKg, currency, { per: "kg" })}
          {line.metalBaseFixedAt
            ? `, ${fixedAtWords[line.metalBaseFixedAt]}`
            : ""}
        </div>
      ) : (
        <div className="text-xs text-graphite-500">price list</div>
      )}
    </div>
  );
}
