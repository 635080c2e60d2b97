import { describe, expect, it } from "vitest";
import {
  formatDateTime,
  formatDay,
  formatQuantity,
  formatTimeOfDay,
} from "./format";

describe("formatQuantity", () => {
  it("puts the unit beside the number, with a no-break space", () => {
    expect(formatQuantity(1.2345, "kg", 3)).toBe("1.235\u00a0kg");
    expect(formatQuantity(12500, "pcs")).toBe("12,500\u00a0pcs");
  });
});

describe("formatDateTime", () => {
  it("shows UTC so server and browser render the same text", () => {
    expect(formatDateTime(new Date("2026-12-02T14:05:00Z"))).toBe(
      "2 Dec 2026, 14:05 UTC",
    );
    expect(formatDateTime(null)).toBe("—");
  });
});

describe("formatDay and formatTimeOfDay", () => {
  it("write the day and the time of day as formatDateTime does", () => {
    expect(formatDay("2026-12-02")).toBe("2 Dec 2026");
    expect(formatDay("2026-12-02T23:59:00Z")).toBe("2 Dec 2026");
    expect(formatDay("2026-01-05T00:00:00.000Z")).toBe("5 Jan 2026");
    expect(formatTimeOfDay("2026-12-02T14:05:00Z")).toBe("14:05");
  });
});
