/**
 * A lot as its page and the API show it: the item, the supplier and the supplier's lot or
 * heat, the receipt that created it and the purchase order it came on, the hold, and its
 * balances per location. And finding a lot by its number, which is unique per item only
 * (`lots_item_number_unique`), so a number alone may name lots of several items.
 */
import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  stockBalances,
  stockMovements,
  suppliers,
  users,
} from "~/db/schema";
import { DomainError } from "~/lib/domain-error";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { idFromText } from "~/lib/search-params";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";

const holder = alias(users, "holder");

/** The lot with its origin, hold and balances; null when there is no such lot. */
export async function findLot(lotId: number) {
  const [row] = await db
    .select({
      id: lots.id,
      number: lots.lotNumber,
      supplierBatch: lots.supplierBatch,
      spoolType: lots.spoolType,
      tareKg: lots.tareKg,
      receivedOn: lots.receivedOn,
      purchaseOrderId: lots.purchaseOrderId,
      receiptMovementId: lots.receiptMovementId,
      holdReason: lots.holdReason,
      heldAt: lots.heldAt,
      heldBy: holder.name,
      itemId: items.id,
      sku: items.sku,
      itemName: items.name,
      kind: items.kind,
      unit: items.unit,
      supplierId: suppliers.id,
      supplierName: suppliers.name,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .leftJoin(suppliers, eq(suppliers.id, lots.supplierId))
    .leftJoin(holder, eq(holder.id, lots.heldBy))
    .where(eq(lots.id, lotId))
    .limit(1);
  if (!row) return null;
  const [receipt, balanceRows] = await Promise.all([
    row.receiptMovementId === null
      ? null
      : db
          .select({
            id: stockMovements.id,
            quantity: stockMovements.quantity,
            reference: stockMovements.reference,
            createdAt: stockMovements.createdAt,
            location: locations.code,
          })
          .from(stockMovements)
          .innerJoin(locations, eq(locations.id, stockMovements.locationId))
          .where(eq(stockMovements.id, row.receiptMovementId))
          .limit(1)
          .then((rows) => rows[0] ?? null),
    // The balance's primary key is item × lot × location: item and lot lead it.
    db
      .select({
        location: locations.code,
        locationName: locations.name,
        onHand: stockBalances.onHand,
        reserved: stockBalances.reserved,
      })
      .from(stockBalances)
      .innerJoin(locations, eq(locations.id, stockBalances.locationId))
      .where(
        and(
          eq(stockBalances.itemId, row.itemId),
          eq(stockBalances.lotId, row.id),
        ),
      )
      .orderBy(asc(locations.code)),
  ]);
  const balances = balanceRows
    .map((balance) => ({
      location: balance.location,
      locationName: balance.locationName,
      onHand: quantityToNumber(parseQuantity(balance.onHand)),
      reserved: quantityToNumber(parseQuantity(balance.reserved)),
    }))
    .filter((balance) => balance.onHand !== 0 || balance.reserved !== 0);
  return {
    id: row.id,
    number: row.number,
    item: {
      id: row.itemId,
      sku: row.sku,
      name: row.itemName,
      kind: row.kind,
      unit: row.unit,
    },
    supplier:
      row.supplierId === null || row.supplierName === null
        ? null
        : { id: row.supplierId, name: row.supplierName },
    supplierBatch: row.supplierBatch,
    spoolType: row.spoolType,
    tareKg: row.tareKg === null ? null : Number(row.tareKg),
    receivedOn: row.receivedOn,
    purchaseOrder:
      row.purchaseOrderId === null
        ? null
        : {
            id: row.purchaseOrderId,
            number: purchaseOrderNumber(row.purchaseOrderId),
          },
    receipt: receipt && {
      movementId: receipt.id,
      quantity: quantityToNumber(parseQuantity(receipt.quantity)),
      reference: receipt.reference,
      location: receipt.location,
      at: receipt.createdAt.toISOString(),
    },
    hold:
      row.heldAt === null
        ? null
        : {
            reason: row.holdReason ?? "",
            since: row.heldAt.toISOString(),
            by: row.heldBy,
          },
    balances,
  };
}

export type LotDetails = NonNullable<Awaited<ReturnType<typeof findLot>>>;

/** The lot id in a page's address ("/stock/lots/12"), or null when it is no id. */
export const lotIdFromPath = idFromText;

/** The longest lot number (lots.lot_number). */
const lotNumberMaxLength = 40;

/** The lot an API path names by its number (`?sku=` narrows it); 404 when none, 409 when several items have it. */
export async function lotByNumber(
  number: string,
  sku: string | null,
): Promise<{ id: number; number: string; sku: string; unit: string }> {
  // Longer than a lot number can be: no such lot (never cut, which could name another lot).
  if (number.length > lotNumberMaxLength)
    throw new DomainError(404, `No lot "${number.slice(0, 60)}…".`);
  const rows = await db
    .select({
      id: lots.id,
      number: lots.lotNumber,
      sku: items.sku,
      unit: items.unit,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .where(
      sku
        ? and(eq(lots.lotNumber, number), eq(items.sku, sku))
        : eq(lots.lotNumber, number),
    )
    .orderBy(asc(items.sku))
    .limit(50);
  if (rows.length === 0)
    throw new DomainError(
      404,
      sku ? `No lot "${number}" of ${sku}.` : `No lot "${number}".`,
    );
  if (rows.length > 1)
    throw new DomainError(
      409,
      `Lot "${number}" is a lot of several items (${rows.map((row) => row.sku).join(", ")}): add ?sku= to say which.`,
      "sku",
    );
  return rows[0]!;
}
