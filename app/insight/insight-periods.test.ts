import { describe, expect, it } from "vitest";
import { monthlyDates, trendWeeks, weekStart } from "./insight-periods";

// Weekdays checked with GNU date (`date -u -d 2026-11-30 +%A` → Monday): 30 Nov 2026 is a
// Monday, 2 Dec 2026 a Wednesday, 6 Dec 2026 a Sunday, 4 Jan 2027 a Monday.
describe("weekStart", () => {
  it("is the Monday 00:00 UTC of the week", () => {
    expect(weekStart(new Date("2026-12-02T15:30:00Z")).toISOString()).toBe(
      "2026-11-30T00:00:00.000Z",
    );
    // Sunday late still belongs to the week that started on Monday.
    expect(weekStart(new Date("2026-12-06T23:59:59.999Z")).toISOString()).toBe(
      "2026-11-30T00:00:00.000Z",
    );
    // A Monday at midnight starts its own week.
    expect(weekStart(new Date("2026-11-30T00:00:00Z")).toISOString()).toBe(
      "2026-11-30T00:00:00.000Z",
    );
  });
});

describe("trendWeeks", () => {
  it("gives complete weeks valued at their end and the running week valued now", () => {
    const now = new Date("2026-12-02T15:30:00Z");
    const weeks = trendWeeks(now, 3);
    expect(
      weeks.map((week) => ({
        week: week.week,
        at: week.valueAt.toISOString(),
        complete: week.complete,
      })),
    ).toEqual([
      { week: "2026-11-16", at: "2026-11-23T00:00:00.000Z", complete: true },
      { week: "2026-11-23", at: "2026-11-30T00:00:00.000Z", complete: true },
      { week: "2026-11-30", at: "2026-12-02T15:30:00.000Z", complete: false },
    ]);
  });

  it("spans 26 weeks across a year end", () => {
    const weeks = trendWeeks(new Date("2027-01-06T08:00:00Z"), 26);
    expect(weeks).toHaveLength(26);
    // 25 weeks (175 days) before Monday 4 Jan 2027: `date -u -d "2027-01-04 -175 days"` → 2026-07-13.
    expect(weeks[0]!.week).toBe("2026-07-13");
    expect(weeks.at(-1)!.week).toBe("2027-01-04");
    expect(weeks.filter((week) => !week.complete)).toHaveLength(1);
  });

  it("refuses a trend of no weeks", () => {
    expect(() => trendWeeks(new Date(), 0)).toThrow(RangeError);
  });
});

describe("monthlyDates", () => {
  it("steps back a month at a time to the same day", () => {
    expect(monthlyDates("2026-12-02", 12)).toEqual([
      "2026-01-02",
      "2026-02-02",
      "2026-03-02",
      "2026-04-02",
      "2026-05-02",
      "2026-06-02",
      "2026-07-02",
      "2026-08-02",
      "2026-09-02",
      "2026-10-02",
      "2026-11-02",
      "2026-12-02",
    ]);
  });

  it("takes a short month's last day, and crosses a year", () => {
    // 2026 is not a leap year (2026 / 4 is not whole): February has 28 days.
    expect(monthlyDates("2026-03-31", 4)).toEqual([
      "2025-12-31",
      "2026-01-31",
      "2026-02-28",
      "2026-03-31",
    ]);
    // 2028 is a leap year: 29 February.
    expect(monthlyDates("2028-03-30", 2)).toEqual(["2028-02-29", "2028-03-30"]);
  });
});
