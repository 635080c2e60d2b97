/** The suppliers, prices and past-imports pages and the currency-rates API, over HTTP. */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  newPerson,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

const cookies: Record<string, string> = {};
beforeAll(async () => {
  for (const role of ["buyer", "storekeeper", "manager", "admin"] as const) {
    cookies[role] = await signInAs(role);
  }
});
afterAll(closeTestDatabase);

async function countRows(sql: string, values: unknown[]): Promise<number> {
  const [rows] = await testDatabase().query(sql, values);
  return Number((rows as { n: number }[])[0]!.n);
}

const supplierCount = (name: string) =>
  countRows("SELECT COUNT(*) AS n FROM suppliers WHERE name = ?", [name]);
const rateCount = (currency: string) =>
  countRows("SELECT COUNT(*) AS n FROM currency_rates WHERE currency = ?", [
    currency,
  ]);

/** A made-up ISO-shaped code per test, so tests never see each other's rates. */
/**
 * A three-letter code no rate uses yet: random codes meet the demo's and other
 * tests' currencies now and then, and a test that counts rows must start at none.
 */
async function testCurrency(): Promise<string> {
  const letters = "ABCDEFGHIJKLMNOPQRSTUVWXYZ";
  for (;;) {
    const code = Array.from(
      { length: 3 },
      () => letters[Math.floor(Math.random() * letters.length)],
    ).join("");
    if ((await rateCount(code)) === 0) return code;
  }
}

describe("/api/v1/currency-rates", () => {
  it("a buyer sets a rate; everyone signed in reads it with the company currency", async () => {
    const currency = await testCurrency();
    const put = await sendJson(
      "PUT",
      "/api/v1/currency-rates",
      {
        currency: currency.toLowerCase(),
        rate: 0.912345,
        validFrom: "2026-03-02",
      },
      cookies.buyer,
    );
    expect(put.status).toBe(200);
    const listed = await put.json();
    expect(listed.companyCurrency).toBe("EUR");
    expect(listed.rates).toContainEqual({
      currency,
      rate: 0.912345,
      validFrom: "2026-03-02",
    });

    const read = await get("/api/v1/currency-rates", cookies.manager);
    expect(read.status).toBe(200);
    const body = await read.json();
    const dates = body.rates.map(
      (rate: { validFrom: string }) => rate.validFrom,
    );
    expect(dates).toEqual([...dates].sort().reverse());
    expect(body.rates).toContainEqual({
      currency,
      rate: 0.912345,
      validFrom: "2026-03-02",
    });
  });

  it("the same currency and day again replaces the rate", async () => {
    const currency = await testCurrency();
    for (const rate of [1.5, 1.25]) {
      const put = await sendJson(
        "PUT",
        "/api/v1/currency-rates",
        { currency, rate, validFrom: "2026-04-01" },
        cookies.admin,
      );
      expect(put.status).toBe(200);
    }
    expect(await rateCount(currency)).toBe(1);
    const body = await (
      await get("/api/v1/currency-rates", cookies.buyer)
    ).json();
    expect(
      body.rates.filter(
        (rate: { currency: string }) => rate.currency === currency,
      ),
    ).toEqual([{ currency, rate: 1.25, validFrom: "2026-04-01" }]);
  });

  it.each([
    ["currency", { currency: "dollars", rate: 1.1, validFrom: "2026-03-01" }],
    ["currency", { rate: 1.1, validFrom: "2026-03-01" }],
    ["rate", { currency: "QQQ", rate: 0, validFrom: "2026-03-01" }],
    ["rate", { currency: "QQQ", rate: "1.1", validFrom: "2026-03-01" }],
    ["rate", { currency: "QQQ", rate: 1.1234567, validFrom: "2026-03-01" }],
    ["validFrom", { currency: "QQQ", rate: 1.1, validFrom: "2026-02-30x" }],
    ["validFrom", { currency: "QQQ", rate: 1.1, validFrom: "1 March" }],
  ])(
    "refuses a bad %s with 400 naming it, writing nothing",
    async (field, payload) => {
      const response = await sendJson(
        "PUT",
        "/api/v1/currency-rates",
        payload,
        cookies.buyer,
      );
      expect(response.status).toBe(400);
      const body = await response.json();
      expect(Object.keys(body.error.fields)).toEqual([field]);
      expect(await rateCount("QQQ")).toBe(0);
    },
  );

  it("refuses a rate for the company currency itself", async () => {
    const before = await rateCount("EUR");
    const response = await sendJson(
      "PUT",
      "/api/v1/currency-rates",
      { currency: "eur", rate: 1, validFrom: "2026-03-01" },
      cookies.buyer,
    );
    expect(response.status).toBe(400);
    expect((await response.json()).error.fields.currency[0]).toMatch(
      /company currency/,
    );
    expect(await rateCount("EUR")).toBe(before);
  });

  it("refuses a storekeeper (403) and an anonymous caller (401), writing nothing", async () => {
    const currency = await testCurrency();
    const payload = { currency, rate: 2, validFrom: "2026-03-01" };
    const storekeeper = await sendJson(
      "PUT",
      "/api/v1/currency-rates",
      payload,
      cookies.storekeeper,
    );
    expect(storekeeper.status).toBe(403);
    const anonymous = await sendJson("PUT", "/api/v1/currency-rates", payload);
    expect(anonymous.status).toBe(401);
    expect(await rateCount(currency)).toBe(0);
  });
});

describe("/suppliers", () => {
  it("a buyer adds a supplier through the form and sees it listed", async () => {
    const name = `Coil wire works ${uniqueCode("S")}`;
    const response = await postForm(
      "/suppliers",
      {
        name,
        email: "orders@wire.example",
        currency: "usd",
        leadTimeDays: "14",
        notes: "Ships on returnable spools.",
      },
      cookies.buyer,
    );
    expect(response.status).toBe(302);
    expect(response.headers.get("location")).toBe("/suppliers");
    // The next page says so once, naming the supplier from the database.
    expect(
      await (await followRedirect(response, cookies.buyer)).text(),
    ).toContain(`Added the supplier ${name}.`);
    const [rows] = await testDatabase().query(
      "SELECT currency, lead_time_days, email FROM suppliers WHERE name = ?",
      [name],
    );
    expect(rows).toEqual([
      { currency: "USD", lead_time_days: 14, email: "orders@wire.example" },
    ]);

    const page = await get("/suppliers", cookies.manager);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(name);
    expect(html).toContain("14\u00a0days");
  });

  it("answers bad input with a message per field and writes nothing", async () => {
    const name = `Bad lead ${uniqueCode("S")}`;
    const response = await postForm(
      "/suppliers",
      { name, email: "not-an-address", currency: "euro", leadTimeDays: "-2" },
      cookies.buyer,
    );
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain("Give a valid e-mail address.");
    expect(html).toContain("Give the currency as a 3-letter ISO 4217 code");
    expect(html).toContain("The lead time cannot be negative.");
    expect(await supplierCount(name)).toBe(0);
  });

  it("answers a taken name with 409 and a message beside the name", async () => {
    const name = `Twice ${uniqueCode("S")}`;
    const first = await postForm(
      "/suppliers",
      { name, currency: "EUR" },
      cookies.admin,
    );
    expect(first.status).toBe(302);
    const second = await postForm(
      "/suppliers",
      { name, currency: "EUR" },
      cookies.buyer,
    );
    expect(second.status).toBe(409);
    expect(await second.text()).toContain("There is already a supplier named");
    expect(await supplierCount(name)).toBe(1);
  });

  it("refuses a storekeeper with 403 and shows them no form", async () => {
    const name = `Not mine ${uniqueCode("S")}`;
    const response = await postForm(
      "/suppliers",
      { name, currency: "EUR" },
      cookies.storekeeper,
    );
    expect(response.status).toBe(403);
    expect(await supplierCount(name)).toBe(0);
    const page = await (await get("/suppliers", cookies.storekeeper)).text();
    expect(page).not.toContain("Add supplier");
    expect(page).not.toContain("Import a price list");
    expect(page).toContain("Past imports");
  });
});

describe("/prices", () => {
  it("a buyer sets the copper base and a rate; the page shows them with units", async () => {
    const copper = await postForm(
      "/prices",
      {
        intent: "metal-base",
        conductor: "copper",
        currency: "EUR",
        pricePerKg: "8.7654",
        validFrom: "2026-01-05",
      },
      cookies.buyer,
    );
    expect(copper.status).toBe(302);
    expect(copper.headers.get("location")).toBe("/prices");
    expect(
      await (await followRedirect(copper, cookies.buyer)).text(),
    ).toContain("Metal base saved.");
    const currency = await testCurrency();
    const rate = await postForm(
      "/prices",
      {
        intent: "currency-rate",
        currency,
        rate: "0.5",
        validFrom: "2026-01-05",
      },
      cookies.buyer,
    );
    expect(rate.status).toBe(302);
    expect(await rateCount(currency)).toBe(1);

    const html = await (await get("/prices", cookies.manager)).text();
    expect(html).toContain("8.7654\u00a0EUR/kg");
    expect(html).toContain(`1 ${currency} = 0.500000\u00a0EUR`);
    expect(html).not.toContain("Save metal base");
  });

  it("answers a bad metal base with field messages and writes nothing", async () => {
    const count = () =>
      countRows(
        "SELECT COUNT(*) AS n FROM metal_base_prices WHERE valid_from = ?",
        ["2025-12-31"],
      );
    const response = await postForm(
      "/prices",
      {
        intent: "metal-base",
        conductor: "silver",
        currency: "EUR",
        pricePerKg: "-1",
        validFrom: "2025-12-31",
      },
      cookies.buyer,
    );
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain("The conductor must be copper or aluminium.");
    expect(html).toContain("The price per kg must be more than 0.");
    expect(await count()).toBe(0);
  });

  it("refuses a rate for the company currency beside the currency field", async () => {
    const before = await rateCount("EUR");
    const response = await postForm(
      "/prices",
      {
        intent: "currency-rate",
        currency: "EUR",
        rate: "1",
        validFrom: "2026-01-05",
      },
      cookies.buyer,
    );
    expect(response.status).toBe(400);
    expect(await response.text()).toContain("EUR is the company currency");
    expect(await rateCount("EUR")).toBe(before);
  });

  it("refuses a storekeeper with 403, writing nothing", async () => {
    const currency = await testCurrency();
    const response = await postForm(
      "/prices",
      { intent: "currency-rate", currency, rate: "2", validFrom: "2026-01-05" },
      cookies.storekeeper,
    );
    expect(response.status).toBe(403);
    expect(await rateCount(currency)).toBe(0);
  });
});

describe("/suppliers/imports", () => {
  it("lists a committed import and opens its mapping and price lines", async () => {
    // The import is written straight to the tables, so this page is tested apart from the uploader.
    const database = testDatabase();
    const supplier = `Import mill ${uniqueCode("S")}`;
    const fileName = `${uniqueCode("F")}.csv`;
    const [created] = await database.query(
      "INSERT INTO suppliers (name, currency, created_at) VALUES (?, 'EUR', UTC_TIMESTAMP(3))",
      [supplier],
    );
    const supplierId = (created as { insertId: number }).insertId;
    const [[wire], [magnet], [buyer]] = (await Promise.all([
      database.query("SELECT id, sku FROM items WHERE unit = 'kg' LIMIT 1"),
      database.query("SELECT id, sku FROM items WHERE unit = 'pcs' LIMIT 1"),
      newPerson("buyer").then((person) => [[{ id: person.id }]]),
    ]).then((results) => results.map(([rows]) => rows))) as [
      { id: number; sku: string }[],
      { id: number; sku: string }[],
      { id: string }[],
    ];
    const [imported] = await database.query(
      "INSERT INTO price_imports (supplier_id, file_name, file_sha256, row_count, created_items, mapping, user_id, created_at) VALUES (?, ?, SHA2(?, 256), 2, 1, ?, ?, UTC_TIMESTAMP(3))",
      [
        supplierId,
        fileName,
        fileName,
        JSON.stringify({ supplierSku: "Art. no", adderPerKg: "Adder/kg" }),
        buyer!.id,
      ],
    );
    const importId = (imported as { insertId: number }).insertId;
    await database.query(
      `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, import_id, line) VALUES
       (?, ?, 'W-050', 'EUR', NULL, 3.5, 'copper', 25, '2026-11-01', ?, 2),
       (?, ?, 'M-DISC', 'EUR', 2.35, NULL, NULL, 100, '2026-11-01', ?, 3)`,
      [supplierId, wire!.id, importId, supplierId, magnet!.id, importId],
    );

    const list = await get("/suppliers/imports", cookies.storekeeper);
    expect(list.status).toBe(200);
    const listHtml = await list.text();
    expect(listHtml).toContain(`href="/suppliers/imports?import=${importId}"`);
    expect(listHtml).toContain(fileName);

    const suppliersPage = await (
      await get("/suppliers", cookies.manager)
    ).text();
    // The supplier's row in the table (the name is also in the loader's data, which the
    // page may stream before the table).
    const suppliersTable = suppliersPage.slice(
      suppliersPage.indexOf('<table class="data-table"'),
    );
    const supplierRow = suppliersTable.slice(suppliersTable.indexOf(supplier));
    expect(supplierRow.slice(0, supplierRow.indexOf("</tr>"))).toMatch(
      />2<\/td>/,
    );

    const opened = await get(
      `/suppliers/imports?import=${importId}`,
      cookies.manager,
    );
    expect(opened.status).toBe(200);
    const html = await opened.text();
    expect(html).toContain(supplier);
    expect(html).toContain("Adder/kg");
    expect(html).toContain("Adder per kg");
    expect(html).toContain("W-050");
    expect(html).toContain(wire!.sku);
    expect(html).toContain("copper base + 3.5000\u00a0EUR/kg");
    expect(html).toContain("2.3500\u00a0EUR/piece");
    expect(html).toContain("100\u00a0pieces");
  });

  it("answers an unknown import with 404", async () => {
    const response = await get(
      "/suppliers/imports?import=999999999",
      cookies.buyer,
    );
    expect(response.status).toBe(404);
    const bad = await get("/suppliers/imports?import=abc", cookies.buyer);
    expect(bad.status).toBe(404);
  });
});
