/**
 * Rectangular (flat) winding wire: conductor area with rounded corners, overall size over
 * the enamel, mass and resistance per metre, and how it fills a slot.
 *
 * - Area A = a·b − (4 − π)·r² (IEC 60317-0-2; each corner of radius r removes a square r²
 *   less a quarter circle πr²/4), a the thickness, b the width.
 * - Overall dimensions (maximum) = nominal + the grade's maximum increase (conductor
 *   tolerances not included).
 * - Fill of a slot: copper fill = N·strands·A / A_slot; gross fill = N·strands·(a'·b') /
 *   A_slot over the enamel. Rectangles can tile a slot, so the geometric limit is 1; in
 *   practice flat wire reaches about 0.6–0.75 of net copper (common practice, as hairpin in
 *   the brief).
 *
 * Data in ./rectangular-wire-data (IEC 60317-0-2, from memory). Errors name the API's
 * input path ("wire.thicknessMm", "wire.widthMm", "wire.cornerRadiusMm", "insulation").
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";
import {
  CORNER_RADIUS_ROWS,
  ENAMEL_INCREASE_MM,
  RECTANGULAR_RANGE,
  type RectangularGrade,
} from "./rectangular-wire-data";
import type { ConductorKey } from "./reference-data";
import { linearMassKgPerM, resistancePerMetreOhm } from "./wire-geometry";

/** A flat wire as the API takes it. */
export interface RectangularWireSpec {
  standard: "rectangular";
  /** Smaller side a, mm. */
  thicknessMm: number;
  /** Larger side b, mm. */
  widthMm: number;
  /** Corner radius, mm; omitted → the standard's nominal radius for the thickness. */
  cornerRadiusMm?: number | null;
  /** Wound on edge (the narrow side against the layer below); default false, wound flat. */
  edgewise?: boolean;
}

export interface RectangularWire {
  thicknessMm: number;
  widthMm: number;
  cornerRadiusMm: number;
  /** True when the radius is the standard's nominal one, false when the request gave it. */
  cornerRadiusFromStandard: boolean;
  areaMm2: number;
  /** Maximum overall dimensions over the enamel; null without a grade. */
  overallThicknessMm: number | null;
  overallWidthMm: number | null;
}

/** Nominal corner radius of IEC 60317-0-2 for thickness `thicknessMm` (from memory). */
export function nominalCornerRadiusMm(thicknessMm: number): number {
  checkThickness(thicknessMm);
  const row = CORNER_RADIUS_ROWS.find(
    (candidate) => thicknessMm <= candidate.maxThicknessMm + 1e-9,
  );
  // checkThickness keeps a within the last row.
  return row!.cornerRadiusMm ?? thicknessMm / 2;
}

function checkThickness(thicknessMm: number): void {
  requirePositive(thicknessMm, "wire.thicknessMm", "The thickness");
  const { minThicknessMm, maxThicknessMm } = RECTANGULAR_RANGE;
  if (thicknessMm < minThicknessMm || thicknessMm > maxThicknessMm) {
    throw new EngineeringInputError(
      "wire.thicknessMm",
      `IEC 60317-0-2 covers thicknesses from ${minThicknessMm.toFixed(2)} to ${maxThicknessMm.toFixed(2)} mm.`,
    );
  }
}

/** Conductor area A = a·b − (4 − π)·r², mm². */
export function rectangularAreaMm2(
  thicknessMm: number,
  widthMm: number,
  cornerRadiusMm: number,
): number {
  requirePositive(thicknessMm, "wire.thicknessMm", "The thickness");
  requirePositive(widthMm, "wire.widthMm", "The width");
  requireNonNegative(
    cornerRadiusMm,
    "wire.cornerRadiusMm",
    "The corner radius",
  );
  if (cornerRadiusMm > Math.min(thicknessMm, widthMm) / 2) {
    throw new EngineeringInputError(
      "wire.cornerRadiusMm",
      "The corner radius cannot be more than half the thickness.",
    );
  }
  return thicknessMm * widthMm - (4 - Math.PI) * cornerRadiusMm ** 2;
}

/** The flat wire's dimensions, area and overall size (grade 1 or 2; grade 3 is not in the standard). */
export function rectangularWire(
  spec: RectangularWireSpec,
  insulation?: string | null,
): RectangularWire {
  checkThickness(spec.thicknessMm);
  requirePositive(spec.widthMm, "wire.widthMm", "The width");
  const { minWidthMm, maxWidthMm, minAspectRatio, maxAspectRatio } =
    RECTANGULAR_RANGE;
  if (spec.widthMm < minWidthMm || spec.widthMm > maxWidthMm) {
    throw new EngineeringInputError(
      "wire.widthMm",
      `IEC 60317-0-2 covers widths from ${minWidthMm.toFixed(2)} to ${maxWidthMm.toFixed(2)} mm.`,
    );
  }
  const ratio = spec.widthMm / spec.thicknessMm;
  if (ratio < minAspectRatio - 1e-9 || ratio > maxAspectRatio + 1e-9) {
    throw new EngineeringInputError(
      "wire.widthMm",
      `The width must be ${minAspectRatio} to ${maxAspectRatio} times the thickness (IEC 60317-0-2); ${spec.widthMm} × ${spec.thicknessMm} mm is ${ratio.toFixed(2)}.`,
    );
  }
  const given = spec.cornerRadiusMm;
  const cornerRadiusMm =
    given === undefined || given === null
      ? nominalCornerRadiusMm(spec.thicknessMm)
      : given;
  const increase = enamelIncreaseMm(insulation);
  return {
    thicknessMm: spec.thicknessMm,
    widthMm: spec.widthMm,
    cornerRadiusMm,
    cornerRadiusFromStandard: given === undefined || given === null,
    areaMm2: rectangularAreaMm2(spec.thicknessMm, spec.widthMm, cornerRadiusMm),
    overallThicknessMm: increase === null ? null : spec.thicknessMm + increase,
    overallWidthMm: increase === null ? null : spec.widthMm + increase,
  };
}

/** Maximum increase of each dimension for a grade, mm; null when no grade is given. */
export function enamelIncreaseMm(insulation?: string | null): number | null {
  if (insulation === undefined || insulation === null) return null;
  if (insulation !== "grade1" && insulation !== "grade2") {
    throw new EngineeringInputError(
      "insulation",
      `Flat wire (IEC 60317-0-2) takes grade1 or grade2, not "${insulation}".`,
    );
  }
  return ENAMEL_INCREASE_MM[insulation as RectangularGrade].max;
}

/** Bare mass and resistance per metre of a flat conductor of `areaMm2`. */
export function rectangularPerMetre(
  conductor: ConductorKey,
  areaMm2: number,
  temperatureC = 20,
): { linearMassKgPerM: number; resistancePerMetreOhm: number } {
  requirePositive(areaMm2, "wire", "The conductor area");
  return {
    linearMassKgPerM: linearMassKgPerM(conductor, areaMm2),
    resistancePerMetreOhm: resistancePerMetreOhm(
      conductor,
      areaMm2,
      temperatureC,
    ),
  };
}

export interface RectangularSlotFill {
  /** Net copper over the free slot area. */
  copperFill: number;
  /** Conductors over their enamel (overall rectangles) over the free slot area; null without a grade. */
  grossFill: number | null;
  /** True when the gross fill is at most 1 (rectangles can tile); null without a grade. */
  fits: boolean | null;
}

/**
 * How `conductorsInSlot` flat conductors (turns × strands × coil sides in the slot) fill a
 * slot of `slotAreaMm2`, less `linerAreaMm2` (liner and separator).
 */
export function rectangularSlotFill(input: {
  wire: RectangularWire;
  conductorsInSlot: number;
  slotAreaMm2: number;
  linerAreaMm2?: number;
}): RectangularSlotFill {
  const { wire } = input;
  if (!Number.isInteger(input.conductorsInSlot) || input.conductorsInSlot < 1) {
    throw new EngineeringInputError(
      "conductorsInSlot",
      "The conductors in the slot must be a whole number of at least 1.",
    );
  }
  requirePositive(input.slotAreaMm2, "slotAreaMm2", "The slot area");
  const liner = input.linerAreaMm2 ?? 0;
  requireNonNegative(liner, "linerAreaMm2", "The liner area");
  const freeMm2 = input.slotAreaMm2 - liner;
  if (freeMm2 <= 0) {
    throw new EngineeringInputError(
      "linerAreaMm2",
      "The liner area must be less than the slot area.",
    );
  }
  const grossFill =
    wire.overallThicknessMm === null || wire.overallWidthMm === null
      ? null
      : (input.conductorsInSlot *
          wire.overallThicknessMm *
          wire.overallWidthMm) /
        freeMm2;
  return {
    copperFill: (input.conductorsInSlot * wire.areaMm2) / freeMm2,
    grossFill,
    fits: grossFill === null ? null : grossFill <= 1,
  };
}
