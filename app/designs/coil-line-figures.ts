/**
 * What one coil line of a design comes to in one motor: copper length, the mass drawn from
 * stock, resistance, active share, copper loss at the rated current, and where the drawn
 * mass goes (active sides, end turns, leads and scrap).
 *
 * Every formula is the coil estimator's (`~/engineering/coil-estimate`: MLT, wound length,
 * resistance with strands in parallel, R(T), scrap outside the resistance; brief and
 * Bianchi, Bolognani and Frare 2006). This module only maps a design line onto it, picks
 * the enamelled mass where the wire's linear mass is known, and splits the drawn mass
 * exactly.
 */

import {
  conductorSplit,
  estimateCoil,
  type CoilEstimateInput,
} from "~/engineering/coil-estimate";
import { massKgFromEstimate } from "~/pricing/metal-base";
import type { ExactDecimal } from "~/pricing/money";
import { apportion, weightsFromShares } from "./apportion";
import { assertDesignLine, type CoilLine } from "./design-lines";

/** Which mass the drawn mass is: of enamelled wire (linear mass known) or of bare conductor. */
export type DrawnMassBasis = "enamelled" | "bare";

/** Scale of the exact masses: kg to 7 decimals, a tenth of a milligram (as `massKgFromEstimate`). */
export const EXACT_MASS_DECIMALS = 7;

/**
 * The drawn mass of a coil line split by where the wire goes, kg, exact to a tenth of a
 * milligram. The three add up to `drawnMass` exactly.
 */
export interface DrawnMassSplit {
  /** Coil sides in the field. */
  activeKg: ExactDecimal;
  /** End connections (no torque). */
  endTurnKg: ExactDecimal;
  /** Leads, plus the scrap drawn beyond the wound length. */
  leadsAndScrapKg: ExactDecimal;
}

export interface CoilLineFigures {
  /** Bare diameter of one strand, mm. */
  bareDiameterMm: number;
  /** Mean length of turn, mm. */
  meanTurnLengthMm: number;
  /** Share of each turn in the field: active ÷ (active + end turn), 0–1. */
  activeShare: number;
  /** Conductor wound into this line's coils in one motor, all strands, m. */
  copperLengthM: number;
  /** Wire drawn from stock for one motor, wound length plus scrap, m. */
  drawnLengthM: number;
  /** Mass drawn from stock for one motor, kg (see `massBasis`). */
  drawnMassKg: number;
  /** The same, exact to a tenth of a milligram: the quantity the costing prices. */
  drawnMass: ExactDecimal;
  /** "enamelled" when the wire's linear mass is known, else "bare" (conductor only, a lower bound). */
  massBasis: DrawnMassBasis;
  /** Where the drawn mass goes; adds up to `drawnMass` exactly. */
  drawnMassSplit: DrawnMassSplit;
  /** Resistance of one coil between its leads at 20 °C, Ω. */
  resistance20PerCoilOhm: number;
  /** Resistance of one coil at the operating temperature, Ω. */
  resistancePerCoilOhm: number;
  /** The operating temperature the hot resistance and loss are at, °C. */
  operatingTemperatureC: number;
  /** Copper loss of the line in one motor at the rated current: coils × I² × R(T), W; null without a current. */
  copperLossW: number | null;
  /** Conductor length in the field for one motor: 2 × turns × active length × coils, m. */
  forceLengthM: number;
  /** Current density in each strand at the rated current, A/mm²; null without a current. */
  currentDensityAPerMm2: number | null;
  /** Skin depth at the electrical frequency and operating temperature, mm; null without a frequency. */
  skinDepthMm: number | null;
  /**
   * R_ac / R_dc at the electrical frequency by Dowell with ONE layer of turns per coil
   * (a design does not say how its coils are layered): a lower bound, as more layers add
   * proximity loss. Null without a frequency.
   */
  acResistanceRatio: number | null;
}

/**
 * The coil estimator's input for a design coil line: `coilsPerMotor` coils at the
 * operating temperature, with `currentA` through each coil (null → no loss).
 */
export function coilEstimateInputFor(
  line: CoilLine,
  currentA: number | null = null,
  frequencyHz: number | null = null,
): CoilEstimateInput {
  return {
    conductor: line.wire.conductor,
    wire: line.wire.size,
    turns: line.turns,
    strandsInHand: line.strandsInHand,
    activeLengthMm: line.activeLengthMm,
    endTurnLengthMm: line.endTurnLengthMm,
    leadLengthMm: line.leadLengthMm,
    coilCount: line.coilsPerMotor,
    temperatureC: line.operatingTemperatureC,
    scrapPercent: line.scrapPercent,
    currentA,
    frequencyHz,
  };
}

function exactKg(digits: bigint): ExactDecimal {
  return { digits, decimals: EXACT_MASS_DECIMALS };
}

/**
 * Figures of one coil line for one motor. `ratedCurrentA` is the current through each
 * coil at the rated point (coils of a phase in series carry the phase current; with
 * parallel paths, divide by them); null or omitted gives no copper loss. `frequencyHz`
 * is the electrical frequency at rated speed; null or omitted gives no AC figures.
 * Throws {@link EngineeringInputError} for a line that cannot be calculated.
 */
export function coilLineFigures(
  line: CoilLine,
  ratedCurrentA: number | null = null,
  frequencyHz: number | null = null,
): CoilLineFigures {
  // A costing asks for the same line's figures several times (quantities, cost split,
  // winding figures): worked out once per line object and current, then remembered
  // while the line object lives. Lines are values, never changed in place.
  const key = `${ratedCurrentA}|${frequencyHz}`;
  let known = figuresByLine.get(line);
  const found = known?.get(key);
  if (found) return found;
  const figures = workOutCoilLineFigures(line, ratedCurrentA, frequencyHz);
  if (!known) figuresByLine.set(line, (known = new Map()));
  known.set(key, figures);
  return figures;
}

const figuresByLine = new WeakMap<CoilLine, Map<string, CoilLineFigures>>();

function workOutCoilLineFigures(
  line: CoilLine,
  ratedCurrentA: number | null,
  frequencyHz: number | null,
): CoilLineFigures {
  assertDesignLine(line);
  const input = coilEstimateInputFor(line, ratedCurrentA, frequencyHz);
  const estimate = estimateCoil(input);
  const perCoil = estimate.perCoil;

  const enamelled = line.wire.enamelledLinearMassKgPerM;
  const massBasis: DrawnMassBasis = enamelled === null ? "bare" : "enamelled";
  const drawnMassKg =
    enamelled === null
      ? estimate.total.purchasedMassKg
      : estimate.total.purchasedLengthM * enamelled;
  const drawnMass = massKgFromEstimate(drawnMassKg);

  // Mass follows length (one linear mass for the whole wire), so the drawn mass splits
  // as the drawn length of one coil does: active sides, end turns, and the rest (leads,
  // plus the scrap drawn beyond the wound length).
  const split = conductorSplit(input);
  const scrapM = Math.max(
    0,
    perCoil.purchasedLengthM - perCoil.conductorLengthM,
  );
  const [activeDigits, endTurnDigits, leadsAndScrapDigits] = apportion(
    drawnMass.digits,
    weightsFromShares([split.activeM, split.endTurnM, split.leadM + scrapM]),
  );

  return {
    bareDiameterMm: estimate.wire.bareDiameterMm,
    meanTurnLengthMm: estimate.meanTurnLengthMm,
    activeShare: estimate.activeShare,
    copperLengthM: estimate.total.conductorLengthM,
    drawnLengthM: estimate.total.purchasedLengthM,
    drawnMassKg,
    drawnMass,
    massBasis,
    drawnMassSplit: {
      activeKg: exactKg(activeDigits!),
      endTurnKg: exactKg(endTurnDigits!),
      leadsAndScrapKg: exactKg(leadsAndScrapDigits!),
    },
    resistance20PerCoilOhm: perCoil.resistance20Ohm,
    resistancePerCoilOhm: perCoil.resistanceOhm,
    operatingTemperatureC: line.operatingTemperatureC,
    copperLossW: estimate.copperLossW,
    forceLengthM: estimate.total.forceLengthM,
    currentDensityAPerMm2: perCoil.currentDensityAPerMm2,
    skinDepthMm: perCoil.skinDepthMm,
    acResistanceRatio: perCoil.acResistanceRatio,
  };
}
