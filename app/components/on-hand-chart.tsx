import { formatDay, formatTimeOfDay } from "~/lib/format";
import { quantityText } from "~/lib/unit-text";
import { onHandChart, type OnHandPoint } from "~/stock/on-hand-history-chart";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

const frame = {
  width: 720,
  height: 220,
  left: 78,
  right: 16,
  top: 14,
  bottom: 40,
};

/**
 * On hand over time as a step line, one dot per movement, the reorder point
 * dashed and labelled: readable in black and white. A summary stands in for
 * screen readers; the movement table below holds every figure.
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
  const decimals =
    unit === "pcs"
      ? 0
      : chart.valueTicks.some((tick) => !Number.isInteger(tick.value))
        ? 2
        : 0;
  const last = points[points.length - 1]!;
  const summary = `On hand over the last ${points.length} movement${points.length === 1 ? "" : "s"}, from ${formatDay(points[0]!.at)} to now: ${formatStockQuantity(last.onHand, unit)} now${
    reorderPoint > 0
      ? `, reorder point ${formatStockQuantity(reorderPoint, unit)}`
      : ""
  }.`;
  const plotLeft = frame.left;
  const plotRight = frame.width - frame.right;
  const plotBottom = frame.height - frame.bottom;
  return (
    <figure>
      <svg
        viewBox={`0 0 ${frame.width} ${frame.height}`}
        role="img"
        aria-label={summary}
        className="h-auto w-full text-graphite-700"
      >
        {chart.valueTicks.map((tick) => (
          <g key={tick.value}>
            <line
              x1={plotLeft}
              x2={plotRight}
              y1={tick.y}
              y2={tick.y}
              stroke="currentColor"
              strokeOpacity={tick.value === 0 ? 0.6 : 0.12}
            />
            <text
              x={plotLeft - 8}
              y={tick.y + 4}
              textAnchor="end"
              fontSize="12"
              fill="currentColor"
            >
              {quantityText(tick.value, unit, decimals)}
            </text>
          </g>
        ))}
        {chart.timeTicks.map((tick, index) => (
          <text
            key={tick.at}
            x={tick.x}
            y={plotBottom + 18}
            textAnchor={
              index === 0
                ? "start"
                : index === chart.timeTicks.length - 1
                  ? "end"
                  : "middle"
            }
            fontSize="12"
            fill="currentColor"
          >
            {index === chart.timeTicks.length - 1
              ? "now"
              : !chart.withinTwoDays
                ? formatDay(tick.at)
                : index === 0
                  ? `${formatDay(tick.at)}, ${formatTimeOfDay(tick.at)}`
                  : formatTimeOfDay(tick.at)}
          </text>
        ))}
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
        {chart.reorderY !== null ? (
          <g>
            <line
              x1={plotLeft}
              x2={plotRight}
              y1={chart.reorderY}
              y2={chart.reorderY}
              stroke="currentColor"
              strokeWidth={1.5}
              strokeDasharray="6 4"
            />
            <text
              x={plotRight - 4}
              y={chart.reorderY - 5}
              textAnchor="end"
              fontSize="11"
              fill="currentColor"
            >
              reorder point {formatStockQuantity(reorderPoint, unit)}
            </text>
          </g>
        ) : null}
        <path
          d={chart.path}
          fill="none"
          className="stroke-copper-600"
          strokeWidth={2.25}
          strokeLinejoin="round"
        />
        {chart.markers.map((marker, index) => (
          <circle
            key={index}
            cx={marker.x}
            cy={marker.y}
            r={2.75}
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
