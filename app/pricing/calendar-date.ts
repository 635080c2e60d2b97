/**
 * Calendar days for price validity, metal bases and exchange rates. A day is ISO 8601
 * text, "2026-11-01", with no time and no time zone: a price list is valid "from 1
 * November", whatever the clock says where the buyer sits. Text of this one shape sorts
 * in time order, so days compare as strings. Pure: the caller says what "today" is.
 */

/** A calendar day, "YYYY-MM-DD". */
export type CalendarDate = string;

const calendarDatePattern = /^(\d{4})-(\d{2})-(\d{2})$/;

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
  const date = new Date(Date.UTC(year, month - 1, day));
  return (
    date.getUTCFullYear() === year &&
    date.getUTCMonth() === month - 1 &&
    date.getUTCDate() === day
  );
}

/** Throws RangeError unless `text` is a real day; `what` names it in the message. */
export function assertCalendarDate(text: string, what: string): CalendarDate {
  if (!isCalendarDate(text)) {
    throw new RangeError(`${what} "${text}" is not a day in YYYY-MM-DD form`);
  }
  return text;
}

/** The following day: "2026-01-31" → "2026-02-01". */
export function dayAfter(date: CalendarDate): CalendarDate {
  assertCalendarDate(date, "date");
  const next = new Date(`${date}T00:00:00Z`);
  next.setUTCDate(next.getUTCDate() + 1);
  return next.toISOString().slice(0, 10);
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
