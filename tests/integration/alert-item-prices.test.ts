/**
 * A low-stock e-mail and the item's page price the item by one rule, at one quantity (the
 * suggested order; one unit when nothing is to be ordered): through real movements, the
 * outbox and the SMTP fake. The start page shows a buyer how many alerts are open.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs, uniqueEmail } from "../support/app-client";
import { waitForMessage } from "../support/mail-fake-client";
import {
  createSupplier,
  importPriceList,
} from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let location = "";
/** A buyer who chose nothing, so hears of each alert (the default for buyers). */
const listener = uniqueEmail("alert-buyer");

beforeAll(async () => {
  await createPerson({
    email: listener,
    roles: ["buyer"],
    password: "alert-buyer-password",
  });
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  location = await createLocation(uniqueCode("AP"));
});
afterAll(async () => {
  await closeTestDatabase();
});

/** A part with no reorder quantity, quoted by one supplier at the given breaks (EUR). */
async function quotedPart(
  unit: "pcs" | "kg",
  breaks: { from: string; price: string }[],
) {
  const sku = uniqueCode("AP");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "part",
      sku,
      name: "Slot liner varnish",
      unit,
      reorderPoint: 10,
      reorderQuantity: 0,
    },
    buyer,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const supplier = `Liner house ${uniqueCode("L")}`;
  const supplierId = await createSupplier(buyer, supplier);
  await testDatabase().query(
    "INSERT INTO supplier_items (supplier_id, supplier_sku, item_id) SELECT ?, ?, id FROM items WHERE sku = ?",
    [supplierId, `LH-${sku}`, sku],
  );
  await importPriceList(buyer, {
    supplier,
    fileName: `${sku}.csv`,
    lines: [
      "Art. no,Kind,Price,Currency,From qty,Valid from",
      ...breaks.map(
        (entry) => `LH-${sku},part,${entry.price},EUR,${entry.from},2025-01-01`,
      ),
    ],
    mapping: {
      supplierSku: "Art. no",
      kind: "Kind",
      price: "Price",
      currency: "Currency",
      minQuantity: "From qty",
      validFrom: "Valid from",
    },
  });
  return { sku, supplier };
}

async function move(body: Record<string, unknown>) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    { location, ...body },
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

/** A page's text as read: tags and React's text separators dropped, no-break spaces plain. */
function textOf(html: string): string {
  return html
    .replace(/<script[\s\S]*?<\/script>/g, " ")
    .replace(/<!-- -->/g, "")
    .replace(/<[^>]+>/g, " ")
    .replace(/&quot;/g, '"')
    .replace(/&#x27;/g, "'")
    .replace(/\u00a0/g, " ")
    .replace(/\s+/g, " ");
}

async function itemPageText(sku: string) {
  const response = await get(`/stock/items/${encodeURIComponent(sku)}`, buyer);
  expect(response.status).toBe(200);
  return textOf(await response.text());
}

describe("the low-stock e-mail and the item page", () => {
  it("price the same quantity at the same price", async () => {
    // Breaks: from 1 pc at 2.00 EUR, from 3 pcs at 1.50 EUR.
    const { sku, supplier } = await quotedPart("pcs", [
      { from: "1", price: "2.00" },
      { from: "3", price: "1.50" },
    ]);
    await move({ type: "receipt", sku, quantity: 12, unitCost: 1 });
    // 12 − 5 = 7 < 10: the alert opens; the suggested order is the shortfall, 10 − 7 = 3 pcs.
    await move({ type: "issue", sku, quantity: 5 });
    const mail = await waitForMessage(
      listener,
      new RegExp(`Low stock: ${sku} `),
    );
    expect(mail.text).toContain("Suggested order: 3 pieces");
    expect(mail.text).toContain(
      `Best price for that quantity: ${supplier}, their SKU LH-${sku}, 1.5000 EUR per piece`,
    );

    const page = await itemPageText(sku);
    expect(page).toContain("Best prices for 3 pieces");
    expect(page).toMatch(new RegExp(`${supplier} LH-${sku} 1\\.5000 EUR`));
  });

  it("give the same reasons when the quantity is below every break, never 'no supplier quotes'", async () => {
    // One break, from 1 kg at 4.00 EUR.
    const { sku, supplier } = await quotedPart("kg", [
      { from: "1", price: "4.00" },
    ]);
    await move({ type: "receipt", sku, quantity: 10, unitCost: 3 });
    // 10 − 0.5 = 9.5 < 10: suggested order 0.5 kg, below the 1 kg break.
    await move({ type: "issue", sku, quantity: 0.5 });
    const mail = await waitForMessage(
      listener,
      new RegExp(`Low stock: ${sku} `),
    );
    expect(mail.text).toContain("Suggested order: 0.500 kg");
    expect(mail.text).not.toContain("No supplier quotes a price");
    const reason = mail.text.match(
      new RegExp(`- ${supplier}, their SKU LH-${sku}: (.+)`),
    )?.[1];
    expect(reason).toMatch(/^0\.500 is below the smallest quantity break/);

    const page = await itemPageText(sku);
    expect(page).toContain("Best prices for 0.500 kg");
    expect(page).toContain(reason!);
  });
});

describe("the start page", () => {
  it("shows a buyer how many alerts are open, linked to the alerts page", async () => {
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS open FROM stock_alerts WHERE closed_at IS NULL AND covered_by_order_id IS NULL",
    );
    const open = Number((rows as { open: number }[])[0]!.open);
    expect(open).toBeGreaterThan(0);
    const response = await get("/", buyer);
    const html = await response.text();
    expect(html).toMatch(
      new RegExp(
        `<a[^>]*href="/alerts"[^>]*>\\s*<span[^>]*>${open}</span>\\s*<span[^>]*>open low-stock alerts? to order</span>`,
      ),
    );
    const builder = await signInAs("builder");
    expect(await (await get("/", builder)).text()).not.toContain(
      "open low-stock alert",
    );
  });
});
