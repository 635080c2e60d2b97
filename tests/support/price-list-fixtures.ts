/** Suppliers and their price lists through the real API, for tests that need prices before their browser steps. */
import { expect } from "vitest";
import { baseUrl, sendJson } from "./app-client";
import { eq } from "drizzle-orm";
import { supplierItems, suppliers } from "~/db/schema";
import { itemIdOf } from "./build-order-fixtures";
import { testDb, uniqueCode } from "./test-database";

/** Adds a supplier as the buyer whose session cookie is given; returns its id. */
export async function createSupplier(
  buyer: string,
  name: string,
  currency = "EUR",
): Promise<number> {
  const response = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name, currency },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  const [row] = await testDb()
    .select({ id: suppliers.id })
    .from(suppliers)
    .where(eq(suppliers.name, name));
  return row!.id;
}

/** Maps a supplier's own SKU to one of our items (what an import would find). */
export async function mapSupplierSku(
  supplierId: number,
  supplierSku: string,
  itemId: number,
): Promise<void> {
  await testDb()
    .insert(supplierItems)
    .values({ supplierId, supplierSku, itemId });
}

/**
 * Imports a CSV price list through POST /api/v1/price-lists (committed, not a
 * dry run): `lines` holds the header line first, `mapping` says which of our
 * fields each header feeds.
 */
export async function importPriceList(
  buyer: string,
  list: {
    supplier: string;
    fileName: string;
    lines: string[];
    mapping: Record<string, string>;
  },
): Promise<void> {
  const form = new FormData();
  form.set("file", new Blob([list.lines.join("\n")]), list.fileName);
  form.set("supplier", list.supplier);
  form.set("mapping", JSON.stringify(list.mapping));
  const response = await fetch(`${baseUrl()}/api/v1/price-lists`, {
    method: "POST",
    headers: { Cookie: buyer, Origin: baseUrl() },
    body: form,
  });
  expect(response.status, await response.clone().text()).toBe(201);
}

/**
 * One supplier quoting a wire, a magnet and a part at the design tests'
 * prices: the wire at a 3.50/kg adder on the copper base, the magnet at 2.00
 * a piece, the part at 1.50, all from `validFrom`. The supplier's SKUs
 * ("I-" and our SKU) are mapped to our items before the import, so it prices
 * these items and no other wire of the same size or magnet of the same grade.
 */
export async function quoteDesignItems(
  buyer: string,
  quote: {
    supplier: string;
    fileName: string;
    validFrom: string;
    wireSku: string;
    magnetSku: string;
    partSku: string;
  },
): Promise<void> {
  const supplierId = await createSupplier(buyer, quote.supplier);
  for (const sku of [quote.wireSku, quote.magnetSku, quote.partSku])
    await mapSupplierSku(supplierId, `I-${sku}`, await itemIdOf(sku));
  await importPriceList(buyer, {
    supplier: quote.supplier,
    fileName: quote.fileName,
    lines: [
      "Art. no,Kind,Standard,Size,Grade,Price,Adder per kg,Currency,Valid from",
      `I-${quote.wireSku},wire,IEC,0.8,,,3.50,EUR,${quote.validFrom}`,
      `I-${quote.magnetSku},magnet,,,N42SH,2.00,,EUR,${quote.validFrom}`,
      `I-${quote.partSku},part,,,,1.50,,EUR,${quote.validFrom}`,
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
    },
  });
}

/** The column mapping of {@link partPriceList}'s files. */
export const partPriceListMapping = {
  supplierSku: "Art. no",
  description: "Description",
  kind: "Kind",
  unit: "Unit",
  price: "Price",
  currency: "Currency",
  minQuantity: "Min qty",
  validFrom: "Valid from",
};

/** A CSV of `rows` part rows, four quantity breaks a SKU; `bad` lines (1-based data rows) get a negative price. */
export function partPriceList(rows: number, bad: number[] = []): string {
  const prefix = uniqueCode("P");
  const lines = [
    "Art. no,Description,Kind,Unit,Price,Currency,Min qty,Valid from",
  ];
  for (let index = 0; index < rows; index += 1) {
    const price = bad.includes(index + 1) ? "-1.00" : "2.50";
    lines.push(
      `${prefix}-${Math.floor(index / 4)},Insulation sleeve ${index},part,pcs,${price},EUR,${[1, 10, 100, 1000][index % 4]},2026-11-01`,
    );
  }
  return `${lines.join("\n")}\n`;
}
