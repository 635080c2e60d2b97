/**
 * Cycle counting: which locations to count this week. Pure: no I/O.
 *
 * Locations are put in ABC classes by their share of the stock value: sorted from the
 * most valuable down, a location whose running total before it is under 80 % of all the
 * value is class A, under 95 % class B, the rest (and every location holding nothing of
 * value) class C. A is counted about monthly, B quarterly, C twice a year. Both the
 * 80/95 % cut-offs and the intervals are common practice in storerooms, with no
 * published source behind these exact figures.
 *
 * A location is due when it was never counted, or when its last count is at least its
 * class's interval before the end of this week (today + 6 days). The plan lists the due
 * locations, never-counted first, then the longest overdue, the more valuable first
 * between equals; locations already in an open stocktake are left out.
 */
import { addDays, dayNumber, type CalendarDate } from "~/lib/calendar-days";

export type CountClass = "A" | "B" | "C";

/** Running share of the stock value (in percent) below which a location is in the class. */
export const classCutOffPercent = { A: 80n, B: 95n } as const;

/** Days between counts of each class: about monthly, quarterly, twice a year (common practice). */
export const countIntervalDays: Record<CountClass, number> = {
  A: 30,
  B: 91,
  C: 182,
};

export interface LocationToPlan {
  id: number;
  code: string;
  /** Stock value held at the location, in ten-thousandths of the company currency. */
  value: bigint;
  /** The day its last stocktake was approved; null when never counted. */
  lastCountedOn: CalendarDate | null;
  /** In a stocktake that is still counting: not suggested again. */
  inOpenStocktake: boolean;
}

export interface PlannedLocation {
  id: number;
  code: string;
  value: bigint;
  countClass: CountClass;
  lastCountedOn: CalendarDate | null;
  /** The day it is due (last count + interval); null when never counted. */
  dueOn: CalendarDate | null;
}

/** Each location's ABC class by its share of the total stock value. */
export function countClasses(
  locations: readonly Pick<LocationToPlan, "id" | "value">[],
): Map<number, CountClass> {
  const byValue = [...locations].sort((a, b) =>
    a.value === b.value ? a.id - b.id : a.value > b.value ? -1 : 1,
  );
  const total = byValue.reduce(
    (sum, location) => sum + (location.value > 0n ? location.value : 0n),
    0n,
  );
  const classes = new Map<number, CountClass>();
  let before = 0n;
  for (const location of byValue) {
    let countClass: CountClass = "C";
    if (total > 0n && location.value > 0n) {
      // before / total < cut-off / 100, in whole numbers.
      if (before * 100n < classCutOffPercent.A * total) countClass = "A";
      else if (before * 100n < classCutOffPercent.B * total) countClass = "B";
      before += location.value;
    }
    classes.set(location.id, countClass);
  }
  return classes;
}

/** The locations to count in the week starting `today`, at most `limit` of them. */
export function cycleCountPlan(
  locations: readonly LocationToPlan[],
  today: CalendarDate,
  limit = 8,
): PlannedLocation[] {
  if (!Number.isInteger(limit) || limit < 1)
    throw new RangeError("limit must be a whole number of at least 1");
  const classes = countClasses(locations);
  const weekEnd = dayNumber(addDays(today, 6));
  const due: PlannedLocation[] = [];
  for (const location of locations) {
    if (location.inOpenStocktake) continue;
    const countClass = classes.get(location.id)!;
    const dueOn =
      location.lastCountedOn === null
        ? null
        : addDays(location.lastCountedOn, countIntervalDays[countClass]);
    if (dueOn !== null && dayNumber(dueOn) > weekEnd) continue;
    due.push({
      id: location.id,
      code: location.code,
      value: location.value,
      countClass,
      lastCountedOn: location.lastCountedOn,
      dueOn,
    });
  }
  due.sort((a, b) => {
    if (a.dueOn !== b.dueOn) {
      if (a.dueOn === null) return -1;
      if (b.dueOn === null) return 1;
      return dayNumber(a.dueOn) - dayNumber(b.dueOn);
    }
    if (a.value !== b.value) return a.value > b.value ? -1 : 1;
    return a.code < b.code ? -1 : a.code > b.code ? 1 : 0;
  });
  return due.slice(0, limit);
}
