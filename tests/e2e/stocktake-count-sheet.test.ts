/**
 * The blind count sheet on a phone (390 px wide), filled by keyboard alone: Tab to the
 * first field, type, Enter saves the line and puts the cursor in the next line's field.
 * No book figure anywhere on the sheet; no serious axe-core violation. Then the
 * reviewer's page with the variances and the printable sheet, with screenshots.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, postForm, sendJson, signInAs } from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { tabTo } from "../support/keyboard";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let stocktakeId = 0;
let wireLine = 0;
let magnetLine = 0;
const magnet = uniqueCode("MG");
const wire = uniqueCode("CU");

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const rack = await createLocation(
    uniqueCode("RACK"),
    "Magnet and spool rack",
  );
  for (const body of [
    {
      kind: "wire",
      sku: wire,
      name: "Enamelled copper 0.50 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.5",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
    },
    {
      kind: "magnet",
      sku: magnet,
      name: "N42SH block 20×10×5",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      coating: "NiCuNi",
      magnetisation: "through 5 mm",
    },
  ]) {
    const created = await sendJson("POST", "/api/v1/items", body, buyer);
    expect(created.status).toBe(201);
  }
  // Book figures chosen to be recognisable: 137 pieces and 12.345 kg.
  for (const body of [
    {
      type: "receipt",
      sku: magnet,
      location: rack,
      quantity: 137,
      unitCost: 2.5,
    },
    {
      type: "receipt",
      sku: wire,
      lot: "SP-77",
      location: rack,
      quantity: 12.345,
      tareKg: 0.6,
      unitCost: 12,
    },
  ]) {
    const moved = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      body,
      storekeeper,
    );
    expect(moved.status).toBe(201);
  }
  const started = await postForm(
    "/stocktakes",
    { intent: "start", locations: [rack], note: "Rack check" },
    storekeeper,
  );
  expect(started.status).toBe(302);
  stocktakeId = Number(/(\d+)$/.exec(started.headers.get("location")!)![1]);
  const [lines] = await testDatabase().query(
    "SELECT l.id, i.sku FROM stocktake_lines l JOIN items i ON i.id = l.item_id WHERE l.stocktake_id = ?",
    [stocktakeId],
  );
  for (const line of lines as { id: number; sku: string }[]) {
    if (line.sku === wire) wireLine = line.id;
    if (line.sku === magnet) magnetLine = line.id;
  }
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const notesFolder = "/work/notes/screens-r20";

async function keepScreenshot(page: Page, name: string) {
  await saveScreenshot(page, name);
  // A copy beside the other helpers' screenshots, when that folder is there.
  await page
    .screenshot({ path: `${notesFolder}/${name}.png`, fullPage: true })
    .catch(() => undefined);
}

async function expectNoBookFigure(page: Page) {
  const html = await page.content();
  for (const book of ["137", "12.345", "12,345"])
    expect(html, `the sheet shows the book figure ${book}`).not.toContain(book);
}

describe("the blind count sheet", () => {
  it("is filled on a phone with the keyboard alone, and shows no book figure", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${baseUrl()}/stocktakes/${stocktakeId}/count`);
    await waitForHydration(page);
    await expectNoBookFigure(page);
    // Nothing wider than the phone: no sideways scrolling.
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth),
    ).toBeLessThanOrEqual(390);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // The spool first (its SKU sorts first): Tab to its gross field, weigh, Enter.
    const spool = page.locator(`#count-${wireLine}`);
    const block = page.locator(`#count-${magnetLine}`);
    expect(await spool.getByLabel("tare").inputValue()).toBe("0.6");
    await tabTo(page, spool.getByLabel("or gross"));
    await page.keyboard.type("11.3");
    await page.keyboard.press("Enter");
    // Saved (11.300 − 0.600 = 10.700 kg), and the cursor is on the next line.
    await page
      .getByRole("status")
      .filter({ hasText: /Counted 10\.700\skg/ })
      .waitFor();
    const blockField = block.getByLabel("Quantity found");
    await expect
      .poll(() =>
        blockField.evaluate((field) => field === document.activeElement),
      )
      .toBe(true);
    await page.keyboard.type("154");
    await page.keyboard.press("Enter");
    await page
      .getByRole("status")
      .filter({ hasText: /Counted 154\spieces/ })
      .waitFor();
    // A mistake is answered beside its field and saves nothing.
    await tabTo(page, blockField);
    await page.keyboard.press("ControlOrMeta+A");
    await page.keyboard.type("1.5");
    await page.keyboard.press("Enter");
    await block.getByText("counted in whole pieces").waitFor();
    await expectNoBookFigure(page);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await keepScreenshot(page, "stocktake-count-390");

    const [saved] = await testDatabase().query(
      "SELECT counted, book_at_count, gross_kg, tare_kg FROM stocktake_lines WHERE id IN (?, ?) ORDER BY id = ?",
      [wireLine, magnetLine, magnetLine],
    );
    expect(saved).toEqual([
      {
        counted: "10.700",
        book_at_count: "12.345",
        gross_kg: "11.300",
        tare_kg: "0.600",
      },
      {
        counted: "154.000",
        book_at_count: "137.000",
        gross_kg: null,
        tare_kg: null,
      },
    ]);

    // The list with the start form and this week's cycle count.
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto(`${baseUrl()}/stocktakes`);
    await waitForHydration(page);
    await page.getByRole("heading", { name: "To count this week" }).waitFor();
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await keepScreenshot(page, "stocktake-list");

    // The printable sheet: columns to write in, no book figure.
    await page.setViewportSize({ width: 1024, height: 1400 });
    await page.goto(`${baseUrl()}/stocktakes/${stocktakeId}/print`);
    await waitForHydration(page);
    await expectNoBookFigure(page);
    await page.emulateMedia({ media: "print" });
    await keepScreenshot(page, "stocktake-print");
    await page.close();
  });

  it("shows the reviewer the variances in quantity and value", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/stocktakes/${stocktakeId}`);
    await waitForHydration(page);
    // 154 − 137 = +17 pieces × 2.50 = 42.50; 10.700 − 12.345 = −1.645 kg × 12.00 = −19.74; net 22.76.
    const table = page.getByRole("table", { name: /variances/ });
    const tableText = async () =>
      ((await table.textContent()) ?? "").replace(/\u00a0/g, " ");
    await expect.poll(tableText).toContain("+17 pieces");
    const text = await tableText();
    for (const figure of ["+42.50", "−1.645 kg", "−19.74", "+22.76"])
      expect(text).toContain(figure);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await keepScreenshot(page, "stocktake-review");
    await page.close();
  });
});
