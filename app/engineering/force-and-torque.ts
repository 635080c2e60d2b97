/**
 * First-order force and torque from conductors in a magnetic field.
 *
 * F = B · I · L with B perpendicular to I; torque sums F · r over the active conductors
 * only, because the end turns lie outside the field (brief). L is the active conductor
 * length, e.g. a coil's `forceLengthM` from coil-estimate.
 */

/** Force on conductors of active length `activeLengthM` (m) carrying `currentA` (A) in `fluxDensityT` (T), N. */
export function conductorForceN(
  fluxDensityT: number,
  currentA: number,
  activeLengthM: number,
): number {
  return fluxDensityT * currentA * activeLengthM;
}

/** Torque of a tangential force `forceN` (N) acting at radius `radiusM` (m), N·m. */
export function torqueNm(forceN: number, radiusM: number): number {
  return forceN * radiusM;
}
