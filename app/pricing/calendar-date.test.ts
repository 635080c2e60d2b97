import { describe, expect, it } from "vitest";
import {
  assertCalendarDate,
  dayAfter,
  isCalendarDate,
  latestOnOrBefore,
} from "./calendar-date";

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
});
