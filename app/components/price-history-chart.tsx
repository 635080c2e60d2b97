import { createColumnHelper } from "@tanstack/react-table";
import { useId } from "react";
import { Link } from "react-router";
import { DataTable } from "~/components/data-table";
import { formatDay, formatQuantity } from "~/lib/format";
import {
  markerPath,
  priceHistoryChart,
  type ChartFrame,
  type SeriesStyle,
} from "~/pricing/price-history-chart";
import { perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

/** What the item page's loader sends: the unit price of one quantity over time, one series per offer. */
export interface PriceHistoryView {
  unit: string;
  quantity: number;
  companyCurrency: string;
  from: string;
  to: string;
  lineCount: number;
  series: {
    supplier: string;
    supplierSku: string;
    currency: string;
    points: {
      date: string;
      unitPrice: number | null;
      quotedUnitPrice: number | null;
      problems: string[];
    }[];
  }[];
}

type Offer = PriceHistoryView["series"][number];

const frame: ChartFrame = {
  width: 760,
  height: 290,
  left: 62,
  right: 196,
  top: 14,
  bottom: 46,
};
const plotRight = frame.width - frame.right;
const plotBottom = frame.height - frame.bottom;
const labelCharacters = 26;

/** Line colours from the palette; the dash and marker tell offers apart without them. */
const strokeClasses = [
  "stroke-graphite-900",
  "stroke-copper-600",
  "stroke-field",
  "stroke-ok",
  "stroke-caution",
  "stroke-graphite-500",
];

/** "2026-12-01" → "Dec 2026". */
function monthText(date: string): string {
  return formatDay(date).replace(/^\d+ /, "");
}

/** A unit price with its currency and unit, to the ten-thousandth: "12.5000 EUR/kg", "2.4000 EUR/piece". */
function pricePerUnit(value: number, currency: string, unit: string): string {
  return formatQuantity(value, `${currency}/${perUnitWord(unit)}`, 4);
}

function offerName(offer: Pick<Offer, "supplier" | "supplierSku">): string {
  return `${offer.supplier} · ${offer.supplierSku}`;
}

function shortName(name: string): string {
  return name.length > labelCharacters
    ? `${name.slice(0, labelCharacters - 1)}…`
    : name;
}

/** The marker of an offer, hollow so overlapping markers stay readable. */
function Marker({
  style,
  x,
  y,
  className,
  children,
}: {
  style: SeriesStyle;
  x: number;
  y: number;
  className: string;
  children?: React.ReactNode;
}) {
  return (
    <path
      d={markerPath(style.marker, x, y)}
      className={`${className} ${style.marker === "cross" ? "fill-none" : "fill-sheet"}`}
      strokeWidth={1.75}
    >
      {children}
    </path>
  );
}

/** A short piece of the offer's line with its marker: the legend's key. */
function LineSample({
  style,
  strokeClass,
}: {
  style: SeriesStyle;
  strokeClass: string;
}) {
  return (
    <svg
      viewBox="0 0 36 12"
      width={36}
      height={12}
      aria-hidden="true"
      className="shrink-0"
    >
      <line
        x1={1}
        x2={35}
        y1={6}
        y2={6}
        className={strokeClass}
        strokeWidth={2}
        strokeDasharray={style.dash || undefined}
      />
      <Marker style={style} x={18} y={6} className={strokeClass} />
    </svg>
  );
}

/**
 * The item's unit price for one quantity over the last year, one step line per supplier
 * article: a price holds until the next marker, and a break in a line is a stretch of days
 * without a price. Offers differ in dash pattern and marker shape and are named beside
 * their line, so the chart reads in print and without colour. A summary stands in for
 * screen readers; the figures are in a table below. Drawn as plain SVG from a pure layout
 * (like OnHandChart) so the server renders it whole: recharts 3 renders an empty box on
 * the server, and recharts 2's server and browser paths differ, failing hydration.
 */
export function PriceHistoryChart({
  history,
  canImport,
}: {
  history: PriceHistoryView;
  canImport: boolean;
}) {
  const summaryId = useId();
  const currency = history.companyCurrency;
  const unitWord = perUnitWord(history.unit);
  const price = (value: number) => pricePerUnit(value, currency, history.unit);
  const quantity = formatStockQuantity(history.quantity, history.unit);
  const chart = priceHistoryChart(history.series, history.to, frame);

  return (
    <section
      aria-labelledby="price-history-heading"
      className="panel space-y-3 break-inside-avoid"
    >
      <div>
        <h2 id="price-history-heading" className="text-lg font-semibold">
          Price history for {quantity}
        </h2>
        <p className="text-sm text-graphite-500">
          Unit price in {currency} per {unitWord}
          {chart
            ? `, ${formatDay(chart.start)} to ${formatDay(chart.end)}, one line per supplier article`
            : ` over the last year, ${formatDay(history.from)} to ${formatDay(history.to)}`}
          .
        </p>
      </div>
      {history.lineCount === 0 ? (
        <p className="text-sm text-graphite-500">
          No price lines for this item yet.
          {canImport ? (
            <>
              {" "}
              <Link
                to="/suppliers/import"
                className="text-copper-700 underline underline-offset-2"
              >
                Import a price list
              </Link>{" "}
              to chart its prices here.
            </>
          ) : null}
        </p>
      ) : !chart ? (
        <div className="text-sm">
          <p className="text-graphite-500">
            No supplier article has a price for {quantity} on any of these days.
          </p>
          {history.series.length > 0 ? (
            <ul className="mt-1 list-disc pl-5 text-caution">
              {history.series.map((offer) => (
                <li key={offerName(offer)}>
                  {offerName(offer)}:{" "}
                  {offer.points.at(-1)?.problems.join("; ") || "no price"}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : (
        <figure className="space-y-2">
          <div className="overflow-x-auto [contain:inline-size]">
            <svg
              viewBox={`0 0 ${frame.width} ${frame.height}`}
              role="img"
              aria-label={`Price history chart, ${currency} per ${unitWord}`}
              aria-describedby={summaryId}
              className="h-auto w-full min-w-[34rem] text-graphite-700 tabular-nums"
            >
              {chart.valueTicks.map((tick) => (
                <g key={tick.value}>
                  <line
                    x1={frame.left}
                    x2={plotRight}
                    y1={tick.y}
                    y2={tick.y}
                    stroke="currentColor"
                    strokeOpacity={0.14}
                  />
                  <text
                    x={frame.left - 8}
                    y={tick.y + 4}
                    textAnchor="end"
                    fontSize="12"
                    fill="currentColor"
                  >
                    {formatQuantity(tick.value, "", chart.valueDecimals)}
                  </text>
                </g>
              ))}
              <line
                x1={frame.left}
                x2={plotRight}
                y1={plotBottom}
                y2={plotBottom}
                stroke="currentColor"
                strokeOpacity={0.5}
              />
              {chart.dateTicks.map((tick) => (
                <g key={tick.date}>
                  <line
                    x1={tick.x}
                    x2={tick.x}
                    y1={plotBottom}
                    y2={plotBottom + 5}
                    stroke="currentColor"
                    strokeOpacity={0.5}
                  />
                  <text
                    x={tick.x}
                    y={plotBottom + 18}
                    textAnchor={tick.anchor}
                    fontSize="12"
                    fill="currentColor"
                  >
                    {chart.monthTicks
                      ? monthText(tick.date)
                      : formatDay(tick.date)}
                  </text>
                </g>
              ))}
              <text
                x={frame.left}
                y={frame.height - 6}
                fontSize="11"
                fill="currentColor"
                fillOpacity={0.75}
              >
                Date (each price holds until the next marker) →
              </text>
              <text
                x={14}
                y={frame.top + (plotBottom - frame.top) / 2}
                fontSize="11"
                fill="currentColor"
                fillOpacity={0.75}
                textAnchor="middle"
                transform={`rotate(-90 14 ${frame.top + (plotBottom - frame.top) / 2})`}
              >
                {currency} per {unitWord}
              </text>
              {chart.series.map((layout, index) => {
                const offer = history.series[index]!;
                const name = offerName(offer);
                const strokeClass =
                  strokeClasses[index % strokeClasses.length]!;
                const pricedNow = offer.points.at(-1)?.unitPrice != null;
                return (
                  <g key={name}>
                    <path
                      d={layout.path}
                      fill="none"
                      className={strokeClass}
                      strokeWidth={2.25}
                      strokeDasharray={layout.style.dash || undefined}
                      strokeLinejoin="round"
                    />
                    {layout.markers.map((marker) => (
                      <Marker
                        key={marker.date}
                        style={layout.style}
                        x={marker.x}
                        y={marker.y}
                        className={strokeClass}
                      >
                        <title>{`${name}: ${price(marker.unitPrice)} from ${formatDay(marker.date)}`}</title>
                      </Marker>
                    ))}
                    {layout.labelY !== null && layout.endY !== null ? (
                      <g>
                        {pricedNow && layout.labelY !== layout.endY ? (
                          <line
                            x1={plotRight + 1}
                            x2={plotRight + 6}
                            y1={layout.endY}
                            y2={layout.labelY}
                            className={strokeClass}
                            strokeWidth={1}
                          />
                        ) : null}
                        <Marker
                          style={layout.style}
                          x={plotRight + 13}
                          y={layout.labelY}
                          className={strokeClass}
                        />
                        <text
                          x={plotRight + 23}
                          y={layout.labelY + 4}
                          fontSize="11"
                          className="fill-graphite-900"
                        >
                          <title>{name}</title>
                          {shortName(name)}
                        </text>
                      </g>
                    ) : null}
                  </g>
                );
              })}
            </svg>
          </div>
          <p id={summaryId} className="sr-only">
            {summaryOf(history, price)}
          </p>
          <figcaption>
            <ul aria-label="Legend" className="space-y-1 text-sm">
              {history.series.map((offer, index) => {
                const layout = chart.series[index]!;
                const last = offer.points.at(-1);
                return (
                  <li
                    key={offerName(offer)}
                    className="flex items-center gap-2"
                  >
                    <LineSample
                      style={layout.style}
                      strokeClass={strokeClasses[index % strokeClasses.length]!}
                    />
                    <span>
                      <span className="font-medium">{offerName(offer)}</span>
                      <span className="text-graphite-500">
                        {" — "}
                        {last?.unitPrice != null
                          ? `now ${price(last.unitPrice)}`
                          : layout.markers.length === 0
                            ? `no price on these days: ${last?.problems.join("; ") ?? ""}`
                            : `no price now: ${last?.problems.join("; ") ?? ""}`}
                        {offer.currency !== currency
                          ? `, quoted in ${offer.currency}`
                          : ""}
                        {layout.markers.length > 0 &&
                        offer.points.some((point) => point.unitPrice === null)
                          ? "; breaks in the line are days without a price (see the figures)"
                          : ""}
                      </span>
                    </span>
                  </li>
                );
              })}
            </ul>
          </figcaption>
        </figure>
      )}
      {history.series.length > 0 ? (
        <details className="text-sm">
          <summary className="cursor-pointer font-medium text-graphite-800">
            Figures of the price history
          </summary>
          <div className="mt-2">
            <DataTable
              caption={`Unit price of ${quantity} by supplier article and date, in ${currency} per ${unitWord}`}
              columns={figureColumns(currency, history.unit)}
              rows={history.series.flatMap((offer) =>
                offer.points.map((point) => ({
                  ...point,
                  offer: offerName(offer),
                  currency: offer.currency,
                })),
              )}
            />
          </div>
        </details>
      ) : null}
    </section>
  );
}

type FigureRow = Offer["points"][number] & { offer: string; currency: string };

function figureColumns(companyCurrency: string, unit: string) {
  const column = createColumnHelper<FigureRow>();
  return [
    column.accessor("offer", { header: "Supplier article" }),
    column.accessor("date", {
      header: "From",
      cell: (info) => (
        <span className="whitespace-nowrap">{formatDay(info.getValue())}</span>
      ),
    }),
    column.accessor("unitPrice", {
      header: `Unit price in ${companyCurrency}`,
      cell: (info) => {
        const value = info.getValue();
        return value === null ? (
          <span className="text-graphite-500">no price</span>
        ) : (
          <span className="whitespace-nowrap">
            {pricePerUnit(value, companyCurrency, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "quoted",
      header: "As quoted",
      cell: ({ row }) => {
        const { quotedUnitPrice, currency } = row.original;
        return quotedUnitPrice === null || currency === companyCurrency ? (
          "—"
        ) : (
          <span className="whitespace-nowrap">
            {pricePerUnit(quotedUnitPrice, currency, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("problems", {
      header: "Why no price",
      cell: (info) => info.getValue().join("; ") || "—",
    }),
  ];
}

/** One sentence per offer for screen readers: first and last price, lowest and highest, now. */
function summaryOf(
  history: PriceHistoryView,
  price: (value: number) => string,
): string {
  const quantity = formatStockQuantity(history.quantity, history.unit);
  const offers = history.series.map((offer) => {
    const priced = offer.points.filter(
      (point): point is typeof point & { unitPrice: number } =>
        point.unitPrice !== null,
    );
    const name = offerName(offer);
    if (priced.length === 0) return `${name}: no price on these days.`;
    const values = priced.map((point) => point.unitPrice);
    const last = offer.points.at(-1)!;
    const changes = priced.length - 1;
    const quoted =
      offer.currency === history.companyCurrency
        ? ""
        : ` (quoted in ${offer.currency})`;
    return `${name}${quoted}: ${price(priced[0]!.unitPrice)} from ${formatDay(priced[0]!.date)}, ${changes === 0 ? "no change" : `${changes} change${changes === 1 ? "" : "s"}`}, lowest ${price(Math.min(...values))}, highest ${price(Math.max(...values))}, ${last.unitPrice === null ? "no price now" : `now ${price(last.unitPrice)}`}.`;
  });
  return `Unit price of ${quantity} from ${formatDay(history.from)} to ${formatDay(history.to)}, ${history.series.length} supplier article${history.series.length === 1 ? "" : "s"}. ${offers.join(" ")}`;
}
