/**
 * The plot of the item page's price history, drawn with visx: price ticks (GridRows,
 * AxisLeft), date ticks (AxisBottom), one step line per supplier article (LinePath with
 * curveStepAfter, broken on days without a price), a marker at each price and each
 * article's name beside the end of its line. Which ticks and where the names go come
 * from the pure layout (`priceHistoryChart`).
 */
import { AxisBottom, AxisLeft } from "@visx/axis";
import { curveStepAfter } from "@visx/curve";
import { GridRows } from "@visx/grid";
import { scaleLinear, scaleUtc } from "@visx/scale";
import { Line, LinePath } from "@visx/shape";
import { formatQuantity } from "~/lib/format";
import { perUnitWord } from "~/lib/unit-text";
import {
  type ChartPoint,
  type PriceHistoryChartLayout,
} from "~/pricing/price-history-chart";
import {
  monthText,
  offerName,
  shortName,
  type PriceHistoryView,
} from "~/stock/price-history-texts";
import { formatDay } from "~/lib/format";
import { OfferMarker, offerStrokeClass } from "./price-offer-marker";
import { priceHistoryFrame as frame } from "./price-history-layout";

const plotRight = frame.width - frame.right;
const plotBottom = frame.height - frame.bottom;

/**
 * The offer's prices as a step line: each price holds until the next point, a day
 * without a price ends the line there, and the last price holds on to `end`.
 */
function stepsOf(points: readonly ChartPoint[], end: string): ChartPoint[] {
  const steps: ChartPoint[] = [];
  let held: number | null = null;
  for (const point of points) {
    if (point.unitPrice === null && held !== null)
      steps.push({ date: point.date, unitPrice: held });
    steps.push(point);
    held = point.unitPrice;
  }
  if (held !== null) steps.push({ date: end, unitPrice: held });
  return steps;
}

const dayOf = (date: string) => new Date(`${date}T00:00:00Z`);

export function PriceHistoryPlot({
  history,
  chart,
  summaryId,
  price,
}: {
  history: PriceHistoryView;
  chart: PriceHistoryChartLayout;
  /** The id of the summary that describes the plot. */
  summaryId: string;
  /** A unit price in words: "12.5000 EUR/kg". */
  price: (value: number) => string;
}) {
  const currency = history.companyCurrency;
  const unitWord = perUnitWord(history.unit);
  const values = chart.valueTicks.map((tick) => tick.value);
  const yScale = scaleLinear<number>({
    domain: [values[0]!, values[values.length - 1]!],
    range: [plotBottom, frame.top],
  });
  const xScale = scaleUtc<number>({
    domain: [dayOf(chart.start), dayOf(chart.end)],
    range: [frame.left, plotRight],
  });
  return (
    <div className="overflow-x-auto [contain:inline-size]">
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        role="img"
        aria-label={`Price history chart, ${currency} per ${unitWord}`}
        aria-describedby={summaryId}
        className="h-auto w-full min-w-[34rem] text-graphite-700 tabular-nums"
      >
        <GridRows
          scale={yScale}
          tickValues={values}
          left={frame.left}
          width={plotRight - frame.left}
          stroke="currentColor"
          strokeOpacity={0.14}
        />
        <AxisLeft
          scale={yScale}
          left={frame.left}
          tickValues={values}
          hideAxisLine
          hideTicks
          tickLength={8}
          tickFormat={(value) =>
            formatQuantity(Number(value), "", chart.valueDecimals)
          }
          tickLabelProps={{
            fontSize: 12,
            fontFamily: undefined,
            fill: "currentColor",
            textAnchor: "end",
            dx: 0,
            dy: 4,
          }}
        />
        <AxisBottom
          scale={xScale}
          top={plotBottom}
          tickValues={chart.dateTicks.map((tick) => dayOf(tick.date))}
          stroke="currentColor"
          tickStroke="currentColor"
          tickLength={5}
          axisLineClassName="[stroke-opacity:0.5]"
          tickLineProps={{ strokeOpacity: 0.5, strokeLinecap: "butt" }}
          tickFormat={(_, index) => {
            const date = chart.dateTicks[index]!.date;
            return chart.monthTicks ? monthText(date) : formatDay(date);
          }}
          tickLabelProps={(_, index) => ({
            fontSize: 12,
            fontFamily: undefined,
            fill: "currentColor",
            textAnchor: chart.dateTicks[index]!.anchor,
            dy: 1,
          })}
        />
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
          const strokeClass = offerStrokeClass(index);
          const pricedNow = offer.points.at(-1)?.unitPrice != null;
          return (
            <g key={name}>
              <LinePath
                data={stepsOf(offer.points, chart.end)}
                x={(point) => xScale(dayOf(point.date))}
                y={(point) => yScale(point.unitPrice ?? 0)}
                defined={(point) => point.unitPrice !== null}
                curve={curveStepAfter}
                fill="none"
                className={strokeClass}
                strokeWidth={2.25}
                strokeDasharray={layout.style.dash || undefined}
                strokeLinejoin="round"
              />
              {layout.markers.map((marker) => (
                <g key={marker.date}>
                  <title>{`${name}: ${price(marker.unitPrice)} from ${formatDay(marker.date)}`}</title>
                  <OfferMarker
                    style={layout.style}
                    x={xScale(dayOf(marker.date))}
                    y={yScale(marker.unitPrice)}
                    index={index}
                  />
                </g>
              ))}
              {layout.labelY !== null && layout.endY !== null ? (
                <g>
                  {pricedNow && layout.labelY !== layout.endY ? (
                    <Line
                      from={{ x: plotRight + 1, y: layout.endY }}
                      to={{ x: plotRight + 6, y: layout.labelY }}
                      className={strokeClass}
                      strokeWidth={1}
                    />
                  ) : null}
                  <OfferMarker
                    style={layout.style}
                    x={plotRight + 13}
                    y={layout.labelY}
                    index={index}
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
  );
}
