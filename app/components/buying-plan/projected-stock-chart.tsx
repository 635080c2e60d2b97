/**
 * One item's projected stock week by week: a dashed line without ordering anything
 * more, a solid copper line with the plan's suggestions arriving, the reorder point as a
 * dotted line, the build orders' needs as downward triangles, open orders' arrivals as
 * upward triangles and suggested arrivals as diamonds. Drawn with visx as plain SVG the
 * server renders whole; the geometry comes from projection-chart.ts. A summary stands in
 * for screen readers; the table of weeks below holds every figure.
 */
import { AxisLeft } from "@visx/axis";
import { scaleLinear } from "@visx/scale";
import { Line, LinePath } from "@visx/shape";
import {
  projectionChart,
  type ProjectionWeek,
} from "~/buying-plan/projection-chart";
import { formatDay } from "~/lib/format";
import { quantityText } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { WeekMarkers } from "./week-markers";

const frame = {
  width: 720,
  height: 260,
  left: 84,
  right: 16,
  top: 16,
  bottom: 48,
};

export function ProjectedStockChart({
  sku,
  unit,
  reorderPoint,
  weeks,
}: {
  sku: string;
  unit: string;
  reorderPoint: number;
  weeks: ProjectionWeek[];
}) {
  const chart = projectionChart(weeks, reorderPoint, frame, unit === "pcs");
  if (!chart) return null;
  const ticks = chart.valueTicks;
  const yScale = scaleLinear<number>({
    domain: [ticks[0]!.value, ticks.at(-1)!.value],
    range: [ticks[0]!.y, ticks.at(-1)!.y],
  });
  const plotRight = frame.width - frame.right;
  const last = chart.points.at(-1)!;
  const summary = `${sku}, projected stock over ${weeks.length} weeks from ${formatDay(weeks[0]!.weekStart)}: ${formatStockQuantity(last.without, unit)} at the end without ordering, ${formatStockQuantity(last.with, unit)} with the suggested orders${reorderPoint > 0 ? `; reorder point ${formatStockQuantity(reorderPoint, unit)}` : ""}.`;
  return (
    <figure>
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        role="img"
        aria-label={summary}
        className="h-auto w-full text-graphite-700"
      >
        {ticks.map((tick) => (
          <Line
            key={tick.value}
            from={{ x: frame.left, y: tick.y }}
            to={{ x: plotRight, y: tick.y }}
            stroke="currentColor"
            strokeOpacity={tick.value === 0 ? 0.6 : 0.12}
          />
        ))}
        <AxisLeft
          scale={yScale}
          left={frame.left}
          tickValues={ticks.map((tick) => tick.value)}
          hideAxisLine
          hideTicks
          tickFormat={(value) => quantityText(Number(value), unit, 0)}
          tickLabelProps={{
            fontSize: 12,
            fontFamily: undefined,
            fill: "currentColor",
            textAnchor: "end",
            dy: 4,
          }}
        />
        {chart.points.map((point) => (
          <text
            key={point.weekStart}
            x={point.x}
            y={frame.height - 10}
            fontSize="12"
            fill="currentColor"
            textAnchor="middle"
          >
            {formatDay(point.weekStart).replace(/ \d{4}$/, "")}
          </text>
        ))}
        {chart.reorderY !== null ? (
          <g>
            <Line
              from={{ x: frame.left, y: chart.reorderY }}
              to={{ x: plotRight, y: chart.reorderY }}
              stroke="currentColor"
              strokeWidth={1.5}
              strokeDasharray="2 4"
            />
            <text
              x={plotRight - 4}
              y={chart.reorderY - 5}
              fontSize="11"
              fill="currentColor"
              textAnchor="end"
            >
              reorder point {formatStockQuantity(reorderPoint, unit)}
            </text>
          </g>
        ) : null}
        <LinePath
          data={chart.points}
          x={(point) => point.x}
          y={(point) => point.withoutY}
          fill="none"
          stroke="currentColor"
          strokeOpacity={0.55}
          strokeWidth={1.5}
          strokeDasharray="6 4"
        />
        <LinePath
          data={chart.points}
          x={(point) => point.x}
          y={(point) => point.withY}
          fill="none"
          className="stroke-copper-600"
          strokeWidth={2.25}
          strokeLinejoin="round"
        />
        {chart.points.map((point) => (
          <WeekMarkers
            key={point.weekStart}
            point={point}
            zeroY={chart.zeroY}
            unit={unit}
          />
        ))}
      </svg>
      <figcaption className="mt-1 text-xs text-graphite-500">
        Stock at each week&apos;s end. Solid copper line: with the suggested
        orders arriving (diamonds). Dashed: without ordering more. Dotted:
        reorder point. Red triangles: build orders&apos; needs; blue: open
        orders due.
      </figcaption>
    </figure>
  );
}
