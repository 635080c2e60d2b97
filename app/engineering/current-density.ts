/**
 * Current density in a coil's conductor, J = I / (strands in hand × conductor area), A/mm²,
 * and the ranges a coil's cooling usually carries.
 *
 * The ranges are COMMON PRACTICE, FROM MEMORY (no published source was checked): about 5–6
 * A/mm² in an enclosed coil with natural cooling, about 10 A/mm² fan-cooled; beyond that
 * only with liquid cooling or for short duty.
 */

import { requireNonNegative, requirePositive } from "./errors";

/** A/mm² a coil's cooling usually carries (common practice, from memory; see the module comment). */
export const currentDensityPractice = {
  naturalCoolingAPerMm2: 6,
  fanCooledAPerMm2: 10,
} as const;

/** The cooling a current density usually needs, by the common-practice ranges above. */
export type CoolingPractice = "natural" | "fan" | "liquid-or-short-duty";

/**
 * J = I / (strands × area), A/mm². `currentA` is the current through the coil's terminals,
 * shared by its strands in hand; `conductorAreaMm2` is one strand's copper (for litz wire,
 * the copper of all its strands).
 */
export function currentDensityAPerMm2(
  currentA: number,
  strandsInHand: number,
  conductorAreaMm2: number,
): number {
  requireNonNegative(currentA, "currentA", "The current");
  requirePositive(strandsInHand, "strandsInHand", "Strands in hand");
  requirePositive(conductorAreaMm2, "wire", "The conductor area");
  return currentA / (strandsInHand * conductorAreaMm2);
}

/** Which cooling the density usually needs (common practice, from memory). */
export function coolingPracticeFor(densityAPerMm2: number): CoolingPractice {
  if (densityAPerMm2 <= currentDensityPractice.naturalCoolingAPerMm2)
    return "natural";
  if (densityAPerMm2 <= currentDensityPractice.fanCooledAPerMm2) return "fan";
  return "liquid-or-short-duty";
}
