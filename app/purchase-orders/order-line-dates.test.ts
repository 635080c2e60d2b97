import { describe, expect, it } from "vitest";
import { daysLate, daysLateText } from "./order-line-dates";

describe("days late", () => {
  it("counts whole calendar days past the expected day", () => {
    // By hand: 28 Nov → 3 Dec is 2 days of November (29, 30) + 3 of December = 5.
    expect(daysLate("2026-11-28", "2026-12-03")).toBe(5);
    // Across a year end: 30 Dec 2026 → 2 Jan 2027 = 3.
    expect(daysLate("2026-12-30", "2027-01-02")).toBe(3);
  });

  it("is 0 for a line due today or later", () => {
    expect(daysLate("2026-12-03", "2026-12-03")).toBe(0);
    expect(daysLate("2026-12-10", "2026-12-03")).toBe(0);
  });

  it("says it in words", () => {
    expect(daysLateText(1)).toBe("1 day late");
    expect(daysLateText(12)).toBe("12 days late");
  });
});
