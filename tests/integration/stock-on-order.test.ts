/**
 * What is on order, read everywhere: the items API and CSV carry onOrder, the item page
 * lists the open lines; a low-stock alert that a sent order covers e-mails nobody and
 * says which order covers it; the late lines page lists the open lines past due.
 * Orders are written straight into the database as sending leaves them
 * (tests/support/purchase-order-fixtures.ts).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { eq } from "drizzle-orm";
import { demoPassword } from "../../seed/demo-people";
import { get, sendJson, signInAs, uniqueEmail } from "../support/app-client";
import { receivedMessages } from "../support/mail-fake-client";
import {
  dayFromToday,
  insertOrder,
  itemIdOf,
  supplierWithLeadTime,
} from "../support/open-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  testDatabase,
  testDb,
  uniqueCode,
} from "../support/test-database";
import { items, purchaseOrders } from "~/db/schema";
import { formatDay } from "~/lib/format";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";

let buyer = "";
let storekeeper = "";
let builder = "";
let location = "";
let buyerId = "";
/** A buyer who hears of each alert (the default). */
const listener = uniqueEmail("on-order-buyer");

beforeAll(async () => {
  buyerId = await createPerson({
    email: listener,
    roles: ["buyer"],
    password: demoPassword(),
  });
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  builder = await signInAs("builder");
  location = await createLocation(uniqueCode("OO"));
});
afterAll(closeTestDatabase);

async function newPart(reorderPoint: number, supplierId?: number) {
  const sku = uniqueCode("ONO");
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "part",
      sku,
      name: "Bearing 6202",
      unit: "pcs",
      reorderPoint,
      reorderQuantity: 20,
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  if (supplierId !== undefined)
    await testDb()
      .update(items)
      .set({ preferredSupplierId: supplierId })
      .where(eq(items.id, await itemIdOf(sku)));
  return sku;
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

async function alertMailsTo(sku: string, to: string) {
  const [rows] = await testDatabase().query(
    "SELECT id FROM mail_outbox WHERE subject LIKE ? AND to_address = ?",
    [`Low stock: ${sku} %`, to],
  );
  return (rows as unknown[]).length;
}

interface AlertAnswer {
  sku: string;
  status: string;
  told: unknown[];
  coveredBy: {
    orderId: number;
    order: string;
    due: string;
    text: string;
  } | null;
}

async function alertOf(sku: string) {
  const response = await get("/api/v1/alerts?status=open&perPage=200", builder);
  expect(response.status).toBe(200);
  return ((await response.json()) as AlertAnswer[]).find(
    (alert) => alert.sku === sku,
  );
}

describe("stock on order", () => {
  it("is in the items API, the stock list, its CSV and on the item page", async () => {
    const supplierId = await supplierWithLeadTime(
      `Bearings ${uniqueCode("S")}`,
      10,
    );
    const sku = await newPart(0);
    const late = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "partly_received",
      lines: [
        // 12 ordered, 4 came: 8 still to come, due 3 days ago.
        { sku, quantity: "12", received: "4", expectedDate: dayFromToday(-3) },
      ],
    });
    const coming = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "sent",
      lines: [{ sku, quantity: "25", expectedDate: dayFromToday(9) }],
    });
    // A draft and a fully received line are not on order.
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "draft",
      lines: [{ sku, quantity: "100", expectedDate: dayFromToday(5) }],
    });

    // 8 + 25 = 33 pieces, the kept balance.
    const one = await get(`/api/v1/items/${sku}`, builder);
    expect(one.status).toBe(200);
    const item = (await one.json()) as Record<string, unknown>;
    expect(item).toMatchObject({ sku, onOrder: 33, onHand: 0, available: 0 });
    expect(item).toHaveProperty("reorderPoint");
    const list = await get(`/api/v1/items?search=${sku}`, builder);
    const listed = (await list.json()) as {
      items: { sku: string; onOrder: number }[];
    };
    expect(listed.items).toEqual([
      expect.objectContaining({ sku, onOrder: 33 }),
    ]);

    const csv = await (
      await get(`/stock/export.csv?search=${sku}`, builder)
    ).text();
    const [header, row] = csv
      .replace(/^\uFEFF/, "")
      .trim()
      .split("\r\n");
    const onOrderColumn = header!.split(",").indexOf("on order");
    expect(onOrderColumn).toBeGreaterThan(0);
    expect(row!.split(",")[onOrderColumn]).toBe("33");

    const stockPage = await (await get(`/stock?search=${sku}`, builder)).text();
    expect(stockPage).toContain("On order");
    expect(stockPage).toContain("33\u00a0pieces");

    const page = await (await get(`/stock/items/${sku}`, builder)).text();
    expect(page).toContain("33\u00a0pieces still to come on sent orders.");
    expect(page).toContain(`href="/purchase-orders/${late.id}"`);
    expect(page).toContain(purchaseOrderNumber(coming.id));
    expect(page).toContain("3 days late");
    expect(page).toContain(formatDay(dayFromToday(9)));
  });
});

describe("a low-stock alert covered by a sent order", () => {
  it("e-mails nobody and says which order covers it; losing the cover e-mails once", async () => {
    const supplierId = await supplierWithLeadTime(
      `Circlips ${uniqueCode("S")}`,
      14,
    );
    const sku = await newPart(10, supplierId);
    await move({ type: "receipt", sku, quantity: 15, unitCost: 0.5 });
    // 20 pieces due in 7 days, within the 14-day lead time.
    const order = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "sent",
      lines: [{ sku, quantity: "20", expectedDate: dayFromToday(7) }],
    });

    // 15 − 6 = 9 < 10, but 9 + 20 = 29 ≥ 10: covered.
    await move({ type: "issue", sku, quantity: 6 });
    const alert = await alertOf(sku);
    const text = `covered by ${purchaseOrderNumber(order.id)} due ${formatDay(dayFromToday(7))}`;
    expect(alert).toMatchObject({
      status: "open",
      told: [],
      coveredBy: {
        orderId: order.id,
        order: purchaseOrderNumber(order.id),
        due: dayFromToday(7),
        text,
      },
    });
    expect(await alertMailsTo(sku, listener)).toBe(0);
    // Nothing reached the fake either.
    expect(
      (await receivedMessages()).filter((message) =>
        message.subject.includes(sku),
      ),
    ).toEqual([]);
    const alertsPage = await (await get("/alerts", buyer)).text();
    expect(alertsPage).toContain(`href="/purchase-orders/${order.id}"`);
    expect(alertsPage).toContain(formatDay(dayFromToday(7)));

    // The order is cancelled: the next check finds no cover, and the buyer hears once.
    await testDb()
      .update(purchaseOrders)
      .set({ status: "cancelled" })
      .where(eq(purchaseOrders.id, order.id));
    await testDb()
      .update(items)
      .set({ onOrder: "0" })
      .where(eq(items.sku, sku));
    await move({ type: "issue", sku, quantity: 1 });
    expect((await alertOf(sku))?.coveredBy).toBeNull();
    expect(await alertMailsTo(sku, listener)).toBe(1);
    await move({ type: "issue", sku, quantity: 1 });
    expect(await alertMailsTo(sku, listener)).toBe(1);
  });

  it("is a call to order when the order comes after the lead time", async () => {
    const supplierId = await supplierWithLeadTime(
      `Magnets ${uniqueCode("S")}`,
      14,
    );
    const sku = await newPart(10, supplierId);
    await move({ type: "receipt", sku, quantity: 12, unitCost: 0.5 });
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "sent",
      lines: [{ sku, quantity: "50", expectedDate: dayFromToday(15) }],
    });
    await move({ type: "issue", sku, quantity: 5 });
    expect((await alertOf(sku))?.coveredBy).toBeNull();
    expect(await alertMailsTo(sku, listener)).toBe(1);
  });
});

describe("late order lines", () => {
  it("lists open lines past their expected day, longest late first, to everyone signed in", async () => {
    const supplierName = `Late mill ${uniqueCode("S")}`;
    const supplierId = await supplierWithLeadTime(supplierName, 21);
    const sku = await newPart(0);
    const old = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "sent",
      // Far in the past, so it is first whatever other tests left.
      lines: [
        {
          sku,
          quantity: "40",
          received: "0",
          expectedDate: dayFromToday(-4000),
        },
      ],
    });
    const due = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "partly_received",
      lines: [
        {
          sku,
          quantity: "10",
          received: "10",
          expectedDate: dayFromToday(-3999),
          completedAt: new Date(),
        },
        { sku, quantity: "10", received: "0", expectedDate: dayFromToday(0) },
      ],
    });
    const closed = await insertOrder({
      supplierId,
      userId: buyerId,
      status: "closed_short",
      lines: [{ sku, quantity: "5", expectedDate: dayFromToday(-3998) }],
    });

    const response = await get("/purchase-orders/late", builder);
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain("Late order lines");
    const first = html.indexOf(purchaseOrderNumber(old.id));
    expect(first).toBeGreaterThan(0);
    expect(html).toContain("4000 days late");
    expect(html).toContain(sku);
    expect(html).toContain(supplierName);
    expect(html).toContain("40\u00a0pieces");
    // Received in full, due today, or on a closed order: not late lines.
    expect(html).not.toContain(purchaseOrderNumber(due.id));
    expect(html).not.toContain(purchaseOrderNumber(closed.id));
  });
});
