/**
 * The CSV exports of issue 21: an import's price lines and each table of the cost
 * insight page. Machine-neutral files (decimal point, no grouping, ISO days), the same
 * figures as the pages and the API, and the same role check as their pages (anyone
 * signed in; no one else).
 */
import Papa from "papaparse";
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { priceImports } from "~/db/schema";
import { get, signInAs } from "../support/app-client";
import {
  createMagnetItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { createPricedReleasedDesign } from "../support/insight-fixtures";
import {
  createSupplier,
  importPriceList,
  mapSupplierSku,
} from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDb,
  uniqueCode,
} from "../support/test-database";

/** The body as sent: Response.text() would drop the byte-order mark. */
async function bodyOf(response: Response): Promise<string> {
  return new TextDecoder("utf-8", { ignoreBOM: true }).decode(
    await response.arrayBuffer(),
  );
}

function readCsv(text: string) {
  expect(text.startsWith("\uFEFF"), "a byte-order mark first").toBe(true);
  const parsed = Papa.parse<string[]>(text.slice(1), { skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  const [header, ...rows] = parsed.data;
  return {
    header: header!,
    rows: rows.map((row) =>
      Object.fromEntries(header!.map((field, index) => [field, row[index]!])),
    ),
  };
}

let buyer = "";
let manager = "";
let importId = 0;
let wireSku = "";
let magnetSku = "";
let design: Awaited<ReturnType<typeof createPricedReleasedDesign>>;

beforeAll(async () => {
  buyer = await signInAs("buyer");
  manager = await signInAs("manager");
  const wire = await createWireItem(buyer);
  const magnet = await createMagnetItem(buyer);
  wireSku = wire.sku;
  magnetSku = magnet.sku;
  const supplier = `Export supplier ${uniqueCode("S")}`;
  const supplierId = await createSupplier(buyer, supplier);
  await mapSupplierSku(supplierId, `X-${wire.sku}`, wire.id);
  await mapSupplierSku(supplierId, `X-${magnet.sku}`, magnet.id);
  await importPriceList(buyer, {
    supplier,
    fileName: "exports.csv",
    lines: [
      "Art. no,Kind,Standard,Size,Grade,Price,Adder per kg,Currency,Valid from,Min qty",
      `X-${wire.sku},wire,IEC,0.8,,,3.50,EUR,2026-02-01,1`,
      `X-${magnet.sku},magnet,,,N42SH,2.25,,EUR,2026-02-01,1`,
      `X-${magnet.sku},magnet,,,N42SH,1875.5,,EUR,2026-02-01,1000`,
    ],
    mapping: {
      supplierSku: "Art. no",
      kind: "Kind",
      standard: "Standard",
      size: "Size",
      grade: "Grade",
      price: "Price",
      adderPerKg: "Adder per kg",
      currency: "Currency",
      validFrom: "Valid from",
      minQuantity: "Min qty",
    },
  });
  const [row] = await testDb()
    .select({ id: priceImports.id })
    .from(priceImports)
    .where(
      and(
        eq(priceImports.supplierId, supplierId),
        eq(priceImports.fileName, "exports.csv"),
      ),
    );
  importId = row!.id;
  design = await createPricedReleasedDesign();
});
afterAll(closeTestDatabase);

describe("the price lines of an import as CSV", () => {
  it("holds every line with its exact prices, dot decimals and ISO days", async () => {
    const response = await get(
      `/suppliers/imports/${importId}/lines.csv`,
      manager,
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toContain("text/csv");
    expect(response.headers.get("content-disposition")).toContain(
      `price-lines-import-${importId}.csv`,
    );
    const { header, rows } = readCsv(await bodyOf(response));
    expect(header).toEqual([
      "file_row",
      "supplier_sku",
      "item_sku",
      "unit",
      "min_quantity",
      "pack_quantity",
      "currency",
      "unit_price",
      "adder_per_kg",
      "metal_base_conductor",
      "valid_from",
      "lead_time_days",
    ]);
    expect(rows).toHaveLength(3);
    const wire = rows.find((row) => row.item_sku === wireSku)!;
    expect(wire).toMatchObject({
      supplier_sku: `X-${wireSku}`,
      unit: "kg",
      currency: "EUR",
      unit_price: "",
      adder_per_kg: "3.5000",
      metal_base_conductor: "copper",
      valid_from: "2026-02-01",
    });
    const magnets = rows.filter((row) => row.item_sku === magnetSku);
    expect(magnets.map((row) => [row.min_quantity, row.unit_price])).toEqual([
      ["1.000", "2.2500"],
      // No grouping separator in a price over a thousand.
      ["1000.000", "1875.5000"],
    ]);
  });

  it("is refused to someone not signed in, and 404 for an import that is not there", async () => {
    const anonymous = await get(`/suppliers/imports/${importId}/lines.csv`);
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get("location")).toContain("/sign-in");
    expect(
      (await get("/suppliers/imports/999999999/lines.csv", manager)).status,
    ).toBe(404);
  });
});

describe("the cost insight tables as CSV", () => {
  it("gives the released designs with the same costs as the insight API", async () => {
    const response = await get("/insight/csv/designs?quantity=5", manager);
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toMatch(
      /insight-designs-\d{4}-\d{2}-\d{2}\.csv/,
    );
    const { header, rows } = readCsv(await bodyOf(response));
    expect(header).toContain("cost_per_motor");
    expect(header).toContain("cost_per_nm");
    const row = rows.find((each) => each.design === design.designName)!;
    expect(row).toBeDefined();
    const api = (await (
      await get("/api/v1/insight/designs?quantity=5&perPage=50", manager)
    ).json()) as {
      designId: number;
      costPerMotor: number;
      costPerNm: number | null;
    }[];
    const figures = api.find((each) => each.designId === design.designId)!;
    expect(Number(row.cost_per_motor)).toBe(figures.costPerMotor);
    expect(Number(row.cost_per_nm)).toBe(figures.costPerNm);
    expect(row).toMatchObject({
      motors: "5",
      currency: "EUR",
      rated_torque_nm: "0.5",
      per_nm_torque_source: "rated",
      every_line_priced: "true",
    });
    // Machine-neutral numbers: digits and one decimal point, nothing else.
    expect(row.cost_per_motor).toMatch(/^\d+(\.\d+)?$/);
  });

  it("splits cost per N·m by part, adding up to the total", async () => {
    const { rows } = readCsv(
      await bodyOf(await get("/insight/csv/cost-per-nm", manager)),
    );
    const row = rows.find((each) => each.design === design.designName)!;
    const parts = [
      "active_copper_per_nm",
      "end_turn_copper_per_nm",
      "leads_and_scrap_per_nm",
      "magnets_per_nm",
      "other_parts_per_nm",
    ].reduce((sum, field) => sum + Math.round(Number(row[field]) * 10_000), 0);
    expect(parts).toBe(Math.round(Number(row.cost_per_nm) * 10_000));
    // 2 magnets at 2.00 over 0.5 N·m: 8.00 per N·m.
    expect(Number(row.magnets_per_nm)).toBe(8);
  });

  it("gives the month-by-month cost, its change, and the stock by kind, location and week", async () => {
    const months = readCsv(
      await bodyOf(await get("/insight/csv/cost-by-month", manager)),
    );
    const ours = months.rows.filter((row) => row.design === design.designName);
    expect(ours.length).toBeGreaterThanOrEqual(12);
    for (const row of ours) expect(row.day).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const change = readCsv(
      await bodyOf(await get("/insight/csv/cost-change", manager)),
    );
    expect(change.rows.some((row) => row.design === design.designName)).toBe(
      true,
    );

    const kinds = readCsv(
      await bodyOf(await get("/insight/csv/stock-by-kind", manager)),
    );
    expect(kinds.header).toEqual(["kind", "items_valued", "currency", "value"]);
    for (const row of kinds.rows)
      expect(["wire", "magnet", "part"]).toContain(row.kind);
    const api = (await (
      await get("/api/v1/insight/stock-value", manager)
    ).json()) as { byKind: { kind: string; value: number }[] };
    for (const kind of api.byKind)
      expect(
        Number(kinds.rows.find((row) => row.kind === kind.kind)!.value),
      ).toBe(kind.value);

    const locations = readCsv(
      await bodyOf(await get("/insight/csv/stock-by-location", manager)),
    );
    expect(locations.header).toEqual([
      "location",
      "name",
      "items",
      "currency",
      "value",
    ]);
    const weeks = readCsv(
      await bodyOf(await get("/insight/csv/stock-by-week", manager)),
    );
    expect(weeks.rows).toHaveLength(26);
    expect(weeks.rows[0]!.week_of).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it("is refused to someone not signed in, 404 for a table that is not there, 400 for a bad what-if", async () => {
    const anonymous = await get("/insight/csv/designs");
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get("location")).toContain("/sign-in");
    expect((await get("/insight/csv/nothing-here", manager)).status).toBe(404);
    const bad = await get("/insight/csv/designs?quantity=-3", manager);
    expect(bad.status).toBe(400);
    expect(await bad.text()).toContain("quantity");
  });
});
