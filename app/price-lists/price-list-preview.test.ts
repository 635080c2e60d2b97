import { describe, expect, it } from "vitest";
import { summarisePreview } from "./price-list-preview";
import type { PriceListRow } from "./price-list-rows";

function partRow(line: number): PriceListRow {
  return {
    line,
    supplierSku: `P-${line}`,
    itemSku: null,
    description: "",
    kind: "part",
    unit: "pcs",
    price: "1.0000",
    adderPerKg: null,
    currency: "EUR",
    minQuantity: "1.000",
    validFrom: "2025-06-02",
    leadTimeDays: null,
    packQuantity: null,
  };
}

describe("the dry-run preview", () => {
  it("shows the first 20 good rows, counts all, and lists errors by line", () => {
    const rows = Array.from({ length: 45 }, (_, index) => partRow(index + 2));
    const preview = summarisePreview(rows, [
      { line: 60, message: "Line 60: b." },
      { line: 50, message: "Line 50: a." },
    ]);
    expect(preview.rows).toHaveLength(20);
    expect(preview.rows[0]!.line).toBe(2);
    expect(preview.rows[19]!.line).toBe(21);
    expect(preview.valid).toBe(45);
    expect(preview.invalid).toEqual([
      { line: 50, message: "Line 50: a." },
      { line: 60, message: "Line 60: b." },
    ]);
    expect(preview.invalidCount).toBe(2);
    expect(preview.invalidTruncated).toBe(false);
    expect(Object.keys(preview)).toEqual([
      "rows",
      "valid",
      "invalid",
      "invalidCount",
      "invalidTruncated",
    ]);
  });

  it("works with no rows at all", () => {
    expect(summarisePreview([], [])).toEqual({
      rows: [],
      valid: 0,
      invalid: [],
      invalidCount: 0,
      invalidTruncated: false,
    });
  });

  it("lists the first 1,000 lines with errors and says how many there were", () => {
    const errors = Array.from({ length: 1_500 }, (_, index) => ({
      line: 1_501 - index,
      message: `Line ${1_501 - index}: bad.`,
    }));
    const preview = summarisePreview([], errors);
    expect(preview.invalid).toHaveLength(1_000);
    expect(preview.invalid[0]!.line).toBe(2);
    expect(preview.invalid.at(-1)!.line).toBe(1_001);
    expect(preview.invalidCount).toBe(1_500);
    expect(preview.invalidTruncated).toBe(true);
  });
});
