/**
 * Substitutes from stock for a design's coil line: wire items in stock wound as n strands
 * in hand whose total copper area is within a tolerance of the line's (default ±3 %), that
 * still fit the slot on gross fill, with what changes per motor. Pure; the data layer
 * (wire-substitutes.server.ts) reads the stock and applies one.
 *
 * Rules (decision 037):
 * - Same conductor as the line's wire, on hand > 0, active (the data layer's query), thermal
 *   class at least the design's insulation class (IEC 60085; brief), and a size the tables
 *   know. The line's own wire at its own strand count is not a substitute.
 * - Area: n × A_candidate against strands × A_line, bare conductor (π/4 · d², ASTM B258 /
 *   IEC 60317-0-1 bare diameters). Every n with the change within the tolerance is offered.
 * - Fit (only when the revision has a slot area): the substituted winding must fit
 *   (gross fill ≤ π/√12) and pass no more serious fill limit than the line does today
 *   (0.45 random-wound practice, π/4, π/√12; slot-fill module). When the line's own fill is
 *   judged over the enamel, a candidate whose overall diameter is unknown is left out: its
 *   fit cannot be judged on gross fill.
 * - Changes per motor come from the design's own calculations: resistance and copper loss
 *   from coil-line-figures (R(T) with strands in parallel), mass drawn from stock likewise,
 *   cost from the design costing (costDesign) at each item's moving average cost of stock.
 * - Sorted by the size of the area change, then fewer strands, then SKU.
 */

import {
  EngineeringInputError,
  isEngineeringInputError,
  requireNonNegative,
} from "~/engineering/errors";
import type { SlotFill } from "~/engineering/slot-fill";
import { circleAreaMm2 } from "~/engineering/wire-geometry";
import { formatExactDecimal, type MoneyAmount } from "~/pricing/money";
import { coilLineFigures } from "./coil-line-figures";
import { costDesign } from "./design-costing";
import { coilSlotFill } from "./design-checks";
import {
  designWireBareDiameterMm,
  type CoilLine,
  type DesignWire,
} from "./design-lines";

/** ±3 %: the tolerance on copper area when none is asked for (issue 19). */
export const DEFAULT_AREA_TOLERANCE = 0.03;
/** The widest tolerance asked for: beyond ±25 % the winding is another design. */
export const MAX_AREA_TOLERANCE = 0.25;
/** Strands in hand a substitute may have (as the coil line schema allows). */
export const MAX_SUBSTITUTE_STRANDS = 200;

/** A wire item in stock, as a candidate. */
export interface StockedWire extends DesignWire {
  name: string;
  /** On hand, kg (all lots and locations). */
  onHandKg: number;
  /** Moving average cost of stock per kg, ten-thousandths; 0 or null when unknown. */
  unitCost: MoneyAmount | null;
}

export interface WireSubstituteQuery {
  line: CoilLine;
  /** The line's own item's moving average cost per kg; null when unknown. */
  lineUnitCost: MoneyAmount | null;
  /** Current through each coil at the rated point, A; null for no copper loss. */
  ratedCurrentA: number | null;
  /** The design's insulation class, °C. */
  insulationClassC: number;
  /** Allowed change of total copper area, as a fraction (0.03 = ±3 %). */
  tolerance?: number;
  candidates: readonly StockedWire[];
}

export interface WireSubstitute {
  sku: string;
  itemId: number;
  name: string;
  strands: number;
  bareDiameterMm: number;
  /** (n · A_candidate) ÷ (strands · A_line) − 1, %. */
  areaChangePercent: number;
  /** Change of resistance per coil, %. */
  resistanceChangePercent: number;
  /** Change of copper loss per motor at the rated current, W; null without a current. */
  copperLossChangeW: number | null;
  /** Change of the mass drawn from stock per motor, kg. */
  massChangeKg: number;
  /** Mass drawn from stock per motor with the substitute, kg. */
  massPerMotorKg: number;
  /** Copper fill of the slot with the substitute; null without a slot area. */
  copperFill: number | null;
  /** Gross fill over the enamel; null without a slot area or when the overall diameter is unknown. */
  grossFill: number | null;
  /** Change of the wire's cost per motor at moving average cost of stock; null when either cost is unknown. */
  costPerMotorChange: number | null;
  onHandKg: number;
}

const fillRank = (fill: SlotFill | null): number => {
  switch (fill?.warning?.code) {
    case undefined:
      return 0;
    case "above-random-round-wire-practice":
      return 1;
    case "above-square-packing-limit":
      return 2;
    case "above-hexagonal-packing-limit":
      return 3;
  }
};

/** The wire's cost per motor of one coil line at `unitCost` per kg (the design costing's rule). */
function lineCost(line: CoilLine, unitCost: MoneyAmount | null) {
  if (unitCost === null || unitCost <= 0n) return null;
  return costDesign({
    lines: [line],
    quantity: 1,
    currency: "",
    prices: new Map([
      [line.wire.itemId, { unitPrice: unitCost, source: "average cost" }],
    ]),
    ratedTorqueNm: null,
  }).costPerMotor;
}

const moneyNumber = (amount: MoneyAmount) =>
  Number(formatExactDecimal({ digits: amount, decimals: 4 }));

/** Strand counts n whose area n · a is within `tolerance` of `target`. */
function strandCounts(target: number, a: number, tolerance: number): number[] {
  const low = Math.max(1, Math.floor((target * (1 - tolerance)) / a));
  const high = Math.min(
    MAX_SUBSTITUTE_STRANDS,
    Math.ceil((target * (1 + tolerance)) / a),
  );
  const counts: number[] = [];
  for (let n = low; n <= high; n += 1) {
    if (Math.abs((n * a) / target - 1) <= tolerance + 1e-12) counts.push(n);
  }
  return counts;
}

/** Throws unless the tolerance is a fraction from 0 to {@link MAX_AREA_TOLERANCE}. */
export function assertAreaTolerance(tolerance: number): void {
  if (
    !Number.isFinite(tolerance) ||
    tolerance < 0 ||
    tolerance > MAX_AREA_TOLERANCE
  )
    throw new EngineeringInputError(
      "tolerance",
      `The area tolerance must be from 0 to ${MAX_AREA_TOLERANCE * 100} %.`,
    );
}

/** The substitutes from stock for a coil line (see the module's rules), closest area first. */
export function proposeWireSubstitutes(
  query: WireSubstituteQuery,
): WireSubstitute[] {
  const tolerance = query.tolerance ?? DEFAULT_AREA_TOLERANCE;
  assertAreaTolerance(tolerance);
  if (!Number.isFinite(query.insulationClassC))
    throw new EngineeringInputError(
      "insulationClassC",
      "The insulation class must be a number of °C.",
    );
  if (query.ratedCurrentA !== null)
    requireNonNegative(query.ratedCurrentA, "ratedCurrentA", "Rated current");
  const { line } = query;
  const target =
    line.strandsInHand * circleAreaMm2(designWireBareDiameterMm(line.wire));
  const before = coilLineFigures(line, query.ratedCurrentA);
  const fillBefore = coilSlotFill(line);
  const costBefore = lineCost(line, query.lineUnitCost);

  const substitutes: WireSubstitute[] = [];
  for (const candidate of query.candidates) {
    if (candidate.conductor !== line.wire.conductor) continue;
    if (!(candidate.onHandKg > 0)) continue;
    if (candidate.thermalClassC < query.insulationClassC) continue;
    let bare: number;
    try {
      bare = designWireBareDiameterMm(candidate);
    } catch (error) {
      if (isEngineeringInputError(error)) continue; // a size the tables do not know
      throw error;
    }
    const area = circleAreaMm2(bare);
    for (const strands of strandCounts(target, area, tolerance)) {
      if (
        candidate.itemId === line.wire.itemId &&
        strands === line.strandsInHand
      )
        continue;
      const substituted: CoilLine = {
        ...line,
        wire: candidate,
        strandsInHand: strands,
      };
      const fill = coilSlotFill(substituted);
      if (
        fill &&
        (!fill.fits ||
          fillRank(fill) > fillRank(fillBefore) ||
          (fill.grossFill === null && fillBefore?.grossFill !== null))
      )
        continue;
      const after = coilLineFigures(substituted, query.ratedCurrentA);
      const costAfter = lineCost(substituted, candidate.unitCost);
      substitutes.push({
        sku: candidate.sku,
        itemId: candidate.itemId,
        name: candidate.name,
        strands,
        bareDiameterMm: bare,
        areaChangePercent: ((strands * area) / target - 1) * 100,
        resistanceChangePercent:
          (after.resistancePerCoilOhm / before.resistancePerCoilOhm - 1) * 100,
        copperLossChangeW:
          after.copperLossW === null || before.copperLossW === null
            ? null
            : after.copperLossW - before.copperLossW,
        massChangeKg: after.drawnMassKg - before.drawnMassKg,
        massPerMotorKg: after.drawnMassKg,
        copperFill: fill?.copperFill ?? null,
        grossFill: fill?.grossFill ?? null,
        costPerMotorChange:
          costBefore === null || costAfter === null
            ? null
            : moneyNumber(costAfter - costBefore),
        onHandKg: candidate.onHandKg,
      });
    }
  }
  return substitutes.sort(
    (a, b) =>
      Math.abs(a.areaChangePercent) - Math.abs(b.areaChangePercent) ||
      a.strands - b.strands ||
      a.sku.localeCompare(b.sku),
  );
}
