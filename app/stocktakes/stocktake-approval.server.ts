/**
 * The reviewer's steps: asking for a line to be counted again, and approving. Approval
 * posts, in one transaction, a count movement through the ledger's one writer for every
 * line whose count differs from the book at the count, applying that difference to the
 * balance as it is now (movements since the count stay as they were: the count movement
 * records what the balance becomes, now + variance). Then the stocktake is approved and
 * read-only, and the locations it counted completely get today as their last count.
 * Nothing is posted before approval.
 */
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  stockBalances,
  stocktakeLines,
  stocktakeLocations,
  stocktakes,
} from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import { todayUtc } from "~/lib/calendar-days";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { unitWord } from "~/lib/unit-text";
import {
  movementsCommitted,
  recordMovementIn,
} from "~/stock/stock-movements.server";
import {
  approvalBlocker,
  lineVariance,
  onHandAfterApproval,
} from "./stocktake-figures";
import { bookNow } from "./stocktake-counts.server";
import { lockStocktake } from "./stocktakes.server";
import { stocktakeReference } from "./stocktake-reference";

/** Clears a line's count and flags it: it must be counted again before approval. */
export async function askForRecount(
  stocktakeId: number,
  lineId: number,
): Promise<void> {
  await writeTransaction(
    async (tx) => {
      await lockStocktake(tx, stocktakeId);
      const [line] = await tx
        .select({ id: stocktakeLines.id })
        .from(stocktakeLines)
        .where(
          and(
            eq(stocktakeLines.id, lineId),
            eq(stocktakeLines.stocktakeId, stocktakeId),
          ),
        )
        .limit(1);
      if (!line)
        throw new DomainError(404, "That line is not on this stocktake.");
      await tx
        .update(stocktakeLines)
        .set({
          counted: null,
          bookAtCount: null,
          grossKg: null,
          tareKg: null,
          countedBy: null,
          countedAt: null,
          recountRequested: true,
        })
        .where(eq(stocktakeLines.id, lineId));
    },
    { label: "stocktake recount" },
  );
}

const amount = (thousandths: bigint, unit: string) => {
  const value = quantityToNumber(thousandths);
  return `${value} ${unitWord(unit, value)}`;
};

/** The item row, locked first (the ledger's order: item, then balance), and the balance's on hand now. */
async function lockBalanceNow(
  tx: Transaction,
  line: { itemId: number; lotId: number; locationId: number },
): Promise<bigint> {
  await tx
    .select({ id: items.id })
    .from(items)
    .where(eq(items.id, line.itemId))
    .for("update");
  return bookNow(tx, line);
}

/** The stocktake's locations where every balance with stock has a line of this stocktake. */
async function completelyCounted(tx: Transaction, stocktakeId: number) {
  const covered = await tx
    .select({ id: stocktakeLocations.locationId })
    .from(stocktakeLocations)
    .where(eq(stocktakeLocations.stocktakeId, stocktakeId));
  const ids = covered.map((row) => row.id);
  if (ids.length === 0) return [];
  const partial = await tx
    .selectDistinct({ id: stockBalances.locationId })
    .from(stockBalances)
    .where(
      and(
        inArray(stockBalances.locationId, ids),
        sql`${stockBalances.onHand} <> 0`,
        sql`NOT EXISTS (SELECT 1 FROM stocktake_lines l WHERE l.stocktake_id = ${stocktakeId} AND l.item_id = ${stockBalances.itemId} AND l.lot_id = ${stockBalances.lotId} AND l.location_id = ${stockBalances.locationId})`,
      ),
    );
  const notAll = new Set(partial.map((row) => row.id));
  return ids.filter((id) => !notAll.has(id));
}

export interface ApprovalResult {
  movements: number;
  skus: string[];
}

/** Approves the stocktake, posting its differences; refused while a line is uncounted or awaits a recount. */
export async function approveStocktake(
  stocktakeId: number,
  userId: string,
): Promise<ApprovalResult> {
  const reference = stocktakeReference(stocktakeId);
  const result = await writeTransaction(
    async (tx) => {
      await lockStocktake(tx, stocktakeId);
      const lines = await tx
        .select({
          id: stocktakeLines.id,
          itemId: stocktakeLines.itemId,
          lotId: stocktakeLines.lotId,
          locationId: stocktakeLines.locationId,
          counted: stocktakeLines.counted,
          bookAtCount: stocktakeLines.bookAtCount,
          recountRequested: stocktakeLines.recountRequested,
          sku: items.sku,
          unit: items.unit,
          lot: lots.lotNumber,
          location: locations.code,
        })
        .from(stocktakeLines)
        .innerJoin(items, eq(items.id, stocktakeLines.itemId))
        .innerJoin(locations, eq(locations.id, stocktakeLines.locationId))
        .leftJoin(lots, eq(lots.id, stocktakeLines.lotId))
        .where(eq(stocktakeLines.stocktakeId, stocktakeId))
        .orderBy(
          asc(stocktakeLines.itemId),
          asc(stocktakeLines.lotId),
          asc(stocktakeLines.locationId),
        );
      const blocker = approvalBlocker(
        lines.map((line) => ({
          counted: line.counted === null ? null : parseQuantity(line.counted),
          recountRequested: line.recountRequested,
        })),
      );
      if (blocker) throw new DomainError(409, blocker);

      const now = new Date();
      const skus = new Set<string>();
      let movements = 0;
      for (const line of lines) {
        const counted = parseQuantity(line.counted!);
        const bookAtCount = parseQuantity(line.bookAtCount!);
        const variance = lineVariance({ counted, bookAtCount });
        if (variance === 0n) continue;
        const onHandNow = await lockBalanceNow(tx, line);
        const after = onHandAfterApproval(onHandNow, variance);
        const where = `${line.sku}${line.lot ? ` lot ${line.lot}` : ""} at ${line.location}`;
        if (after === null)
          throw new DomainError(
            409,
            `${where}: the count found ${amount(-variance, line.unit)} less than the book, but only ${amount(onHandNow, line.unit)} is on hand now. Ask for a recount of this line.`,
          );
        const recorded = await recordMovementIn(
          tx,
          {
            type: "count",
            sku: line.sku,
            lot: line.lot ?? undefined,
            location: line.location,
            toLocation: undefined,
            quantity: after,
            unit: undefined,
            unitCost: undefined,
            grossKg: undefined,
            tareKg: undefined,
            spoolType: undefined,
            supplierBatch: undefined,
            reference,
            note: `Stocktake ${reference}: counted ${amount(counted, line.unit)}, book at the count ${amount(bookAtCount, line.unit)}.`,
            buildOrderId: undefined,
          },
          userId,
          { at: now },
        );
        await tx
          .update(stocktakeLines)
          .set({ movementId: recorded.movement.id })
          .where(eq(stocktakeLines.id, line.id));
        skus.add(line.sku);
        movements += 1;
      }
      await tx
        .update(stocktakes)
        .set({
          status: "approved",
          approvedBy: userId,
          approvedAt: now,
          closedAt: now,
        })
        .where(eq(stocktakes.id, stocktakeId));
      const counted = await completelyCounted(tx, stocktakeId);
      if (counted.length > 0)
        await tx
          .update(locations)
          .set({ lastCountedOn: todayUtc(now) })
          .where(inArray(locations.id, counted));
      return { movements, skus: [...skus] };
    },
    { label: "approve stocktake" },
  );
  // After the commit: low-stock alerts for what the differences moved.
  if (result.skus.length > 0) await movementsCommitted(result.skus);
  return result;
}
