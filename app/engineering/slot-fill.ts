/**
 * Slot fill factor (net copper): k = N · strands · A_bare / A_slot (brief).
 *
 * Reference levels:
 * - random-wound round wire: 0.35–0.45; linear winding on segmented teeth 0.5–0.65;
 *   hairpin 0.65–0.75 (common practice, brief)
 * - geometric limits for round conductors: square packing π/4 = 0.785 and hexagonal
 *   packing π/√12 = 0.9069 (brief). These count bare conductor only; with enamel and
 *   slot liner the real limits are lower still.
 */

import { requirePositive } from "./errors";

/** Upper end of what random-wound round wire reaches in production (common practice). */
export const RANDOM_ROUND_WIRE_FILL_LIMIT = 0.45;
/** Round conductors in square (layer-on-layer) packing: π/4. */
export const SQUARE_PACKING_FILL_LIMIT = Math.PI / 4;
/** Round conductors in hexagonal (orthocyclic) packing, the densest possible: π/√12. */
export const HEXAGONAL_PACKING_FILL_LIMIT = Math.PI / Math.sqrt(12);

export type SlotFillWarningCode =
  | "above-random-round-wire-practice"
  | "above-square-packing-limit"
  | "above-hexagonal-packing-limit";

export interface SlotFillWarning {
  code: SlotFillWarningCode;
  /** The limit passed, as a fill factor (0–1). */
  limit: number;
  message: string;
}

export interface SlotFill {
  /** Net conductor fill factor, 0–1 (can exceed 1 for impossible input). */
  fillFactor: number;
  /** The most serious limit passed, or null. */
  fillWarning: SlotFillWarning | null;
}

/** k = turns · strands · bare strand area / slot area (all areas in mm²). */
export function slotFillFactor(input: {
  turns: number;
  strandsInHand?: number;
  bareAreaMm2: number;
  slotAreaMm2: number;
}): number {
  requirePositive(input.slotAreaMm2, "slotAreaMm2", "Slot area");
  return (
    (input.turns * (input.strandsInHand ?? 1) * input.bareAreaMm2) /
    input.slotAreaMm2
  );
}

/** The most serious fill warning for fill factor `fillFactor`, or null when none applies. */
export function slotFillWarning(fillFactor: number): SlotFillWarning | null {
  if (fillFactor > HEXAGONAL_PACKING_FILL_LIMIT) {
    return {
      code: "above-hexagonal-packing-limit",
      limit: HEXAGONAL_PACKING_FILL_LIMIT,
      message: `Fill factor ${fillFactor.toFixed(3)} is above π/√12 = 0.907, the densest packing of round conductors: this winding cannot fit the slot.`,
    };
  }
  if (fillFactor > SQUARE_PACKING_FILL_LIMIT) {
    return {
      code: "above-square-packing-limit",
      limit: SQUARE_PACKING_FILL_LIMIT,
      message: `Fill factor ${fillFactor.toFixed(3)} is above π/4 = 0.785, the limit for round conductors stacked in square layers; only perfect hexagonal packing could reach it.`,
    };
  }
  if (fillFactor > RANDOM_ROUND_WIRE_FILL_LIMIT) {
    return {
      code: "above-random-round-wire-practice",
      limit: RANDOM_ROUND_WIRE_FILL_LIMIT,
      message: `Fill factor ${fillFactor.toFixed(3)} is above the 0.35–0.45 usual for random-wound round wire; it needs linear winding on segmented teeth (0.5–0.65) or hairpins (0.65–0.75).`,
    };
  }
  return null;
}

/** Fill factor of a slot with its warning (see {@link slotFillFactor}). */
export function assessSlotFill(input: {
  turns: number;
  strandsInHand?: number;
  bareAreaMm2: number;
  slotAreaMm2: number;
}): SlotFill {
  const fillFactor = slotFillFactor(input);
  return { fillFactor, fillWarning: slotFillWarning(fillFactor) };
}
