/**
 * The geometry of the item page's on-hand chart: a step line of the on-hand
 * quantity after each movement, from the first movement shown to now, with
 * round-numbered value ticks. Pure: no I/O, no framework.
 */
import { roundStep, type ChartFrame } from "~/lib/chart-frame";

export interface OnHandPoint {
  /** ISO time of the movement. */
  at: string;
  /** Item on hand after it. */
  onHand: number;
}

export interface OnHandChart {
  /** SVG path of the step line. */
  path: string;
  /** Value ticks, bottom up. */
  valueTicks: { value: number; y: number }[];
  /** Time ticks: the start of the axis, the middle, now. */
  timeTicks: { at: string; x: number }[];
  /** True when the axis spans two days or less, so ticks are better read as times of day. */
  withinTwoDays: boolean;
  /** Height of the reorder point line, null when none is set. */
  reorderY: number | null;
  /** Where each movement's point is drawn. */
  markers: { x: number; y: number }[];
}

const round = (value: number) => Math.round(value * 10) / 10;

/** The shortest time axis: a few movements within minutes still read as a line, not a spike. */
const shortestSpanMs = 3_600_000;

/**
 * The chart from the first movement shown to now. The axis always ends at
 * now and spans at least an hour, so recent movements sit at the right.
 */
export function onHandChart(
  points: readonly OnHandPoint[],
  now: string,
  reorderPoint: number,
  frame: ChartFrame,
  /** Counted in whole units (pieces): ticks fall on whole numbers only. */
  wholeUnits = false,
): OnHandChart | null {
  if (points.length === 0) return null;
  const end = Math.max(
    Date.parse(now),
    Date.parse(points[points.length - 1]!.at),
  );
  const start = Math.min(Date.parse(points[0]!.at), end - shortestSpanMs);
  const span = end - start;
  const highest = Math.max(
    reorderPoint,
    ...points.map((point) => point.onHand),
  );
  const step = wholeUnits
    ? Math.max(1, roundStep(highest))
    : roundStep(highest);
  const top = Math.max(step, Math.ceil(highest / step) * step);

  const plotWidth = frame.width - frame.left - frame.right;
  const plotHeight = frame.height - frame.top - frame.bottom;
  const x = (time: number) =>
    round(frame.left + ((time - start) / span) * plotWidth);
  const y = (value: number) =>
    round(frame.top + plotHeight - (value / top) * plotHeight);

  const markers = points.map((point) => ({
    x: x(Date.parse(point.at)),
    y: y(point.onHand),
  }));
  let path = `M${markers[0]!.x},${markers[0]!.y}`;
  for (let index = 1; index < markers.length; index += 1) {
    path += ` H${markers[index]!.x} V${markers[index]!.y}`;
  }
  path += ` H${x(end)}`;

  const valueTicks: { value: number; y: number }[] = [];
  for (let value = 0; value <= top + step / 2; value += step) {
    const rounded = Number(value.toPrecision(12));
    valueTicks.push({ value: rounded, y: y(rounded) });
  }
  const middle = start + span / 2;
  return {
    path,
    valueTicks,
    timeTicks: [
      { at: new Date(start).toISOString(), x: x(start) },
      { at: new Date(middle).toISOString(), x: x(middle) },
      { at: new Date(end).toISOString(), x: x(end) },
    ],
    withinTwoDays: span <= 2 * 86_400_000,
    reorderY: reorderPoint > 0 ? y(reorderPoint) : null,
    markers,
  };
}
