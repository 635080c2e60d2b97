/**
 * The storeroom floor: lot certificates, the history of lot holds, and stocktakes
 * (see docs/decisions/039-storeroom-floor.md).
 */
import {
  bigint,
  boolean,
  char,
  customType,
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
import { items, locations, lots } from "./stock";
import { lotHoldActions, stocktakeStatuses } from "./storeroom-enums";

const quantity = (name: string) => decimal(name, { precision: 14, scale: 3 });

/** File bytes, up to 16 MiB (the upload limit is lower: app/lots/certificate-rules.ts). */
const mediumBlob = customType<{ data: Buffer; driverData: Buffer }>({
  dataType() {
    return "mediumblob";
  },
});

/**
 * The bytes of an uploaded document, once per content (SHA-256). Kept in the database
 * so backups, restores and the cluster carry them with the rows that name them.
 */
export const documentContents = mysqlTable("document_contents", {
  sha256: char("sha256", { length: 64 }).primaryKey(),
  sizeBytes: int("size_bytes").notNull(),
  content: mediumBlob("content").notNull(),
  createdAt: createdAt(),
});

/** A mill or test certificate (PDF or image) attached to a lot. */
export const lotDocuments = mysqlTable(
  "lot_documents",
  {
    id: int("id").autoincrement().primaryKey(),
    lotId: int("lot_id")
      .notNull()
      .references(() => lots.id),
    /** The file name as uploaded, cleaned of paths and control characters. */
    fileName: varchar("file_name", { length: 160 }).notNull(),
    /** Checked from the file's first bytes, not taken from the browser: application/pdf, image/png, image/jpeg. */
    contentType: varchar("content_type", { length: 60 }).notNull(),
    sizeBytes: int("size_bytes").notNull(),
    sha256: char("sha256", { length: 64 })
      .notNull()
      .references(() => documentContents.sha256),
    /** "Mill certificate", "Test report" … */
    title: varchar("title", { length: 120 }).notNull().default(""),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
  },
  (table) => [index("lot_documents_lot_idx").on(table.lotId, table.id)],
);

/** Every hold put on a lot and its release, with the reason: the quality record. */
export const lotHoldEvents = mysqlTable(
  "lot_hold_events",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    lotId: int("lot_id")
      .notNull()
      .references(() => lots.id),
    action: mysqlEnum("action", lotHoldActions).notNull(),
    reason: varchar("reason", { length: 300 }).notNull(),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [index("lot_hold_events_lot_idx").on(table.lotId, table.id)],
);

/** A count of chosen locations. Nothing is posted to the ledger until it is approved. */
export const stocktakes = mysqlTable(
  "stocktakes",
  {
    id: int("id").autoincrement().primaryKey(),
    status: mysqlEnum("status", stocktakeStatuses).notNull().default("counting"),
    note: varchar("note", { length: 300 }).notNull().default(""),
    startedBy: varchar("started_by", { length: 40 })
      .notNull()
      .references(() => users.id),
    startedAt: datetime("started_at", { mode: "date", fsp: 3 }).notNull(),
    approvedBy: varchar("approved_by", { length: 40 }).references(
      () => users.id,
    ),
    approvedAt: datetime("approved_at", { mode: "date", fsp: 3 }),
    /** Set when it is cancelled or approved: no more counting. */
    closedAt: datetime("closed_at", { mode: "date", fsp: 3 }),
  },
  (table) => [index("stocktakes_status_idx").on(table.status, table.id)],
);

/** The locations a stocktake covers. */
export const stocktakeLocations = mysqlTable(
  "stocktake_locations",
  {
    stocktakeId: int("stocktake_id")
      .notNull()
      .references(() => stocktakes.id),
    locationId: int("location_id")
      .notNull()
      .references(() => locations.id),
  },
  (table) => [
    primaryKey({ columns: [table.stocktakeId, table.locationId] }),
    index("stocktake_locations_location_idx").on(table.locationId),
  ],
);

/**
 * One lot × location to count. The book quantity is recorded at the start and again
 * when the count is entered (movements during the count move the book, not the count);
 * the variance is counted − book at count.
 */
export const stocktakeLines = mysqlTable(
  "stocktake_lines",
  {
    id: int("id").autoincrement().primaryKey(),
    stocktakeId: int("stocktake_id")
      .notNull()
      .references(() => stocktakes.id),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    /** 0 when the item is not kept in lots (as in stock_balances). */
    lotId: int("lot_id").notNull().default(0),
    locationId: int("location_id")
      .notNull()
      .references(() => locations.id),
    bookAtStart: quantity("book_at_start").notNull(),
    counted: quantity("counted"),
    /** The book quantity at the moment the count was entered. */
    bookAtCount: quantity("book_at_count"),
    /** Wire counted by weighing: the spool's gross mass and the tare used, kg. */
    grossKg: quantity("gross_kg"),
    tareKg: quantity("tare_kg"),
    countedBy: varchar("counted_by", { length: 40 }).references(() => users.id),
    countedAt: datetime("counted_at", { mode: "date", fsp: 3 }),
    /** Asked for again by the reviewer: the count is cleared until it is entered anew. */
    recountRequested: boolean("recount_requested").notNull().default(false),
    /** Added during the count (found on the shelf, not on the book at the start). */
    addedDuringCount: boolean("added_during_count").notNull().default(false),
    /** The count movement approval posted, when there was a difference. */
    movementId: bigint("movement_id", { mode: "number" }),
  },
  (table) => [
    uniqueIndex("stocktake_lines_unique").on(
      table.stocktakeId,
      table.itemId,
      table.lotId,
      table.locationId,
    ),
    index("stocktake_lines_order_idx").on(
      table.stocktakeId,
      table.locationId,
      table.id,
    ),
  ],
);
