import { describe, expect, it } from "vitest";
import { mondayOf, planWeeks, weekIndexOf } from "./plan-weeks";

// The calendar: 3 December 2026 is a Thursday, so its week starts on Monday 30 November.
describe("plan weeks (weeks start on Monday)", () => {
  it("finds the Monday of any day of the week, and Monday itself", () => {
    expect(mondayOf("2026-12-03")).toBe("2026-11-30");
    expect(mondayOf("2026-11-30")).toBe("2026-11-30");
    expect(mondayOf("2026-12-06")).toBe("2026-11-30"); // Sunday
    expect(mondayOf("2027-01-01")).toBe("2026-12-28"); // across the year
  });

  it("lists the Mondays of the horizon from this week", () => {
    expect(planWeeks("2026-12-03", 3)).toEqual([
      "2026-11-30",
      "2026-12-07",
      "2026-12-14",
    ]);
  });

  it("refuses a horizon outside 1–26 weeks", () => {
    expect(() => planWeeks("2026-12-03", 0)).toThrow(RangeError);
    expect(() => planWeeks("2026-12-03", 27)).toThrow(RangeError);
    expect(() => planWeeks("2026-12-03", 2.5)).toThrow(RangeError);
    expect(planWeeks("2026-12-03", 26)).toHaveLength(26);
  });

  it("puts overdue days in this week and days after the horizon nowhere", () => {
    const weeks = planWeeks("2026-12-03", 2);
    expect(weekIndexOf("2026-11-01", weeks)).toBe(0);
    expect(weekIndexOf("2026-12-06", weeks)).toBe(0);
    expect(weekIndexOf("2026-12-07", weeks)).toBe(1);
    expect(weekIndexOf("2026-12-13", weeks)).toBe(1);
    expect(weekIndexOf("2026-12-14", weeks)).toBeNull();
  });
});
