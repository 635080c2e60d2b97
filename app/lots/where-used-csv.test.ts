import { describe, expect, it } from "vitest";
import { buildOrderLotsCsv, csvName, lotWhereUsedCsv } from "./where-used-csv";

describe("where-used CSV", () => {
  it("writes one row per build order, quantities as numbers (RFC 4180 CRLF rows, BOM first)", () => {
    const csv = lotWhereUsedCsv({ number: "S24101", sku: "CU-IEC-0500" }, [
      {
        reference: "BO-7",
        design: "Outrunner, 12 slots",
        revision: 2,
        motorQuantity: 6,
        issued: 1.65,
        returned: 0.15,
        net: 1.5,
        unit: "kg",
        firstIssuedAt: "2026-12-01T08:00:00.000Z",
        lastMovementAt: "2026-12-01T08:20:00.000Z",
      },
    ]);
    expect(csv.split("\r\n")).toEqual([
      "\uFEFFlot,sku,build_order,design,revision,motors,issued,returned,net,unit,first_issued_at,last_movement_at",
      'S24101,CU-IEC-0500,BO-7,"Outrunner, 12 slots",2,6,1.65,0.15,1.5,kg,2026-12-01T08:00:00.000Z,2026-12-01T08:20:00.000Z',
      "",
    ]);
  });

  it("starts a formula-like supplier lot with an apostrophe (CSV injection)", () => {
    const csv = buildOrderLotsCsv("BO-3", [
      {
        lot: "L1",
        sku: "MG-1",
        itemName: "Magnet",
        supplier: { name: "Marrowfield" },
        supplierBatch: "=HYPERLINK(1)",
        issued: 8,
        returned: 0,
        net: 8,
        unit: "pcs",
        firstIssuedAt: null,
        lastMovementAt: "2026-12-01T08:20:00.000Z",
      },
    ]);
    expect(csv).toContain(',"\'=HYPERLINK(1)",');
  });

  it("names files with safe characters only", () => {
    expect(csvName("lot", "CU-IEC-0500", "S 241/01", "where-used")).toBe(
      "lot-CU-IEC-0500-S_241_01-where-used.csv",
    );
  });
});
