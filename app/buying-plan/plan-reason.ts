/**
 * Why the plan suggests buying, in words: "BO-12 needs 4.200 kg in week of 14 Dec 2026;
 * projected 1.100 kg below reorder point 5.000 kg". Pure.
 */
import { buildOrderReference } from "~/build-orders/build-order-status";
import type { CalendarDate } from "~/lib/calendar-days";
import { quantityToNumber } from "~/lib/decimal-amounts";
import { formatDay } from "~/lib/format";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

interface ReasonInput {
  item: { unit: string; reorderPoint: bigint };
  weekStart: CalendarDate;
  needs: readonly { buildOrderId: number; quantity: bigint }[];
  shortfall: bigint;
}

/** A list in words: "BO-1", "BO-1 and BO-2", "BO-1, BO-2 and BO-3". */
function listed(names: readonly string[]): string {
  if (names.length <= 1) return names.join("");
  return `${names.slice(0, -1).join(", ")} and ${names.at(-1)}`;
}

export function suggestionReason(input: ReasonInput): string {
  const quantity = (value: bigint) =>
    formatStockQuantity(quantityToNumber(value), input.item.unit);
  const week = `week of ${formatDay(input.weekStart)}`;
  const needed = input.needs.reduce((sum, need) => sum + need.quantity, 0n);
  const cause =
    input.needs.length === 0
      ? `Already low in ${week}`
      : `${listed(input.needs.map((need) => buildOrderReference(need.buildOrderId)))} ${input.needs.length === 1 ? "needs" : "need"} ${quantity(needed)} in ${week}`;
  const below =
    input.item.reorderPoint > 0n
      ? `projected ${quantity(input.shortfall)} below reorder point ${quantity(input.item.reorderPoint)}`
      : `projected ${quantity(input.shortfall)} short (no reorder point)`;
  return `${cause}; ${below}`;
}
