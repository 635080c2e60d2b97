/**
 * The reviewer's table of a stocktake: each line's book at the start and at the count,
 * the count, and the variance in quantity and value, with the totals. Turns the stored
 * DECIMAL texts into exact amounts (stocktake-figures.ts) and then into numbers for the
 * page. Pure.
 */
import {
  parseQuantity,
  parseUnitCost,
  quantityToNumber,
} from "~/lib/decimal-amounts";
import { reviewTotals, varianceOf, approvalBlocker } from "./stocktake-figures";

export interface StoredReviewLine {
  id: number;
  location: string;
  sku: string;
  name: string;
  unit: string;
  averageCost: string;
  lot: string | null;
  bookAtStart: string;
  counted: string | null;
  bookAtCount: string | null;
  grossKg: string | null;
  tareKg: string | null;
  countedBy: string | null;
  countedAt: string | null;
  recountRequested: boolean;
  addedDuringCount: boolean;
  movementId: number | null;
}

const money = (tenThousandths: bigint) => Number(tenThousandths) / 10_000;
const maybe = (text: string | null) =>
  text === null ? null : quantityToNumber(parseQuantity(text));

export function reviewOf(lines: readonly StoredReviewLine[]) {
  const figures = lines.map((line) => ({
    counted: line.counted === null ? null : parseQuantity(line.counted),
    bookAtCount:
      line.bookAtCount === null ? null : parseQuantity(line.bookAtCount),
    recountRequested: line.recountRequested,
    averageCost: parseUnitCost(line.averageCost),
  }));
  const totals = reviewTotals(figures);
  return {
    lines: lines.map((line, index) => {
      const variance = varianceOf(figures[index]!);
      return {
        id: line.id,
        location: line.location,
        sku: line.sku,
        name: line.name,
        unit: line.unit,
        lot: line.lot,
        bookAtStart: maybe(line.bookAtStart)!,
        bookAtCount: maybe(line.bookAtCount),
        counted: maybe(line.counted),
        grossKg: maybe(line.grossKg),
        tareKg: maybe(line.tareKg),
        countedBy: line.countedBy,
        countedAt: line.countedAt,
        recountRequested: line.recountRequested,
        addedDuringCount: line.addedDuringCount,
        movementId: line.movementId,
        varianceQuantity: variance ? quantityToNumber(variance.quantity) : null,
        varianceValue: variance ? money(variance.value) : null,
      };
    }),
    totals: {
      lines: totals.lines,
      counted: totals.counted,
      toCount: totals.toCount,
      recounts: totals.recounts,
      differences: totals.differences,
      gainValue: money(totals.gainValue),
      lossValue: money(totals.lossValue),
      netValue: money(totals.netValue),
    },
    blocker: approvalBlocker(figures),
  };
}
export type StocktakeReview = ReturnType<typeof reviewOf>;
export type ReviewRow = StocktakeReview["lines"][number];
