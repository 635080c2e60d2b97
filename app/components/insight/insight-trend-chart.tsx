/**
 * A value over time, one line per series (the stock value week by week; the cost per
 * motor of each design month by month), drawn with visx (@visx/shape LinePath,
 * @visx/glyph markers, @visx/scale, @visx/axis, @visx/grid) as plain SVG that the server
 * renders whole. Series differ in dash pattern and marker shape (the same styles as the
 * item page's price history) and are named at the end of their line, so the chart reads
 * in print and without colour; a gap in a line is a point with no value. A series with
 * only a few points (a design priced in two months) has each point's value written beside
 * it, so a short line reads as figures over time rather than as a legend's key. The
 * figures are in a table beside the chart (the caller's).
 */
import { AxisBottom, AxisLeft } from "@visx/axis";
import {
  GlyphCircle,
  GlyphCross,
  GlyphDiamond,
  GlyphSquare,
  GlyphTriangle,
} from "@visx/glyph";
import { GridRows } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleLinear, scaleUtc } from "@visx/scale";
import { LinePath } from "@visx/shape";
import { useId } from "react";
import { axisUnits } from "~/insight/axis-units";
import { widestText, wrapLabel } from "~/insight/chart-labels";
import { formatQuantity } from "~/lib/format";
import {
  labelSpacing,
  seriesStyle,
  spreadLabels,
  type SeriesStyle,
} from "~/pricing/price-history-chart";
import { palette } from "../insight-patterns";

export interface TrendSeries {
  key: string;
  label: string;
  points: { date: string; value: number | null }[];
}

/** The plot's own width; the right margin grows to hold each series' whole name. */
const plotWidth = 472;
const height = 280;
const marginTop = 14;
const marginBottom = 40;
const marginLeft = 78;
/** Series names wrap at this many characters (whole, on as many lines as they need). */
const nameCharacters = 26;
const nameLineHeight = 12;
/** Series with at most this many points have each point's value written beside it. */
const fewPoints = 3;

/** Line colours from the palette; the dash and marker tell the series apart without them. */
const strokes = [
  palette.graphite900,
  palette.copper600,
  palette.field,
  palette.ok,
  palette.caution,
  palette.graphite500,
];

const dayMonth = new Intl.DateTimeFormat("en-GB", {
  day: "numeric",
  month: "short",
  timeZone: "UTC",
});
const monthYear = new Intl.DateTimeFormat("en-GB", {
  month: "short",
  year: "numeric",
  timeZone: "UTC",
});

const dayOf = (date: string) => new Date(`${date}T00:00:00Z`);

/** The marker of a series, hollow so overlapping markers stay readable. */
export function TrendMarker({
  style,
  x,
  y,
  stroke,
}: {
  style: SeriesStyle;
  x: number;
  y: number;
  stroke: string;
}) {
  const common = {
    left: x,
    top: y,
    size: 48,
    stroke,
    strokeWidth: 1.75,
    fill: style.marker === "cross" ? stroke : palette.sheet,
  };
  switch (style.marker) {
    case "circle":
      return <GlyphCircle {...common} />;
    case "square":
      return <GlyphSquare {...common} />;
    case "triangle":
      return <GlyphTriangle {...common} />;
    case "triangle-down":
      return (
        <g transform={`rotate(180 ${x} ${y})`}>
          <GlyphTriangle {...common} />
        </g>
      );
    case "diamond":
      return <GlyphDiamond {...common} />;
    case "cross":
      return <GlyphCross {...common} size={36} strokeWidth={0.5} />;
  }
}

/** A short piece of a series' line with its marker: the legend's key. */
export function TrendSample({ index }: { index: number }) {
  const style = seriesStyle(index);
  const stroke = strokes[index % strokes.length]!;
  return (
    <svg
      viewBox="0 0 36 14"
      width={36}
      height={14}
      aria-hidden="true"
      className="inline-block shrink-0"
    >
      <line
        x1={1}
        x2={35}
        y1={7}
        y2={7}
        stroke={stroke}
        strokeWidth={2}
        strokeDasharray={style.dash || undefined}
      />
      <TrendMarker style={style} x={18} y={7} stroke={stroke} />
    </svg>
  );
}

export function InsightTrendChart({
  series,
  unit,
  label,
  summary,
  monthly,
}: {
  series: TrendSeries[];
  /** What the values are in, for the value axis: "EUR", "EUR per motor". */
  unit: string;
  /** The chart's name for screen readers. */
  label: string;
  /** One or two sentences with the figures, for screen readers. */
  summary: string;
  /** Ticks name months ("Mar 2026") rather than days ("2 Mar"). */
  monthly: boolean;
}) {
  const summaryId = useId();
  const dates = series.flatMap((entry) =>
    entry.points.map((point) => point.date),
  );
  const values = series.flatMap((entry) =>
    entry.points.flatMap((point) =>
      point.value === null ? [] : [point.value],
    ),
  );
  // Each name whole, wrapped, 12 px after the plot; the margin is as wide as its widest line.
  const names = series.map((entry) => wrapLabel(entry.label, nameCharacters));
  const nameLines = Math.max(1, ...names.map((lines) => lines.length));
  const margin = {
    top: marginTop,
    bottom: marginBottom,
    left: marginLeft,
    right: Math.max(40, Math.ceil(widestText(names.flat(), 11) + 18)),
  };
  const innerWidth = plotWidth;
  const width = margin.left + innerWidth + margin.right;
  const innerHeight = height - margin.top - margin.bottom;
  const first = dates.reduce(
    (a, b) => (b < a ? b : a),
    dates[0] ?? "2000-01-01",
  );
  const last = dates.reduce(
    (a, b) => (b > a ? b : a),
    dates[0] ?? "2000-01-01",
  );
  const xScale = scaleUtc<number>({
    domain: [dayOf(first), dayOf(last)],
    range: [0, innerWidth],
  });
  const highest = Math.max(0, ...values);
  const yScale = scaleLinear<number>({
    domain: [0, highest > 0 ? highest : 1],
    range: [innerHeight, 0],
    nice: true,
  });
  const units = axisUnits(yScale.domain()[1] ?? highest);
  const x = (date: string) => xScale(dayOf(date));
  const ends = series.map((entry) => {
    const lastPoint = [...entry.points]
      .reverse()
      .find((point) => point.value !== null);
    return lastPoint ? yScale(lastPoint.value!) : null;
  });
  // Names of several lines need more room between them than the shared spacing gives.
  const spread =
    Math.max(labelSpacing, nameLines * nameLineHeight + 2) / labelSpacing;
  const labelYs = spreadLabels(
    ends.map((end) => (end === null ? null : end / spread)),
    0,
    Math.max(0, innerHeight - (nameLines - 1) * nameLineHeight) / spread,
  ).map((labelY) => (labelY === null ? null : labelY * spread));

  return (
    <figure className="space-y-2">
      <div className="overflow-x-auto [contain:inline-size]">
        <svg
          viewBox={`0 0 ${width} ${height}`}
          role="img"
          aria-label={label}
          aria-describedby={summaryId}
          style={{ maxWidth: width }}
          className="h-auto w-full min-w-[30rem] tabular-nums"
        >
          <Group left={margin.left} top={margin.top}>
            <GridRows
              scale={yScale}
              width={innerWidth}
              numTicks={5}
              stroke={palette.graphite700}
              strokeOpacity={0.14}
            />
            <AxisLeft
              scale={yScale}
              numTicks={5}
              stroke={palette.graphite500}
              tickStroke={palette.graphite500}
              tickFormat={(value) =>
                formatQuantity(
                  Number(value) / units.divisor,
                  "",
                  units.decimals,
                )
              }
              tickLabelProps={{
                fontSize: 11,
                fill: palette.graphite700,
                textAnchor: "end",
                dx: -2,
                dy: 4,
              }}
              label={`${units.prefix}${unit}`}
              labelOffset={52}
              labelProps={{
                fontSize: 11,
                fill: palette.graphite700,
                textAnchor: "middle",
              }}
            />
            <AxisBottom
              top={innerHeight}
              scale={xScale}
              numTicks={6}
              stroke={palette.graphite500}
              tickStroke={palette.graphite500}
              tickFormat={(value) =>
                (monthly ? monthYear : dayMonth).format(value as Date)
              }
              tickLabelProps={{
                fontSize: 11,
                fill: palette.graphite700,
                textAnchor: "middle",
              }}
            />
            {series.map((entry, index) => {
              const style = seriesStyle(index);
              const stroke = strokes[index % strokes.length]!;
              const labelY = labelYs[index];
              const end = ends[index];
              const valued = entry.points.filter(
                (point) => point.value !== null,
              );
              return (
                <g key={entry.key} data-series={entry.label}>
                  <LinePath
                    data={entry.points}
                    x={(point) => x(point.date)}
                    y={(point) => yScale(point.value ?? 0)}
                    defined={(point) => point.value !== null}
                    stroke={stroke}
                    strokeWidth={2.25}
                    strokeDasharray={style.dash || undefined}
                    strokeLinejoin="round"
                    fill="none"
                  />
                  {entry.points.map((point) =>
                    point.value === null ? null : (
                      <g key={point.date}>
                        <title>{`${entry.label}, ${point.date}: ${formatQuantity(point.value, unit, 2)}`}</title>
                        <TrendMarker
                          style={style}
                          x={x(point.date)}
                          y={yScale(point.value)}
                          stroke={stroke}
                        />
                        {/* Up and to the left of its point, so next months' values do not meet. */}
                        {valued.length <= fewPoints ? (
                          <text
                            data-point-value=""
                            x={x(point.date) - 5}
                            y={Math.max(10, yScale(point.value) - 7)}
                            textAnchor="end"
                            fontSize={10}
                            fill={palette.graphite900}
                          >
                            {formatQuantity(point.value, "", 2)}
                          </text>
                        ) : null}
                      </g>
                    ),
                  )}
                  {labelY !== null && labelY !== undefined && end !== null ? (
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
                        {names[index]!.map((line, lineIndex) => (
                          <tspan
                            key={lineIndex}
                            x={innerWidth + 12}
                            dy={lineIndex === 0 ? 0 : nameLineHeight}
                          >
                            {lineIndex < names[index]!.length - 1
                              ? `${line} `
                              : line}
                          </tspan>
                        ))}
                      </text>
                    </g>
                  ) : null}
                </g>
              );
            })}
          </Group>
        </svg>
      </div>
      <p id={summaryId} className="sr-only">
        {summary}
      </p>
    </figure>
  );
}
