/**
 * Litz wire: many enamelled round strands bunched (twisted) together, each strand taking
 * every position in the bundle in turn, so the current shares the strands evenly.
 *
 * - Copper area = strands × strand area; the bundle is bought and wound by its length.
 * - Take-up: bunching shortens the bundle, so each strand is longer than the bundle. DC
 *   resistance and mass per metre of bundle are multiplied by k1 = 1.02 for one bunching
 *   step, 1.04 for two, 1.06 for three or more (IEC 60317-11 as quoted in Elektrisola's
 *   litz-wire calculation notes). New England Wire's litz notes use 1.5 % per bunching and
 *   2.5 % per cabling operation; a request may give its own factor.
 * - Bundle diameter ≈ d_strand,overall · √(n / k_p), with the packing factor k_p about
 *   0.75 (COMMON PRACTICE, FROM MEMORY: the same as the rule of thumb OD ≈ 1.155 · d · √n;
 *   the true diameter depends on the lay and the number of bunching steps, so it is an
 *   estimate).
 * - AC resistance: Dowell's method at strand level (Hurley and Wölfle, "Transformers and
 *   Inductors for Power Electronics", 2013, ch. 6, from memory): each strand is a round
 *   conductor, a winding of m layers of bundles has m·√n layers of strands, and the strand
 *   pitch along a layer is the bundle diameter over √n. This counts strand skin effect and
 *   the proximity effect of the winding's field on every strand; it assumes perfect
 *   transposition (no bundle-level eddy currents from too long a lay). Its low-frequency
 *   limit agrees with C. R. Sullivan's litz formula (IEEE Trans. Power Electronics 14(2),
 *   1999) to within π/3 (the equal-area square, see the tests).
 */

import { EngineeringInputError, requirePositive } from "./errors";
import type { InsulationKey } from "./reference-data";
import {
  dowellResistanceFactor,
  roundConductorPenetrationRatio,
} from "./skin-effect";
import {
  bareDiameterMm,
  circleAreaMm2,
  overallDiameter,
  type WireSpec,
} from "./wire-geometry";

/** A litz wire as the API takes it. */
export interface LitzWireSpec {
  standard: "litz";
  /** Number of strands in the bundle, whole number ≥ 2. */
  strands: number;
  /** The strand: an AWG size or an IEC 60317-0-1 nominal diameter. */
  strandWire: WireSpec;
  /** Bunching steps (1 for a simple bunch, more for bunches of bunches); default 1. */
  bunchingSteps?: number;
  /** Length factor of the strands over the bundle; omitted → IEC 60317-11's k1 for the steps. */
  takeUpFactor?: number | null;
  /** Copper-with-enamel share of the bundle's circle; default 0.75 (common practice). */
  packingFactor?: number | null;
}

/** Packing factor of a litz bundle: strands over enamel ÷ the bundle's circle (common practice, from memory). */
export const DEFAULT_LITZ_PACKING_FACTOR = 0.75;

/** Enamel of a fine strand whose overall diameter is not tabled: 10 % of the bare diameter (see litzWire). */
const FINE_STRAND_ENAMEL_SHARE = 0.1;

/** IEC 60317-11 k1 (via Elektrisola's notes): 1.02, 1.04, then 1.06 for three steps or more. */
export function litzTakeUpFactor(bunchingSteps: number): number {
  if (
    !Number.isInteger(bunchingSteps) ||
    bunchingSteps < 1 ||
    bunchingSteps > 10
  ) {
    throw new EngineeringInputError(
      "wire.bunchingSteps",
      "The bunching steps must be a whole number from 1 to 10.",
    );
  }
  return 1 + 0.02 * Math.min(bunchingSteps, 3);
}

/**
 * Resistance per length of a litz bundle from one strand's resistance per the same length:
 * R_strand · takeUp / strands (IEC 60317-11; New England Wire's litz formula 3).
 */
export function litzResistancePerLength(
  strandResistancePerLength: number,
  strands: number,
  takeUpFactor: number,
): number {
  requirePositive(
    strandResistancePerLength,
    "wire.strandWire",
    "The strand resistance",
  );
  checkStrands(strands);
  checkTakeUp(takeUpFactor);
  return (strandResistancePerLength * takeUpFactor) / strands;
}

/** Bundle diameter ≈ d_overall · √(n / k_p), mm. */
export function litzBundleDiameterMm(
  strandOverallDiameterMm: number,
  strands: number,
  packingFactor = DEFAULT_LITZ_PACKING_FACTOR,
): number {
  requirePositive(
    strandOverallDiameterMm,
    "wire.strandWire",
    "The strand diameter",
  );
  checkStrands(strands);
  checkPacking(packingFactor);
  return strandOverallDiameterMm * Math.sqrt(strands / packingFactor);
}

function checkStrands(strands: number): void {
  if (!Number.isInteger(strands) || strands < 2 || strands > 100_000) {
    throw new EngineeringInputError(
      "wire.strands",
      "A litz wire has a whole number of strands from 2 to 100,000.",
    );
  }
}

function checkTakeUp(takeUpFactor: number): void {
  if (
    !Number.isFinite(takeUpFactor) ||
    takeUpFactor < 1 ||
    takeUpFactor > 1.2
  ) {
    throw new EngineeringInputError(
      "wire.takeUpFactor",
      "The take-up factor must be between 1 and 1.2 (each strand is a little longer than the bundle).",
    );
  }
}

function checkPacking(packingFactor: number): void {
  // π/√12 = 0.9069 is the densest packing of equal circles (hexagonal).
  if (
    !Number.isFinite(packingFactor) ||
    packingFactor < 0.3 ||
    packingFactor > 0.9069
  ) {
    throw new EngineeringInputError(
      "wire.packingFactor",
      "The packing factor must be between 0.3 and 0.9069 (hexagonal packing, π/√12).",
    );
  }
}

/** The strand's bare diameter; a refused size names "wire.strandWire.…" (the API's path). */
function strandBareDiameterMm(strandWire: WireSpec): number {
  try {
    return bareDiameterMm(strandWire);
  } catch (error) {
    if (
      error instanceof EngineeringInputError &&
      error.field.startsWith("wire.")
    ) {
      throw new EngineeringInputError(
        error.field.replace("wire.", "wire.strandWire."),
        error.message,
      );
    }
    throw error;
  }
}

export interface LitzWire {
  strands: number;
  strandBareDiameterMm: number;
  /** Strand diameter over its enamel, mm (published, fitted, or bare + 10 %). */
  strandOverallDiameterMm: number;
  /** True unless the strand's overall diameter is a published maximum. */
  strandOverallDiameterIsEstimate: boolean;
  /** Strand insulation used for the overall diameter (given, or the usual grade 1 / single build). */
  strandInsulation: InsulationKey;
  strandInsulationAssumed: boolean;
  /** Copper of all strands, mm². */
  copperAreaMm2: number;
  /** Diameter of a round wire of the same copper area, mm. */
  equalAreaDiameterMm: number;
  /** Estimated bundle diameter over the strands (no serving or wrap), mm. */
  bundleDiameterMm: number;
  packingFactor: number;
  takeUpFactor: number;
}

/**
 * The litz wire's strands, copper and bundle. `insulation` is the strands' film (IEC grade
 * or AWG build); omitted → grade 1 for IEC strands, single build for AWG, as litz strands
 * usually are (common practice), flagged as assumed.
 */
export function litzWire(
  spec: LitzWireSpec,
  insulation?: InsulationKey | null,
): LitzWire {
  checkStrands(spec.strands);
  const strandBare = strandBareDiameterMm(spec.strandWire);
  const strandInsulation: InsulationKey =
    insulation ?? (spec.strandWire.standard === "IEC" ? "grade1" : "single");
  const overall = overallDiameter(spec.strandWire, strandInsulation);
  // Fine strands are below the tabled and fitted sizes; their grade 1 film adds about 8–17 %
  // (Elektrisola: 0.100 mm grade 1 is 0.108–0.117 mm overall), so take 10 %.
  const strandOverallDiameterMm =
    overall.overallDiameterMm ?? strandBare * (1 + FINE_STRAND_ENAMEL_SHARE);
  const packingFactor = spec.packingFactor ?? DEFAULT_LITZ_PACKING_FACTOR;
  const takeUpFactor =
    spec.takeUpFactor ?? litzTakeUpFactor(spec.bunchingSteps ?? 1);
  checkTakeUp(takeUpFactor);
  const copperAreaMm2 = spec.strands * circleAreaMm2(strandBare);
  return {
    strands: spec.strands,
    strandBareDiameterMm: strandBare,
    strandOverallDiameterMm,
    strandOverallDiameterIsEstimate:
      overall.overallDiameterMm === null || overall.overallDiameterIsEstimate,
    strandInsulation,
    strandInsulationAssumed: insulation === undefined || insulation === null,
    copperAreaMm2,
    equalAreaDiameterMm: Math.sqrt((4 * copperAreaMm2) / Math.PI),
    bundleDiameterMm: litzBundleDiameterMm(
      strandOverallDiameterMm,
      spec.strands,
      packingFactor,
    ),
    packingFactor,
    takeUpFactor,
  };
}

/**
 * R_ac/R_dc of a winding of `layers` layers of litz bundles (strand-level Dowell; see the
 * module comment), at skin depth `skinDepthMm`.
 */
export function litzAcResistanceFactor(input: {
  strandBareDiameterMm: number;
  strands: number;
  bundleDiameterMm: number;
  layers: number;
  skinDepthMm: number;
}): number {
  checkStrands(input.strands);
  requirePositive(input.bundleDiameterMm, "wire", "The bundle diameter");
  const strandsAcross = Math.sqrt(input.strands);
  const strandPitchMm = input.bundleDiameterMm / strandsAcross;
  const delta = roundConductorPenetrationRatio(
    input.strandBareDiameterMm,
    strandPitchMm,
    input.skinDepthMm,
  );
  return dowellResistanceFactor(delta, input.layers * strandsAcross);
}
