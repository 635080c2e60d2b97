/**
 * The stock half of the cost insight: the headline figures (value, reserved value, items
 * below their reorder point), value by kind and by location, and the weekly trend; plus
 * the cost per motor of each design month by month. Every chart has its figures in a
 * table beside it.
 */
import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { Link } from "react-router";
import { InsightCsvLink } from "~/components/insight/insight-csv-link";
import { DataTable } from "~/components/data-table";
import type { DesignInsight } from "~/insight/design-insight.server";
import { costHistoryChange, costingMoneyText } from "~/insight/design-insight";
import type { StockValueInsight } from "~/insight/stock-value.server";
import { formatDay, formatQuantity } from "~/lib/format";
import { kindParts, palette, Swatch, type FillPart } from "./insight-patterns";
import { lazyFigure } from "./lazy-figure";
import { keepServerDrawing } from "./server-drawing";
import { countText } from "~/lib/unit-text";

// The charts and the legend's samples load after the page (lazy-figure.tsx), and
// not at all when the page came with them drawn (server-drawing.tsx).
const InsightTrendChart = keepServerDrawing(
  lazyFigure(
    () =>
      import("./insight/insight-trend-chart").then(
        (module) => module.InsightTrendChart,
      ),
    { aspectRatio: "720 / 300" },
  ),
  "block",
);
const InsightValueBars = keepServerDrawing(
  lazyFigure(
    () =>
      import("./insight-value-bars").then((module) => module.InsightValueBars),
    { aspectRatio: "720 / 200" },
  ),
  "block",
);
const TrendSample = keepServerDrawing(
  lazyFigure(
    () => import("./insight/trend-marker").then((module) => module.TrendSample),
    { width: 36, height: 14 },
  ),
  "inline",
);

function Figure({
  label,
  value,
  to,
  note,
}: {
  label: string;
  value: string;
  to?: string;
  note?: string;
}) {
  const body = (
    <>
      <span className="block text-2xl font-semibold tabular-nums">{value}</span>
      <span className="text-sm text-graphite-500">{label}</span>
      {note ? (
        <span className="block text-xs text-graphite-500">{note}</span>
      ) : null}
    </>
  );
  return to ? (
    <Link
      to={to}
      className="block rounded-md border border-rule bg-white px-4 py-3 hover:border-copper-300"
    >
      {body}
    </Link>
  ) : (
    <div className="rounded-md border border-rule bg-white px-4 py-3">
      {body}
    </div>
  );
}

/** Value, reserved value and what is short, as four figures. */
export function StockHeadline({ stock }: { stock: StockValueInsight }) {
  return (
    <section aria-labelledby="stock-headline-heading" className="space-y-3">
      <h2
        id="stock-headline-heading"
        className="break-after-avoid text-lg font-semibold"
      >
        Stock value
      </h2>
      <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
        <Figure
          label="in stock (on hand × average cost)"
          value={costingMoneyText(stock.total, stock.currency)}
          to="/stock"
        />
        <Figure
          label="reserved for build orders"
          value={costingMoneyText(stock.reservedValue, stock.currency)}
          to="/build-orders"
        />
        <Figure
          label="items below their reorder point"
          value={String(stock.belowReorderPoint)}
          to="/alerts"
          note={`${countText(stock.openAlerts, "open alert")} — see Alerts`}
        />
        <Figure
          label="kinds of item holding value"
          value={String(stock.byKind.filter((kind) => kind.value !== 0).length)}
          note={stock.byKind
            .map(
              (kind) =>
                `${kindParts.find((part) => part.key === kind.kind)?.label ?? kind.kind}: ${countText(kind.items, "item")}`,
            )
            .join(", ")}
        />
      </div>
    </section>
  );
}

type LocationRow = StockValueInsight["byLocation"][number];

const locationPart: FillPart<string> = {
  key: "location",
  label: "Location",
  detail: "",
  patternName: "solid",
  style: { kind: "solid", color: palette.graphite500 },
};

type KindRow = {
  part: (typeof kindParts)[number];
  row: StockValueInsight["byKind"][number];
};

function kindColumns(currency: string) {
  const kindColumn = createColumnHelper<KindRow>();
  return [
    kindColumn.display({
      id: "kind",
      header: "Kind",
      cell: ({ row }) => (
        <span className="inline-flex items-center gap-2">
          <Swatch part={row.original.part} />
          {row.original.part.label}
          <span className="text-xs text-graphite-500">
            ({row.original.part.patternName})
          </span>
        </span>
      ),
    }),
    kindColumn.display({
      id: "items",
      header: "Items valued",
      cell: ({ row }) => row.original.row.items,
      meta: { numeric: true },
    }),
    kindColumn.display({
      id: "value",
      header: "Value",
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {costingMoneyText(row.original.row.value, currency)}
        </span>
      ),
      meta: { numeric: true },
    }),
  ];
}

function locationColumns(currency: string) {
  const locationColumn = createColumnHelper<LocationRow>();
  return [
    locationColumn.display({
      id: "location",
      header: "Location",
      cell: ({ row }) => (
        <span>
          <span className="font-medium">{row.original.code}</span>
          <span className="block text-xs text-graphite-500">
            {row.original.name}
          </span>
        </span>
      ),
    }),
    locationColumn.accessor("items", {
      header: "Items",
      meta: { numeric: true },
    }),
    locationColumn.display({
      id: "value",
      header: "Value",
      cell: ({ row }) => (
        <span className="whitespace-nowrap">
          {costingMoneyText(row.original.value, currency)}
        </span>
      ),
      meta: { numeric: true },
    }),
  ];
}

/** Value by kind of item and by location, each as bars with a table beside. */
export function StockBreakdown({ stock }: { stock: StockValueInsight }) {
  const currency = stock.currency;
  const kinds = kindParts.map((part) => ({
    part,
    row: stock.byKind.find((kind) => kind.kind === part.key) ?? {
      kind: part.key,
      value: 0,
      items: 0,
    },
  }));
  // The same columns on every render: a new cell function would be a new component
  // type to React, and every cell would be built again (after hydration too).
  const kindColumnList = useMemo(() => kindColumns(currency), [currency]);
  const locationColumnList = useMemo(
    () => locationColumns(currency),
    [currency],
  );
  const shownLocations = stock.byLocation.slice(0, 10);
  return (
    <section aria-labelledby="stock-breakdown-heading" className="space-y-4">
      <h2
        id="stock-breakdown-heading"
        className="break-after-avoid text-lg font-semibold"
      >
        Where the stock value is
      </h2>
      <div className="grid gap-6 xl:grid-cols-2">
        <div className="panel space-y-3 break-inside-avoid">
          <h3 className="text-sm font-semibold">By kind of item</h3>
          <InsightValueBars
            currency={currency}
            label={`Stock value by kind of item, in ${currency}`}
            bars={kinds.map(({ part, row }) => ({
              key: part.key,
              label: part.label,
              value: row.value,
              part,
            }))}
          />
          <DataTable
            caption={`Stock value by kind of item, in ${currency}`}
            rows={kinds}
            columns={kindColumnList}
          />
          <InsightCsvLink
            table="stock-by-kind"
            what="stock value by kind of item"
          />
          <p className="text-sm">
            Total{" "}
            <span className="font-semibold">
              {costingMoneyText(stock.total, currency)}
            </span>
          </p>
        </div>
        <div className="panel space-y-3 break-inside-avoid">
          <h3 className="text-sm font-semibold">By location</h3>
          {stock.byLocation.length === 0 ? (
            <p className="text-sm text-graphite-500">
              No stock on hand anywhere.
            </p>
          ) : (
            <>
              <InsightValueBars
                currency={currency}
                label={`Stock value of the ${shownLocations.length} most valuable locations, in ${currency}`}
                bars={shownLocations.map((location) => ({
                  key: String(location.locationId),
                  label: location.code,
                  value: location.value,
                  part: locationPart,
                }))}
              />
              <DataTable
                caption={`Stock value by location, in ${currency}`}
                rows={stock.byLocation}
                columns={locationColumnList}
              />
              <InsightCsvLink
                table="stock-by-location"
                what="stock value by location"
              />
              <p className="text-xs text-graphite-500">
                Each balance at its item's average cost, to 0.0001 before adding
                up, so the locations can differ from the total by a few
                ten-thousandths.
                {stock.byLocation.length > shownLocations.length
                  ? ` The chart shows the ${shownLocations.length} most valuable locations.`
                  : ""}
                {stock.otherLocations
                  ? ` ${stock.otherLocations.locations} more locations hold ${costingMoneyText(stock.otherLocations.value, currency)}.`
                  : ""}
              </p>
            </>
          )}
        </div>
      </div>
    </section>
  );
}

type TrendPoint = { week: string; value: number; complete: boolean };

function trendColumns(currency: string) {
  const column = createColumnHelper<TrendPoint>();
  return [
    column.accessor("week", {
      header: "Week of",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatDay(info.getValue())}
          {info.row.original.complete ? "" : " (so far)"}
        </span>
      ),
    }),
    column.accessor("value", {
      header: "Value at its end",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {costingMoneyText(info.getValue(), currency)}
        </span>
      ),
      meta: { numeric: true },
    }),
  ];
}

/** The stock value at the end of each of the last 26 weeks. */
export function StockTrend({
  trend,
  currency,
}: {
  trend: TrendPoint[];
  currency: string;
}) {
  const trendColumnList = useMemo(() => trendColumns(currency), [currency]);
  const newestFirst = useMemo(() => [...trend].reverse(), [trend]);
  const first = trend[0];
  const last = trend.at(-1);
  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
      <div className="panel break-inside-avoid">
        <InsightTrendChart
          monthly={false}
          unit={currency}
          label={`Stock value at the end of each week, in ${currency}`}
          summary={
            first && last
              ? `Stock value ${costingMoneyText(first.value, currency)} at the end of the week of ${formatDay(first.week)}, ${costingMoneyText(last.value, currency)} now; lowest ${costingMoneyText(Math.min(...trend.map((point) => point.value)), currency)}, highest ${costingMoneyText(Math.max(...trend.map((point) => point.value)), currency)}.`
              : "No weeks to show."
          }
          series={[
            {
              key: "stock",
              label: "Stock value",
              points: trend.map((point) => ({
                date: point.week,
                value: point.value,
              })),
            },
          ]}
        />
        <p className="mt-1 text-xs text-graphite-500">
          Each point is the week starting on that Monday, valued at its end (the
          running week: now), from the on hand and average cost after each
          movement.
        </p>
      </div>
      {/* Scrolls on its own: reachable by keyboard (Tab, then the arrow keys). */}
      <div
        tabIndex={0}
        role="region"
        aria-label="Stock value by week, table"
        className="max-h-[28rem] overflow-y-auto print:max-h-none print:overflow-visible"
      >
        <DataTable
          caption={`Stock value at the end of each week, in ${currency}`}
          rows={newestFirst}
          columns={trendColumnList}
        />
      </div>
      <InsightCsvLink table="stock-by-week" what="stock value by week" />
    </div>
  );
}

function changeColumns(currency: string) {
  const column = createColumnHelper<DesignInsight>();
  const changeOf = (design: DesignInsight) =>
    costHistoryChange(design.costHistory ?? []);
  return [
    column.display({
      id: "design",
      header: "Design",
      cell: ({ row }) => row.original.name,
    }),
    column.display({
      id: "from",
      header: "First priced",
      cell: ({ row }) => {
        const change = changeOf(row.original);
        return change ? (
          <span className="whitespace-nowrap">
            {costingMoneyText(change.from.costPerMotor, currency)}
            <span className="block text-xs text-graphite-500">
              {formatDay(change.from.date)}
            </span>
          </span>
        ) : (
          "—"
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "to",
      header: "Latest",
      cell: ({ row }) => {
        const change = changeOf(row.original);
        return change ? (
          <span className="whitespace-nowrap">
            {costingMoneyText(change.to.costPerMotor, currency)}
            <span className="block text-xs text-graphite-500">
              {formatDay(change.to.date)}
            </span>
          </span>
        ) : (
          "—"
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "change",
      header: "Change",
      cell: ({ row }) => {
        const change = changeOf(row.original);
        if (!change)
          return (
            <span className="text-graphite-500">
              fewer than two priced months
            </span>
          );
        const sign = change.change > 0 ? "+" : change.change < 0 ? "−" : "±";
        return (
          <span className="whitespace-nowrap font-semibold">
            {sign}
            {costingMoneyText(Math.abs(change.change), currency)}
            {change.percent === null ? null : (
              <span className="block text-xs font-normal text-graphite-500">
                {sign}
                {formatQuantity(Math.abs(change.percent), "", 1)} %
              </span>
            )}
          </span>
        );
      },
      meta: { numeric: true },
    }),
  ];
}

function monthColumns(withHistory: DesignInsight[]) {
  const column = createColumnHelper<DesignInsight>();
  const dates = withHistory[0]?.costHistory?.map((point) => point.date) ?? [];
  return [
    column.display({
      id: "design",
      header: "Design",
      cell: ({ row }) => (
        <span className="inline-flex items-center gap-2 whitespace-nowrap">
          <TrendSample index={withHistory.indexOf(row.original)} />
          {row.original.name}
          <span className="text-xs text-graphite-500">
            rev {row.original.revision}
          </span>
        </span>
      ),
    }),
    ...dates.map((date, index) =>
      column.display({
        id: date,
        header: () => (
          <span className="whitespace-nowrap" title={formatDay(date)}>
            {formatDay(date, "monthShortYear")}
          </span>
        ),
        cell: ({ row }) => {
          const point = row.original.costHistory?.[index];
          return point && point.complete ? (
            <span className="whitespace-nowrap">
              {costingMoneyText(point.costPerMotor)}
            </span>
          ) : (
            "—"
          );
        },
        meta: { numeric: true },
      }),
    ),
  ];
}

/** Cost per motor of each design a month apart over the last year. */
export function CostHistory({
  designs,
  currency,
  quantity,
}: {
  designs: DesignInsight[];
  currency: string;
  quantity: number;
}) {
  const withHistory = useMemo(
    () => designs.filter((design) => design.costHistory),
    [designs],
  );
  const changeColumnList = useMemo(() => changeColumns(currency), [currency]);
  const monthColumnList = useMemo(
    () => monthColumns(withHistory),
    [withHistory],
  );
  if (withHistory.length === 0) return null;
  return (
    <section aria-labelledby="cost-history-heading" className="space-y-3">
      <div>
        <h2
          id="cost-history-heading"
          className="break-after-avoid text-lg font-semibold"
        >
          Cost per motor over the last year
        </h2>
        <p className="text-sm text-graphite-500">
          Each released design costed on the same day of each month, at the best
          supplier prices and metal base stored for that day, for{" "}
          {countText(quantity, "motor")} (the what-if and the price basis above
          do not apply here). A gap is a month with a line that had no price.
        </p>
      </div>
      <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="panel break-inside-avoid">
          <InsightTrendChart
            monthly
            unit={`${currency} per motor`}
            label={`Cost per motor by month, in ${currency}`}
            summary={withHistory
              .map((design) => {
                const points = design.costHistory!;
                const priced = points.filter((point) => point.complete);
                return priced.length === 0
                  ? `${design.name}: not fully priced in any month.`
                  : `${design.name}: ${costingMoneyText(priced[0]!.costPerMotor, currency)} on ${formatDay(priced[0]!.date)}, ${costingMoneyText(priced.at(-1)!.costPerMotor, currency)} on ${formatDay(priced.at(-1)!.date)}.`;
              })
              .join(" ")}
            series={withHistory.map((design) => ({
              key: String(design.designId),
              label: `${design.name} · rev ${design.revision}`,
              points: design.costHistory!.map((point) => ({
                date: point.date,
                value: point.complete ? point.costPerMotor : null,
              })),
            }))}
          />
        </div>
        <div className="space-y-2">
          <DataTable
            caption={`Change in cost per motor over the year, in ${currency}`}
            rows={withHistory}
            columns={changeColumnList}
          />
          <InsightCsvLink
            table="cost-change"
            what="change in cost per motor over the year"
          />
        </div>
      </div>
      <DataTable
        widerThanPanel
        caption={`Cost per motor by month, in ${currency}; — where a line had no price`}
        rows={withHistory}
        columns={monthColumnList}
      />
      <InsightCsvLink table="cost-by-month" what="cost per motor by month" />
      <p className="text-xs text-graphite-500">
        In {currency} per motor; beside each design, the dash and marker of its
        line in the chart.
      </p>
    </section>
  );
}
