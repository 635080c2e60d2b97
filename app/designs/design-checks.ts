/**
 * Warnings shown on a design:
 * - a wire whose thermal class is below the design's insulation class: the wire's class
 *   must be at least the motor's (IEC 60085; brief, "Thermal classes");
 * - a coil whose slot is filled beyond what random-wound round wire reaches, 0.45 (common
 *   practice, brief), or beyond the geometric packing limits π/4 and π/√12 (brief), via
 *   the slot-fill module;
 * - a magnet whose operating temperature is above its grade's maximum working temperature:
 *   it may lose magnetisation for good (makers' tables; brief).
 */

import {
  THERMAL_CLASSES,
  isWireClassSufficient,
} from "~/engineering/reference-data";
import {
  assessSlotFill,
  type SlotFill,
  type SlotFillWarningCode,
} from "~/engineering/slot-fill";
import { circleAreaMm2 } from "~/engineering/wire-geometry";
import {
  designWireBareDiameterMm,
  type CoilLine,
  type DesignLine,
  type MagnetLine,
} from "./design-lines";

export type DesignWarningCode =
  | "wire-class-below-insulation-class"
  | SlotFillWarningCode
  | "magnet-above-max-working-temperature";

export interface DesignWarning {
  code: DesignWarningCode;
  /** Index of the line in the design's lines. */
  lineIndex: number;
  sku: string;
  message: string;
}

/** "155 (F)" for a class whose IEC 60085 letter the reference data holds, else "155". */
export function thermalClassName(classC: number): string {
  const row = THERMAL_CLASSES.find((entry) => entry.classC === classC);
  return row ? `${classC} (${row.letter})` : String(classC);
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
 * Net conductor fill of the coil line's slot: turns × strands × coil sides per slot ×
 * bare strand area ÷ slot area; null when the line has no slot.
 */
export function coilSlotFillFactor(line: CoilLine): number | null {
  return coilSlotFill(line)?.fillFactor ?? null;
}

/** The slot-fill module's assessment of the line's slot, or null without a slot. */
function coilSlotFill(line: CoilLine): SlotFill | null {
  if (!line.slot) return null;
  return assessSlotFill({
    turns: line.turns * line.slot.coilSidesPerSlot,
    strandsInHand: line.strandsInHand,
    bareAreaMm2: circleAreaMm2(designWireBareDiameterMm(line.wire)),
    slotAreaMm2: line.slot.areaMm2,
  });
}

/** The slot-fill warning of a coil line (most serious limit passed), or null. */
export function slotFillDesignWarning(
  line: CoilLine,
  lineIndex: number,
): DesignWarning | null {
  const warning = coilSlotFill(line)?.fillWarning ?? null;
  if (!warning) return null;
  return {
    code: warning.code,
    lineIndex,
    sku: line.wire.sku,
    message: `Coil line ${lineIndex + 1} (${line.wire.sku}): ${warning.message}`,
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
 * Every warning of a design, in line order. `insulationClassC` is the design's insulation
 * class, °C; null skips the wire class check.
 */
export function designWarnings(input: {
  lines: readonly DesignLine[];
  insulationClassC: number | null;
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
    } else if (line.kind === "magnet") {
      const temperatureWarning = magnetTemperatureWarning(line, lineIndex);
      if (temperatureWarning) warnings.push(temperatureWarning);
    }
  });
  return warnings;
}
