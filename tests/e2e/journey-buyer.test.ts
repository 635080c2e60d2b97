/**
 * The buyer's journey, by keyboard alone from sign-in to done: read an item's
 * best prices, import a new supplier's price list whose draft has a bad row
 * (held back, line named), import the fixed file, see the item's best price
 * move to the new supplier; then a storekeeper's issue takes the item below
 * its reorder point, the buyer gets the low-stock e-mail (SMTP fake) and sees
 * the alert, and the admin reads the same e-mail in the outbox. Every page is
 * scanned with axe-core.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import { sendJson, signIn as signInApi, signInAs } from "../support/app-client";
import { scanPage } from "../support/accessibility";
import { launchBrowser, saveScreenshot } from "../support/browser";
import { followLink, mainLink, signInByKeyboard } from "../support/journey";
import { chooseOption, press, tabTo } from "../support/keyboard";
import { chooseFileByKeyboard } from "../support/keyboard-files";
import { waitForMessage } from "../support/mail-fake-client";
import { readable } from "../support/page-text";
import {
  createSupplier,
  importPriceList,
} from "../support/price-list-fixtures";
import { openItemByKeyboard } from "../support/stock-search";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

const buyerEmail = "buyer@turnledger.test";
const buyerName = "Tobias Reyne";
const today = new Date().toISOString().slice(0, 10);

let browser: Browser;
let storekeeper = "";
let location = "";
/** The item whose prices move and whose stock runs low: reorder point 10 pieces, reorder quantity 20 pieces. */
const wedge = {
  sku: uniqueCode("WEDGE"),
  name: "Slot wedge, glass laminate 2 mm",
};
/** A second item on the new supplier's list. */
const sleeve = {
  sku: uniqueCode("SLEEVE"),
  name: "Lead sleeve, glass braid 3 mm",
};
/** The supplier quoting the wedge before the journey (2.40 EUR), and the one whose list the buyer imports (1.80 EUR). */
const usual = `Aster Laminates ${uniqueCode("A")}`;
const newcomer = `Borealis Insulation ${uniqueCode("B")}`;

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInApi(buyerEmail, demoPassword());
  storekeeper = await signInAs("storekeeper");
  for (const [item, reorderPoint] of [
    [wedge, 10],
    [sleeve, 0],
  ] as const) {
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        unit: "pcs",
        ...item,
        reorderPoint,
        reorderQuantity: 20,
      },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
  }
  await createSupplier(buyer, usual);
  await createSupplier(buyer, newcomer);
  await importPriceList(buyer, {
    supplier: usual,
    fileName: "aster-2020.csv",
    lines: [
      "Art. no,Our SKU,Price,Valid from",
      `AL-W2,${wedge.sku},2.40,2020-01-01`,
    ],
    mapping: {
      supplierSku: "Art. no",
      itemSku: "Our SKU",
      price: "Price",
      validFrom: "Valid from",
    },
  });
  location = await createLocation(uniqueCode("JB"));
  await moveStock({ type: "receipt", quantity: 15, unitCost: 2.4 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** A movement of the wedge recorded by the demo storekeeper through the stock API. */
async function moveStock(body: Record<string, unknown>): Promise<void> {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    { sku: wedge.sku, location, ...body },
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

/** The new supplier's CSV: the wedge at `wedgePrice`, the sleeve at 0.35; "Customer ref" holds our SKU. */
function newcomerList(name: string, wedgePrice: string) {
  const lines = [
    "Art. no,Customer ref,Description,Price,Currency,Min qty,Valid from",
    `BI-W2,${wedge.sku},Slot wedge 2 mm,${wedgePrice},EUR,10,${today}`,
    `BI-S3,${sleeve.sku},Glass sleeve 3 mm,0.35,EUR,10,${today}`,
  ];
  return {
    name,
    mimeType: "text/csv",
    buffer: Buffer.from(`${lines.join("\n")}\n`, "utf-8"),
  };
}

/** The rows of the item page's best-price table, supplier first, as plain text. */
async function bestPriceRows(page: Page): Promise<string[]> {
  const rows = page
    .getByRole("table", { name: "Supplier prices, cheapest first" })
    .getByRole("row");
  return (await rows.allTextContents()).slice(1).map(readable);
}

/** Step 1 and 2 of the import: the file chosen by keyboard, "Customer ref" mapped to our SKU by keyboard (kept when the file is chosen again). */
async function chooseListAndMapIt(
  page: Page,
  file: ReturnType<typeof newcomerList>,
  options: { backwards?: boolean; chosenBefore?: boolean } = {},
): Promise<void> {
  await chooseFileByKeyboard(
    page,
    page.getByLabel("Price list (CSV or .xlsx, up to 20 MB)"),
    file,
    options,
  );
  await page.getByText(`${file.name}:`).waitFor();
  const ourSku = page.getByLabel("Field for the column “Customer ref”");
  if (options.chosenBefore) {
    // The corrected file has the same columns: the buyer's own choice is kept.
    expect(await ourSku.inputValue()).toBe("itemSku");
  } else {
    expect(await ourSku.inputValue()).toBe(""); // not a header the page can guess
    await chooseOption(page, ourSku, "Our SKU");
  }
  await page.getByText("Every needed field has a column.").waitFor();
  for (const [column, field] of [
    ["Art. no", "supplierSku"],
    ["Customer ref", "itemSku"],
    ["Price", "price"],
    ["Currency", "currency"],
    ["Min qty", "minQuantity"],
    ["Valid from", "validFrom"],
  ])
    expect(
      await page.getByLabel(`Field for the column “${column}”`).inputValue(),
      column,
    ).toBe(field);
}

async function priceLinesOf(supplier: string) {
  const [rows] = await testDatabase().query(
    `SELECT price_lines.supplier_sku AS supplierSku, items.sku, price_lines.unit_price AS price
       FROM price_lines JOIN suppliers ON suppliers.id = price_lines.supplier_id
       JOIN items ON items.id = price_lines.item_id
      WHERE suppliers.name = ? ORDER BY price_lines.supplier_sku`,
    [supplier],
  );
  return rows as { supplierSku: string; sku: string; price: string }[];
}

describe("the buyer's journey", () => {
  const found: string[] = [];
  let page: Page;

  it("signs in and reads the item's best price: the usual supplier's 2.40 EUR", async () => {
    page = await signInByKeyboard(browser, "buyer", found);
    await saveScreenshot(page, "journey-buyer-1-start");
    await openItemByKeyboard(page, wedge.sku, wedge.name, found);
    await page
      .getByRole("heading", { name: "Best prices for 20 pieces" })
      .waitFor();
    expect(await bestPriceRows(page)).toEqual([
      expect.stringMatching(new RegExp(`^${usual}AL-W2.*2\\.4000 EUR`)),
    ]);
    await saveScreenshot(page, "journey-buyer-2-item-before");
  });

  it("imports a price list: the draft's bad row holds the import back, the fixed file goes in", async () => {
    await followLink(page, mainLink(page, "Suppliers"), "Suppliers", found);
    await followLink(
      page,
      page.getByRole("main").getByRole("link", { name: "Import a price list" }),
      "Import a price list",
      found,
    );
    // followLink has waited for React to hydrate the page: the supplier chosen is the page's own.
    await chooseOption(
      page,
      page.getByLabel("Supplier", { exact: true }),
      `${newcomer} (EUR)`,
    );
    await chooseListAndMapIt(page, newcomerList("borealis-draft.csv", "-1.80"));
    await scanPage(page, found);
    await saveScreenshot(page, "journey-buyer-3-mapping");

    // The check names line 2 (the wedge, a negative price) and holds the import back.
    await press(page, page.getByRole("button", { name: "Check the rows" }));
    await page
      .getByRole("heading", { name: "1 row cannot be imported" })
      .waitFor();
    const invalidRow = page
      .getByRole("table", { name: "Rows that cannot be imported" })
      .getByRole("row")
      .nth(1);
    expect(await invalidRow.getByRole("cell").first().textContent()).toBe("2");
    expect(await invalidRow.textContent()).toMatch(/negative/i);
    const importOne = page.getByRole("button", { name: "Import 1 row" });
    expect(await importOne.isDisabled()).toBe(true);
    await scanPage(page, found);
    await saveScreenshot(page, "journey-buyer-4-check-with-problem");
    expect(await priceLinesOf(newcomer)).toEqual([]);

    // The fixed file, chosen again by keyboard (back up the page with Shift+Tab).
    await chooseListAndMapIt(page, newcomerList("borealis.csv", "1.80"), {
      backwards: true,
      chosenBefore: true,
    });
    await press(page, page.getByRole("button", { name: "Check the rows" }));
    await page
      .getByRole("table", { name: "Rows as they will be stored" })
      .getByRole("cell", { name: "BI-S3" })
      .waitFor();
    expect(
      await page.getByRole("heading", { name: /cannot be imported/ }).count(),
    ).toBe(0);
    await scanPage(page, found);
    await press(
      page,
      page.getByRole("button", { name: "Import 2 rows", disabled: false }),
    );
    await page
      .getByText(`Imported 2 rows from borealis.csv for ${newcomer}.`)
      .waitFor();
    await scanPage(page, found);
    await saveScreenshot(page, "journey-buyer-5-imported");
    expect(await priceLinesOf(newcomer)).toEqual([
      { supplierSku: "BI-S3", sku: sleeve.sku, price: "0.3500" },
      { supplierSku: "BI-W2", sku: wedge.sku, price: "1.8000" },
    ]);
  });

  it("sees the item's best price move to the new supplier's 1.80 EUR", async () => {
    await openItemByKeyboard(page, wedge.sku, wedge.name, found);
    expect(await bestPriceRows(page)).toEqual([
      expect.stringMatching(new RegExp(`^${newcomer}BI-W2.*1\\.8000 EUR`)),
      expect.stringMatching(new RegExp(`^${usual}AL-W2.*2\\.4000 EUR`)),
    ]);
    await saveScreenshot(page, "journey-buyer-6-item-after");
  });

  it("gets the low-stock e-mail when an issue takes the item below its reorder point", async () => {
    // 15 − 6 = 9 pieces available, below the reorder point of 10.
    await moveStock({ type: "issue", quantity: 6 });
    const mail = await waitForMessage(
      buyerEmail,
      new RegExp(`^Low stock: ${wedge.sku} `),
    );
    expect(mail.text).toContain("Available now: 9 pieces");
    expect(mail.text).toContain("Reorder point: 10 pieces");
    expect(mail.text).toContain("Suggested order: 20 pieces");
    expect(mail.text).toContain(
      `Best price for that quantity: ${newcomer}, their SKU BI-W2, 1.8000 EUR per piece`,
    );

    await followLink(page, mainLink(page, "Alerts"), "Low-stock alerts", found);
    const alert = page.getByRole("row", { name: new RegExp(wedge.sku) });
    const alertText = readable(await alert.textContent());
    expect(alertText).toContain("Open");
    expect(alertText).toContain("9 pieces");
    expect(alertText).toContain(`${buyerName} (e-mail`);
    await saveScreenshot(page, "journey-buyer-7-alerts");
    await page.close();
  });

  it("the admin reads the same e-mail in the outbox, opened by keyboard", async () => {
    const admin = await signInByKeyboard(browser, "admin", found);
    await followLink(admin, mainLink(admin, "Outbox"), "Outbox", found);
    const row = admin
      .getByRole("row")
      .filter({ hasText: `Low stock: ${wedge.sku} ` })
      .filter({ hasText: buyerEmail });
    const summary = row.locator("summary");
    await tabTo(admin, summary);
    await admin.keyboard.press("Enter");
    const text = row.locator("details pre");
    await text.waitFor();
    expect(await text.textContent()).toContain(
      `Best price for that quantity: ${newcomer}, their SKU BI-W2, 1.8000 EUR per piece`,
    );
    expect(readable(await row.textContent())).not.toContain("Waiting");
    await scanPage(admin, found);
    await saveScreenshot(admin, "journey-buyer-8-outbox");
    await admin.close();
    expect(found).toEqual([]);
  });
});
