/**
 * The figures of a stocktake: a spool's count by weighing, each line's variance in
 * quantity and value, the totals a reviewer reads, what approval leaves on hand, and
 * what still stops approval. Quantities in thousandths of their unit, money in
 * ten-thousandths (app/lib/decimal-amounts.ts). Pure: no I/O.
 */
import { valueOf } from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";

/** A wire spool counted on the scale: net = gross − tare, in thousandths of a kg. */
export function weighedCount(grossKg: bigint, tareKg: bigint): bigint {
  if (tareKg < 0n)
    throw new DomainError(400, "The tare cannot be negative.", "tareKg");
  if (grossKg < tareKg)
    throw new DomainError(
      400,
      "The gross weight is below the spool's tare: weigh again or check the tare.",
      "grossKg",
    );
  return grossKg - tareKg;
}

/** Counted − book at the moment of the count: + found more, − found less. */
export function lineVariance(line: {
  counted: bigint;
  bookAtCount: bigint;
}): bigint {
  return line.counted - line.bookAtCount;
}

export interface ReviewLineFigures {
  counted: bigint | null;
  bookAtCount: bigint | null;
  recountRequested: boolean;
  /** The item's average cost per unit, ten-thousandths. */
  averageCost: bigint;
}

export interface LineVariance {
  quantity: bigint;
  /** ten-thousandths of money */
  value: bigint;
}

/** A counted line's variance and its value at the item's average cost; null until it is counted. */
export function varianceOf(line: ReviewLineFigures): LineVariance | null {
  if (line.counted === null || line.bookAtCount === null) return null;
  const quantity = lineVariance({
    counted: line.counted,
    bookAtCount: line.bookAtCount,
  });
  return { quantity, value: valueOf(quantity, line.averageCost) };
}

export interface ReviewTotals {
  lines: number;
  counted: number;
  toCount: number;
  recounts: number;
  /** Lines whose count differs from the book. */
  differences: number;
  /** Σ of the value found over the book (ten-thousandths). */
  gainValue: bigint;
  /** Σ of the value found short (ten-thousandths, negative or 0). */
  lossValue: bigint;
  netValue: bigint;
}

export function reviewTotals(
  lines: readonly ReviewLineFigures[],
): ReviewTotals {
  const totals: ReviewTotals = {
    lines: lines.length,
    counted: 0,
    toCount: 0,
    recounts: 0,
    differences: 0,
    gainValue: 0n,
    lossValue: 0n,
    netValue: 0n,
  };
  for (const line of lines) {
    if (line.recountRequested) totals.recounts += 1;
    const variance = varianceOf(line);
    if (variance === null) {
      if (!line.recountRequested) totals.toCount += 1;
      continue;
    }
    totals.counted += 1;
    if (variance.quantity !== 0n) totals.differences += 1;
    if (variance.value > 0n) totals.gainValue += variance.value;
    else totals.lossValue += variance.value;
    totals.netValue += variance.value;
  }
  return totals;
}

/** Why approval must wait, in words; null when every line is counted and none awaits a recount. */
export function approvalBlocker(
  lines: readonly Pick<ReviewLineFigures, "counted" | "recountRequested">[],
): string | null {
  const recounts = lines.filter((line) => line.recountRequested).length;
  const uncounted = lines.filter(
    (line) => line.counted === null && !line.recountRequested,
  ).length;
  const parts: string[] = [];
  if (uncounted > 0)
    parts.push(
      `${uncounted} ${uncounted === 1 ? "line is" : "lines are"} not counted yet`,
    );
  if (recounts > 0)
    parts.push(
      `${recounts} ${recounts === 1 ? "line waits" : "lines wait"} for a recount`,
    );
  return parts.length === 0 ? null : `Not yet: ${parts.join(" and ")}.`;
}

/**
 * What a balance becomes on approval: its on hand now plus the variance found at the
 * count (movements since the count stay as they were). Null when that is below zero:
 * more left since the count than the count found.
 */
export function onHandAfterApproval(
  onHandNow: bigint,
  variance: bigint,
): bigint | null {
  const after = onHandNow + variance;
  return after < 0n ? null : after;
}
