/**
 * The buying plan's small fixture, shared by its API and browser tests; the suggestions
 * it makes are worked out by hand in tests/integration/buying-plan.test.ts.
 *
 * - Resin (kg): reorder point 5 kg, reorder quantity 10 kg; 12 kg received. Build order
 *   A: 2 motors × 3.5 kg, planned start Wednesday of week 2. Build order B: 1 motor ×
 *   2 kg, no planned start, all of it reserved. A sent order: 20 kg due Tuesday of week 3;
 *   a draft order (not on order) of 100 kg this week. Price lines: Coilco 17.00 (16.00
 *   from 25 kg) in 4 kg packs, line lead time 10 days (its own 30); Wirehaus 21.00, any
 *   quantity, lead time 14 days.
 * - Bearings (pcs): no reorder point; 40 received. Build order C: 2 motors × 65,
 *   planned start Monday of week 1. Price lines: 2.40 (2.10 from 100) in boxes of 10,
 *   lead time 21 days.
 */
import { eq } from "drizzle-orm";
import { expect } from "vitest";
import {
  priceLines,
  purchaseOrderLines,
  purchaseOrders,
  settings,
  suppliers,
} from "~/db/schema";
import { mondayOf } from "~/buying-plan/plan-weeks";
import { addDays, dayOf } from "~/lib/calendar-days";
import { sendJson } from "./app-client";
import { itemIdOf, receive } from "./build-order-fixtures";
import { createDesign } from "./design-fixtures";
import { createLocation, testDb, uniqueCode } from "./test-database";

export interface BuyingPlanFixture {
  currency: string;
  today: string;
  /** The day `offset` days after this week's Monday. */
  day: (offset: number) => string;
  resin: string;
  bearing: string;
  /** Coilco, Wirehaus, the bearing supplier. */
  supplierIds: [number, number, number];
  /** Build order A (resin, planned start day 16). */
  plannedOrder: number;
  /** The fixture's own draft order holding resin. */
  fixtureDraft: number;
}

export async function createBuyingPlanFixture(cookies: {
  buyer: string;
  builder: string;
  storekeeper: string;
}): Promise<BuyingPlanFixture> {
  const db = testDb();
  const today = dayOf(new Date());
  const monday = mondayOf(today);
  const day = (offset: number) => addDays(monday, offset);
  const [setting] = await db
    .select({ value: settings.value })
    .from(settings)
    .where(eq(settings.key, "company_currency"));
  const currency = setting?.value ?? "EUR";

  const createItem = async (
    sku: string,
    unit: "kg" | "pcs",
    reorderPoint: number,
    reorderQuantity: number,
  ) => {
    const response = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku,
        name: unit === "kg" ? "Impregnating resin" : "Ball bearing 6001-2RS",
        unit,
        reorderPoint,
        reorderQuantity,
      },
      cookies.buyer,
    );
    expect(response.status, await response.clone().text()).toBe(201);
    return itemIdOf(sku);
  };
  const createOrder = async (
    design: { designId: number; revision: number },
    quantity: number,
    plannedStart?: string,
  ) => {
    const response = await sendJson(
      "POST",
      "/api/v1/build-orders",
      {
        designId: design.designId,
        revision: design.revision,
        quantity,
        ...(plannedStart ? { plannedStart } : {}),
      },
      cookies.builder,
    );
    expect(response.status, await response.clone().text()).toBe(201);
    return ((await response.json()) as { id: number }).id;
  };
  const addSupplier = async (name: string, leadTimeDays: number | null) => {
    const [row] = await db
      .insert(suppliers)
      .values({ name: uniqueCode(name), currency, leadTimeDays })
      .$returningId();
    return row!.id;
  };

  const resin = uniqueCode("RES");
  const bearing = uniqueCode("BRG");
  const resinId = await createItem(resin, "kg", 5, 10);
  const bearingId = await createItem(bearing, "pcs", 0, 0);
  const rack = await createLocation(uniqueCode("PL"));
  await receive(cookies.storekeeper, {
    sku: resin,
    location: rack,
    quantity: 12,
    unitCost: 15,
  });
  await receive(cookies.storekeeper, {
    sku: bearing,
    location: rack,
    quantity: 40,
    unitCost: 2,
  });

  const plannedOrder = await createOrder(
    await createDesign([
      { kind: "part", itemId: resinId, quantityPerMotor: "3.5" },
    ]),
    2,
    day(16),
  );
  const heldOrder = await createOrder(
    await createDesign([
      { kind: "part", itemId: resinId, quantityPerMotor: "2" },
    ]),
    1,
  );
  const reserved = await sendJson(
    "POST",
    `/api/v1/build-orders/${heldOrder}/reserve`,
    {},
    cookies.builder,
  );
  expect(reserved.status, await reserved.clone().text()).toBe(200);
  await createOrder(
    await createDesign([
      { kind: "part", itemId: bearingId, quantityPerMotor: "65" },
    ]),
    2,
    day(7),
  );

  const coilco = await addSupplier("Plan Coilco", 30);
  const wirehaus = await addSupplier("Plan Wirehaus", 14);
  const bearings = await addSupplier("Plan Bearings", null);
  const line = (
    supplierId: number,
    itemId: number,
    unitPrice: string,
    minQuantity: string,
    extra: { packQuantity?: string; leadTimeDays?: number } = {},
  ) => ({
    supplierId,
    itemId,
    supplierSku: `S${supplierId}-${itemId}`,
    currency,
    unitPrice,
    minQuantity,
    validFrom: "2026-01-01",
    ...extra,
  });
  await db.insert(priceLines).values([
    line(coilco, resinId, "17.0000", "0", {
      packQuantity: "4",
      leadTimeDays: 10,
    }),
    line(coilco, resinId, "16.0000", "25", {
      packQuantity: "4",
      leadTimeDays: 10,
    }),
    line(wirehaus, resinId, "21.0000", "0"),
    line(bearings, bearingId, "2.4000", "1", {
      packQuantity: "10",
      leadTimeDays: 21,
    }),
    line(bearings, bearingId, "2.1000", "100", {
      packQuantity: "10",
      leadTimeDays: 21,
    }),
  ]);

  let fixtureDraft = 0;
  for (const [status, expectedDate, quantity] of [
    ["sent", day(22), "20"],
    ["draft", day(0), "100"],
  ] as const) {
    const [order] = await db
      .insert(purchaseOrders)
      .values({
        supplierId: wirehaus,
        status,
        currency,
        orderedOn: status === "sent" ? today : null,
        userId: "demo-02-buyer",
        updatedAt: new Date(),
      })
      .$returningId();
    if (status === "draft") fixtureDraft = order!.id;
    await db.insert(purchaseOrderLines).values({
      orderId: order!.id,
      lineNumber: 1,
      itemId: resinId,
      quantity,
      unitPrice: "21.0000",
      priceSource: "price_list",
      expectedDate,
    });
  }
  return {
    currency,
    today,
    day,
    resin,
    bearing,
    supplierIds: [coilco, wirehaus, bearings],
    plannedOrder,
    fixtureDraft,
  };
}
