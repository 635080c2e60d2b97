import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import {
  bomCsv,
  bomCsvFilename,
  bomCsvHeaders,
  buildQuantity,
  type BomCsvLine,
} from "./bom-csv";

/** Worked check 4 of the engineering brief (with two 150 mm leads, 3 % scrap): 30.84 g drawn. */
const coil: BomCsvLine = {
  kind: "coil",
  sku: "CU-080-G2",
  name: "Enamelled copper 0.80 mm grade 2",
  perMotorQuantity: 0.0308378,
  unit: "kg",
  unitPrice: 12.5,
  cost: 0.3855,
  priceSource: "moving average cost of stock",
  massBasis: "bare",
  coil: {
    turns: 40,
    strandsInHand: 1,
    activeLengthMm: 50,
    endTurnLengthMm: 30,
    leadLengthMm: 150,
    coilsPerMotor: 1,
    scrapPercent: 3,
    operatingTemperatureC: 20,
    copperLengthM: 6.7,
  },
};

const magnet: BomCsvLine = {
  kind: "magnet",
  sku: "N42SH-20x10x5",
  name: "N42SH block 20 × 10 × 5",
  perMotorQuantity: 14,
  unit: "pcs",
  unitPrice: null,
  cost: null,
  priceSource: null,
  massBasis: null,
  coil: null,
};

function parse(text: string): string[][] {
  return Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: true,
  }).data;
}

describe("BOM CSV", () => {
  it("writes a row per line with the per-motor and per-build quantity and the price source", () => {
    const [header, coilRow, magnetRow] = parse(
      bomCsv({ quantity: 500, currency: "EUR", lines: [coil, magnet] }),
    );
    expect(header).toEqual(bomCsvHeaders(500, "EUR"));
    const cell = (row: string[] | undefined, name: string) =>
      row![header!.indexOf(name)];
    expect(cell(coilRow, "line")).toBe("1");
    expect(cell(coilRow, "quantity per motor")).toBe("0.0308378");
    // 0.0308378 kg × 500 = 15.4189 kg, rounded up to the gram (design-costing's rule).
    expect(cell(coilRow, "quantity for 500 motors")).toBe("15.419");
    expect(cell(coilRow, "wire mass basis")).toBe("bare conductor");
    expect(cell(coilRow, "unit price (EUR per unit)")).toBe("12.5");
    expect(cell(coilRow, "cost per motor (EUR)")).toBe("0.3855");
    expect(cell(coilRow, "end-turn length (mm)")).toBe("30");
    expect(cell(coilRow, "copper length per motor (m)")).toBe("6.7");
    expect(cell(magnetRow, "line")).toBe("2");
    expect(cell(magnetRow, "quantity for 500 motors")).toBe("7000");
    expect(cell(magnetRow, "price source")).toBe("no price");
    expect(cell(magnetRow, "cost per motor (EUR)")).toBe("");
    expect(cell(magnetRow, "turns")).toBe("");
  });

  it("guards text that a spreadsheet would run as a formula, and keeps numbers numbers", () => {
    const text = bomCsv({
      quantity: 1,
      currency: "EUR",
      lines: [
        { ...coil, name: '=HYPERLINK("http://x.test","click")', sku: "+SKU" },
      ],
    });
    const [, row] = parse(text);
    expect(row![3]).toBe(`'=HYPERLINK("http://x.test","click")`);
    expect(row![2]).toBe("'+SKU");
    expect(row![4]).toBe("0.0308378");
  });

  it("names one motor in the singular in the build column's header", () => {
    // English: "1 motor", "2 motors" (CLDR plural rules).
    expect(bomCsvHeaders(1, "EUR")).toContain("quantity for 1 motor");
    expect(bomCsvHeaders(2, "EUR")).toContain("quantity for 2 motors");
  });

  it("starts with a byte-order mark and ends lines with CRLF", () => {
    const text = bomCsv({ quantity: 1, currency: "EUR", lines: [coil] });
    expect(text.startsWith("\uFEFFline,kind,sku,")).toBe(true);
    expect(text.split("\r\n")).toHaveLength(3);
  });

  it("rounds a build's wire up to the gram, never down", () => {
    expect(buildQuantity(0.0308378, 1)).toBe(0.031);
    expect(buildQuantity(0.03, 3)).toBe(0.09);
    expect(buildQuantity(1.5, 4)).toBe(6);
  });

  it("names the file after the design in plain letters", () => {
    expect(bomCsvFilename("Outrunner 12N14P — Ø80", 2)).toBe(
      "turnledger-bom-outrunner-12n14p-80-rev2.csv",
    );
    expect(bomCsvFilename("«»", 1)).toBe("turnledger-bom-design-rev1.csv");
  });
});
