/**
 * Stock value as horizontal bars (by kind of item, by location), drawn with visx
 * (@visx/shape Bar, @visx/scale, @visx/axis, @visx/pattern) as server-rendered SVG. Each
 * bar has its row's pattern and is named at its start and valued at its end, so it reads
 * without colour; the figures are in the table beside it (the caller's).
 */
import { AxisBottom } from "@visx/axis";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { Bar } from "@visx/shape";
import { useId } from "react";
import { widestText } from "~/insight/chart-labels";
import { formatQuantity } from "~/lib/format";
import {
  fillOf,
  palette,
  PatternDefs,
  usePatternPrefix,
  type FillPart,
} from "./insight-patterns";

export interface ValueBar {
  key: string;
  label: string;
  value: number;
  /** The fill of this bar (its pattern and colour). */
  part: FillPart<string>;
}

/** The bars' own width; the margins grow to hold each whole name and value. */
const plotWidth = 280;
const rowHeight = 30;
const gap = 8;

export function InsightValueBars({
  bars,
  currency,
  label,
}: {
  bars: ValueBar[];
  currency: string;
  label: string;
}) {
  const prefix = usePatternPrefix();
  const summaryId = useId();
  const money = (value: number) => formatQuantity(value, currency, 2);
  const margin = {
    top: 6,
    bottom: 34,
    left: Math.ceil(
      widestText(
        bars.map((bar) => bar.label),
        12,
      ) + gap,
    ),
    right: Math.ceil(
      widestText(
        bars.map((bar) => money(bar.value)),
        12,
        { bold: true },
      ) + gap,
    ),
  };
  const innerWidth = plotWidth;
  const width = margin.left + innerWidth + margin.right;
  const height =
    margin.top + margin.bottom + rowHeight * Math.max(bars.length, 1);
  const innerHeight = height - margin.top - margin.bottom;
  const largest = Math.max(0, ...bars.map((bar) => bar.value));
  const xScale = scaleLinear<number>({
    domain: [0, largest > 0 ? largest : 1],
    range: [0, innerWidth],
    nice: true,
  });
  const yScale = scaleBand<string>({
    domain: bars.map((bar) => bar.key),
    range: [0, innerHeight],
    padding: 0.25,
  });
  const parts = [
    ...new Map(bars.map((bar) => [bar.part.key, bar.part])).values(),
  ];
  return (
    <figure>
      <svg
        viewBox={`0 0 ${width} ${height}`}
        role="img"
        aria-label={label}
        aria-describedby={summaryId}
        style={{ maxWidth: width }}
        className="h-auto w-full tabular-nums print:[print-color-adjust:exact]"
      >
        <PatternDefs prefix={prefix} parts={parts} />
        <Group left={margin.left} top={margin.top}>
          {bars.map((bar) => {
            const y = yScale(bar.key) ?? 0;
            const barWidth = Math.max(0, xScale(Math.max(0, bar.value)));
            return (
              <g key={bar.key}>
                <Bar
                  x={0}
                  y={y}
                  width={barWidth}
                  height={yScale.bandwidth()}
                  fill={fillOf(prefix, bar.part)}
                  stroke={palette.graphite500}
                  strokeWidth={0.75}
                />
                <text
                  x={-8}
                  y={y + yScale.bandwidth() / 2 + 4}
                  textAnchor="end"
                  fontSize={12}
                  fill={palette.graphite900}
                >
                  {bar.label}
                </text>
                <text
                  x={barWidth + 6}
                  y={y + yScale.bandwidth() / 2 + 4}
                  fontSize={12}
                  fontWeight={600}
                  fill={palette.graphite900}
                >
                  {money(bar.value)}
                </text>
              </g>
            );
          })}
          <AxisBottom
            top={innerHeight}
            scale={xScale}
            numTicks={4}
            stroke={palette.graphite500}
            tickStroke={palette.graphite500}
            tickFormat={(value) => formatQuantity(Number(value), "", 0)}
            tickLabelProps={{
              fontSize: 11,
              fill: palette.graphite700,
              textAnchor: "middle",
            }}
          />
        </Group>
      </svg>
      <p id={summaryId} className="sr-only">
        {bars.map((bar) => `${bar.label}: ${money(bar.value)}.`).join(" ")}
      </p>
    </figure>
  );
}
