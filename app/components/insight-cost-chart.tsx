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
import { formatQuantity } from "~/lib/format";
import {
  fillOf,
  palette,
  PatternDefs,
  PatternLegend,
  splitParts,
  usePatternPrefix,
} from "./insight-patterns";

export interface CostChartRow {
  key: string;
  /** "Hub motor · rev 2" */
  label: string;
  costPerNm: number | null;
  splitPerNm: SplitFigures | null;
  complete: boolean;
}

type StackDatum = Record<SplitKey, number> & { key: string };

const width = 600;
const rowHeight = 34;
const margin = { top: 8, right: 136, bottom: 44, left: 168 };
const labelCharacters = 22;

function shortLabel(label: string): string {
  return label.length > labelCharacters
    ? `${label.slice(0, labelCharacters - 1)}…`
    : label;
}

export function InsightCostChart({
  rows,
  currency,
}: {
  rows: CostChartRow[];
  currency: string;
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
  const height =
    margin.top + margin.bottom + rowHeight * Math.max(rows.length, 1);
  const innerWidth = width - margin.left - margin.right;
  const innerHeight = height - margin.top - margin.bottom;
  const largest = Math.max(0, ...charted.map((row) => row.costPerNm));
  const xScale = scaleLinear<number>({
    domain: [0, largest > 0 ? largest : 1],
    range: [0, innerWidth],
    nice: true,
  });
  const yScale = scaleBand<string>({
    domain: rows.map((row) => row.key),
    range: [0, innerHeight],
    padding: 0.28,
  });
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
          className="h-auto w-full max-w-[600px] min-w-[30rem] text-graphite-700 tabular-nums print:[print-color-adjust:exact]"
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
            {rows.map((row) => {
              const y = (yScale(row.key) ?? 0) + yScale.bandwidth() / 2;
              const end =
                row.costPerNm !== null && row.splitPerNm !== null
                  ? xScale(row.costPerNm)
                  : 0;
              return (
                <g key={row.key}>
                  <text
                    x={-8}
                    y={y + 4}
                    textAnchor="end"
                    fontSize={11}
                    fill={palette.graphite900}
                  >
                    <title>{row.label}</title>
                    {shortLabel(row.label)}
                  </text>
                  <text
                    x={end + 6}
                    y={y + (row.complete ? 4 : -1)}
                    fontSize={12}
                    fontWeight={600}
                    fill={palette.graphite900}
                  >
                    {row.costPerNm === null
                      ? "no rated torque"
                      : perNm(row.costPerNm)}
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
              label={`${currency} per N·m of rated torque`}
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
