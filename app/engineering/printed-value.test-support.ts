/**
 * Test support: compare a computed value with a value printed to a few decimals,
 * e.g. "0.21952" in the brief. The tolerance is half a unit in the last printed digit
 * (the printed value is the computed one rounded), plus a little for floating point.
 */

import { expect } from "vitest";

/** Half a unit in the last digit of `printed` ("6.901" → 0.0005, "1361" → 0.5). */
export function halfUnitInLastPlace(printed: string): number {
  const decimals = printed.includes(".")
    ? (printed.split(".")[1] ?? "").length
    : 0;
  return 0.5 * 10 ** -decimals;
}

/** Asserts `actual` rounds to `printed`. */
export function expectMatchesPrinted(actual: number, printed: string): void {
  const tolerance = halfUnitInLastPlace(printed) * (1 + 1e-9) + 1e-12;
  expect(
    Math.abs(actual - Number(printed)),
    `${actual} should round to ${printed}`,
  ).toBeLessThanOrEqual(tolerance);
}

/** Asserts `actual` is within `relative` (e.g. 0.005 for ±0.5 %) of `expected`. */
export function expectWithinRelative(
  actual: number,
  expected: number,
  relative: number,
): void {
  expect(
    Math.abs(actual - expected) / Math.abs(expected),
    `${actual} should be within ${relative * 100} % of ${expected}`,
  ).toBeLessThanOrEqual(relative);
}
