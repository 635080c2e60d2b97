/**
 * What the import API answers before and at a commit: one column for both
 * SKUs, line errors that name the column and the value, the catalogue item
 * each previewed row matched (or the new item it makes), currency signs, and
 * warnings for a currency without a rate or a wire list without a metal base.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let supplier = "";
let bearing = "";
let shaft = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  supplier = `Preview test supplier ${uniqueCode("S")}`;
  await createSupplier(buyer, supplier, "EUR");
  bearing = uniqueCode("BRG");
  shaft = uniqueCode("SHF");
  for (const [sku, name] of [
    [bearing, "Bearing 6001-2RS"],
    [shaft, "Rotor shaft 12 mm"],
  ]) {
    const response = await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name, unit: "pcs" },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(201);
  }
});
afterAll(closeTestDatabase);

async function upload(
  lines: string[],
  mapping: Record<string, string>,
  options: { dryRun?: boolean; supplier?: string } = {},
) {
  const form = new FormData();
  form.set(
    "file",
    new Blob([lines.join("\n")]),
    `preview-${uniqueCode("F")}.csv`,
  );
  form.set("supplier", options.supplier ?? supplier);
  form.set("mapping", JSON.stringify(mapping));
  return fetch(
    `${baseUrl()}/api/v1/price-lists${options.dryRun ? "?dryRun=1" : ""}`,
    {
      method: "POST",
      headers: { Cookie: buyer, Origin: baseUrl() },
      body: form,
    },
  );
}

describe("one column for the supplier's SKU and ours", () => {
  const mapping = {
    supplierSku: "Item code",
    itemSku: "Item code",
    description: "Description",
    price: "Net price",
  };

  it("takes a file whose item code holds our SKUs, and prices those items", async () => {
    const lines = [
      "Item code,Description,Net price",
      `${bearing},Deep groove bearing,2.40`,
      `${shaft},Shaft,7.15`,
    ];
    const preview = await upload(lines, mapping, { dryRun: true });
    expect(preview.status, await preview.clone().text()).toBe(200);
    expect((await preview.json()).valid).toBe(2);

    const committed = await upload(lines, mapping);
    expect(committed.status, await committed.clone().text()).toBe(201);
    expect(await committed.json()).toMatchObject({ rows: 2, newItems: 0 });
    const [rows] = await testDatabase().query(
      "SELECT pl.supplier_sku, i.sku FROM price_lines pl JOIN items i ON i.id = pl.item_id JOIN suppliers s ON s.id = pl.supplier_id WHERE s.name = ? ORDER BY pl.line",
      [supplier],
    );
    expect(rows).toEqual([
      { supplier_sku: bearing, sku: bearing },
      { supplier_sku: shaft, sku: shaft },
    ]);
  });

  it("still refuses one column for two other fields", async () => {
    const answer = await upload(
      ["Item code,Net price", `${bearing},2.40`],
      { supplierSku: "Item code", price: "Net price", adderPerKg: "Net price" },
      { dryRun: true },
    );
    expect(answer.status).toBe(400);
    expect((await answer.json()).error.message).toContain(
      'The column "Net price" is chosen for Price per unit and Adder per kg; a column can feed one field only',
    );
  });
});

describe("line errors", () => {
  it("name the column and the value, the number first", async () => {
    const code = uniqueCode("P");
    const answer = await upload(
      [
        "Art. no,Our SKU,Adder EUR/kg,Currency",
        `${code}-1,,2.4O,EUR`,
        `${code}-2,NO-SUCH-${code},1.00,EUR`,
      ],
      {
        supplierSku: "Art. no",
        itemSku: "Our SKU",
        adderPerKg: "Adder EUR/kg",
        currency: "Currency",
      },
    );
    expect(answer.status).toBe(422);
    const body = await answer.json();
    expect(
      body.invalid.map((error: { message: string }) => error.message),
    ).toEqual([
      'Line 2: the adder per kg "2.4O" (column "Adder EUR/kg") is not a number; an adder per kg (column "Adder EUR/kg") is for wire priced on the metal base, and this row is a part.',
      `Line 3: an adder per kg (column "Adder EUR/kg") is for wire priced on the metal base, and this row is a part.`,
    ]);
  });

  it("name the column of an unknown Our SKU", async () => {
    const code = uniqueCode("Q");
    const answer = await upload(
      ["Item code,Net price", `${code},2.40`],
      { supplierSku: "Item code", itemSku: "Item code", price: "Net price" },
      { dryRun: true },
    );
    expect(answer.status).toBe(200);
    expect((await answer.json()).invalid).toEqual([
      {
        line: 2,
        message: `Line 2: our SKU "${code}" (column "Item code") is not an active item in the catalogue.`,
      },
    ]);
  });
});

describe("the preview's catalogue items", () => {
  it("says which catalogue SKU each row matched, and which rows make a new item of which kind", async () => {
    const mapSupplier = `Preview match supplier ${uniqueCode("S")}`;
    const supplierId = await createSupplier(buyer, mapSupplier, "EUR");
    const code = uniqueCode("M");
    const mapping = {
      supplierSku: "Art. no",
      itemSku: "Our SKU",
      description: "Description",
      price: "Price",
    };
    const first = [
      "Art. no,Our SKU,Description,Price",
      `${code}-1,${bearing},Bearing,2.40`,
      `${code}-2,,Terminal block,0.85`,
    ];
    const preview = await upload(first, mapping, {
      dryRun: true,
      supplier: mapSupplier,
    });
    expect(preview.status, await preview.clone().text()).toBe(200);
    const body = await preview.json();
    // Fields added beside the ones the preview always had.
    expect(body.rows[0]).toMatchObject({
      line: 2,
      supplierSku: `${code}-1`,
      match: {
        sku: bearing,
        name: "Bearing 6001-2RS",
        kind: "part",
        newItem: false,
        by: "our-sku",
      },
    });
    expect(body.rows[1].match).toEqual({
      sku: `S${supplierId}-${code}-2`,
      name: "Terminal block",
      kind: "part",
      newItem: true,
      by: "new-item",
    });
    expect(body).toMatchObject({ matched: 1, newItems: 1 });

    expect(
      (await upload(first, mapping, { supplier: mapSupplier })).status,
    ).toBe(201);
    const second = await upload(
      ["Art. no,Our SKU,Description,Price", `${code}-2,,Terminal block,0.80`],
      mapping,
      { dryRun: true, supplier: mapSupplier },
    );
    expect((await second.json()).rows[0].match).toEqual({
      sku: `S${supplierId}-${code}-2`,
      name: "Terminal block",
      kind: "part",
      newItem: false,
      by: "supplier-sku",
    });
  });
});

describe("currency signs", () => {
  const mapping = {
    supplierSku: "Art. no",
    price: "Price",
    currency: "Currency",
  };

  it("reads € and £ as EUR and GBP", async () => {
    const code = uniqueCode("C");
    const answer = await upload(
      ["Art. no,Price,Currency", `${code}-1,1.20,€`, `${code}-2,1.10,£`],
      mapping,
      { dryRun: true },
    );
    expect(answer.status).toBe(200);
    const body = await answer.json();
    expect(body.invalid).toEqual([]);
    expect(body.rows.map((row: { currency: string }) => row.currency)).toEqual([
      "EUR",
      "GBP",
    ]);
  });

  it("asks for a code instead of $", async () => {
    const answer = await upload(
      ["Art. no,Price,Currency", `${uniqueCode("C")},1.20,$`],
      mapping,
      { dryRun: true },
    );
    expect((await answer.json()).invalid[0].message).toContain(
      'the currency "$" (column "Currency") stands for several currencies (US, Canadian, Australian and other dollars); write a code such as USD, CAD or AUD',
    );
  });
});

describe("warnings for a missing rate or metal base", () => {
  // South African rand: no other test gives it a rate or a base.
  const currency = "ZAR";
  let randSupplier = "";
  beforeAll(async () => {
    randSupplier = `Rand wire mill ${uniqueCode("S")}`;
    await createSupplier(buyer, randSupplier, currency);
  });

  const wireMapping = {
    supplierSku: "Art. no",
    itemSku: "Our SKU",
    standard: "Standard",
    size: "Size",
    adderPerKg: "Adder per kg",
  };

  it("warns at the dry run and at the commit, without refusing the file", async () => {
    const lines = [
      "Art. no,Our SKU,Standard,Size,Adder per kg",
      `${uniqueCode("W")},,AWG,38,4.10`,
    ];
    const preview = await upload(lines, wireMapping, {
      dryRun: true,
      supplier: randSupplier,
    });
    expect(preview.status, await preview.clone().text()).toBe(200);
    const body = await preview.json();
    expect(body.valid).toBe(1);
    expect(
      body.warnings.map((w: { kind: string; currency: string }) => [
        w.kind,
        w.currency,
      ]),
    ).toEqual([
      ["no-exchange-rate", currency],
      ["no-metal-base", currency],
    ]);
    expect(body.warnings[0].message).toContain(
      `No ${currency} rate into EUR (the company currency)`,
    );
    expect(body.warnings[0].message).toContain("cannot be compared");
    expect(body.warnings[1].message).toContain(`No copper base in ${currency}`);
    expect(body.warnings[1].message).toContain("cannot be computed");

    const committed = await upload(lines, wireMapping, {
      supplier: randSupplier,
    });
    expect(committed.status).toBe(201);
    expect(
      (await committed.json()).warnings.map((w: { kind: string }) => w.kind),
    ).toEqual(["no-exchange-rate", "no-metal-base"]);
  });

  it("says the base will be derived from the company currency's base at the rate once a rate exists", async () => {
    const aluminium = uniqueCode("AL");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "wire",
        sku: aluminium,
        name: "Enamelled aluminium 1.00 mm grade 2",
        conductor: "aluminium",
        standard: "IEC",
        size: "1",
        insulation: "grade2",
        thermalClass: 155,
        enamel: "polyesterimide",
      },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    // Invented values; only that a rate and an aluminium base in EUR exist matters.
    for (const [path, body] of [
      [
        "/api/v1/currency-rates",
        { currency, rate: 0.05, validFrom: "2026-01-01" },
      ],
      [
        "/api/v1/metal-base",
        {
          conductor: "aluminium",
          currency: "EUR",
          pricePerKg: 2.6,
          validFrom: "2026-01-01",
        },
      ],
    ] as const) {
      const response = await sendJson("PUT", path, body, buyer);
      expect(response.status, await response.clone().text()).toBe(200);
    }
    const answer = await upload(
      [
        "Art. no,Our SKU,Standard,Size,Adder per kg",
        `${uniqueCode("W")},${aluminium},IEC,1,1.90`,
      ],
      wireMapping,
      { dryRun: true, supplier: randSupplier },
    );
    const body = await answer.json();
    expect(body.warnings).toEqual([
      {
        kind: "metal-base-derived",
        currency,
        conductor: "aluminium",
        message: expect.stringContaining(
          `will be derived from the aluminium base in EUR at the ${currency} rate`,
        ),
      },
    ]);
  });
});
