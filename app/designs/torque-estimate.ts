/**
 * FIRST-ORDER torque estimate of a design, labelled as such wherever it is shown:
 *
 *   T = Kt · I,   Kt = m · √2 · k_w1 · N_ph · B̂₁ · r · L   (`~/engineering/motor-constants`)
 *
 * - I: the design's rated current, the RMS PHASE current of a sinusoidal drive. Each phase
 *   has a parallel paths, so a coil carries I/a.
 * - k_w1: the fundamental winding factor of the revision's slots, poles, layers and phases,
 *   by the star of slots (`~/engineering/winding-factor`).
 * - N_ph · L: series turns per phase times the active length, from the coil lines (their
 *   coils split equally among the m phases and a paths; end turns lie outside the field).
 * - B̂₁: the fundamental of the air-gap field, (4/π) · B_g · sin(α_p · π/2), from the
 *   flat-topped B_g under the magnets (typed, or B_g = Br · l_m / (l_m + μ_rec · g) from a
 *   magnet, Hanselman) and α_p, the magnet arc ÷ pole pitch. Default α_p
 *   {@link DEFAULT_POLE_COVERAGE}.
 * - r: the air-gap radius.
 *
 * What it leaves out: slotting, fringing and leakage, saturation, the field's harmonics
 * (with sinusoidal currents they make ripple, not mean torque) and armature reaction. Rated
 * torque from test data is what cost per N·m should use when there is some.
 */

import { EngineeringInputError } from "~/engineering/errors";
import {
  CURRENT_BASIS_TEXT,
  fundamentalFluxDensityT,
  motorConstants,
  type MotorConstants,
  type PhaseConnection,
  type WindingCoils,
} from "~/engineering/motor-constants";
import {
  airGapFluxDensityT,
  remanenceAtTemperatureT,
} from "~/engineering/magnet-estimate";
import {
  windingFactors,
  type WindingFactors,
} from "~/engineering/winding-factor";
import { assertDesignLine, type DesignLine } from "./design-lines";

/**
 * Default α_p, the magnet arc ÷ pole pitch of a surface permanent-magnet rotor, typically
 * 0.7–0.85. COMMON PRACTICE, value from memory: no published source was checked for this
 * range or for 0.8 as its middle. Give the design's own magnet arc ÷ pole pitch when known.
 */
export const DEFAULT_POLE_COVERAGE = 0.8;

export const DEFAULT_POLE_COVERAGE_SOURCE =
  "Surface PM rotor: magnet arc ÷ pole pitch, typically 0.7–0.85 (common practice, from memory)";

/** Label shown with every torque estimate. */
export const TORQUE_ESTIMATE_LABEL =
  "First-order estimate: T = Kt · I with I the RMS phase current of a sinusoidal drive, Kt from the winding factor and the fundamental of the air-gap field. Not a measured torque.";

/** The revision's winding: what the winding factor and the phase figures need. */
export interface DesignWinding {
  slots: number;
  poles: number;
  /** 1 or 2. */
  layers: number;
  phases: number;
  connection: PhaseConnection;
  parallelPaths: number;
}

/** Where the air-gap flux density comes from. */
export type AirGapFluxDensityInput =
  /** Typed by the builder (measured or from a field calculation), T: the flat top under a magnet. */
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
  winding: DesignWinding;
  fluxDensity: AirGapFluxDensityInput;
  /** Rated current: RMS phase current of a sinusoidal drive, A, ≥ 0. */
  ratedCurrentA: number;
  /** Air-gap radius, mm, > 0. */
  airGapRadiusMm: number;
  /** Magnet arc ÷ pole pitch α_p, 0 < α_p ≤ 1; default {@link DEFAULT_POLE_COVERAGE}. */
  poleCoverage?: number | null;
}

export interface TorqueEstimate {
  /** Always "first-order": the estimate is never to be shown as a measured torque. */
  basis: "first-order";
  label: string;
  /** What the current is: RMS phase current of a sinusoidal drive. */
  currentBasis: string;
  torqueNm: number;
  /** Flat-top B_g used, T. */
  fluxDensityT: number;
  /** Peak of its fundamental B̂₁, T. */
  fundamentalFluxDensityT: number;
  /** Fundamental winding factor k_w1. */
  windingFactor: number;
  constants: MotorConstants;
  /** Σ 2 × turns × active length × coils over the coil lines for one motor, m. */
  forceLengthM: number;
  /** α_p used. */
  poleCoverage: number;
  /** Where α_p comes from: the default's source, or "given". */
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

/** The coil lines as groups of coils of the winding (checked). */
export function designCoilGroups(lines: readonly DesignLine[]): WindingCoils[] {
  const groups: WindingCoils[] = [];
  for (const line of lines) {
    if (line.kind !== "coil") continue;
    assertDesignLine(line);
    groups.push({
      coils: line.coilsPerMotor,
      turnsPerCoil: line.turns,
      activeLengthMm: line.activeLengthMm,
    });
  }
  return groups;
}

/** The winding factors of the revision's winding; refuses a winding that cannot be balanced. */
export function designWindingFactors(winding: DesignWinding): WindingFactors {
  return windingFactors({
    slots: winding.slots,
    poles: winding.poles,
    layers: winding.layers,
    phases: winding.phases,
  });
}

/** First-order torque of one motor (see the module comment). */
export function estimateTorque(input: TorqueEstimateInput): TorqueEstimate {
  const given = input.poleCoverage ?? null;
  const poleCoverage = given ?? DEFAULT_POLE_COVERAGE;
  if (!Number.isFinite(input.ratedCurrentA) || input.ratedCurrentA < 0) {
    throw new EngineeringInputError(
      "ratedCurrentA",
      "Rated current must be a number of zero or more.",
    );
  }
  const fluxDensityT = airGapFluxDensityFor(input.fluxDensity);
  const fundamental = fundamentalFluxDensityT(fluxDensityT, poleCoverage);
  const windingFactor = designWindingFactors(input.winding).fundamental;
  const coils = designCoilGroups(input.lines);
  const constants = motorConstants({
    phases: input.winding.phases,
    connection: input.winding.connection,
    parallelPaths: input.winding.parallelPaths,
    coils,
    windingFactor,
    fundamentalFluxDensityT: fundamental,
    airGapRadiusMm: input.airGapRadiusMm,
  });
  return {
    basis: "first-order",
    label: TORQUE_ESTIMATE_LABEL,
    currentBasis: CURRENT_BASIS_TEXT,
    torqueNm: constants.ktNmPerA * input.ratedCurrentA,
    fluxDensityT,
    fundamentalFluxDensityT: fundamental,
    windingFactor,
    constants,
    forceLengthM: coils.reduce(
      (sum, group) =>
        sum +
        (2 * group.turnsPerCoil * group.activeLengthMm * group.coils) / 1000,
      0,
    ),
    poleCoverage,
    poleCoverageSource: given === null ? DEFAULT_POLE_COVERAGE_SOURCE : "given",
  };
}
