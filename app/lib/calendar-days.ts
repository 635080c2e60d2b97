/**
 * Calendar days: price validity, metal bases, exchange rates, journal filters, chart axes
 * and insight periods. A day is ISO 8601 text, "2026-11-01", with no time and no time
 * zone: a price list is valid "from 1 November", whatever the clock says where the buyer
 * sits. Text of this one shape sorts in time order, so days compare as strings. Days turn
 * into moments at 00:00 UTC, as every time in Turnledger is UTC. Pure: the caller says
 * what "today" is.
 */

/** A calendar day, "YYYY-MM-DD". */
export type CalendarDate = string;

/** Milliseconds in a day (UTC has no daylight-saving days). */
export const dayMs = 86_400_000;

const calendarDatePattern = /^(\d{4})-(\d{2})-(\d{2})$/;

/** True when year, month (1–12) and day are a day on the calendar (30 February is not). */
export function isRealDay(year: number, month: number, day: number): boolean {
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year &&
    date.getUTCMonth() === month - 1 &&
    date.getUTCDate() === day
  );
}

/** True for a real day in "YYYY-MM-DD" form ("2026-02-30" is not one). */
export function isCalendarDate(text: string): boolean {
  const match = calendarDatePattern.exec(text);
  if (!match) return false;
  const [, year, month, day] = match.map(Number) as [
    number,
    number,
    number,
    number,
  ];
  return isRealDay(year, month, day);
}

/** Throws RangeError unless `text` is a real day; `what` names it in the message. */
export function assertCalendarDate(text: string, what: string): CalendarDate {
  if (!isCalendarDate(text)) {
    throw new RangeError(`${what} "${text}" is not a day in YYYY-MM-DD form`);
  }
  return text;
}

/** The moment the day starts: 00:00 UTC. */
export function startOfDay(date: CalendarDate): Date {
  return new Date(`${date}T00:00:00Z`);
}

/** The day (in UTC) a moment lies in. */
export function dayOf(moment: Date): CalendarDate {
  return moment.toISOString().slice(0, 10);
}

/** Today's day in UTC, the day dated tables (prices, metal bases, rates) are read for. */
export function todayUtc(now = new Date()): CalendarDate {
  return dayOf(now);
}

/** Days since 1970-01-01: "1970-01-02" → 1. Whole for every day, so days subtract. */
export function dayNumber(date: CalendarDate): number {
  return startOfDay(date).getTime() / dayMs;
}

/** The day of a day number: 1 → "1970-01-02". */
export function dateOfDayNumber(day: number): CalendarDate {
  return dayOf(new Date(day * dayMs));
}

/** The day `days` days later (earlier when negative): ("2026-12-02", −365) → "2025-12-02". */
export function addDays(date: CalendarDate, days: number): CalendarDate {
  return dateOfDayNumber(dayNumber(date) + days);
}

/** The following day: "2026-01-31" → "2026-02-01". Throws RangeError on a non-day. */
export function dayAfter(date: CalendarDate): CalendarDate {
  return addDays(assertCalendarDate(date, "date"), 1);
}

/**
 * The same day of the month `months` months later (earlier when negative), or that month's
 * last day when it is shorter: ("2026-03-31", −1) → "2026-02-28".
 */
export function addMonths(date: CalendarDate, months: number): CalendarDate {
  const [year, month, day] = date.split("-").map(Number) as [
    number,
    number,
    number,
  ];
  const first = new Date(Date.UTC(year, month - 1 + months, 1));
  const lastDay = new Date(
    Date.UTC(first.getUTCFullYear(), first.getUTCMonth() + 1, 0),
  ).getUTCDate();
  first.setUTCDate(Math.min(day, lastDay));
  return dayOf(first);
}

/** The first day of a month on or after `date`: "2026-03-01" → itself, "2026-03-02" → "2026-04-01". */
export function monthStartOnOrAfter(date: CalendarDate): CalendarDate {
  const monthStart = `${date.slice(0, 8)}01`;
  return monthStart === date ? date : addMonths(monthStart, 1);
}

/**
 * The entry with the latest day on or before `date`, or undefined when every entry is
 * later. Two entries on the same day: the one later in the list wins (the last one kept).
 */
export function latestOnOrBefore<T>(
  entries: readonly T[],
  dayOf: (entry: T) => CalendarDate,
  date: CalendarDate,
): T | undefined {
  let latest: T | undefined;
  for (const entry of entries) {
    const day = dayOf(entry);
    if (day > date) continue;
    if (latest === undefined || day >= dayOf(latest)) latest = entry;
  }
  return latest;
}

/**
 * The moments a range of calendar days covers, for a filter: from the start of `from`
 * (inclusive) to the start of the day after `to` (exclusive); either end may be open.
 * Days are UTC today; this is the one place a person's time zone will come in.
 */
export function dayRangeBounds(range: {
  from?: CalendarDate;
  to?: CalendarDate;
}): { start?: Date; end?: Date } {
  return {
    start: range.from ? startOfDay(range.from) : undefined,
    end: range.to ? startOfDay(dayAfter(range.to)) : undefined,
  };
}
