/**
 * Where a lot went and what went into a build order, read from the journal (never kept
 * twice): an issue to a build order is the movement its `build_order_issues` row names; a
 * return is a `return` movement of the lot whose reference names the order ("BO-12",
 * as the record page's "Build order" field takes it). Every read goes by an index:
 * movements by `movements_lot_idx` (lot_id), issues by their primary key (movement_id)
 * and `build_order_issues_line_idx`, order lines by `build_order_lines_order_item_unique`
 * (order_id first), orders, designs, revisions, lots and items by primary key.
 */
import { and, eq, inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  buildOrderIssues,
  buildOrderLines,
  buildOrders,
  designRevisions,
  designs,
  items,
  lots,
  stockMovements,
  suppliers,
} from "~/db/schema";
import {
  buildOrderIdInReference,
  buildOrderReference,
} from "~/build-orders/build-order-status";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { issueTotals, type IssueOrReturn } from "./issue-totals";

/** One build order a lot went into (the API's `uses`). */
export interface LotUse {
  buildOrderId: number;
  reference: string;
  design: string;
  revision: number;
  /** Motors the order builds. */
  motorQuantity: number;
  issued: number;
  returned: number;
  net: number;
  unit: string;
  /** ISO times; firstIssuedAt null when the order only returned stock of the lot. */
  firstIssuedAt: string | null;
  lastMovementAt: string;
}

/** Issues of the lot not made to a build order (older workshop jobs, plain issues). */
export interface OtherIssues {
  count: number;
  quantity: number;
}

/** Every build order that drew from the lot, issues net of returns, oldest first. */
export async function lotWhereUsed(
  lotId: number,
  unit: string,
): Promise<{ uses: LotUse[]; otherIssues: OtherIssues }> {
  const rows = await db
    .select({
      type: stockMovements.type,
      quantity: stockMovements.quantity,
      reference: stockMovements.reference,
      createdAt: stockMovements.createdAt,
      issuedToOrder: buildOrderLines.orderId,
    })
    .from(stockMovements)
    .leftJoin(
      buildOrderIssues,
      eq(buildOrderIssues.movementId, stockMovements.id),
    )
    .leftJoin(buildOrderLines, eq(buildOrderLines.id, buildOrderIssues.lineId))
    .where(
      and(
        eq(stockMovements.lotId, lotId),
        inArray(stockMovements.type, ["issue", "return"]),
      ),
    );
  const movements: IssueOrReturn<number>[] = [];
  const other: OtherIssues = { count: 0, quantity: 0 };
  let otherThousandths = 0n;
  for (const row of rows) {
    const orderId =
      row.type === "issue"
        ? row.issuedToOrder
        : buildOrderIdInReference(row.reference);
    if (orderId === null) {
      if (row.type === "issue") {
        other.count += 1;
        otherThousandths -= parseQuantity(row.quantity);
      }
      continue;
    }
    movements.push({
      key: orderId,
      type: row.type as "issue" | "return",
      quantity: parseQuantity(row.quantity),
      at: row.createdAt,
    });
  }
  other.quantity = quantityToNumber(otherThousandths);
  const totals = issueTotals(movements);
  const orders = await ordersById(totals.map((total) => total.key));
  const uses = totals.flatMap((total) => {
    const order = orders.get(total.key);
    // A return naming an order that does not exist, or one that never drew from this lot,
    // is not a use of the lot (as in the build order's own list of lots).
    if (!order || total.issued === 0n) return [];
    return [
      {
        buildOrderId: total.key,
        reference: buildOrderReference(total.key),
        design: order.design,
        revision: order.revision,
        motorQuantity: order.quantity,
        issued: quantityToNumber(total.issued),
        returned: quantityToNumber(total.returned),
        net: quantityToNumber(total.net),
        unit,
        firstIssuedAt: total.firstIssuedAt?.toISOString() ?? null,
        lastMovementAt: total.lastMovementAt.toISOString(),
      },
    ];
  });
  return { uses, otherIssues: other };
}

async function ordersById(ids: number[]) {
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({
      id: buildOrders.id,
      quantity: buildOrders.quantity,
      design: designs.name,
      revision: designRevisions.revision,
    })
    .from(buildOrders)
    .innerJoin(designs, eq(designs.id, buildOrders.designId))
    .innerJoin(designRevisions, eq(designRevisions.id, buildOrders.revisionId))
    .where(inArray(buildOrders.id, ids));
  return new Map(rows.map((row) => [row.id, row]));
}

/** One lot that went into a build order (the API's `lots`). */
export interface BuildOrderLot {
  lotId: number;
  lot: string;
  sku: string;
  itemName: string;
  supplier: { id: number; name: string } | null;
  supplierBatch: string | null;
  /** True while the lot is on hold. */
  onHold: boolean;
  issued: number;
  returned: number;
  net: number;
  unit: string;
  firstIssuedAt: string | null;
  lastMovementAt: string;
}

/**
 * Every lot issued to the order, issues net of the returns that name it, in the order of
 * the first issue. Items not kept in lots (lot 0) have no lot to trace and are left out.
 */
export async function buildOrderLots(
  orderId: number,
): Promise<BuildOrderLot[]> {
  const issued = await db
    .select({
      lotId: stockMovements.lotId,
      quantity: stockMovements.quantity,
      createdAt: stockMovements.createdAt,
    })
    .from(buildOrderLines)
    .innerJoin(
      buildOrderIssues,
      eq(buildOrderIssues.lineId, buildOrderLines.id),
    )
    .innerJoin(
      stockMovements,
      eq(stockMovements.id, buildOrderIssues.movementId),
    )
    .where(eq(buildOrderLines.orderId, orderId));
  const lotIds = [
    ...new Set(issued.map((row) => row.lotId).filter((id) => id > 0)),
  ];
  if (lotIds.length === 0) return [];
  const returned = await db
    .select({
      lotId: stockMovements.lotId,
      quantity: stockMovements.quantity,
      reference: stockMovements.reference,
      createdAt: stockMovements.createdAt,
    })
    .from(stockMovements)
    .where(
      and(
        inArray(stockMovements.lotId, lotIds),
        eq(stockMovements.type, "return"),
      ),
    );
  const movements: IssueOrReturn<number>[] = [
    ...issued
      .filter((row) => row.lotId > 0)
      .map((row) => ({
        key: row.lotId,
        type: "issue" as const,
        quantity: parseQuantity(row.quantity),
        at: row.createdAt,
      })),
    ...returned
      .filter((row) => buildOrderIdInReference(row.reference) === orderId)
      .map((row) => ({
        key: row.lotId,
        type: "return" as const,
        quantity: parseQuantity(row.quantity),
        at: row.createdAt,
      })),
  ];
  const lotRows = await db
    .select({
      id: lots.id,
      number: lots.lotNumber,
      supplierBatch: lots.supplierBatch,
      heldAt: lots.heldAt,
      supplierId: suppliers.id,
      supplierName: suppliers.name,
      sku: items.sku,
      itemName: items.name,
      unit: items.unit,
    })
    .from(lots)
    .innerJoin(items, eq(items.id, lots.itemId))
    .leftJoin(suppliers, eq(suppliers.id, lots.supplierId))
    .where(inArray(lots.id, lotIds));
  const lotsById = new Map(lotRows.map((row) => [row.id, row]));
  return issueTotals(movements).map((total) => {
    const lot = lotsById.get(total.key)!;
    return {
      lotId: lot.id,
      lot: lot.number,
      sku: lot.sku,
      itemName: lot.itemName,
      supplier:
        lot.supplierId === null || lot.supplierName === null
          ? null
          : { id: lot.supplierId, name: lot.supplierName },
      supplierBatch: lot.supplierBatch,
      onHold: lot.heldAt !== null,
      issued: quantityToNumber(total.issued),
      returned: quantityToNumber(total.returned),
      net: quantityToNumber(total.net),
      unit: lot.unit,
      firstIssuedAt: total.firstIssuedAt?.toISOString() ?? null,
      lastMovementAt: total.lastMovementAt.toISOString(),
    };
  });
}

/** True when the build order exists (by its primary key). */
export async function buildOrderExists(orderId: number): Promise<boolean> {
  const [row] = await db
    .select({ id: buildOrders.id })
    .from(buildOrders)
    .where(eq(buildOrders.id, orderId))
    .limit(1);
  return Boolean(row);
}
