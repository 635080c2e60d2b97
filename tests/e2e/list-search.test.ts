/**
 * Every list that can grow is searched by keyboard alone: `/` focuses its search box, the
 * search narrows the list on the server and lands in the address, and the page stays
 * clean for axe-core. A search that finds nothing says so and offers to clear it.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  mailOutbox,
  priceImports,
  stockAlerts,
  stocktakes,
  suppliers,
} from "~/db/schema";
import { newPerson, sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import { createPartItem, receive } from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { searchListByKeyboard } from "../support/list-search";
import { createOrder } from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
const found: string[] = [];
const code = uniqueCode("Q");
let designName = "";
let buildOrderId = 0;
let supplierName = "";
let fileName = "";
let personName = "";
let subject = "";
let item = { sku: "", id: 0 };
let orderId = 0;
let stocktakeNote = "";

beforeAll(async () => {
  browser = await launchBrowser();
  const admin = await newPerson("admin", `Admin ${code}`);
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const builder = await signInAs("builder");
  const db = testDb();

  designName = `Search motor ${code}`;
  const part = await createPartItem(buyer, "pcs", `Housing ${code}`);
  const design = await createDesign(
    [{ kind: "part", itemId: part.id, quantityPerMotor: "1" }],
    { name: designName },
  );
  const created = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: 1, quantity: 2 },
    builder,
  );
  buildOrderId = ((await created.json()) as { id: number }).id;

  supplierName = `Coil supply ${code}`;
  const [supplier] = await db
    .insert(suppliers)
    .values({ name: supplierName, currency: "EUR" })
    .$returningId();
  fileName = `prices-${code}.csv`;
  await db.insert(priceImports).values({
    supplierId: supplier!.id,
    fileName,
    fileSha256: code.padEnd(64, "0").slice(0, 64),
    rowCount: 1,
    mapping: "{}",
    userId: admin.id,
  });

  personName = `Searchable ${code}`;
  await newPerson("manager", personName);
  subject = `Spool report ${code}`;
  await db.insert(mailOutbox).values({
    toAddress: "reader@turnledger.test",
    subject,
    textBody: "Counted.",
  });

  item = await createPartItem(buyer, "pcs", `Shaft ${code}`);
  const rack = await createLocation(uniqueCode("QR"));
  await receive(storekeeper, {
    sku: item.sku,
    lot: `L-${code}`,
    location: rack,
    quantity: 1,
    unitCost: 2,
  });
  await db.insert(stockAlerts).values({
    itemId: item.id,
    availableAtOpen: "1",
    reorderPoint: "5",
    reorderQuantity: "10",
    openedAt: new Date(),
  });
  orderId = (
    await createOrder({
      supplierId: supplier!.id,
      userId: admin.id,
      lines: [{ itemId: item.id, quantity: "3", unitPrice: "2" }],
    })
  ).id;
  stocktakeNote = `Bay ${code}`;
  await db.insert(stocktakes).values({
    note: stocktakeNote,
    startedBy: admin.id,
    startedAt: new Date(),
  });

  page = await signIn(browser, admin);
});

afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const cell = (caption: string | RegExp, text: string | RegExp) => (p: Page) =>
  p.getByRole("table", { name: caption }).getByText(text).first();

describe("search on every list, by keyboard alone", () => {
  it("designs", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/designs",
        form: "Search the designs",
        text: code,
        expected: cell("Designs with their revisions", designName),
      },
      found,
    );
  });

  it("build orders", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/build-orders",
        form: "Search the build orders",
        text: designName,
        expected: cell("Build orders, newest first", `BO-${buildOrderId}`),
      },
      found,
    );
    const rows = page
      .getByRole("table", { name: "Build orders, newest first" })
      .getByRole("row");
    expect(await rows.count()).toBe(2);
  });

  it("suppliers", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/suppliers",
        form: "Search the suppliers",
        text: supplierName,
        expected: cell(/^Suppliers/, supplierName),
      },
      found,
    );
  });

  it("price imports", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/suppliers/imports",
        form: "Search the past imports",
        text: code,
        expected: cell("Committed price-list files, newest first", fileName),
      },
      found,
    );
  });

  it("people", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/admin/people",
        form: "Search the people",
        text: personName,
        expected: cell("People with an account", personName),
      },
      found,
    );
  });

  it("outbox", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/admin/outbox",
        form: "Search the outbox",
        text: code,
        expected: cell("E-mail sent by Turnledger", subject),
      },
      found,
    );
  });

  it("alerts", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/alerts",
        form: "Search the alerts",
        text: item.sku,
        expected: cell(/alert/, item.sku),
      },
      found,
    );
  });

  it("purchase orders", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/purchase-orders",
        form: "Search the purchase orders",
        text: supplierName,
        expected: cell("Purchase orders, newest first", supplierName),
      },
      found,
    );
    expect(orderId).toBeGreaterThan(0);
  });

  it("stocktakes", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/stocktakes",
        form: "Search the stocktakes",
        text: code,
        expected: cell("Stocktakes, newest first", stocktakeNote),
      },
      found,
    );
  });

  it("stock", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/stock",
        form: "Filter the stock list",
        text: item.sku,
        expected: cell("Stock items", item.sku),
      },
      found,
    );
  });

  it("the journal, by item and lot, with its CSV link carrying the filters", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/stock/journal",
        form: "Filter the journal",
        text: item.sku,
        param: "sku",
        expected: cell("Stock movements", `L-${code}`),
      },
      found,
    );
    const download = page.getByRole("link", { name: "Download CSV" });
    expect(await download.getAttribute("href")).toBe(
      `/stock/journal.csv?sku=${item.sku}`,
    );
    await page.goto(
      `${page.url().split("?")[0]}?sku=${item.sku}&lot=L-${code}&type=receipt&from=2020-01-01&to=2099-12-31`,
    );
    await page.getByRole("table", { name: "Stock movements" }).waitFor();
    const shots = "/work/notes/shots";
    const { mkdirSync } = await import("node:fs");
    mkdirSync(shots, { recursive: true });
    await page.screenshot({
      path: `${shots}/journal-filtered.png`,
      fullPage: true,
    });
    await saveScreenshot(page, "journal-filtered");
  });

  it("a search that finds nothing says so, apart from an empty list, and clears", async () => {
    await searchListByKeyboard(
      page,
      {
        path: "/designs",
        form: "Search the designs",
        text: `nothing-${code}`,
        expected: (p) => p.getByText("No results for this search"),
      },
      found,
    );
    await page.getByRole("link", { name: "Clear the search and filters" }).press("Enter");
    await page.waitForURL(
      (url) => url.pathname === "/designs" && url.search === "",
    );
  });

  it("`/` types a slash in a field instead of jumping", async () => {
    const box = page
      .getByRole("form", { name: "Search the designs" })
      .getByRole("searchbox");
    await page.keyboard.press("/");
    await page.keyboard.type("a/b");
    expect(await box.inputValue()).toBe("a/b");
  });

  it("found nothing serious for axe-core on any list", () => {
    expect(found).toEqual([]);
  });
});
