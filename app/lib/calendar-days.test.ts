import { describe, expect, it } from "vitest";
import {
  addDays,
  addMonths,
  assertCalendarDate,
  dateOfDayNumber,
  dayAfter,
  dayNumber,
  dayOf,
  todayUtc,
  isCalendarDate,
  isRealDay,
  latestOnOrBefore,
  monthStartOnOrAfter,
  startOfDay,
} from "./calendar-days";

describe("calendar days", () => {
  it("accepts real days only", () => {
    expect(isCalendarDate("2026-11-01")).toBe(true);
    expect(isCalendarDate("2028-02-29")).toBe(true);
    expect(isCalendarDate("2026-02-29")).toBe(false);
    expect(isCalendarDate("2026-1-5")).toBe(false);
    expect(isCalendarDate("2026-11-01T00:00:00Z")).toBe(false);
    expect(() => assertCalendarDate("01/11/2026", "pricing date")).toThrow(
      /pricing date/,
    );
  });

  it("steps to the next day across months and years", () => {
    expect(dayAfter("2026-01-31")).toBe("2026-02-01");
    expect(dayAfter("2028-02-28")).toBe("2028-02-29");
    expect(dayAfter("2026-12-31")).toBe("2027-01-01");
  });

  it("finds the latest entry on or before a day; the later entry wins a same-day tie", () => {
    const entries = [
      { day: "2026-03-01", name: "march" },
      { day: "2026-01-01", name: "january" },
      { day: "2026-03-01", name: "march, entered again" },
    ];
    const on = (date: string) =>
      latestOnOrBefore(entries, (entry) => entry.day, date)?.name;
    expect(on("2025-12-31")).toBeUndefined();
    expect(on("2026-01-01")).toBe("january");
    expect(on("2026-02-28")).toBe("january");
    expect(on("2026-03-01")).toBe("march, entered again");
  });

  it("checks year, month and day as numbers", () => {
    expect(isRealDay(2028, 2, 29)).toBe(true);
    expect(isRealDay(2026, 2, 29)).toBe(false);
    expect(isRealDay(2026, 13, 1)).toBe(false);
    expect(isRealDay(2026, 4, 31)).toBe(false);
  });

  it("turns days into UTC moments and back", () => {
    expect(startOfDay("2026-12-02").toISOString()).toBe(
      "2026-12-02T00:00:00.000Z",
    );
    expect(dayOf(new Date("2026-12-02T23:59:59.999Z"))).toBe("2026-12-02");
    expect(dayNumber("1970-01-02")).toBe(1);
    expect(dateOfDayNumber(1)).toBe("1970-01-02");
    expect(dayNumber("2026-03-01") - dayNumber("2026-02-01")).toBe(28);
  });

  it("adds days forwards and backwards across months, years and leap days", () => {
    expect(addDays("2026-12-02", -365)).toBe("2025-12-02");
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDays("2026-12-31", 1)).toBe("2027-01-01");
    expect(addDays("2026-03-01", -1)).toBe("2026-02-28");
    expect(addDays("2026-03-01", 0)).toBe("2026-03-01");
  });

  it("adds months keeping the day, or the month's last day when it is shorter", () => {
    expect(addMonths("2026-03-31", -1)).toBe("2026-02-28");
    expect(addMonths("2028-03-31", -1)).toBe("2028-02-29");
    expect(addMonths("2026-01-15", 12)).toBe("2027-01-15");
    expect(addMonths("2026-01-31", -2)).toBe("2025-11-30");
    expect(addMonths("2026-12-01", 1)).toBe("2027-01-01");
  });

  it("finds the first month start on or after a day", () => {
    expect(monthStartOnOrAfter("2026-03-01")).toBe("2026-03-01");
    expect(monthStartOnOrAfter("2026-03-02")).toBe("2026-04-01");
    expect(monthStartOnOrAfter("2026-12-31")).toBe("2027-01-01");
  });
});

describe("todayUtc", () => {
  it("gives the UTC day, not the local one", () => {
    // 23:30 at UTC−2 on 30 June is 01:30 UTC on 1 July.
    expect(todayUtc(new Date("2026-06-30T23:30:00-02:00"))).toBe("2026-07-01");
  });
});
