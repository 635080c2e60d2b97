/**
 * A buyer imports a supplier's price list in the browser: choose supplier and
 * file, check the guessed column choices, see the bad row in the check with
 * its line number and the import held back, then import the fixed file and
 * see the result — and that the same file twice changes nothing.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import ExcelJS from "exceljs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let browser: Browser;
let supplier = "";

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  supplier = `Kupferdraht Nord ${uniqueCode("E2E")}`;
  const created = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name: supplier, currency: "EUR" },
    buyer,
  );
  expect(created.status, await created.clone().text()).toBe(201);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const header =
  "Art. no,Description,Standard,Size,Insulation,Price,Currency,Min qty,Valid from";
const goodRows = [
  "A-1,Enamelled copper 0.50 mm,IEC,0.5,grade 2,14.20,EUR,25,2026-11-01",
  "A-2,Enamelled copper 0.80 mm,IEC,0.8,grade 2,13.65,EUR,25,2026-11-01",
  "A-3,Enamelled copper 1.00 mm,IEC,1,grade 2,13.10,EUR,50,2026-11-01",
];
const badRow =
  "A-2,Enamelled copper 0.80 mm,IEC,0.8,grade 2,-13.65,EUR,25,2026-11-01";

function csvFile(name: string, rows: string[]) {
  return {
    name,
    mimeType: "text/csv",
    buffer: Buffer.from(`${header}\n${rows.join("\n")}\n`, "utf-8"),
  };
}

function fieldFor(page: Page, column: string) {
  return page.getByLabel(`Field for the column “${column}”`);
}

/** Opens the import page as a document and waits for React to take it over: the page works only in the browser. */
async function openImportPage(page: Page) {
  await page.goto(`${new URL(page.url()).origin}/suppliers/import`);
  await page
    .getByRole("heading", { name: "Import a price list", level: 1 })
    .waitFor();
  await waitForHydration(page);
}

/** A supplier's workbook: an old list first, this year's prices (typed cells) on the second sheet. */
async function workbookFile(name: string) {
  const book = new ExcelJS.Workbook();
  const old = book.addWorksheet("Prices 2025");
  old.addRow(["Art. no", "Price"]);
  old.addRow(["OLD-1", 9.99]);
  const current = book.addWorksheet("Prices 2026");
  current.addRow(["Copper wire, prices net per kg"]);
  current.addRow([
    "Art. no",
    "Description",
    "Standard",
    "Size",
    "Insulation",
    "Price",
    "Currency",
    "Min qty",
    "Valid from",
    "Lead time (days)",
    "Spool kg",
  ]);
  const rows: ExcelJS.CellValue[][] = [
    [
      "X-1",
      "Enamelled copper 0.50 mm",
      "IEC",
      0.5,
      "grade 2",
      14.345,
      "EUR",
      25,
    ],
    [
      "X-2",
      "Enamelled copper 0.80 mm",
      "IEC",
      0.8,
      "grade 2",
      13.65,
      "EUR",
      25,
    ],
    ["X-3", "Enamelled copper 1.00 mm", "IEC", 1, "grade 2", 13.1, "EUR", 50],
  ];
  for (const row of rows)
    current.addRow([...row, new Date(Date.UTC(2026, 10, 1)), 21, 5]);
  current.getColumn(9).numFmt = "dd.mm.yyyy";
  return {
    name,
    mimeType:
      "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet",
    buffer: Buffer.from(await book.xlsx.writeBuffer()),
  };
}

async function chooseFile(page: Page, file: ReturnType<typeof csvFile>) {
  await page
    .getByLabel("Price list (CSV or .xlsx, up to 20 MB)")
    .setInputFiles(file);
  await page.getByText(`${file.name}:`).waitFor();
}

describe("price-list import in the browser", () => {
  it("holds back a file with a bad row, then imports the fixed file once", async () => {
    const page = await signIn(browser, "buyer");
    await openImportPage(page);
    expect(
      await page.getByRole("heading", { level: 2 }).allTextContents(),
    ).toEqual([
      "1Step 1: Supplier and file",
      "2Step 2: Match the columns",
      "3Step 3: Check the rows",
      "4Step 4: Import",
    ]);
    await saveScreenshot(page, "price-import-1-start");

    // Step 1 and 2: supplier, file with a negative price on line 3, the guesses.
    await page
      .getByLabel("Supplier", { exact: true })
      .selectOption({ label: `${supplier} (EUR)` });
    await chooseFile(
      page,
      csvFile("mill-list-draft.csv", [goodRows[0]!, badRow, goodRows[2]!]),
    );
    const expectedGuesses: Record<string, string> = {
      "Art. no": "supplierSku",
      Description: "description",
      Standard: "standard",
      Size: "size",
      Insulation: "insulation",
      Price: "price",
      Currency: "currency",
      "Min qty": "minQuantity",
      "Valid from": "validFrom",
    };
    for (const [column, field] of Object.entries(expectedGuesses))
      expect(await fieldFor(page, column).inputValue(), column).toBe(field);
    await page.getByText("Every needed field has a column.").waitFor();

    // Leaving out the SKU column is reported live, and checking is held back.
    await fieldFor(page, "Art. no").selectOption("");
    await page
      .getByText("The mapping misses the supplier SKU column.")
      .waitFor();
    expect(
      await page.getByRole("button", { name: "Check the rows" }).isDisabled(),
    ).toBe(true);
    await saveScreenshot(page, "price-import-2-mapping-incomplete");
    await fieldFor(page, "Art. no").selectOption("supplierSku");
    await page.getByText("Every needed field has a column.").waitFor();
    await saveScreenshot(page, "price-import-2-mapping");

    // Step 3: the check lists line 3 and its reason; the import is held back.
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page
      .getByRole("heading", { name: "1 row cannot be imported" })
      .waitFor();
    const invalidTable = page.getByRole("table", {
      name: "Rows that cannot be imported",
    });
    const invalidRow = invalidTable.getByRole("row").nth(1);
    expect(await invalidRow.getByRole("cell").first().textContent()).toBe("3");
    expect(await invalidRow.textContent()).toMatch(/negative/i);
    const importButton = page.getByRole("button", {
      name: /^Import \d+ rows$/,
    });
    expect(await importButton.textContent()).toBe("Import 2 rows");
    expect(await importButton.isDisabled()).toBe(true);
    await page.getByText("The import is all or nothing").waitFor();
    await saveScreenshot(page, "price-import-3-check-with-problem");

    // The fixed file: three good rows, imported.
    await chooseFile(page, csvFile("mill-list.csv", goodRows));
    await page.getByText("Every needed field has a column.").waitFor();
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .getByRole("cell", { name: "A-3" })
      .waitFor();
    expect(
      await page.getByRole("heading", { name: /cannot be imported/ }).count(),
    ).toBe(0);
    await page
      .getByRole("button", { name: "Import 3 rows", disabled: false })
      .waitFor();
    await saveScreenshot(page, "price-import-3-check");

    await importButton.click();
    await page
      .getByText(`Imported 3 rows from mill-list.csv for ${supplier}.`)
      .waitFor();
    const link = page.getByRole("link", { name: "See the import" });
    expect(await link.getAttribute("href")).toMatch(
      /^\/suppliers\/imports\?import=\d+$/,
    );
    await saveScreenshot(page, "price-import-4-done");

    // The same file again: checked fine, but the import changes nothing.
    await chooseFile(page, csvFile("mill-list.csv", goodRows));
    // The saved choices of this supplier's import now fill the columns.
    await page.getByText("from this supplier's last import").first().waitFor();
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page.getByRole("button", { name: "Import 3 rows" }).waitFor();
    await page.getByRole("button", { name: "Import 3 rows" }).click();
    await page.getByText("Already imported, nothing changed.").waitFor();
    await saveScreenshot(page, "price-import-5-again");
    await page.close();
  });

  it("imports an .xlsx workbook from the sheet the buyer chooses", async () => {
    const page = await signIn(browser, "buyer");
    await openImportPage(page);
    await page
      .getByLabel("Supplier", { exact: true })
      .selectOption({ label: `${supplier} (EUR)` });
    await chooseFile(page, await workbookFile("mill-list-2026.xlsx"));
    // The first sheet is read until the buyer chooses another.
    const sheet = page.getByLabel("Sheet", { exact: true });
    expect(await sheet.inputValue()).toBe("Prices 2025");
    await page.getByText("from the sheet “Prices 2025”.").waitFor();
    await sheet.selectOption("Prices 2026");
    await page.getByText("from the sheet “Prices 2026”.").waitFor();
    expect(await fieldFor(page, "Lead time (days)").inputValue()).toBe(
      "leadTimeDays",
    );
    expect(await fieldFor(page, "Spool kg").inputValue()).toBe("packQuantity");
    await page.getByText("Every needed field has a column.").waitFor();

    await page.getByRole("button", { name: "Check the rows" }).click();
    const stored = page.getByRole("table", {
      name: "Rows as they will be stored",
    });
    await stored.getByRole("cell", { name: "X-3" }).waitFor();
    // Typed cells read exactly: the number cell 14.345, the date cell as typed, days and spool.
    const first = stored.getByRole("row").nth(1);
    expect(await first.textContent()).toContain("14.345");
    expect(await first.textContent()).toContain("2026-11-01");
    expect(await first.textContent()).toMatch(/21\sdays · packs of 5\.000\skg/);
    expect(await first.getByRole("cell").first().textContent()).toBe("3");
    await saveScreenshot(page, "price-import-6-xlsx-check");

    await page
      .getByRole("button", { name: "Import 3 rows", disabled: false })
      .click();
    await page
      .getByText(`Imported 3 rows from mill-list-2026.xlsx for ${supplier}.`)
      .waitFor();
    await page.close();
  });

  it("shows the upload's progress while a larger file is sent", async () => {
    const page = await signIn(browser, "buyer");
    await openImportPage(page);
    await page
      .getByLabel("Supplier", { exact: true })
      .selectOption({ label: `${supplier} (EUR)` });
    const rows = Array.from(
      { length: 12_000 },
      (_, index) =>
        `B-${index},Enamelled copper 0.50 mm,IEC,0.5,grade 2,14.20,EUR,${index + 1},2026-11-01`,
    );
    await chooseFile(page, csvFile("mill-list-long.csv", rows));
    // A slow line (about 400 KB/s up), so the bar can be seen moving.
    const devtools = await page.context().newCDPSession(page);
    await devtools.send("Network.enable");
    await devtools.send("Network.emulateNetworkConditions", {
      offline: false,
      latency: 20,
      downloadThroughput: -1,
      uploadThroughput: 400 * 1024,
    });
    await page.getByRole("button", { name: "Check the rows" }).click();
    const bar = page.getByRole("progressbar", {
      name: "Sending mill-list-long.csv",
    });
    await bar.waitFor();
    await page.waitForFunction(() => {
      const now = document
        .querySelector('[role="progressbar"]')
        ?.getAttribute("aria-valuenow");
      return Number(now) > 0 && Number(now) < 100;
    });
    await saveScreenshot(page, "price-import-3-uploading");
    // The page stays usable while the file is sent: the mapping can be read and scrolled.
    expect(await fieldFor(page, "Price").isEnabled()).toBe(true);
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .waitFor({ timeout: 30_000 });
    expect(await bar.count()).toBe(0);
    expect(await page.getByText("Rows to import").count()).toBe(1);
    await page.close();
  });

  it("refuses a file over 20 MB in the browser before sending it", async () => {
    // Handed to Chromium as a file on disk: 20 MB as a buffer crosses the
    // DevTools connection (base64) and takes many seconds on a busy machine.
    const folder = fs.mkdtempSync(path.join(os.tmpdir(), "turnledger-e2e-"));
    const huge = path.join(folder, "huge.csv");
    fs.writeFileSync(huge, Buffer.alloc(20 * 1024 * 1024 + 1, 0x41));
    try {
      const page = await signIn(browser, "buyer");
      await openImportPage(page);
      await page
        .getByLabel("Price list (CSV or .xlsx, up to 20 MB)")
        .setInputFiles(huge);
      await page.getByText(/a price list can be at most 20 MB/).waitFor();
      expect(
        await page
          .getByLabel("Price list (CSV or .xlsx, up to 20 MB)")
          .getAttribute("aria-invalid"),
      ).toBe("true");
      await page.close();
    } finally {
      fs.rmSync(folder, { recursive: true, force: true });
    }
  });
});
