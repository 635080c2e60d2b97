/**
 * First-order estimates of the end-turn length l_end: the length of ONE end connection
 * (per end) of a coil, in mm, as used by MLT = 2 · l_active + 2 · l_end.
 *
 * Two published estimates (brief):
 *
 * 1. From the tooth geometry (Bianchi, Bolognani and Frare, IEEE Trans. Energy
 *    Conversion, 2006):
 *      tooth (concentrated) coil   l_end ≈ (π/4) · (τ_u + w_t)
 *      distributed coil            l_end ≈ (π/4) · (τ_u + w_t) + τ_u · K_ov · (y − 1), K_ov ≈ 1.8
 *    where τ_u is the slot pitch (mm, the arc from one slot centre to the next where the
 *    coil sides lie), w_t the tooth width (mm) and y the coil throw in slot pitches
 *    (y = 1 for a coil around one tooth). (π/4)(τ_u + w_t) is half a circle whose
 *    diameter, (τ_u + w_t)/2, is the distance between the middles of the coil's two sides
 *    around one tooth.
 *
 * 2. From the slot pitch alone (Magnussen and Sadarangani, IEMDC 2003):
 *      l_end ≈ k_c · τ_s, τ_s = 2πr/Q
 *    with r the radius where the slot pitch is taken (mm) and Q the number of slots;
 *    k_c = (π/2) · y for a distributed winding, 1.36 for a single-layer tooth-coil
 *    winding and 0.93 for a double-layer tooth-coil winding.
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";

/** End-winding overhang factor K_ov (Bianchi 2006). */
export const BIANCHI_OVERHANG_FACTOR = 1.8;

/** k_c for tooth-coil windings (Magnussen and Sadarangani, IEMDC 2003). */
export const SINGLE_LAYER_TOOTH_COIL_FACTOR = 1.36;
export const DOUBLE_LAYER_TOOTH_COIL_FACTOR = 0.93;

function requireCoilThrow(coilThrowSlots: number): void {
  if (!Number.isInteger(coilThrowSlots) || coilThrowSlots < 1) {
    throw new EngineeringInputError(
      "coilThrowSlots",
      "Coil throw must be a whole number of slot pitches, at least 1.",
    );
  }
}

/**
 * End-turn length per end, mm, from the tooth geometry (Bianchi 2006).
 * `coilThrowSlots` 1 (default) is a tooth coil; larger is a distributed coil.
 */
export function endTurnLengthFromToothMm(input: {
  /** Slot pitch τ_u, mm. */
  slotPitchMm: number;
  /** Tooth width w_t, mm. */
  toothWidthMm: number;
  /** Coil throw y, slot pitches (integer ≥ 1); default 1. */
  coilThrowSlots?: number;
  /** Overhang factor K_ov; default 1.8. */
  overhangFactor?: number;
}): number {
  const coilThrow = input.coilThrowSlots ?? 1;
  const overhangFactor = input.overhangFactor ?? BIANCHI_OVERHANG_FACTOR;
  requirePositive(input.slotPitchMm, "slotPitchMm", "Slot pitch");
  requireNonNegative(input.toothWidthMm, "toothWidthMm", "Tooth width");
  // τ_u = tooth width + slot width at the same radius: a tooth as wide as the pitch
  // leaves no slot for the coil sides.
  if (input.toothWidthMm >= input.slotPitchMm) {
    throw new EngineeringInputError(
      "toothWidthMm",
      `A tooth ${input.toothWidthMm} mm wide leaves no slot in a slot pitch of ${input.slotPitchMm} mm: the tooth width must be less than the slot pitch.`,
    );
  }
  requireCoilThrow(coilThrow);
  requireNonNegative(overhangFactor, "overhangFactor", "Overhang factor");
  const aroundTooth = (Math.PI / 4) * (input.slotPitchMm + input.toothWidthMm);
  return aroundTooth + input.slotPitchMm * overhangFactor * (coilThrow - 1);
}

/** Slot pitch τ_s = 2πr/Q, mm, at radius `radiusMm` (mm) with `slotCount` slots. */
export function slotPitchMm(radiusMm: number, slotCount: number): number {
  requirePositive(radiusMm, "radiusMm", "Radius");
  if (!Number.isInteger(slotCount) || slotCount < 1) {
    throw new EngineeringInputError(
      "slotCount",
      "Number of slots must be a whole number, at least 1.",
    );
  }
  return (2 * Math.PI * radiusMm) / slotCount;
}

export type WindingLayout =
  "distributed" | "single-layer-tooth-coil" | "double-layer-tooth-coil";

/** k_c of Magnussen and Sadarangani (2003): (π/2)·y distributed, 1.36 or 0.93 for tooth coils. */
export function endTurnFactor(
  layout: WindingLayout,
  coilThrowSlots = 1,
): number {
  switch (layout) {
    case "distributed":
      requireCoilThrow(coilThrowSlots);
      return (Math.PI / 2) * coilThrowSlots;
    case "single-layer-tooth-coil":
      return SINGLE_LAYER_TOOTH_COIL_FACTOR;
    case "double-layer-tooth-coil":
      return DOUBLE_LAYER_TOOTH_COIL_FACTOR;
    default:
      throw new EngineeringInputError(
        "layout",
        'The winding layout must be "distributed", "single-layer-tooth-coil" or "double-layer-tooth-coil".',
      );
  }
}

/** End-turn length per end, mm: k_c · 2πr/Q (Magnussen and Sadarangani, IEMDC 2003). */
export function endTurnLengthFromSlotPitchMm(input: {
  /** Radius where the slot pitch is taken, mm. */
  radiusMm: number;
  /** Number of slots Q. */
  slotCount: number;
  layout: WindingLayout;
  /** Coil throw y in slot pitches, used for the distributed layout; default 1. */
  coilThrowSlots?: number;
}): number {
  return (
    endTurnFactor(input.layout, input.coilThrowSlots ?? 1) *
    slotPitchMm(input.radiusMm, input.slotCount)
  );
}
