/**
 * The buying plan as the API and the page read it: quantities as numbers in the item's
 * unit, money as numbers (to 0.0001), days as "YYYY-MM-DD". Also the key of a suggestion
 * (item and week: one suggestion per item per shortfall) and the draft orders a chosen
 * set of suggestions makes, one per supplier. Pure.
 */
import { buildOrderReference } from "~/build-orders/build-order-status";
import type { CalendarDate } from "~/lib/calendar-days";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { amountForQuantity, fromThousandths } from "~/pricing/money";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";
import type { BuyingPlan, Suggestion } from "./buying-plan";

const money = (tenThousandths: bigint) => Number(tenThousandths) / 10_000;

/** "W-050@2026-12-14": the item and the week of its shortfall. */
export function suggestionKey(
  suggestion: Pick<Suggestion, "needBy"> & { item: { sku: string } },
): string {
  return `${suggestion.item.sku}@${suggestion.needBy}`;
}

function suggestionJson(suggestion: Suggestion, drafts: readonly number[]) {
  const order = suggestion.order;
  const candidate = order?.candidate ?? null;
  return {
    key: suggestionKey(suggestion),
    sku: suggestion.item.sku,
    name: suggestion.item.name,
    unit: suggestion.item.unit,
    supplierId: candidate?.line.supplierId ?? null,
    supplier: candidate?.supplier ?? null,
    supplierSku: candidate?.supplierSku ?? null,
    quantity: quantityToNumber(suggestion.quantity),
    shortfall: quantityToNumber(suggestion.shortfall),
    /** Per unit, as the supplier quotes it, in `currency` (wire on a metal base: base + adder). */
    unitPrice: candidate ? money(candidate.quotedUnitPrice) : null,
    currency: candidate?.currency ?? null,
    /** unitPrice × quantity in `currency`. */
    total: candidate
      ? money(
          amountForQuantity(
            fromThousandths(suggestion.quantity),
            candidate.quotedUnitPrice,
          ),
        )
      : null,
    /** The whole order in the company currency (what offers are compared by). */
    totalInCompanyCurrency: candidate
      ? money(candidate.totalForQuantity)
      : null,
    packQuantity:
      order?.packQuantity == null ? null : quantityToNumber(order.packQuantity),
    raisedToBreak: order?.raisedToBreak ?? false,
    leadTimeDays: candidate?.leadTimeDays ?? null,
    needBy: suggestion.needBy,
    orderBy: suggestion.orderBy,
    late: suggestion.late,
    reason: suggestion.reason,
    /** Draft purchase orders already holding the item (drafts are not on order: send them, or this suggestion stays). */
    draftOrders: drafts.map((id) => ({ id, number: purchaseOrderNumber(id) })),
    needs: suggestion.needs.map((need) => ({
      buildOrderId: need.buildOrderId,
      reference: buildOrderReference(need.buildOrderId),
      quantity: quantityToNumber(need.quantity),
    })),
  };
}

export type SuggestionJson = ReturnType<typeof suggestionJson>;

export function buyingPlanJson(
  plan: BuyingPlan & {
    today: CalendarDate;
    companyCurrency: string;
    draftsBySku?: Record<string, number[]>;
  },
) {
  return {
    today: plan.today,
    /** Weeks start on Monday; the first is the week of `today`. */
    weeks: plan.weeks,
    companyCurrency: plan.companyCurrency,
    suggestions: plan.suggestions.map((suggestion) =>
      suggestionJson(suggestion, plan.draftsBySku?.[suggestion.item.sku] ?? []),
    ),
    items: plan.items.map(({ item, weeks }) => ({
      sku: item.sku,
      name: item.name,
      unit: item.unit,
      reorderPoint: quantityToNumber(item.reorderPoint),
      available: quantityToNumber(item.onHand - item.reserved - item.held),
      weeks: weeks.map((week) => ({
        weekStart: week.weekStart,
        needed: quantityToNumber(
          week.needs.reduce((sum, need) => sum + need.quantity, 0n),
        ),
        arriving: quantityToNumber(week.arriving),
        suggested: quantityToNumber(week.suggested),
        /** At the week's end, before this week's suggestion arrives. */
        projected: quantityToNumber(week.projected),
        projectedWithSuggestion: quantityToNumber(week.projectedWithSuggestion),
      })),
    })),
  };
}

export type BuyingPlanJson = ReturnType<typeof buyingPlanJson>;

export interface DraftOrderInput {
  supplierId: number;
  currency: string;
  lines: {
    sku: string;
    /** Thousandths of the item's unit. */
    quantity: bigint;
    requestedDate: CalendarDate;
  }[];
}

/**
 * The draft orders the chosen suggestions make: one per supplier (in the supplier's
 * quoting currency of the first chosen line), lines in the plan's order. A line is
 * requested for its need-by day, or today when that Monday has passed. Suggestions
 * without a supplier cannot be ordered and are returned apart.
 */
export function draftOrdersOf(
  suggestions: readonly Suggestion[],
  chosenKeys: ReadonlySet<string>,
  today: CalendarDate,
): { orders: DraftOrderInput[]; unpriced: string[] } {
  const bySupplier = new Map<number, DraftOrderInput>();
  const unpriced: string[] = [];
  for (const suggestion of suggestions) {
    if (!chosenKeys.has(suggestionKey(suggestion))) continue;
    const candidate = suggestion.order?.candidate;
    const supplierId = candidate?.line.supplierId;
    if (!candidate || supplierId === undefined) {
      unpriced.push(suggestion.item.sku);
      continue;
    }
    let order = bySupplier.get(supplierId);
    if (!order) {
      order = { supplierId, currency: candidate.currency, lines: [] };
      bySupplier.set(supplierId, order);
    }
    order.lines.push({
      sku: suggestion.item.sku,
      quantity: suggestion.quantity,
      requestedDate: suggestion.needBy < today ? today : suggestion.needBy,
    });
  }
  return { orders: [...bySupplier.values()], unpriced };
}
