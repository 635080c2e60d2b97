/**
 * What a coil does in operation, beyond its DC figures: current density, skin depth and AC
 * resistance at a frequency (Dowell), loss at the fundamental and chosen harmonics, and the
 * operating temperature found together with its loss. Part of POST /api/v1/coil-estimates.
 *
 * All per coil unless named total. The current is the RMS current through the coil's
 * terminals at the fundamental; harmonics give their own RMS currents.
 */

import {
  conductorAcResistanceFactor,
  type CoilConductor,
} from "./coil-conductor";
import { currentDensityAPerMm2 } from "./current-density";
import { EngineeringInputError } from "./errors";
import type { ConductorKey } from "./reference-data";
import {
  harmonicLosses,
  skinDepthMm,
  type HarmonicCurrent,
  type HarmonicLoss,
} from "./skin-effect";
import { windingTemperature, type ThermalInput } from "./winding-temperature";
import {
  resistanceTemperatureFactor,
  resistivityOhmMm2PerM,
} from "./wire-geometry";

export interface CoilOperatingInput {
  conductor: ConductorKey;
  coilConductor: CoilConductor;
  strandsInHand: number;
  coilCount: number;
  /** DC resistance of one coil at 20 °C, Ω. */
  resistance20Ohm: number;
  /** Conductor temperature of the estimate, °C. */
  temperatureC: number;
  currentA?: number | null;
  frequencyHz?: number | null;
  harmonics?: readonly HarmonicCurrent[] | null;
  /** Layers of conductors in each coil, for Dowell; omitted → 1 (flagged as assumed). */
  layersPerCoil?: number | null;
  thermal?: ThermalInput | null;
}

/** The four figures added to perCoil; each null when its input (current, frequency) is absent. */
export interface CoilOperatingPerCoil {
  /** I / (strands in hand × copper area), A/mm²; null without a current. */
  currentDensityAPerMm2: number | null;
  /** Skin depth at the fundamental and the estimate's temperature, mm; null without a frequency. */
  skinDepthMm: number | null;
  /** AC resistance at the fundamental and the estimate's temperature, Ω; null without a frequency. */
  acResistanceOhm: number | null;
  /** R_ac / R_dc at the fundamental (Dowell); null without a frequency. */
  acResistanceRatio: number | null;
}

export interface CoilAcLoss {
  frequencyHz: number;
  layersPerCoil: number;
  /** True when no layer count was given and one layer was assumed (the least proximity loss). */
  layersAssumed: boolean;
  temperatureC: number;
  /** The fundamental (order 1) and each harmonic: frequency, current, R_ac and loss per coil. */
  harmonics: HarmonicLoss[];
  lossPerCoilW: number;
  totalLossW: number;
}

export interface CoilOperatingPoint {
  method: "thermal-resistance" | "temperature-rise";
  ambientC: number;
  temperatureC: number;
  /** DC resistance of one coil at the operating temperature, Ω. */
  resistanceOhm: number;
  /** AC resistance at the fundamental at that temperature, Ω; null without a frequency. */
  acResistanceOhm: number | null;
  /** Loss of one coil at that temperature (with harmonics when given), W. */
  lossPerCoilW: number;
  totalLossW: number;
  iterations: number;
}

export interface CoilOperatingFigures {
  perCoil: CoilOperatingPerCoil;
  acLoss: CoilAcLoss | null;
  operatingPoint: CoilOperatingPoint | null;
}

/** The coil's current density, AC figures and operating point (see the module comment). */
export function coilOperatingFigures(
  input: CoilOperatingInput,
): CoilOperatingFigures {
  const currentA = input.currentA ?? null;
  const frequencyHz = input.frequencyHz ?? null;
  const harmonics = input.harmonics ?? [];
  const layers = input.layersPerCoil ?? 1;
  if (!Number.isInteger(layers) || layers < 1) {
    throw new EngineeringInputError(
      "layersPerCoil",
      "The layers per coil must be a whole number of at least 1.",
    );
  }
  if (harmonics.length > 0 && frequencyHz === null) {
    throw new EngineeringInputError(
      "frequencyHz",
      "Give the fundamental frequency with the harmonics.",
    );
  }
  if (harmonics.length > 0 && currentA === null) {
    throw new EngineeringInputError(
      "currentA",
      "Give the current (the fundamental's RMS current) with the harmonics.",
    );
  }
  if (input.thermal && currentA === null) {
    throw new EngineeringInputError(
      "currentA",
      "Give a current to find the operating temperature.",
    );
  }

  const dcResistanceAt = (temperatureC: number) =>
    input.resistance20Ohm *
    resistanceTemperatureFactor(input.conductor, temperatureC);
  const acRatioAt = (hz: number, temperatureC: number) =>
    conductorAcResistanceFactor(
      input.coilConductor,
      skinDepthMm(resistivityOhmMm2PerM(input.conductor, temperatureC), hz),
      layers,
    );
  /** Loss of one coil at a temperature: I² R_dc without a frequency, else Σ I_h² R_ac(f_h). */
  const lossAt = (temperatureC: number): number => {
    const current = currentA ?? 0;
    if (frequencyHz === null)
      return current ** 2 * dcResistanceAt(temperatureC);
    return harmonicLosses(
      frequencyHz,
      current,
      harmonics,
      (hz) => dcResistanceAt(temperatureC) * acRatioAt(hz, temperatureC),
    ).lossW;
  };

  const temperatureC = input.temperatureC;
  const ratio =
    frequencyHz === null ? null : acRatioAt(frequencyHz, temperatureC);
  const perCoil: CoilOperatingPerCoil = {
    currentDensityAPerMm2:
      currentA === null
        ? null
        : currentDensityAPerMm2(
            currentA,
            input.strandsInHand,
            input.coilConductor.areaMm2,
          ),
    skinDepthMm:
      frequencyHz === null
        ? null
        : skinDepthMm(
            resistivityOhmMm2PerM(input.conductor, temperatureC),
            frequencyHz,
          ),
    acResistanceOhm:
      ratio === null ? null : dcResistanceAt(temperatureC) * ratio,
    acResistanceRatio: ratio,
  };

  let acLoss: CoilAcLoss | null = null;
  if (frequencyHz !== null && currentA !== null) {
    const { losses, lossW } = harmonicLosses(
      frequencyHz,
      currentA,
      harmonics,
      (hz) => dcResistanceAt(temperatureC) * acRatioAt(hz, temperatureC),
    );
    acLoss = {
      frequencyHz,
      layersPerCoil: layers,
      layersAssumed:
        input.layersPerCoil === undefined || input.layersPerCoil === null,
      temperatureC,
      harmonics: losses,
      lossPerCoilW: lossW,
      totalLossW: lossW * input.coilCount,
    };
  }

  let operatingPoint: CoilOperatingPoint | null = null;
  if (input.thermal) {
    const found = windingTemperature(input.thermal, lossAt);
    operatingPoint = {
      method: found.method,
      ambientC: input.thermal.ambientC,
      temperatureC: found.temperatureC,
      resistanceOhm: dcResistanceAt(found.temperatureC),
      acResistanceOhm:
        frequencyHz === null
          ? null
          : dcResistanceAt(found.temperatureC) *
            acRatioAt(frequencyHz, found.temperatureC),
      lossPerCoilW: found.lossW,
      totalLossW: found.lossW * input.coilCount,
      iterations: found.iterations,
    };
  }

  return { perCoil, acLoss, operatingPoint };
}
