import { formatAmount } from "~/lib/format";
/** The item's figures at a glance: on hand, reserved, available, on order, reorder point, average cost, value. */
import { SummaryFigure } from "~/components/summary-figure";
import {
  formatStockQuantity,
  formatUnitCost,
} from "~/stock/stock-quantity-text";

export function ItemSummaryFigures({
  item,
}: {
  item: {
    unit: string;
    onHand: number;
    reserved: number;
    held: number;
    available: number;
    onOrder: number;
    reorderPoint: number;
    averageCost: number;
    value: number;
  };
}) {
  const unit = item.unit;
  return (
    <dl
      className={`panel grid grid-cols-2 gap-4 sm:grid-cols-3 ${item.held > 0 ? "lg:grid-cols-8" : "lg:grid-cols-7"}`}
    >
      <SummaryFigure
        label="On hand"
        value={formatStockQuantity(item.onHand, unit)}
        emphasis
      />
      <SummaryFigure
        label="Reserved"
        value={formatStockQuantity(item.reserved, unit)}
      />
      {item.held > 0 ? (
        <SummaryFigure
          label="On hold"
          value={
            <span className="text-danger">
              {formatStockQuantity(item.held, unit)}
            </span>
          }
        />
      ) : null}
      <SummaryFigure
        label="Available"
        value={formatStockQuantity(item.available, unit)}
        emphasis
      />
      <SummaryFigure
        label="On order"
        value={formatStockQuantity(item.onOrder, unit)}
      />
      <SummaryFigure
        label="Reorder point"
        value={
          item.reorderPoint > 0
            ? formatStockQuantity(item.reorderPoint, unit)
            : "not set"
        }
      />
      <SummaryFigure
        label="Average cost"
        value={formatUnitCost(item.averageCost, unit)}
      />
      <SummaryFigure label="Value" value={formatAmount(item.value)} />
    </dl>
  );
}
