/** An item's price history: two imported price lists, read back through the API and the item page. */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let supplier = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  supplier = `History bearings ${uniqueCode("S")}`;
  const created = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name: supplier, currency: "EUR" },
    buyer,
  );
  expect(created.status).toBe(201);
});
afterAll(closeTestDatabase);

const mapping = {
  supplierSku: "Art. no",
  description: "Description",
  price: "Price",
  currency: "Currency",
  minQuantity: "Min qty",
  validFrom: "Valid from",
};

/** Imports a one-row price list for the supplier; the row's article is a part priced per piece. */
async function importPrice(
  supplierSku: string,
  price: string,
  validFrom: string,
): Promise<void> {
  const form = new FormData();
  form.set(
    "file",
    new Blob([
      `Art. no,Description,Price,Currency,Min qty,Valid from\n${supplierSku},Ball bearing 608-2RS,${price},EUR,1,${validFrom}\n`,
    ]),
    `${uniqueCode("list")}.csv`,
  );
  form.set("supplier", supplier);
  form.set("mapping", JSON.stringify(mapping));
  const response = await fetch(`${baseUrl()}/api/v1/price-lists`, {
    method: "POST",
    headers: { Cookie: buyer, Origin: baseUrl() },
    body: form,
  });
  expect(response.status, await response.clone().text()).toBe(201);
}

/** The catalogue SKU the import made for the supplier's article. */
async function itemSkuOf(supplierSku: string): Promise<string> {
  const [rows] = await testDatabase().query(
    "SELECT i.sku FROM supplier_items si JOIN items i ON i.id = si.item_id WHERE si.supplier_sku = ?",
    [supplierSku],
  );
  return (rows as { sku: string }[])[0]!.sku;
}

/** The day `days` before today (UTC), as the app counts days. */
function daysAgo(days: number): string {
  const day = new Date();
  day.setUTCHours(0, 0, 0, 0);
  day.setUTCDate(day.getUTCDate() - days);
  return day.toISOString().slice(0, 10);
}

/** Page HTML as searchable text: React's text markers gone, no-break spaces as spaces. */
const readable = (html: string) =>
  html.replace(/<!-- -->/g, "").replace(/\u00a0/g, " ");

interface HistoryAnswer {
  prices: { unitPrice: number }[];
  history?: {
    unit: string;
    quantity: number;
    companyCurrency: string;
    from: string;
    to: string;
    lineCount: number;
    series: {
      supplier: string;
      supplierSku: string;
      currency: string;
      points: {
        date: string;
        unitPrice: number | null;
        quotedUnitPrice: number | null;
        problems: string[];
      }[];
    }[];
  };
}

async function pricesOf(sku: string, query: string): Promise<HistoryAnswer> {
  const response = await get(
    `/api/v1/items/${encodeURIComponent(sku)}/prices?${query}`,
    storekeeper,
  );
  expect(response.status).toBe(200);
  return (await response.json()) as HistoryAnswer;
}

describe("price history of an item", () => {
  it("a second import with a later valid-from adds a step, in the API and on the item page", async () => {
    const article = uniqueCode("HB");
    // Worked example: 2.15 EUR per piece from 60 days ago, 2.40 from 20 days ago.
    const first = daysAgo(60);
    const second = daysAgo(20);
    await importPrice(article, "2.15", first);
    const sku = await itemSkuOf(article);
    const before = await pricesOf(sku, "quantity=1&history=1");
    expect(before.history!.series[0]!.points).toEqual([
      { date: first, unitPrice: 2.15, quotedUnitPrice: 2.15, problems: [] },
    ]);

    await importPrice(article, "2.40", second);
    const after = await pricesOf(sku, "quantity=1&history=1");
    // The window is the 365 days up to today (the API's default day).
    expect(after.history).toMatchObject({
      unit: "pcs",
      quantity: 1,
      companyCurrency: "EUR",
      from: daysAgo(365),
      to: daysAgo(0),
      lineCount: 2,
    });
    // Both lists stay valid (no end date); on and after the later valid-from its price wins.
    expect(after.history!.series).toEqual([
      {
        supplier,
        supplierSku: article,
        currency: "EUR",
        points: [
          { date: first, unitPrice: 2.15, quotedUnitPrice: 2.15, problems: [] },
          { date: second, unitPrice: 2.4, quotedUnitPrice: 2.4, problems: [] },
        ],
      },
    ]);
    // Today's best price is the later list's, the same figure as the history's last point.
    expect(after.prices.map((price) => price.unitPrice)).toEqual([2.4]);

    // Without history=1 the answer is as before: no history.
    expect(await pricesOf(sku, "quantity=1")).not.toHaveProperty("history");

    // Half a piece is below the one-piece break on every day: one point, no price, the reason.
    const below = await pricesOf(sku, "quantity=0.5&history=1");
    expect(below.history!.series[0]!.points).toEqual([
      {
        date: first,
        unitPrice: null,
        quotedUnitPrice: null,
        problems: [
          `0.500 is below the smallest quantity break valid on ${first} (1.000)`,
        ],
      },
    ]);

    // The item page charts the reorder quantity, here 1 piece (none is set).
    const page = await get(`/stock/items/${encodeURIComponent(sku)}`, buyer);
    expect(page.status).toBe(200);
    const html = readable(await page.text());
    expect(html).toContain("Price history for 1 piece");
    expect(html).toContain('aria-label="Price history chart, EUR per piece"');
    expect(html).toContain(`${supplier} · ${article}: 2.1500 EUR/piece from `);
    expect(html).toMatch(
      /1 change, lowest 2\.1500 EUR\/piece, highest 2\.4000 EUR\/piece, now 2\.4000 EUR\/piece\./,
    );
    expect(html).toContain("now 2.4000 EUR/piece");
    // The figures table has one row per price, each with its unit.
    expect(html).toContain("Figures of the price history");
    expect(html.match(/>2\.1500 EUR\/piece</g)).toHaveLength(1);
    expect(html.match(/>2\.4000 EUR\/piece</g)).toHaveLength(1);
  });

  it("an item without price lines says so, with the import link for buyers only", async () => {
    const sku = uniqueCode("NP");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name: "Slot liner, Nomex 0.18 mm", unit: "m" },
      buyer,
    );
    expect(created.status).toBe(201);

    const answer = await pricesOf(sku, "history=1");
    expect(answer.history).toMatchObject({ lineCount: 0, series: [] });

    const forBuyer = readable(
      await (await get(`/stock/items/${sku}`, buyer)).text(),
    );
    expect(forBuyer).toContain("No price lines for this item yet.");
    expect(forBuyer).toContain('href="/suppliers/import"');
    expect(forBuyer).not.toContain("Price history chart");

    const forStorekeeper = readable(
      await (await get(`/stock/items/${sku}`, storekeeper)).text(),
    );
    expect(forStorekeeper).toContain("No price lines for this item yet.");
    expect(forStorekeeper).not.toContain('href="/suppliers/import"');
  });

  it("refuses a bad history flag with 400 naming it", async () => {
    const article = uniqueCode("HF");
    await importPrice(article, "1.00", daysAgo(5));
    const sku = await itemSkuOf(article);
    const response = await get(
      `/api/v1/items/${encodeURIComponent(sku)}/prices?history=yes`,
      buyer,
    );
    expect(response.status).toBe(400);
    expect(Object.keys((await response.json()).error.fields)).toEqual([
      "history",
    ]);
  });
});
