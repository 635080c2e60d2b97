/**
 * Figures the item page works out from a stocked item's attributes: the
 * length a wire stock can be (from the bare conductor's linear mass) and the
 * mass of stocked magnets (from the grade's density and the piece's shape).
 * Pure: built on the engineering modules.
 */
import {
  estimateMagnet,
  type MagnetShape,
} from "~/engineering/magnet-estimate";
import type { ConductorKey, MagnetGrade } from "~/engineering/reference-data";
import { maxLengthFromMassM } from "~/engineering/spool";
import { wireProperties, type WireSpec } from "~/engineering/wire-geometry";
import { magnetShapes } from "~/db/tables/stock-enums";

export { magnetDimensionsText } from "./magnet-dimensions-text";

export interface WireStockFigures {
  bareDiameterMm: number;
  /** Bare conductor mass per metre, kg/m. */
  linearMassKgPerM: number;
  /**
   * Metres the stock can be at most: kg on hand ÷ bare linear mass. Stock is
   * weighed with its enamel, which is about 2 % of the mass at 1.0 mm and about
   * 5 % at 0.2 mm (engineering brief), so the true length is a few per cent less.
   */
  maxLengthM: number;
}

/** The wire size as stored ("20", "0000", "0.500") as the engineering modules take it. */
export function wireSpecOf(
  standard: "AWG" | "IEC",
  sizeLabel: string,
): WireSpec {
  return standard === "AWG"
    ? { standard, size: sizeLabel }
    : { standard, diameterMm: Number(sizeLabel) };
}

export function wireStockFigures(input: {
  conductor: ConductorKey;
  standard: "AWG" | "IEC";
  sizeLabel: string;
  onHandKg: number;
}): WireStockFigures {
  const properties = wireProperties({
    conductor: input.conductor,
    wire: wireSpecOf(input.standard, input.sizeLabel),
  });
  return {
    bareDiameterMm: properties.bareDiameterMm,
    linearMassKgPerM: properties.linearMassKgPerM,
    maxLengthM: maxLengthFromMassM(
      Math.max(0, input.onHandKg),
      properties.linearMassKgPerM,
    ),
  };
}

/** A stored magnet shape (the kind, and its dimensions in mm as JSON) as the magnet estimate takes it; null when unreadable. */
export function magnetShapeOf(
  kind: string,
  dimensionsJson: string,
): MagnetShape | null {
  if (!(magnetShapes as readonly string[]).includes(kind)) return null;
  try {
    const dimensions = JSON.parse(dimensionsJson) as unknown;
    if (!dimensions || typeof dimensions !== "object") return null;
    return { ...(dimensions as Record<string, number>), kind } as MagnetShape;
  } catch {
    return null;
  }
}

/** Mass of one piece and of the pieces on hand, kg. */
export function magnetStockFigures(input: {
  grade: MagnetGrade;
  shape: MagnetShape;
  pieces: number;
}) {
  const estimate = estimateMagnet({
    grade: input.grade,
    shape: input.shape,
    count: Math.max(1, input.pieces),
  });
  return {
    volumeMm3: estimate.volumeMm3,
    massPerPieceKg: estimate.massPerPieceKg,
    totalMassKg: estimate.massPerPieceKg * Math.max(0, input.pieces),
  };
}
