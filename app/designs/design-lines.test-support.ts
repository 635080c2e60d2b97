/**
 * Test support: design lines built on the engineering brief's worked check 4
 * (l_active 50 mm, l_end 30 mm, N 40, 0.80 mm copper, one strand).
 */

import { EngineeringInputError } from "~/engineering/errors";
import { parseExactDecimal } from "~/pricing/money";
import type {
  CoilLine,
  DesignWire,
  MagnetLine,
  PartLine,
} from "./design-lines";

/** 0.80 mm IEC copper, class 155, enamelled mass unknown. */
export const WIRE_080: DesignWire = {
  itemId: 1,
  sku: "CU-0.80-G2",
  conductor: "copper",
  size: { standard: "IEC", diameterMm: 0.8 },
  enamelledLinearMassKgPerM: null,
  thermalClassC: 155,
};

/** The coil of worked check 4 without leads or scrap, one coil per motor, at 20 °C. */
export function checkFourCoil(overrides: Partial<CoilLine> = {}): CoilLine {
  return {
    kind: "coil",
    wire: WIRE_080,
    turns: 40,
    strandsInHand: 1,
    activeLengthMm: 50,
    endTurnLengthMm: 30,
    leadLengthMm: 0,
    coilsPerMotor: 1,
    scrapPercent: 0,
    operatingTemperatureC: 20,
    slot: null,
    ...overrides,
  };
}

/** Magnet line: N42SH pieces of 7.5 g (item 2), 150 °C limit (brief). */
export function n42shMagnets(overrides: Partial<MagnetLine> = {}): MagnetLine {
  return {
    kind: "magnet",
    magnet: {
      itemId: 2,
      sku: "MAG-N42SH-20x10x5",
      gradeName: "N42SH",
      massPerPieceKg: 0.0075,
      maxWorkingTemperatureC: 150,
    },
    piecesPerMotor: 10,
    operatingTemperatureC: null,
    ...overrides,
  };
}

/** Part line of `quantity` (decimal text) of item `itemId`. */
export function partLine(
  itemId: number,
  sku: string,
  unit: string,
  quantity: string,
): PartLine {
  return {
    kind: "part",
    part: { itemId, sku, unit },
    quantityPerMotor: parseExactDecimal(quantity),
  };
}

/** A small deterministic pseudo-random generator (LCG) for property-style tests. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}

/** The `field` of the EngineeringInputError `attempt` throws; "no error" when it throws none. */
export function fieldOfError(attempt: () => unknown): string {
  try {
    attempt();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.field;
    throw error;
  }
  return "no error";
}
