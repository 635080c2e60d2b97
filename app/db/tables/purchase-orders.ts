/**
 * Purchase orders to suppliers, their lines, their history, and the receipts booked
 * against them. An order's number is "PO-" and its id in six digits (see
 * app/purchase-orders/purchase-order-number.ts). What is still to come on sent orders is
 * kept on the item (`items.on_order`) by the same transactions that send, receive,
 * cancel or close an order.
 */
import { sql } from "drizzle-orm";
import {
  bigint,
  check,
  date,
  datetime,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  smallint,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { createdAt, users } from "./accounts";
import { items, stockMovements } from "./stock";
import { suppliers } from "./purchasing";
import {
  linePriceSources,
  metalBaseFixings,
  purchaseOrderStatuses,
} from "./purchase-order-enums";

const quantity = (name: string) => decimal(name, { precision: 14, scale: 3 });
const unitMoney = (name: string) => decimal(name, { precision: 14, scale: 4 });

export const purchaseOrders = mysqlTable(
  "purchase_orders",
  {
    id: int("id").autoincrement().primaryKey(),
    supplierId: int("supplier_id")
      .notNull()
      .references(() => suppliers.id),
    status: mysqlEnum("status", purchaseOrderStatuses)
      .notNull()
      .default("draft"),
    /** ISO 4217 code of every price on the order (the supplier's currency unless chosen). */
    currency: varchar("currency", { length: 3 }).notNull(),
    notes: varchar("notes", { length: 1000 }).notNull().default(""),
    /** The day the order was sent: expected dates count from it. Null while draft. */
    orderedOn: date("ordered_on", { mode: "string" }),
    sentAt: datetime("sent_at", { mode: "date", fsp: 3 }),
    /** Why an order was cancelled or closed short. */
    endReason: varchar("end_reason", { length: 500 }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    updatedAt: datetime("updated_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    index("purchase_orders_status_idx").on(table.status, table.id),
    index("purchase_orders_supplier_idx").on(table.supplierId, table.id),
  ],
);

export const purchaseOrderLines = mysqlTable(
  "purchase_order_lines",
  {
    id: int("id").autoincrement().primaryKey(),
    orderId: int("order_id")
      .notNull()
      .references(() => purchaseOrders.id),
    /** 1, 2, 3 … in the order they were added: the line number printed on the order. */
    lineNumber: smallint("line_number").notNull(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    supplierSku: varchar("supplier_sku", { length: 60 }).notNull().default(""),
    /** In the item's unit (kg, pcs, m). */
    quantity: quantity("quantity").notNull(),
    /** Per unit of the item, in the order's currency (wire: base + adder per kg). */
    unitPrice: unitMoney("unit_price").notNull(),
    priceSource: mysqlEnum("price_source", linePriceSources).notNull(),
    /** Kept with an overridden price: why the buyer changed it. */
    overrideReason: varchar("override_reason", { length: 300 }),
    /** Wire lines priced on the metal base: the base and adder per kg, and when the base is fixed. */
    metalBasePerKg: unitMoney("metal_base_per_kg"),
    adderPerKg: unitMoney("adder_per_kg"),
    metalBaseFixedAt: mysqlEnum("metal_base_fixed_at", metalBaseFixings),
    requestedDate: date("requested_date", { mode: "string" }),
    /** Lead time used for this line (price line's, else the supplier's), days. */
    leadTimeDays: smallint("lead_time_days").notNull().default(0),
    /** Requested date, else order date (creation day while draft) + lead time. */
    expectedDate: date("expected_date", { mode: "string" }).notNull(),
    /** Received so far, in the item's unit. */
    received: quantity("received").notNull().default("0"),
    /** When the line was received in full (for on-time and in-full figures). */
    completedAt: datetime("completed_at", { mode: "date", fsp: 3 }),
  },
  (table) => [
    uniqueIndex("purchase_order_lines_number_unique").on(
      table.orderId,
      table.lineNumber,
    ),
    index("purchase_order_lines_item_idx").on(table.itemId, table.expectedDate),
    index("purchase_order_lines_expected_idx").on(table.expectedDate),
    check("purchase_order_lines_quantity", sql`${table.quantity} > 0`),
    check("purchase_order_lines_received", sql`${table.received} >= 0`),
    check("purchase_order_lines_price", sql`${table.unitPrice} >= 0`),
  ],
);

/** Every change to an order: who, when, what (in words), in order. */
export const purchaseOrderEvents = mysqlTable(
  "purchase_order_events",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    orderId: int("order_id")
      .notNull()
      .references(() => purchaseOrders.id),
    /** created, line-added, line-changed, line-removed, price-overridden, edited, sent, received, cancelled, closed-short. */
    kind: varchar("kind", { length: 30 }).notNull(),
    detail: varchar("detail", { length: 1000 }).notNull().default(""),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    index("purchase_order_events_order_idx").on(table.orderId, table.id),
  ],
);

/** One delivery booked against an order by a storekeeper. */
export const purchaseReceipts = mysqlTable(
  "purchase_receipts",
  {
    id: int("id").autoincrement().primaryKey(),
    orderId: int("order_id")
      .notNull()
      .references(() => purchaseOrders.id),
    /** The receipt day: its exchange rate converts the order's prices. */
    receivedOn: date("received_on", { mode: "string" }).notNull(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [index("purchase_receipts_order_idx").on(table.orderId, table.id)],
);

/** One spool or lot of a receipt: the order line it fills and the ledger movement it made. */
export const purchaseReceiptLines = mysqlTable(
  "purchase_receipt_lines",
  {
    id: int("id").autoincrement().primaryKey(),
    receiptId: int("receipt_id")
      .notNull()
      .references(() => purchaseReceipts.id),
    orderLineId: int("order_line_id")
      .notNull()
      .references(() => purchaseOrderLines.id),
    movementId: bigint("movement_id", { mode: "number" })
      .notNull()
      .references(() => stockMovements.id),
    quantity: quantity("quantity").notNull(),
    /** The order line's price in the order's currency on the day (wire with the base fixed at delivery: that day's base). */
    unitPrice: unitMoney("unit_price").notNull(),
    /** The same in the company currency, as booked on the movement. */
    unitCost: unitMoney("unit_cost").notNull(),
    /** Company currency per order currency used; null when they are the same. */
    rate: decimal("rate", { precision: 16, scale: 6 }),
  },
  (table) => [
    index("purchase_receipt_lines_receipt_idx").on(table.receiptId),
    index("purchase_receipt_lines_line_idx").on(table.orderLineId),
    uniqueIndex("purchase_receipt_lines_movement_unique").on(table.movementId),
  ],
);
