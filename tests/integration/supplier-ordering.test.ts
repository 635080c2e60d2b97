/**
 * A supplier's ordering settings (order e-mail, when the wire's metal base is fixed,
 * over-delivery tolerances) through the forms and the API, field by field, and its
 * delivery record over the last 12 months on its page.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, postForm, sendJson, signInAs } from "../support/app-client";
import {
  dayFromToday,
  insertOrder,
  supplierWithLeadTime,
} from "../support/open-order-fixtures";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
  uniqueCode,
} from "../support/test-database";
import { demoPassword } from "../../seed/demo-people";

let buyer = "";
let builder = "";
let buyerId = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  buyerId = await createPerson({
    email: `po-author-${uniqueCode("P").toLowerCase()}@turnledger.test`,
    roles: ["buyer"],
    password: demoPassword(),
  });
});
afterAll(closeTestDatabase);

async function stored(name: string) {
  const [rows] = await testDatabase().query(
    "SELECT order_email AS orderEmail, metal_base_fixed_at AS fixedAt, wire_tolerance_percent AS wire, piece_tolerance_percent AS pieces FROM suppliers WHERE name = ?",
    [name],
  );
  return rows as {
    orderEmail: string | null;
    fixedAt: string;
    wire: string;
    pieces: string;
  }[];
}

describe("a supplier's ordering settings", () => {
  it("are kept from the new-supplier form and shown on its page", async () => {
    const name = `Enamel works ${uniqueCode("S")}`;
    const response = await postForm(
      "/suppliers",
      {
        name,
        currency: "EUR",
        orderEmail: "po@enamel.example",
        metalBaseFixedAt: "delivery",
        wireTolerancePercent: "7.5",
        pieceTolerancePercent: "2",
      },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(302);
    expect(await stored(name)).toEqual([
      {
        orderEmail: "po@enamel.example",
        fixedAt: "delivery",
        wire: "7.50",
        pieces: "2.00",
      },
    ]);
    const [[{ id }]] = (await testDatabase().query(
      "SELECT id FROM suppliers WHERE name = ?",
      [name],
    )) as unknown as [[{ id: number }]];
    const page = await (await get(`/suppliers/${id}`, builder)).text();
    expect(page).toContain("po@enamel.example");
    expect(page).toContain("fixed at delivery");
    expect(page).toContain("up to 7.50\u00a0%");
    expect(page).toContain("up to 2\u00a0%");
    expect(page).toContain("No deliveries in the last 12 months.");
  });

  it("start from the base fixed at order, wire 10 % and pieces 0 %", async () => {
    const name = `Plain mill ${uniqueCode("S")}`;
    const created = await sendJson(
      "POST",
      "/api/v1/suppliers",
      { name, currency: "EUR" },
      buyer,
    );
    expect(created.status).toBe(201);
    expect(await created.json()).toMatchObject({
      orderEmail: null,
      metalBaseFixedAt: "order",
      wireTolerancePercent: 10,
      pieceTolerancePercent: 0,
    });
    expect(await stored(name)).toEqual([
      { orderEmail: null, fixedAt: "order", wire: "10.00", pieces: "0.00" },
    ]);
  });

  it("refuse bad values field by field in the form and the API, writing nothing", async () => {
    const name = `Strict mill ${uniqueCode("S")}`;
    const form = await postForm(
      "/suppliers",
      {
        name,
        currency: "EUR",
        orderEmail: "po-at-mill",
        metalBaseFixedAt: "invoice",
        wireTolerancePercent: "150",
        pieceTolerancePercent: "-1",
      },
      buyer,
    );
    expect(form.status).toBe(400);
    const html = await form.text();
    expect(html).toContain("Give a valid e-mail address for orders.");
    expect(html).toContain("The metal base is fixed at order or at delivery.");
    expect(html).toContain("The wire tolerance is at most 100 %.");
    expect(html).toContain("The piece tolerance cannot be negative.");
    expect(await stored(name)).toEqual([]);

    const id = await supplierWithLeadTime(name, 7);
    const patch = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { wireTolerancePercent: 100.5, orderEmail: "nope" },
      buyer,
    );
    expect(patch.status).toBe(400);
    const body = (await patch.json()) as {
      error: { fields: Record<string, string[]> };
    };
    expect(Object.keys(body.error.fields).sort()).toEqual([
      "orderEmail",
      "wireTolerancePercent",
    ]);
    expect(await stored(name)).toEqual([
      { orderEmail: null, fixedAt: "order", wire: "10.00", pieces: "0.00" },
    ]);

    const good = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { pieceTolerancePercent: 1.25, orderEmail: "orders@strict.example" },
      buyer,
    );
    expect(good.status).toBe(200);
    expect(await good.json()).toMatchObject({
      pieceTolerancePercent: 1.25,
      wireTolerancePercent: 10,
      orderEmail: "orders@strict.example",
    });
    // Builders read, never change.
    const refused = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { pieceTolerancePercent: 5 },
      builder,
    );
    expect(refused.status).toBe(403);
    expect((await stored(name))[0]!.pieces).toBe("1.25");
  });
});

describe("a supplier's delivery record", () => {
  it("shows on-time and in-full rates over the last 12 months: a worked example by hand", async () => {
    const name = `Record mill ${uniqueCode("S")}`;
    const supplierId = await supplierWithLeadTime(name, 14);
    const skuResponse = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku: uniqueCode("REC"),
        name: "Lamination stack",
        unit: "pcs",
      },
      buyer,
    );
    const { sku } = (await skuResponse.json()) as { sku: string };
    const day = (days: number) => new Date(`${dayFromToday(days)}T09:00:00Z`);
    // 1. Expected 40 days ago, all came 42 days ago: on time, in full.
    // 2. Expected 30 days ago, all came 25 days ago: late, in full.
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "received",
      lines: [
        {
          sku,
          quantity: "10",
          received: "10",
          expectedDate: dayFromToday(-40),
          completedAt: day(-42),
        },
        {
          sku,
          quantity: "10",
          received: "10",
          expectedDate: dayFromToday(-30),
          completedAt: day(-25),
        },
      ],
    });
    // 3. Expected 20 days ago, 6 of 10 came, the order closed short 5 days ago: late, not in full.
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "closed_short",
      updatedAt: day(-5),
      lines: [
        { sku, quantity: "10", received: "6", expectedDate: dayFromToday(-20) },
      ],
    });
    // 4. Completed 400 days ago: outside the window. 5. Still open: not finished.
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "received",
      lines: [
        {
          sku,
          quantity: "10",
          received: "10",
          expectedDate: dayFromToday(-410),
          completedAt: day(-400),
        },
      ],
    });
    await insertOrder({
      supplierId,
      userId: buyerId,
      status: "sent",
      lines: [{ sku, quantity: "10", expectedDate: dayFromToday(-2) }],
    });
    // Counted: 1, 2, 3. On time: 1 → 1 of 3 = 33 %. In full: 1, 2 → 2 of 3 = 67 %.
    const page = await (await get(`/suppliers/${supplierId}`, builder)).text();
    expect(page).toContain("33 % (1 of 3 lines)");
    expect(page).toContain("67 % (2 of 3 lines)");
    expect(page).not.toContain("No deliveries in the last 12 months.");
  });
});
