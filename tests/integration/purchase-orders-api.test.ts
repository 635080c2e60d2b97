/**
 * Purchase orders through the API against the real app, MariaDB and SMTP fake: create a
 * draft priced from the supplier's price lines (breaks, metal base + adder, lead times),
 * edit it while draft with every change in its history, send it (the e-mail reaches the
 * fake with the order as PDF and CSV, on_order rises), cancel and close short (on_order
 * falls by what was open), the list, and refusals that write nothing.
 */
import { count, eq, inArray } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  mailOutbox,
  items,
  metalBasePrices,
  priceLines,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseOrders,
  suppliers,
} from "~/db/schema";
import { addDays, dayOf } from "~/lib/calendar-days";
import { get, sendJson, signInAs } from "../support/app-client";
import {
  createPartItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { waitForMessage } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  testDb,
  uniqueCode,
} from "../support/test-database";

interface OrderLineJson {
  id: number;
  lineNumber: number;
  sku: string;
  supplierSku: string;
  quantity: number;
  received: number;
  open: number;
  unitPrice: number;
  lineTotal: number;
  priceSource: string;
  overrideReason: string | null;
  metalBasePerKg: number | null;
  adderPerKg: number | null;
  metalBaseFixedAt: string | null;
  requestedDate: string | null;
  leadTimeDays: number;
  expectedDate: string;
}
interface OrderJson {
  id: number;
  number: string;
  status: string;
  currency: string;
  notes: string;
  orderedOn: string | null;
  total: number;
  supplier: { id: number; name: string };
  lines: OrderLineJson[];
  events: { kind: string; detail: string; person: string; at: string }[];
}

let buyer = "";
let admin = "";
let supplierId = 0;
let noAddressSupplierId = 0;
let orderEmail = "";
let magnet = { sku: "", id: 0 };
let wire = { sku: "", id: 0 };
let unpriced = { sku: "", id: 0 };
const today = dayOf(new Date());
// A currency no other test prices in, so the metal base this file keeps is the one used.
const currency = "DKK";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  admin = await signInAs("admin");
  magnet = await createPartItem(buyer, "pcs", "N42SH disc 10×3");
  wire = await createWireItem(buyer);
  unpriced = await createPartItem(buyer, "pcs", "Shaft key 3×3×12");
  const db = testDb();
  orderEmail = `${uniqueCode("orders").toLowerCase()}@supplier.test`;
  const [created] = await db
    .insert(suppliers)
    .values({
      name: uniqueCode("Fjord Magnetics"),
      currency,
      leadTimeDays: 14,
      orderEmail,
      email: "general@supplier.test",
      metalBaseFixedAt: "delivery",
    })
    .$returningId();
  supplierId = created!.id;
  const [bare] = await db
    .insert(suppliers)
    .values({ name: uniqueCode("No Address Ltd"), currency })
    .$returningId();
  noAddressSupplierId = bare!.id;
  // Magnet breaks 1+ 2.40, 100+ 2.10 DKK a piece, 21 days' lead time on the price line.
  await db.insert(priceLines).values([
    {
      supplierId,
      itemId: magnet.id,
      supplierSku: "FM-D10",
      currency,
      unitPrice: "2.4000",
      minQuantity: "1.000",
      validFrom: "2020-01-01",
      leadTimeDays: 21,
    },
    {
      supplierId,
      itemId: magnet.id,
      supplierSku: "FM-D10",
      currency,
      unitPrice: "2.1000",
      minQuantity: "100.000",
      validFrom: "2020-01-01",
      leadTimeDays: 21,
    },
    // Wire: adder 3.25 DKK/kg on the copper base; no lead time of its own (the supplier's 14 days).
    {
      supplierId,
      itemId: wire.id,
      supplierSku: "FM-CU080",
      currency,
      adderPerKg: "3.2500",
      conductor: "copper",
      minQuantity: "0.000",
      validFrom: "2020-01-01",
    },
    {
      supplierId: noAddressSupplierId,
      itemId: magnet.id,
      supplierSku: "NA-1",
      currency,
      unitPrice: "1.0000",
      minQuantity: "0.000",
      validFrom: "2020-01-01",
    },
  ]);
  await db.insert(metalBasePrices).values({
    conductor: "copper",
    currency,
    pricePerKg: "65.0000",
    validFrom: "2020-01-01",
  });
});
afterAll(closeTestDatabase);

async function json<T>(response: Response, status: number): Promise<T> {
  const text = await response.text();
  expect(response.status, text).toBe(status);
  return JSON.parse(text) as T;
}

async function createDraft(
  lines: Record<string, unknown>[],
  extra: Record<string, unknown> = {},
): Promise<OrderJson> {
  return json<OrderJson>(
    await sendJson(
      "POST",
      "/api/v1/purchase-orders",
      { supplierId, lines, ...extra },
      buyer,
    ),
    201,
  );
}

/** POST …/send, …/cancel or …/close as the buyer. */
function step(orderId: number, name: string, body?: unknown) {
  return sendJson(
    "POST",
    `/api/v1/purchase-orders/${orderId}/${name}`,
    body,
    buyer,
  );
}

async function onOrder(itemId: number): Promise<number> {
  const [row] = await testDb()
    .select({ onOrder: items.onOrder })
    .from(items)
    .where(eq(items.id, itemId));
  return Number(row!.onOrder);
}

/**
 * What a purchase-order change writes, for this file's suppliers only (other test files
 * may write orders and mail at the same time): their orders, lines and history, the
 * mail to their addresses, and the items' on_order.
 */
async function writtenRows() {
  const db = testDb();
  const ordersNow = await db
    .select({
      id: purchaseOrders.id,
      status: purchaseOrders.status,
      currency: purchaseOrders.currency,
      notes: purchaseOrders.notes,
    })
    .from(purchaseOrders)
    .where(
      inArray(purchaseOrders.supplierId, [supplierId, noAddressSupplierId]),
    )
    .orderBy(purchaseOrders.id);
  const orderIds = ordersNow.map((order) => order.id);
  const linesNow =
    orderIds.length === 0
      ? []
      : await db
          .select({
            id: purchaseOrderLines.id,
            quantity: purchaseOrderLines.quantity,
            unitPrice: purchaseOrderLines.unitPrice,
            expectedDate: purchaseOrderLines.expectedDate,
          })
          .from(purchaseOrderLines)
          .where(inArray(purchaseOrderLines.orderId, orderIds))
          .orderBy(purchaseOrderLines.id);
  const [events] =
    orderIds.length === 0
      ? [{ n: 0 }]
      : await db
          .select({ n: count() })
          .from(purchaseOrderEvents)
          .where(inArray(purchaseOrderEvents.orderId, orderIds));
  const [mail] = await db
    .select({ n: count() })
    .from(mailOutbox)
    .where(eq(mailOutbox.toAddress, orderEmail));
  const onOrders = await db
    .select({ id: items.id, onOrder: items.onOrder })
    .from(items)
    .where(inArray(items.id, [magnet.id, wire.id, unpriced.id]))
    .orderBy(items.id);
  return { ordersNow, linesNow, events: events!.n, mail: mail!.n, onOrders };
}

describe("creating and editing a draft", () => {
  it("prices lines from the price list: breaks, base + adder, lead times", async () => {
    const order = await createDraft([
      { sku: magnet.sku, quantity: 150 },
      { sku: wire.sku, quantity: 25.5, requestedDate: "2031-05-02" },
    ]);
    expect(order).toMatchObject({
      status: "draft",
      currency,
      number: `PO-${String(order.id).padStart(6, "0")}`,
      supplier: { id: supplierId },
    });
    const [magnetLine, wireLine] = order.lines;
    // Worked by hand: 150 pieces reach the 100+ break, 2.10 DKK; 21 days from today.
    expect(magnetLine).toMatchObject({
      sku: magnet.sku,
      supplierSku: "FM-D10",
      quantity: 150,
      received: 0,
      unitPrice: 2.1,
      lineTotal: 315,
      priceSource: "price_list",
      leadTimeDays: 21,
      expectedDate: addDays(today, 21),
      metalBasePerKg: null,
    });
    // Worked by hand: base 65.00 + adder 3.25 = 68.25 DKK/kg, base fixed on delivery
    // (the supplier's setting); the requested date wins over the supplier's 14 days.
    expect(wireLine).toMatchObject({
      sku: wire.sku,
      quantity: 25.5,
      unitPrice: 68.25,
      metalBasePerKg: 65,
      adderPerKg: 3.25,
      metalBaseFixedAt: "delivery",
      leadTimeDays: 14,
      requestedDate: "2031-05-02",
      expectedDate: "2031-05-02",
    });
    // Line totals to the cent, half away from zero, as the printed order adds them:
    // 315.00 + 25.5 × 68.25 = 315.00 + 1,740.375 → 1,740.38 = 2,055.38
    expect(order.total).toBe(2055.38);
    expect(order.events.map((event) => event.kind)).toEqual(["created"]);
    expect(order.events[0]!.detail).toContain(magnet.sku);
  });

  it("edits a draft and keeps every change in its history", async () => {
    const order = await createDraft([
      { sku: magnet.sku, quantity: 150 },
      { sku: wire.sku, quantity: 10 },
    ]);
    const [magnetLine, wireLine] = order.lines;
    const edited = await json<OrderJson>(
      await sendJson(
        "PATCH",
        `/api/v1/purchase-orders/${order.id}`,
        {
          notes: "Deliver to gate 2.",
          lines: [
            { id: magnetLine!.id, quantity: 50 },
            { id: wireLine!.id, remove: true },
            {
              sku: unpriced.sku,
              quantity: 40,
              unitPrice: 0.35,
              overrideReason: "Quoted by phone",
            },
          ],
        },
        buyer,
      ),
      200,
    );
    expect(edited.notes).toBe("Deliver to gate 2.");
    // 50 pieces fall below the 100 break: 2.40 again.
    expect(edited.lines).toHaveLength(2);
    expect(edited.lines[0]).toMatchObject({ quantity: 50, unitPrice: 2.4 });
    expect(edited.lines[1]).toMatchObject({
      sku: unpriced.sku,
      lineNumber: 3,
      unitPrice: 0.35,
      priceSource: "override",
      overrideReason: "Quoted by phone",
      leadTimeDays: 14,
    });
    const kinds = edited.events.map((event) => event.kind);
    expect(kinds).toEqual([
      "created",
      "line-removed",
      "edited",
      "line-changed",
      "line-added",
      "price-overridden",
    ]);
    const changed = edited.events.find(
      (event) => event.kind === "line-changed",
    );
    expect(changed!.detail).toMatch(/150\.000 pcs → 50\.000 pcs/);
    expect(changed!.detail).toMatch(/2\.1000 → 2\.4000/);
    expect(
      edited.events.find((event) => event.kind === "price-overridden")!.detail,
    ).toContain("Quoted by phone");
    for (const event of edited.events) expect(event.person).toBeTruthy();

    // The buyer's own price on a priced line overrides it, with the list price named.
    const overridden = await json<OrderJson>(
      await sendJson(
        "PATCH",
        `/api/v1/purchase-orders/${order.id}`,
        {
          lines: [
            { id: magnetLine!.id, unitPrice: 2.2, overrideReason: "Agreed" },
          ],
        },
        buyer,
      ),
      200,
    );
    expect(overridden.lines[0]).toMatchObject({
      unitPrice: 2.2,
      priceSource: "override",
    });
    expect(overridden.events.at(-1)!.detail).toMatch(/2\.4000/);
    // null goes back to the price list.
    const back = await json<OrderJson>(
      await sendJson(
        "PATCH",
        `/api/v1/purchase-orders/${order.id}`,
        { lines: [{ id: magnetLine!.id, unitPrice: null }] },
        buyer,
      ),
      200,
    );
    expect(back.lines[0]).toMatchObject({
      unitPrice: 2.4,
      priceSource: "price_list",
      overrideReason: null,
    });
  });
});

describe("sending", () => {
  it("e-mails the order as PDF and CSV, freezes it and puts it on order", async () => {
    const order = await createDraft(
      [
        { sku: magnet.sku, quantity: 120 },
        { sku: wire.sku, quantity: 12.5 },
      ],
      { notes: "Please pack the magnets in separated trays." },
    );
    const magnetBefore = await onOrder(magnet.id);
    const wireBefore = await onOrder(wire.id);
    const sent = await json<OrderJson>(await step(order.id, "send"), 200);
    expect(sent.status).toBe("sent");
    expect(sent.orderedOn).toBe(today);
    expect(sent.lines[0]!.expectedDate).toBe(addDays(today, 21));
    expect(sent.lines[1]!.expectedDate).toBe(addDays(today, 14));
    expect(sent.events.at(-1)).toMatchObject({ kind: "sent" });
    expect(sent.events.at(-1)!.detail).toContain(orderEmail);
    expect(await onOrder(magnet.id)).toBe(magnetBefore + 120);
    expect(await onOrder(wire.id)).toBe(wireBefore + 12.5);

    const message = await waitForMessage(orderEmail, new RegExp(sent.number));
    expect(message.text).toContain(sent.number);
    const pdf = message.attachments.find(
      (file) => file.fileName === `${sent.number}.pdf`,
    );
    const csv = message.attachments.find(
      (file) => file.fileName === `${sent.number}.csv`,
    );
    expect(pdf?.contentType).toBe("application/pdf");
    expect(
      Buffer.from(pdf!.contentBase64, "base64").subarray(0, 5).toString(),
    ).toBe("%PDF-");
    const csvText = Buffer.from(csv!.contentBase64, "base64")
      .toString("utf8")
      .replace(/^\uFEFF/, "");
    const rows = Papa.parse<Record<string, string>>(csvText.trim(), {
      header: true,
    }).data;
    expect(
      rows.map((row) => ({
        sku: row.our_sku,
        supplierSku: row.supplier_sku,
        quantity: Number(row.quantity),
        unitPrice: Number(row.unit_price),
        currency: row.currency,
        expectedDate: row.expected_date,
      })),
    ).toEqual(
      sent.lines.map((line) => ({
        sku: line.sku,
        supplierSku: line.supplierSku,
        quantity: line.quantity,
        unitPrice: line.unitPrice,
        currency,
        expectedDate: line.expectedDate,
      })),
    );
    // 120 × 2.10 = 252.00; 12.5 × 68.25 = 853.125 → 853.13 to the cent.
    expect(rows.map((row) => row.line_total)).toEqual(["252.00", "853.13"]);

    // The admin's outbox names the attachments.
    const outbox = await json<
      { to: string; attachments: { fileName: string; byteSize: number }[] }[]
    >(await get("/api/v1/outbox?limit=50", admin), 200);
    const kept = outbox.find((entry) => entry.to === orderEmail);
    expect(kept?.attachments.map((file) => file.fileName)).toEqual([
      `${sent.number}.pdf`,
      `${sent.number}.csv`,
    ]);
    expect(kept!.attachments[0]!.byteSize).toBeGreaterThan(500);

    // Frozen: no second send, no edit, and nothing written by either refusal.
    const before = await writtenRows();
    const again = await step(order.id, "send");
    expect(again.status).toBe(409);
    const edit = await sendJson(
      "PATCH",
      `/api/v1/purchase-orders/${order.id}`,
      { notes: "late change" },
      buyer,
    );
    expect(edit.status).toBe(409);
    expect(
      ((await edit.json()) as { error: { message: string } }).error.message,
    ).toMatch(/only a draft can be edited/);
    expect(await writtenRows()).toEqual(before);
  });

  it("lists orders by status and supplier, a page at a time", async () => {
    const draft = await createDraft([{ sku: magnet.sku, quantity: 5 }]);
    const page = await json<{
      total: number;
      orders: { id: number; number: string; status: string; total: number }[];
    }>(
      await get(
        `/api/v1/purchase-orders?status=draft&supplierId=${supplierId}&pageSize=2`,
        buyer,
      ),
      200,
    );
    expect(page.orders.length).toBeLessThanOrEqual(2);
    expect(page.orders[0]).toMatchObject({
      id: draft.id,
      status: "draft",
      total: 12,
    });
    expect(page.orders.every((order) => order.status === "draft")).toBe(true);
    const bad = await get("/api/v1/purchase-orders?status=lost", buyer);
    expect(bad.status).toBe(400);
  });
});

describe("cancelling and closing short", () => {
  it("cancelling a sent order takes its quantities off on_order", async () => {
    const before = await onOrder(magnet.id);
    const order = await createDraft([{ sku: magnet.sku, quantity: 30 }]);
    await json(await step(order.id, "send"), 200);
    expect(await onOrder(magnet.id)).toBe(before + 30);
    const cancelled = await json<OrderJson>(
      await step(order.id, "cancel", { reason: "Ordered twice" }),
      200,
    );
    expect(cancelled.status).toBe("cancelled");
    expect(cancelled.events.at(-1)!.detail).toContain("Ordered twice");
    expect(await onOrder(magnet.id)).toBe(before);
  });

  it("closing short takes off only what was still open", async () => {
    const before = await onOrder(magnet.id);
    const order = await createDraft([{ sku: magnet.sku, quantity: 100 }]);
    await json(await step(order.id, "send"), 200);
    // 40 of 100 arrived (booked here as the receiving side does: received up, on_order down).
    const db = testDb();
    await db
      .update(purchaseOrderLines)
      .set({ received: "40.000" })
      .where(eq(purchaseOrderLines.id, order.lines[0]!.id));
    await db
      .update(purchaseOrders)
      .set({ status: "partly_received" })
      .where(eq(purchaseOrders.id, order.id));
    await db
      .update(items)
      .set({ onOrder: String(before + 60) })
      .where(eq(items.id, magnet.id));
    // A partly received order cannot be cancelled, and the refusal writes nothing.
    const rows = await writtenRows();
    const cancel = await step(order.id, "cancel", {});
    expect(cancel.status).toBe(409);
    expect(await writtenRows()).toEqual(rows);
    const closed = await json<OrderJson>(await step(order.id, "close"), 200);
    expect(closed.status).toBe("closed_short");
    expect(closed.lines[0]).toMatchObject({ received: 40, open: 60 });
    expect(closed.events.at(-1)!.kind).toBe("closed-short");
    expect(await onOrder(magnet.id)).toBe(before);
  });

  it("a draft is cancelled without touching on_order; closing a draft is refused", async () => {
    const before = await onOrder(magnet.id);
    const order = await createDraft([{ sku: magnet.sku, quantity: 7 }]);
    const rows = await writtenRows();
    const close = await step(order.id, "close", { reason: "x" });
    expect(close.status).toBe(409);
    expect(await writtenRows()).toEqual(rows);
    await json(await step(order.id, "cancel"), 200);
    expect(await onOrder(magnet.id)).toBe(before);
  });
});

describe("refusals write nothing", () => {
  const refusals: [string, () => Promise<Response>, number, RegExp][] = [
    [
      "a body with bad fields",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          { supplierId: "one", lines: [{ sku: "", quantity: -1 }] },
          buyer,
        ),
      400,
      /missing or wrong/,
    ],
    [
      "a piece item ordered in part pieces",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          { supplierId, lines: [{ sku: magnet.sku, quantity: 2.5 }] },
          buyer,
        ),
      400,
      /counted in whole pieces.*lines\.0\.quantity/,
    ],
    [
      "an unknown supplier",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          { supplierId: 999_999_999, lines: [] },
          buyer,
        ),
      422,
      /No supplier has the id/,
    ],
    [
      "an unknown SKU",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          {
            supplierId,
            lines: [
              { sku: magnet.sku, quantity: 1 },
              { sku: "NO-SUCH-SKU-42", quantity: 1 },
            ],
          },
          buyer,
        ),
      422,
      /NO-SUCH-SKU-42/,
    ],
    [
      "a line the supplier does not price, without a price",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          {
            supplierId,
            lines: [
              { sku: magnet.sku, quantity: 1 },
              { sku: unpriced.sku, quantity: 1 },
            ],
          },
          buyer,
        ),
      422,
      /no price for this item.*Give a unit price/,
    ],
    [
      "a currency without a rate",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders",
          { supplierId, currency: "XTS", lines: [] },
          buyer,
        ),
      422,
      /No exchange rate is kept for XTS/,
    ],
    [
      "an unknown order",
      () =>
        sendJson(
          "POST",
          "/api/v1/purchase-orders/999999999/send",
          undefined,
          buyer,
        ),
      404,
      /No purchase order PO-999999999/,
    ],
  ];

  it.each(refusals)("%s", async (_what, request, status, message) => {
    const before = await writtenRows();
    const response = await request();
    const body = (await response.json()) as {
      error: { message: string; fields?: Record<string, string[]> };
    };
    expect(response.status, JSON.stringify(body)).toBe(status);
    expect(
      `${body.error.message} ${JSON.stringify(body.error.fields ?? {})}`,
    ).toMatch(message);
    expect(await writtenRows()).toEqual(before);
  });

  it("names each bad field of the body", async () => {
    const response = await sendJson(
      "POST",
      "/api/v1/purchase-orders",
      { supplierId: 1, lines: [{ sku: "A", quantity: 1.0001 }] },
      buyer,
    );
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { fields: Record<string, string[]> };
    };
    expect(body.error.fields["lines.0.quantity"]).toEqual([
      "The quantity has at most 3 decimals.",
    ]);
  });

  it("a supplier with no e-mail address cannot be sent an order", async () => {
    const order = await json<OrderJson>(
      await sendJson(
        "POST",
        "/api/v1/purchase-orders",
        {
          supplierId: noAddressSupplierId,
          lines: [{ sku: magnet.sku, quantity: 3 }],
        },
        buyer,
      ),
      201,
    );
    const before = await writtenRows();
    const response = await step(order.id, "send");
    expect(response.status).toBe(422);
    expect(
      ((await response.json()) as { error: { message: string } }).error.message,
    ).toMatch(/no order e-mail address/);
    expect(await writtenRows()).toEqual(before);
  });

  it("an edit naming a line of another order is refused", async () => {
    const order = await createDraft([{ sku: magnet.sku, quantity: 2 }]);
    const before = await writtenRows();
    const response = await sendJson(
      "PATCH",
      `/api/v1/purchase-orders/${order.id}`,
      { notes: "changed", lines: [{ id: 999_999_999, quantity: 3 }] },
      buyer,
    );
    expect(response.status).toBe(422);
    expect(await writtenRows()).toEqual(before);
  });
});
