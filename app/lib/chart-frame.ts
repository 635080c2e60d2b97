/**
 * What the item page's charts (on hand, price history) share: the frame a chart is
 * drawn in and the round value step of its axis. Pure: no I/O, no framework.
 */

/** A chart's size and the margins around its plot, in px. */
export interface ChartFrame {
  width: number;
  height: number;
  left: number;
  right: number;
  top: number;
  bottom: number;
}

/** A round step (1, 2 or 5 × 10ⁿ) that cuts 0…max into at most `maxTicks` steps. */
export function roundStep(max: number, maxTicks = 5): number {
  if (!(max > 0)) return 1;
  const rough = max / maxTicks;
  const power = 10 ** Math.floor(Math.log10(rough));
  for (const factor of [1, 2, 5, 10]) {
    if (factor * power >= rough) return factor * power;
  }
  return 10 * power;
}
