import { formatNumber, formatQuantity } from "~/lib/format";
/**
 * Warnings shown on a design:
 * - a wire whose thermal class is below the design's insulation class: the wire's class
 *   must be at least the motor's (IEC 60085; brief, "Thermal classes");
 * - a coil whose slot is filled beyond what random-wound round wire reaches, 0.45 (common
 *   practice, brief), or beyond the geometric packing limits π/4 and π/√12 (brief), judged
 *   on GROSS fill (over the enamel, liner subtracted) via the slot-fill module — on copper
 *   fill, with a note, only when the wire's overall diameter is unknown;
 * - a magnet whose operating temperature is above its grade's maximum working temperature:
 *   it may lose magnetisation for good (makers' tables; brief);
 * - a coil whose current density J = I / (strands × bare area) at the rated current is
 *   above what its cooling usually carries (COMMON PRACTICE, FROM MEMORY: roughly up to
 *   5–6 A/mm² enclosed with natural cooling, about 10 A/mm² fan-cooled, more only with
 *   liquid cooling or short duty). No published source was checked for these ranges.
 */

import { isWireClassSufficient } from "~/engineering/reference-data";
import {
  assessSlotFill,
  type SlotFill,
  type SlotFillWarningCode,
} from "~/engineering/slot-fill";
import { THERMAL_CLASS_LETTERS } from "~/engineering/thermal-class-letters";
import { circleAreaMm2 } from "~/engineering/wire-geometry";
import {
  currentDensityAPerMm2,
  currentDensityPractice,
} from "~/engineering/current-density";

export { currentDensityPractice };
import {
  designWireBareDiameterMm,
  designWireOverallDiameterMm,
  type CoilLine,
  type DesignLine,
  type MagnetLine,
} from "./design-lines";

export type DesignWarningCode =
  | "wire-class-below-insulation-class"
  | SlotFillWarningCode
  | "magnet-above-max-working-temperature"
  | CurrentDensityWarningCode;

export type CurrentDensityWarningCode =
  "current-density-above-natural-cooling" | "current-density-above-fan-cooling";

/** Each check's name, as the release confirmation lists the checks still open. */
export const designCheckNames: Record<DesignWarningCode, string> = {
  "wire-class-below-insulation-class": "Wire thermal class",
  "above-random-round-wire-practice": "Slot fill",
  "above-square-packing-limit": "Slot fill",
  "above-hexagonal-packing-limit": "Slot fill",
  "magnet-above-max-working-temperature": "Magnet temperature",
  "current-density-above-natural-cooling": "Current density",
  "current-density-above-fan-cooling": "Current density",
};

export interface DesignWarning {
  code: DesignWarningCode;
  /** Index of the line in the design's lines. */
  lineIndex: number;
  sku: string;
  message: string;
}

/** "155 (F)" for a class whose IEC 60085 letter the reference data holds, else "155". */
export function thermalClassName(classC: number): string {
  const row = THERMAL_CLASS_LETTERS.find(([entryC]) => entryC === classC);
  return row ? `${classC} (${row[1]})` : String(classC);
}

/** Warning when the coil line's wire class is below the design's insulation class, else null. */
export function wireClassWarning(
  line: CoilLine,
  lineIndex: number,
  insulationClassC: number,
): DesignWarning | null {
  if (isWireClassSufficient(line.wire.thermalClassC, insulationClassC)) {
    return null;
  }
  return {
    code: "wire-class-below-insulation-class",
    lineIndex,
    sku: line.wire.sku,
    message: `Wire ${line.wire.sku} is thermal class ${thermalClassName(line.wire.thermalClassC)}, below the design's insulation class ${thermalClassName(insulationClassC)}. Use wire of class ${insulationClassC} or higher.`,
  };
}

/**
 * Copper fill of the coil line's slot: turns × strands × coil sides per slot × bare
 * strand area ÷ slot area; null when the line has no slot.
 */
export function coilSlotFillFactor(line: CoilLine): number | null {
  return coilSlotFill(line)?.copperFill ?? null;
}

/**
 * The slot-fill module's assessment of the line's slot (copper fill, gross fill over the
 * wire's maximum overall diameter, the limits judged on gross fill), or null without a slot.
 */
export function coilSlotFill(line: CoilLine): SlotFill | null {
  if (!line.slot) return null;
  return assessSlotFill({
    turns: line.turns,
    coilSidesPerSlot: line.slot.coilSidesPerSlot,
    strands: line.strandsInHand,
    bareDiameterMm: designWireBareDiameterMm(line.wire),
    overallDiameterMm: designWireOverallDiameterMm(line.wire),
    slotAreaMm2: line.slot.areaMm2,
    linerAreaMm2: line.slot.linerAreaMm2 ?? null,
  });
}

/** The slot-fill warning of a coil line (most serious limit passed), or null. */
export function slotFillDesignWarning(
  line: CoilLine,
  lineIndex: number,
): DesignWarning | null {
  const fill = coilSlotFill(line);
  if (!fill?.warning) return null;
  const note = fill.note ? ` ${fill.note}` : "";
  return {
    code: fill.warning.code,
    lineIndex,
    sku: line.wire.sku,
    message: `Coil line ${lineIndex + 1} (${line.wire.sku}): ${fill.warning.message}${note}`,
  };
}

/** Warning when the magnet's operating temperature is above its grade's maximum working temperature, else null. */
export function magnetTemperatureWarning(
  line: MagnetLine,
  lineIndex: number,
): DesignWarning | null {
  const temperatureC = line.operatingTemperatureC;
  const limitC = line.magnet.maxWorkingTemperatureC;
  if (temperatureC === null || temperatureC <= limitC) return null;
  return {
    code: "magnet-above-max-working-temperature",
    lineIndex,
    sku: line.magnet.sku,
    message: `Magnet ${line.magnet.sku} (${line.magnet.gradeName}) runs at ${temperatureC} °C, above the grade's ${limitC} °C maximum working temperature: it may lose magnetisation for good. Choose a higher temperature grade.`,
  };
}

/**
 * Current density in the coil's copper at `ratedCurrentA` through the coil, A/mm²: the
 * strands in hand share the current, so J = I / (strands × π/4 · d²) with d the bare
 * diameter. Null when the current is not a positive number.
 */
export function coilCurrentDensityAPerMm2(
  line: CoilLine,
  ratedCurrentA: number | null,
): number | null {
  if (ratedCurrentA === null || !Number.isFinite(ratedCurrentA)) return null;
  if (ratedCurrentA <= 0) return null;
  return currentDensityAPerMm2(
    ratedCurrentA,
    line.strandsInHand,
    circleAreaMm2(designWireBareDiameterMm(line.wire)),
  );
}

const densityText = (value: number) => `${formatQuantity(value, "", 1)} A/mm²`;
/** A coil current to three significant decimals at most: 6, 2.5, 3.333. */
const formatCurrent = (value: number) => formatNumber(value, 3);

/** Warning when the coil's current density is above natural (or fan) cooling practice, else null. */
export function currentDensityWarning(
  line: CoilLine,
  lineIndex: number,
  ratedCurrentA: number | null,
): DesignWarning | null {
  const density = coilCurrentDensityAPerMm2(line, ratedCurrentA);
  if (density === null) return null;
  const { naturalCoolingAPerMm2, fanCooledAPerMm2 } = currentDensityPractice;
  if (density <= naturalCoolingAPerMm2) return null;
  const strands =
    line.strandsInHand > 1 ? ` in ${line.strandsInHand} strands` : "";
  const at = `Coil line ${lineIndex + 1} (${line.wire.sku}) carries ${densityText(density)} at ${formatCurrent(ratedCurrentA ?? 0)} A per coil${strands} at the rated point`;
  const practice = `Common practice (from memory): up to about 5–6 A/mm² enclosed with natural cooling, about ${fanCooledAPerMm2} A/mm² fan-cooled, more only with liquid cooling or short duty.`;
  return density > fanCooledAPerMm2
    ? {
        code: "current-density-above-fan-cooling",
        lineIndex,
        sku: line.wire.sku,
        message: `${at}: above what even fan cooling carries. Use thicker wire or more strands in hand, or plan liquid cooling or short duty. ${practice}`,
      }
    : {
        code: "current-density-above-natural-cooling",
        lineIndex,
        sku: line.wire.sku,
        message: `${at}: above natural cooling, it needs a fan. ${practice}`,
      };
}

/**
 * Every warning of a design, in line order. `insulationClassC` is the design's insulation
 * class, °C; null skips the wire class check. `ratedCurrentA` is the current through each
 * coil; null or absent skips the current density check.
 */
export function designWarnings(input: {
  lines: readonly DesignLine[];
  insulationClassC: number | null;
  ratedCurrentA?: number | null;
}): DesignWarning[] {
  const warnings: DesignWarning[] = [];
  input.lines.forEach((line, lineIndex) => {
    if (line.kind === "coil") {
      if (input.insulationClassC !== null) {
        const classWarning = wireClassWarning(
          line,
          lineIndex,
          input.insulationClassC,
        );
        if (classWarning) warnings.push(classWarning);
      }
      const fillWarning = slotFillDesignWarning(line, lineIndex);
      if (fillWarning) warnings.push(fillWarning);
      const densityWarning = currentDensityWarning(
        line,
        lineIndex,
        input.ratedCurrentA ?? null,
      );
      if (densityWarning) warnings.push(densityWarning);
    } else if (line.kind === "magnet") {
      const temperatureWarning = magnetTemperatureWarning(line, lineIndex);
      if (temperatureWarning) warnings.push(temperatureWarning);
    }
  });
  return warnings;
}
