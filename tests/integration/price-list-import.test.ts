import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let supplier = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  supplier = `Test wire mill ${uniqueCode("S")}`;
  const created = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name: supplier, currency: "EUR", leadTimeDays: 21 },
    buyer,
  );
  expect(created.status).toBe(201);
});
afterAll(closeTestDatabase);

const mapping = {
  supplierSku: "Art. no",
  description: "Description",
  standard: "Standard",
  size: "Size",
  insulation: "Insulation",
  grade: "Grade",
  price: "Price",
  adderPerKg: "Adder per kg",
  currency: "Currency",
  minQuantity: "Min qty",
  validFrom: "Valid from",
};

function priceList(rows: string[]): string {
  return [
    "Art. no,Description,Standard,Size,Insulation,Grade,Price,Adder per kg,Currency,Min qty,Valid from",
    ...rows,
  ].join("\n");
}

async function upload(
  csv: string | Uint8Array,
  options: {
    dryRun?: boolean;
    cookie?: string;
    fields?: Record<string, string>;
  } = {},
) {
  const form = new FormData();
  form.set("file", new Blob([csv as BlobPart]), "prices.csv");
  form.set("supplier", supplier);
  form.set("mapping", JSON.stringify(mapping));
  for (const [key, value] of Object.entries(options.fields ?? {}))
    form.set(key, value);
  return fetch(
    `${baseUrl()}/api/v1/price-lists${options.dryRun ? "?dryRun=1" : ""}`,
    {
      method: "POST",
      headers: { Cookie: options.cookie ?? buyer, Origin: baseUrl() },
      body: form,
    },
  );
}

async function tableCounts() {
  const [rows] = await testDatabase().query(
    "SELECT (SELECT COUNT(*) FROM price_lines) AS line_count, (SELECT COUNT(*) FROM price_imports) AS import_count, (SELECT COUNT(*) FROM items) AS item_count, (SELECT COUNT(*) FROM supplier_items) AS sku_count",
  );
  return (rows as Record<string, number>[])[0];
}

const good = () => {
  const sku = uniqueCode("A");
  return priceList([
    `${sku}-1,Enamelled copper 0.50 mm grade 2,IEC,0.5,grade 2,,,3.50,EUR,25,2026-11-01`,
    `${sku}-1,Enamelled copper 0.50 mm grade 2,IEC,0.5,grade 2,,,3.20,EUR,100,2026-11-01`,
    `${sku}-2,Copper AWG 20 heavy,AWG,20,heavy,,15.80,,EUR,1,2026-11-01`,
    `${sku}-3,Sm2Co17 disc,,,,Sm2Co17,2.35,,EUR,100,2026-11-01`,
  ]);
};

describe("price-list import", () => {
  it("previews without writing, then commits all rows, and a second import of the file changes nothing", async () => {
    const csv = good();
    const before = await tableCounts();
    const preview = await upload(csv, { dryRun: true });
    expect(preview.status).toBe(200);
    const body = await preview.json();
    expect(body.valid).toBe(4);
    expect(body.invalid).toEqual([]);
    expect(body.rows).toHaveLength(4);
    expect(await tableCounts()).toEqual(before);

    const committed = await upload(csv);
    expect(committed.status).toBe(201);
    expect((await committed.json()).rows).toBe(4);
    const after = await tableCounts();
    expect(after!.line_count! - before!.line_count!).toBe(4);
    expect(after!.import_count! - before!.import_count!).toBe(1);

    const again = await upload(csv);
    expect(again.status).toBe(200);
    expect((await again.json()).alreadyImported).toBe(true);
    expect(await tableCounts()).toEqual(after);
  });

  it.each([
    [
      "an unknown currency",
      (sku: string) => `${sku},x,,,,,1.00,,XYZ,1,2026-11-01`,
    ],
    ["a negative price", (sku: string) => `${sku},x,,,,,-3,,EUR,1,2026-11-01`],
    [
      "a non-numeric minimum quantity",
      (sku: string) => `${sku},x,,,,,1.00,,EUR,ten,2026-11-01`,
    ],
    [
      "an unknown AWG size",
      (sku: string) => `${sku},x,AWG,99,heavy,,1.00,,EUR,1,2026-11-01`,
    ],
    [
      "an unknown grade",
      (sku: string) => `${sku},x,,,,N99,1.00,,EUR,1,2026-11-01`,
    ],
    ["a row with too few columns", (sku: string) => `${sku},x,,`],
  ])(
    "refuses a file with %s with 422, its line number, and writes nothing",
    async (_label, badRow) => {
      const sku = uniqueCode("B");
      const before = await tableCounts();
      const answer = await upload(
        priceList([
          `${sku}-ok,fine,,,,,1.00,,EUR,1,2026-11-01`,
          badRow(`${sku}-bad`),
        ]),
      );
      expect(answer.status).toBe(422);
      const body = await answer.json();
      expect(body.invalid).toHaveLength(1);
      expect(body.invalid[0].line).toBe(3);
      expect(body.invalid[0].message.length).toBeGreaterThan(10);
      expect(await tableCounts()).toEqual(before);
    },
  );

  it("refuses duplicate rows with different prices", async () => {
    const sku = uniqueCode("D");
    const answer = await upload(
      priceList([
        `${sku},x,,,,,1.00,,EUR,1,2026-11-01`,
        `${sku},x,,,,,1.10,,EUR,1,2026-11-01`,
      ]),
    );
    expect(answer.status).toBe(422);
    expect((await answer.json()).invalid[0].line).toBe(3);
  });

  it.each([
    ["an empty file", ""],
    ["a header only", priceList([])],
    [
      "a binary file renamed .csv",
      new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0, 0, 0, 0, 0x14, 0, 0, 0]),
    ],
    [
      "unclosed quotes",
      priceList([`"X1,"unclosed,,,,,1.00,,EUR,1,2026-11-01`]),
    ],
  ])(
    "refuses %s with a clear message and writes nothing",
    async (_label, csv) => {
      const before = await tableCounts();
      const answer = await upload(csv);
      expect([400, 422]).toContain(answer.status);
      const body = await answer.json();
      expect(JSON.stringify(body).length).toBeGreaterThan(30);
      expect(await tableCounts()).toEqual(before);
    },
  );

  it("refuses a mapping without the price column, and a 25 MB file", async () => {
    const withoutPrice = { ...mapping } as Record<string, string>;
    delete withoutPrice.price;
    delete withoutPrice.adderPerKg;
    const noPrice = await upload(good(), {
      fields: { mapping: JSON.stringify(withoutPrice) },
    });
    expect(noPrice.status).toBe(400);
    expect((await noPrice.json()).error.message).toMatch(/price/);
    const huge = await upload(new Uint8Array(25 * 1024 * 1024).fill(0x41));
    expect(huge.status).toBe(413);
    expect((await huge.json()).error.message).toBe(
      "The file is larger than 20 MB.",
    );
  });

  it("lists the first 1,000 bad lines of a file of 30,000, says how many there were, and writes nothing", async () => {
    const sku = uniqueCode("E");
    // One good line, then lines of one column (a broken row each) and bad prices, mixed.
    const lines = [`${sku}-ok,fine,,,,,1.00,,EUR,1,2026-11-01`];
    for (let index = 0; index < 30_000; index += 1)
      lines.push(
        index % 3 === 0
          ? `${sku}-${index},x,,,,,-3,,EUR,1,2026-11-01`
          : `${sku}-${index}`,
      );
    const csv = priceList(lines);
    const before = await tableCounts();

    const preview = await upload(csv, { dryRun: true });
    expect(preview.status).toBe(200);
    const checked = await preview.json();
    expect(checked.valid).toBe(1);
    expect(checked.invalid).toHaveLength(1_000);
    expect(checked.invalid[0].line).toBe(3);
    expect(checked.invalid.at(-1).line).toBe(1_002);
    expect(checked.invalidCount).toBe(30_000);
    expect(checked.invalidTruncated).toBe(true);

    const committed = await upload(csv);
    expect(committed.status).toBe(422);
    const refused = await committed.json();
    expect(refused.error.message).toBe(
      "30,000 rows are invalid; nothing was imported. The first 1,000 are listed.",
    );
    expect(refused.invalid).toHaveLength(1_000);
    expect(refused.invalidCount).toBe(30_000);
    expect(refused.invalidTruncated).toBe(true);
    expect(await tableCounts()).toEqual(before);

    // A file with a few bad lines lists them all and says the list is whole.
    const few = await upload(
      priceList([`${sku}-a,x,,,,,-3,,EUR,1,2026-11-01`, `${sku}-b`]),
      { dryRun: true },
    );
    expect(await few.json()).toMatchObject({
      invalidCount: 2,
      invalidTruncated: false,
    });
  });

  it("lets only buyers and admins import", async () => {
    for (const role of ["storekeeper", "builder", "manager"] as const) {
      const cookie = await signInAs(role);
      expect((await upload(good(), { cookie })).status).toBe(403);
    }
  });
});

describe("metal base", () => {
  it("is kept by buyers and read by everyone", async () => {
    const put = await sendJson(
      "PUT",
      "/api/v1/metal-base",
      {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: 9,
        validFrom: "2026-11-01",
      },
      buyer,
    );
    expect(put.status).toBe(200);
    const storekeeper = await signInAs("storekeeper");
    expect(
      (
        await sendJson(
          "PUT",
          "/api/v1/metal-base",
          {
            conductor: "copper",
            currency: "EUR",
            pricePerKg: 1,
            validFrom: "2026-11-02",
          },
          storekeeper,
        )
      ).status,
    ).toBe(403);
    const bad = await sendJson(
      "PUT",
      "/api/v1/metal-base",
      {
        conductor: "gold",
        currency: "EURO",
        pricePerKg: -1,
        validFrom: "soon",
      },
      buyer,
    );
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).error.fields).sort()).toEqual([
      "conductor",
      "currency",
      "pricePerKg",
      "validFrom",
    ]);
    const list = (await (
      await fetch(`${baseUrl()}/api/v1/metal-base`, {
        headers: { Cookie: storekeeper },
      })
    ).json()) as { conductor: string; pricePerKg: number; validFrom: string }[];
    expect(
      list.find(
        (row) => row.conductor === "copper" && row.validFrom === "2026-11-01",
      )?.pricePerKg,
    ).toBe(9);
  });
});

describe("best price per item", () => {
  it("prices adder lines on the metal base, converts currencies, picks the break, and follows a new base", async () => {
    const sku = uniqueCode("BP");
    const other = `Second mill ${uniqueCode("S")}`;
    expect(
      (
        await sendJson(
          "POST",
          "/api/v1/suppliers",
          { name: other, currency: "USD" },
          buyer,
        )
      ).status,
    ).toBe(201);
    const csv = priceList([
      `${sku}-1,Enamelled copper 0.71 mm grade 1,IEC,0.71,grade 1,,,3.50,EUR,25,2026-11-01`,
      `${sku}-1,Enamelled copper 0.71 mm grade 1,IEC,0.71,grade 1,,,3.20,EUR,100,2026-11-01`,
    ]);
    expect((await upload(csv)).status).toBe(201);
    const [rows] = await testDatabase().query(
      "SELECT i.sku FROM supplier_items si JOIN items i ON i.id = si.item_id WHERE si.supplier_sku = ?",
      [`${sku}-1`],
    );
    const itemSku = (rows as { sku: string }[])[0]!.sku;

    const usd = new FormData();
    usd.set(
      "file",
      new Blob([
        priceList([
          `${sku}-9,Same wire from the USA,IEC,0.71,grade 1,,14.00,,USD,1,2026-11-01`,
        ]),
      ]),
      "usd.csv",
    );
    usd.set("supplier", other);
    usd.set("mapping", JSON.stringify(mapping));
    expect(
      (
        await fetch(`${baseUrl()}/api/v1/price-lists`, {
          method: "POST",
          headers: { Cookie: buyer, Origin: baseUrl() },
          body: usd,
        })
      ).status,
    ).toBe(201);

    // The base and rate are dated years ahead (priced on a day after them), clear of the
    // demo data's bases and rates over the last months and of the other tests' days.
    await sendJson(
      "PUT",
      "/api/v1/metal-base",
      {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: 9,
        validFrom: "2032-11-01",
      },
      buyer,
    );
    await sendJson(
      "PUT",
      "/api/v1/currency-rates",
      { currency: "USD", rate: 0.92, validFrom: "2032-11-01" },
      buyer,
    );
    const pricesAt = async (quantity: number) =>
      (await (
        await fetch(
          `${baseUrl()}/api/v1/items/${encodeURIComponent(itemSku)}/prices?quantity=${quantity}&date=2032-12-01`,
          { headers: { Cookie: buyer } },
        )
      ).json()) as {
        prices: {
          supplier: string;
          unitPrice: number;
          currency: string;
          quotedUnitPrice: number;
        }[];
        cannotPrice: { supplier: string; reasons: string[] }[];
      };

    // Worked example in the price-list issue: adder 3.50/kg + copper base 9.00/kg = 12.50/kg.
    const at30 = await pricesAt(30);
    expect(
      at30.prices.find((price) => price.supplier === supplier)?.unitPrice,
    ).toBe(12.5);
    // 14.00 USD × 0.92 EUR/USD = 12.88 EUR (worked by hand): dearer than 12.50, so second.
    expect(at30.prices.map((price) => price.unitPrice)).toEqual([12.5, 12.88]);
    // From 100 kg the 3.20 break applies: 3.20 + 9.00 = 12.20 (worked by hand).
    expect((await pricesAt(100)).prices[0]!.unitPrice).toBe(12.2);
    // Below the smallest break (25 kg) the EUR supplier cannot price 10 kg, and says why.
    expect(
      (await pricesAt(10)).cannotPrice.map((offer) => offer.supplier),
    ).toContain(supplier);

    // A new copper base moves every adder price: 3.50 + 10.00 = 13.50.
    await sendJson(
      "PUT",
      "/api/v1/metal-base",
      {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: 10,
        validFrom: "2032-11-15",
      },
      buyer,
    );
    expect(
      (await pricesAt(30)).prices.find((price) => price.supplier === supplier)
        ?.unitPrice,
    ).toBe(13.5);
    await sendJson(
      "PUT",
      "/api/v1/metal-base",
      {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: 9,
        validFrom: "2032-11-15",
      },
      buyer,
    );
  });
});

describe("item page prices", () => {
  it("shows the suppliers' prices on the item page, cheapest first", async () => {
    const sku = uniqueCode("IP");
    expect(
      (
        await upload(
          priceList([
            `${sku},Deep-groove bearing 6203-2RS,,,,,2.15,,EUR,1,2026-11-01`,
          ]),
        )
      ).status,
    ).toBe(201);
    const [rows] = await testDatabase().query(
      "SELECT i.sku FROM supplier_items si JOIN items i ON i.id = si.item_id WHERE si.supplier_sku = ?",
      [sku],
    );
    const itemSku = (rows as { sku: string }[])[0]!.sku;
    const page = await (
      await fetch(`${baseUrl()}/stock/items/${encodeURIComponent(itemSku)}`, {
        headers: { Cookie: buyer },
      })
    ).text();
    expect(page).toContain("Best prices for");
    expect(page).toContain(supplier);
    expect(page).toMatch(/2\.1500\s*EUR/);
  });
});
