/**
 * The figures and geometry of the cost-per-N·m chart, worked out from its rows alone (no
 * React, no scales): which rows have a bar, the texts at the end of each bar, the frame
 * (the right margin holds the longest total, a long name widens the chart) and the
 * sentence that reads the chart to a screen reader.
 */
import type { SplitFigures, SplitKey } from "~/insight/design-insight";
import { estimatedTextWidth, widestText } from "~/insight/chart-labels";
import { formatQuantity } from "~/lib/format";

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

/** A row with a bar: split and cost per N·m both known. */
export type ChartedRow = CostChartRow & {
  splitPerNm: SplitFigures;
  costPerNm: number;
};

/** The chart's usual width; it grows only for a name longer than a whole row. */
const usualWidth = 600;
/** Each design's row: its whole name on a line of its own, its bar below it. */
export const nameHeight = 16;
export const barHeight = 20;
export const rowHeight = nameHeight + barHeight + 12;
const marginTop = 4;
const marginBottom = 44;
/** Room for half of the first tick label ("0.00"), centred on the axis start. */
const marginLeft = 18;
const gap = 8;

/** The notes under a total, in the order the chart may write them. */
export const incompleteNote = "incomplete: lines unpriced";
export const estimatedNote = "estimated torque";

/** "11.75 EUR/N·m". */
export function perNmText(value: number, currency: string): string {
  return formatQuantity(value, `${currency}/N·m`, 2);
}

/** The rows that get a bar. */
export function chartedRows(rows: readonly CostChartRow[]): ChartedRow[] {
  return rows.filter(
    (row): row is ChartedRow =>
      row.splitPerNm !== null && row.costPerNm !== null,
  );
}

/** The total at the end of a row's bar. */
export function costValueText(row: CostChartRow, currency: string): string {
  return row.costPerNm === null
    ? "no rated torque"
    : perNmText(row.costPerNm, currency);
}

export function costAxisLabel(currency: string, basis: string): string {
  return `${currency} per N·m, at the ${basis}`;
}

/** The chart's size and margins for these rows. */
export function costChartFrame(
  rows: readonly CostChartRow[],
  currency: string,
  basis: string,
) {
  // Each total (and its note) at the end of its bar, in the right margin at the longest.
  const margin = {
    top: marginTop,
    bottom: marginBottom,
    left: marginLeft,
    right: Math.ceil(
      Math.max(
        widestText(
          rows.map((row) => costValueText(row, currency)),
          12,
          { bold: true },
        ),
        widestText([incompleteNote, estimatedNote], 10),
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
      estimatedTextWidth(costAxisLabel(currency, basis), 11) +
        margin.left +
        gap,
    ),
  );
  const count = Math.max(rows.length, 1);
  const innerHeight = rowHeight * count;
  return {
    margin,
    width,
    innerWidth: width - margin.left - margin.right,
    count,
    innerHeight,
    height: margin.top + margin.bottom + innerHeight,
  };
}

/** The chart read out: each charted design's cost per N·m and its parts. */
export function costChartSummary(
  charted: readonly ChartedRow[],
  currency: string,
  parts: readonly { key: SplitKey; label: string }[],
): string {
  return charted.length === 0
    ? "No design has a cost per N·m yet."
    : charted
        .map(
          (row) =>
            `${row.label}: ${perNmText(row.costPerNm, currency)}, of which ${parts
              .map(
                (part) =>
                  `${part.label.toLowerCase()} ${perNmText(row.splitPerNm[part.key], currency)}`,
              )
              .join(", ")}.`,
        )
        .join(" ");
}
