/** One item's projected stock: the chart, a choice of item, and every week's figures in a table. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { BuyingPlanJson } from "~/buying-plan/plan-json";
import { DataTable } from "~/components/data-table";
import { formatDay } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { lazyFigure } from "~/components/lazy-figure";
import { keepServerDrawing } from "~/components/server-drawing";

/** The chart's code (visx) loads after the page; the server's drawing stays meanwhile. */
const ProjectedStockChart = keepServerDrawing(
  lazyFigure(
    () =>
      import("./projected-stock-chart").then(
        (module) => module.ProjectedStockChart,
      ),
    { aspectRatio: "720 / 260" },
  ),
  "block",
);

type ItemJson = BuyingPlanJson["items"][number];
type WeekRow = ItemJson["weeks"][number];

function weekColumns(unit: string) {
  const column = createColumnHelper<WeekRow>();
  const amount = (value: number) =>
    value === 0 ? "—" : formatStockQuantity(value, unit);
  return [
    column.accessor("weekStart", {
      header: "Week of",
      cell: (info) => formatDay(info.getValue()),
    }),
    column.accessor("needed", {
      header: "Needed",
      meta: { numeric: true },
      cell: (info) => amount(info.getValue()),
    }),
    column.accessor("arriving", {
      header: "On order, due",
      meta: { numeric: true },
      cell: (info) => amount(info.getValue()),
    }),
    column.accessor("projected", {
      header: "Projected",
      meta: { numeric: true },
      cell: (info) => formatStockQuantity(info.getValue(), unit),
    }),
    column.accessor("suggested", {
      header: "Suggested",
      meta: { numeric: true },
      cell: (info) => amount(info.getValue()),
    }),
    column.accessor("projectedWithSuggestion", {
      header: "With suggestion",
      meta: { numeric: true },
      cell: (info) => formatStockQuantity(info.getValue(), unit),
    }),
  ];
}

export function ItemProjection({
  items,
  shown,
  itemHref,
}: {
  items: ItemJson[];
  shown: ItemJson | null;
  itemHref: (sku: string) => string;
}) {
  return (
    <section aria-labelledby="projection-heading" className="panel space-y-4">
      <h2 id="projection-heading" className="text-lg font-semibold">
        Projected stock{shown ? `: ${shown.sku}` : ""}
      </h2>
      {items.length === 0 ? (
        <p className="text-sm text-graphite-500">
          No open build order needs stock in this horizon, and no item is below
          its reorder point.
        </p>
      ) : (
        <>
          <nav aria-label="Items in the plan" className="flex flex-wrap gap-2">
            {items.map((item) => (
              <Link
                key={item.sku}
                to={itemHref(item.sku)}
                aria-current={item.sku === shown?.sku ? "true" : undefined}
                className={`rounded-full border px-3 py-1 text-sm ${item.sku === shown?.sku ? "border-copper-600 bg-copper-50 font-medium text-copper-700" : "border-rule text-graphite-700 hover:border-copper-300"}`}
              >
                {item.sku}
              </Link>
            ))}
          </nav>
          {shown ? (
            <>
              <p className="text-sm text-graphite-500">
                {shown.name} · free now{" "}
                {formatStockQuantity(shown.available, shown.unit)}
              </p>
              <ProjectedStockChart
                sku={shown.sku}
                unit={shown.unit}
                reorderPoint={shown.reorderPoint}
                weeks={shown.weeks}
              />
              <DataTable
                caption={`${shown.sku} week by week`}
                columns={weekColumns(shown.unit)}
                rows={shown.weeks}
              />
            </>
          ) : null}
        </>
      )}
    </section>
  );
}
