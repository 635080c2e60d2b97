/**
 * POST /api/v1/stock-movements with a build order: an issue that names `buildOrderId` goes
 * through the build order's own issue (it takes what the order holds and counts as issued
 * to it); one whose reference only looks like a build order's is refused, so the same wire
 * is never held by an order and gone from the shelf at once.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";
import {
  createPartItem,
  createWireItem,
  receive,
  reservationBooks,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
let manager = "";
let rackA = "";
let rackB = "";
let wire: { sku: string; id: number };
let part: { sku: string; id: number };
let design: { designId: number; revision: number };

interface OrderLine {
  sku: string;
  required: number;
  reserved: number;
  issued: number;
  issues: { lot: string | null; location: string; quantity: number }[];
}

/** One coil line (0.80 mm copper, 40 turns, active 50 mm, end turn 30 mm) × 12 coils, 5 % scrap: 360.348 g per motor. */
const twelveCoils = (itemId: number) => ({
  kind: "coil" as const,
  itemId,
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
  coilsPerMotor: 12,
  scrapPercent: 5,
});

const movement = (body: Record<string, unknown>) =>
  sendJson("POST", "/api/v1/stock-movements", body, storekeeper);

async function createOrder(motors: number): Promise<number> {
  const response = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity: motors },
    builder,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return ((await response.json()) as { id: number }).id;
}

async function orderStep(id: number, step: string) {
  const response = await sendJson(
    "POST",
    `/api/v1/build-orders/${id}/${step}`,
    {},
    builder,
  );
  expect(response.status, await response.clone().text()).toBe(200);
}

async function wireLine(orderId: number): Promise<OrderLine> {
  const response = await get(`/api/v1/build-orders/${orderId}`, manager);
  expect(response.status).toBe(200);
  const order = (await response.json()) as { lines: OrderLine[] };
  return order.lines.find((line) => line.sku === wire.sku)!;
}

async function movementCount(): Promise<number> {
  const [rows] = await testDatabase().query(
    "SELECT COUNT(*) AS n FROM stock_movements",
  );
  return Number((rows as { n: number }[])[0]!.n);
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  rackA = await createLocation(uniqueCode("RA"));
  rackB = await createLocation(uniqueCode("RB"));
  wire = await createWireItem(buyer);
  part = await createPartItem(buyer);
  // Spool A: gross 5.40 kg − tare 0.60 kg = 4.80 kg net; spool B 6 kg.
  await receive(storekeeper, {
    sku: wire.sku,
    lot: "SP-A",
    location: rackA,
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: 14.2,
  });
  await receive(storekeeper, {
    sku: wire.sku,
    lot: "SP-B",
    location: rackB,
    quantity: 6,
    unitCost: 15,
  });
  await receive(storekeeper, {
    sku: part.sku,
    location: rackB,
    quantity: 20,
    unitCost: 2.5,
  });
  design = await createDesign([twelveCoils(wire.id)]);
});
afterAll(closeTestDatabase);

describe("an issue to a build order through the stock-movements API", () => {
  let orderId = 0;

  it("takes what the order holds and shows as issued on the order (buildOrderId)", async () => {
    orderId = await createOrder(5);
    await orderStep(orderId, "reserve");
    // 360.348 g per motor × 5 = 1.80174 kg → 1.802 kg held on the oldest spool, SP-A.
    expect(await wireLine(orderId)).toMatchObject({
      required: 1.802,
      reserved: 1.802,
      issued: 0,
    });

    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      quantity: 0.5,
      buildOrderId: orderId,
    });
    expect(response.status, await response.clone().text()).toBe(201);
    const issued = await response.json();
    expect(issued).toMatchObject({
      movement: { type: "issue", sku: wire.sku, lot: "SP-A", quantity: -0.5 },
      // 10.8 kg − 0.5 kg on hand; 1.802 − 0.5 = 1.302 kg still held.
      balance: { onHand: 10.3, reserved: 1.302, available: 8.998 },
      buildOrder: {
        id: orderId,
        reference: `BO-${orderId}`,
        status: "in_progress",
        line: { required: 1.802, reserved: 1.302, issued: 0.5 },
      },
    });
    const line = await wireLine(orderId);
    expect(line).toMatchObject({ reserved: 1.302, issued: 0.5 });
    expect(line.issues).toEqual([
      expect.objectContaining({ lot: "SP-A", location: rackA, quantity: 0.5 }),
    ]);
    const books = await reservationBooks(wire.id);
    expect(books.grams(books.reserved)).toBe(books.heldTotal);
  });

  it("weighs a spool back against the order as the order's page does", async () => {
    // SP-A holds 4.30 kg net; 4.50 kg gross − 0.60 kg tare = 3.90 kg now: 0.400 kg left the spool.
    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      grossKg: 4.5,
      buildOrderId: orderId,
    });
    expect(response.status, await response.clone().text()).toBe(201);
    expect((await response.json()).buildOrder.line).toMatchObject({
      reserved: 0.902,
      issued: 0.9,
    });
  });

  it("answers 409 when the order does not need the item, writing nothing", async () => {
    const before = await movementCount();
    const response = await movement({
      type: "issue",
      sku: part.sku,
      location: rackB,
      quantity: 1,
      buildOrderId: orderId,
    });
    expect(response.status).toBe(409);
    const body = await response.json();
    expect(body.error.message).toContain(`BO-${orderId} needs no ${part.sku}`);
    expect(await movementCount()).toBe(before);
  });

  it("answers 409 when the order is not open (a draft, a cancelled order)", async () => {
    const draft = await createOrder(1);
    const cancelled = await createOrder(1);
    await orderStep(cancelled, "reserve");
    await orderStep(cancelled, "cancel");
    const before = await movementCount();
    for (const id of [draft, cancelled]) {
      const response = await movement({
        type: "issue",
        sku: wire.sku,
        lot: "SP-A",
        location: rackA,
        quantity: 0.1,
        buildOrderId: id,
      });
      expect(response.status, `BO-${id}`).toBe(409);
      expect((await response.json()).error.message).toMatch(
        /Reserve stock|cancelled/,
      );
    }
    expect(await movementCount()).toBe(before);
  });

  it("answers 404 for a build order that does not exist", async () => {
    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-B",
      location: rackB,
      quantity: 0.1,
      buildOrderId: 2_000_000_000,
    });
    expect(response.status).toBe(404);
    expect((await response.json()).error.message).toContain(
      "No build order BO-2000000000",
    );
  });

  it("refuses a reference that looks like a build order's without buildOrderId (400, the field named)", async () => {
    const before = await movementCount();
    for (const reference of [`BO-${orderId}`, `bo ${orderId}`]) {
      const response = await movement({
        type: "issue",
        sku: wire.sku,
        lot: "SP-B",
        location: rackB,
        quantity: 0.1,
        reference,
      });
      expect(response.status, reference).toBe(400);
      const body = await response.json();
      expect(body.error.fields.reference[0]).toContain("buildOrderId");
      expect(body.error.fields.reference[0]).toContain(
        `/build-orders/${orderId}`,
      );
    }
    expect(await movementCount()).toBe(before);
    expect(await wireLine(orderId)).toMatchObject({ issued: 0.9 });
  });

  it("keeps an ordinary movement's answer as it was, and buildOrderId only on an issue", async () => {
    const plain = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-B",
      location: rackB,
      quantity: 0.1,
      reference: "JOB-77",
    });
    expect(plain.status, await plain.clone().text()).toBe(201);
    expect(Object.keys(await plain.json()).sort()).toEqual([
      "balance",
      "movement",
    ]);
    const receipt = await movement({
      type: "receipt",
      sku: part.sku,
      location: rackB,
      quantity: 1,
      unitCost: 2.5,
      buildOrderId: orderId,
    });
    expect(receipt.status).toBe(400);
    expect((await receipt.json()).error.fields.buildOrderId).toBeDefined();
  });
  it("refuses a build-order reference written with another dash, a sign or full-width letters", async () => {
    const before = await movementCount();
    const fullWidth = (text: string) =>
      text.replace(/[A-Z0-9-]/g, (c) =>
        String.fromCharCode(c.charCodeAt(0) + 0xfee0),
      );
    for (const reference of [
      `BO\u2212${orderId}`, // minus sign
      `BO\u2012${orderId}`, // figure dash
      fullWidth(`BO-${orderId}`),
      `BO#${orderId}`,
      `build order ${orderId}`,
    ]) {
      const response = await movement({
        type: "issue",
        sku: wire.sku,
        lot: "SP-B",
        location: rackB,
        quantity: 0.1,
        reference,
      });
      expect(response.status, reference).toBe(400);
      expect(
        (await response.json()).error.fields.reference[0],
        reference,
      ).toContain(`/build-orders/${orderId}`);
    }
    expect(await movementCount()).toBe(before);
  });

  it("refuses a plain issue with both a quantity and a gross weight (400 on grossKg), as for an order", async () => {
    const before = await movementCount();
    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      // SP-A holds 3.90 kg net: 4.00 kg gross − 0.60 kg tare would take 0.500 kg, not the 0.1 kg asked.
      quantity: 0.1,
      grossKg: 4,
      reference: "JOB-78",
    });
    expect(response.status, await response.clone().text()).toBe(400);
    expect((await response.json()).error.fields.grossKg[0]).toContain(
      "not both",
    );
    expect(await movementCount()).toBe(before);
  });

  it("checks the unit named with an issue to an order as a plain issue does (400 on unit)", async () => {
    const before = await movementCount();
    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      quantity: 0.1,
      unit: "pcs",
      buildOrderId: orderId,
    });
    expect(response.status, await response.clone().text()).toBe(400);
    expect((await response.json()).error.fields.unit[0]).toContain(
      "stocked in kg",
    );
    expect(await movementCount()).toBe(before);
    expect(await wireLine(orderId)).toMatchObject({
      reserved: 0.902,
      issued: 0.9,
    });
  });

  it("answers 409 naming what the order holds when more is asked, writing nothing", async () => {
    const before = await movementCount();
    const response = await movement({
      type: "issue",
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      quantity: 1,
      buildOrderId: orderId,
    });
    expect(response.status).toBe(409);
    const body = await response.json();
    // Held 0.902 kg on SP-A (1.802 − 0.5 − 0.4, by hand).
    expect(body.error.message).toContain(
      `BO-${orderId} holds only 0.902 kg of ${wire.sku} lot SP-A`,
    );
    expect(body.error.fields.quantity).toBeDefined();
    expect(await movementCount()).toBe(before);
    expect(await wireLine(orderId)).toMatchObject({
      reserved: 0.902,
      issued: 0.9,
    });
  });

  it("lets only one of two storekeepers take the last of what the order holds at the same moment", async () => {
    // Both ask 0.6 kg of the 0.902 kg held: the order's lock queues them, the second finds 0.302 kg.
    const ask = () =>
      movement({
        type: "issue",
        sku: wire.sku,
        lot: "SP-A",
        location: rackA,
        quantity: 0.6,
        buildOrderId: orderId,
      });
    const answers = await Promise.all([ask(), ask()]);
    expect(answers.map((answer) => answer.status).sort()).toEqual([201, 409]);
    expect(await wireLine(orderId)).toMatchObject({
      reserved: 0.302,
      issued: 1.5,
    });
    const books = await reservationBooks(wire.id);
    expect(books.grams(books.reserved)).toBe(books.heldTotal);
    expect(books.linesReserved).toBe(books.heldTotal);
  });
});
