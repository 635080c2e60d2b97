/**
 * Cost per N·m of each released design as a stacked bar, one bar per design, stacked by
 * where the money goes (active copper, end-turn copper, leads and scrap, magnets, other
 * parts). Drawn with visx (@visx/shape BarStackHorizontal, @visx/scale, @visx/axis,
 * @visx/grid, @visx/pattern), which renders plain SVG on the server, so the chart is in
 * the page before any script runs and hydrates without change. Each part has a pattern
 * as well as a colour; the total is written at the end of each bar, and every figure is
 * in the table beside the chart.
 */
import { AxisBottom } from "@visx/axis";
import { GridColumns } from "@visx/grid";
import { Group } from "@visx/group";
import { scaleBand, scaleLinear } from "@visx/scale";
import { BarStackHorizontal } from "@visx/shape";
import { useId } from "react";
import {
  splitKeys,
  type SplitFigures,
  type SplitKey,
} from "~/insight/design-insight";
import { estimatedTextWidth, widestText } from "~/insight/chart-labels";
import { formatQuantity } from "~/lib/format";
import {
  fillOf,
  palette,
  PatternDefs,
  PatternLegend,
  splitParts,
  usePatternPrefix,
} from "../insight-patterns";

export interface CostChartRow {
  key: string;
  /** "Hub motor · rev 2" */
  label: string;
  costPerNm: number | null;
  splitPerNm: SplitFigures | null;
  complete: boolean;
  /** Per N·m of the first-order torque estimate (no rated torque given). */
  estimated?: boolean;
}

type StackDatum = Record<SplitKey, number> & { key: string };

/** The chart's usual width; it grows only for a name longer than a whole row. */
const usualWidth = 600;
/** Each design's row: its whole name on a line of its own, its bar below it. */
const nameHeight = 16;
const barHeight = 20;
const rowHeight = nameHeight + barHeight + 12;
const marginTop = 4;
const marginBottom = 44;
/** Room for half of the first tick label ("0.00"), centred on the axis start. */
const marginLeft = 18;
const gap = 8;

export function InsightCostChart({
  rows,
  currency,
  basis,
}: {
  rows: CostChartRow[];
  currency: string;
  /** The price basis as words: "best current supplier price". */
  basis: string;
}) {
  const prefix = usePatternPrefix();
  const summaryId = useId();
  const perNm = (value: number) => formatQuantity(value, `${currency}/N·m`, 2);
  const charted = rows.filter(
    (
      row,
    ): row is CostChartRow & { splitPerNm: SplitFigures; costPerNm: number } =>
      row.splitPerNm !== null && row.costPerNm !== null,
  );
  const valueText = (row: CostChartRow) =>
    row.costPerNm === null ? "no rated torque" : perNm(row.costPerNm);
  const axisLabel = `${currency} per N·m, at the ${basis}`;
  // Each total (and its note) at the end of its bar, in the right margin at the longest.
  const margin = {
    top: marginTop,
    bottom: marginBottom,
    left: marginLeft,
    right: Math.ceil(
      Math.max(
        widestText(rows.map(valueText), 12, { bold: true }),
        widestText(["incomplete: lines unpriced", "estimated torque"], 10),
      ) + gap,
    ),
  };
  // Names run across the whole row; a name longer than that widens the chart.
  const width = Math.ceil(
    Math.max(
      usualWidth,
      margin.left +
        widestText(
          rows.map((row) => row.label),
          11,
        ) +
        gap,
      estimatedTextWidth(axisLabel, 11) + margin.left + gap,
    ),
  );
  const innerWidth = width - margin.left - margin.right;
  const count = Math.max(rows.length, 1);
  const innerHeight = rowHeight * count;
  const height = margin.top + margin.bottom + innerHeight;
  const largest = Math.max(0, ...charted.map((row) => row.costPerNm));
  const xScale = scaleLinear<number>({
    domain: [0, largest > 0 ? largest : 1],
    range: [0, innerWidth],
    nice: true,
  });
  // Bars one row apart, each below its name: a band scale whose step is a row.
  const yScale = scaleBand<string>({
    domain: rows.map((row) => row.key),
    range: [0, rowHeight * count - (rowHeight - barHeight)],
    paddingInner: (rowHeight - barHeight) / rowHeight,
    paddingOuter: 0,
  });
  const barTop = (key: string) => nameHeight + (yScale(key) ?? 0);
  const data: StackDatum[] = charted.map((row) => ({
    key: row.key,
    ...row.splitPerNm,
  }));

  return (
    <figure className="space-y-2">
      <div className="overflow-x-auto [contain:inline-size]">
        <svg
          viewBox={`0 0 ${width} ${height}`}
          role="img"
          aria-label={`Cost per N·m by design, stacked by part, in ${currency} per N·m`}
          aria-describedby={summaryId}
          style={{ maxWidth: width }}
          className="h-auto w-full min-w-[30rem] text-graphite-700 tabular-nums print:[print-color-adjust:exact]"
        >
          <PatternDefs prefix={prefix} parts={splitParts} />
          <Group left={margin.left} top={margin.top}>
            <GridColumns
              scale={xScale}
              height={innerHeight}
              numTicks={5}
              stroke="currentColor"
              strokeOpacity={0.14}
            />
            <Group top={nameHeight}>
              <BarStackHorizontal<StackDatum, SplitKey>
                data={data}
                keys={[...splitKeys]}
                y={(datum) => datum.key}
                xScale={xScale}
                yScale={yScale}
                color={(key) =>
                  fillOf(
                    prefix,
                    splitParts.find((part) => part.key === key)!,
                  )
                }
              >
                {(stacks) =>
                  stacks.map((stack) =>
                    stack.bars.map((bar) =>
                      bar.width > 0 ? (
                        <rect
                          key={`${stack.key}-${bar.bar.data.key}`}
                          x={bar.x}
                          y={bar.y}
                          width={bar.width}
                          height={bar.height}
                          fill={bar.color}
                          stroke={palette.sheet}
                          strokeWidth={1}
                        >
                          <title>{`${splitParts.find((part) => part.key === stack.key)!.label}: ${perNm(bar.bar.data[stack.key])}`}</title>
                        </rect>
                      ) : null,
                    ),
                  )
                }
              </BarStackHorizontal>
            </Group>
            {rows.map((row) => {
              const y = barTop(row.key) + yScale.bandwidth() / 2;
              const end =
                row.costPerNm !== null && row.splitPerNm !== null
                  ? xScale(row.costPerNm)
                  : 0;
              return (
                <g key={row.key}>
                  <text
                    x={0}
                    y={barTop(row.key) - 5}
                    fontSize={11}
                    fill={palette.graphite900}
                  >
                    {row.label}
                  </text>
                  <text
                    x={end + 6}
                    y={y + (row.complete && !row.estimated ? 4 : -1)}
                    fontSize={12}
                    fontWeight={600}
                    fill={palette.graphite900}
                  >
                    {valueText(row)}
                  </text>
                  {row.costPerNm !== null && !row.complete ? (
                    <text
                      x={end + 6}
                      y={y + 11}
                      fontSize={10}
                      fill={palette.caution}
                    >
                      incomplete: lines unpriced
                    </text>
                  ) : row.costPerNm !== null && row.estimated ? (
                    <text
                      x={end + 6}
                      y={y + 11}
                      fontSize={10}
                      fill={palette.graphite700}
                    >
                      estimated torque
                    </text>
                  ) : null}
                </g>
              );
            })}
            <AxisBottom
              top={innerHeight}
              scale={xScale}
              numTicks={5}
              stroke={palette.graphite500}
              tickStroke={palette.graphite500}
              tickFormat={(value) => formatQuantity(Number(value), "", 2)}
              tickLabelProps={{
                fontSize: 11,
                fill: palette.graphite700,
                textAnchor: "middle",
              }}
              label={axisLabel}
              labelProps={{
                fontSize: 11,
                fill: palette.graphite700,
                textAnchor: "middle",
              }}
            />
          </Group>
        </svg>
      </div>
      <p id={summaryId} className="sr-only">
        {charted.length === 0
          ? "No design has a cost per N·m yet."
          : charted
              .map(
                (row) =>
                  `${row.label}: ${perNm(row.costPerNm)}, of which ${splitParts
                    .map(
                      (part) =>
                        `${part.label.toLowerCase()} ${perNm(row.splitPerNm[part.key])}`,
                    )
                    .join(", ")}.`,
              )
              .join(" ")}
      </p>
      <figcaption>
        <PatternLegend parts={splitParts} label="Parts of the cost" />
      </figcaption>
    </figure>
  );
}
