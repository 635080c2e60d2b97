import { describe, expect, it } from "vitest";
import {
  deliveryPerformance,
  performanceWindowStart,
  rateText,
  type FinishedLine,
} from "./delivery-performance";

const at = (day: string) => new Date(`${day}T10:00:00Z`);
const line = (overrides: Partial<FinishedLine>): FinishedLine => ({
  expectedDate: "2026-06-10",
  quantity: 50_000n,
  received: 50_000n,
  completedAt: null,
  closedShortAt: null,
  ...overrides,
});

describe("a supplier's delivery record", () => {
  it("counts the last 12 months: after the same day a year ago, up to today", () => {
    expect(performanceWindowStart("2026-12-03")).toBe("2025-12-04");
    // 29 February has no twin a year later: 28 Feb 2025, so the window starts 1 March.
    expect(performanceWindowStart("2026-02-28")).toBe("2025-03-01");
  });

  it("works out on time and in full: a worked example by hand", () => {
    // Today 3 Dec 2026; the window is 4 Dec 2025 – 3 Dec 2026.
    const lines = [
      // 1. Expected 10 Jun, all 50 kg by 8 Jun: on time, in full.
      line({ completedAt: at("2026-06-08") }),
      // 2. Expected 10 Jun, completed on the day itself: on time, in full.
      line({ completedAt: at("2026-06-10") }),
      // 3. Expected 10 Jun, completed 15 Jun (52 of 50 kg, within tolerance): late, in full.
      line({ completedAt: at("2026-06-15"), received: 52_000n }),
      // 4. Expected 1 Sep, 30 of 50 kg came, order closed short 20 Sep: late, not in full.
      line({
        expectedDate: "2026-09-01",
        received: 30_000n,
        closedShortAt: at("2026-09-20"),
      }),
      // 5. Completed 1 Dec 2025, before the window: not counted.
      line({ expectedDate: "2025-11-20", completedAt: at("2025-12-01") }),
      // 6. Still open, nothing finished: not counted.
      line({ received: 10_000n }),
      // 7. Completed on time, then the order was closed short over other lines: counted
      //    by its completion, on time and in full.
      line({
        expectedDate: "2026-11-30",
        completedAt: at("2026-11-25"),
        closedShortAt: at("2026-12-01"),
      }),
    ];
    // Counted: 1, 2, 3, 4, 7 = 5 lines. On time: 1, 2, 7 = 3 → 60 %. In full: 1, 2, 3, 7 = 4 → 80 %.
    expect(deliveryPerformance(lines, "2026-12-03")).toEqual({
      from: "2025-12-04",
      to: "2026-12-03",
      lines: 5,
      onTime: 3,
      inFull: 4,
      onTimeRate: 0.6,
      inFullRate: 0.8,
    });
  });

  it("has no rate without a finished line in the window", () => {
    const result = deliveryPerformance(
      [line({ completedAt: at("2024-01-01") })],
      "2026-12-03",
    );
    expect(result.lines).toBe(0);
    expect(result.onTimeRate).toBeNull();
    expect(result.inFullRate).toBeNull();
  });

  it("says the rate with what it counts", () => {
    expect(rateText(3, 5)).toBe("60 % (3 of 5 lines)");
    expect(rateText(1, 1)).toBe("100 % (1 of 1 line)");
    expect(rateText(2, 3)).toBe("67 % (2 of 3 lines)");
  });
});
