/**
 * Spool weigh-back: how much wire a spool holds from its weights.
 *
 * net = gross − tare; length ≤ net / bare linear mass. Bare conductor mass gives an
 * upper bound on the length because the enamel adds mass (about 2 % at 1.0 mm grade 2,
 * about 5 % at 0.2 mm) (brief).
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";

/** Net wire mass on a spool, kg: gross − tare. Throws when the tare exceeds the gross. */
export function spoolNetMassKg(grossKg: number, tareKg: number): number {
  requireNonNegative(grossKg, "grossKg", "Gross mass");
  requireNonNegative(tareKg, "tareKg", "Tare");
  if (tareKg > grossKg) {
    throw new EngineeringInputError(
      "tareKg",
      "The tare cannot be more than the gross mass.",
    );
  }
  return grossKg - tareKg;
}

/**
 * Largest length of wire (m) that `netMassKg` of it can be, from the bare conductor's
 * linear mass (kg/m). The true enamelled length is a few per cent shorter.
 */
export function maxLengthFromMassM(
  netMassKg: number,
  bareLinearMassKgPerM: number,
): number {
  requireNonNegative(netMassKg, "netMassKg", "Net mass");
  requirePositive(bareLinearMassKgPerM, "linearMassKgPerM", "Linear mass");
  return netMassKg / bareLinearMassKgPerM;
}

/** Bare conductor mass (kg) of `lengthM` metres of wire with linear mass `bareLinearMassKgPerM` (kg/m). */
export function massFromLengthKg(
  lengthM: number,
  bareLinearMassKgPerM: number,
): number {
  requireNonNegative(lengthM, "lengthM", "Length");
  requirePositive(bareLinearMassKgPerM, "linearMassKgPerM", "Linear mass");
  return lengthM * bareLinearMassKgPerM;
}
