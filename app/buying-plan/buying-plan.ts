/**
 * The buying plan: what the open build orders will take, netted week by week against the
 * stock, and what to order so that no week falls below the reorder point. Pure: the
 * caller loads the figures and says what "today" is.
 *
 * - Weeks start on Monday; the first is the week `today` lies in (plan-weeks.ts).
 * - A build order's remaining need of an item (required − issued − what it holds
 *   reserved, since reserved stock is already out of "on hand − reserved") falls in the
 *   week of its planned start. An order with no planned start, or one that should have
 *   started already, needs it this week. Needs after the horizon are left out.
 * - Open purchase-order lines arrive in the week of their expected date; overdue lines
 *   count this week; lines due after the horizon are left out.
 * - projected(week) = on hand − reserved + arrivals due by the week's end − needs up to
 *   the week's end + what this plan suggested for earlier weeks.
 * - Where projected falls below the reorder point (below zero when the item has none),
 *   one suggestion brings it back: at least the shortfall and at least the reorder
 *   quantity, rounded and priced by order-quantity.ts, needed by the Monday of that week
 *   and ordered the supplier's lead time before. The following weeks count it as arriving.
 */
import type { CalendarDate } from "~/lib/calendar-days";
import { addDays } from "~/lib/calendar-days";
import type { PricingContext } from "~/pricing/line-price";
import type { PriceLine } from "~/pricing/price-line";
import { chooseOrder, type OrderChoice } from "./order-quantity";
import { planWeeks, weekIndexOf } from "./plan-weeks";
import { suggestionReason } from "./plan-reason";

/** Quantities in thousandths of the item's unit. */
export interface PlanItem {
  itemId: number;
  sku: string;
  name: string;
  unit: string;
  onHand: bigint;
  reserved: bigint;
  /** The free stock of its lots on hold (decision 039): on hand but not usable. */
  held: bigint;
  /** 0: the item has no reorder point (then the plan keeps it from going below zero). */
  reorderPoint: bigint;
  reorderQuantity: bigint;
}

/** One open build order's line: what it still needs (required − issued − reserved). */
export interface PlanNeed {
  itemId: number;
  buildOrderId: number;
  plannedStart: CalendarDate | null;
  remaining: bigint;
}

/** One open purchase-order line: what is still to come and when. */
export interface PlanArrival {
  itemId: number;
  orderId: number;
  expectedDate: CalendarDate;
  open: bigint;
}

export interface BuyingPlanInput extends Omit<
  PricingContext,
  "date" | "rateDay"
> {
  today: CalendarDate;
  weeks: number;
  items: readonly PlanItem[];
  needs: readonly PlanNeed[];
  arrivals: readonly PlanArrival[];
  lines: readonly PriceLine[];
}

export interface WeekNeed {
  buildOrderId: number;
  quantity: bigint;
}

export interface PlanWeek {
  weekStart: CalendarDate;
  /** Build orders' needs falling in the week, by order. */
  needs: WeekNeed[];
  /** Open purchase-order quantities arriving in the week. */
  arriving: bigint;
  /** Projected stock at the week's end, before this week's suggestion. */
  projected: bigint;
  /** What this plan suggests buying for the week (0 when nothing). */
  suggested: bigint;
  /** Projected with this week's suggestion arrived. */
  projectedWithSuggestion: bigint;
}

export interface ItemPlan {
  item: PlanItem;
  weeks: PlanWeek[];
}

export interface Suggestion {
  item: PlanItem;
  /** How far below the reorder point (zero) the week falls. */
  shortfall: bigint;
  /** At least the shortfall and the reorder quantity, rounded to the offer's packs and breaks. */
  quantity: bigint;
  /** The offer and its price for the quantity; null when no supplier can price the item. */
  order: OrderChoice | null;
  /** The Monday of the week of the shortfall. */
  needBy: CalendarDate;
  /** needBy − lead time (the price line's, else the supplier's; none known: needBy). */
  orderBy: CalendarDate;
  /** True when orderBy is before today: order now, it will come late. */
  late: boolean;
  needs: WeekNeed[];
  reason: string;
}

export interface BuyingPlan {
  weeks: CalendarDate[];
  suggestions: Suggestion[];
  items: ItemPlan[];
}

/** What a build-order line still needs: required − issued − reserved (held stock is already out of the free stock); never below 0. */
export function remainingNeed(line: {
  required: bigint;
  issued: bigint;
  reserved: bigint;
}): bigint {
  const remaining = line.required - line.issued - line.reserved;
  return remaining > 0n ? remaining : 0n;
}

function needsByWeek(
  needs: readonly PlanNeed[],
  weeks: readonly CalendarDate[],
): WeekNeed[][] {
  const byWeek = weeks.map((): WeekNeed[] => []);
  for (const need of needs) {
    if (need.remaining <= 0n) continue;
    const index =
      need.plannedStart === null ? 0 : weekIndexOf(need.plannedStart, weeks);
    if (index === null) continue;
    const week = byWeek[index]!;
    const same = week.find((entry) => entry.buildOrderId === need.buildOrderId);
    if (same) same.quantity += need.remaining;
    else
      week.push({ buildOrderId: need.buildOrderId, quantity: need.remaining });
  }
  for (const week of byWeek)
    week.sort((a, b) => a.buildOrderId - b.buildOrderId);
  return byWeek;
}

function arrivalsByWeek(
  arrivals: readonly PlanArrival[],
  weeks: readonly CalendarDate[],
): bigint[] {
  const byWeek = weeks.map(() => 0n);
  for (const arrival of arrivals) {
    if (arrival.open <= 0n) continue;
    const index = weekIndexOf(arrival.expectedDate, weeks);
    if (index !== null) byWeek[index]! += arrival.open;
  }
  return byWeek;
}

function planItem(
  input: BuyingPlanInput,
  weeks: readonly CalendarDate[],
  item: PlanItem,
  suggestions: Suggestion[],
): ItemPlan {
  const needs = needsByWeek(
    input.needs.filter((need) => need.itemId === item.itemId),
    weeks,
  );
  const arriving = arrivalsByWeek(
    input.arrivals.filter((arrival) => arrival.itemId === item.itemId),
    weeks,
  );
  const floor = item.reorderPoint > 0n ? item.reorderPoint : 0n;
  let level = item.onHand - item.reserved - item.held;
  const planned: PlanWeek[] = weeks.map((weekStart, index) => {
    const weekNeeds = needs[index]!;
    const needed = weekNeeds.reduce((sum, need) => sum + need.quantity, 0n);
    level += arriving[index]! - needed;
    const projected = level;
    let suggested = 0n;
    if (projected < floor) {
      const shortfall = floor - projected;
      const atLeast =
        shortfall > item.reorderQuantity ? shortfall : item.reorderQuantity;
      const order = chooseOrder({
        itemId: String(item.itemId),
        atLeast,
        lines: input.lines,
        bases: input.bases,
        rates: input.rates,
        companyCurrency: input.companyCurrency,
        date: input.today,
      });
      suggested = order?.quantity ?? atLeast;
      const leadTime = order?.candidate.leadTimeDays ?? 0;
      const orderBy = addDays(weekStart, -leadTime);
      suggestions.push({
        item,
        shortfall,
        quantity: suggested,
        order,
        needBy: weekStart,
        orderBy,
        late: orderBy < input.today,
        needs: weekNeeds,
        reason: suggestionReason({
          item,
          weekStart,
          needs: weekNeeds,
          shortfall,
        }),
      });
      level += suggested;
    }
    return {
      weekStart,
      needs: weekNeeds,
      arriving: arriving[index]!,
      projected,
      suggested,
      projectedWithSuggestion: level,
    };
  });
  return { item, weeks: planned };
}

/** The plan over `input.weeks` weeks from the week of `input.today`, items in SKU order. */
export function buyingPlan(input: BuyingPlanInput): BuyingPlan {
  const weeks = planWeeks(input.today, input.weeks);
  const suggestions: Suggestion[] = [];
  const items = [...input.items]
    .sort((a, b) => (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : 0))
    .map((item) => planItem(input, weeks, item, suggestions));
  suggestions.sort(
    (a, b) =>
      (a.orderBy < b.orderBy ? -1 : a.orderBy > b.orderBy ? 1 : 0) ||
      (a.item.sku < b.item.sku ? -1 : a.item.sku > b.item.sku ? 1 : 0),
  );
  return { weeks, suggestions, items };
}
