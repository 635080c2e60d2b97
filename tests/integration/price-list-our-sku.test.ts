/**
 * A price list with an "Our SKU" column prices the catalogue items it names
 * (instead of making new items or matching by size or grade) and ties the
 * supplier's SKU to them; a wrong SKU or kind is an invalid line, nothing written.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let supplier = "";
let bearing = "";
let magnet = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  supplier = `Our-SKU test supplier ${uniqueCode("S")}`;
  expect(
    (
      await sendJson(
        "POST",
        "/api/v1/suppliers",
        { name: supplier, currency: "EUR" },
        buyer,
      )
    ).status,
  ).toBe(201);
  bearing = uniqueCode("BRG");
  magnet = uniqueCode("MAG");
  for (const body of [
    { kind: "part", sku: bearing, name: "Bearing 6001-2RS", unit: "pcs" },
    {
      kind: "magnet",
      sku: magnet,
      name: "N42SH block 15 × 8 × 3",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 15, widthMm: 8, heightMm: 3 },
      coating: "NiCuNi",
      magnetisation: "through 3 mm",
    },
  ]) {
    const response = await sendJson("POST", "/api/v1/items", body, buyer);
    expect(response.status, await response.clone().text()).toBe(201);
  }
});
afterAll(closeTestDatabase);

async function upload(rows: string[]) {
  const form = new FormData();
  form.set(
    "file",
    new Blob([
      ["Article,Our SKU,Kind,Grade,Price,Valid from", ...rows].join("\n"),
    ]),
    `our-sku-${uniqueCode("F")}.csv`,
  );
  form.set("supplier", supplier);
  form.set(
    "mapping",
    JSON.stringify({
      supplierSku: "Article",
      itemSku: "Our SKU",
      kind: "Kind",
      grade: "Grade",
      price: "Price",
      validFrom: "Valid from",
    }),
  );
  return fetch(`${baseUrl()}/api/v1/price-lists`, {
    method: "POST",
    headers: { Cookie: buyer, Origin: baseUrl() },
    body: form,
  });
}

async function priceLineCount(): Promise<number> {
  const [[row]] = (await testDatabase().query(
    "SELECT COUNT(*) AS count FROM price_lines pl JOIN suppliers s ON s.id = pl.supplier_id WHERE s.name = ?",
    [supplier],
  )) as unknown as [[{ count: number }]];
  return Number(row.count);
}

describe("the Our SKU column", () => {
  it("prices the named items, even a magnet whose grade other items share", async () => {
    const response = await upload([
      `X-6001,${bearing},part,,0.85,2026-11-01`,
      `X-MAG,${magnet},magnet,N42SH,0.42,2026-11-01`,
    ]);
    expect(response.status, await response.clone().text()).toBe(201);
    expect(((await response.json()) as { newItems: number }).newItems).toBe(0);
    const prices = (await (
      await get(
        `/api/v1/items/${bearing}/prices?quantity=10&date=2026-12-01`,
        buyer,
      )
    ).json()) as {
      prices: { supplier: string; supplierSku: string; unitPrice: number }[];
    };
    expect(prices.prices).toContainEqual(
      expect.objectContaining({
        supplier,
        supplierSku: "X-6001",
        unitPrice: 0.85,
      }),
    );
    const [[tie]] = (await testDatabase().query(
      "SELECT i.sku FROM supplier_items si JOIN items i ON i.id = si.item_id JOIN suppliers s ON s.id = si.supplier_id WHERE s.name = ? AND si.supplier_sku = 'X-MAG'",
      [supplier],
    )) as unknown as [[{ sku: string }]];
    expect(tie.sku).toBe(magnet);
  });

  it("refuses an unknown SKU and a kind that does not match, writing nothing", async () => {
    const before = await priceLineCount();
    const response = await upload([
      `X-1,NOPE-${uniqueCode("N")},part,,1.00,2026-11-02`,
      `X-2,${bearing},magnet,N42SH,1.00,2026-11-02`,
      `X-3,${bearing},part,,1.10,2026-11-02`,
    ]);
    expect(response.status).toBe(422);
    const body = (await response.json()) as {
      invalid: { line: number; message: string }[];
    };
    expect(body.invalid.map((error) => error.line)).toEqual([2, 3]);
    expect(body.invalid[0]!.message).toContain(
      "is not an active item in the catalogue",
    );
    expect(body.invalid[1]!.message).toContain(
      "is a part item, but the row is magnet",
    );
    expect(await priceLineCount()).toBe(before);
  });
});
