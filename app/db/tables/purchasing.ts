/**
 * Suppliers, their price lists and what prices depend on: the metal base per
 * conductor and currency, and currency rates to the company currency.
 */
import {
  bigint,
  date,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  smallint,
  text,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { createdAt, users } from "./accounts";
import { items } from "./stock";
import { metalBaseFixings } from "./purchase-order-enums";

export const suppliers = mysqlTable(
  "suppliers",
  {
    id: int("id").autoincrement().primaryKey(),
    name: varchar("name", { length: 120 }).notNull(),
    email: varchar("email", { length: 254 }),
    /** ISO 4217 code the supplier quotes in unless a price line says otherwise. */
    currency: varchar("currency", { length: 3 }).notNull(),
    leadTimeDays: smallint("lead_time_days"),
    /** Where purchase orders are e-mailed; the general address when empty. */
    orderEmail: varchar("order_email", { length: 254 }),
    /** When the metal base of a wire price is fixed: on ordering or on delivery (both common practice). */
    metalBaseFixedAt: mysqlEnum("metal_base_fixed_at", metalBaseFixings)
      .notNull()
      .default("order"),
    /** How far past the ordered quantity a delivery may go, percent: wire by weight, and pieces (common practice, no source). */
    wireTolerancePercent: decimal("wire_tolerance_percent", {
      precision: 5,
      scale: 2,
    })
      .notNull()
      .default("10"),
    pieceTolerancePercent: decimal("piece_tolerance_percent", {
      precision: 5,
      scale: 2,
    })
      .notNull()
      .default("0"),
    notes: varchar("notes", { length: 1000 }),
    createdAt: createdAt(),
  },
  (table) => [uniqueIndex("suppliers_name_unique").on(table.name)],
);

/** The supplier's own part number for one of our items (filled by imports). */
export const supplierItems = mysqlTable(
  "supplier_items",
  {
    id: int("id").autoincrement().primaryKey(),
    supplierId: int("supplier_id")
      .notNull()
      .references(() => suppliers.id),
    supplierSku: varchar("supplier_sku", { length: 60 }).notNull(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
  },
  (table) => [
    uniqueIndex("supplier_items_sku_unique").on(
      table.supplierId,
      table.supplierSku,
    ),
    index("supplier_items_item_idx").on(table.itemId),
  ],
);

/** One committed price-list file. The same file (by SHA-256) is imported once per supplier. */
export const priceImports = mysqlTable(
  "price_imports",
  {
    id: int("id").autoincrement().primaryKey(),
    supplierId: int("supplier_id")
      .notNull()
      .references(() => suppliers.id),
    fileName: varchar("file_name", { length: 200 }).notNull(),
    fileSha256: varchar("file_sha256", { length: 64 }).notNull(),
    rowCount: int("row_count").notNull(),
    createdItems: int("created_items").notNull().default(0),
    /** The column mapping used, JSON: our field → the file's header. */
    mapping: text("mapping").notNull(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("price_imports_file_unique").on(
      table.supplierId,
      table.fileSha256,
    ),
    index("price_imports_time_idx").on(table.createdAt),
  ],
);

/** A supplier's price for an item from a minimum quantity, valid from a date. */
export const priceLines = mysqlTable(
  "price_lines",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    supplierId: int("supplier_id")
      .notNull()
      .references(() => suppliers.id),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    supplierSku: varchar("supplier_sku", { length: 60 }).notNull(),
    currency: varchar("currency", { length: 3 }).notNull(),
    /** Price per unit of the item; null when the line is an adder on the metal base. */
    unitPrice: decimal("unit_price", { precision: 14, scale: 4 }),
    /** Fabrication adder per kg of wire, priced on top of the metal base. */
    adderPerKg: decimal("adder_per_kg", { precision: 14, scale: 4 }),
    conductor: varchar("conductor", { length: 20 }),
    minQuantity: decimal("min_quantity", { precision: 14, scale: 3 }).notNull(),
    validFrom: date("valid_from", { mode: "string" }).notNull(),
    /** The supplier's lead time for this line, days; the supplier's own when null. */
    leadTimeDays: smallint("lead_time_days"),
    /** Sold only in whole packs or spools of this quantity (in the item's unit); null when any quantity. */
    packQuantity: decimal("pack_quantity", { precision: 14, scale: 3 }),
    importId: int("import_id").references(() => priceImports.id),
    line: int("line"),
  },
  (table) => [
    uniqueIndex("price_lines_break_unique").on(
      table.supplierId,
      table.supplierSku,
      table.minQuantity,
      table.validFrom,
    ),
    index("price_lines_item_idx").on(table.itemId, table.validFrom),
  ],
);

/** The column mapping last used for a supplier, offered again on the next import. */
export const supplierMappings = mysqlTable("supplier_mappings", {
  supplierId: int("supplier_id")
    .primaryKey()
    .references(() => suppliers.id),
  /** The file's header row, joined by tabs: a file with the same header maps itself. */
  headerSignature: text("header_signature").notNull(),
  mapping: text("mapping").notNull(),
});

/** Copper or aluminium price per kg, in a currency, from a date (kept by the buyer). */
export const metalBasePrices = mysqlTable(
  "metal_base_prices",
  {
    id: int("id").autoincrement().primaryKey(),
    conductor: varchar("conductor", { length: 20 }).notNull(),
    currency: varchar("currency", { length: 3 }).notNull(),
    pricePerKg: decimal("price_per_kg", { precision: 14, scale: 4 }).notNull(),
    validFrom: date("valid_from", { mode: "string" }).notNull(),
    userId: varchar("user_id", { length: 40 }).references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("metal_base_unique").on(
      table.conductor,
      table.currency,
      table.validFrom,
    ),
  ],
);

/** Units of the company currency per one unit of `currency`, from a date. */
export const currencyRates = mysqlTable(
  "currency_rates",
  {
    id: int("id").autoincrement().primaryKey(),
    currency: varchar("currency", { length: 3 }).notNull(),
    rate: decimal("rate", { precision: 16, scale: 6 }).notNull(),
    validFrom: date("valid_from", { mode: "string" }).notNull(),
    userId: varchar("user_id", { length: 40 }).references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [
    uniqueIndex("currency_rates_unique").on(table.currency, table.validFrom),
  ],
);

/** Company-wide settings (admins): e.g. company_currency. */
export const settings = mysqlTable("settings", {
  key: varchar("setting_key", { length: 60 }).primaryKey(),
  value: varchar("value", { length: 500 }).notNull(),
});
