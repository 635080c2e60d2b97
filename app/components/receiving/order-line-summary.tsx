/**
 * One order line as the storekeeper sees it before weighing in: what was ordered, what
 * came so far, what is still open, when it is expected, how much over the order it may
 * go, and the unit cost a receipt books (from the order, read-only).
 */
import { formatDay, formatQuantity } from "~/lib/format";
import { moneyText } from "~/lib/unit-text";
import type { ReceivingLine } from "~/purchase-orders/receiving-view";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function OrderLineSummary({
  line,
  currency,
}: {
  line: ReceivingLine;
  /** The company currency the unit cost is in. */
  currency: string;
}) {
  const amount = (value: number) => formatStockQuantity(value, line.unit);
  const figures: [string, string][] = [
    ["Ordered", amount(line.ordered)],
    ["Received", amount(line.received)],
    ["Open", amount(line.open)],
    ["Expected", formatDay(line.expectedDate)],
    [
      "Tolerance",
      `${formatQuantity(
        line.tolerancePercent,
        "%",
        Number.isInteger(line.tolerancePercent) ? 0 : 2,
      )} · at most ${amount(line.mayStillTake)} more`,
    ],
    [
      "Unit cost",
      line.unitCost === null
        ? "—"
        : moneyText(line.unitCost, currency, line.unit),
    ],
  ];
  return (
    <div className="space-y-2">
      <h3 className="text-base font-semibold">
        Line {line.lineNumber} · {line.sku}{" "}
        <span className="font-normal text-graphite-500">{line.name}</span>
      </h3>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-6">
        {figures.map(([label, value]) => (
          <div key={label}>
            <dt className="text-graphite-500">{label}</dt>
            <dd className="tabular-nums">{value}</dd>
          </div>
        ))}
      </dl>
      {line.costProblem ? (
        <p className="text-sm text-danger">{line.costProblem}</p>
      ) : (
        <p className="text-xs text-graphite-500">
          The unit cost comes from the order, converted to {currency} at
          today&apos;s rate.
        </p>
      )}
    </div>
  );
}
