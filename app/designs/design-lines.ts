/**
 * The lines of a motor design revision, as the pure design calculations take them: coil
 * lines (a wire wound into coils), magnet lines and part lines. Everything is per motor.
 *
 * The database rows are mapped onto these types by the data layer; nothing here reads a
 * database or a framework. `assertDesignLine` refuses input no calculation can use (zero
 * turns, a negative length …) with an {@link EngineeringInputError} naming the field, so a
 * route can answer 400 field by field.
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "~/engineering/errors";
import type { ConductorKey, InsulationKey } from "~/engineering/reference-data";
import {
  bareDiameterMm,
  overallDiameter,
  type WireSpec,
} from "~/engineering/wire-geometry";
import type { ExactDecimal } from "~/pricing/money";

/** The catalogue item a line uses: its id and SKU (both unique). */
export interface DesignItemRef {
  itemId: number;
  sku: string;
}

/** A wire item as a coil line needs it. */
export interface DesignWire extends DesignItemRef {
  conductor: ConductorKey;
  /**
   * The catalogued size (AWG label or IEC nominal diameter). The bare diameter follows
   * from it exactly as in the coil estimator (ASTM B258 formula, IEC 60317-0-1 nominal);
   * see {@link designWireBareDiameterMm}.
   */
  size: WireSpec;
  /**
   * Mass of one metre of the enamelled wire (one strand), kg/m, from the supplier's data
   * or a weighed length; null when unknown, and the bare conductor mass is used instead.
   */
  enamelledLinearMassKgPerM: number | null;
  /** Thermal class of the wire's insulation (IEC 60085), °C: 130, 155, 180, 200, 220 … */
  thermalClassC: number;
  /** Enamel grade (IEC) or film build (AWG) of the catalogue item, for the overall diameter; null/absent when not catalogued. */
  insulation?: InsulationKey | null;
}

/** The slot a coil side lies in, for the fill factor. */
export interface CoilSlot {
  /** Whole slot area, mm². */
  areaMm2: number;
  /** Slot liner and separator area taken from the slot area, mm²; null/absent when not given. */
  linerAreaMm2?: number | null;
  /** Coil sides sharing one slot: 1 for a single-layer winding, 2 for a double-layer one. */
  coilSidesPerSlot: number;
}

/** A coil line: `coilsPerMotor` identical coils wound from one wire item. */
export interface CoilLine {
  kind: "coil";
  wire: DesignWire;
  /** Turns per coil, integer ≥ 1. */
  turns: number;
  /** Strands wound in hand (in parallel), integer ≥ 1. */
  strandsInHand: number;
  /** Straight length of each coil side in the field, mm, > 0. */
  activeLengthMm: number;
  /** Length of each of the two end connections (per end), mm, ≥ 0. */
  endTurnLengthMm: number;
  /** Length of each of the two leads, mm, ≥ 0. */
  leadLengthMm: number;
  /** Identical coils in one motor, integer ≥ 1. */
  coilsPerMotor: number;
  /** Extra wire drawn from stock (start-up, cut-offs, test pieces), %, ≥ 0. */
  scrapPercent: number;
  /** Conductor temperature at the rated point, °C. */
  operatingTemperatureC: number;
  /** The slot one coil side lies in; null when not given (no fill factor). */
  slot?: CoilSlot | null;
}

/** A magnet item as a magnet line needs it. */
export interface DesignMagnet extends DesignItemRef {
  /** Grade name as written, "N42SH". */
  gradeName: string;
  /** Mass of one piece, kg. */
  massPerPieceKg: number;
  /** The grade's maximum working temperature, °C. */
  maxWorkingTemperatureC: number;
}

/** A magnet line: pieces of one magnet item per motor. */
export interface MagnetLine {
  kind: "magnet";
  magnet: DesignMagnet;
  /** Pieces per motor, integer ≥ 1. */
  piecesPerMotor: number;
  /** Magnet temperature at the rated point, °C; null when not given (not checked). */
  operatingTemperatureC: number | null;
}

/** Any other item (bearing, lamination stack, shaft …) with its stock unit. */
export interface DesignPart extends DesignItemRef {
  /** The item's stock unit: "pcs", "kg", "m". */
  unit: string;
}

/** A part line: a quantity of one item per motor, in the item's unit. */
export interface PartLine {
  kind: "part";
  part: DesignPart;
  /** Quantity per motor in the item's unit, exact, > 0. */
  quantityPerMotor: ExactDecimal;
}

export type DesignLine = CoilLine | MagnetLine | PartLine;
export type DesignLineKind = DesignLine["kind"];

/** The item a line draws from stock. */
export function lineItem(line: DesignLine): DesignItemRef {
  switch (line.kind) {
    case "coil":
      return line.wire;
    case "magnet":
      return line.magnet;
    case "part":
      return line.part;
  }
}

/** Bare conductor diameter of one strand of the wire, mm (same lookup as the coil estimator). */
export function designWireBareDiameterMm(wire: DesignWire): number {
  return bareDiameterMm(wire.size);
}

/**
 * Maximum overall diameter of one strand over its enamel, mm (published, else the labelled
 * estimate of the wire-geometry module); null when the item names no insulation, or one
 * that does not belong to its standard, or the size is outside the estimate's range.
 */
export function designWireOverallDiameterMm(wire: DesignWire): number | null {
  if (!wire.insulation) return null;
  try {
    return overallDiameter(wire.size, wire.insulation).overallDiameterMm;
  } catch {
    return null;
  }
}

function requireWholeNumberAtLeastOne(
  value: number,
  field: string,
  label: string,
): void {
  if (!Number.isInteger(value) || value < 1) {
    throw new EngineeringInputError(
      field,
      `${label} must be a whole number of at least 1.`,
    );
  }
}

function requireFinite(value: number, field: string, label: string): void {
  if (!Number.isFinite(value)) {
    throw new EngineeringInputError(field, `${label} must be a number.`);
  }
}

function assertCoilLine(line: CoilLine): void {
  requireWholeNumberAtLeastOne(line.turns, "turns", "Turns");
  requireWholeNumberAtLeastOne(
    line.strandsInHand,
    "strandsInHand",
    "Strands in hand",
  );
  requirePositive(line.activeLengthMm, "activeLengthMm", "Active length");
  requireNonNegative(
    line.endTurnLengthMm,
    "endTurnLengthMm",
    "End-turn length",
  );
  requireNonNegative(line.leadLengthMm, "leadLengthMm", "Lead length");
  requireWholeNumberAtLeastOne(
    line.coilsPerMotor,
    "coilsPerMotor",
    "Coils per motor",
  );
  requireNonNegative(line.scrapPercent, "scrapPercent", "Scrap");
  requireFinite(
    line.operatingTemperatureC,
    "operatingTemperatureC",
    "Operating temperature",
  );
  if (line.wire.enamelledLinearMassKgPerM !== null) {
    requirePositive(
      line.wire.enamelledLinearMassKgPerM,
      "wire.enamelledLinearMassKgPerM",
      "Enamelled wire mass per metre",
    );
  }
  if (line.slot) {
    requirePositive(line.slot.areaMm2, "slot.areaMm2", "Slot area");
    const liner = line.slot.linerAreaMm2;
    if (liner !== undefined && liner !== null) {
      requireNonNegative(liner, "slot.linerAreaMm2", "Slot liner area");
      if (liner >= line.slot.areaMm2)
        throw new EngineeringInputError(
          "slot.linerAreaMm2",
          "The slot liner and separator area must be less than the slot area.",
        );
    }
    requireWholeNumberAtLeastOne(
      line.slot.coilSidesPerSlot,
      "slot.coilSidesPerSlot",
      "Coil sides per slot",
    );
  }
  // Throws for an AWG label or IEC diameter that is not in the tables.
  designWireBareDiameterMm(line.wire);
}

/**
 * Throws an {@link EngineeringInputError} (field named as in the line) when a line cannot
 * be calculated: turns, strands, coils or pieces not whole and ≥ 1, active length ≤ 0,
 * negative end-turn, lead or scrap, unknown wire size, part quantity ≤ 0.
 */
export function assertDesignLine(line: DesignLine): void {
  switch (line.kind) {
    case "coil":
      assertCoilLine(line);
      return;
    case "magnet":
      requireWholeNumberAtLeastOne(
        line.piecesPerMotor,
        "piecesPerMotor",
        "Pieces per motor",
      );
      requireNonNegative(
        line.magnet.massPerPieceKg,
        "magnet.massPerPieceKg",
        "Mass per piece",
      );
      if (line.operatingTemperatureC !== null) {
        requireFinite(
          line.operatingTemperatureC,
          "operatingTemperatureC",
          "Magnet temperature",
        );
      }
      return;
    case "part":
      if (line.quantityPerMotor.digits <= 0n) {
        throw new EngineeringInputError(
          "quantityPerMotor",
          "Quantity per motor must be greater than zero.",
        );
      }
      return;
  }
}

/** Magnet mass in one motor, kg: mass per piece × pieces per motor. */
export function magnetMassPerMotorKg(line: MagnetLine): number {
  return line.magnet.massPerPieceKg * line.piecesPerMotor;
}
