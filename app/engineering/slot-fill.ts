/**
 * How full a slot is: copper fill and gross fill.
 *
 * - Copper fill (bare conductor, the brief's fill factor):
 *   k_Cu = conductors · strands · π/4 · d_bare² / A_slot,
 *   conductors = turns × coil sides per slot.
 * - Gross fill (over the enamel, what must physically fit):
 *   k_gross = conductors · strands · π/4 · d_overall² / (A_slot − A_liner),
 *   A_liner = the slot liner and separator (phase paper, wedge) area when given.
 *
 * The packing limits are limits on round conductors as they are wound, that is over their
 * enamel: square (layer-on-layer) packing π/4 = 0.785 and hexagonal (orthocyclic) packing
 * π/√12 = 0.9069 (brief; the ratio of a circle to its square or hexagonal cell). These are
 * judged on gross fill. The 0.35–0.45 usual for random-wound round wire (common practice) is
 * a copper fill — the brief gives it beside its net-copper fill factor — so it is judged on
 * copper fill. When the overall diameter is unknown the packing limits fall back to copper
 * fill too, with a note that it understates how full the slot is.
 *
 * Errors are {@link EngineeringInputError}s naming the field as the slot-fill API does:
 * "turns", "strands", "coilSidesPerSlot", "slotAreaMm2", "linerAreaMm2",
 * "bareDiameterMm", "overallDiameterMm".
 */

import { EngineeringInputError, requirePositive } from "./errors";

/** Upper end of what random-wound round wire reaches in production (common practice, brief). */
export const RANDOM_ROUND_WIRE_FILL_LIMIT = 0.45;
/** Round conductors in square (layer-on-layer) packing: π/4. */
export const SQUARE_PACKING_FILL_LIMIT = Math.PI / 4;
/** Round conductors in hexagonal (orthocyclic) packing, the densest possible: π/√12. */
export const HEXAGONAL_PACKING_FILL_LIMIT = Math.PI / Math.sqrt(12);

export type SlotFillWarningCode =
  | "above-random-round-wire-practice"
  | "above-square-packing-limit"
  | "above-hexagonal-packing-limit";

/** Which fill the limits were judged on. */
export type SlotFillBasis = "gross" | "copper";

export interface SlotFillWarning {
  code: SlotFillWarningCode;
  /** The limit passed, as a fill factor (0–1). */
  limit: number;
  message: string;
}

export interface SlotFillInput {
  /** Turns of one coil side, whole ≥ 1. */
  turns: number;
  /** Coil sides sharing the slot (1 single layer, 2 double layer), whole ≥ 1; default 1. */
  coilSidesPerSlot?: number;
  /** Strands wound in hand, whole ≥ 1; default 1. */
  strands?: number;
  /** Bare conductor diameter of one strand, mm, > 0. */
  bareDiameterMm: number;
  /** Maximum overall diameter over the enamel, mm (≥ bare); null when unknown. */
  overallDiameterMm: number | null;
  /** Whole slot area, mm², > 0. */
  slotAreaMm2: number;
  /** Slot liner and separator area, mm², ≥ 0 and below the slot area; null/absent = none given. */
  linerAreaMm2?: number | null;
}

export interface SlotFill {
  /** Bare conductor over the whole slot area, 0–1 (above 1 for impossible input). */
  copperFill: number;
  /** Conductor over its enamel over the slot area left by the liner; null when the overall diameter is unknown. */
  grossFill: number | null;
  /** Slot area left for wire: slot area − liner area, mm². */
  wireAreaMm2: number;
  /** The fill the limits were judged on: gross, or copper when the overall diameter is unknown. */
  judgedOn: SlotFillBasis;
  /** False when the judged fill is above π/√12: no packing of round wire can fit it. */
  fits: boolean;
  /** The most serious limit passed, or null. */
  warning: SlotFillWarning | null;
  /** Set when judged on copper fill: it understates how full the slot is. */
  note: string | null;
}

const wholeAtLeastOne = (value: number, field: string, label: string) => {
  if (!Number.isInteger(value) || value < 1) {
    throw new EngineeringInputError(
      field,
      `${label} must be a whole number of at least 1.`,
    );
  }
};

function assertSlotFillInput(input: SlotFillInput): void {
  wholeAtLeastOne(input.turns, "turns", "Turns");
  wholeAtLeastOne(input.strands ?? 1, "strands", "Strands");
  wholeAtLeastOne(
    input.coilSidesPerSlot ?? 1,
    "coilSidesPerSlot",
    "Coil sides per slot",
  );
  requirePositive(input.bareDiameterMm, "bareDiameterMm", "Bare diameter");
  requirePositive(input.slotAreaMm2, "slotAreaMm2", "Slot area");
  const liner = input.linerAreaMm2;
  if (liner !== undefined && liner !== null) {
    if (!Number.isFinite(liner) || liner < 0) {
      throw new EngineeringInputError(
        "linerAreaMm2",
        "Liner and separator area must be a number of zero or more.",
      );
    }
    if (liner >= input.slotAreaMm2) {
      throw new EngineeringInputError(
        "linerAreaMm2",
        `Liner and separator area (${liner} mm²) must be less than the slot area (${input.slotAreaMm2} mm²): nothing would be left for the wire.`,
      );
    }
  }
  const overall = input.overallDiameterMm;
  if (overall !== null) {
    requirePositive(overall, "overallDiameterMm", "Overall diameter");
    if (overall < input.bareDiameterMm) {
      throw new EngineeringInputError(
        "overallDiameterMm",
        `Overall diameter (${overall} mm) cannot be less than the bare diameter (${input.bareDiameterMm} mm).`,
      );
    }
  }
}

const fillText = (fill: number) => fill.toFixed(3);
const basisText = (basis: SlotFillBasis) =>
  basis === "gross" ? "Gross fill (over the enamel)" : "Copper fill";

/**
 * The most serious limit passed, or null when none applies: the packing limits on `fill`
 * (judged on `basis`), the random-wound practice on `copperFill` (default `fill`).
 */
export function slotFillWarning(
  fill: number,
  basis: SlotFillBasis = "gross",
  copperFill: number = fill,
): SlotFillWarning | null {
  const what = `${basisText(basis)} ${fillText(fill)}`;
  if (fill > HEXAGONAL_PACKING_FILL_LIMIT) {
    return {
      code: "above-hexagonal-packing-limit",
      limit: HEXAGONAL_PACKING_FILL_LIMIT,
      message: `${what} is above π/√12 = 0.907, the densest packing of round conductors: this winding cannot fit the slot.`,
    };
  }
  if (fill > SQUARE_PACKING_FILL_LIMIT) {
    return {
      code: "above-square-packing-limit",
      limit: SQUARE_PACKING_FILL_LIMIT,
      message: `${what} is above π/4 = 0.785, the limit for round conductors stacked in square layers; only perfect hexagonal packing could reach it.`,
    };
  }
  if (copperFill > RANDOM_ROUND_WIRE_FILL_LIMIT) {
    return {
      code: "above-random-round-wire-practice",
      limit: RANDOM_ROUND_WIRE_FILL_LIMIT,
      message: `Copper fill ${fillText(copperFill)} is above the 0.35–0.45 usual for random-wound round wire (common practice); it needs linear winding on segmented teeth (0.5–0.65) or hairpins (0.65–0.75).`,
    };
  }
  return null;
}

/** The note when the limits are judged on copper fill for want of the overall diameter. */
export const COPPER_BASIS_NOTE =
  "The overall diameter over the enamel is not known for this wire, so the limits are judged on copper fill, which understates how full the slot is: over grade 2 enamel a round wire takes about 20 % more area at 1.0 mm and about 43 % more at 0.2 mm (IEC 60317-0-1 maximum overall diameters).";

/**
 * Copper fill and gross fill of a slot, with the limits judged on gross fill (on copper
 * fill, with a note, when the overall diameter is unknown). Throws
 * {@link EngineeringInputError} for input no slot can have.
 */
export function assessSlotFill(input: SlotFillInput): SlotFill {
  assertSlotFillInput(input);
  const conductors =
    input.turns * (input.coilSidesPerSlot ?? 1) * (input.strands ?? 1);
  const circle = (diameterMm: number) => (Math.PI / 4) * diameterMm ** 2;
  const wireAreaMm2 = input.slotAreaMm2 - (input.linerAreaMm2 ?? 0);
  const copperFill =
    (conductors * circle(input.bareDiameterMm)) / input.slotAreaMm2;
  const grossFill =
    input.overallDiameterMm === null
      ? null
      : (conductors * circle(input.overallDiameterMm)) / wireAreaMm2;
  const judgedOn: SlotFillBasis = grossFill === null ? "copper" : "gross";
  const judged = grossFill ?? copperFill;
  return {
    copperFill,
    grossFill,
    wireAreaMm2,
    judgedOn,
    fits: judged <= HEXAGONAL_PACKING_FILL_LIMIT,
    warning: slotFillWarning(judged, judgedOn, copperFill),
    note: judgedOn === "copper" ? COPPER_BASIS_NOTE : null,
  };
}

/** One sentence about a slot's fill, for the API and the pages. */
export function slotFillMessage(fill: SlotFill): string {
  const figures = `Copper fill ${fillText(fill.copperFill)}${
    fill.grossFill === null
      ? ""
      : `, gross fill over the enamel ${fillText(fill.grossFill)}`
  }.`;
  const verdict =
    fill.warning?.message ??
    `${basisText(fill.judgedOn)} ${fillText(fill.grossFill ?? fill.copperFill)} is within the packing limits of round wire (π/4 = 0.785 in square layers), and copper fill ${fillText(fill.copperFill)} is at or below 0.45, the upper end of what random-wound round wire usually reaches (common practice).`;
  return [figures, verdict, fill.note].filter(Boolean).join(" ");
}
