/**
 * The import page's check step as a buyer sees it: one column chosen for both
 * SKUs, the catalogue item each row matched (or the new item it makes), and the
 * warnings for a currency without a rate and a wire list without a metal base.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { createSupplier } from "../support/price-list-fixtures";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let browser: Browser;
let buyer = "";
let bearing = "";
let shaft = "";

beforeAll(async () => {
  browser = await launchBrowser();
  buyer = await signInAs("buyer");
  bearing = uniqueCode("BRG");
  shaft = uniqueCode("SHF");
  for (const [sku, name] of [
    [bearing, "Bearing 6202-2RS"],
    [shaft, "Rotor shaft 17 mm"],
  ]) {
    const response = await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name, unit: "pcs" },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(201);
  }
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function openImportPage(page: Page) {
  await page.goto(`${new URL(page.url()).origin}/suppliers/import`);
  await page
    .getByRole("heading", { name: "Import a price list", level: 1 })
    .waitFor();
  await waitForHydration(page);
}

async function chooseSupplierAndFile(
  page: Page,
  supplier: string,
  currency: string,
  name: string,
  lines: string[],
) {
  await page
    .getByLabel("Supplier", { exact: true })
    .selectOption({ label: `${supplier} (${currency})` });
  await page
    .getByLabel("Price list (CSV or .xlsx, up to 20 MB)")
    .setInputFiles({
      name,
      mimeType: "text/csv",
      buffer: Buffer.from(`${lines.join("\n")}\n`, "utf-8"),
    });
  await page.getByText(`${name}:`).waitFor();
}

function fieldFor(page: Page, column: string) {
  return page.getByLabel(`Field for the column “${column}”`);
}

/** The preview table's cells of one column, by its header, row by row. */
async function previewColumn(page: Page, header: string): Promise<string[]> {
  const table = page.getByRole("table", {
    name: "Rows as they will be stored",
  });
  const headers = await table.getByRole("columnheader").allTextContents();
  const index = headers.indexOf(header);
  expect(index, `a "${header}" column in ${headers.join(", ")}`).not.toBe(-1);
  const rows = table.getByRole("row");
  const texts: string[] = [];
  for (let at = 1; at < (await rows.count()); at += 1)
    texts.push(
      (await rows.nth(at).getByRole("cell").nth(index).textContent()) ?? "",
    );
  return texts;
}

describe("the import preview", () => {
  it("lets one column feed both SKUs and shows the items it matched", async () => {
    const supplier = `Lager Süd ${uniqueCode("E2E")}`;
    await createSupplier(buyer, supplier, "EUR");
    const page = await signIn(browser, "buyer");
    await openImportPage(page);
    await chooseSupplierAndFile(page, supplier, "EUR", "bearings.csv", [
      "Item code,Description,Net price",
      `${bearing},Deep groove bearing,2.40`,
      `${shaft},Shaft,7.15`,
    ]);
    await fieldFor(page, "Item code").selectOption({
      label: "Supplier SKU and Our SKU (the same code)",
    });
    await page.getByText("Every needed field has a column.").waitFor();
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .waitFor();
    expect(await previewColumn(page, "Catalogue item")).toEqual([
      `${bearing}Bearing 6202-2RS · by our SKU`,
      `${shaft}Rotor shaft 17 mm · by our SKU`,
    ]);
    await page.getByRole("button", { name: "Import 2 rows" }).waitFor();
    await saveScreenshot(page, "price-import-mapping-both-skus");
    await page.close();
  });

  it("shows new items with their kind, and warns of a missing rate and metal base", async () => {
    // Israeli new shekel: no test gives it a rate or a metal base.
    const supplier = `Galil Winding ${uniqueCode("E2E")}`;
    const supplierId = await createSupplier(buyer, supplier, "ILS");
    const code = uniqueCode("G");
    const page = await signIn(browser, "buyer");
    await openImportPage(page);
    await chooseSupplierAndFile(page, supplier, "ILS", "galil-2026.csv", [
      "Art. no,Our SKU,Description,Standard,Size,Price,Adder per kg",
      `${code}-1,${bearing},Bearing 6202,,,9.80,`,
      `${code}-2,,Copper AWG 39 heavy,AWG,39,,21.50`,
      `${code}-3,,Slot wedge 40 mm,,,0.45,`,
    ]);
    await page.getByText("Every needed field has a column.").waitFor();
    await page.getByRole("button", { name: "Check the rows" }).click();
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .waitFor();
    expect(await previewColumn(page, "Catalogue item")).toEqual([
      `${bearing}Bearing 6202-2RS · by our SKU`,
      `S${supplierId}-${code}-2New wire item`,
      `S${supplierId}-${code}-3New part`,
    ]);
    const warnings = page.getByRole("region", { name: "Warnings" });
    await warnings.getByText("No ILS rate into EUR").waitFor();
    await warnings.getByText("No copper base in ILS").waitFor();
    expect(await warnings.textContent()).toMatch(/cannot be computed/);
    // Warnings do not hold the import back.
    await page
      .getByRole("button", { name: "Import 3 rows", disabled: false })
      .waitFor();
    await saveScreenshot(page, "price-import-preview-matched-skus");
    await page.close();
  });
});
