/**
 * The points in time the insight trends are drawn at. Pure: the caller says what "now"
 * is. Weeks run Monday 00:00 to the next Monday 00:00 UTC (ISO 8601 weeks, times in UTC
 * as everywhere in Turnledger).
 */
import {
  addMonths,
  dayMs,
  dayOf,
  startOfDay,
  type CalendarDate,
} from "~/lib/calendar-days";

const weekMs = 7 * dayMs;

/** One week of a stock-value trend: the Monday it starts, and the moment its value is taken. */
export interface TrendWeek {
  /** The Monday the week starts, "YYYY-MM-DD". */
  week: CalendarDate;
  /** The end of the week (the next Monday 00:00 UTC), or `now` for the week still running. */
  valueAt: Date;
  /** False for the week still running: its value is "so far", taken at `now`. */
  complete: boolean;
}

/** Monday 00:00 UTC of the week `moment` lies in. */
export function weekStart(moment: Date): Date {
  const day = startOfDay(dayOf(moment));
  // getUTCDay: Sunday 0 … Saturday 6; days since Monday: Monday 0 … Sunday 6.
  const sinceMonday = (day.getUTCDay() + 6) % 7;
  return new Date(day.getTime() - sinceMonday * dayMs);
}

/**
 * The last `count` weeks up to `now`, oldest first: `count − 1` complete weeks, each
 * valued at its end, and the week still running, valued at `now`.
 * 2026-12-02 (a Wednesday), 3 weeks → weeks of 16 Nov (value at 23 Nov 00:00),
 * 23 Nov (value at 30 Nov 00:00) and 30 Nov (value now).
 */
export function trendWeeks(now: Date, count: number): TrendWeek[] {
  if (!Number.isInteger(count) || count < 1) {
    throw new RangeError(`a trend has at least 1 week, not ${count}`);
  }
  const current = weekStart(now).getTime();
  return Array.from({ length: count }, (_, index) => {
    const start = current - (count - 1 - index) * weekMs;
    const complete = start !== current;
    return {
      week: dayOf(new Date(start)),
      valueAt: complete ? new Date(start + weekMs) : now,
      complete,
    };
  });
}

/**
 * `count` days a month apart ending on `today`, oldest first: the same day of each month,
 * or the month's last day when it is shorter ("2026-03-31", 2 → "2026-02-28", "2026-03-31").
 */
export function monthlyDates(
  today: CalendarDate,
  count: number,
): CalendarDate[] {
  return Array.from({ length: count }, (_, index) =>
    addMonths(today, -(count - 1 - index)),
  );
}
