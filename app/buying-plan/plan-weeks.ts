/**
 * The weeks of a buying plan. Weeks start on Monday (ISO 8601 weeks, in UTC as every day
 * in Turnledger), the first one being the week `today` lies in. Pure: the caller says
 * what "today" is.
 */
import {
  addDays,
  dayOf,
  startOfDay,
  type CalendarDate,
} from "~/lib/calendar-days";
import { weekStart } from "~/insight/insight-periods";

/** The shortest and longest horizon a plan looks over, and the one it takes unless told. */
export const planHorizon = { min: 1, max: 26, default: 8 } as const;

/** The Monday of the week `day` lies in: "2026-12-03" (a Thursday) → "2026-11-30". */
export function mondayOf(day: CalendarDate): CalendarDate {
  return dayOf(weekStart(startOfDay(day)));
}

/** The Mondays of the `count` weeks from the week of `today`, in order. */
export function planWeeks(today: CalendarDate, count: number): CalendarDate[] {
  if (
    !Number.isInteger(count) ||
    count < planHorizon.min ||
    count > planHorizon.max
  )
    throw new RangeError(
      `a buying plan looks ${planHorizon.min} to ${planHorizon.max} weeks ahead, not ${count}`,
    );
  const first = mondayOf(today);
  return Array.from({ length: count }, (_, index) => addDays(first, 7 * index));
}

/**
 * The index of the week `day` falls in among `weeks` (Mondays from `planWeeks`): a day
 * before the first week counts in the first (overdue: still needed, or still to come,
 * now); null for a day after the last week (beyond the horizon).
 */
export function weekIndexOf(
  day: CalendarDate,
  weeks: readonly CalendarDate[],
): number | null {
  const first = weeks[0];
  if (first === undefined) return null;
  if (day < first) return 0;
  const monday = mondayOf(day);
  const index = weeks.indexOf(monday);
  return index === -1 ? null : index;
}
