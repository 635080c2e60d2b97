/**
 * The winding figures of a design revision as its page and the costing API show them:
 * the winding factor, Kt and line-to-line Ke, the resistance between two terminals at
 * 20 °C and at the coils' operating temperature, and the electrical frequency at the rated
 * speed — each with what is missing or refused instead when it cannot be worked out, so a
 * revision the calculation cannot use shows a message, never an error page.
 *
 * Every formula is in `~/engineering/winding-factor` and `~/engineering/motor-constants`;
 * this module maps a revision onto them. Pure.
 */

import { isEngineeringInputError } from "~/engineering/errors";
import {
  CURRENT_BASIS_TEXT,
  electricalFrequencyHz,
  windingResistance,
  type MotorConstants,
} from "~/engineering/motor-constants";
import { coilLineFigures } from "./coil-line-figures";
import type { DesignLine } from "./design-lines";
import {
  designWindingFactors,
  estimateTorque,
  type DesignWinding,
} from "./torque-estimate";

export interface WindingFiguresInput {
  winding: DesignWinding;
  lines: readonly DesignLine[];
  /** RMS phase current, A. */
  ratedCurrentA: number;
  ratedSpeedRpm: number | null;
  airGapRadiusMm: number | null;
  airGapFluxDensityT: number | null;
  poleCoverage: number | null;
}

/** A figure, or why there is none. */
export type Figure<T> = { value: T } | { unavailable: string };

export interface WindingFigures {
  currentBasis: string;
  winding: DesignWinding;
  windingFactor: Figure<{
    fundamental: number;
    coilPitch: number;
    kind: "concentrated" | "distributed";
    harmonics: { order: number; factor: number }[];
  }>;
  /** Coils the lines give against those a winding of these slots and layers has; null when they agree or are unknown. */
  coilCountNote: string | null;
  constants: Figure<MotorConstants>;
  resistance: Figure<{
    lineToLine20Ohm: number;
    lineToLineHotOhm: number;
    phase20Ohm: number;
    phaseHotOhm: number;
    /** The coil lines' operating temperatures, °C, lowest first. */
    operatingTemperaturesC: number[];
  }>;
  electricalFrequency: Figure<number>;
}

function attempt<T>(calculate: () => T): Figure<T> {
  try {
    return { value: calculate() };
  } catch (error) {
    if (isEngineeringInputError(error)) return { unavailable: error.message };
    throw error;
  }
}

const coilLinesOf = (lines: readonly DesignLine[]) =>
  lines.filter((line) => line.kind === "coil");

/** The winding figures of a revision (see the module comment). */
export function designWindingFigures(
  input: WindingFiguresInput,
): WindingFigures {
  const { winding } = input;
  const coilLines = coilLinesOf(input.lines);
  const noCoils = "Add the coil lines of the winding.";

  const factors = attempt(() => designWindingFactors(winding));
  const windingFactor: WindingFigures["windingFactor"] =
    "value" in factors
      ? {
          value: {
            fundamental: factors.value.fundamental,
            coilPitch: factors.value.coilPitch,
            kind: factors.value.kind,
            harmonics: factors.value.harmonics,
          },
        }
      : factors;

  const totalCoils = coilLines.reduce(
    (sum, line) => sum + line.coilsPerMotor,
    0,
  );
  const expectedCoils =
    "value" in factors ? factors.value.coilsPerPhase * winding.phases : null;
  const coilCountNote =
    expectedCoils !== null && totalCoils > 0 && totalCoils !== expectedCoils
      ? `The coil lines give ${totalCoils} coils; a ${winding.layers === 2 ? "double" : "single"}-layer winding in ${winding.slots} slots has ${expectedCoils}. The figures use the coil lines.`
      : null;

  const missingTorqueFigures = [
    input.airGapRadiusMm === null ? "the air-gap radius" : null,
    input.airGapFluxDensityT === null ? "the air-gap flux density" : null,
  ].filter((text) => text !== null);
  const constants: Figure<MotorConstants> =
    coilLines.length === 0
      ? { unavailable: noCoils }
      : missingTorqueFigures.length > 0
        ? {
            unavailable: `Give ${missingTorqueFigures.join(" and ")} for Kt and Ke.`,
          }
        : attempt(
            () =>
              estimateTorque({
                lines: input.lines,
                winding,
                fluxDensity: {
                  source: "typed",
                  fluxDensityT: input.airGapFluxDensityT!,
                },
                ratedCurrentA: input.ratedCurrentA,
                airGapRadiusMm: input.airGapRadiusMm!,
                poleCoverage: input.poleCoverage,
              }).constants,
          );

  const resistance: WindingFigures["resistance"] =
    coilLines.length === 0
      ? { unavailable: noCoils }
      : attempt(() => {
          const figures = coilLines.map((line) => ({
            coils: line.coilsPerMotor,
            figures: coilLineFigures(line),
            temperatureC: line.operatingTemperatureC,
          }));
          const connection = {
            phases: winding.phases,
            connection: winding.connection,
            parallelPaths: winding.parallelPaths,
          };
          const cold = windingResistance({
            ...connection,
            coils: figures.map((line) => ({
              coils: line.coils,
              resistancePerCoilOhm: line.figures.resistance20PerCoilOhm,
            })),
          });
          const hot = windingResistance({
            ...connection,
            coils: figures.map((line) => ({
              coils: line.coils,
              resistancePerCoilOhm: line.figures.resistancePerCoilOhm,
            })),
          });
          return {
            lineToLine20Ohm: cold.lineToLineOhm,
            lineToLineHotOhm: hot.lineToLineOhm,
            phase20Ohm: cold.phaseOhm,
            phaseHotOhm: hot.phaseOhm,
            operatingTemperaturesC: [
              ...new Set(figures.map((line) => line.temperatureC)),
            ].sort((a, b) => a - b),
          };
        });

  const electricalFrequency: Figure<number> =
    input.ratedSpeedRpm === null
      ? { unavailable: "Give the rated speed for the electrical frequency." }
      : attempt(() =>
          electricalFrequencyHz(winding.poles, input.ratedSpeedRpm!),
        );

  return {
    currentBasis: CURRENT_BASIS_TEXT,
    winding,
    windingFactor,
    coilCountNote,
    constants,
    resistance,
    electricalFrequency,
  };
}
