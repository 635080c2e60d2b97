/**
 * Build orders: N motors of a released design revision. Each line is one item
 * with the quantity required, reserved (held on particular balances, see
 * `build_order_reservations`) and issued. Every status change is recorded.
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
  primaryKey,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { createdAt, users } from "./accounts";
import { designRevisions, designs } from "./designs";
import { items, locations, stockMovements } from "./stock";
import { buildOrderStatuses } from "./build-order-enums";

const quantity = (name: string) => decimal(name, { precision: 14, scale: 3 });

export const buildOrders = mysqlTable(
  "build_orders",
  {
    id: int("id").autoincrement().primaryKey(),
    designId: int("design_id")
      .notNull()
      .references(() => designs.id),
    revisionId: int("revision_id")
      .notNull()
      .references(() => designRevisions.id),
    /** Motors to build. */
    quantity: int("quantity").notNull(),
    status: mysqlEnum("status", buildOrderStatuses).notNull().default("draft"),
    note: varchar("note", { length: 500 }).notNull().default(""),
    /** When building starts: the buying plan needs the order's stock by this day. */
    plannedStart: date("planned_start", { mode: "string" }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    updatedAt: datetime("updated_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    index("build_orders_status_idx").on(table.status, table.id),
    index("build_orders_revision_idx").on(table.revisionId),
    check("build_orders_quantity_positive", sql`${table.quantity} > 0`),
  ],
);

export const buildOrderLines = mysqlTable(
  "build_order_lines",
  {
    id: int("id").autoincrement().primaryKey(),
    orderId: int("order_id")
      .notNull()
      .references(() => buildOrders.id),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    /** Per-motor quantity × motors (wire in kg including scrap), rounded up to the unit's step. */
    required: quantity("required").notNull(),
    reserved: quantity("reserved").notNull().default("0"),
    issued: quantity("issued").notNull().default("0"),
    /** Planned cost of the line at creation (company currency), for planned vs actual. */
    plannedUnitCost: decimal("planned_unit_cost", { precision: 14, scale: 4 }),
  },
  (table) => [
    // One line per item: the design's lines of one item are added together.
    uniqueIndex("build_order_lines_order_item_unique").on(
      table.orderId,
      table.itemId,
    ),
    index("build_order_lines_item_idx").on(table.itemId),
    check("build_order_lines_required", sql`${table.required} > 0`),
    check("build_order_lines_reserved", sql`${table.reserved} >= 0`),
    check("build_order_lines_issued", sql`${table.issued} >= 0`),
  ],
);

/** What one order line holds on one balance (item × lot × location). */
export const buildOrderReservations = mysqlTable(
  "build_order_reservations",
  {
    lineId: int("line_id")
      .notNull()
      .references(() => buildOrderLines.id),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    lotId: int("lot_id").notNull().default(0),
    locationId: int("location_id")
      .notNull()
      .references(() => locations.id),
    quantity: quantity("quantity").notNull(),
  },
  (table) => [
    primaryKey({
      columns: [table.lineId, table.itemId, table.lotId, table.locationId],
    }),
    index("build_order_reservations_balance_idx").on(
      table.itemId,
      table.lotId,
      table.locationId,
    ),
    check("build_order_reservations_positive", sql`${table.quantity} > 0`),
  ],
);

export const buildOrderEvents = mysqlTable(
  "build_order_events",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    orderId: int("order_id")
      .notNull()
      .references(() => buildOrders.id),
    fromStatus: mysqlEnum("from_status", buildOrderStatuses),
    toStatus: mysqlEnum("to_status", buildOrderStatuses).notNull(),
    note: varchar("note", { length: 500 }).notNull().default(""),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [index("build_order_events_order_idx").on(table.orderId)],
);

/**
 * What was issued to an order line: one row per issue movement, with the item's
 * moving average cost at that moment (the actual cost of the build).
 */
export const buildOrderIssues = mysqlTable(
  "build_order_issues",
  {
    movementId: bigint("movement_id", { mode: "number" })
      .primaryKey()
      .references(() => stockMovements.id),
    lineId: int("line_id")
      .notNull()
      .references(() => buildOrderLines.id),
    quantity: quantity("quantity").notNull(),
    /** The item's moving average cost when it was issued, per unit. */
    unitCost: decimal("unit_cost", { precision: 14, scale: 4 }).notNull(),
  },
  (table) => [
    index("build_order_issues_line_idx").on(table.lineId),
    check("build_order_issues_positive", sql`${table.quantity} > 0`),
  ],
);
