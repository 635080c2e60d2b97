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
import { Group } from "@visx/group";
import { scaleLinear, scaleUtc } from "@visx/scale";
import { useId } from "react";
import { TrendChartAxes } from "./trend-chart-axes";
import {
  lastValue,
  trendChartFrame,
  trendDateSpan,
  trendHighest,
  trendNameYs,
  type TrendSeries,
} from "./trend-chart-layout";
import { TrendChartSeries } from "./trend-chart-series";

const dayOf = (date: string) => new Date(`${date}T00:00:00Z`);

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
  const { names, nameLines, margin, width, height, innerWidth, innerHeight } =
    trendChartFrame(series);
  const { first, last } = trendDateSpan(series);
  const xScale = scaleUtc<number>({
    domain: [dayOf(first), dayOf(last)],
    range: [0, innerWidth],
  });
  const highest = trendHighest(series);
  const yScale = scaleLinear<number>({
    domain: [0, highest > 0 ? highest : 1],
    range: [innerHeight, 0],
    nice: true,
  });
  const x = (date: string) => xScale(dayOf(date));
  const ends = series.map((entry) => {
    const value = lastValue(entry.points);
    return value === null ? null : yScale(value);
  });
  const labelYs = trendNameYs(ends, nameLines, innerHeight);

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
            <TrendChartAxes
              xScale={xScale}
              yScale={yScale}
              highest={highest}
              innerWidth={innerWidth}
              innerHeight={innerHeight}
              unit={unit}
              monthly={monthly}
            />
            {series.map((entry, index) => (
              <TrendChartSeries
                key={entry.key}
                series={entry}
                index={index}
                nameLines={names[index]!}
                labelY={labelYs[index]}
                end={ends[index]}
                x={x}
                y={(value) => yScale(value)}
                innerWidth={innerWidth}
                unit={unit}
              />
            ))}
          </Group>
        </svg>
      </div>
      <p id={summaryId} className="sr-only">
        {summary}
      </p>
    </figure>
  );
}
