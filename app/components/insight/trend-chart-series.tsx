/**
 * One series of the trend chart: its line (a gap where a point has no value), a marker
 * with a tooltip at each valued point, each point's value written beside it when the
 * series has only a few, and its name at the end of the line, wrapped, with a short
 * leader line when the name had to move away from the line's end.
 */
import { LinePath } from "@visx/shape";
import { formatQuantity } from "~/lib/format";
import { seriesStyle, type SeriesStyle } from "~/pricing/price-history-chart";
import { palette } from "../insight-patterns";
import {
  nameLineHeight,
  type TrendSeries,
  writesPointValues,
} from "./trend-chart-layout";
import { TrendMarker, trendStroke } from "./trend-marker";

type Point = TrendSeries["points"][number];

function TrendPoint({
  series,
  point,
  value,
  style,
  stroke,
  x,
  y,
  unit,
  writeValue,
}: {
  series: TrendSeries;
  point: Point;
  value: number;
  style: SeriesStyle;
  stroke: string;
  x: number;
  y: number;
  unit: string;
  writeValue: boolean;
}) {
  return (
    <g>
      <title>{`${series.label}, ${point.date}: ${formatQuantity(value, unit, 2)}`}</title>
      <TrendMarker style={style} x={x} y={y} stroke={stroke} />
      {/* Up and to the left of its point, so next months' values do not meet. */}
      {writeValue ? (
        <text
          data-point-value=""
          x={x - 5}
          y={Math.max(10, y - 7)}
          textAnchor="end"
          fontSize={10}
          fill={palette.graphite900}
        >
          {formatQuantity(value, "", 2)}
        </text>
      ) : null}
    </g>
  );
}

/** The series' name beside the plot at `labelY`, led from the line's `end` when apart. */
function SeriesName({
  lines,
  labelY,
  end,
  stroke,
  innerWidth,
}: {
  lines: string[];
  labelY: number;
  end: number;
  stroke: string;
  innerWidth: number;
}) {
  return (
    <g>
      {labelY !== end ? (
        <line
          x1={innerWidth + 2}
          x2={innerWidth + 8}
          y1={end}
          y2={labelY}
          stroke={stroke}
          strokeWidth={1}
        />
      ) : null}
      <text
        data-series-name=""
        x={innerWidth + 12}
        y={labelY + 4}
        fontSize={11}
        fill={palette.graphite900}
      >
        {lines.map((line, lineIndex) => (
          <tspan
            key={lineIndex}
            x={innerWidth + 12}
            dy={lineIndex === 0 ? 0 : nameLineHeight}
          >
            {lineIndex < lines.length - 1 ? `${line} ` : line}
          </tspan>
        ))}
      </text>
    </g>
  );
}

export function TrendChartSeries({
  series,
  index,
  nameLines,
  labelY,
  end,
  x,
  y,
  innerWidth,
  unit,
}: {
  series: TrendSeries;
  index: number;
  /** The series' name as the lines it wraps to. */
  nameLines: string[];
  labelY: number | null | undefined;
  /** The y of the line's last valued point; null without one. */
  end: number | null | undefined;
  x: (date: string) => number;
  y: (value: number) => number;
  innerWidth: number;
  unit: string;
}) {
  const style = seriesStyle(index);
  const stroke = trendStroke(index);
  const writeValues = writesPointValues(series.points);
  return (
    <g data-series={series.label}>
      <LinePath
        data={series.points}
        x={(point) => x(point.date)}
        y={(point) => y(point.value ?? 0)}
        defined={(point) => point.value !== null}
        stroke={stroke}
        strokeWidth={2.25}
        strokeDasharray={style.dash || undefined}
        strokeLinejoin="round"
        fill="none"
      />
      {series.points.map((point) =>
        point.value === null ? null : (
          <TrendPoint
            key={point.date}
            series={series}
            point={point}
            value={point.value}
            style={style}
            stroke={stroke}
            x={x(point.date)}
            y={y(point.value)}
            unit={unit}
            writeValue={writeValues}
          />
        ),
      )}
      {labelY !== null &&
      labelY !== undefined &&
      end !== null &&
      end !== undefined ? (
        <SeriesName
          lines={nameLines}
          labelY={labelY}
          end={end}
          stroke={stroke}
          innerWidth={innerWidth}
        />
      ) : null}
    </g>
  );
}
