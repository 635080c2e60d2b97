/**
 * Exact arithmetic for stock quantities and money. Quantities are kept as
 * whole thousandths of their unit (grams for kg) and money per unit as whole
 * ten-thousandths, so sums and balances never drift the way binary floating
 * point does. The database stores both as DECIMAL. Pure: no I/O.
 */
import { isTooLongForNumber } from "~/lib/number-text";

export const quantityScale = 1_000n;
export const unitCostScale = 10_000n;

/** A plain decimal number as stored and sent: digits, an optional point and fraction, an optional leading minus. */
export const decimalNumberPattern = /^-?\d+(\.\d+)?$/;

/** "12.345" → 12345n thousandths. Throws on more than 3 decimals or non-numbers. */
export function parseQuantity(text: string): bigint {
  return parseScaled(text, 3);
}

/** "1.2345" → 12345n ten-thousandths. */
export function parseUnitCost(text: string): bigint {
  return parseScaled(text, 4);
}

/** The parts of a decimal number: sign, whole digits, fraction digits (as {@link decimalNumberPattern}). */
const decimalParts = /^(-?)(\d+)(?:\.(\d+))?$/;

/**
 * Every list and page parses each DECIMAL column of each row here (50 rows × 7 columns
 * for a page of items): one match and one BigInt per value.
 */
function parseScaled(text: string, decimals: number): bigint {
  const trimmed = text.trim();
  const parts = isTooLongForNumber(trimmed) ? null : decimalParts.exec(trimmed);
  if (!parts)
    throw new RangeError(`"${text.slice(0, 40)}" is not a decimal number`);
  const [, sign, whole, fraction = ""] = parts;
  if (fraction.length > decimals && /[1-9]/.test(fraction.slice(decimals))) {
    throw new RangeError(`"${text}" has more than ${decimals} decimals`);
  }
  const scaled = BigInt(
    whole! +
      (fraction.length >= decimals
        ? fraction.slice(0, decimals)
        : fraction.padEnd(decimals, "0")),
  );
  return sign ? -scaled : scaled;
}

/** A JSON number from the API as thousandths; null when it has more than 3 decimals. */
export function quantityFromNumber(value: number): bigint | null {
  const scaled = Math.round(value * 1000);
  if (Math.abs(scaled - value * 1000) > 1e-6 * Math.max(1, Math.abs(value)))
    return null;
  return BigInt(scaled);
}

export function unitCostFromNumber(value: number): bigint | null {
  const scaled = Math.round(value * 10_000);
  if (Math.abs(scaled - value * 10_000) > 1e-6 * Math.max(1, Math.abs(value)))
    return null;
  return BigInt(scaled);
}

/** 12345n thousandths → "12.345" (for DECIMAL columns). */
export function formatQuantityText(thousandths: bigint): string {
  return formatScaled(thousandths, 3);
}

export function formatUnitCostText(tenThousandths: bigint): string {
  return formatScaled(tenThousandths, 4);
}

function formatScaled(value: bigint, decimals: number): string {
  const negative = value < 0n;
  const magnitude = negative ? -value : value;
  const scale = 10n ** BigInt(decimals);
  const whole = magnitude / scale;
  const fraction = (magnitude % scale).toString().padStart(decimals, "0");
  return `${negative ? "-" : ""}${whole}.${fraction}`;
}

/**
 * A money amount kept as a JSON number (ten-thousandths over 10,000, as the item API
 * gives it) as plain text to `decimals` places, rounded half away from zero on the exact
 * amount: 1.005 → "1.01", where rounding the float (1.00499…) would give "1.00".
 */
export function roundedAmountText(
  amount: number,
  decimals: 1 | 2 | 3 | 4,
): string {
  const tenThousandths = BigInt(Math.round(amount * 10_000));
  return formatScaled(
    divideHalfAwayFromZero(tenThousandths, 10n ** BigInt(4 - decimals)),
    decimals,
  );
}

/** Thousandths as a JSON number (exact for any stock quantity below 9 × 10¹² units). */
export function quantityToNumber(thousandths: bigint): number {
  return Number(thousandths) / 1000;
}

/**
 * `numerator / denominator`, rounded half away from zero to a whole number: the one
 * rounding rule of quantities and money (decision 006). Throws RangeError when the
 * denominator is zero.
 */
export function divideHalfAwayFromZero(
  numerator: bigint,
  denominator: bigint,
): bigint {
  if (denominator === 0n) throw new RangeError("division by zero");
  const negative = numerator < 0n !== denominator < 0n;
  const n = numerator < 0n ? -numerator : numerator;
  const d = denominator < 0n ? -denominator : denominator;
  const rounded = (n * 2n + d) / (2n * d);
  return negative ? -rounded : rounded;
}

/**
 * Moving average cost after a receipt: (onHand · average + received · cost) / (onHand + received),
 * to the nearest ten-thousandth. With nothing on hand before, the receipt's cost.
 */
export function movingAverageAfterReceipt(input: {
  onHand: bigint;
  averageCost: bigint;
  received: bigint;
  unitCost: bigint;
}): bigint {
  const before = input.onHand > 0n ? input.onHand : 0n;
  const total = before + input.received;
  if (total <= 0n) return input.unitCost;
  return divideHalfAwayFromZero(
    before * input.averageCost + input.received * input.unitCost,
    total,
  );
}

/** Value of a quantity at a unit cost, in ten-thousandths of money (exact). */
export function valueOf(thousandths: bigint, unitCost: bigint): bigint {
  return divideHalfAwayFromZero(thousandths * unitCost, quantityScale);
}
