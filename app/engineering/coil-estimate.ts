/**
 * Copper (or aluminium) length, mass, resistance and loss of a coil from its geometry:
 * the body of POST /api/v1/coil-estimates.
 *
 * Formulas (brief; Bianchi, Bolognani and Frare, IEEE Trans. Energy Conversion, 2006):
 * - mean length of turn MLT = 2 · l_active + 2 · l_end
 * - wound length per coil = strands · (N · MLT + 2 · l_lead)
 * - resistance between the leads, strands in parallel:
 *   R = ρ(T) · (N · MLT + 2 · l_lead) / (strands · A), ρ(T) = ρ20 · (1 + α20 · (T − 20))
 * - scrap adds to what is drawn from stock, not to resistance.
 * - litz wire: copper length and mass × the take-up factor, resistance too (./litz-wire);
 *   flat wire: area by IEC 60317-0-2 (./rectangular-wire).
 * - current density, AC resistance (Dowell), harmonics and the operating temperature:
 *   ./coil-operating-figures.
 *
 * The input is assumed validated (types, ranges, integers) by the API's schema; wire
 * and insulation lookups that fail still throw {@link EngineeringInputError}.
 * All outputs are plain numbers in the named units, unrounded.
 */

import { assertCoilEstimateInput } from "./coil-estimate-input";
import {
  coilConductor,
  type CoilWireSpec,
  type ConductorKind,
} from "./coil-conductor";
import {
  coilOperatingFigures,
  type CoilAcLoss,
  type CoilOperatingPerCoil,
  type CoilOperatingPoint,
} from "./coil-operating-figures";
import type { LitzWire } from "./litz-wire";
import type { RectangularWire } from "./rectangular-wire";
import type { ConductorKey, InsulationKey } from "./reference-data";
import type { HarmonicCurrent } from "./skin-effect";
import type { ThermalInput } from "./winding-temperature";
import { linearMassKgPerM, resistancePerMetreOhm } from "./wire-geometry";

export interface CoilEstimateInput {
  conductor: ConductorKey;
  /** Round (AWG, IEC), litz or rectangular wire. */
  wire: CoilWireSpec;
  /** IEC grade for IEC wire, film build for AWG wire (litz: the strands'); omitted → overall diameter null. */
  insulation?: InsulationKey | null;
  /** Turns per coil, integer ≥ 1. */
  turns: number;
  /** Strands wound in hand (in parallel), integer ≥ 1; default 1. */
  strandsInHand?: number;
  /** Straight length of each coil side in the field, mm, > 0. */
  activeLengthMm: number;
  /** Length of each of the two end connections (per end), mm, ≥ 0. */
  endTurnLengthMm: number;
  /** Length of each of the two leads, mm, ≥ 0; default 0. */
  leadLengthMm?: number;
  /** Number of identical coils, integer ≥ 1; default 1. */
  coilCount?: number;
  /** Conductor temperature for `resistanceOhm`, °C; default 20. */
  temperatureC?: number;
  /** Extra conductor drawn from stock (start-up, cut-offs, test pieces), %, ≥ 0; default 0. */
  scrapPercent?: number;
  /** Terminal current through each coil, A, ≥ 0; omitted → copperLossW null. */
  currentA?: number | null;
  /** Fundamental frequency of the current, Hz; omitted → no AC figures. */
  frequencyHz?: number | null;
  /** Harmonics of the current (orders ≥ 2, RMS A), needs frequencyHz and currentA. */
  harmonics?: readonly HarmonicCurrent[] | null;
  /** Layers of conductors in each coil for the AC resistance; default 1 (flagged). */
  layersPerCoil?: number | null;
  /** Ambient and a thermal resistance or a temperature rise; needs currentA. */
  thermal?: ThermalInput | null;
}

export interface CoilQuantities {
  /** Conductor wound, all strands: strands × (turns × MLT + 2 × lead), m. */
  conductorLengthM: number;
  /** Conductor drawn from stock: conductorLengthM × (1 + scrap/100), m. */
  purchasedLengthM: number;
  /** Bare conductor mass of conductorLengthM, kg. */
  woundMassKg: number;
  /** Bare conductor mass of purchasedLengthM, kg. */
  purchasedMassKg: number;
  /** Resistance between the leads at 20 °C, Ω (scrap excluded). */
  resistance20Ohm: number;
  /** Resistance between the leads at temperatureC, Ω (scrap excluded). */
  resistanceOhm: number;
  /** Conductor length in the field that makes force: 2 × turns × active length, m. */
  forceLengthM: number;
}

/** perCoil: the quantities plus current density and the AC figures at the fundamental. */
export type PerCoilQuantities = CoilQuantities & CoilOperatingPerCoil;

export interface CoilEstimate {
  /**
   * One strand in hand. overallDiameterMm is null when unknown; overallDiameterIsEstimate
   * flags a fitted estimate. Litz: bareDiameterMm is the equal-copper round diameter and
   * overallDiameterMm the estimated bundle; flat wire: the equal-copper diameter and null.
   */
  wire: {
    bareDiameterMm: number;
    overallDiameterMm: number | null;
    overallDiameterIsEstimate: boolean;
    areaMm2: number;
    kind: ConductorKind;
    litz: LitzWire | null;
    rectangular: (RectangularWire & { edgewise: boolean }) | null;
  };
  /** Mean length of turn 2·active + 2·end turn, mm. */
  meanTurnLengthMm: number;
  /** Share of each turn that lies in the field: active ÷ (active + end turn), 0–1. */
  activeShare: number;
  perCoil: PerCoilQuantities;
  /** perCoil × coilCount, field by field (the DC quantities only). */
  total: CoilQuantities;
  /** coilCount × I² × perCoil.resistanceOhm, W; null when no current is given. */
  copperLossW: number | null;
  /** Loss at the fundamental and harmonics at temperatureC; null without frequency and current. */
  acLoss: CoilAcLoss | null;
  /** Temperature and loss found together from the thermal input; null without one. */
  operatingPoint: CoilOperatingPoint | null;
}

/** Mean length of turn, mm: 2 · active length + 2 · end-turn length (per end). */
export function meanTurnLengthMm(
  activeLengthMm: number,
  endTurnLengthMm: number,
): number {
  return 2 * activeLengthMm + 2 * endTurnLengthMm;
}

/** Share of a turn in the field: active ÷ (active + end turn). */
export function activeShare(
  activeLengthMm: number,
  endTurnLengthMm: number,
): number {
  return activeLengthMm / (activeLengthMm + endTurnLengthMm);
}

function scaleQuantities(
  quantities: CoilQuantities,
  factor: number,
): CoilQuantities {
  return {
    conductorLengthM: quantities.conductorLengthM * factor,
    purchasedLengthM: quantities.purchasedLengthM * factor,
    woundMassKg: quantities.woundMassKg * factor,
    purchasedMassKg: quantities.purchasedMassKg * factor,
    // The contract makes total = perCoil × coilCount for every field, which for
    // resistance means all coils in series. For coils in parallel groups, use perCoil.
    resistance20Ohm: quantities.resistance20Ohm * factor,
    resistanceOhm: quantities.resistanceOhm * factor,
    forceLengthM: quantities.forceLengthM * factor,
  };
}

/** Estimates a coil's conductor length, mass, resistance and loss (see the module comment). */
export function estimateCoil(input: CoilEstimateInput): CoilEstimate {
  assertCoilEstimateInput(input);
  const strands = input.strandsInHand ?? 1;
  const leadLengthMm = input.leadLengthMm ?? 0;
  const coilCount = input.coilCount ?? 1;
  const temperatureC = input.temperatureC ?? 20;
  const scrapPercent = input.scrapPercent ?? 0;

  const conductor = coilConductor(input.wire, input.insulation);
  const areaMm2 = conductor.areaMm2;

  const mltMm = meanTurnLengthMm(input.activeLengthMm, input.endTurnLengthMm);
  // Length of one strand from lead end to lead end, m (litz: of the bundle).
  const strandLengthM = (input.turns * mltMm + 2 * leadLengthMm) / 1000;
  // Copper per metre of conductor: litz strands are longer than the bundle by the take-up.
  const copperLengthFactor = conductor.lengthFactor;
  const conductorLengthM = strands * strandLengthM;
  const purchasedLengthM = conductorLengthM * (1 + scrapPercent / 100);
  const massPerMetreKg =
    linearMassKgPerM(input.conductor, areaMm2) * copperLengthFactor;

  // Strands in parallel: one strand's length over the section of all strands.
  const parallelAreaMm2 = strands * areaMm2;
  const resistance20Ohm =
    strandLengthM *
    copperLengthFactor *
    resistancePerMetreOhm(input.conductor, parallelAreaMm2, 20);
  const resistanceOhm =
    strandLengthM *
    copperLengthFactor *
    resistancePerMetreOhm(input.conductor, parallelAreaMm2, temperatureC);

  // Per the contract: 2 × turns × active length, NOT multiplied by strands. That is
  // right when force is computed with the coil's terminal current (F = B · I · forceLength):
  // the strands share that current, so each carries I/strands and the strands together
  // make the same force as one conductor carrying I. Multiply by strands only if the
  // current used is the current per strand.
  const forceLengthM = (2 * input.turns * input.activeLengthMm) / 1000;

  const quantities: CoilQuantities = {
    conductorLengthM,
    purchasedLengthM,
    woundMassKg: conductorLengthM * massPerMetreKg,
    purchasedMassKg: purchasedLengthM * massPerMetreKg,
    resistance20Ohm,
    resistanceOhm,
    forceLengthM,
  };

  const operating = coilOperatingFigures({
    conductor: input.conductor,
    coilConductor: conductor,
    strandsInHand: strands,
    coilCount,
    resistance20Ohm,
    temperatureC,
    currentA: input.currentA,
    frequencyHz: input.frequencyHz,
    harmonics: input.harmonics,
    layersPerCoil: input.layersPerCoil,
    thermal: input.thermal,
  });
  const perCoil: PerCoilQuantities = { ...quantities, ...operating.perCoil };

  const currentA = input.currentA;
  return {
    wire: {
      bareDiameterMm: conductor.bareDiameterMm,
      overallDiameterMm: conductor.overallDiameterMm,
      overallDiameterIsEstimate: conductor.overallDiameterIsEstimate,
      areaMm2,
      kind: conductor.kind,
      litz: conductor.litz,
      rectangular: conductor.rectangular,
    },
    meanTurnLengthMm: mltMm,
    activeShare: activeShare(input.activeLengthMm, input.endTurnLengthMm),
    perCoil,
    total: scaleQuantities(quantities, coilCount),
    copperLossW:
      currentA === undefined || currentA === null
        ? null
        : coilCount * currentA * currentA * perCoil.resistanceOhm,
    acLoss: operating.acLoss,
    operatingPoint: operating.operatingPoint,
  };
}

/** Where one coil's conductor goes, m: the active sides, the end turns and the leads (all strands). */
export interface ConductorSplit {
  activeM: number;
  endTurnM: number;
  leadM: number;
}

/**
 * Splits a coil's wound conductor into active sides (strands × turns × 2 × l_active),
 * end turns (strands × turns × 2 × l_end) and leads (strands × 2 × l_lead); the three add
 * up to `perCoil.conductorLengthM` of {@link estimateCoil}.
 */
export function conductorSplit(input: CoilEstimateInput): ConductorSplit {
  assertCoilEstimateInput(input);
  const strands = input.strandsInHand ?? 1;
  const perSideM = (lengthMm: number) =>
    (strands * input.turns * 2 * lengthMm) / 1000;
  return {
    activeM: perSideM(input.activeLengthMm),
    endTurnM: perSideM(input.endTurnLengthMm),
    leadM: (strands * 2 * (input.leadLengthMm ?? 0)) / 1000,
  };
}
