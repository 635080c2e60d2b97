/**
 * Entering counts on a stocktake's sheet: the quantity found (or a spool weighed, gross −
 * tare), stored with the book quantity of that balance read in the same transaction, so
 * the variance compares the count with the book at the count, whatever moved since the
 * start. And a line found on the shelf that the sheet lacks. Nothing here writes the
 * ledger; approval does (stocktake-approval.server.ts).
 */
import { and, eq } from "drizzle-orm";
import type { Transaction } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  stockBalances,
  stocktakeLines,
  stocktakeLocations,
} from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import {
  formatQuantityText,
  parseQuantity,
  quantityScale,
} from "~/lib/decimal-amounts";
import { DomainError } from "~/lib/domain-error";
import { weighedCount } from "./stocktake-figures";
import type { AddLineInput, CountInput } from "./stocktake-forms";
import { lockStocktake } from "./stocktakes.server";

/**
 * The on hand of one balance now, 0 when there is none: a locking read (MariaDB 10.11
 * has no FOR SHARE, so FOR UPDATE), which sees the latest committed value rather than
 * the transaction's snapshot and waits for a movement being written to that balance.
 */
export async function bookNow(
  tx: Transaction,
  line: { itemId: number; lotId: number; locationId: number },
): Promise<bigint> {
  const [row] = await tx
    .select({ onHand: stockBalances.onHand })
    .from(stockBalances)
    .where(
      and(
        eq(stockBalances.itemId, line.itemId),
        eq(stockBalances.lotId, line.lotId),
        eq(stockBalances.locationId, line.locationId),
      ),
    )
    .for("update");
  return row ? parseQuantity(row.onHand) : 0n;
}

async function lineOf(tx: Transaction, stocktakeId: number, lineId: number) {
  const [line] = await tx
    .select({
      id: stocktakeLines.id,
      itemId: stocktakeLines.itemId,
      lotId: stocktakeLines.lotId,
      locationId: stocktakeLines.locationId,
      kind: items.kind,
      unit: items.unit,
      sku: items.sku,
      lotTareKg: lots.tareKg,
    })
    .from(stocktakeLines)
    .innerJoin(items, eq(items.id, stocktakeLines.itemId))
    .leftJoin(lots, eq(lots.id, stocktakeLines.lotId))
    .where(
      and(
        eq(stocktakeLines.id, lineId),
        eq(stocktakeLines.stocktakeId, stocktakeId),
      ),
    )
    .limit(1);
  if (!line)
    throw new DomainError(404, "That line is not on this stocktake's sheet.");
  return line;
}

/** What was counted, in thousandths of the line's unit, from a quantity or a weighing. */
function countedFrom(
  input: CountInput,
  line: { kind: string; unit: string; sku: string; lotTareKg: string | null },
) {
  if (input.grossKg !== undefined) {
    if (line.kind !== "wire" || line.unit !== "kg")
      throw new DomainError(
        400,
        "Weighing is for wire kept in kg: give the quantity counted.",
        "grossKg",
      );
    const tare =
      input.tareKg ??
      (line.lotTareKg === null ? null : parseQuantity(line.lotTareKg));
    if (tare === null)
      throw new DomainError(
        400,
        "This spool has no tare on record: give the empty spool's weight.",
        "tareKg",
      );
    return {
      counted: weighedCount(input.grossKg, tare),
      grossKg: input.grossKg,
      tareKg: tare,
    };
  }
  const counted = input.quantity!;
  if (line.unit === "pcs" && counted % quantityScale !== 0n)
    throw new DomainError(
      400,
      `${line.sku} is counted in whole pieces.`,
      "quantity",
    );
  return { counted, grossKg: null, tareKg: null };
}

/** Stores a line's count with the book at this moment; clears a recount request. */
export async function recordCount(
  stocktakeId: number,
  input: CountInput,
  userId: string,
): Promise<{ lineId: number }> {
  return writeTransaction(
    async (tx) => {
      await lockStocktake(tx, stocktakeId);
      const line = await lineOf(tx, stocktakeId, input.lineId);
      const count = countedFrom(input, line);
      const book = await bookNow(tx, line);
      await tx
        .update(stocktakeLines)
        .set({
          counted: formatQuantityText(count.counted),
          bookAtCount: formatQuantityText(book),
          grossKg:
            count.grossKg === null ? null : formatQuantityText(count.grossKg),
          tareKg:
            count.tareKg === null ? null : formatQuantityText(count.tareKg),
          countedBy: userId,
          countedAt: new Date(),
          recountRequested: false,
        })
        .where(eq(stocktakeLines.id, line.id));
      return { lineId: line.id };
    },
    { label: "stocktake count" },
  );
}

/**
 * Adds a line found on the shelf: an existing lot (or an item kept without lots) at a
 * location the stocktake covers. Its book at the start is the balance now (0 when the
 * balance does not exist).
 */
export async function addFoundLine(
  stocktakeId: number,
  input: AddLineInput,
): Promise<{ lineId: number }> {
  return writeTransaction(
    async (tx) => {
      await lockStocktake(tx, stocktakeId);
      const [item] = await tx
        .select({ id: items.id, kind: items.kind, active: items.active })
        .from(items)
        .where(eq(items.sku, input.sku))
        .limit(1)
        // The ledger's order: the item before its balance (bookNow locks the balance).
        .for("update");
      if (!item || !item.active)
        throw new DomainError(400, `No item with SKU "${input.sku}".`, "sku");
      let lotId = 0;
      if (input.lot) {
        const [lot] = await tx
          .select({ id: lots.id })
          .from(lots)
          .where(and(eq(lots.itemId, item.id), eq(lots.lotNumber, input.lot)))
          .limit(1);
        if (!lot)
          throw new DomainError(
            400,
            `No lot "${input.lot}" of ${input.sku}. A new lot comes with a receipt.`,
            "lot",
          );
        lotId = lot.id;
      } else if (item.kind === "wire") {
        throw new DomainError(
          400,
          "Wire is kept by spool: give the lot.",
          "lot",
        );
      }
      const [covered] = await tx
        .select({ id: locations.id })
        .from(stocktakeLocations)
        .innerJoin(locations, eq(locations.id, stocktakeLocations.locationId))
        .where(
          and(
            eq(stocktakeLocations.stocktakeId, stocktakeId),
            eq(locations.code, input.location),
          ),
        )
        .limit(1);
      if (!covered)
        throw new DomainError(
          400,
          `${input.location} is not a location of this stocktake.`,
          "location",
        );
      const key = { itemId: item.id, lotId, locationId: covered.id };
      const [existing] = await tx
        .select({ id: stocktakeLines.id })
        .from(stocktakeLines)
        .where(
          and(
            eq(stocktakeLines.stocktakeId, stocktakeId),
            eq(stocktakeLines.itemId, key.itemId),
            eq(stocktakeLines.lotId, key.lotId),
            eq(stocktakeLines.locationId, key.locationId),
          ),
        )
        .limit(1);
      if (existing)
        throw new DomainError(
          409,
          "That lot is already on the sheet at this location: count it there.",
          "lot",
        );
      const book = await bookNow(tx, key);
      const [created] = await tx
        .insert(stocktakeLines)
        .values({
          stocktakeId,
          ...key,
          bookAtStart: formatQuantityText(book),
          addedDuringCount: true,
        })
        .$returningId();
      return { lineId: created!.id };
    },
    { label: "stocktake found line" },
  );
}
