/**
 * How much a purchase-order line may receive in total: the ordered quantity plus the
 * supplier's over-delivery tolerance. Wire bought by weight (items stocked in kg) takes the
 * supplier's wire tolerance, pieces and metres its piece tolerance; the suppliers table
 * starts them at 10 % and 0 % (common practice, no source). Under-delivery is never refused
 * here: a line short of its quantity stays open until received or closed short.
 *
 * Exact: quantities are thousandths of the item's unit (bigint), percentages hundredths of
 * a percent (the column is DECIMAL(5,2)). The limit is rounded down to what the unit can
 * hold: a thousandth of a kg or metre, a whole piece. Pure.
 */
import { parseExactDecimal, rescale } from "~/pricing/money";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { unitWord } from "~/lib/unit-text";

/** The suppliers table's defaults, percent (common practice, no source). */
export const defaultWireTolerancePercent = 10;
export const defaultPieceTolerancePercent = 0;

/** A supplier's two tolerances as stored ("10.00"). */
export interface SupplierTolerances {
  wireTolerancePercent: string;
  pieceTolerancePercent: string;
}

/** Hundredths of a percent: "10.00" → 1000n, "2.5" → 250n. */
export function percentHundredths(text: string): bigint {
  const value = rescale(parseExactDecimal(text), 2);
  if (value < 0n) throw new RangeError(`a tolerance of ${text} % is negative`);
  return value;
}

/** The tolerance that applies to an item stocked in `unit`, hundredths of a percent. */
export function toleranceFor(
  unit: string,
  supplier: SupplierTolerances,
): bigint {
  return percentHundredths(
    unit === "kg"
      ? supplier.wireTolerancePercent
      : supplier.pieceTolerancePercent,
  );
}

/** The smallest amount of the unit, in thousandths: a whole piece, else a gram or a millimetre. */
export function unitStep(unit: string): bigint {
  return unit === "pcs" ? 1000n : 1n;
}

/**
 * The most a line may receive in total: ordered × (1 + tolerance / 100), rounded down to
 * the unit's step. 100 kg at 10 % → 110 kg; 7 pieces at 10 % → 7.7 → 7 pieces.
 */
export function deliveryLimit(
  ordered: bigint,
  unit: string,
  toleranceHundredths: bigint,
): bigint {
  const exact = (ordered * (10_000n + toleranceHundredths)) / 10_000n;
  const step = unitStep(unit);
  return (exact / step) * step;
}

/** One line of a receipt, as the tolerance check sees it. */
export interface LineDelivery {
  /** How the line is named in words: "Line 2 (CU-0.50-G2)". */
  label: string;
  unit: string;
  /** Thousandths of the unit. */
  ordered: bigint;
  receivedSoFar: bigint;
  /** What this receipt brings to the line: every spool or lot of it together. */
  receivingNow: bigint;
  toleranceHundredths: bigint;
}

function amount(thousandths: bigint, unit: string): string {
  const value = quantityToNumber(thousandths);
  return `${value} ${unitWord(unit, value)}`;
}

function percentText(hundredths: bigint): string {
  return `${quantityToNumber(hundredths * 10n)} %`;
}

/**
 * Null when the line may take this delivery; otherwise why not, in words that name the
 * line, the ordered quantity, what it received so far, the limit and what this delivery
 * would make it.
 */
export function toleranceRefusal(delivery: LineDelivery): string | null {
  const limit = deliveryLimit(
    delivery.ordered,
    delivery.unit,
    delivery.toleranceHundredths,
  );
  const after = delivery.receivedSoFar + delivery.receivingNow;
  if (after <= limit) return null;
  const { unit } = delivery;
  return (
    `${delivery.label}: ordered ${amount(delivery.ordered, unit)}, ` +
    `received so far ${amount(delivery.receivedSoFar, unit)}; ` +
    `at most ${amount(limit, unit)} may be received ` +
    `(${percentText(delivery.toleranceHundredths)} over the order), ` +
    `but this delivery would make it ${amount(after, unit)}.`
  );
}
