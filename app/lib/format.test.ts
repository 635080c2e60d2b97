import { describe, expect, it } from "vitest";
import {
  formatAmount,
  formatDateTime,
  formatDay,
  formatPriceText,
  formatQuantity,
  formatTimeOfDay,
} from "./format";

// Expected texts worked by hand from the en-GB number format (comma thousands, point decimals).
describe("money and price texts", () => {
  it("writes an amount to the cent, grouped, without a currency", () => {
    expect(formatAmount(1234.5)).toBe("1,234.50");
    expect(formatAmount(0)).toBe("0.00");
  });

  it("writes a file's price with two to four places and no grouping", () => {
    expect(formatPriceText("14.2000")).toBe("14.20");
    expect(formatPriceText("0.85125")).toBe("0.8513");
    expect(formatPriceText("12345.6")).toBe("12345.60");
  });
});

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
