/**
 * Low-stock rules and the words of their e-mails. An item with a reorder
 * point above zero is low while its available stock (on hand − reserved) is
 * below that point; an alert opens on the drop and closes when available is
 * back at or above the point. An open alert is covered (no e-mail) while sent
 * orders due within the item's lead time make up the shortfall
 * (`orderCoverage`). Pure: quantities in thousandths of the unit.
 */
import { csvFile } from "~/lib/csv-file";
import type { AlertMailMode } from "~/db/tables/alert-enums";
import { suggestedOrderQuantity } from "~/stock/reorder-quantities";
import {
  amountForQuantity,
  formatExactDecimal,
  formatMoneyText,
  fromThousandths,
  rescale,
  type MoneyAmount,
} from "~/pricing/money";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { addDays, type CalendarDate } from "~/lib/calendar-days";
import { formatDay } from "~/lib/format";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";

export type AlertChange = "open" | "close" | "none";

/** Whether the item is low: a reorder point above zero, and less than that available. */
export function isLow(input: {
  available: bigint;
  reorderPoint: bigint;
}): boolean {
  return input.reorderPoint > 0n && input.available < input.reorderPoint;
}

/** What happens to an item's alert after its available stock changed. */
export function alertChange(input: {
  available: bigint;
  reorderPoint: bigint;
  alertOpen: boolean;
}): AlertChange {
  const low = isLow(input);
  if (low && !input.alertOpen) return "open";
  if (!low && input.alertOpen) return "close";
  return "none";
}

/** What is still to come on one line of a sent (or partly received) order for the item. */
export interface OpenOrderLine {
  orderId: number;
  expectedDate: CalendarDate;
  /** Ordered − received, thousandths of the item's unit. */
  open: bigint;
}

/** The order that makes a low item's shortfall good in time, and when its line is due. */
export interface OrderCoverage {
  orderId: number;
  due: CalendarDate;
}

/**
 * Whether open order lines cover a low item: lines expected on or before today + the
 * item's lead time (what a new order placed today would take) are counted, earliest
 * due first (then the older order), until available + their open quantities reach the
 * reorder point; the order whose line makes it enough covers the alert. Without a
 * known lead time only lines due by today count (never hides a shortfall on a guess).
 * Null when the item is not low or the lines due in time are not enough.
 */
export function orderCoverage(input: {
  available: bigint;
  reorderPoint: bigint;
  today: CalendarDate;
  leadTimeDays: number | null;
  lines: readonly OpenOrderLine[];
}): OrderCoverage | null {
  if (input.reorderPoint <= 0n || input.available >= input.reorderPoint) {
    return null;
  }
  const horizon = addDays(input.today, Math.max(0, input.leadTimeDays ?? 0));
  const inTime = input.lines
    .filter((line) => line.open > 0n && line.expectedDate <= horizon)
    .sort((a, b) =>
      a.expectedDate === b.expectedDate
        ? a.orderId - b.orderId
        : a.expectedDate < b.expectedDate
          ? -1
          : 1,
    );
  let expected = input.available;
  for (const line of inTime) {
    expected += line.open;
    if (expected >= input.reorderPoint) {
      return { orderId: line.orderId, due: line.expectedDate };
    }
  }
  return null;
}

/** "covered by PO-000123 due 12 Dec 2026": how pages, the API and the digest name a covered alert. */
export function coveredText(coverage: {
  orderId: number;
  due: CalendarDate | null;
}): string {
  const order = `covered by ${purchaseOrderNumber(coverage.orderId)}`;
  return coverage.due ? `${order} due ${formatDay(coverage.due)}` : order;
}

export interface AlertPerson {
  id: string;
  email: string;
  roles: readonly string[];
  /** The person's choice; null when never chosen. */
  mode: AlertMailMode | null;
}

/** How a person hears about alerts: buyers each alert unless they chose otherwise; admins only when they opted in. */
export function alertModeOf(person: AlertPerson): AlertMailMode {
  if (person.mode) {
    const allowed =
      person.roles.includes("buyer") || person.roles.includes("admin");
    return allowed ? person.mode : "none";
  }
  return person.roles.includes("buyer") ? "each" : "none";
}

export interface AlertMailFacts {
  sku: string;
  name: string;
  unit: string;
  available: bigint;
  reorderPoint: bigint;
  reorderQuantity: bigint;
  /** The cheapest supplier for the order quantity, or null when nobody's price can be worked out. */
  bestOffer: {
    supplier: string;
    supplierSku: string;
    unitPrice: number;
    currency: string;
  } | null;
  /** Offers quoted for the item that cannot be priced for that quantity, each reason apart. */
  unpricedOffers: {
    supplier: string;
    supplierSku: string;
    reasons: string[];
  }[];
  /** Open build orders that need the item. */
  buildOrders: { id: number; status: string; stillNeeded: bigint }[];
  /** Link to the item page. */
  itemUrl: string;
}

/** "2.500 kg", "3 pieces" with a plain space: e-mail text is read and searched as typed. */
const quantityText = (thousandths: bigint, unit: string) =>
  formatStockQuantity(quantityToNumber(thousandths), unit).replace(
    /\u00a0/g,
    " ",
  );

/** The e-mail sent to each person told about a newly opened alert. */
export function alertMail(facts: AlertMailFacts): {
  subject: string;
  text: string;
} {
  const order = suggestedOrderQuantity(facts);
  const lines = [
    `${facts.sku} ${facts.name} is below its reorder point.`,
    "",
    `Available now: ${quantityText(facts.available, facts.unit)} (on hand less reserved)`,
    `Reorder point: ${quantityText(facts.reorderPoint, facts.unit)}`,
    `Suggested order: ${quantityText(order, facts.unit)} (reorder quantity ${quantityText(facts.reorderQuantity, facts.unit)})`,
    facts.bestOffer
      ? `Best price for that quantity: ${facts.bestOffer.supplier}, their SKU ${facts.bestOffer.supplierSku}, ${facts.bestOffer.unitPrice.toFixed(4)} ${facts.bestOffer.currency} per ${perUnitWord(facts.unit)}`
      : facts.unpricedOffers.length > 0
        ? "No supplier's price can be worked out for that quantity."
        : "No supplier quotes a price for that quantity yet.",
    ...(facts.unpricedOffers.length > 0
      ? [
          `Quoted but not priced for that quantity:`,
          ...facts.unpricedOffers.flatMap((offer) =>
            offer.reasons.map(
              (reason) =>
                `- ${offer.supplier}, their SKU ${offer.supplierSku}: ${reason}`,
            ),
          ),
        ]
      : []),
    "",
    facts.buildOrders.length === 0
      ? "No open build order needs it."
      : `Open build orders that need it: ${facts.buildOrders
          .map(
            (order) =>
              `#${order.id} (${order.status.replace("_", " ")}, ${quantityText(order.stillNeeded, facts.unit)} still to issue)`,
          )
          .join(", ")}`,
    "",
    `Item: ${facts.itemUrl}`,
    "",
    "You get this because you buy for Turnledger; choose each alert, a daily digest or none on your account page.",
  ];
  return {
    subject: `Low stock: ${facts.sku} ${facts.name}`.slice(0, 255),
    text: lines.join("\n"),
  };
}

export interface DigestLine {
  sku: string;
  name: string;
  unit: string;
  available: bigint;
  reorderPoint: bigint;
  openedAt: Date;
  /** The sent order that makes the shortfall good in time, or null (a call to order). */
  coveredBy?: { orderId: number; due: CalendarDate | null } | null;
}

/** The daily digest of every open alert: the ones to order first, then those orders cover. */
export function digestMail(
  alerts: readonly DigestLine[],
  alertsUrl: string,
): { subject: string; text: string } {
  const line = (alert: DigestLine) =>
    `- ${alert.sku} ${alert.name}: ${quantityText(alert.available, alert.unit)} available, reorder point ${quantityText(alert.reorderPoint, alert.unit)} (low since ${alert.openedAt.toISOString().slice(0, 10)}${alert.coveredBy ? `; ${coveredText(alert.coveredBy)}` : ""})`;
  const toOrder = alerts.filter((alert) => !alert.coveredBy);
  const covered = alerts.filter((alert) => alert.coveredBy);
  return {
    subject: `Low stock digest: ${alerts.length} item${alerts.length === 1 ? "" : "s"} below reorder point`,
    text: [
      `${alerts.length} item${alerts.length === 1 ? " is" : "s are"} below the reorder point${covered.length > 0 ? `, ${covered.length} covered by sent orders` : ""}:`,
      "",
      ...toOrder.map(line),
      ...(covered.length > 0
        ? [
            ...(toOrder.length > 0 ? [""] : []),
            "Covered by orders already sent (nothing to order):",
            ...covered.map(line),
          ]
        : []),
      "",
      `All alerts: ${alertsUrl}`,
    ].join("\n"),
  };
}

export interface PurchaseRequestLine {
  sku: string;
  name: string;
  supplierSku: string;
  quantity: bigint;
  unit: string;
  /** Ten-thousandths of the supplier's currency per unit. */
  unitPrice: MoneyAmount;
  currency: string;
}

export const purchaseRequestHeaders = [
  "our_sku",
  "description",
  "supplier_sku",
  "quantity",
  "unit",
  "unit_price",
  "currency",
  "line_total",
] as const;

/** A draft purchase request for one supplier as CSV (formula-like text neutralised). */
export function purchaseRequestCsv(
  lines: readonly PurchaseRequestLine[],
): string {
  const rows = lines.map((line) => {
    const total = amountForQuantity(
      fromThousandths(line.quantity),
      line.unitPrice,
    );
    return [
      line.sku,
      line.name,
      line.supplierSku,
      quantityToNumber(line.quantity),
      // The stock unit as stored (kg, pcs, m), not as words: machine-read, like the API.
      line.unit,
      Number(formatMoneyText(line.unitPrice)),
      line.currency,
      // To the cent, half away from zero.
      Number(
        formatExactDecimal({
          digits: rescale({ digits: total, decimals: 4 }, 2),
          decimals: 2,
        }),
      ),
    ];
  });
  return csvFile(purchaseRequestHeaders, rows);
}
