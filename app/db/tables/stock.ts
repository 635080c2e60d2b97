/**
 * The catalogue and the stock ledger. Movements are append-only; balances per
 * item × lot × location and per item are kept by the same transaction that
 * writes a movement (see docs/decisions/005-stock-ledger.md).
 */
import {
  bigint,
  boolean,
  check,
  date,
  datetime,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  primaryKey,
  smallint,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { sql } from "drizzle-orm";
import { createdAt, users } from "./accounts";

import {
  itemKinds,
  magnetShapes,
  movementTypes,
  stockUnits,
} from "./stock-enums";

/** Quantities: 3 decimals (kg to the gram); whole numbers for pieces are enforced in code. */
const quantity = (name: string) => decimal(name, { precision: 14, scale: 3 });
/** Money per unit, in the company currency: 4 decimals. */
const unitMoney = (name: string) => decimal(name, { precision: 14, scale: 4 });

export const locations = mysqlTable(
  "locations",
  {
    id: int("id").autoincrement().primaryKey(),
    /** Short code people type and print on labels: "MAIN", "MAIN-A3". */
    code: varchar("code", { length: 20 }).notNull(),
    name: varchar("name", { length: 80 }).notNull(),
    kind: mysqlEnum("kind", ["store", "bin"]).notNull(),
    parentId: int("parent_id"),
    active: boolean("active").notNull().default(true),
    /** The day its last stocktake was approved (cycle counting picks the longest uncounted). */
    lastCountedOn: date("last_counted_on", { mode: "string" }),
  },
  (table) => [uniqueIndex("locations_code_unique").on(table.code)],
);

export const items = mysqlTable(
  "items",
  {
    id: int("id").autoincrement().primaryKey(),
    sku: varchar("sku", { length: 40 }).notNull(),
    name: varchar("name", { length: 160 }).notNull(),
    kind: mysqlEnum("kind", itemKinds).notNull(),
    unit: mysqlEnum("unit", stockUnits).notNull(),
    /** What the list shows in its size/grade column: "AWG 20 heavy", "N42SH block 20×10×5". */
    sizeOrGrade: varchar("size_or_grade", { length: 80 }).notNull().default(""),
    reorderPoint: quantity("reorder_point").notNull().default("0"),
    reorderQuantity: quantity("reorder_quantity").notNull().default("0"),
    preferredSupplierId: int("preferred_supplier_id"),
    active: boolean("active").notNull().default(true),
    /** Kept balances for the whole item (all lots and locations). */
    onHand: quantity("on_hand").notNull().default("0"),
    reserved: quantity("reserved").notNull().default("0"),
    /**
     * The free part of lots on hold (quality block): Σ (on hand − reserved) over the
     * balances of held lots. Held stock is on hand but not available.
     */
    held: quantity("held").notNull().default("0"),
    /** Still to come on sent purchase orders (ordered − received, until received or closed). */
    onOrder: quantity("on_order").notNull().default("0"),
    /** Moving average cost per unit, updated on receipts. */
    averageCost: unitMoney("average_cost").notNull().default("0"),
    /** Kept by the database from the columns above, so lists sort and filter on an index. */
    available: decimal("available", {
      precision: 14,
      scale: 3,
    }).generatedAlwaysAs(sql`on_hand - reserved - held`, { mode: "stored" }),
    stockValue: decimal("stock_value", {
      precision: 20,
      scale: 4,
    }).generatedAlwaysAs(sql`on_hand * average_cost`, { mode: "stored" }),
    /** What the stock list's search box looks in: SKU, name and size, lower case (binary collation: fast LIKE). */
    searchText: varchar("search_text", { length: 300 }).generatedAlwaysAs(
      sql`LOWER(CONCAT_WS(' ', sku, name, size_or_grade))`,
      { mode: "stored" },
    ),
    belowReorder: boolean("below_reorder").generatedAlwaysAs(
      sql`reorder_point > 0 AND on_hand - reserved - held < reorder_point`,
      { mode: "stored" },
    ),
    createdAt: createdAt(),
    updatedAt: datetime("updated_at", { mode: "date", fsp: 3 })
      .notNull()
      .$defaultFn(() => new Date()),
  },
  (table) => [
    uniqueIndex("items_sku_unique").on(table.sku),
    index("items_name_idx").on(table.name),
    index("items_kind_idx").on(table.kind, table.sku),
    index("items_active_idx").on(table.active, table.sku),
    index("items_value_idx").on(table.active, table.stockValue),
    index("items_kind_value_idx").on(
      table.active,
      table.kind,
      table.stockValue,
    ),
    index("items_search_idx").on(table.active, table.searchText, table.sku),
    index("items_available_idx").on(table.active, table.available),
    index("items_below_reorder_idx").on(
      table.active,
      table.belowReorder,
      table.sku,
    ),
    index("items_on_hand_idx").on(table.active, table.onHand),
    check("items_on_hand_not_negative", sql`${table.onHand} >= 0`),
    check("items_reserved_not_negative", sql`${table.reserved} >= 0`),
    check("items_held_not_negative", sql`${table.held} >= 0`),
    check("items_on_order_not_negative", sql`${table.onOrder} >= 0`),
  ],
);

/**
 * How many items there are by active, kind and below-reorder: the stock list's total without
 * counting the catalogue. Kept by triggers on items (migration 0020, decision 050), in the same
 * transaction as the item's own change; touched only when one of the three columns changes.
 */
export const itemCounts = mysqlTable(
  "item_counts",
  {
    active: boolean("active").notNull(),
    kind: mysqlEnum("kind", itemKinds).notNull(),
    belowReorder: boolean("below_reorder").notNull(),
    items: int("items").notNull().default(0),
  },
  (table) => [
    primaryKey({
      name: "item_counts_pk",
      columns: [table.active, table.kind, table.belowReorder],
    }),
  ],
);

/**
 * The stock list's search postings: one row per distinct three-character piece ("gram") of
 * an item's search_text, so a substring search walks the postings of one of its term's
 * grams in SKU order instead of reading the whole search index. Kept by triggers on items
 * (migration 0022, decision 057-trigram-search) in the same transaction as the item's own
 * change; `gram` has a binary collation (edited by hand in the migration, as search_text).
 */
export const itemSearchGrams = mysqlTable(
  "item_search_grams",
  {
    gram: varchar("gram", { length: 3 }).notNull(),
    sku: varchar("sku", { length: 40 }).notNull(),
    itemId: int("item_id").notNull(),
    active: boolean("active").notNull(),
  },
  (table) => [
    primaryKey({
      name: "item_search_grams_pk",
      columns: [table.gram, table.sku],
    }),
    index("item_search_grams_item_idx").on(table.itemId),
  ],
);

export const wireItems = mysqlTable("wire_items", {
  itemId: int("item_id")
    .primaryKey()
    .references(() => items.id, { onDelete: "cascade" }),
  conductor: varchar("conductor", { length: 20 }).notNull(),
  standard: mysqlEnum("standard", ["AWG", "IEC"]).notNull(),
  sizeLabel: varchar("size_label", { length: 12 }).notNull(),
  insulation: varchar("insulation", { length: 12 }),
  thermalClass: smallint("thermal_class").notNull(),
  enamel: varchar("enamel", { length: 40 }).notNull(),
});

export const magnetItems = mysqlTable("magnet_items", {
  itemId: int("item_id")
    .primaryKey()
    .references(() => items.id, { onDelete: "cascade" }),
  gradeKey: varchar("grade_key", { length: 40 }).notNull(),
  shape: mysqlEnum("shape", magnetShapes).notNull(),
  /** Shape dimensions in mm, as the magnet estimate takes them: { lengthMm, widthMm, heightMm } … */
  dimensionsMm: varchar("dimensions_mm", { length: 200 }).notNull(),
  coating: varchar("coating", { length: 40 }).notNull(),
  magnetisation: varchar("magnetisation", { length: 60 }).notNull(),
});

export const lots = mysqlTable(
  "lots",
  {
    id: int("id").autoincrement().primaryKey(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    lotNumber: varchar("lot_number", { length: 40 }).notNull(),
    supplierBatch: varchar("supplier_batch", { length: 60 }),
    spoolType: varchar("spool_type", { length: 40 }),
    /** Empty spool mass, kg (wire lots). */
    tareKg: quantity("tare_kg"),
    receivedOn: date("received_on", { mode: "string" }),
    /** Who supplied it, when known (a receipt against an order, or named at receipt). */
    supplierId: int("supplier_id"),
    /** The purchase order it was first received against, when there was one. */
    purchaseOrderId: int("purchase_order_id"),
    /** The receipt movement that created the lot. */
    receiptMovementId: bigint("receipt_movement_id", { mode: "number" }),
    /** Set while the lot is on hold (quality block): why, since when, by whom. Null when free. */
    holdReason: varchar("hold_reason", { length: 300 }),
    heldAt: datetime("held_at", { mode: "date", fsp: 3 }),
    heldBy: varchar("held_by", { length: 40 }),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("lots_item_number_unique").on(table.itemId, table.lotNumber),
    index("lots_number_idx").on(table.lotNumber),
    index("lots_supplier_idx").on(table.supplierId, table.id),
    index("lots_held_idx").on(table.heldAt),
  ],
);

export const stockMovements = mysqlTable(
  "stock_movements",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    type: mysqlEnum("type", movementTypes).notNull(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    /** 0 when the item is not kept in lots. */
    lotId: int("lot_id").notNull().default(0),
    locationId: int("location_id")
      .notNull()
      .references(() => locations.id),
    /** Signed: + into the location, − out of it. A transfer writes two rows with one transferId. */
    quantity: quantity("quantity").notNull(),
    unitCost: unitMoney("unit_cost"),
    /** Moving average cost after this movement, per unit (for the value history). */
    averageCostAfter: unitMoney("average_cost_after").notNull(),
    /** Item on hand (all lots and locations) after this movement. */
    itemOnHandAfter: quantity("item_on_hand_after").notNull(),
    transferId: bigint("transfer_id", { mode: "number" }),
    /** For a count: the quantity found; the movement's quantity is the difference. */
    countedQuantity: quantity("counted_quantity"),
    /** For a weigh-back issue: the spool's gross mass, kg. */
    grossKg: quantity("gross_kg"),
    reference: varchar("reference", { length: 80 }),
    note: varchar("note", { length: 500 }),
    reversesMovementId: bigint("reverses_movement_id", { mode: "number" }),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    index("movements_item_time_idx").on(table.itemId, table.createdAt),
    index("movements_time_idx").on(table.createdAt),
    index("movements_type_time_idx").on(table.type, table.createdAt),
    index("movements_user_time_idx").on(table.userId, table.createdAt),
    index("movements_lot_idx").on(table.lotId),
    index("movements_reference_idx").on(table.reference),
  ],
);

/** On hand and reserved per item × lot × location: written only with a movement or reservation. */
export const stockBalances = mysqlTable(
  "stock_balances",
  {
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    lotId: int("lot_id").notNull().default(0),
    locationId: int("location_id")
      .notNull()
      .references(() => locations.id),
    onHand: quantity("on_hand").notNull().default("0"),
    reserved: quantity("reserved").notNull().default("0"),
    updatedAt: datetime("updated_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    primaryKey({ columns: [table.itemId, table.lotId, table.locationId] }),
    index("balances_location_idx").on(table.locationId, table.itemId),
    check("balances_on_hand_not_negative", sql`${table.onHand} >= 0`),
    check("balances_reserved_not_negative", sql`${table.reserved} >= 0`),
  ],
);
