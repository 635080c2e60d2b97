/**
 * The geometry of the insight's trend chart, worked out from its series alone (no React,
 * no scales): the frame (the right margin grows to hold each series' whole name, wrapped),
 * the span of dates and the highest value the scales cover, where each line ends and
 * where its name goes so that names of neighbouring lines do not overlap.
 */
import { widestText, wrapLabel } from "~/insight/chart-labels";
import { labelSpacing, spreadLabels } from "~/pricing/price-history-chart";

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
export const nameLineHeight = 12;
/** Series with at most this many points have each point's value written beside it. */
const fewPoints = 3;

/** The chart's size and margins, and each series' name as the lines it wraps to. */
export function trendChartFrame(series: readonly TrendSeries[]) {
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
  return {
    names,
    nameLines,
    margin,
    width: margin.left + innerWidth + margin.right,
    height,
    innerWidth,
    innerHeight: height - margin.top - margin.bottom,
  };
}

/** The first and the last date of all series ("2000-01-01" for both without any). */
export function trendDateSpan(series: readonly TrendSeries[]): {
  first: string;
  last: string;
} {
  const dates = series.flatMap((entry) =>
    entry.points.map((point) => point.date),
  );
  const first = dates.reduce(
    (a, b) => (b < a ? b : a),
    dates[0] ?? "2000-01-01",
  );
  const last = dates.reduce(
    (a, b) => (b > a ? b : a),
    dates[0] ?? "2000-01-01",
  );
  return { first, last };
}

/** The highest value of all series, and never below 0. */
export function trendHighest(series: readonly TrendSeries[]): number {
  const values = series.flatMap((entry) =>
    entry.points.flatMap((point) =>
      point.value === null ? [] : [point.value],
    ),
  );
  return Math.max(0, ...values);
}

/** The last value of a series, or null when it has none. */
export function lastValue(points: TrendSeries["points"]): number | null {
  const lastPoint = [...points].reverse().find((point) => point.value !== null);
  return lastPoint ? lastPoint.value : null;
}

/**
 * Where each series' name goes (its first line's y), from where each line ends (null for
 * a series without a value): spread apart by at least the height of the longest name.
 */
export function trendNameYs(
  ends: readonly (number | null)[],
  nameLines: number,
  innerHeight: number,
): (number | null)[] {
  // Names of several lines need more room between them than the shared spacing gives.
  const spread =
    Math.max(labelSpacing, nameLines * nameLineHeight + 2) / labelSpacing;
  return spreadLabels(
    ends.map((end) => (end === null ? null : end / spread)),
    0,
    Math.max(0, innerHeight - (nameLines - 1) * nameLineHeight) / spread,
  ).map((labelY) => (labelY === null ? null : labelY * spread));
}

/** Whether a series has few enough valued points to write each one's value beside it. */
export function writesPointValues(points: TrendSeries["points"]): boolean {
  return points.filter((point) => point.value !== null).length <= fewPoints;
}
