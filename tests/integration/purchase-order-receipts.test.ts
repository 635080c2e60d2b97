/**
 * POST /api/v1/purchase-orders/:orderId/receipts: spools weighed in against an order at the
 * order's price converted at the receipt day's rate; stock on order falls and on hand
 * rises; 20 receipts at once never take a line past its tolerance; every refusal writes
 * nothing. Orders are written straight into the database as sending leaves them.
 */
import { and, count, eq, inArray, sum } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  items,
  lots,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseOrders,
  purchaseReceiptLines,
  purchaseReceipts,
  stockMovements,
} from "~/db/schema";
import { get, newPerson, sendJson, signIn } from "../support/app-client";
import {
  createPartItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import {
  addRates,
  createOrder,
  createOrderSupplier,
  uniqueCurrency,
} from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let storekeeperId = "";
let rack = "";
let currency = "";
let supplierId = 0;

const today = () => new Date().toISOString().slice(0, 10);
const dayAfter = (day: string) =>
  new Date(Date.parse(day) + 86_400_000).toISOString().slice(0, 10);

const receipt = (
  orderId: number | string,
  body: unknown,
  cookie = storekeeper,
) =>
  sendJson("POST", `/api/v1/purchase-orders/${orderId}/receipts`, body, cookie);

interface ReceiptAnswer {
  receipt: {
    id: number;
    receivedOn: string;
    lines: {
      lineId: number;
      movementId: number;
      quantity: number;
      unitCost: number;
    }[];
  };
  order: {
    id: number;
    number: string;
    status: string;
    lines: {
      id: number;
      sku: string;
      quantity: number;
      received: number;
      open: number;
    }[];
  };
}

async function itemFigures(itemId: number) {
  const [item] = await testDb()
    .select({
      onHand: items.onHand,
      onOrder: items.onOrder,
      averageCost: items.averageCost,
    })
    .from(items)
    .where(eq(items.id, itemId));
  return item!;
}

/** Everything a receipt against these orders and items could write. */
async function footprint(orderIds: number[], itemIds: number[]) {
  const db = testDb();
  const [movements] = await db
    .select({ rows: count() })
    .from(stockMovements)
    .where(inArray(stockMovements.itemId, itemIds));
  const [lotRows] = await db
    .select({ rows: count() })
    .from(lots)
    .where(inArray(lots.itemId, itemIds));
  const [receipts] = await db
    .select({ rows: count() })
    .from(purchaseReceipts)
    .where(inArray(purchaseReceipts.orderId, orderIds));
  const [events] = await db
    .select({ rows: count() })
    .from(purchaseOrderEvents)
    .where(inArray(purchaseOrderEvents.orderId, orderIds));
  const lines = await db
    .select({
      id: purchaseOrderLines.id,
      received: purchaseOrderLines.received,
    })
    .from(purchaseOrderLines)
    .where(inArray(purchaseOrderLines.orderId, orderIds))
    .orderBy(purchaseOrderLines.id);
  const orders = await db
    .select({ id: purchaseOrders.id, status: purchaseOrders.status })
    .from(purchaseOrders)
    .where(inArray(purchaseOrders.id, orderIds))
    .orderBy(purchaseOrders.id);
  const itemRows = await db
    .select({
      onHand: items.onHand,
      onOrder: items.onOrder,
      averageCost: items.averageCost,
    })
    .from(items)
    .where(inArray(items.id, itemIds))
    .orderBy(items.id);
  return { movements, lotRows, receipts, events, lines, orders, itemRows };
}

beforeAll(async () => {
  const buyerPerson = await newPerson("buyer");
  buyer = await signIn(buyerPerson.email, buyerPerson.password);
  const person = await newPerson("storekeeper");
  storekeeperId = person.id;
  storekeeper = await signIn(person.email, person.password);
  rack = await createLocation(uniqueCode("RCV"));
  currency = uniqueCurrency();
  // Only the rate dated on or before the receipt day counts: not the older, not the later.
  await addRates(currency, [
    { validFrom: "2020-01-01", rate: "0.800000" },
    { validFrom: today(), rate: "0.920000" },
    { validFrom: dayAfter(today()), rate: "1.500000" },
  ]);
  supplierId = await createOrderSupplier(currency);
});

afterAll(closeTestDatabase);

describe("receiving wire spools against an order", () => {
  it("books two weighed spools at the order's price, then the rest, and the order is received", async () => {
    const wire = await createWireItem(buyer);
    // 10 kg already on the shelf at 10.0000 (a receipt without an order).
    await receive(storekeeper, {
      sku: wire.sku,
      lot: uniqueCode("OLD"),
      location: rack,
      quantity: 10,
      unitCost: 10,
    });
    const order = await createOrder({
      supplierId,
      currency,
      userId: storekeeperId,
      lines: [{ itemId: wire.id, quantity: "20.000", unitPrice: "12.5000" }],
    });
    const [lineId] = order.lineIds;
    expect((await itemFigures(wire.id)).onOrder).toBe("20.000");

    const [lotA, lotB] = [uniqueCode("SP"), uniqueCode("SP")];
    const first = await receipt(order.id, {
      lines: [
        { lineId, lot: lotA, location: rack, grossKg: 5.4, tareKg: 0.6 },
        { lineId, lot: lotB, location: rack, grossKg: 6.15, tareKg: 0.65 },
      ],
    });
    expect(first.status, await first.clone().text()).toBe(201);
    const answer = (await first.json()) as ReceiptAnswer;
    // Worked by hand: nets 5.40 − 0.60 = 4.80 kg and 6.15 − 0.65 = 5.50 kg, 10.30 kg in all;
    // 12.5000 in the order's currency × 0.920000 = 11.5000 in the company currency.
    expect(answer.receipt.receivedOn).toBe(today());
    expect(
      answer.receipt.lines.map((line) => [line.quantity, line.unitCost]),
    ).toEqual([
      [4.8, 11.5],
      [5.5, 11.5],
    ]);
    expect(answer.order).toMatchObject({
      id: order.id,
      number: `PO-${String(order.id).padStart(6, "0")}`,
      status: "partly_received",
      lines: [
        { id: lineId, sku: wire.sku, quantity: 20, received: 10.3, open: 9.7 },
      ],
    });
    // On hand 10 + 10.3 = 20.3 kg; moving average (10 × 10.0000 + 10.3 × 11.5000) / 20.3
    // = 218.45 / 20.3 = 10.76108… → 10.7611; on order 20 − 10.3 = 9.7 kg.
    expect(await itemFigures(wire.id)).toEqual({
      onHand: "20.300",
      onOrder: "9.700",
      averageCost: "10.7611",
    });
    const movements = await testDb()
      .select({
        reference: stockMovements.reference,
        quantity: stockMovements.quantity,
        unitCost: stockMovements.unitCost,
        grossKg: stockMovements.grossKg,
      })
      .from(stockMovements)
      .where(
        inArray(
          stockMovements.id,
          answer.receipt.lines.map((line) => line.movementId),
        ),
      )
      .orderBy(stockMovements.id);
    expect(movements).toEqual([
      {
        reference: answer.order.number,
        quantity: "4.800",
        unitCost: "11.5000",
        grossKg: "5.400",
      },
      {
        reference: answer.order.number,
        quantity: "5.500",
        unitCost: "11.5000",
        grossKg: "6.150",
      },
    ]);
    const receiptLines = await testDb()
      .select({
        quantity: purchaseReceiptLines.quantity,
        unitPrice: purchaseReceiptLines.unitPrice,
        unitCost: purchaseReceiptLines.unitCost,
        rate: purchaseReceiptLines.rate,
      })
      .from(purchaseReceiptLines)
      .where(eq(purchaseReceiptLines.receiptId, answer.receipt.id))
      .orderBy(purchaseReceiptLines.id);
    expect(receiptLines).toEqual([
      {
        quantity: "4.800",
        unitPrice: "12.5000",
        unitCost: "11.5000",
        rate: "0.920000",
      },
      {
        quantity: "5.500",
        unitPrice: "12.5000",
        unitCost: "11.5000",
        rate: "0.920000",
      },
    ]);

    // The rest: 10.30 − 0.60 = 9.70 kg fills the line; the order is received.
    const second = await receipt(order.id, {
      lines: [
        {
          lineId,
          lot: uniqueCode("SP"),
          location: rack,
          grossKg: 10.3,
          tareKg: 0.6,
        },
      ],
    });
    expect(second.status, await second.clone().text()).toBe(201);
    const last = (await second.json()) as ReceiptAnswer;
    expect(last.order.status).toBe("received");
    expect(last.order.lines[0]).toMatchObject({ received: 20, open: 0 });
    expect((await itemFigures(wire.id)).onOrder).toBe("0.000");
    const [line] = await testDb()
      .select({ completedAt: purchaseOrderLines.completedAt })
      .from(purchaseOrderLines)
      .where(eq(purchaseOrderLines.id, lineId!));
    expect(line!.completedAt).not.toBeNull();
    const events = await testDb()
      .select({
        kind: purchaseOrderEvents.kind,
        detail: purchaseOrderEvents.detail,
      })
      .from(purchaseOrderEvents)
      .where(eq(purchaseOrderEvents.orderId, order.id))
      .orderBy(purchaseOrderEvents.id);
    expect(events.map((event) => event.kind)).toEqual(["received", "received"]);
    expect(events[0]!.detail).toContain(
      `10.3 kg in 2 spools or lots (lot ${lotA}, ${lotB})`,
    );
    expect(events[1]!.detail).toContain("Order now received");

    // A received order takes nothing more.
    const more = await receipt(order.id, {
      lines: [{ lineId, lot: uniqueCode("SP"), location: rack, quantity: 0.5 }],
    });
    expect(more.status).toBe(422);

    // The journal names the order on its receipts, and says "no order" on the others.
    const journal = await get(
      `/api/v1/stock-movements?sku=${wire.sku}`,
      storekeeper,
    );
    const { movements: listed } = (await journal.json()) as {
      movements: { type: string; purchaseOrder: string | null }[];
    };
    expect(listed.map((movement) => movement.purchaseOrder)).toEqual([
      answer.order.number,
      answer.order.number,
      answer.order.number,
      null,
    ]);
  });
});

describe("receipts at the same time", () => {
  it("20 receipts of one line from five storekeepers never take it past its tolerance", async () => {
    const wire = await createWireItem(buyer);
    const part = await createPartItem(buyer);
    // Line 1: 10 kg at 10 % → at most 11 kg; line 2 stays open so the order stays open.
    const order = await createOrder({
      supplierId,
      currency,
      userId: storekeeperId,
      lines: [
        { itemId: wire.id, quantity: "10.000", unitPrice: "12.0000" },
        { itemId: part.id, quantity: "4.000", unitPrice: "3.0000" },
      ],
    });
    const [lineId] = order.lineIds;
    const people = await Promise.all(
      Array.from({ length: 5 }, async () => {
        const person = await newPerson("storekeeper");
        return signIn(person.email, person.password);
      }),
    );
    // 20 × 0.6 kg = 12 kg asked for; 18 × 0.6 = 10.8 kg fit under 11 kg, a 19th would make 11.4.
    const answers = await Promise.all(
      Array.from({ length: 20 }, (_, index) =>
        receipt(
          order.id,
          {
            lines: [
              {
                lineId,
                lot: uniqueCode(`C${index}`),
                location: rack,
                quantity: 0.6,
              },
            ],
          },
          people[index % people.length],
        ),
      ),
    );
    const statuses = answers.map((answer) => answer.status).sort();
    expect(statuses.filter((status) => status === 201)).toHaveLength(18);
    expect(statuses.filter((status) => status === 409)).toHaveLength(2);
    const refused = answers.find((answer) => answer.status === 409)!;
    const { error } = (await refused.json()) as { error: { message: string } };
    expect(error.message).toContain(`Line 1 (${wire.sku}): ordered 10 kg`);
    expect(error.message).toContain("at most 11 kg may be received");
    expect(error.message).toContain("would make it 11.4 kg");

    const [line] = await testDb()
      .select({ received: purchaseOrderLines.received })
      .from(purchaseOrderLines)
      .where(eq(purchaseOrderLines.id, lineId!));
    expect(line!.received).toBe("10.800");
    const [moved] = await testDb()
      .select({ rows: count(), total: sum(stockMovements.quantity) })
      .from(stockMovements)
      .where(
        and(
          eq(stockMovements.itemId, wire.id),
          eq(
            stockMovements.reference,
            `PO-${String(order.id).padStart(6, "0")}`,
          ),
        ),
      );
    expect(moved).toEqual({ rows: 18, total: "10.800" });
    const [booked] = await testDb()
      .select({ rows: count(), total: sum(purchaseReceiptLines.quantity) })
      .from(purchaseReceiptLines)
      .where(eq(purchaseReceiptLines.orderLineId, lineId!));
    expect(booked).toEqual({ rows: 18, total: "10.800" });
    // On order: 10 kg, lowered by at most what was still open: 0 once 10 kg had come.
    expect(await itemFigures(wire.id)).toMatchObject({
      onHand: "10.800",
      onOrder: "0.000",
    });
    const [orderRow] = await testDb()
      .select({ status: purchaseOrders.status })
      .from(purchaseOrders)
      .where(eq(purchaseOrders.id, order.id));
    expect(orderRow!.status).toBe("partly_received");
  });
});

describe("refusals write nothing", () => {
  let wireId = 0;
  let partId = 0;
  let sent: { id: number; lineIds: number[] };
  let draft: { id: number; lineIds: number[] };
  let cancelled: { id: number; lineIds: number[] };
  let unpriced: { id: number; lineIds: number[] };

  beforeAll(async () => {
    const wire = await createWireItem(buyer);
    const part = await createPartItem(buyer);
    wireId = wire.id;
    partId = part.id;
    const lines = [
      { itemId: wire.id, quantity: "10.000", unitPrice: "12.0000" },
      { itemId: part.id, quantity: "20.000", unitPrice: "3.0000" },
    ];
    sent = await createOrder({
      supplierId,
      currency,
      userId: storekeeperId,
      lines,
    });
    draft = await createOrder({
      supplierId,
      currency,
      userId: storekeeperId,
      status: "draft",
      lines,
    });
    cancelled = await createOrder({
      supplierId,
      currency,
      userId: storekeeperId,
      status: "cancelled",
      lines,
    });
    // An order in a currency nobody keeps a rate for.
    const noRate = uniqueCurrency();
    unpriced = await createOrder({
      supplierId: await createOrderSupplier(noRate),
      currency: noRate,
      userId: storekeeperId,
      lines,
    });
  });

  async function refused(
    orderId: number | string,
    body: unknown,
    status: number,
  ): Promise<{ message: string; fields?: Record<string, string[]> }> {
    const orders = [sent.id, draft.id, cancelled.id, unpriced.id];
    const before = await footprint(orders, [wireId, partId]);
    const response = await receipt(orderId, body);
    expect(response.status, await response.clone().text()).toBe(status);
    expect(await footprint(orders, [wireId, partId])).toEqual(before);
    return (
      (await response.json()) as {
        error: { message: string; fields?: Record<string, string[]> };
      }
    ).error;
  }

  it("refuses two spools that together pass the line's tolerance (409)", async () => {
    // 6.0 + 5.5 = 11.5 kg against at most 10 × 1.10 = 11 kg.
    const error = await refused(
      sent.id,
      {
        lines: [
          {
            lineId: sent.lineIds[0],
            lot: uniqueCode("SP"),
            location: rack,
            grossKg: 6.6,
            tareKg: 0.6,
          },
          {
            lineId: sent.lineIds[0],
            lot: uniqueCode("SP"),
            location: rack,
            quantity: 5.5,
          },
        ],
      },
      409,
    );
    expect(error.message).toMatch(
      /^Line 1 \(.+\): ordered 10 kg, received so far 0 kg; at most 11 kg may be received \(10 % over the order\), but this delivery would make it 11\.5 kg\.$/,
    );
  });

  it("refuses one piece more than ordered at 0 % (409)", async () => {
    const error = await refused(
      sent.id,
      { lines: [{ lineId: sent.lineIds[1], location: rack, quantity: 21 }] },
      409,
    );
    expect(error.message).toContain("at most 20 pieces may be received");
  });

  it("refuses a draft and a cancelled order (422)", async () => {
    const body = (order: typeof draft) => ({
      lines: [{ lineId: order.lineIds[1], location: rack, quantity: 1 }],
    });
    expect((await refused(draft.id, body(draft), 422)).message).toContain(
      "is a draft",
    );
    expect(
      (await refused(cancelled.id, body(cancelled), 422)).message,
    ).toContain("is cancelled");
  });

  it("refuses a line of another order (422) and an unknown order (404)", async () => {
    const error = await refused(
      sent.id,
      { lines: [{ lineId: draft.lineIds[1], location: rack, quantity: 1 }] },
      422,
    );
    expect(error.message).toContain(`has no line ${draft.lineIds[1]}`);
    expect(error.fields).toEqual({ "lines.0.lineId": [error.message] });
    await refused(
      2_147_483_000,
      { lines: [{ lineId: 1, location: rack, quantity: 1 }] },
      404,
    );
    await refused(
      "not-an-order",
      { lines: [{ lineId: 1, location: rack, quantity: 1 }] },
      404,
    );
  });

  it("refuses a receipt no rate can price (409) with the rate it lacks", async () => {
    const error = await refused(
      unpriced.id,
      { lines: [{ lineId: unpriced.lineIds[1], location: rack, quantity: 2 }] },
      409,
    );
    expect(error.message).toContain(`no ${"Q"}`);
    expect(error.message).toContain(`rate on or before ${today()}`);
  });

  it("undoes the first spool when the second is refused by the ledger (400)", async () => {
    const error = await refused(
      sent.id,
      {
        lines: [
          {
            lineId: sent.lineIds[0],
            lot: uniqueCode("SP"),
            location: rack,
            quantity: 2,
          },
          {
            lineId: sent.lineIds[0],
            lot: uniqueCode("SP"),
            location: "NO-SUCH-BIN",
            quantity: 2,
          },
        ],
      },
      400,
    );
    expect(error.fields).toEqual({
      "lines.1.location": ['No location with code "NO-SUCH-BIN".'],
    });
  });

  it("answers a bad body with field messages (400)", async () => {
    const error = await refused(
      sent.id,
      { lines: [{ lineId: sent.lineIds[0], location: "", grossKg: 1.2345 }] },
      400,
    );
    expect(error.fields).toMatchObject({
      "lines.0.location": ["Give the location."],
      "lines.0.grossKg": ["The gross weight has at most 3 decimals."],
    });
    const empty = await refused(sent.id, { lines: [] }, 400);
    expect(empty.fields).toEqual({
      lines: ["Receive at least one spool or lot."],
    });
  });
});
