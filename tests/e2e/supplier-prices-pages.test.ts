/**
 * Suppliers and prices as a buyer meets them in Chromium: the supplier form warns of what
 * its currency lacks; a supplier opens from the list and is edited (a taken name is a field
 * message); an item's best prices are asked for any quantity, a base missing in the
 * supplier's currency is derived and says so, and each reason a price is missing stands on
 * its own line; the best-prices list across items; the menu names; the start page's count
 * of open alerts.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, newPerson, sendJson, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { readable } from "../support/page-text";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let buyerCookie = "";
const today = new Date().toISOString().slice(0, 10);
/** The EUR copper base in force today before this file set its own, put back afterwards. */
let savedEuroBase: { price_per_kg: string } | undefined;

beforeAll(async () => {
  browser = await launchBrowser();
  buyerCookie = await signInAs("buyer");
  const [rows] = await testDatabase().query(
    "SELECT price_per_kg FROM metal_base_prices WHERE conductor = 'copper' AND currency = 'EUR' AND valid_from = ?",
    [today],
  );
  savedEuroBase = (rows as { price_per_kg: string }[])[0];
});
afterAll(async () => {
  await testDatabase().query(
    savedEuroBase
      ? "UPDATE metal_base_prices SET price_per_kg = ? WHERE conductor = 'copper' AND currency = 'EUR' AND valid_from = ?"
      : "DELETE FROM metal_base_prices WHERE conductor = 'copper' AND currency = 'EUR' AND valid_from = ?",
    savedEuroBase ? [savedEuroBase.price_per_kg, today] : [today],
  );
  await browser?.close();
  await closeTestDatabase();
});

/** A currency code no rate and no metal base uses yet ("Q" and two letters; QAR left alone). */
async function unusedCurrency(): Promise<string> {
  const letters = "ABCDEFGHIJKLMNOPQRSTUVWXYZ";
  for (;;) {
    const code = `Q${letters[Math.floor(Math.random() * 26)]}${letters[Math.floor(Math.random() * 26)]}`;
    if (code === "QAR") continue;
    const [rows] = await testDatabase().query(
      "SELECT (SELECT COUNT(*) FROM currency_rates WHERE currency = ?) + (SELECT COUNT(*) FROM metal_base_prices WHERE currency = ?) + (SELECT COUNT(*) FROM suppliers WHERE currency = ?) AS used",
      [code, code, code],
    );
    if (Number((rows as { used: number }[])[0]!.used) === 0) return code;
  }
}

const shot = (page: Page, name: string) =>
  saveScreenshot(page, `supplier-prices-${name}`);

/** A new copper wire of our own, 10 kg reorder quantity. */
async function createWire(): Promise<{ sku: string; id: number }> {
  const sku = uniqueCode("DW");
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: "Enamelled copper 0.63 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.63",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
      reorderPoint: 0,
      reorderQuantity: 10,
    },
    buyerCookie,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  const [rows] = await testDatabase().query(
    "SELECT id FROM items WHERE sku = ?",
    [sku],
  );
  return { sku, id: (rows as { id: number }[])[0]!.id };
}

/** A copper adder line of a supplier quoting in `currency`, valid since 2025-01-01. */
async function quoteAdder(
  supplierId: number,
  itemId: number,
  supplierSku: string,
  currency: string,
  adderPerKg: string,
) {
  await testDatabase().query(
    "INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, import_id, line) VALUES (?, ?, ?, ?, NULL, ?, 'copper', 0, '2025-01-01', NULL, NULL)",
    [supplierId, itemId, supplierSku, currency, adderPerKg],
  );
}

describe("the supplier form and page", () => {
  it("warns of a currency with no rate and no base, opens the supplier from the list and edits it", async () => {
    const currency = await unusedCurrency();
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/suppliers`);
    await waitForHydration(page);
    const form = page.getByRole("region", { name: "New supplier" });
    const name = `Winding wire works ${uniqueCode("W")}`;
    await form.getByLabel("Name").fill(name);
    await form.getByLabel("Quotes in (currency)").fill(currency);
    const warnings = form.getByRole("note", { name: "Currency warnings" });
    await warnings.waitFor();
    // One line per thing missing: the rate, the copper base, the aluminium base.
    expect(await warnings.getByRole("listitem").allTextContents()).toEqual([
      `No rate from ${currency} to EUR is set: this supplier's prices cannot be converted or compared until one is.`,
      expect.stringMatching(
        new RegExp(`^No copper base in ${currency} is set`),
      ),
      expect.stringMatching(
        new RegExp(`^No aluminium base in ${currency} is set`),
      ),
    ]);
    await form.getByLabel("Lead time").fill("12");
    await shot(page, "supplier-form-currency-warning");
    await form.getByRole("button", { name: "Add supplier" }).click();
    await page
      .getByRole("status")
      .getByText(`Added the supplier ${name}.`)
      .waitFor();

    // The list's row opens the supplier's page.
    await page.getByRole("link", { name, exact: true }).click();
    await page.getByRole("heading", { name, level: 1 }).waitFor();
    await waitForHydration(page);
    const details = readable(await page.locator("dl").first().textContent());
    expect(details).toContain(currency);
    expect(details).toContain("12 days");
    expect(
      await page
        .getByRole("note", { name: "Currency warnings" })
        .first()
        .getByRole("listitem")
        .count(),
    ).toBe(3);

    // Edit: a name another supplier has is refused beside the name field.
    const taken = `Taken name ${uniqueCode("T")}`;
    await createSupplier(buyerCookie, taken);
    const edit = page.getByRole("region", { name: "Edit supplier" });
    await edit.getByLabel("Name").fill(taken);
    await edit.getByLabel("Notes").fill("Spools returnable.");
    await edit.getByRole("button", { name: "Save supplier" }).click();
    await edit
      .getByText(`There is already a supplier named "${taken}".`)
      .waitFor();
    expect(await edit.getByLabel("Name").getAttribute("aria-invalid")).toBe(
      "true",
    );
    await shot(page, "supplier-edit-name-taken");

    await edit.getByLabel("Name").fill(`${name} Ltd`);
    await edit.getByLabel("Quotes in (currency)").fill("EUR");
    await edit.getByRole("button", { name: "Save supplier" }).click();
    await page
      .getByRole("status")
      .getByText(`Saved the supplier ${name} Ltd.`)
      .waitFor();
    await page
      .getByRole("heading", { name: `${name} Ltd`, level: 1 })
      .waitFor();
    expect(readable(await page.locator("dl").first().textContent())).toContain(
      "EUR",
    );
    await page.getByText("Spools returnable.").first().waitFor();
    await shot(page, "supplier-page");
    await page.close();
  });

  it("lists the supplier's price-list imports on its page", async () => {
    const name = `Import mill ${uniqueCode("I")}`;
    const supplierId = await createSupplier(buyerCookie, name);
    const fileName = `${uniqueCode("list")}.csv`;
    const importer = await newPerson("buyer");
    await testDatabase().query(
      "INSERT INTO price_imports (supplier_id, file_name, file_sha256, row_count, created_items, mapping, user_id, created_at) VALUES (?, ?, SHA2(?, 256), 4, 0, '{}', ?, UTC_TIMESTAMP(3))",
      [supplierId, fileName, fileName, importer.id],
    );
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/suppliers/${supplierId}`);
    await waitForHydration(page);
    const imports = page.getByRole("table", {
      name: `Price lists imported for ${name}, newest first`,
    });
    await imports.getByRole("link", { name: fileName }).click();
    await page
      .getByRole("heading", { name: `Import of ${fileName}` })
      .waitFor();
    // Readers see no edit form.
    await page.goBack();
    await page.getByRole("heading", { name, level: 1 }).waitFor();
    expect(
      await page.getByRole("region", { name: "Edit supplier" }).count(),
    ).toBe(0);
    await page.close();
  });
});

describe("best prices", () => {
  it("prices an item at the quantity asked, derives a missing base and lists each reason apart", async () => {
    const derivedCurrency = await unusedCurrency();
    const unratedCurrency = await unusedCurrency();
    const wire = await createWire();
    // The EUR copper base in force today: 9.2000 EUR/kg; 1 {derived} = 0.800000 EUR.
    await testDatabase().query(
      "INSERT INTO metal_base_prices (conductor, currency, price_per_kg, valid_from, created_at) VALUES ('copper', 'EUR', 9.2, ?, UTC_TIMESTAMP(3)) ON DUPLICATE KEY UPDATE price_per_kg = 9.2",
      [today],
    );
    await testDatabase().query(
      "INSERT INTO currency_rates (currency, rate, valid_from, created_at) VALUES (?, 0.8, '2025-01-01', UTC_TIMESTAMP(3))",
      [derivedCurrency],
    );
    const derivedSupplier = `Far wire ${uniqueCode("F")}`;
    await quoteAdder(
      await createSupplier(buyerCookie, derivedSupplier, derivedCurrency),
      wire.id,
      "FW-063",
      derivedCurrency,
      "2.40",
    );
    const unratedSupplier = `Unrated wire ${uniqueCode("U")}`;
    await quoteAdder(
      await createSupplier(buyerCookie, unratedSupplier, unratedCurrency),
      wire.id,
      "UW-063",
      unratedCurrency,
      "3.00",
    );

    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/stock/items/${wire.sku}`);
    await waitForHydration(page);
    const prices = page.getByRole("region", { name: /^Best prices for/ });
    // No quantity asked: the reorder quantity, 10 kg.
    expect(readable(await prices.getByRole("heading").textContent())).toBe(
      "Best prices for 10.000 kg (the suggested order)",
    );
    const derivedRow = prices.getByRole("row", {
      name: new RegExp(derivedSupplier),
    });
    // Base 9.2 / 0.8 = 11.5 (units -t '9.2 / 0.8'); (2.40 + 11.50) × 0.8 = 11.12 EUR/kg
    // (units -t '(2.4 + 11.5) * 0.8' → 11.12); 10 kg: 111.20 EUR.
    const derivedText = readable(await derivedRow.textContent());
    expect(derivedText).toContain("11.1200 EUR");
    expect(derivedText).toContain("111.20 EUR");
    expect(derivedText).toContain(
      `2.4000 ${derivedCurrency} adder + 11.5000 ${derivedCurrency} metal base`,
    );
    expect(derivedText).toContain(
      `base derived from 9.2000 EUR/kg at the rate 0.8 EUR/${derivedCurrency}`,
    );
    // No base and no rate: two reasons, each on its own line.
    const unratedRow = prices.getByRole("row", {
      name: new RegExp(unratedSupplier),
    });
    expect(await unratedRow.getByRole("listitem").allTextContents()).toEqual([
      `no copper base price in ${unratedCurrency} on or before ${today}`,
      `no ${unratedCurrency} to EUR rate on or before ${today}`,
    ]);
    await shot(page, "item-best-prices-derived-base");

    // Another quantity: 2.5 kg, kept in the address.
    await prices.getByRole("textbox", { name: /^Quantity/ }).fill("2.5");
    await prices.getByRole("button", { name: "Price it" }).click();
    await page.waitForURL(/\?quantity=2\.5$/);
    await expect
      .poll(async () =>
        readable(await prices.getByRole("heading").textContent()),
      )
      .toBe("Best prices for 2.500 kg");
    // 11.12 × 2.5 = 27.80 EUR (worked by hand).
    expect(readable(await derivedRow.textContent())).toContain("27.80 EUR");
    await shot(page, "item-best-prices-quantity");

    // A quantity that is not one: said beside the field, the default stands.
    await prices.getByRole("textbox", { name: /^Quantity/ }).fill("-3");
    await prices.getByRole("button", { name: "Price it" }).click();
    await prices.getByText(/^quantity must be a number above 0/).waitFor();
    expect(readable(await prices.getByRole("heading").textContent())).toMatch(
      /^Best prices for 10\.000 kg/,
    );

    // The list across items, searched for this wire, at 2.5 kg.
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Best prices" })
      .click();
    await page
      .getByRole("heading", { name: "Best prices", level: 1 })
      .waitFor();
    await waitForHydration(page);
    await page.getByLabel("Search").fill(wire.sku);
    await page.getByLabel(/^Quantity/).fill("2.5");
    await page.getByRole("button", { name: "Show prices" }).click();
    await page.waitForURL(/search=.*quantity=2\.5/);
    const table = page.getByRole("table", {
      name: "Quoted items with their cheapest offer",
    });
    await expect.poll(() => table.getByRole("row").count()).toBe(2);
    const row = readable(await table.getByRole("row").nth(1).textContent());
    expect(row).toContain(wire.sku);
    expect(row).toContain("2.500 kg");
    expect(row).toContain(derivedSupplier);
    expect(row).toContain("11.1200 EUR/kg");
    expect(row).toContain("27.80 EUR");
    expect(row).toContain(`no ${unratedCurrency} to EUR rate`);
    await shot(page, "best-prices-list");

    // The item links to its page at the same quantity.
    await table.getByRole("link", { name: wire.sku }).click();
    await page.waitForURL(
      new RegExp(`/stock/items/${wire.sku}\\?quantity=2\\.5$`),
    );
    await page.close();
  });

  it("names the menu entries for what they open, and shows a buyer the open alerts", async () => {
    const page = await signIn(browser, "buyer");
    const menu = page.getByRole("navigation", { name: "Main" });
    expect(
      await menu.getByRole("link", { name: "Prices", exact: true }).count(),
    ).toBe(0);
    await menu.getByRole("link", { name: "Metal base & rates" }).click();
    await page
      .getByRole("heading", { name: "Metal base and currency rates", level: 1 })
      .waitFor();

    await page.goto(`${baseUrl()}/`);
    await waitForHydration(page);
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS open FROM stock_alerts WHERE closed_at IS NULL AND covered_by_order_id IS NULL",
    );
    const open = Number((rows as { open: number }[])[0]!.open);
    const buying = page.getByRole("region", { name: "Low stock" });
    const link = buying.getByRole("link", { name: /open low-stock alert/ });
    expect(readable(await link.textContent())).toMatch(
      new RegExp(`^${open}open low-stock alerts? to order$`),
    );
    await shot(page, "start-page-open-alerts");
    await link.click();
    await page.waitForURL(`${baseUrl()}/alerts`);
    await page.close();
  });
});
