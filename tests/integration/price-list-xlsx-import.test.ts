import ExcelJS from "exceljs";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
const suppliers = { csv: "", xlsx: "", other: "" };
beforeAll(async () => {
  buyer = await signInAs("buyer");
  for (const key of Object.keys(suppliers) as (keyof typeof suppliers)[]) {
    suppliers[key] = `Sheet mill ${key} ${uniqueCode("S")}`;
    const created = await sendJson(
      "POST",
      "/api/v1/suppliers",
      { name: suppliers[key], currency: "EUR", leadTimeDays: 21 },
      buyer,
    );
    expect(created.status).toBe(201);
  }
});
afterAll(closeTestDatabase);

const headers = [
  "Art. no",
  "Description",
  "Standard",
  "Size",
  "Grade",
  "Price",
  "Adder per kg",
  "Min qty",
  "Valid from",
  "Lead time (days)",
  "Spool kg",
];
const mapping = {
  supplierSku: "Art. no",
  description: "Description",
  standard: "Standard",
  size: "Size",
  grade: "Grade",
  price: "Price",
  adderPerKg: "Adder per kg",
  minQuantity: "Min qty",
  validFrom: "Valid from",
  leadTimeDays: "Lead time (days)",
  packQuantity: "Spool kg",
};

type Cell = ExcelJS.CellValue;
const day = (year: number, month: number, date: number) =>
  new Date(Date.UTC(year, month - 1, date));

/**
 * The same price rows twice: as a workbook's typed cells (numbers, date cells, a formula with
 * its saved result) and as the CSV text a buyer would type for them.
 */
function samePriceRows(prefix: string): { cells: Cell[][]; csv: string } {
  const cells: Cell[][] = [
    [
      `${prefix}-1`,
      "Enamelled copper 0.50 mm",
      "IEC",
      0.5,
      null,
      null,
      3.5,
      25,
      day(2026, 11, 1),
      14,
      5,
    ],
    [
      `${prefix}-1`,
      "Enamelled copper 0.50 mm",
      "IEC",
      0.5,
      null,
      null,
      // =3.5-0.3, saved as the double nearest 3.2.
      { formula: "G2-0.3", result: 3.5 - 0.3 },
      100,
      day(2026, 11, 1),
      14,
      5,
    ],
    [
      `${prefix}-2`,
      "Copper AWG 20 heavy",
      "AWG",
      20,
      null,
      12.345,
      null,
      1,
      day(2026, 12, 31),
      null,
      2.5,
    ],
    [
      `${prefix}-3`,
      "Sm2Co17 disc",
      null,
      null,
      "Sm2Co17",
      2.35,
      null,
      100,
      "2026-11-01",
      0,
      null,
    ],
    [
      1000 + Number(prefix.replace(/\D/g, "").slice(-4) || "0"),
      "Shaft 8 mm",
      null,
      null,
      null,
      0.1 + 0.2,
      null,
      10,
      day(2026, 11, 1),
      30,
      10,
    ],
  ];
  const text = (cell: Cell, index: number): string => {
    if (cell === null) return "";
    if (cell instanceof Date) return cell.toISOString().slice(0, 10);
    if (typeof cell === "object" && "formula" in cell) return "3.2";
    if (index === 5 && cell === 0.1 + 0.2) return "0.3";
    return String(cell);
  };
  const csv = [
    headers.join(","),
    ...cells.map((row) => row.map(text).join(",")),
  ].join("\n");
  return { cells, csv };
}

async function workbook(sheets: Record<string, Cell[][]>): Promise<Uint8Array> {
  const book = new ExcelJS.Workbook();
  for (const [name, rows] of Object.entries(sheets)) {
    const sheet = book.addWorksheet(name);
    for (const row of rows) sheet.addRow(row);
    // Dates typed as dates: a date number format, as a spreadsheet program sets it.
    sheet.getColumn(9).numFmt = "dd.mm.yyyy";
  }
  return new Uint8Array(await book.xlsx.writeBuffer());
}

async function upload(
  bytes: Uint8Array | string,
  fileName: string,
  supplier: string,
  options: { dryRun?: boolean; layout?: boolean; sheet?: string } = {},
) {
  const form = new FormData();
  form.set("file", new Blob([bytes as BlobPart]), fileName);
  form.set("supplier", supplier);
  form.set("mapping", JSON.stringify(mapping));
  if (options.sheet) form.set("sheet", options.sheet);
  const query = options.layout
    ? "?layout=1"
    : options.dryRun
      ? "?dryRun=1"
      : "";
  return fetch(`${baseUrl()}/api/v1/price-lists${query}`, {
    method: "POST",
    headers: { Cookie: buyer, Origin: baseUrl() },
    body: form,
  });
}

async function storedLines(supplier: string) {
  const [rows] = await testDatabase().query(
    `SELECT l.supplier_sku, l.currency, l.unit_price, l.adder_per_kg, l.conductor, l.min_quantity,
            DATE_FORMAT(l.valid_from, '%Y-%m-%d') AS valid_from, l.lead_time_days, l.pack_quantity, l.line, i.kind, i.unit, i.name
       FROM price_lines l JOIN suppliers s ON s.id = l.supplier_id JOIN items i ON i.id = l.item_id
      WHERE s.name = ? ORDER BY l.line`,
    [supplier],
  );
  return rows as Record<string, unknown>[];
}

async function tableCounts() {
  const [rows] = await testDatabase().query(
    "SELECT (SELECT COUNT(*) FROM price_lines) AS line_count, (SELECT COUNT(*) FROM price_imports) AS import_count, (SELECT COUNT(*) FROM items) AS item_count, (SELECT COUNT(*) FROM supplier_items) AS sku_count",
  );
  return (rows as Record<string, number>[])[0];
}

describe("price lists as .xlsx workbooks", () => {
  it("stores the same price lines from a workbook as from the CSV of the same rows", async () => {
    const { cells, csv } = samePriceRows(uniqueCode("X"));
    const fromCsv = await upload(csv, "prices.csv", suppliers.csv);
    expect(fromCsv.status).toBe(201);
    const book = await workbook({ Prices: [headers, ...cells] });
    const preview = await upload(book, "prices.xlsx", suppliers.xlsx, {
      dryRun: true,
    });
    expect(preview.status).toBe(200);
    const checked = await preview.json();
    expect(checked).toMatchObject({ valid: 5, invalidCount: 0 });
    expect(checked.rows[0]).toMatchObject({
      line: 2,
      adderPerKg: "3.5000",
      leadTimeDays: 14,
      packQuantity: "5.000",
    });
    const fromWorkbook = await upload(book, "prices.xlsx", suppliers.xlsx);
    expect(fromWorkbook.status).toBe(201);
    expect((await fromWorkbook.json()).rows).toBe(5);

    const csvLines = await storedLines(suppliers.csv);
    const workbookLines = await storedLines(suppliers.xlsx);
    expect(workbookLines).toHaveLength(5);
    expect(workbookLines).toEqual(csvLines);
    // Worked by hand from the rows above: typed cells read exactly, dates as typed.
    expect(
      workbookLines.map((line) => [
        line.unit_price,
        line.adder_per_kg,
        line.min_quantity,
        line.valid_from,
        line.lead_time_days,
        line.pack_quantity,
      ]),
    ).toEqual([
      [null, "3.5000", "25.000", "2026-11-01", 14, "5.000"],
      [null, "3.2000", "100.000", "2026-11-01", 14, "5.000"],
      ["12.3450", null, "1.000", "2026-12-31", null, "2.500"],
      ["2.3500", null, "100.000", "2026-11-01", 0, null],
      ["0.3000", null, "10.000", "2026-11-01", 30, "10.000"],
    ]);

    // The same workbook again changes nothing (its SHA-256 is known for this supplier).
    const before = await tableCounts();
    const again = await upload(book, "prices-again.xlsx", suppliers.xlsx);
    expect(again.status).toBe(200);
    expect((await again.json()).alreadyImported).toBe(true);
    expect(await tableCounts()).toEqual(before);
  });

  it("names a workbook's sheets and reads a chosen one", async () => {
    const { cells } = samePriceRows(uniqueCode("Y"));
    const book = await workbook({
      Cover: [["Price list 2026"], ["Valid from November"]],
      Prices: [headers, ...cells.slice(0, 2)],
    });
    const layout = await upload(book, "prices.xlsx", suppliers.other, {
      layout: true,
    });
    expect(layout.status).toBe(200);
    expect(await layout.json()).toMatchObject({
      format: "xlsx",
      sheets: [
        { name: "Cover", hidden: false },
        { name: "Prices", hidden: false },
      ],
      // The cover sheet has no header row: the first sheet that has one is read.
      sheet: "Prices",
    });
    const cover = await upload(book, "prices.xlsx", suppliers.other, {
      dryRun: true,
      sheet: "cover",
    });
    expect(cover.status).toBe(400);
    expect((await cover.json()).error.message).toBe(
      'The sheet "Cover" has no header row: no row names two columns or more.',
    );

    const chosen = await upload(book, "prices.xlsx", suppliers.other, {
      layout: true,
      sheet: "Prices",
    });
    expect(await chosen.json()).toMatchObject({
      sheet: "Prices",
      headers,
      sampleRow: expect.arrayContaining(["IEC", "0.5", "2026-11-01"]),
    });
    const preview = await upload(book, "prices.xlsx", suppliers.other, {
      dryRun: true,
      sheet: "Prices",
    });
    expect(preview.status).toBe(200);
    expect((await preview.json()).valid).toBe(2);
    const missing = await upload(book, "prices.xlsx", suppliers.other, {
      dryRun: true,
      sheet: "Prices 2027",
    });
    expect(missing.status).toBe(400);
    expect((await missing.json()).error.message).toBe(
      'The workbook has no sheet named "Prices 2027"; its sheets are "Cover", "Prices".',
    );
  });

  it("refuses a file that is not a workbook with a clear 400 and writes nothing", async () => {
    const before = await tableCounts();
    const named = await upload(
      "Art. no,Price\nA,1\n",
      "prices.xlsx",
      suppliers.other,
    );
    expect(named.status).toBe(400);
    expect((await named.json()).error.message).toContain(
      "is named as an .xlsx workbook but is not one",
    );
    const { cells } = samePriceRows(uniqueCode("Z"));
    const book = await workbook({ Prices: [headers, ...cells] });
    const damaged = await upload(
      book.slice(0, book.length - 100),
      "prices.xlsx",
      suppliers.other,
    );
    expect(damaged.status).toBe(400);
    expect((await damaged.json()).error.message).toContain("could not be read");
    expect(await tableCounts()).toEqual(before);
  });

  it("refuses a workbook with one bad row with 422, its row number, and writes nothing", async () => {
    const { cells } = samePriceRows(uniqueCode("W"));
    const bad = cells.map((row) => [...row]);
    bad[2]![9] = 2.5; // lead time on row 4: not whole days
    bad[3]![10] = 0; // pack quantity on row 5: not more than zero
    const before = await tableCounts();
    const answer = await upload(
      await workbook({ Prices: [headers, ...bad] }),
      "prices.xlsx",
      suppliers.other,
    );
    expect(answer.status).toBe(422);
    const body = await answer.json();
    expect(body.invalid).toEqual([
      {
        line: 4,
        message:
          'Line 4: the lead time "2.5" (column "Lead time (days)") is not a whole number of days.',
      },
      {
        line: 5,
        message:
          'Line 5: the pack quantity "0" (column "Spool kg") must be more than zero.',
      },
    ]);
    expect(await tableCounts()).toEqual(before);
  });

  it("gives the line's lead time and pack quantity in the item's prices", async () => {
    const [rows] = await testDatabase().query(
      `SELECT i.sku FROM price_lines l JOIN suppliers s ON s.id = l.supplier_id JOIN items i ON i.id = l.item_id
        WHERE s.name = ? AND l.pack_quantity = 2.5`,
      [suppliers.xlsx],
    );
    const sku = (rows as { sku: string }[])[0]!.sku;
    const answer = await fetch(
      `${baseUrl()}/api/v1/items/${encodeURIComponent(sku)}/prices?quantity=5&date=2027-01-15`,
      { headers: { Cookie: buyer } },
    );
    expect(answer.status).toBe(200);
    const prices = (await answer.json()).prices as {
      supplier: string;
      leadTimeDays: number | null;
      packQuantity: number | null;
    }[];
    // No lead time on the line: the supplier's 21 days; its spools are 2.5 kg.
    expect(
      prices.find((price) => price.supplier === suppliers.xlsx),
    ).toMatchObject({ leadTimeDays: 21, packQuantity: 2.5 });
  });
});
