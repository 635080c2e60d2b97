/**
 * Low-stock alerts kept after every movement and reservation: each touched
 * item is checked once its transaction has committed; a drop below the
 * reorder point opens an alert and e-mails the people who want each alert,
 * a return to the point closes it. Mail goes through the outbox, so an SMTP
 * failure never fails the stock work; `npm run mail:retry` sends it later.
 */
import {
  and,
  asc,
  desc,
  eq,
  inArray,
  isNotNull,
  isNull,
  like,
  sql,
  type SQL,
} from "drizzle-orm";
import { db, type Transaction } from "~/db/client.server";
import {
  retryWriteConflicts,
  writeTransaction,
} from "~/db/write-transaction.server";
import { appUrl } from "~/lib/app-url.server";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";
import { areaLogger } from "~/observability/logger.server";
import { isDuplicateKey } from "~/db/database-errors";
import {
  alertPreferences,
  buildOrderLines,
  buildOrders,
  items,
  stockAlertNotices,
  stockAlerts,
  suppliers,
  userRoles,
  users,
} from "~/db/schema";
import { coverDueDays, openOrderLinesOf } from "./open-order-lines.server";
import { deliverLater, queueMail, writeToOutbox } from "~/mail/mailer.server";
import { todayUtc } from "~/lib/calendar-days";
import { containsPattern } from "~/lib/list-filters";
import { bestPricesOf, loadItemPricing } from "~/purchasing/item-prices.server";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { quantityToPrice } from "~/stock/reorder-quantities";
import { afterMovementsCommitted } from "~/stock/stock-movements.server";
import {
  alertChange,
  alertMail,
  alertModeOf,
  coveredText,
  digestMail,
  isLow,
  orderCoverage,
  type AlertMailFacts,
  type AlertPerson,
  type OrderCoverage,
} from "./low-stock";

const alertsLog = areaLogger("alerts");

/** Active buyers and admins with their alert choice. */
async function alertPeople(): Promise<AlertPerson[]> {
  const rows = await db
    .select({
      id: users.id,
      email: users.email,
      role: userRoles.role,
      mode: alertPreferences.mode,
    })
    .from(users)
    .innerJoin(userRoles, eq(userRoles.userId, users.id))
    .leftJoin(alertPreferences, eq(alertPreferences.userId, users.id))
    .where(
      and(eq(users.active, true), inArray(userRoles.role, ["buyer", "admin"])),
    );
  const people = new Map<string, AlertPerson>();
  for (const row of rows) {
    const person = people.get(row.id) ?? {
      id: row.id,
      email: row.email,
      roles: [],
      mode: row.mode ?? null,
    };
    people.set(row.id, { ...person, roles: [...person.roles, row.role] });
  }
  return [...people.values()];
}

/**
 * The item's prices for the e-mail: the same function and quantity rule as its page
 * (`bestPricesOf`, `quantityToPrice`), so the two never disagree about who quotes it.
 */
async function offersFor(item: {
  sku: string;
  available: bigint;
  reorderPoint: bigint;
  reorderQuantity: bigint;
}): Promise<Pick<AlertMailFacts, "bestOffer" | "unpricedOffers">> {
  const pricing = await loadItemPricing(item.sku);
  if (!pricing) return { bestOffer: null, unpricedOffers: [] };
  const prices = bestPricesOf(pricing, quantityToPrice(item), todayUtc());
  const [best] = prices.prices;
  return {
    bestOffer: best
      ? {
          supplier: best.supplier,
          supplierSku: best.supplierSku,
          unitPrice: best.unitPrice,
          currency: prices.companyCurrency,
        }
      : null,
    unpricedOffers: prices.cannotPrice,
  };
}

/** Open build orders that still need an item, with what is still to issue. */
async function openBuildOrdersNeeding(itemId: number) {
  const rows = await db
    .select({
      id: buildOrders.id,
      status: buildOrders.status,
      required: buildOrderLines.required,
      issued: buildOrderLines.issued,
    })
    .from(buildOrderLines)
    .innerJoin(buildOrders, eq(buildOrders.id, buildOrderLines.orderId))
    .where(
      and(
        eq(buildOrderLines.itemId, itemId),
        inArray(buildOrders.status, ["draft", "reserved", "in_progress"]),
      ),
    )
    .orderBy(asc(buildOrders.id))
    .limit(20);
  return rows
    .map((row) => ({
      id: row.id,
      status: row.status,
      stillNeeded: parseQuantity(row.required) - parseQuantity(row.issued),
    }))
    .filter((row) => row.stillNeeded > 0n);
}

interface AlertItem {
  id: number;
  sku: string;
  name: string;
  unit: string;
  available: bigint;
  reorderPoint: bigint;
  reorderQuantity: bigint;
}

/** Who is told of a new alert at once, and the e-mail they get. */
async function newAlertMail(item: AlertItem) {
  const recipients = (await alertPeople()).filter(
    (person) => alertModeOf(person) === "each",
  );
  if (recipients.length === 0) return { recipients, mail: null };
  const mail = alertMail({
    ...item,
    ...(await offersFor(item)),
    buildOrders: await openBuildOrdersNeeding(item.id),
    itemUrl: `${appUrl()}/stock/items/${encodeURIComponent(item.sku)}`,
  });
  return { recipients, mail };
}

/** Writes the alert's e-mails to the outbox and who was told, inside the caller's transaction. */
async function writeAlertMail(
  tx: Transaction,
  alertId: number,
  { recipients, mail }: Awaited<ReturnType<typeof newAlertMail>>,
) {
  if (!mail) return [];
  // Written now, sent after the commit (deliverLater).
  const messages = await writeToOutbox(
    tx,
    recipients.map((person) => ({ to: person.email, ...mail })),
  );
  await tx.insert(stockAlertNotices).values(
    recipients.map((person, index) => ({
      alertId,
      userId: person.id,
      kind: "alert" as const,
      outboxId: messages[index]!.id,
      createdAt: new Date(),
    })),
  );
  return messages;
}

/**
 * Opens the item's alert with its e-mails and notices in one transaction, and hands the
 * e-mails to SMTP once it has committed; nothing when another request opened the alert
 * first (one open alert per item: the unique key decides, inside the transaction).
 * An alert covered by a sent order opens marked so, and e-mails nobody.
 * The e-mail's text and recipients are read before: a description, not a decision.
 */
async function openAlert(item: AlertItem, coverage: OrderCoverage | null) {
  const text = (thousandths: bigint) =>
    quantityToNumber(thousandths).toFixed(3);
  const told = coverage
    ? { recipients: [], mail: null }
    : await newAlertMail(item);
  const queued = await writeTransaction(
    async (tx) => {
      let alertId: number;
      try {
        const [created] = await tx
          .insert(stockAlerts)
          .values({
            itemId: item.id,
            availableAtOpen: text(item.available),
            reorderPoint: text(item.reorderPoint),
            reorderQuantity: text(item.reorderQuantity),
            openedAt: new Date(),
            coveredByOrderId: coverage?.orderId ?? null,
          })
          .$returningId();
        alertId = created!.id;
      } catch (error) {
        // Another request opened it a moment ago: it tells people.
        if (isDuplicateKey(error)) return [];
        throw error;
      }
      return writeAlertMail(tx, alertId, told);
    },
    { label: "low-stock alert" },
  );
  deliverLater(queued);
}

/**
 * Keeps an open alert's cover up to date: another order may now cover it, or its order
 * was cancelled, closed short or slipped. Losing its cover makes it a call to order: the
 * e-mails go out then, once (the update that clears the cover decides who sends them).
 */
async function recoverAlert(
  item: AlertItem,
  alertId: number,
  coveredBefore: number | null,
  coverage: OrderCoverage | null,
) {
  const coveredNow = coverage?.orderId ?? null;
  if (coveredNow === coveredBefore) return;
  const told =
    coveredBefore !== null && coveredNow === null
      ? await newAlertMail(item)
      : { recipients: [], mail: null };
  const queued = await writeTransaction(
    async (tx) => {
      const [result] = await tx
        .update(stockAlerts)
        .set({ coveredByOrderId: coveredNow })
        .where(
          and(
            eq(stockAlerts.id, alertId),
            isNull(stockAlerts.closedAt),
            coveredBefore === null
              ? isNull(stockAlerts.coveredByOrderId)
              : eq(stockAlerts.coveredByOrderId, coveredBefore),
          ),
        );
      // Another request changed it first: it tells people.
      if (result.affectedRows !== 1) return [];
      return writeAlertMail(tx, alertId, told);
    },
    { label: "low-stock alert cover" },
  );
  deliverLater(queued);
}

/**
 * Checks the items after their stock changed: opens, keeps or closes each
 * one's alert, and whether sent orders cover it. Call it after the stock (or
 * purchase-order) transaction has committed. Errors are logged, never thrown:
 * the stock work has already been done. `touched` picks the items (by id or
 * by SKU), read in the same query as their alerts.
 */
async function checkStockAlertsWhere(touched: SQL) {
  try {
    const rows = await db
      .select({
        id: items.id,
        sku: items.sku,
        name: items.name,
        unit: items.unit,
        onHand: items.onHand,
        reserved: items.reserved,
        held: items.held,
        reorderPoint: items.reorderPoint,
        reorderQuantity: items.reorderQuantity,
        leadTimeDays: suppliers.leadTimeDays,
        openAlertId: stockAlerts.id,
        coveredByOrderId: stockAlerts.coveredByOrderId,
      })
      .from(items)
      .leftJoin(stockAlerts, eq(stockAlerts.openItemId, items.id))
      .leftJoin(suppliers, eq(suppliers.id, items.preferredSupplierId))
      .where(touched);
    const checked = rows.map((row) => ({
      row,
      item: {
        id: row.id,
        sku: row.sku,
        name: row.name,
        unit: row.unit,
        available:
          parseQuantity(row.onHand) -
          parseQuantity(row.reserved) -
          parseQuantity(row.held),
        reorderPoint: parseQuantity(row.reorderPoint),
        reorderQuantity: parseQuantity(row.reorderQuantity),
      },
    }));
    // Only a low item's alert looks at what sent orders bring (its cover): the orders
    // are read for those alone, and not at all when none is low (most movements).
    const lowIds = checked
      .filter(({ item }) => isLow(item))
      .map(({ item }) => item.id);
    const openLines = await openOrderLinesOf(lowIds);
    for (const { row, item } of checked) {
      const change = alertChange({
        available: item.available,
        reorderPoint: item.reorderPoint,
        alertOpen: row.openAlertId !== null,
      });
      const coverage = () =>
        orderCoverage({
          available: item.available,
          reorderPoint: item.reorderPoint,
          today: todayUtc(),
          leadTimeDays: row.leadTimeDays,
          lines: openLines.get(item.id) ?? [],
        });
      const text = (thousandths: bigint) =>
        quantityToNumber(thousandths).toFixed(3);
      if (change === "close") {
        await retryWriteConflicts(
          () =>
            db
              .update(stockAlerts)
              .set({
                closedAt: new Date(),
                availableAtClose: text(item.available),
              })
              .where(
                and(
                  eq(stockAlerts.id, row.openAlertId!),
                  isNull(stockAlerts.closedAt),
                ),
              ),
          { label: "low-stock alert close" },
        );
      } else if (change === "open") {
        await openAlert(item, coverage());
      } else if (row.openAlertId !== null) {
        await recoverAlert(
          item,
          row.openAlertId,
          row.coveredByOrderId,
          coverage(),
        );
      }
    }
  } catch (error) {
    alertsLog.error({ err: error }, "low-stock check failed");
  }
}

/** Sends the digest of every open alert to the people who chose it; answers how many were sent. */
export async function sendAlertDigest(): Promise<{
  people: number;
  alerts: number;
}> {
  const open = await db
    .select({
      id: stockAlerts.id,
      openedAt: stockAlerts.openedAt,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      onHand: items.onHand,
      reserved: items.reserved,
      held: items.held,
      reorderPoint: items.reorderPoint,
      itemId: stockAlerts.itemId,
      coveredByOrderId: stockAlerts.coveredByOrderId,
    })
    .from(stockAlerts)
    .innerJoin(items, eq(items.id, stockAlerts.itemId))
    .where(isNotNull(stockAlerts.openItemId))
    .orderBy(asc(items.sku));
  if (open.length === 0) return { people: 0, alerts: 0 };
  const covers = await coversOf(open);
  const recipients = (await alertPeople()).filter(
    (person) => alertModeOf(person) === "digest",
  );
  const mail = digestMail(
    open.map((alert) => ({
      sku: alert.sku,
      name: alert.name,
      unit: alert.unit,
      available:
        parseQuantity(alert.onHand) -
        parseQuantity(alert.reserved) -
        parseQuantity(alert.held),
      reorderPoint: parseQuantity(alert.reorderPoint),
      openedAt: alert.openedAt,
      coveredBy: covers.get(alert.id) ?? null,
    })),
    `${appUrl()}/alerts`,
  );
  for (const person of recipients) {
    const { outboxId } = await queueMail({ to: person.email, ...mail });
    await db.insert(stockAlertNotices).values(
      open.map((alert) => ({
        alertId: alert.id,
        userId: person.id,
        kind: "digest" as const,
        outboxId,
        createdAt: new Date(),
      })),
    );
  }
  return { people: recipients.length, alerts: open.length };
}

/** Each covered alert's order and the day it is due (null once the order has nothing open for the item). */
async function coversOf(
  alerts: readonly {
    id: number;
    itemId: number;
    coveredByOrderId: number | null;
  }[],
): Promise<Map<number, { orderId: number; due: string | null }>> {
  const covered = alerts.flatMap((alert) =>
    alert.coveredByOrderId === null
      ? []
      : [
          {
            id: alert.id,
            itemId: alert.itemId,
            orderId: alert.coveredByOrderId,
          },
        ],
  );
  const due = await coverDueDays(covered);
  return new Map(
    covered.map((alert) => [
      alert.id,
      {
        orderId: alert.orderId,
        due: due.get(`${alert.itemId}:${alert.orderId}`) ?? null,
      },
    ]),
  );
}

/** A covered alert as pages and the API show it: the order, its number, when due, in words. */
function coverAnswer(
  cover: { orderId: number; due: string | null } | undefined,
) {
  return cover
    ? {
        orderId: cover.orderId,
        order: purchaseOrderNumber(cover.orderId),
        due: cover.due,
        text: coveredText(cover),
      }
    : null;
}

/** Open alerts for the start page: those to order, and those sent orders cover. */
export async function countOpenAlertsByCover(): Promise<{
  toOrder: number;
  covered: number;
}> {
  const [row] = await db
    .select({
      total: sql<number>`COUNT(*)`,
      covered: sql<number>`COUNT(${stockAlerts.coveredByOrderId})`,
    })
    .from(stockAlerts)
    .where(isNotNull(stockAlerts.openItemId));
  const total = Number(row?.total ?? 0);
  const covered = Number(row?.covered ?? 0);
  return { toOrder: total - covered, covered };
}

/** How many alerts are open now (one per item at most), for the start page. */
export async function countOpenAlerts(): Promise<number> {
  const [row] = await db
    .select({ total: sql<number>`COUNT(*)` })
    .from(stockAlerts)
    .where(isNotNull(stockAlerts.openItemId));
  return Number(row?.total ?? 0);
}

export const alertsPageSize = 50;

/** Alerts newest first (open, closed or all), with who was told and when. */
export async function listAlerts(options: {
  status: "open" | "closed" | "all";
  page: number;
  perPage?: number;
  /** Part of the item's SKU, name or size (the stock list's search). */
  search?: string;
}) {
  const perPage = options.perPage ?? alertsPageSize;
  const where = and(
    options.status === "open"
      ? isNull(stockAlerts.closedAt)
      : options.status === "closed"
        ? isNotNull(stockAlerts.closedAt)
        : undefined,
    options.search
      ? inArray(
          stockAlerts.itemId,
          db
            .select({ id: items.id })
            .from(items)
            .where(
              like(
                items.searchText,
                containsPattern(options.search.toLowerCase()),
              ),
            ),
        )
      : undefined,
  );
  const [{ total }] = (await db
    .select({ total: sql<number>`COUNT(*)` })
    .from(stockAlerts)
    .where(where)) as [{ total: number }];
  const alerts = await db
    .select({
      id: stockAlerts.id,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      onHand: items.onHand,
      reserved: items.reserved,
      held: items.held,
      availableAtOpen: stockAlerts.availableAtOpen,
      reorderPoint: stockAlerts.reorderPoint,
      reorderQuantity: stockAlerts.reorderQuantity,
      openedAt: stockAlerts.openedAt,
      closedAt: stockAlerts.closedAt,
      availableAtClose: stockAlerts.availableAtClose,
      itemId: stockAlerts.itemId,
      coveredByOrderId: stockAlerts.coveredByOrderId,
    })
    .from(stockAlerts)
    .innerJoin(items, eq(items.id, stockAlerts.itemId))
    .where(where)
    .orderBy(desc(stockAlerts.openedAt), desc(stockAlerts.id))
    .limit(perPage)
    .offset((options.page - 1) * perPage);
  const notices =
    alerts.length === 0
      ? []
      : await db
          .select({
            alertId: stockAlertNotices.alertId,
            kind: stockAlertNotices.kind,
            createdAt: stockAlertNotices.createdAt,
            email: users.email,
            name: users.name,
          })
          .from(stockAlertNotices)
          .innerJoin(users, eq(users.id, stockAlertNotices.userId))
          .where(
            inArray(
              stockAlertNotices.alertId,
              alerts.map((alert) => alert.id),
            ),
          )
          .orderBy(asc(stockAlertNotices.createdAt));
  const covers = await coversOf(alerts);
  return {
    total: Number(total),
    alerts: alerts.map((alert) => ({
      id: alert.id,
      sku: alert.sku,
      name: alert.name,
      unit: alert.unit,
      status: alert.closedAt ? ("closed" as const) : ("open" as const),
      availableNow: quantityToNumber(
        parseQuantity(alert.onHand) -
          parseQuantity(alert.reserved) -
          parseQuantity(alert.held),
      ),
      availableAtOpen: Number(alert.availableAtOpen),
      reorderPoint: Number(alert.reorderPoint),
      reorderQuantity: Number(alert.reorderQuantity),
      openedAt: alert.openedAt.toISOString(),
      closedAt: alert.closedAt?.toISOString() ?? null,
      availableAtClose:
        alert.availableAtClose === null ? null : Number(alert.availableAtClose),
      coveredBy: coverAnswer(covers.get(alert.id)),
      told: notices
        .filter((notice) => notice.alertId === alert.id)
        .map(({ kind, createdAt, email, name }) => ({
          kind,
          name,
          email,
          at: createdAt.toISOString(),
        })),
    })),
  };
}

/** Checks the items of a build order after its reservations or issues changed. */
export async function checkStockAlertsOfOrder(orderId: number) {
  try {
    const lines = await db
      .select({ itemId: buildOrderLines.itemId })
      .from(buildOrderLines)
      .where(eq(buildOrderLines.orderId, orderId));
    await checkStockAlerts(lines.map((line) => line.itemId));
  } catch (error) {
    alertsLog.error({ err: error }, "low-stock check failed");
  }
}

/** Checks the items with these ids (after their stock changed); see checkStockAlertsWhere. */
export async function checkStockAlerts(itemIds: readonly number[]) {
  if (itemIds.length > 0)
    await checkStockAlertsWhere(inArray(items.id, [...new Set(itemIds)]));
}

/** Checks the items with these SKUs (after a movement), found in the same query as their alerts. */
export async function checkStockAlertsOfSkus(skus: readonly string[]) {
  if (skus.length > 0)
    await checkStockAlertsWhere(inArray(items.sku, [...new Set(skus)]));
}

// Every movement the ledger commits is checked against the reorder points, once, after
// the final commit (the ledger's after-commit hook; it imports no alert code).
afterMovementsCommitted(checkStockAlertsOfSkus);
