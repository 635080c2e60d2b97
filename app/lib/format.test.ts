import { describe, expect, it } from "vitest";
import { formatDateTime, formatQuantity } from "./format";

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
