/**
 * Low-stock alerts: one open alert per item while its available stock is
 * below the reorder point, closed by itself when stock is back; who was told
 * and when; and how each person wants to hear about them.
 */
import { sql } from "drizzle-orm";
import {
  bigint,
  datetime,
  decimal,
  index,
  int,
  mysqlEnum,
  mysqlTable,
  uniqueIndex,
  varchar,
} from "drizzle-orm/mysql-core";
import { mailOutbox, users } from "./accounts";
import { items } from "./stock";
import { alertMailModes } from "./alert-enums";

const quantity = (name: string) => decimal(name, { precision: 14, scale: 3 });

export const stockAlerts = mysqlTable(
  "stock_alerts",
  {
    id: int("id").autoincrement().primaryKey(),
    itemId: int("item_id")
      .notNull()
      .references(() => items.id),
    /** Available (on hand − reserved) when the alert opened. */
    availableAtOpen: quantity("available_at_open").notNull(),
    reorderPoint: quantity("reorder_point").notNull(),
    reorderQuantity: quantity("reorder_quantity").notNull(),
    openedAt: datetime("opened_at", { mode: "date", fsp: 3 }).notNull(),
    closedAt: datetime("closed_at", { mode: "date", fsp: 3 }),
    availableAtClose: quantity("available_at_close"),
    /** The sent purchase order that covers the shortfall when the alert opened (no e-mail then). */
    coveredByOrderId: int("covered_by_order_id"),
    /** The item while the alert is open, null once closed: unique, so an item has one open alert. */
    openItemId: int("open_item_id").generatedAlwaysAs(
      sql`IF(closed_at IS NULL, item_id, NULL)`,
      { mode: "stored" },
    ),
  },
  (table) => [
    uniqueIndex("stock_alerts_one_open").on(table.openItemId),
    index("stock_alerts_item_idx").on(table.itemId, table.openedAt),
    index("stock_alerts_opened_idx").on(table.openedAt),
    index("stock_alerts_closed_idx").on(table.closedAt, table.openedAt),
  ],
);

/** Who was told about an alert, how, and when (the message itself is in the outbox). */
export const stockAlertNotices = mysqlTable(
  "stock_alert_notices",
  {
    id: bigint("id", { mode: "number" }).autoincrement().primaryKey(),
    alertId: int("alert_id")
      .notNull()
      .references(() => stockAlerts.id),
    userId: varchar("user_id", { length: 40 })
      .notNull()
      .references(() => users.id),
    kind: mysqlEnum("kind", ["alert", "digest"]).notNull(),
    outboxId: int("outbox_id").references(() => mailOutbox.id),
    createdAt: datetime("created_at", { mode: "date", fsp: 3 }).notNull(),
  },
  (table) => [
    index("stock_alert_notices_alert_idx").on(table.alertId),
    index("stock_alert_notices_user_idx").on(table.userId, table.createdAt),
  ],
);

/**
 * How a person hears about low stock: an e-mail per alert, a daily digest, or
 * none. Without a row, buyers get each alert and admins none (they opt in).
 */
export const alertPreferences = mysqlTable("alert_preferences", {
  userId: varchar("user_id", { length: 40 })
    .primaryKey()
    .references(() => users.id, { onDelete: "cascade" }),
  mode: mysqlEnum("mode", alertMailModes).notNull(),
});
