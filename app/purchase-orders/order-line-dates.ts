/**
 * Open order lines against the calendar: how many days late a line is, and whether it is
 * late at all. A line is late once its expected day has passed (due today is not late).
 * Pure: the caller says what "today" is.
 */
import { dayNumber, type CalendarDate } from "~/lib/calendar-days";

/** Whole days past the expected day: ("2026-12-01", "2026-12-03") → 2; 0 when not late. */
export function daysLate(expected: CalendarDate, today: CalendarDate): number {
  return Math.max(0, dayNumber(today) - dayNumber(expected));
}

/** "1 day late", "12 days late". */
export function daysLateText(days: number): string {
  return `${days} day${days === 1 ? "" : "s"} late`;
}
