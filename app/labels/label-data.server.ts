/**
 * What a label shows and what a scanned code stands for, read from the catalogue and the
 * kept balances: a lot's item, number, supplier batch, supplier, received day and the net
 * quantity on hand with where it is; a location's code and name.
 */
import { and, asc, eq, gt, inArray, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  magnetItems,
  purchaseReceiptLines,
  stockBalances,
  stockMovements,
  suppliers,
} from "~/db/schema";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { findMagnetGradeByName } from "~/reference/magnet-grades.server";
import type { LocationLabelData, LotLabelData } from "./label-types";

/** The lots' label data, in the order of the ids asked for; ids of no lot are left out. */
export async function findLotLabels(
  lotIds: readonly number[],
): Promise<LotLabelData[]> {
  if (lotIds.length === 0) return [];
  const rows = await db
    .select({
      lotId: lots.id,
      sku: items.sku,
      itemName: items.name,
      sizeOrGrade: items.sizeOrGrade,
      kind: items.kind,
      unit: items.unit,
      lotNumber: lots.lotNumber,
      supplierBatch: lots.supplierBatch,
      supplierName: suppliers.name,
      receivedOn: lots.receivedOn,
      tareKg: lots.tareKg,
      gradeKey: magnetItems.gradeKey,
      shape: magnetItems.shape,
      coating: magnetItems.coating,
      magnetisation: magnetItems.magnetisation,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .leftJoin(suppliers, eq(suppliers.id, lots.supplierId))
    .leftJoin(magnetItems, eq(magnetItems.itemId, items.id))
    .where(inArray(lots.id, [...lotIds]));
  const balances = await lotBalances(rows.map((row) => row.lotId));
  // The grade's name as the reference table writes it ("N42SH"; the item keeps its key) and its working limit.
  const grades = new Map<string, { name: string; maxC: number | null }>();
  for (const key of new Set(rows.flatMap((row) => row.gradeKey ?? []))) {
    const grade = await findMagnetGradeByName(key);
    grades.set(key, {
      name: grade?.name ?? key.toUpperCase(),
      maxC: grade?.maxWorkingTemperatureC ?? null,
    });
  }
  const byId = new Map(
    rows.map((row) => {
      const stock = balances.get(row.lotId) ?? [];
      const label: LotLabelData = {
        lotId: row.lotId,
        sku: row.sku,
        itemName: row.itemName,
        sizeOrGrade: row.sizeOrGrade,
        kind: row.kind,
        unit: row.unit,
        lotNumber: row.lotNumber,
        supplierBatch: row.supplierBatch,
        supplierName: row.supplierName,
        receivedOn: row.receivedOn,
        tareKg:
          row.tareKg === null
            ? null
            : quantityToNumber(parseQuantity(row.tareKg)),
        onHand: quantityToNumber(
          stock.reduce((sum, balance) => sum + balance.onHand, 0n),
        ),
        locations: stock.map((balance) => balance.location),
        magnet:
          row.kind === "magnet" && row.gradeKey && row.shape
            ? {
                grade: grades.get(row.gradeKey)?.name ?? row.gradeKey,
                shape: row.shape,
                coating: row.coating ?? "",
                magnetisation: row.magnetisation ?? "",
                maxWorkingTemperatureC: grades.get(row.gradeKey)?.maxC ?? null,
              }
            : null,
      };
      return [row.lotId, label];
    }),
  );
  return lotIds.flatMap((id) => byId.get(id) ?? []);
}

/** Each lot's balances with stock: location code and on hand (thousandths), location order. */
async function lotBalances(lotIds: number[]) {
  const found = new Map<number, { location: string; onHand: bigint }[]>();
  if (lotIds.length === 0) return found;
  const rows = await db
    .select({
      lotId: stockBalances.lotId,
      location: locations.code,
      onHand: stockBalances.onHand,
    })
    .from(stockBalances)
    .innerJoin(locations, eq(locations.id, stockBalances.locationId))
    .where(
      and(inArray(stockBalances.lotId, lotIds), gt(stockBalances.onHand, "0")),
    )
    .orderBy(asc(locations.code));
  for (const row of rows) {
    const list = found.get(row.lotId) ?? [];
    list.push({ location: row.location, onHand: parseQuantity(row.onHand) });
    found.set(row.lotId, list);
  }
  return found;
}

/** The locations' label data, in the order asked for; codes of no location are left out. */
export async function findLocationLabels(
  codes: readonly string[],
): Promise<LocationLabelData[]> {
  if (codes.length === 0) return [];
  const rows = await db
    .select({
      code: locations.code,
      name: locations.name,
      kind: locations.kind,
    })
    .from(locations)
    .where(inArray(locations.code, [...codes]));
  // The database compares codes without regard to case: so does this.
  const byCode = new Map(rows.map((row) => [row.code.toUpperCase(), row]));
  return codes.flatMap((code) => byCode.get(code.toUpperCase()) ?? []);
}

/** The lots a purchase receipt (one delivery against an order) brought in, in booking order. */
export async function lotIdsOfPurchaseReceipt(
  receiptId: number,
): Promise<number[]> {
  const rows = await db
    .selectDistinct({
      lotId: stockMovements.lotId,
      lineId: sql<number>`MIN(${purchaseReceiptLines.id})`,
    })
    .from(purchaseReceiptLines)
    .innerJoin(
      stockMovements,
      eq(stockMovements.id, purchaseReceiptLines.movementId),
    )
    .where(
      and(
        eq(purchaseReceiptLines.receiptId, receiptId),
        gt(stockMovements.lotId, 0),
      ),
    )
    .groupBy(stockMovements.lotId)
    .orderBy(sql`MIN(${purchaseReceiptLines.id})`);
  return rows.map((row) => row.lotId);
}

/** The lot a receipt movement (the record page's receipt) brought in, or null. */
export async function lotIdOfReceiptMovement(
  movementId: number,
): Promise<number | null> {
  const [row] = await db
    .select({ lotId: stockMovements.lotId })
    .from(stockMovements)
    .where(
      and(
        eq(stockMovements.id, movementId),
        eq(stockMovements.type, "receipt"),
      ),
    )
    .limit(1);
  return row && row.lotId > 0 ? row.lotId : null;
}

/**
 * The lots a receipt brought in, to offer their labels: a delivery against a purchase order
 * (its receipt id) or one receipt movement of the record page.
 */
export async function receivedLotsToLabel(
  receipt: { purchaseReceiptId: number } | { movementId: number },
): Promise<{ lotId: number; lotNumber: string; sku: string }[]> {
  const lotIds =
    "purchaseReceiptId" in receipt
      ? await lotIdsOfPurchaseReceipt(receipt.purchaseReceiptId)
      : [await lotIdOfReceiptMovement(receipt.movementId)].flatMap(
          (id) => id ?? [],
        );
  if (lotIds.length === 0) return [];
  const rows = await db
    .select({ lotId: lots.id, lotNumber: lots.lotNumber, sku: items.sku })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .where(inArray(lots.id, lotIds));
  const byId = new Map(rows.map((row) => [row.lotId, row]));
  return lotIds.flatMap((id) => byId.get(id) ?? []);
}
