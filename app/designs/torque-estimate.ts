/**
 * FIRST-ORDER torque estimate of a design, labelled as such wherever it is shown:
 *
 *   T = k · B_g · I · Σ forceLengthM · r
 *
 * - Σ forceLengthM: conductor length in the field over the design's coil lines, each
 *   line's 2 × turns × active length × coils per motor (`forceLengthM` of the coil
 *   estimator). End turns lie outside the field and add nothing (brief, "Coils").
 * - B_g: air-gap flux density, typed, or from a magnet by B_g = Br · l_m / (l_m + μ_rec · g)
 *   with Br at the magnet temperature (Hanselman, Brushless Permanent Magnet Motor Design;
 *   brief), through `airGapFluxDensityT` of the magnet estimator.
 * - I: rated current through each coil, A; r: air-gap radius, m.
 * - F = B · I · L and T = F · r (brief), through `conductorForceN` and `torqueNm`.
 * - k: the fraction of the active conductors that lie under a pole at any moment (the
 *   rest sit between magnets, in little field). Default {@link DEFAULT_POLE_COVERAGE}.
 *
 * What it leaves out: slotting, fringing and leakage, saturation, the winding factor, the
 * phase current waveform and armature reaction. Rated torque from test data is what cost
 * per N·m should use when there is some.
 */

import { estimateCoil } from "~/engineering/coil-estimate";
import { EngineeringInputError, requirePositive } from "~/engineering/errors";
import { conductorForceN, torqueNm } from "~/engineering/force-and-torque";
import {
  airGapFluxDensityT,
  remanenceAtTemperatureT,
} from "~/engineering/magnet-estimate";
import { coilEstimateInputFor } from "./coil-line-figures";
import { assertDesignLine, type DesignLine } from "./design-lines";

/**
 * Default k, the fraction of conductors under the poles, for a surface permanent-magnet
 * machine: the pole-arc to pole-pitch ratio (the share of the rotor circumference the
 * magnets cover), typically 0.7–0.85. COMMON PRACTICE, value from memory: no published
 * source was checked for this range or for 0.8 as its middle. Give the design's own
 * magnet arc ÷ pole pitch when known.
 */
export const DEFAULT_POLE_COVERAGE = 0.8;

export const DEFAULT_POLE_COVERAGE_SOURCE =
  "Surface PM machine: pole-arc to pole-pitch ratio, typically 0.7–0.85 (common practice, from memory)";

/** Label shown with every torque estimate. */
export const TORQUE_ESTIMATE_LABEL =
  "First-order estimate: T = k · B_g · I · Σ active conductor length · r. Not a measured torque.";

/** Where the air-gap flux density comes from. */
export type AirGapFluxDensityInput =
  /** Typed by the builder (measured or from a field calculation), T. */
  | { source: "typed"; fluxDensityT: number }
  /** From a surface magnet, leakage neglected (magnet estimator). */
  | {
      source: "magnet";
      /** Br at 20 °C, T (maker's data sheet, or the middle of the grade's range). */
      br20T: number;
      /** Reversible temperature coefficient of Br, 1/K (−0.0012 for NdFeB). */
      brTemperatureCoefficientPerK: number;
      /** Magnet temperature, °C. */
      magnetTemperatureC: number;
      /** Magnet length along the magnetisation direction, mm. */
      magnetLengthMm: number;
      /** Mechanical air gap plus any non-magnetic sleeve, mm. */
      airGapMm: number;
      /** Recoil permeability μ_rec of the grade. */
      recoilPermeability: number;
    };

export interface TorqueEstimateInput {
  /** The design's lines; only coil lines count. */
  lines: readonly DesignLine[];
  fluxDensity: AirGapFluxDensityInput;
  /** Rated current through each coil, A, ≥ 0. */
  ratedCurrentA: number;
  /** Air-gap radius, mm, > 0. */
  airGapRadiusMm: number;
  /** Fraction of conductors under the poles, 0 < k ≤ 1; default {@link DEFAULT_POLE_COVERAGE}. */
  poleCoverage?: number | null;
}

export interface TorqueEstimate {
  /** Always "first-order": the estimate is never to be shown as a measured torque. */
  basis: "first-order";
  label: string;
  torqueNm: number;
  /** B_g used, T. */
  fluxDensityT: number;
  /** Σ forceLengthM over the coil lines for one motor, m. */
  forceLengthM: number;
  /** k used. */
  poleCoverage: number;
  /** Where k comes from: the default's source, or "given". */
  poleCoverageSource: string;
}

/** B_g for the torque estimate: the typed value, or the magnet's at its temperature. */
export function airGapFluxDensityFor(input: AirGapFluxDensityInput): number {
  if (input.source === "typed") {
    if (!Number.isFinite(input.fluxDensityT) || input.fluxDensityT < 0) {
      throw new EngineeringInputError(
        "fluxDensity.fluxDensityT",
        "Air-gap flux density must be a number of zero or more.",
      );
    }
    return input.fluxDensityT;
  }
  return airGapFluxDensityT({
    brT: remanenceAtTemperatureT(
      input.br20T,
      input.brTemperatureCoefficientPerK,
      input.magnetTemperatureC,
    ),
    magnetLengthMm: input.magnetLengthMm,
    airGapMm: input.airGapMm,
    recoilPermeability: input.recoilPermeability,
  });
}

/** Σ forceLengthM of the coil lines for one motor, m (end turns and leads excluded). */
export function designForceLengthM(lines: readonly DesignLine[]): number {
  let total = 0;
  for (const line of lines) {
    if (line.kind !== "coil") continue;
    assertDesignLine(line);
    total += estimateCoil(coilEstimateInputFor(line)).total.forceLengthM;
  }
  return total;
}

/** First-order torque of one motor (see the module comment). */
export function estimateTorque(input: TorqueEstimateInput): TorqueEstimate {
  const given = input.poleCoverage ?? null;
  const poleCoverage = given ?? DEFAULT_POLE_COVERAGE;
  if (!(poleCoverage > 0 && poleCoverage <= 1)) {
    throw new EngineeringInputError(
      "poleCoverage",
      "The fraction of conductors under the poles must be more than 0 and at most 1.",
    );
  }
  if (!Number.isFinite(input.ratedCurrentA) || input.ratedCurrentA < 0) {
    throw new EngineeringInputError(
      "ratedCurrentA",
      "Rated current must be a number of zero or more.",
    );
  }
  requirePositive(input.airGapRadiusMm, "airGapRadiusMm", "Air-gap radius");

  const fluxDensityT = airGapFluxDensityFor(input.fluxDensity);
  const forceLengthM = designForceLengthM(input.lines);
  const forceN =
    poleCoverage *
    conductorForceN(fluxDensityT, input.ratedCurrentA, forceLengthM);
  return {
    basis: "first-order",
    label: TORQUE_ESTIMATE_LABEL,
    torqueNm: torqueNm(forceN, input.airGapRadiusMm / 1000),
    fluxDensityT,
    forceLengthM,
    poleCoverage,
    poleCoverageSource: given === null ? DEFAULT_POLE_COVERAGE_SOURCE : "given",
  };
}
