/**
 * The buying plan's API against the real app and MariaDB, on a small fixture whose
 * suggestions are worked out by hand below: two items, build orders with planned starts
 * (one fully reserved), a sent purchase order's open line and a draft one (not on order),
 * price lines with pack sizes, breaks and lead times. Also the build orders' planned
 * start through their API.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { and, asc, eq, inArray, like } from "drizzle-orm";
import { items, purchaseOrderLines, purchaseOrders } from "~/db/schema";
import { get, postForm, sendJson, signInAs } from "../support/app-client";
import { itemIdOf } from "../support/build-order-fixtures";
import {
  createBuyingPlanFixture,
  type BuyingPlanFixture,
} from "../support/buying-plan-fixtures";
import { createDesign } from "../support/design-fixtures";
import { closeTestDatabase, testDb } from "../support/test-database";

interface PlanJson {
  weeks: string[];
  suggestions: {
    sku: string;
    supplierId: number | null;
    quantity: number;
    unitPrice: number | null;
    currency: string | null;
    total: number | null;
    needBy: string;
    orderBy: string;
    late: boolean;
    reason: string;
  }[];
  items: {
    sku: string;
    weeks: {
      weekStart: string;
      projected: number;
      projectedWithSuggestion: number;
    }[];
  }[];
}

let buyer = "";
let builder = "";
let storekeeper = "";
let manager = "";
let fixture: BuyingPlanFixture;
// Filled from the fixture before the tests run (see tests/support/buying-plan-fixtures.ts).
let currency = "";
let resin = "";
let bearing = "";
let supplierIds: number[] = [];
let plannedOrder = 0;
let fixtureDraft = 0;
let today = "";
const day = (offset: number) => fixture.day(offset);

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  fixture = await createBuyingPlanFixture({ buyer, builder, storekeeper });
  ({
    currency,
    resin,
    bearing,
    supplierIds,
    plannedOrder,
    fixtureDraft,
    today,
  } = fixture);
});
afterAll(closeTestDatabase);

async function readPlan(
  query = "?weeks=4",
  cookie = manager,
): Promise<PlanJson> {
  const response = await get(`/api/v1/buying-plan${query}`, cookie);
  expect(response.status, await response.clone().text()).toBe(200);
  return (await response.json()) as PlanJson;
}

describe("GET /api/v1/buying-plan: a small fixture worked out by hand", () => {
  it("weeks start on Monday of this week", async () => {
    const plan = await readPlan();
    expect(plan.weeks).toEqual([day(0), day(7), day(14), day(21)]);
    expect((await readPlan("")).weeks).toHaveLength(8);
  });

  /*
   * Resin by hand: on hand 12 kg, reserved 2 kg (BO-b holds all it needs, so it needs
   * nothing more): free 10 kg. The draft order does not count.
   *   week 0: 10. week 1: 10.
   *   week 2: 10 − 7 (BO-a: 2 × 3.5 kg) = 3 < 5: short 2 kg; at least the reorder
   *     quantity 10 kg. Coilco, 4 kg packs: 12 kg × 17.00 = 204.00 (its 25 kg break:
   *     28 kg × 16.00 = 448.00). Wirehaus: 10 kg × 21.00 = 210.00. Coilco wins.
   *     Need by Monday of week 2 (day 14); order by 14 − 10 (the line's lead time) = day 4.
   *     Then 3 + 12 = 15.
   *   week 3: 15 + 20 (the sent order, due day 22) = 35.
   */
  it("suggests 12 kg resin from Coilco and projects the weeks", async () => {
    const plan = await readPlan();
    const suggestions = plan.suggestions.filter((entry) => entry.sku === resin);
    expect(suggestions).toEqual([
      expect.objectContaining({
        supplierId: supplierIds[0],
        quantity: 12,
        unitPrice: 17,
        currency,
        total: 204,
        needBy: day(14),
        orderBy: day(4),
        late: day(4) < today,
        reason: expect.stringContaining(
          `BO-${plannedOrder} needs 7.000\u00a0kg in week of`,
        ),
      }),
    ]);
    expect(suggestions[0]!.reason).toContain(
      "projected 2.000\u00a0kg below reorder point 5.000\u00a0kg",
    );
    const weeks = plan.items.find((item) => item.sku === resin)!.weeks;
    expect(weeks.map((week) => week.projected)).toEqual([10, 10, 3, 35]);
    expect(weeks.map((week) => week.projectedWithSuggestion)).toEqual([
      10, 10, 15, 35,
    ]);
  });

  /*
   * Bearings by hand (no reorder point: stay at or above zero): 40 free.
   *   week 1: 40 − 130 (BO-c: 2 × 65) = −90: short 90 → boxes of 10: 90 × 2.40 = 216.00;
   *     the 100 break: 100 × 2.10 = 210.00, cheaper: 100 pieces. Need by day 7, order by
   *     day 7 − 21 = day −14: late.
   */
  it("raises the bearings to the cheaper 100-piece break, late", async () => {
    const plan = await readPlan();
    expect(plan.suggestions.filter((entry) => entry.sku === bearing)).toEqual([
      expect.objectContaining({
        supplierId: supplierIds[2],
        quantity: 100,
        unitPrice: 2.1,
        total: 210,
        needBy: day(7),
        orderBy: day(-14),
        late: true,
      }),
    ]);
  });

  it("refuses a horizon outside 1–26 weeks with 400 and a message", async () => {
    for (const weeks of ["0", "27", "abc", "8.5", "-1"]) {
      const response = await get(`/api/v1/buying-plan?weeks=${weeks}`, manager);
      expect(response.status, weeks).toBe(400);
      const body = (await response.json()) as {
        error: { fields: Record<string, string[]> };
      };
      expect(body.error.fields.weeks![0]).toBe(
        "weeks must be a whole number from 1 to 26.",
      );
    }
  });

  it("is read by every signed-in person and not by anyone else", async () => {
    expect((await get("/api/v1/buying-plan")).status).toBe(401);
    expect((await get("/api/v1/buying-plan", builder)).status).toBe(200);
  });
});

describe("Make draft orders from the plan (POST /buying-plan)", () => {
  const draftsOf = () =>
    testDb()
      .select({
        orderId: purchaseOrders.id,
        supplierId: purchaseOrders.supplierId,
        status: purchaseOrders.status,
        sku: items.sku,
        quantity: purchaseOrderLines.quantity,
        unitPrice: purchaseOrderLines.unitPrice,
        requestedDate: purchaseOrderLines.requestedDate,
      })
      .from(purchaseOrders)
      .innerJoin(
        purchaseOrderLines,
        eq(purchaseOrderLines.orderId, purchaseOrders.id),
      )
      .innerJoin(items, eq(items.id, purchaseOrderLines.itemId))
      .where(
        and(
          eq(purchaseOrders.status, "draft"),
          like(purchaseOrders.notes, "From the buying plan%"),
          // This file's suppliers only (the browser test makes drafts of its own).
          inArray(purchaseOrders.supplierId, supplierIds),
        ),
      )
      .orderBy(asc(purchaseOrders.id));

  it("refuses people who may not order, a stale choice and an empty one, writing nothing", async () => {
    const fields = { weeks: "4", suggestion: [`${resin}@${day(14)}`] };
    expect((await postForm("/buying-plan", fields, storekeeper)).status).toBe(
      403,
    );
    expect((await postForm("/buying-plan", fields, builder)).status).toBe(403);
    // A week the plan does not suggest (the page was shown before the plan changed).
    const stale = await postForm(
      "/buying-plan",
      { weeks: "4", suggestion: [`${resin}@${day(14)}`, `${resin}@${day(7)}`] },
      buyer,
    );
    expect(stale.status).toBe(409);
    expect((await postForm("/buying-plan", { weeks: "4" }, buyer)).status).toBe(
      400,
    );
    expect(
      (await postForm("/buying-plan", { ...fields, weeks: "40" }, buyer))
        .status,
    ).toBe(400);
    expect(await draftsOf()).toEqual([]);
  });

  it("makes one draft per supplier at the plan's quantities, priced from the lists", async () => {
    const response = await postForm(
      "/buying-plan",
      {
        weeks: "4",
        suggestion: [`${resin}@${day(14)}`, `${bearing}@${day(7)}`],
      },
      buyer,
    );
    expect(response.status).toBe(200);
    const drafts = await draftsOf();
    // Hand-worked above: 100 bearings at 2.10, 12 kg resin from Coilco at 17.00 (in the
    // plan's order, earliest order-by day first); each requested for its need-by Monday,
    // or today when that Monday has passed.
    expect(
      drafts.map(
        ({ supplierId, status, sku, quantity, unitPrice, requestedDate }) => ({
          supplierId,
          status,
          sku,
          quantity,
          unitPrice,
          requestedDate,
        }),
      ),
    ).toEqual([
      {
        supplierId: supplierIds[2],
        status: "draft",
        sku: bearing,
        quantity: "100.000",
        unitPrice: "2.1000",
        requestedDate: day(7) < today ? today : day(7),
      },
      {
        supplierId: supplierIds[0],
        status: "draft",
        sku: resin,
        quantity: "12.000",
        unitPrice: "17.0000",
        requestedDate: day(14) < today ? today : day(14),
      },
    ]);
    expect(new Set(drafts.map((draft) => draft.orderId)).size).toBe(2);
    const page = await response.text();
    for (const draft of drafts)
      expect(page).toContain(`/purchase-orders/${draft.orderId}`);

    // Drafts are not on order: the plan still suggests them, naming the drafts.
    const plan = await readPlan();
    const resinSuggestion = plan.suggestions.find(
      (entry) => entry.sku === resin,
    ) as { draftOrders: { id: number }[] } | undefined;
    expect(resinSuggestion?.draftOrders.map((draft) => draft.id)).toEqual([
      fixtureDraft,
      drafts.find((draft) => draft.sku === resin)!.orderId,
    ]);
  });
});

describe("build orders' planned start through the API", () => {
  it("is returned, changed and cleared by PATCH, and refused when bad or closed", async () => {
    const read = async () =>
      (
        (await (
          await get(`/api/v1/build-orders/${plannedOrder}`, manager)
        ).json()) as { plannedStart: string | null }
      ).plannedStart;
    expect(await read()).toBe(day(16));
    const patch = (body: unknown) =>
      sendJson("PATCH", `/api/v1/build-orders/${plannedOrder}`, body, builder);

    const moved = await patch({ plannedStart: day(23) });
    expect(moved.status, await moved.clone().text()).toBe(200);
    expect(await moved.json()).toMatchObject({
      id: plannedOrder,
      status: "draft",
      plannedStart: day(23),
    });
    expect(await read()).toBe(day(23));

    const bad = await patch({ plannedStart: "2026-02-30" });
    expect(bad.status).toBe(400);
    expect(
      ((await bad.json()) as { error: { fields: Record<string, string[]> } })
        .error.fields.plannedStart,
    ).toBeDefined();
    expect((await patch({})).status).toBe(400);
    expect(await read()).toBe(day(23));

    const cleared = await patch({ plannedStart: null });
    expect(cleared.status).toBe(200);
    expect(await read()).toBeNull();
    await patch({ plannedStart: day(16) });

    // A bad planned start on creation is refused with the field named.
    const created = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId: 1, revision: 1, quantity: 1, plannedStart: "next week" },
      builder,
    );
    expect(created.status).toBe(400);
  });

  it("refuses to change the planned start of a cancelled order (409), changing nothing", async () => {
    const design = await createDesign([
      { kind: "part", itemId: await itemIdOf(resin), quantityPerMotor: "1" },
    ]);
    const made = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { ...design, quantity: 1, plannedStart: day(9) },
      builder,
    );
    expect(made.status).toBe(201);
    const { id } = (await made.json()) as { id: number };
    const cancelled = await sendJson(
      "POST",
      `/api/v1/build-orders/${id}/cancel`,
      {},
      builder,
    );
    expect(cancelled.status).toBe(200);
    const refused = await sendJson(
      "PATCH",
      `/api/v1/build-orders/${id}`,
      { plannedStart: day(30) },
      builder,
    );
    expect(refused.status).toBe(409);
    const order = (await (
      await get(`/api/v1/build-orders/${id}`, manager)
    ).json()) as { plannedStart: string };
    expect(order.plannedStart).toBe(day(9));
  });
});
