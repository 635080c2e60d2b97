/**
 * The geometry of the buying plan's per-item chart: the projected stock at the end of
 * each week without ordering anything more and with the plan's suggestions arriving,
 * the reorder point, the build orders' needs, the open orders' arrivals and the
 * suggested arrivals, one column per week. Pure: no I/O, no framework.
 */
import { roundStep, type ChartFrame } from "~/lib/chart-frame";

/** One week of an item's plan, as plan-json.ts gives it. */
export interface ProjectionWeek {
  weekStart: string;
  needed: number;
  arriving: number;
  suggested: number;
  projected: number;
  projectedWithSuggestion: number;
}

export interface ProjectionPoint {
  weekStart: string;
  /** Centre of the week's column. */
  x: number;
  /** Stock at the week's end if nothing more is ordered. */
  without: number;
  withoutY: number;
  /** Stock at the week's end with the suggestions so far arrived. */
  with: number;
  withY: number;
  needed: number;
  arriving: number;
  suggested: number;
}

export interface ProjectionChart {
  points: ProjectionPoint[];
  /** Value ticks, bottom up (negative values when the stock would run out). */
  valueTicks: { value: number; y: number }[];
  zeroY: number;
  /** Height of the reorder point line, null when the item has none. */
  reorderY: number | null;
  columnWidth: number;
}

const round = (value: number) => Math.round(value * 10) / 10;

/** Adds up in thousandths, so 0.1 + 0.2 stays 0.3. */
const exactSum = (a: number, b: number) =>
  Math.round(a * 1000 + b * 1000) / 1000;

export function projectionChart(
  weeks: readonly ProjectionWeek[],
  reorderPoint: number,
  frame: ChartFrame,
  wholeUnits = false,
): ProjectionChart | null {
  if (weeks.length === 0) return null;
  // Without ordering: take back every suggestion that arrived in this week or before.
  let suggestedSoFar = 0;
  const series = weeks.map((week) => {
    suggestedSoFar = exactSum(suggestedSoFar, week.suggested);
    return {
      week,
      without: exactSum(week.projectedWithSuggestion, -suggestedSoFar),
      with: week.projectedWithSuggestion,
    };
  });
  const values = series.flatMap((entry) => [entry.without, entry.with]);
  const highest = Math.max(reorderPoint, 0, ...values);
  const lowest = Math.min(0, ...values);
  const rawStep = roundStep(highest - lowest || 1);
  const step = wholeUnits ? Math.max(1, rawStep) : rawStep;
  const bottom = Math.floor(lowest / step) * step;
  const top = Math.max(step, Math.ceil(highest / step) * step);
  const plotBottom = frame.height - frame.bottom;
  const y = (value: number) =>
    round(
      plotBottom -
        ((value - bottom) / (top - bottom)) * (plotBottom - frame.top),
    );
  const plotWidth = frame.width - frame.left - frame.right;
  const columnWidth = plotWidth / weeks.length;
  const valueTicks: { value: number; y: number }[] = [];
  for (let value = bottom; value <= top + step / 2; value += step) {
    const tick = Math.round(value * 1e6) / 1e6;
    valueTicks.push({ value: tick, y: y(tick) });
  }
  return {
    points: series.map((entry, index) => ({
      weekStart: entry.week.weekStart,
      x: round(frame.left + columnWidth * (index + 0.5)),
      without: entry.without,
      withoutY: y(entry.without),
      with: entry.with,
      withY: y(entry.with),
      needed: entry.week.needed,
      arriving: entry.week.arriving,
      suggested: entry.week.suggested,
    })),
    valueTicks,
    zeroY: y(0),
    reorderY: reorderPoint > 0 ? y(reorderPoint) : null,
    columnWidth: round(columnWidth),
  };
}
