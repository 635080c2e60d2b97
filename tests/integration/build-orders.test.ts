/**
 * Build orders against the real app and MariaDB: create for N motors of a released
 * revision, reserve (all or nothing, or partial), issue through the stock ledger (by
 * quantity and by weighing a spool back), complete with planned versus actual, cancel,
 * roles, bad input, and many builders reserving the same stock at once.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, get, sendJson, signInAs } from "../support/app-client";
import {
  createMagnetItem,
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
let admin = "";
let rackA = "";
let rackB = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  admin = await signInAs("admin");
  rackA = await createLocation(uniqueCode("RA"));
  rackB = await createLocation(uniqueCode("RB"));
});
afterAll(closeTestDatabase);

/** One coil line of worked check 4 (0.80 mm copper, 40 turns, active 50 mm, end turn 30 mm) × 12 coils, 5 % scrap. */
const twelveCoils = (itemId: number) => ({
  kind: "coil" as const,
  itemId,
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
  coilsPerMotor: 12,
  scrapPercent: 5,
});

interface OrderJson {
  id: number;
  status: string;
  quantity: number;
  lines: {
    sku: string;
    unit: string;
    required: number;
    reserved: number;
    issued: number;
    toReserve: number;
    available: number;
    short: number;
    difference: number;
    plannedUnitCost: number | null;
    plannedCost: number | null;
    actualCost: number;
    held: { lot: string | null; location: string; quantity: number }[];
  }[];
  costs: {
    plannedPerMotor: number;
    actualPerMotor: number;
    plannedTotal: number;
    actualTotal: number;
  };
  events: { fromStatus: string | null; toStatus: string; note: string }[];
}

async function createOrder(
  design: { designId: number; revision: number },
  quantity: number,
  cookie = builder,
): Promise<number> {
  const response = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity },
    cookie,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  const body = (await response.json()) as { id: number; status: string };
  expect(body.status).toBe("draft");
  return body.id;
}

async function readOrder(id: number, cookie = manager): Promise<OrderJson> {
  const response = await get(`/api/v1/build-orders/${id}`, cookie);
  expect(response.status).toBe(200);
  return (await response.json()) as OrderJson;
}

const step = (id: number, name: string, body: unknown = {}, cookie = builder) =>
  sendJson("POST", `/api/v1/build-orders/${id}/${name}`, body, cookie);

const lineOf = (order: OrderJson, sku: string) =>
  order.lines.find((line) => line.sku === sku)!;

async function count(sql: string, values: unknown[] = []): Promise<number> {
  const [rows] = await testDatabase().query(sql, values);
  return Number((rows as { n: number }[])[0]!.n);
}

/** The kept balances of an item equal the sum of what build orders hold on them, and never exceed on hand. */
async function expectBooksBalance(itemId: number) {
  const books = await reservationBooks(itemId);
  expect(books.grams(books.reserved)).toBe(books.heldTotal);
  expect(books.linesReserved).toBe(books.heldTotal);
  expect(books.reserved).toBeLessThanOrEqual(books.onHand);
  for (const balance of books.balances) {
    expect(books.grams(balance.reserved), balance.key).toBe(
      books.grams(books.held.get(balance.key) ?? 0),
    );
    expect(balance.reserved).toBeLessThanOrEqual(balance.onHand);
  }
  return books;
}

describe("a build from order to completion", () => {
  let wire: { sku: string; id: number };
  let magnet: { sku: string; id: number };
  let part: { sku: string; id: number };
  let orderId = 0;

  it("creates an order for N motors with the required quantity per item and the planned cost", async () => {
    wire = await createWireItem(buyer);
    magnet = await createMagnetItem(buyer);
    part = await createPartItem(buyer);
    // Spool A: gross 5.40 kg, tare 0.60 kg → 4.80 kg net at 14.20; spool B: 6 kg at 15.00.
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
      sku: magnet.sku,
      location: rackA,
      quantity: 200,
      unitCost: 0.85,
    });
    await receive(storekeeper, {
      sku: part.sku,
      location: rackB,
      quantity: 20,
      unitCost: 2.5,
    });
    const design = await createDesign([
      twelveCoils(wire.id),
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 10 },
      { kind: "part", itemId: part.id, quantityPerMotor: "2" },
      { kind: "part", itemId: part.id, quantityPerMotor: "0.5" },
    ]);
    orderId = await createOrder(design, 5);

    const order = await readOrder(orderId);
    expect(order.status).toBe("draft");
    // Worked check 4: 28.599 g per coil (6.4 m × 0.50265 mm² × 8.89 g/cm³, IEC 60028);
    // × 12 coils × 1.05 scrap = 360.348 g per motor; × 5 motors = 1.80174 kg → 1.802 kg (rounded up).
    expect(lineOf(order, wire.sku)).toMatchObject({
      unit: "kg",
      required: 1.802,
      reserved: 0,
      issued: 0,
      toReserve: 1.802,
      available: 10.8,
      short: 0,
      // (4.8 kg × 14.20 + 6 kg × 15.00) ÷ 10.8 kg = 14.6444 (moving average, by hand).
      plannedUnitCost: 14.6444,
    });
    expect(lineOf(order, magnet.sku)).toMatchObject({
      unit: "pcs",
      required: 50,
      plannedUnitCost: 0.85,
    });
    // Two lines of the part, 2 + 0.5 per motor, are one requirement: 2.5 × 5 = 12.5 → 13 pieces.
    expect(lineOf(order, part.sku)).toMatchObject({
      unit: "pcs",
      required: 13,
      plannedUnitCost: 2.5,
    });
    expect(order.lines).toHaveLength(3);
    expect(order.events).toEqual([
      expect.objectContaining({ fromStatus: null, toStatus: "draft" }),
    ]);
  });

  it("reserves every line from the oldest lot first and lowers available stock", async () => {
    const response = await step(orderId, "reserve");
    expect(response.status, await response.clone().text()).toBe(200);
    const reserved = (await response.json()) as {
      status: string;
      reserved: {
        sku: string;
        lot: string | null;
        location: string;
        quantity: number;
      }[];
      shortages: unknown[];
    };
    expect(reserved.status).toBe("reserved");
    expect(reserved.shortages).toEqual([]);
    // Both spools came in today: the older lot (SP-A, received first) is taken first.
    expect(reserved.reserved).toContainEqual({
      sku: wire.sku,
      lot: "SP-A",
      location: rackA,
      quantity: 1.802,
      unit: "kg",
    });
    const order = await readOrder(orderId);
    expect(lineOf(order, wire.sku)).toMatchObject({
      reserved: 1.802,
      toReserve: 0,
      available: 8.998,
    });
    expect(lineOf(order, magnet.sku).reserved).toBe(50);
    expect(lineOf(order, part.sku).reserved).toBe(13);
    const item = await (await get(`/api/v1/items/${wire.sku}`, manager)).json();
    expect(item).toMatchObject({
      onHand: 10.8,
      reserved: 1.802,
      available: 8.998,
    });
    for (const id of [wire.id, magnet.id, part.id])
      await expectBooksBalance(id);
  });

  it("keeps held stock from a plain issue: the ledger refuses to take it", async () => {
    // SP-A: 4.8 kg on hand, 1.802 kg held → 2.998 kg free.
    const response = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      {
        type: "issue",
        sku: wire.sku,
        lot: "SP-A",
        location: rackA,
        quantity: 3,
      },
      storekeeper,
    );
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toContain("2.998");
  });

  it("issues by weighing the spool back, through the ledger, and the order is in progress", async () => {
    const movementsBefore = await count(
      "SELECT COUNT(*) AS n FROM stock_movements",
    );
    // SP-A held 4.80 kg net; weighed at 4.60 kg gross − 0.60 kg tare = 4.00 kg: 0.800 kg left the spool.
    const response = await step(
      orderId,
      "issue",
      { sku: wire.sku, lot: "SP-A", location: rackA, grossKg: 4.6 },
      storekeeper,
    );
    expect(response.status, await response.clone().text()).toBe(201);
    const issued = await response.json();
    expect(issued).toMatchObject({
      status: "in_progress",
      movement: { type: "issue", sku: wire.sku, lot: "SP-A", quantity: -0.8 },
      line: { required: 1.802, reserved: 1.002, issued: 0.8, unit: "kg" },
      balance: { onHand: 10, reserved: 1.002, available: 8.998 },
    });
    expect(await count("SELECT COUNT(*) AS n FROM stock_movements")).toBe(
      movementsBefore + 1,
    );
    const [rows] = await testDatabase().query(
      "SELECT reference, gross_kg FROM stock_movements WHERE id = ?",
      [issued.movement.id],
    );
    expect(rows).toEqual([{ reference: `BO-${orderId}`, gross_kg: "4.600" }]);
    await expectBooksBalance(wire.id);
  });

  it("refuses to issue more than the order holds there, or from a lot it does not hold, writing nothing", async () => {
    const movementsBefore = await count(
      "SELECT COUNT(*) AS n FROM stock_movements",
    );
    const tooMuch = await step(
      orderId,
      "issue",
      { sku: wire.sku, lot: "SP-A", location: rackA, quantity: 1.1 },
      storekeeper,
    );
    expect(tooMuch.status).toBe(409);
    const refusal = await tooMuch.json();
    expect(refusal.error.message).toContain("holds only 1.002 kg");
    expect(refusal.error.fields.quantity).toBeDefined();
    const otherLot = await step(
      orderId,
      "issue",
      { sku: wire.sku, lot: "SP-B", location: rackB, quantity: 0.1 },
      storekeeper,
    );
    expect(otherLot.status).toBe(409);
    expect((await otherLot.json()).error.message).toContain("holds no");
    const notNeeded = await step(
      orderId,
      "issue",
      { sku: "NO-SUCH-SKU", location: rackA, quantity: 1 },
      storekeeper,
    );
    expect(notNeeded.status).toBe(400);
    expect(await count("SELECT COUNT(*) AS n FROM stock_movements")).toBe(
      movementsBefore,
    );
    const order = await readOrder(orderId);
    expect(lineOf(order, wire.sku)).toMatchObject({
      reserved: 1.002,
      issued: 0.8,
    });
    await expectBooksBalance(wire.id);
  });

  it("issues the rest by quantity and completes with planned versus actual and the cost per motor", async () => {
    for (const body of [
      { sku: wire.sku, lot: "SP-A", location: rackA, quantity: 0.9 },
      { sku: magnet.sku, location: rackA, quantity: 48 },
      { sku: part.sku, location: rackB, quantity: 13 },
    ]) {
      const response = await step(orderId, "issue", body, storekeeper);
      expect(response.status, await response.clone().text()).toBe(201);
    }
    const response = await step(orderId, "complete");
    expect(response.status, await response.clone().text()).toBe(200);
    const completed = (await response.json()) as OrderJson & {
      released: { sku: string; quantity: number }[];
    };
    expect(completed.status).toBe("complete");
    // What was still held (0.102 kg of wire, 2 magnets) goes back to the free stock.
    expect(
      completed.released.map(({ sku, quantity }) => [sku, quantity]).sort(),
    ).toEqual(
      [
        [wire.sku, 0.102],
        [magnet.sku, 2],
      ].sort(),
    );
    expect(lineOf(completed, wire.sku)).toMatchObject({
      required: 1.802,
      issued: 1.7,
      reserved: 0,
      difference: -0.102,
      // 1.802 kg × 14.6444 = 26.3892; issued 0.8 × 14.6444 = 11.7155 and 0.9 × 14.6444 = 13.1800.
      plannedCost: 26.3892,
      actualCost: 24.8955,
    });
    expect(lineOf(completed, magnet.sku)).toMatchObject({
      issued: 48,
      difference: -2,
      plannedCost: 42.5,
      actualCost: 40.8,
    });
    expect(lineOf(completed, part.sku)).toMatchObject({
      issued: 13,
      difference: 0,
      actualCost: 32.5,
    });
    // Actual: (24.8955 + 40.8 + 32.5) ÷ 5 motors = 98.1955 ÷ 5 = 19.6391 per motor.
    expect(completed.costs.actualTotal).toBe(98.1955);
    expect(completed.costs.actualPerMotor).toBe(19.6391);
    // Planned: (26.3892 + 42.5 + 32.5) ÷ 5 = 101.3892 ÷ 5 = 20.27784 → 20.2778.
    expect(completed.costs.plannedPerMotor).toBe(20.2778);
    expect(completed.events.map((event) => event.toStatus)).toEqual([
      "complete",
      "in_progress",
      "reserved",
      "draft",
    ]);
    for (const id of [wire.id, magnet.id, part.id]) {
      const books = await expectBooksBalance(id);
      expect(books.reserved).toBe(0);
    }
  });

  it("refuses steps a complete order cannot take", async () => {
    for (const name of ["reserve", "cancel", "complete"]) {
      const response = await step(orderId, name);
      expect(response.status, name).toBe(409);
    }
    const issue = await step(
      orderId,
      "issue",
      { sku: magnet.sku, location: rackA, quantity: 1 },
      storekeeper,
    );
    expect(issue.status).toBe(409);
  });
});

describe("reserving when stock is short", () => {
  let magnet: { sku: string; id: number };
  let part: { sku: string; id: number };
  let design: { designId: number; revision: number };

  beforeAll(async () => {
    magnet = await createMagnetItem(buyer);
    part = await createPartItem(buyer);
    await receive(storekeeper, {
      sku: magnet.sku,
      location: rackA,
      quantity: 70,
      unitCost: 1.1,
    });
    await receive(storekeeper, {
      sku: part.sku,
      location: rackB,
      quantity: 50,
      unitCost: 3,
    });
    design = await createDesign([
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 16 },
      { kind: "part", itemId: part.id, quantityPerMotor: "2" },
    ]);
  });

  it("answers 409 listing the shortages and reserves nothing", async () => {
    const id = await createOrder(design, 5); // 80 magnets (70 in stock), 10 parts
    const response = await step(id, "reserve");
    expect(response.status).toBe(409);
    const body = await response.json();
    expect(body.error.shortages).toEqual([
      { sku: magnet.sku, required: 80, available: 70, short: 10, unit: "pcs" },
    ]);
    expect(body.error.message).toContain("Nothing was reserved");
    // 80 − 70 = 10 short, in words as a sentence reads (the JSON keeps the unit code).
    expect(body.error.message).toContain(`${magnet.sku} short by 10 pieces`);
    const order = await readOrder(id);
    expect(order.status).toBe("draft");
    expect(order.lines.map((line) => line.reserved)).toEqual([0, 0]);
    expect(lineOf(order, magnet.sku).short).toBe(10);
    expect(
      await count(
        "SELECT COUNT(*) AS n FROM build_order_reservations r JOIN build_order_lines l ON l.id = r.line_id WHERE l.order_id = ?",
        [id],
      ),
    ).toBe(0);
    for (const item of [magnet, part]) {
      const books = await expectBooksBalance(item.id);
      expect(books.reserved).toBe(0);
    }
  });

  it("reserves what is there when asked, then cancelling releases all of it", async () => {
    const id = await createOrder(design, 5);
    const response = await step(id, "reserve", { partial: true });
    expect(response.status, await response.clone().text()).toBe(200);
    const body = await response.json();
    expect(body.status).toBe("reserved");
    expect(body.shortages).toEqual([
      { sku: magnet.sku, required: 80, available: 70, short: 10, unit: "pcs" },
    ]);
    let order = await readOrder(id);
    expect(lineOf(order, magnet.sku)).toMatchObject({
      reserved: 70,
      toReserve: 10,
      available: 0,
      short: 10,
    });
    expect(lineOf(order, part.sku).reserved).toBe(10);
    expect((await expectBooksBalance(magnet.id)).reserved).toBe(70);

    // A second, full reservation of another order now finds no magnets free.
    const other = await createOrder(design, 1);
    const refused = await step(other, "reserve");
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.shortages[0]).toMatchObject({
      sku: magnet.sku,
      available: 0,
      short: 16,
    });

    const cancelled = await step(id, "cancel", { note: "design change" });
    expect(cancelled.status, await cancelled.clone().text()).toBe(200);
    expect(await cancelled.json()).toMatchObject({
      status: "cancelled",
      released: expect.arrayContaining([
        {
          sku: magnet.sku,
          lot: null,
          location: rackA,
          quantity: 70,
          unit: "pcs",
        },
      ]),
    });
    order = await readOrder(id);
    expect(order.lines.map((line) => line.reserved)).toEqual([0, 0]);
    expect(order.events[0]).toMatchObject({
      fromStatus: "reserved",
      toStatus: "cancelled",
      note: "design change",
    });
    for (const item of [magnet, part]) {
      const books = await expectBooksBalance(item.id);
      expect(books.reserved).toBe(0);
    }
    // Now the other order gets its magnets.
    expect((await step(other, "reserve")).status).toBe(200);
    await step(other, "cancel");
  });

  it("changing the number of motors releases what is held and starts again as a draft", async () => {
    const id = await createOrder(design, 2);
    expect((await step(id, "reserve")).status).toBe(200);
    const response = await sendJson(
      "PATCH",
      `/api/v1/build-orders/${id}`,
      { quantity: 3 },
      builder,
    );
    expect(response.status, await response.clone().text()).toBe(200);
    expect((await response.json()).status).toBe("draft");
    const order = await readOrder(id);
    expect(order.quantity).toBe(3);
    expect(lineOf(order, magnet.sku)).toMatchObject({
      required: 48,
      reserved: 0,
    });
    expect(lineOf(order, part.sku)).toMatchObject({ required: 6, reserved: 0 });
    expect(order.events[0]).toMatchObject({
      fromStatus: "reserved",
      toStatus: "draft",
      note: "Motors 2 → 3; held stock released.",
    });
    expect((await expectBooksBalance(magnet.id)).reserved).toBe(0);
    await step(id, "cancel");
  });
});

describe("bad input and roles", () => {
  let design: { designId: number; revision: number };
  let draftDesign: { designId: number; revision: number };
  let part: { sku: string; id: number };

  beforeAll(async () => {
    part = await createPartItem(buyer);
    await receive(storekeeper, {
      sku: part.sku,
      location: rackA,
      quantity: 30,
      unitCost: 4,
    });
    design = await createDesign([
      { kind: "part", itemId: part.id, quantityPerMotor: "1" },
    ]);
    draftDesign = await createDesign(
      [{ kind: "part", itemId: part.id, quantityPerMotor: "1" }],
      { status: "draft" },
    );
  });

  it("refuses a build of 0 motors, a draft revision and an unknown one, writing nothing", async () => {
    const before = await count("SELECT COUNT(*) AS n FROM build_orders");
    const zero = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId: design.designId, revision: 1, quantity: 0 },
      builder,
    );
    expect(zero.status).toBe(400);
    expect((await zero.json()).error.fields.quantity).toEqual([
      "The number of motors must be at least 1.",
    ]);
    const draft = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId: draftDesign.designId, revision: 1, quantity: 2 },
      builder,
    );
    expect(draft.status).toBe(409);
    const draftBody = await draft.json();
    expect(draftBody.error.message).toContain("is a draft");
    expect(draftBody.error.fields.revision).toBeDefined();
    const unknown = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId: design.designId, revision: 9, quantity: 2 },
      builder,
    );
    expect(unknown.status).toBe(404);
    const notJson = await fetch(`${baseUrl()}/api/v1/build-orders`, {
      method: "POST",
      headers: {
        Cookie: builder,
        "Content-Type": "application/json",
        Origin: baseUrl(),
      },
      body: "{",
    });
    expect(notJson.status).toBe(400);
    expect(await count("SELECT COUNT(*) AS n FROM build_orders")).toBe(before);
  });

  it("refuses bad step bodies field by field and an unknown step", async () => {
    const id = await createOrder(design, 2);
    const partial = await step(id, "reserve", { partial: "yes" });
    expect(partial.status).toBe(400);
    expect((await partial.json()).error.fields.partial).toBeDefined();
    const issueDraft = await step(
      id,
      "issue",
      { sku: part.sku, location: rackA, quantity: 1 },
      storekeeper,
    );
    expect(issueDraft.status).toBe(409);
    expect((await issueDraft.json()).error.message).toContain(
      "Reserve stock for the build order before issuing",
    );
    const neither = await step(
      id,
      "issue",
      { sku: part.sku, location: rackA },
      storekeeper,
    );
    expect(neither.status).toBe(400);
    expect((await neither.json()).error.fields.quantity).toBeDefined();
    const completeDraft = await step(id, "complete");
    expect(completeDraft.status).toBe(409);
    expect((await step(id, "melt")).status).toBe(404);
    expect((await get(`/api/v1/build-orders/${id}x`, builder)).status).toBe(
      404,
    );
    expect((await readOrder(id)).status).toBe("draft");
    await step(id, "cancel");
  });

  it("lets builders reserve, complete and cancel, storekeepers issue, and everyone read; a refusal changes nothing", async () => {
    const id = await createOrder(design, 3);
    // Not a builder: storekeeper, manager, buyer may not create, reserve or cancel.
    for (const cookie of [storekeeper, manager, buyer]) {
      const create = await sendJson(
        "POST",
        "/api/v1/build-orders",
        { designId: design.designId, revision: 1, quantity: 1 },
        cookie,
      );
      expect(create.status).toBe(403);
      for (const name of ["reserve", "cancel", "complete"])
        expect((await step(id, name, {}, cookie)).status, name).toBe(403);
      expect(
        (
          await sendJson(
            "PATCH",
            `/api/v1/build-orders/${id}`,
            { quantity: 9 },
            cookie,
          )
        ).status,
      ).toBe(403);
    }
    expect((await readOrder(id)).status).toBe("draft");
    expect((await step(id, "reserve", {}, builder)).status).toBe(200);
    // Not a storekeeper: builder, manager, buyer may not issue.
    for (const cookie of [builder, manager, buyer]) {
      const issue = await step(
        id,
        "issue",
        { sku: part.sku, location: rackA, quantity: 1 },
        cookie,
      );
      expect(issue.status).toBe(403);
    }
    let order = await readOrder(id, buyer);
    expect(lineOf(order, part.sku)).toMatchObject({ reserved: 3, issued: 0 });
    // Admins may take any step.
    expect(
      (
        await step(
          id,
          "issue",
          { sku: part.sku, location: rackA, quantity: 1 },
          admin,
        )
      ).status,
    ).toBe(201);
    expect((await step(id, "complete", {}, admin)).status).toBe(200);
    order = await readOrder(id, storekeeper);
    expect(order.status).toBe("complete");
    const list = await get(
      "/api/v1/build-orders?status=complete&pageSize=5",
      manager,
    );
    expect(list.status).toBe(200);
    const page = await list.json();
    expect(page).toMatchObject({ page: 1, pageSize: 5 });
    expect(page.buildOrders[0]).toMatchObject({
      id,
      status: "complete",
      quantity: 3,
    });
    expect(page.total).toBeGreaterThanOrEqual(1);
    expect(
      (await get("/api/v1/build-orders?status=melted", manager)).status,
    ).toBe(400);
  });
});

describe("many builders reserving the same stock at once", () => {
  it("40 concurrent reservations never hold more than is on hand; each gets all its lines or a clear 409", async () => {
    const wire = await createWireItem(buyer);
    const magnet = await createMagnetItem(buyer);
    // Three spools, 20.5 kg in all, and 400 magnets.
    for (const [lot, quantity, location] of [
      ["C-1", 8, rackA],
      ["C-2", 7.5, rackB],
      ["C-3", 5, rackA],
    ] as const) {
      await receive(storekeeper, {
        sku: wire.sku,
        lot,
        location,
        quantity,
        unitCost: 15,
      });
    }
    await receive(storekeeper, {
      sku: magnet.sku,
      location: rackB,
      quantity: 400,
      unitCost: 0.9,
    });
    const design = await createDesign([
      twelveCoils(wire.id), // 0.360348 kg per motor
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 10 },
    ]);
    const orders: number[] = [];
    for (let index = 0; index < 40; index += 1)
      orders.push(await createOrder(design, 2 + (index % 5)));

    // 40 reservations at once (≈ 160 motors wanted, stock for about 40), while a
    // storekeeper takes 0.5 kg at a time from spool C-1 with plain issues.
    const responses = await Promise.all([
      ...orders.map((id) => step(id, "reserve")),
      ...Array.from({ length: 6 }, () =>
        sendJson(
          "POST",
          "/api/v1/stock-movements",
          {
            type: "issue",
            sku: wire.sku,
            lot: "C-1",
            location: rackA,
            quantity: 0.5,
          },
          storekeeper,
        ),
      ),
    ]);
    const reserveAnswers = responses.slice(0, orders.length);
    const issueAnswers = responses.slice(orders.length);
    for (const response of issueAnswers)
      expect([201, 409]).toContain(response.status);
    const statuses = reserveAnswers.map((response) => response.status);
    for (const status of statuses) expect([200, 409]).toContain(status);
    const granted = orders.filter((_, index) => statuses[index] === 200);
    const refused = orders.filter((_, index) => statuses[index] === 409);
    expect(granted.length).toBeGreaterThan(0);
    expect(refused.length).toBeGreaterThan(0);

    for (const [index, response] of reserveAnswers.entries()) {
      const body = await response.json();
      if (response.status === 409) {
        expect(
          body.error.shortages.length,
          `order ${orders[index]}`,
        ).toBeGreaterThan(0);
        for (const shortage of body.error.shortages)
          expect(shortage.short).toBeGreaterThan(0);
      }
    }
    // Every granted order holds all of each line; every refused one holds nothing.
    let wireHeld = 0;
    let magnetsHeld = 0;
    for (const id of orders) {
      const order = await readOrder(id);
      if (granted.includes(id)) {
        expect(order.status).toBe("reserved");
        for (const line of order.lines)
          expect(line.reserved).toBe(line.required);
        wireHeld += Math.round(lineOf(order, wire.sku).reserved * 1000);
        magnetsHeld += lineOf(order, magnet.sku).reserved;
      } else {
        expect(order.status).toBe("draft");
        for (const line of order.lines) expect(line.reserved).toBe(0);
      }
    }
    const wireBooks = await expectBooksBalance(wire.id);
    const magnetBooks = await expectBooksBalance(magnet.id);
    expect(wireBooks.heldTotal).toBe(wireHeld);
    expect(magnetBooks.reserved).toBe(magnetsHeld);
    expect(magnetsHeld).toBeLessThanOrEqual(400);
    // On hand is what came in less what the plain issues took.
    const issued = issueAnswers.filter(
      (response) => response.status === 201,
    ).length;
    expect(wireBooks.grams(wireBooks.onHand)).toBe(20_500 - issued * 500);
    expect(wireHeld).toBeLessThanOrEqual(wireBooks.grams(wireBooks.onHand));

    for (const id of granted)
      expect((await step(id, "cancel")).status).toBe(200);
    expect((await expectBooksBalance(wire.id)).reserved).toBe(0);
    expect((await expectBooksBalance(magnet.id)).reserved).toBe(0);
  });
});
