/**
 * What a one-time message is about, looked up in the database by the id its
 * note carries: the supplier's name, the movement recorded, the build order.
 * Null when there is no such thing (the message is then not shown).
 */
import { and, count, eq, ne } from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { findBuildOrder } from "~/build-orders/build-order-details.server";
import { db } from "~/db/client.server";
import {
  buildOrderIssues,
  buildOrderLines,
  designLines,
  designRevisions,
  designs,
  items,
  locations,
  lots,
  magnetGrades,
  purchaseOrders,
  purchaseReceiptLines,
  purchaseReceipts,
  stockMovements,
  suppliers,
  users,
} from "~/db/schema";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import {
  purchaseOrderNumber,
  purchaseOrderStatusLabels,
} from "~/purchase-orders/purchase-order-status";
import type {
  FlashNote,
  FlashSubjects,
  MovementSubject,
} from "./flash-messages";
import { subjectKindOf } from "./flash-messages";

const amount = (text: string) => quantityToNumber(parseQuantity(text));

async function supplierNamed(id: number) {
  const [row] = await db
    .select({ name: suppliers.name })
    .from(suppliers)
    .where(eq(suppliers.id, id))
    .limit(1);
  return row ?? null;
}

async function gradeNamed(key: string) {
  const [row] = await db
    .select({ name: magnetGrades.name })
    .from(magnetGrades)
    .where(eq(magnetGrades.key, key))
    .limit(1);
  return row ?? null;
}

const transferTo = alias(stockMovements, "transfer_to");
const toLocations = alias(locations, "to_location");

/** One movement (the first row of a transfer, with where the stock went). */
async function movement(id: number): Promise<MovementSubject | null> {
  const [row] = await db
    .select({
      type: stockMovements.type,
      sku: items.sku,
      unit: items.unit,
      quantity: stockMovements.quantity,
      lot: lots.lotNumber,
      location: locations.code,
      toLocation: toLocations.code,
      onHandAfter: stockMovements.itemOnHandAfter,
    })
    .from(stockMovements)
    .innerJoin(items, eq(items.id, stockMovements.itemId))
    .innerJoin(locations, eq(locations.id, stockMovements.locationId))
    .leftJoin(lots, eq(lots.id, stockMovements.lotId))
    .leftJoin(
      transferTo,
      and(
        eq(transferTo.transferId, stockMovements.id),
        ne(transferTo.id, stockMovements.id),
      ),
    )
    .leftJoin(toLocations, eq(toLocations.id, transferTo.locationId))
    .where(eq(stockMovements.id, id))
    .limit(1);
  if (!row) return null;
  return {
    ...row,
    quantity: Math.abs(amount(row.quantity)),
    change: amount(row.quantity),
    onHandAfter: amount(row.onHandAfter),
  };
}

async function order(id: number): Promise<FlashSubjects["order"] | null> {
  const found = await findBuildOrder(id);
  if (!found) return null;
  const amounts = (key: "reserved" | "short") =>
    found.lines
      .filter((line) => line[key] > 0)
      .map((line) => ({ sku: line.sku, quantity: line[key], unit: line.unit }));
  return {
    reference: found.reference,
    quantity: found.quantity,
    held: amounts("reserved"),
    short: amounts("short"),
  };
}

/** An issue to a build order, by its movement: the movement and its order line now. */
async function orderIssue(
  movementId: number,
): Promise<FlashSubjects["orderIssue"] | null> {
  const [issue] = await db
    .select({ orderId: buildOrderLines.orderId, lineId: buildOrderLines.id })
    .from(buildOrderIssues)
    .innerJoin(buildOrderLines, eq(buildOrderLines.id, buildOrderIssues.lineId))
    .where(eq(buildOrderIssues.movementId, movementId))
    .limit(1);
  if (!issue) return null;
  const [moved, found] = await Promise.all([
    movement(movementId),
    findBuildOrder(issue.orderId),
  ]);
  const line = found?.lines.find((candidate) =>
    candidate.issues.some((each) => each.movementId === movementId),
  );
  if (!moved || !found || !line) return null;
  return {
    ...moved,
    reference: found.reference,
    issued: line.issued,
    required: line.required,
  };
}

/** A purchase order as its messages name it. */
async function purchaseOrder(
  id: number,
): Promise<FlashSubjects["purchaseOrder"] | null> {
  const [row] = await db
    .select({
      supplier: suppliers.name,
      orderEmail: suppliers.orderEmail,
      email: suppliers.email,
    })
    .from(purchaseOrders)
    .innerJoin(suppliers, eq(suppliers.id, purchaseOrders.supplierId))
    .where(eq(purchaseOrders.id, id))
    .limit(1);
  if (!row) return null;
  return {
    number: purchaseOrderNumber(id),
    supplier: row.supplier,
    // Orders go to the order address, else the supplier's general one.
    orderEmail: row.orderEmail || row.email,
  };
}

/** A receipt against a purchase order: its order, how many spools or lots, the order's status now. */
async function purchaseReceipt(
  receiptId: number,
): Promise<FlashSubjects["purchaseReceipt"] | null> {
  const [row] = await db
    .select({
      orderId: purchaseOrders.id,
      status: purchaseOrders.status,
      entries: count(purchaseReceiptLines.id),
    })
    .from(purchaseReceipts)
    .innerJoin(purchaseOrders, eq(purchaseOrders.id, purchaseReceipts.orderId))
    .leftJoin(
      purchaseReceiptLines,
      eq(purchaseReceiptLines.receiptId, purchaseReceipts.id),
    )
    .where(eq(purchaseReceipts.id, receiptId))
    .groupBy(purchaseOrders.id, purchaseOrders.status);
  if (!row) return null;
  return {
    reference: purchaseOrderNumber(row.orderId),
    entries: row.entries,
    statusLabel: purchaseOrderStatusLabels[row.status],
  };
}

/** A design line with its wire and revision. */
async function designLine(id: number) {
  const [row] = await db
    .select({
      position: designLines.position,
      sku: items.sku,
      strands: designLines.strandsInHand,
      revision: designRevisions.revision,
    })
    .from(designLines)
    .innerJoin(items, eq(items.id, designLines.itemId))
    .innerJoin(designRevisions, eq(designRevisions.id, designLines.revisionId))
    .where(eq(designLines.id, id))
    .limit(1);
  return row ? { ...row, strands: row.strands ?? 1 } : null;
}

/** A lot with its item and hold. */
async function lot(id: number) {
  const [row] = await db
    .select({
      number: lots.lotNumber,
      sku: items.sku,
      holdReason: lots.holdReason,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .where(eq(lots.id, id))
    .limit(1);
  return row ?? null;
}

/** A person by their id. */
async function person(id: string) {
  const [row] = await db
    .select({ name: users.name, email: users.email })
    .from(users)
    .where(eq(users.id, id))
    .limit(1);
  return row ?? null;
}

/** A design revision with its design's name. */
async function revision(id: number) {
  const [row] = await db
    .select({ design: designs.name, revision: designRevisions.revision })
    .from(designRevisions)
    .innerJoin(designs, eq(designs.id, designRevisions.designId))
    .where(eq(designRevisions.id, id))
    .limit(1);
  return row ?? null;
}

/** The subject of a note's message, or null when it no longer exists. */
export async function flashSubjectOf(
  note: FlashNote,
): Promise<FlashSubjects[keyof FlashSubjects] | null> {
  if (!("id" in note)) return null;
  switch (subjectKindOf(note)) {
    case "none":
      return null;
    case "supplier":
      return supplierNamed(note.id as number);
    case "grade":
      return gradeNamed(note.id as string);
    case "movement":
      return movement(note.id as number);
    case "order":
      return order(note.id as number);
    case "orderIssue":
      return orderIssue(note.id as number);
    case "purchaseOrder":
      return purchaseOrder(note.id as number);
    case "purchaseReceipt":
      return purchaseReceipt(note.id as number);
    case "designLine":
      return designLine(note.id as number);
    case "lot":
      return lot(note.id as number);
    case "person":
      return person(note.id as string);
    case "revision":
      return revision(note.id as number);
  }
}
