/**
 * Quantity breaks: a supplier quotes lower unit prices from larger quantities
 * ("1–99 pcs 2.40, 100+ pcs 2.10"). Each break is one price line with its minimum
 * quantity; the break that applies to a quantity is the one with the largest minimum
 * quantity at or below it, among the lines valid on the day.
 */

import type { CalendarDate } from "~/lib/calendar-days";
import { offerKey, type PriceLine } from "./price-line";

type Validity = Pick<PriceLine, "validFrom" | "validTo">;
type Break = Validity & Pick<PriceLine, "minQuantity">;

/** True when the line applies on the day: validFrom ≤ date ≤ validTo (validTo inclusive). */
export function isValidOn(line: Validity, date: CalendarDate): boolean {
  return (
    line.validFrom <= date &&
    (line.validTo === undefined || date <= line.validTo)
  );
}

export type BreakChoice<Line> =
  | { kind: "applies"; line: Line }
  /** Lines are valid on the day, but all from a larger quantity than asked for. */
  | { kind: "below-smallest-break"; smallestMinQuantity: bigint }
  /** No line is valid on the day. */
  | { kind: "none-valid" };

/**
 * The break of one offer that applies to `quantity` (thousandths of the item's unit) on
 * `date`: the largest minQuantity ≤ quantity among the lines valid on the day. Exactly at
 * a break's minimum, that break applies. Two valid lines with the same minimum (an old
 * list left open when a new one was imported): the later validFrom wins, then the one
 * later in the list.
 */
export function applicableBreak<Line extends Break>(
  lines: readonly Line[],
  quantity: bigint,
  date: CalendarDate,
): BreakChoice<Line> {
  const valid = lines.filter((line) => isValidOn(line, date));
  if (valid.length === 0) return { kind: "none-valid" };
  let chosen: Line | undefined;
  for (const line of valid) {
    if (line.minQuantity > quantity) continue;
    if (
      chosen === undefined ||
      line.minQuantity > chosen.minQuantity ||
      (line.minQuantity === chosen.minQuantity &&
        line.validFrom >= chosen.validFrom)
    ) {
      chosen = line;
    }
  }
  if (chosen) return { kind: "applies", line: chosen };
  const smallestMinQuantity = valid.reduce(
    (smallest, line) =>
      line.minQuantity < smallest ? line.minQuantity : smallest,
    valid[0]!.minQuantity,
  );
  return { kind: "below-smallest-break", smallestMinQuantity };
}

/**
 * Lines grouped by offer (supplier and supplier SKU), in order of first appearance.
 * A supplier selling the item under two articles (a 5 kg and a 25 kg spool) has two offers.
 */
export function groupByOffer<Line extends PriceLine>(
  lines: readonly Line[],
): Line[][] {
  const groups = new Map<string, Line[]>();
  for (const line of lines) {
    const key = offerKey(line);
    const group = groups.get(key);
    if (group) group.push(line);
    else groups.set(key, [line]);
  }
  return [...groups.values()];
}
