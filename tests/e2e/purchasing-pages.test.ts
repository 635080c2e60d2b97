import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, newPerson } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** A committed import written straight to the tables, so this page is seen apart from the uploader. */
async function recordAnImport(): Promise<string> {
  const database = testDatabase();
  const fileName = `${uniqueCode("wire-mill")}.csv`;
  const [supplier] = await database.query(
    "INSERT INTO suppliers (name, currency, created_at) VALUES (?, 'EUR', UTC_TIMESTAMP(3))",
    [`Spool mill ${uniqueCode("M")}`],
  );
  const supplierId = (supplier as { insertId: number }).insertId;
  const [wires] = await database.query(
    "SELECT id FROM items WHERE unit = 'kg' LIMIT 1",
  );
  const [magnets] = await database.query(
    "SELECT id FROM items WHERE unit = 'pcs' LIMIT 1",
  );
  const importer = await newPerson("buyer");
  const [imported] = await database.query(
    "INSERT INTO price_imports (supplier_id, file_name, file_sha256, row_count, created_items, mapping, user_id, created_at) VALUES (?, ?, SHA2(?, 256), 3, 1, ?, ?, UTC_TIMESTAMP(3))",
    [
      supplierId,
      fileName,
      fileName,
      JSON.stringify({
        supplierSku: "Art. no",
        adderPerKg: "Adder EUR/kg",
        price: "Net price",
        minQuantity: "From qty",
        validFrom: "Valid from",
      }),
      importer.id,
    ],
  );
  const importId = (imported as { insertId: number }).insertId;
  const wire = (wires as { id: number }[])[0]!.id;
  const magnet = (magnets as { id: number }[])[0]!.id;
  await database.query(
    `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, import_id, line) VALUES
     (?, ?, 'CW-050', 'EUR', NULL, 3.5, 'copper', 25, '2026-11-01', ?, 2),
     (?, ?, 'CW-050', 'EUR', NULL, 3.2, 'copper', 100, '2026-11-01', ?, 3),
     (?, ?, 'ND-D10', 'EUR', 2.35, NULL, NULL, 100, '2026-11-01', ?, 4)`,
    [
      supplierId,
      wire,
      importId,
      supplierId,
      wire,
      importId,
      supplierId,
      magnet,
      importId,
    ],
  );
  return fileName;
}

describe("suppliers and prices in the browser", () => {
  it("a buyer adds a supplier, sets the copper base and a USD rate", async () => {
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/suppliers`);
    await page.getByRole("heading", { name: "Suppliers", level: 1 }).waitFor();
    await waitForHydration(page);

    const name = `Enamel works ${uniqueCode("E")}`;
    const form = page.getByRole("region", { name: "New supplier" });
    await form.getByLabel("Name").fill(name);
    await form.getByLabel("E-mail", { exact: true }).fill("not an address");
    await form.getByLabel("Quotes in (currency)").fill("USD");
    await form.getByLabel("Lead time").fill("21");
    await form.getByLabel("Notes").fill("Spools returnable, 10 kg minimum.");
    await form.getByRole("button", { name: "Add supplier" }).click();
    await expect
      .poll(() => form.getByText("Give a valid e-mail address.").count())
      .toBe(1);
    await saveScreenshot(page, "purchasing-supplier-field-error");

    await form
      .getByLabel("E-mail", { exact: true })
      .fill("orders@enamel.example");
    await form.getByRole("button", { name: "Add supplier" }).click();
    await page
      .getByRole("status")
      .getByText(`Added the supplier ${name}.`)
      .waitFor();
    const row = page.getByRole("row", { name: new RegExp(name) });
    await expect.poll(() => row.textContent()).toContain("21\u00a0days");
    expect(await row.textContent()).toContain("USD");
    await saveScreenshot(page, "purchasing-suppliers");

    await page.goto(`${baseUrl()}/prices`);
    await waitForHydration(page);
    const base = page.getByRole("region", { name: "Set a new base" });
    await base.getByLabel("Conductor").selectOption("copper");
    await base.getByLabel("Currency").fill("EUR");
    await base.getByLabel("Base price").fill("9.1234");
    await base.getByLabel("Valid from (YYYY-MM-DD)").fill("2026-01-02");
    await base.getByRole("button", { name: "Save metal base" }).click();
    await page.getByRole("status").getByText("Metal base saved.").waitFor();
    await expect
      .poll(() =>
        page.getByRole("table", { name: /Metal base history/ }).textContent(),
      )
      .toContain("9.1234\u00a0EUR/kg");

    const rate = page.getByRole("region", { name: "Set a rate" });
    // The company currency is refused by the server, beside the field, keeping what was typed.
    await rate.getByLabel("Currency").fill("EUR");
    await rate.getByLabel("Rate").fill("1");
    await rate.getByRole("button", { name: "Save rate" }).click();
    await rate.getByText("EUR is the company currency").waitFor();
    expect(await rate.getByLabel("Rate").inputValue()).toBe("1");
    await rate.getByLabel("Currency").fill("USD");
    await rate.getByLabel("Rate").fill("0.9123");
    await rate.getByLabel("Valid from (YYYY-MM-DD)").fill("2026-01-02");
    await rate.getByRole("button", { name: "Save rate" }).click();
    await page.getByRole("status").getByText("Currency rate saved.").waitFor();
    await expect
      .poll(() =>
        page
          .getByRole("table", { name: /Currency rate history/ })
          .textContent(),
      )
      .toContain("1 USD = 0.912300\u00a0EUR");
    await saveScreenshot(page, "purchasing-prices");
    await page.close();
  });

  it("a manager reads the prices and past imports without forms", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/prices`);
    await page
      .getByRole("heading", { name: "Metal base and currency rates" })
      .waitFor();
    expect(await page.getByRole("button", { name: /Save/ }).count()).toBe(0);
    await saveScreenshot(page, "purchasing-prices-manager");
    const fileName = await recordAnImport();
    await page.goto(`${baseUrl()}/suppliers/imports`);
    await page.getByRole("heading", { name: "Past imports" }).waitFor();
    expect(
      await page.getByRole("link", { name: "Import a price list" }).count(),
    ).toBe(0);
    await saveScreenshot(page, "purchasing-imports");
    await page.getByRole("link", { name: fileName }).click();
    await page
      .getByRole("heading", { name: `Import of ${fileName}` })
      .waitFor();
    const lines = page.getByRole("table", { name: /Price lines written by/ });
    await expect
      .poll(() => lines.textContent())
      .toContain("copper base + 3.2000\u00a0EUR/kg");
    expect(await page.getByText("Adder EUR/kg").count()).toBe(1);
    await saveScreenshot(page, "purchasing-import-opened");
    await page.close();
  });
});
