/**
 * The range check of a coil estimate's input, run first by `estimateCoil` and
 * `conductorSplit`. The API's schema refuses the same values with its own words; this
 * check is what keeps the pure functions from turning nonsense (turns −5, strands 0, a
 * NaN temperature) into negative masses or Infinity when they are called directly.
 *
 * Each refusal is an {@link EngineeringInputError} whose `field` is the API's input path
 * ("turns", "strandsInHand", "wire.diameterMm" …). The wire itself is checked by the
 * conductor module (round sizes in wire-geometry, litz and flat wire in their modules),
 * the conductor in reference-data.
 */

import { formatNumber } from "~/lib/format";
import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
  requireWholeNumber,
  requireWithin,
} from "./errors";
import type { CoilEstimateInput } from "./coil-estimate";
import { conductorMaterial } from "./reference-data";
import { CONDUCTOR_TEMPERATURE_RANGE_C } from "./wire-geometry";
import { coilConductor } from "./coil-conductor";

/** Upper bounds past which a value is a typing mistake, not a coil (the same as the API's). */
const MAX_TURNS = 100_000;
const MAX_STRANDS = 1_000;
const MAX_COILS = 100_000;
const MAX_LENGTH_MM = 100_000;

function requireLength(
  value: number | undefined,
  field: string,
  label: string,
  allowZero: boolean,
): void {
  if (value === undefined) return;
  if (allowZero) requireNonNegative(value, field, label);
  else requirePositive(value, field, label);
  if (value > MAX_LENGTH_MM) {
    throw new EngineeringInputError(
      field,
      `${label} must be at most 100 m (100,000 mm).`,
    );
  }
}

function requireWholeAtMost(
  value: number | undefined,
  field: string,
  label: string,
  max: number,
): void {
  if (value === undefined) return;
  requireWholeNumber(value, field, label);
  if (value > max) {
    throw new EngineeringInputError(
      field,
      `${label} must be at most ${formatNumber(max)}.`,
    );
  }
}

/** Throws {@link EngineeringInputError} naming the first field of `input` that no coil can have. */
export function assertCoilEstimateInput(input: CoilEstimateInput): void {
  conductorMaterial(input.conductor);
  if (!input.wire) {
    throw new EngineeringInputError(
      "wire.standard",
      'Give the wire: "AWG", "IEC", "litz" or "rectangular".',
    );
  }
  // Round, litz and flat wire alike: the conductor module checks each form's sizes.
  coilConductor(input.wire, input.insulation);
  if (input.turns === undefined) {
    throw new EngineeringInputError("turns", "Give the turns per coil.");
  }
  requireWholeAtMost(input.turns, "turns", "Turns", MAX_TURNS);
  requireWholeAtMost(
    input.strandsInHand,
    "strandsInHand",
    "Strands in hand",
    MAX_STRANDS,
  );
  if (input.activeLengthMm === undefined) {
    throw new EngineeringInputError(
      "activeLengthMm",
      "Give the active length.",
    );
  }
  requireLength(input.activeLengthMm, "activeLengthMm", "Active length", false);
  if (input.endTurnLengthMm === undefined) {
    throw new EngineeringInputError(
      "endTurnLengthMm",
      "Give the end-turn length.",
    );
  }
  requireLength(
    input.endTurnLengthMm,
    "endTurnLengthMm",
    "End-turn length",
    true,
  );
  requireLength(input.leadLengthMm, "leadLengthMm", "Lead length", true);
  requireWholeAtMost(input.coilCount, "coilCount", "Coil count", MAX_COILS);
  if (input.temperatureC !== undefined) {
    requireWithin(
      input.temperatureC,
      "temperatureC",
      "The conductor temperature",
      CONDUCTOR_TEMPERATURE_RANGE_C.min,
      CONDUCTOR_TEMPERATURE_RANGE_C.max,
      "°C",
    );
  }
  if (input.scrapPercent !== undefined) {
    requireWithin(input.scrapPercent, "scrapPercent", "Scrap", 0, 100, "%");
  }
  if (input.currentA !== undefined && input.currentA !== null) {
    requireNonNegative(input.currentA, "currentA", "The current");
  }
}
