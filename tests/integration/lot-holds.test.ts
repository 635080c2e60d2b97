/**
 * Lots on hold (quality block, decision 039), against the real database through the
 * API and the page actions: a held lot refuses issues (plain and a build order's issue
 * of its reserved stock), transfers and reservations with 409 and the reason, writing
 * nothing; scrap, receipts and a reservation given back keep `items.held` right; a
 * release lets the lot be used again.
 *
 * The figures are worked by hand in the comments (pieces, so every step is whole):
 * lot A 10 pieces at rack A, lot B 6 pieces at rack B; order 1 needs 4 pieces.
 */
import { and, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { items, lotHoldEvents, lots, stockAlerts } from "~/db/schema";
import {
  baseUrl,
  flashCookieFrom,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import {
  createPartItem,
  receive,
  reservationBooks,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  testDb,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
let rackA = "";
let rackB = "";
let part: { sku: string; id: number };
let other: { sku: string; id: number };
let design: { designId: number; revision: number };
const lotA = uniqueCode("LA");
const lotB = uniqueCode("LB");
const shared = uniqueCode("LS");
const reason = "Bore out of tolerance on the incoming check";

const movement = (body: Record<string, unknown>) =>
  sendJson("POST", "/api/v1/stock-movements", body, storekeeper);

async function item(sku = part.sku) {
  const response = await get(`/api/v1/items/${sku}`, storekeeper);
  expect(response.status).toBe(200);
  return (await response.json()) as {
    onHand: number;
    reserved: number;
    held: number;
    available: number;
    balances: {
      lot: string | null;
      onHand: number;
      holdReason: string | null;
    }[];
  };
}

/** Every balance row and movement row of the part, to show a refusal wrote nothing. */
async function ledgerState() {
  const [balances] = await testDatabase().query(
    "SELECT lot_id, location_id, on_hand, reserved FROM stock_balances WHERE item_id = ? ORDER BY lot_id, location_id",
    [part.id],
  );
  const [moves] = await testDatabase().query(
    "SELECT COUNT(*) AS n FROM stock_movements WHERE item_id = ?",
    [part.id],
  );
  const [kept] = await testDatabase().query(
    "SELECT on_hand, reserved, held FROM items WHERE id = ?",
    [part.id],
  );
  return { balances, moves, kept };
}

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

const orderStep = (id: number, step: string, body: unknown = {}) =>
  sendJson("POST", `/api/v1/build-orders/${id}/${step}`, body, builder);

const hold = (number: string, body: unknown, query = "") =>
  sendJson("POST", `/api/v1/lots/${number}/hold${query}`, body, storekeeper);
const release = (number: string, body: unknown, query = "") =>
  sendJson("POST", `/api/v1/lots/${number}/release${query}`, body, storekeeper);

async function lotIdOf(number: string, itemId = part.id) {
  const [row] = await testDb()
    .select({ id: lots.id })
    .from(lots)
    .where(and(eq(lots.lotNumber, number), eq(lots.itemId, itemId)));
  return row!.id;
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  rackA = await createLocation(uniqueCode("RA"));
  rackB = await createLocation(uniqueCode("RB"));
  part = await createPartItem(buyer, "pcs", "Rotor hub");
  other = await createPartItem(buyer, "pcs", "Shaft key");
  // Lot A first: the oldest lot (same day, lower id), the one a reservation takes first.
  await receive(storekeeper, {
    sku: part.sku,
    lot: lotA,
    location: rackA,
    quantity: 10,
    unitCost: 3,
  });
  await receive(storekeeper, {
    sku: part.sku,
    lot: lotB,
    location: rackB,
    quantity: 6,
    unitCost: 3,
  });
  // One lot number on two items: the API needs ?sku= for it.
  for (const sku of [part.sku, other.sku])
    await receive(storekeeper, {
      sku,
      lot: shared,
      location: rackB,
      quantity: 1,
      unitCost: 1,
    });
  design = await createDesign([
    { kind: "part", itemId: part.id, quantityPerMotor: "4" },
  ]);
});
afterAll(closeTestDatabase);

describe("a lot on hold", () => {
  let order1 = 0;

  it("keeps what was reserved before the hold, and holds only the free part", async () => {
    order1 = await createOrder(1);
    const reserved = await orderStep(order1, "reserve");
    expect(reserved.status, await reserved.clone().text()).toBe(200);
    expect((await reserved.json()).reserved).toEqual([
      expect.objectContaining({ lot: lotA, location: rackA, quantity: 4 }),
    ]);

    const response = await hold(lotA, { reason }, `?sku=${part.sku}`);
    expect(response.status, await response.clone().text()).toBe(200);
    const body = await response.json();
    expect(body).toEqual({
      id: await lotIdOf(lotA),
      number: lotA,
      sku: part.sku,
      held: true,
      holdReason: reason,
      heldAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/),
      heldBy: "Test storekeeper",
    });
    // Lot A: 10 on hand − 4 reserved = 6 held. Item: 17 on hand (10 + 6 + 1 of the shared
    // lot) − 4 reserved − 6 held = 7 available.
    expect(await item()).toMatchObject({
      onHand: 17,
      reserved: 4,
      held: 6,
      available: 7,
    });
    expect(
      (await item()).balances.find((balance) => balance.lot === lotA),
    ).toMatchObject({ holdReason: reason });
    const events = await testDb()
      .select({ action: lotHoldEvents.action, reason: lotHoldEvents.reason })
      .from(lotHoldEvents)
      .where(eq(lotHoldEvents.lotId, body.id));
    expect(events).toEqual([{ action: "hold", reason }]);
  });

  it("refuses an issue and a transfer from it with 409 and the reason, writing nothing", async () => {
    const before = await ledgerState();
    for (const refused of [
      { type: "issue", quantity: 1 },
      { type: "transfer", quantity: 1, toLocation: rackB },
    ]) {
      const response = await movement({
        ...refused,
        sku: part.sku,
        lot: lotA,
        location: rackA,
      });
      expect(response.status).toBe(409);
      const { error } = await response.json();
      expect(error.message).toBe(`Lot ${lotA} is on hold: ${reason}`);
      expect(error.fields).toEqual({ lot: [error.message] });
    }
    expect(await ledgerState()).toEqual(before);
  });

  it("refuses the build order's issue of the stock it reserved there, writing nothing", async () => {
    const before = await ledgerState();
    const booksBefore = await reservationBooks(part.id);
    const response = await movement({
      type: "issue",
      sku: part.sku,
      lot: lotA,
      location: rackA,
      quantity: 1,
      buildOrderId: order1,
    });
    expect(response.status).toBe(409);
    expect((await response.json()).error.message).toBe(
      `Lot ${lotA} is on hold: ${reason}`,
    );
    expect(await ledgerState()).toEqual(before);
    const booksAfter = await reservationBooks(part.id);
    expect(booksAfter.balances).toEqual(booksBefore.balances);
    expect(booksAfter.held).toEqual(booksBefore.held);
    expect(booksAfter.linesReserved).toBe(booksBefore.linesReserved);
  });

  it("is skipped by a reservation: 409 with the reason when the rest is short, nothing reserved", async () => {
    // Two motors need 8 pieces; free outside the hold: lot B 6 + shared lot 1 = 7.
    const order2 = await createOrder(2);
    const before = await ledgerState();
    const refused = await orderStep(order2, "reserve");
    expect(refused.status).toBe(409);
    const { error } = await refused.json();
    expect(error.message).toContain(`${part.sku} short by 1 piece`);
    expect(error.message).toContain(`Lot ${lotA} is on hold: ${reason}`);
    expect(error.message).toContain("Nothing was reserved.");
    expect(await ledgerState()).toEqual(before);

    // Reserving what there is takes lot B and the shared lot, never lot A.
    const partial = await orderStep(order2, "reserve", { partial: true });
    expect(partial.status, await partial.clone().text()).toBe(200);
    const taken = (await partial.json()).reserved as { lot: string }[];
    expect(taken.map((place) => place.lot).sort()).toEqual(
      [lotB, shared].sort(),
    );
    // 17 on hand − (4 + 7) reserved − 6 held = 0 available.
    expect(await item()).toMatchObject({ reserved: 11, held: 6, available: 0 });
    const cancelled = await orderStep(order2, "cancel");
    expect(cancelled.status).toBe(200);
  });

  it("takes scrap, a receipt and a count, and keeps its held stock right", async () => {
    const scrap = await movement({
      type: "scrap",
      sku: part.sku,
      lot: lotA,
      location: rackA,
      quantity: 1,
      note: "bore 0.05 mm over",
    });
    expect(scrap.status, await scrap.clone().text()).toBe(201);
    // Lot A 9 on hand − 4 reserved = 5 held; item 16 − 4 − 5 = 7 available.
    expect((await scrap.json()).balance).toEqual({
      onHand: 16,
      reserved: 4,
      available: 7,
    });
    expect(await item()).toMatchObject({ onHand: 16, held: 5, available: 7 });

    await receive(storekeeper, {
      sku: part.sku,
      lot: lotA,
      location: rackA,
      quantity: 2,
      unitCost: 3,
    });
    // Lot A 11 − 4 = 7 held; item 18 − 4 − 7 = 7 available: held stock adds nothing usable.
    expect(await item()).toMatchObject({ onHand: 18, held: 7, available: 7 });

    const count = await movement({
      type: "count",
      sku: part.sku,
      lot: lotA,
      location: rackA,
      quantity: 9,
    });
    expect(count.status, await count.clone().text()).toBe(201);
    // Counted 9: lot A 9 − 4 = 5 held; item 16 − 4 − 5 = 7 available.
    expect(await item()).toMatchObject({ onHand: 16, held: 5, available: 7 });
  });

  it("holds again what a build order gives back on it", async () => {
    const cancelled = await orderStep(order1, "cancel");
    expect(cancelled.status, await cancelled.clone().text()).toBe(200);
    // Order 1's 4 pieces on lot A are free of the order but on hold: 9 − 0 = 9 held;
    // item 16 − 0 − 9 = 7 available, as before.
    expect(await item()).toMatchObject({
      onHand: 16,
      reserved: 0,
      held: 9,
      available: 7,
    });
  });

  it("refuses a second hold and answers the release with the lot free again", async () => {
    const again = await hold(lotA, { reason: "again" }, `?sku=${part.sku}`);
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toBe(
      `Lot ${lotA} is already on hold: ${reason}`,
    );

    const response = await release(lotA, undefined, `?sku=${part.sku}`);
    expect(response.status, await response.clone().text()).toBe(200);
    expect(await response.json()).toMatchObject({
      number: lotA,
      held: false,
      holdReason: null,
      heldAt: null,
      heldBy: null,
    });
    expect(await item()).toMatchObject({ onHand: 16, held: 0, available: 16 });

    const twice = await release(lotA, {}, `?sku=${part.sku}`);
    expect(twice.status).toBe(409);
    expect((await twice.json()).error.message).toBe(
      `Lot ${lotA} is not on hold.`,
    );
  });

  it("can be issued and reserved again once released", async () => {
    const issue = await movement({
      type: "issue",
      sku: part.sku,
      lot: lotA,
      location: rackA,
      quantity: 1,
    });
    expect(issue.status, await issue.clone().text()).toBe(201);
    const order3 = await createOrder(2);
    const reserved = await orderStep(order3, "reserve");
    expect(reserved.status, await reserved.clone().text()).toBe(200);
    // Oldest first: 8 pieces all from lot A (8 left of 9 after the issue).
    expect((await reserved.json()).reserved).toEqual([
      expect.objectContaining({ lot: lotA, quantity: 8 }),
    ]);
  });
});

describe("a hold and the low-stock alert", () => {
  it("opens the alert when the hold takes the item below its reorder point, and the release closes it", async () => {
    const sku = uniqueCode("LOW");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku,
        name: "Shaft circlip",
        unit: "pcs",
        reorderPoint: 5,
        reorderQuantity: 20,
      },
      buyer,
    );
    expect(created.status).toBe(201);
    const lot = uniqueCode("LC");
    await receive(storekeeper, {
      sku,
      lot,
      location: rackA,
      quantity: 4,
      unitCost: 1,
    });
    await receive(storekeeper, {
      sku,
      lot: uniqueCode("LD"),
      location: rackA,
      quantity: 4,
      unitCost: 1,
    });
    const [{ id }] = (await testDb()
      .select({ id: items.id })
      .from(items)
      .where(eq(items.sku, sku))) as [{ id: number }];
    const openAlerts = async () =>
      (
        await testDb()
          .select({ id: stockAlerts.id })
          .from(stockAlerts)
          .where(eq(stockAlerts.openItemId, id))
      ).length;
    // 8 on hand, reorder point 5: not low.
    expect(await openAlerts()).toBe(0);
    // 4 held: 8 − 4 = 4 available, below 5.
    expect((await hold(lot, { reason: "Wrong temper" })).status).toBe(200);
    expect(await openAlerts()).toBe(1);
    expect((await release(lot, {})).status).toBe(200);
    expect(await openAlerts()).toBe(0);
  });
});

describe("the hold API's answers", () => {
  it("answers 404 for an unknown lot, and for a lot the named item has not", async () => {
    const unknown = await hold(uniqueCode("NO"), { reason });
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.message).toMatch(/^No lot "/);
    const wrongItem = await hold(lotA, { reason }, `?sku=${other.sku}`);
    expect(wrongItem.status).toBe(404);
  });

  it("answers 409 naming the SKUs when a lot number is two items' lot, and takes ?sku=", async () => {
    const ambiguous = await hold(shared, { reason });
    expect(ambiguous.status).toBe(409);
    const { error } = await ambiguous.json();
    expect(error.message).toContain(part.sku);
    expect(error.message).toContain(other.sku);
    expect(error.fields.sku).toHaveLength(1);

    const narrowed = await hold(shared, { reason }, `?sku=${other.sku}`);
    expect(narrowed.status, await narrowed.clone().text()).toBe(200);
    expect(await narrowed.json()).toMatchObject({
      sku: other.sku,
      number: shared,
      held: true,
    });
    // 1 piece on hand, 1 held, 0 available; the part's own lot of that number is untouched.
    expect(await item(other.sku)).toMatchObject({ held: 1, available: 0 });
    expect((await item()).held).toBe(0);
    const back = await release(
      shared,
      { reason: "checked: fine" },
      `?sku=${other.sku}`,
    );
    expect(back.status).toBe(200);
  });

  it("answers 400 naming the field for a missing, empty or overlong reason, or a body that is not JSON", async () => {
    for (const body of [{}, { reason: "   " }, { reason: "x".repeat(301) }]) {
      const response = await hold(lotB, body, `?sku=${part.sku}`);
      expect(response.status).toBe(400);
      expect(Object.keys((await response.json()).error.fields)).toEqual([
        "reason",
      ]);
    }
    const notJson = await fetch(`${baseUrl()}/api/v1/lots/${lotB}/hold`, {
      method: "POST",
      headers: {
        Cookie: storekeeper,
        Origin: baseUrl(),
        "Content-Type": "application/json",
      },
      body: "reason=x",
    });
    expect(notJson.status).toBe(400);
    const overlongNote = await release(lotB, { reason: "y".repeat(301) });
    expect(overlongNote.status).toBe(400);
    // Nothing was held by the refused requests.
    expect((await item()).held).toBe(0);
  });

  it("is for storekeepers and admins: a builder gets 403", async () => {
    const response = await sendJson(
      "POST",
      `/api/v1/lots/${lotB}/hold?sku=${part.sku}`,
      { reason },
      builder,
    );
    expect(response.status).toBe(403);
  });
});

describe("the lot page's hold and release actions", () => {
  it("hold with a reason, redirect to the lot's page with the message, and release", async () => {
    const lotId = await lotIdOf(lotB);
    const held = await postForm(
      `/stock/lots/${lotId}/hold`,
      { reason },
      storekeeper,
    );
    expect(held.status).toBe(302);
    expect(held.headers.get("location")).toBe(`/stock/lots/${lotId}`);
    expect(flashCookieFrom(held)).not.toBeNull();
    // The message shows on the next page (the item page stands in for the lot page here).
    const shown = await get(
      `/stock/items/${part.sku}`,
      `${storekeeper}; ${flashCookieFrom(held)}`,
    );
    const html = await shown.text();
    expect(html).toContain(
      `Lot ${lotB} of ${part.sku} is on hold: ${reason}. It cannot be issued or reserved until it is released.`,
    );
    expect(html).toContain("On hold");
    expect((await item()).held).toBe(6);

    const again = await postForm(
      `/stock/lots/${lotId}/hold`,
      { reason },
      storekeeper,
    );
    expect(again.status).toBe(409);

    const released = await postForm(
      `/stock/lots/${lotId}/release`,
      { reason: "" },
      storekeeper,
    );
    expect(released.status).toBe(302);
    expect(released.headers.get("location")).toBe(`/stock/lots/${lotId}`);
    expect((await item()).held).toBe(0);
  });

  it("answers 400 without a reason and 404 for an unknown lot, holding nothing", async () => {
    const lotId = await lotIdOf(lotB);
    const empty = await postForm(
      `/stock/lots/${lotId}/hold`,
      { reason: " " },
      storekeeper,
    );
    expect(empty.status).toBe(400);
    expect(await empty.text()).toContain("Say why the lot is on hold.");
    const unknown = await postForm(
      "/stock/lots/2147483647/hold",
      { reason },
      storekeeper,
    );
    expect(unknown.status).toBe(404);
    expect((await item()).held).toBe(0);
  });
});
