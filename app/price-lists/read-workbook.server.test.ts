import ExcelJS from "exceljs";
import { describe, expect, it } from "vitest";
import type { CsvDataRow } from "./parse-price-list";
import { readOpenedPriceListInBatches } from "./read-price-list";
import {
  columnLetters,
  notAWorkbookMessage,
  openPriceListWorkbook,
  unreadableWorkbookMessage,
} from "./read-workbook.server";
import { readZipContents, startsLikeZip } from "./zip-contents";

type Cell = ExcelJS.CellValue;

/** A workbook made with exceljs: each sheet its rows, in order. */
async function workbookBytes(
  sheets: Record<string, Cell[][]>,
  shape?: (workbook: ExcelJS.Workbook) => void,
): Promise<Uint8Array> {
  const workbook = new ExcelJS.Workbook();
  for (const [name, rows] of Object.entries(sheets)) {
    const sheet = workbook.addWorksheet(name);
    for (const row of rows) sheet.addRow(row);
  }
  shape?.(workbook);
  return new Uint8Array(await workbook.xlsx.writeBuffer());
}

async function rowsOf(bytes: Uint8Array, sheet?: string) {
  const opened = await openPriceListWorkbook(bytes, sheet);
  if (!opened.ok) throw new Error(opened.message);
  const rows: CsvDataRow[] = [];
  const outcome = opened.forEachRow((row) => rows.push(row));
  return { opened, rows, outcome };
}

const header = ["SKU", "Description", "Price", "Currency", "Valid from"];

describe("opening a workbook", () => {
  it("reads the first sheet's typed cells as the CSV reader's text", async () => {
    const bytes = await workbookBytes(
      {
        Prices: [
          header,
          [
            "CU-20H",
            "AWG 20 heavy",
            12.345,
            "EUR",
            new Date(Date.UTC(2025, 2, 1)),
          ],
          [
            10045,
            null,
            { formula: "C2*2", result: 24.69 },
            "EUR",
            "2025-03-01",
          ],
        ],
        Notes: [["Prices without VAT", "x"]],
      },
      (workbook) => {
        workbook.getWorksheet("Prices")!.getCell("E2").numFmt = "dd.mm.yyyy";
      },
    );
    expect(startsLikeZip(bytes)).toBe(true);
    const { opened, rows, outcome } = await rowsOf(bytes);
    expect(opened.layout).toMatchObject({
      format: "xlsx",
      sheet: "Prices",
      sheets: [
        { name: "Prices", hidden: false },
        { name: "Notes", hidden: false },
      ],
      headers: header,
      headerLine: 1,
      decimalComma: false,
    });
    expect(rows).toEqual([
      {
        line: 2,
        cells: ["CU-20H", "AWG 20 heavy", "12.345", "EUR", "2025-03-01"],
      },
      { line: 3, cells: ["10045", "", "24.69", "EUR", "2025-03-01"] },
    ]);
    expect(outcome).toMatchObject({ ok: true, dataRowCount: 2, errorCount: 0 });
  });

  it("reads a chosen sheet by name, passes over a title row, and skips hidden sheets by default", async () => {
    const bytes = await workbookBytes(
      {
        Old: [header, ["OLD-1", "", 1, "EUR", ""]],
        "Prices 2025": [
          ["Price list 2025, all prices net"],
          [],
          header,
          ["N42SH-B", "Block", 1.85, "EUR", ""],
        ],
      },
      (workbook) => {
        workbook.getWorksheet("Old")!.state = "hidden";
      },
    );
    const byDefault = await rowsOf(bytes);
    expect(byDefault.opened.layout.sheet).toBe("Prices 2025");
    expect(byDefault.opened.layout.headerLine).toBe(3);
    expect(byDefault.rows).toEqual([
      { line: 4, cells: ["N42SH-B", "Block", "1.85", "EUR", ""] },
    ]);
    const chosen = await rowsOf(bytes, "old");
    expect(chosen.opened.layout.sheet).toBe("Old");
    expect(chosen.rows[0]?.cells[0]).toBe("OLD-1");
    expect(await openPriceListWorkbook(bytes, "Later")).toEqual({
      ok: false,
      message:
        'The workbook has no sheet named "Later"; its sheets are "Old", "Prices 2025".',
    });
  });

  it("reports a formula without a saved result as a row error, naming the cell", async () => {
    const bytes = await workbookBytes({
      Prices: [header, ["A-1", "", { formula: "1+1" } as Cell, "EUR", ""]],
    });
    const { rows, outcome } = await rowsOf(bytes);
    expect(rows).toEqual([]);
    expect(outcome.ok && outcome.errors).toEqual([
      {
        line: 2,
        message:
          'Line 2: the formula in cell C2 (column "Price") has no saved result; open the workbook in the spreadsheet program, let it calculate, save it and upload it again.',
      },
    ]);
  });

  it("refuses a sheet without data rows, and a repeated column name", async () => {
    const headerOnly = await workbookBytes({ Prices: [header] });
    expect((await rowsOf(headerOnly)).outcome).toEqual({
      ok: false,
      message: "The file has a header row but no price rows below it.",
    });
    const twice = await workbookBytes({
      Prices: [
        ["SKU", "Price", "SKU"],
        ["A", 1, "B"],
      ],
    });
    expect(await openPriceListWorkbook(twice)).toEqual({
      ok: false,
      message:
        'The header row names the column "SKU" twice. Each column needs its own name.',
    });
  });

  it("refuses a ZIP package that is not a workbook, and a damaged one", async () => {
    const bytes = await workbookBytes({ Prices: [header] });
    // The same package with its workbook part renamed (same length, in both of its headers).
    const withoutWorkbook = new Uint8Array(
      Buffer.from(
        Buffer.from(bytes)
          .toString("latin1")
          .replaceAll("xl/workbook.xml", "xl/workbook.xmx"),
        "latin1",
      ),
    );
    expect(await openPriceListWorkbook(withoutWorkbook)).toEqual({
      ok: false,
      message: notAWorkbookMessage,
    });
    expect(await openPriceListWorkbook(bytes.slice(0, 200))).toEqual({
      ok: false,
      message: unreadableWorkbookMessage,
    });
  });

  it("hands rows over in batches through the same row checks as CSV", async () => {
    const rows: Cell[][] = [["SKU", "Price", "Lead time", "Pack"]];
    for (let index = 1; index <= 5; index += 1)
      rows.push([`P-${index}`, index + 0.5, 7 * index, 10]);
    rows.push(["P-BAD", -2, 3, 0]);
    const opened = await openPriceListWorkbook(
      await workbookBytes({ Prices: rows }),
    );
    if (!opened.ok) throw new Error(opened.message);
    expect(opened.countDataRows()).toBe(6);
    const batches: number[] = [];
    const readSoFar: number[] = [];
    const read = await readOpenedPriceListInBatches(
      opened,
      {
        mapping: [
          { header: "SKU", field: "supplierSku" },
          { header: "Price", field: "price" },
          { header: "Lead time", field: "leadTimeDays" },
          { header: "Pack", field: "packQuantity" },
        ],
        importDay: "2025-06-02",
        knownGrades: new Set(),
        supplierCurrency: "EUR",
      },
      2,
      async (batch, _errors, dataRowsSoFar) => {
        batches.push(batch.length);
        readSoFar.push(dataRowsSoFar);
      },
    );
    expect(batches).toEqual([2, 2, 1]);
    expect(readSoFar).toEqual([2, 4, 6]);
    expect(read).toMatchObject({
      ok: true,
      goodRows: 5,
      errorCount: 1,
      errors: [
        {
          line: 7,
          message:
            'Line 7: the price "-2" (column "Price") is negative; the pack quantity "0" (column "Pack") must be more than zero.',
        },
      ],
    });
  });
});

describe("the ZIP directory", () => {
  it("lists a workbook's parts and their unpacked size without unpacking", async () => {
    const contents = readZipContents(
      await workbookBytes({ Prices: [header, ["A", "", 1, "EUR", ""]] }),
    );
    expect(contents.ok).toBe(true);
    if (contents.ok) {
      expect(contents.names).toContain("xl/workbook.xml");
      expect(contents.names).toContain("xl/worksheets/sheet1.xml");
      expect(contents.unpackedBytes).toBeGreaterThan(1000);
    }
    expect(
      readZipContents(new TextEncoder().encode("SKU,Price\nA,1\n")),
    ).toEqual({ ok: false });
  });

  it("names columns with the spreadsheet's letters", () => {
    expect([1, 3, 26, 27, 28, 52, 703].map(columnLetters)).toEqual([
      "A",
      "C",
      "Z",
      "AA",
      "AB",
      "AZ",
      "AAA",
    ]);
  });
});
