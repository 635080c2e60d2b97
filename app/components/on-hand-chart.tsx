import { AxisBottom, AxisLeft } from "@visx/axis";
import { curveStepAfter } from "@visx/curve";
import { GlyphCircle } from "@visx/glyph";
import { GridRows } from "@visx/grid";
import { scaleLinear, scaleUtc } from "@visx/scale";
import { Line, LinePath } from "@visx/shape";
import { formatDay, formatTimeOfDay } from "~/lib/format";
import { quantityText } from "~/lib/unit-text";
import {
  onHandChart,
  type OnHandChart as OnHandChartLayout,
  type OnHandPoint,
} from "~/stock/on-hand-history-chart";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

const frame = {
  width: 720,
  height: 220,
  left: 78,
  right: 16,
  top: 14,
  bottom: 40,
};

/** A movement's point on the chart: its time and the on hand after it. */
const timeOf = (point: OnHandPoint) => new Date(point.at);

/**
 * On hand over time as a step line, one dot per movement, the reorder point
 * dashed and labelled: readable in black and white. A summary stands in for
 * screen readers; the movement table below holds every figure. Drawn with visx
 * (scales, axes, grid, a step LinePath, glyphs) as plain SVG the server renders
 * whole; which ticks and how long an axis is come from `onHandChart`.
 */
export function OnHandChart({
  points,
  now,
  unit,
  reorderPoint,
}: {
  points: OnHandPoint[];
  now: string;
  unit: string;
  reorderPoint: number;
}) {
  const chart = onHandChart(points, now, reorderPoint, frame, unit === "pcs");
  if (!chart) {
    return (
      <p className="text-sm text-graphite-500">
        No movements yet: the chart starts with the first receipt.
      </p>
    );
  }
  const last = points[points.length - 1]!;
  const summary = `On hand over the last ${points.length} movement${points.length === 1 ? "" : "s"}, from ${formatDay(points[0]!.at)} to now: ${formatStockQuantity(last.onHand, unit)} now${
    reorderPoint > 0
      ? `, reorder point ${formatStockQuantity(reorderPoint, unit)}`
      : ""
  }.`;
  const plotLeft = frame.left;
  const plotRight = frame.width - frame.right;
  const plotBottom = frame.height - frame.bottom;
  const values = chart.valueTicks.map((tick) => tick.value);
  const start = new Date(chart.timeTicks[0]!.at);
  const end = new Date(chart.timeTicks[chart.timeTicks.length - 1]!.at);
  const xScale = scaleUtc<number>({
    domain: [start, end],
    range: [plotLeft, plotRight],
  });
  const yScale = scaleLinear<number>({
    domain: [0, values[values.length - 1]!],
    range: [plotBottom, frame.top],
  });
  // The line holds each on hand until the next movement, and the last one until now.
  const line = [...points, { at: end.toISOString(), onHand: last.onHand }];
  return (
    <figure>
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        role="img"
        aria-label={summary}
        className="h-auto w-full text-graphite-700"
      >
        <OnHandAxes chart={chart} xScale={xScale} yScale={yScale} unit={unit} />
        {reorderPoint > 0 ? (
          <g>
            <Line
              from={{ x: plotLeft, y: yScale(reorderPoint) }}
              to={{ x: plotRight, y: yScale(reorderPoint) }}
              stroke="currentColor"
              strokeWidth={1.5}
              strokeDasharray="6 4"
              // Drawn smooth at its 1.5 px, like the line it marks, not snapped to whole pixels.
              shapeRendering="auto"
            />
            <text
              x={plotRight - 4}
              y={yScale(reorderPoint) - 5}
              textAnchor="end"
              fontSize="11"
              fill="currentColor"
            >
              reorder point {formatStockQuantity(reorderPoint, unit)}
            </text>
          </g>
        ) : null}
        <LinePath
          data={line}
          x={(point) => xScale(timeOf(point))}
          y={(point) => yScale(point.onHand)}
          curve={curveStepAfter}
          fill="none"
          className="stroke-copper-600"
          strokeWidth={2.25}
          strokeLinejoin="round"
        />
        {points.map((point, index) => (
          <GlyphCircle
            key={index}
            left={xScale(timeOf(point))}
            top={yScale(point.onHand)}
            // A symbol's size is its area: a circle of radius 2.75 px.
            size={Math.PI * 2.75 ** 2}
            className="fill-sheet stroke-copper-700"
            strokeWidth={1.5}
          />
        ))}
      </svg>
      <figcaption className="mt-1 text-xs text-graphite-500">
        Solid line: on hand after each movement (dots). Dashed line: reorder
        point. The last{" "}
        {points.length > 1 ? `${points.length} movements` : "movement"} shown.
      </figcaption>
    </figure>
  );
}

/**
 * The chart's grid and axes: the value ticks (the zero line darker), the start, middle
 * and now of the time axis (times of day when it spans two days or less), and the axis
 * titles.
 */
function OnHandAxes({
  chart,
  xScale,
  yScale,
  unit,
}: {
  chart: OnHandChartLayout;
  xScale: ReturnType<typeof scaleUtc<number>>;
  yScale: ReturnType<typeof scaleLinear<number>>;
  unit: string;
}) {
  const plotLeft = frame.left;
  const plotRight = frame.width - frame.right;
  const plotBottom = frame.height - frame.bottom;
  const values = chart.valueTicks.map((tick) => tick.value);
  const times = chart.timeTicks.map((tick) => new Date(tick.at));
  const decimals =
    unit === "pcs"
      ? 0
      : chart.valueTicks.some((tick) => !Number.isInteger(tick.value))
        ? 2
        : 0;
  const timeText = (at: string, index: number) =>
    index === times.length - 1
      ? "now"
      : !chart.withinTwoDays
        ? formatDay(at)
        : index === 0
          ? `${formatDay(at)}, ${formatTimeOfDay(at)}`
          : formatTimeOfDay(at);
  return (
    <>
      <GridRows
        scale={yScale}
        tickValues={values.filter((value) => value !== 0)}
        left={plotLeft}
        width={plotRight - plotLeft}
        stroke="currentColor"
        strokeOpacity={0.12}
      />
      <GridRows
        scale={yScale}
        tickValues={[0]}
        left={plotLeft}
        width={plotRight - plotLeft}
        stroke="currentColor"
        strokeOpacity={0.6}
      />
      <AxisLeft
        scale={yScale}
        left={plotLeft}
        tickValues={values}
        hideAxisLine
        hideTicks
        tickLength={8}
        tickFormat={(value) => quantityText(Number(value), unit, decimals)}
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
        tickValues={times}
        hideAxisLine
        hideTicks
        tickLength={6}
        tickFormat={(_, index) => timeText(chart.timeTicks[index]!.at, index)}
        tickLabelProps={(_, index) => ({
          fontSize: 12,
          fontFamily: undefined,
          fill: "currentColor",
          textAnchor:
            index === 0
              ? "start"
              : index === times.length - 1
                ? "end"
                : "middle",
        })}
      />
      <text
        x={plotLeft}
        y={frame.height - 4}
        fontSize="11"
        fill="currentColor"
        fillOpacity={0.7}
      >
        Time (UTC) →
      </text>
      <text
        x={12}
        y={frame.top + (plotBottom - frame.top) / 2}
        fontSize="11"
        fill="currentColor"
        fillOpacity={0.7}
        textAnchor="middle"
        transform={`rotate(-90 12 ${frame.top + (plotBottom - frame.top) / 2})`}
      >
        On hand ({unit})
      </text>
    </>
  );
}
