/**
 * First-order force and torque from conductors in a magnetic field.
 *
 * F = B · I · L with B perpendicular to I; torque sums F · r over the active conductors
 * only, because the end turns lie outside the field (brief). L is the active conductor
 * length, e.g. a coil's `forceLengthM` from coil-estimate. Magnitudes: every input is a
 * finite number of zero or more, else {@link EngineeringInputError} names it.
 */

import { requireNonNegative } from "./errors";

/** Force on conductors of active length `activeLengthM` (m) carrying `currentA` (A) in `fluxDensityT` (T), N. */
export function conductorForceN(
  fluxDensityT: number,
  currentA: number,
  activeLengthM: number,
): number {
  requireNonNegative(fluxDensityT, "fluxDensityT", "Flux density");
  requireNonNegative(currentA, "currentA", "Current");
  requireNonNegative(activeLengthM, "activeLengthM", "Active length");
  return fluxDensityT * currentA * activeLengthM;
}

/** Torque of a tangential force `forceN` (N) acting at radius `radiusM` (m), N·m. */
export function torqueNm(forceN: number, radiusM: number): number {
  requireNonNegative(forceN, "forceN", "Force");
  requireNonNegative(radiusM, "radiusM", "Radius");
  return forceN * radiusM;
}
