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
import { useId } from "react";
import { formatQuantity } from "~/lib/format";
import {
  palette,
  PatternDefs,
  PatternLegend,
  splitParts,
  usePatternPrefix,
} from "../insight-patterns";
import { CostChartBars } from "./cost-chart-bars";
import {
  barHeight,
  chartedRows,
  costAxisLabel,
  costChartFrame,
  costChartSummary,
  type CostChartRow,
  nameHeight,
  rowHeight,
} from "./cost-chart-layout";
import { CostChartRowText } from "./cost-chart-row-text";

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
  const charted = chartedRows(rows);
  const { margin, width, innerWidth, count, innerHeight, height } =
    costChartFrame(rows, currency, basis);
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
              <CostChartBars
                charted={charted}
                xScale={xScale}
                yScale={yScale}
                prefix={prefix}
                currency={currency}
              />
            </Group>
            {rows.map((row) => (
              <CostChartRowText
                key={row.key}
                row={row}
                currency={currency}
                barTop={barTop(row.key)}
                barMiddle={barTop(row.key) + yScale.bandwidth() / 2}
                end={
                  row.costPerNm !== null && row.splitPerNm !== null
                    ? xScale(row.costPerNm)
                    : 0
                }
              />
            ))}
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
              label={costAxisLabel(currency, basis)}
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
        {costChartSummary(charted, currency, splitParts)}
      </p>
      <figcaption>
        <PatternLegend parts={splitParts} label="Parts of the cost" />
      </figcaption>
    </figure>
  );
}
