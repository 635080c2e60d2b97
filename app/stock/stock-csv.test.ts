import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import {
  stockCsv,
  stockCsvFilename,
  stockCsvHeaders,
  type StockCsvItem,
} from "./stock-csv";

const wire: StockCsvItem = {
  sku: "CU-050-G2",
  name: "Enamelled copper 0.50 mm, grade 2",
  kind: "wire",
  sizeOrGrade: "0.500 mm grade 2, class 180",
  unit: "kg",
  onHand: 4.8,
  reserved: 1.25,
  // One spool of 0.8 kg on hold: 4.8 − 1.25 − 0.8 = 2.75 (worked by hand).
  held: 0.8,
  available: 2.75,
  onOrder: 25,
  reorderPoint: 5,
  reorderQuantity: 10,
  belowReorder: true,
  averageCost: 14.2,
  value: 68.16,
  active: true,
};

function parse(text: string): string[][] {
  return Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), {
    skipEmptyLines: true,
  }).data;
}

describe("stock CSV", () => {
  it("writes a header with the unit column and quantities as plain numbers", () => {
    const [header, row] = parse(stockCsv([wire]));
    expect(header).toEqual(stockCsvHeaders);
    const cell = (name: string) => row![header!.indexOf(name)];
    expect(cell("unit")).toBe("kg");
    expect(cell("on hand")).toBe("4.8");
    expect(cell("on hold")).toBe("0.8");
    expect(cell("available")).toBe("2.75");
    expect(cell("on order")).toBe("25");
    expect(cell("below reorder point")).toBe("yes");
    expect(cell("value (company currency)")).toBe("68.16");
    expect(cell("archived")).toBe("no");
  });

  it("starts with a byte-order mark and ends lines with CRLF", () => {
    const text = stockCsv([wire]);
    expect(text.startsWith("\uFEFFsku,name,")).toBe(true);
    expect(text.split("\r\n")).toHaveLength(3);
  });

  it("neutralises formula text but keeps quotes and commas intact", () => {
    const [, row] = parse(
      stockCsv([
        { ...wire, name: '=HYPERLINK("x")', sku: "@A1", sizeOrGrade: "a, b" },
      ]),
    );
    expect(row![0]).toBe("'@A1");
    expect(row![1]).toBe(`'=HYPERLINK("x")`);
    expect(row![3]).toBe("a, b");
  });

  it("rounds the value to the cent", () => {
    const [header, row] = parse(stockCsv([{ ...wire, value: 10.005_000_1 }]));
    expect(row![header!.indexOf("value (company currency)")]).toBe("10.01");
  });

  it("rounds half a cent away from zero on the exact amount, not on a float (decision 006)", () => {
    const valueCell = (value: number) => {
      const [header, row] = parse(stockCsv([{ ...wire, value }]));
      return row![header!.indexOf("value (company currency)")];
    };
    // 1.005 is 1.00499999999999989… as a float: rounding the float gives 1.
    expect(valueCell(1.005)).toBe("1.01");
    expect(valueCell(-1.005)).toBe("-1.01");
    expect(valueCell(2.675)).toBe("2.68");
    expect(valueCell(1.0049)).toBe("1");
    expect(valueCell(68.1)).toBe("68.1");
  });

  it("names the file by the day in UTC", () => {
    expect(stockCsvFilename(new Date("2026-12-02T23:59:00Z"))).toBe(
      "turnledger-stock-2026-12-02.csv",
    );
  });
});
