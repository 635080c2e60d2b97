import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let buyer = "";
beforeAll(async () => {
  browser = await launchBrowser();
  buyer = await signInAs("buyer");
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** The day `days` before today (UTC). */
function daysAgo(days: number): string {
  const day = new Date();
  day.setUTCHours(0, 0, 0, 0);
  day.setUTCDate(day.getUTCDate() - days);
  return day.toISOString().slice(0, 10);
}

/** Text with the no-break spaces between numbers and units as plain spaces. */
const readable = (text: string | null) => (text ?? "").replace(/\u00a0/g, " ");

async function createSupplier(name: string, currency: string): Promise<number> {
  const response = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name, currency },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  const [rows] = await testDatabase().query(
    "SELECT id FROM suppliers WHERE name = ?",
    [name],
  );
  return (rows as { id: number }[])[0]!.id;
}

/**
 * A wire with a year of prices from three suppliers, written straight to the price lines
 * so the chart is seen apart from the uploader: two in EUR with changes, one in NOK whose
 * first months have no rate yet (a break in its line).
 */
async function wireWithPrices() {
  const sku = uniqueCode("PH");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: "Enamelled copper 1.12 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "1.12",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
      reorderQuantity: 25,
    },
    buyer,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const [items] = await testDatabase().query(
    "SELECT id FROM items WHERE sku = ?",
    [sku],
  );
  const itemId = (items as { id: number }[])[0]!.id;
  const aster = `Aster Wire ${uniqueCode("A")}`;
  const boreal = `Boreal Enamel ${uniqueCode("B")}`;
  const fjord = `Fjord Kobber ${uniqueCode("F")}`;
  const [asterId, borealId, fjordId] = [
    await createSupplier(aster, "EUR"),
    await createSupplier(boreal, "EUR"),
    await createSupplier(fjord, "NOK"),
  ];
  const lines: [number, string, string, string, string, string][] = [
    [asterId, "CU112-G2", "EUR", "14.20", "1", daysAgo(300)],
    [asterId, "CU112-G2", "EUR", "14.85", "1", daysAgo(150)],
    [asterId, "CU112-G2", "EUR", "13.90", "1", daysAgo(40)],
    [borealId, "BE-112", "EUR", "15.10", "1", daysAgo(250)],
    [borealId, "BE-112", "EUR", "14.60", "1", daysAgo(90)],
    [borealId, "BE-112", "EUR", "13.95", "100", daysAgo(90)],
    [fjordId, "FK 1,12 G2", "NOK", "160.00", "5", daysAgo(200)],
  ];
  for (const [supplierId, supplierSku, currency, price, min, from] of lines) {
    await testDatabase().query(
      "INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, min_quantity, valid_from) VALUES (?, ?, ?, ?, ?, ?, ?)",
      [supplierId, itemId, supplierSku, currency, price, min, from],
    );
  }
  const rate = await sendJson(
    "PUT",
    "/api/v1/currency-rates",
    { currency: "NOK", rate: 0.0852, validFrom: daysAgo(120) },
    buyer,
  );
  expect(rate.status).toBe(200);
  return { sku, aster, boreal, fjord };
}

describe("price history on the item page", () => {
  it("charts each supplier article with a legend, a summary and the figures", async () => {
    const { sku, aster, boreal, fjord } = await wireWithPrices();
    const page = await signIn(browser, "manager");
    const errors: string[] = [];
    page.on("console", (message) => {
      if (message.type() === "error") errors.push(message.text());
    });
    page.on("pageerror", (error) => errors.push(error.message));
    await page.goto(`${baseUrl()}/stock/items/${sku}`);

    const section = page.getByRole("region", {
      name: "Price history for 25.000 kg",
    });
    const chart = section.getByRole("img", {
      name: "Price history chart, EUR per kg",
    });
    await chart.waitFor();
    // The summary for screen readers names every article and today's price.
    const description = await chart.getAttribute("aria-describedby");
    const summary = readable(
      await page.locator(`[id="${description}"]`).textContent(),
    );
    // 13.90 EUR/kg is Aster's third list, the price since 40 days ago (set above).
    expect(summary).toContain(`${aster} · CU112-G2: 14.2000 EUR/kg from`);
    expect(summary).toContain("now 13.9000 EUR/kg");
    expect(summary).toContain(`${fjord} · FK 1,12 G2`);

    const legend = section.getByRole("list", { name: "Legend" });
    for (const name of [aster, boreal, fjord]) {
      expect(await legend.getByText(name, { exact: false }).count()).toBe(1);
    }
    // 160.00 NOK × 0.0852 EUR/NOK = 13.632 EUR per kg (worked by hand).
    expect(readable(await legend.textContent())).toContain(
      "now 13.6320 EUR/kg",
    );

    const figures = section.getByRole("table", {
      name: /Unit price of 25\.000 kg by supplier article and date/,
    });
    expect(await figures.isVisible()).toBe(false);
    await section.getByText("Figures of the price history").click();
    await figures.waitFor();
    // Fjord's first days have no NOK rate: a row without a price, saying why.
    const gap = figures.getByRole("row", { name: /no NOK to EUR rate/ });
    expect(await gap.count()).toBe(1);
    expect(readable(await gap.textContent())).toContain("no price");

    await section.scrollIntoViewIfNeeded();
    await saveScreenshot(page, "stock-item-price-history");
    expect(errors).toEqual([]);
    await page.close();
  });

  it("tells a buyer there are no price lines yet and links to the import", async () => {
    const sku = uniqueCode("NP");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name: "Slot wedge, glass laminate", unit: "pcs" },
      buyer,
    );
    expect(created.status).toBe(201);
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/stock/items/${sku}`);
    const section = page.getByRole("region", {
      name: "Price history for 1 piece",
    });
    await section.getByText("No price lines for this item yet.").waitFor();
    await section.getByRole("link", { name: "Import a price list" }).click();
    await page.waitForURL(`${baseUrl()}/suppliers/import`);
    await page.close();
  });
});
