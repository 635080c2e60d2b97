/**
 * Lots that trace: a receipt records where a lot came from (supplier, purchase order, the
 * receipt movement); where-used lists every build order that drew from a lot, issues net
 * of returns, with quantities equal to the journal's own sum; a build order lists its
 * lots; the API finds a lot by number (404 none, 409 several items, ?sku= narrows it).
 */
import { and, eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { lots, stockMovements } from "~/db/schema";
import {
  get,
  newPerson,
  sendJson,
  signIn,
  signInAs,
} from "../support/app-client";
import {
  createPartItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
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
let builder = "";
let storekeeper = "";
let storekeeperId = "";
let manager = "";
let rack = "";
let supplierId = 0;
let wire: { sku: string; id: number };
let heat = "";
let orderA = 0;
let orderB = 0;

const movement = (body: Record<string, unknown>) =>
  sendJson("POST", "/api/v1/stock-movements", body, storekeeper);

async function ok(response: Response, status = 201) {
  expect(response.status, await response.clone().text()).toBe(status);
  return response.json();
}

async function createBuildOrder(motors: number, designId: number) {
  const answer = await ok(
    await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId, revision: 1, quantity: motors },
      builder,
    ),
  );
  const id = (answer as { id: number }).id;
  await ok(
    await sendJson("POST", `/api/v1/build-orders/${id}/reserve`, {}, builder),
    200,
  );
  return id;
}

const issue = (orderId: number, quantity: number) =>
  movement({
    type: "issue",
    sku: wire.sku,
    lot: heat,
    location: rack,
    quantity,
    buildOrderId: orderId,
  }).then((response) => ok(response));

/** −Σ the journal's quantities of one type of the lot, for one build order (its issues, or returns naming it). */
async function journalSum(
  lotId: number,
  orderId: number,
  type: "issue" | "return",
): Promise<number> {
  const [rows] = await testDb().execute(
    type === "issue"
      ? sql`SELECT COALESCE(SUM(m.quantity), 0) AS total FROM stock_movements m
            JOIN build_order_issues i ON i.movement_id = m.id
            JOIN build_order_lines l ON l.id = i.line_id
            WHERE m.lot_id = ${lotId} AND m.type = 'issue' AND l.order_id = ${orderId}`
      : sql`SELECT COALESCE(SUM(m.quantity), 0) AS total FROM stock_movements m
            WHERE m.lot_id = ${lotId} AND m.type = 'return' AND m.reference = ${`BO-${orderId}`}`,
  );
  return Math.abs(Number((rows as unknown as { total: string }[])[0]!.total));
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  const keeper = await newPerson("storekeeper");
  storekeeperId = keeper.id;
  storekeeper = await signIn(keeper.email, keeper.password);
  manager = await signInAs("manager");
  rack = await createLocation(uniqueCode("TR"));
  supplierId = await createOrderSupplier("EUR");
  wire = await createWireItem(buyer);
  heat = uniqueCode("HEAT");
  // One spool of 10 kg; both build orders reserve (and take) from it.
  await receive(storekeeper, {
    sku: wire.sku,
    lot: heat,
    location: rack,
    quantity: 10,
    unitCost: 12,
    supplierBatch: "H-55102-7",
    supplierId,
  });
  // 40 turns × MLT 160 mm × 12 coils, 5 % scrap: 360.348 g of 0.80 mm copper per motor.
  const design = await createDesign([
    {
      kind: "coil",
      itemId: wire.id,
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      coilsPerMotor: 12,
      scrapPercent: 5,
    },
  ]);
  orderA = await createBuildOrder(2, design.designId);
  orderB = await createBuildOrder(3, design.designId);
});

afterAll(closeTestDatabase);

describe("a lot's origin", () => {
  it("keeps the supplier a plain receipt names, and the receipt movement that created it", async () => {
    const [lot] = await testDb()
      .select()
      .from(lots)
      .where(and(eq(lots.itemId, wire.id), eq(lots.lotNumber, heat)));
    const [receipt] = await testDb()
      .select({ id: stockMovements.id })
      .from(stockMovements)
      .where(
        and(
          eq(stockMovements.lotId, lot!.id),
          eq(stockMovements.type, "receipt"),
        ),
      );
    expect(lot).toMatchObject({
      supplierId,
      purchaseOrderId: null,
      supplierBatch: "H-55102-7",
      receiptMovementId: receipt!.id,
    });
  });

  it("refuses a receipt naming an unknown supplier (400 on supplierId) and writes nothing", async () => {
    const number = uniqueCode("NOSUP");
    const response = await movement({
      type: "receipt",
      sku: wire.sku,
      lot: number,
      location: rack,
      quantity: 1,
      unitCost: 10,
      supplierId: 2_147_483_000,
    });
    expect(response.status).toBe(400);
    expect((await response.json()).error.fields.supplierId[0]).toMatch(
      /No supplier with id 2147483000/,
    );
    const found = await testDb()
      .select({ id: lots.id })
      .from(lots)
      .where(eq(lots.lotNumber, number));
    expect(found).toEqual([]);
  });

  it("keeps the purchase order and its supplier of a receipt against an order", async () => {
    const currency = uniqueCurrency();
    await addRates(currency, [{ validFrom: "2020-01-01", rate: "1.000000" }]);
    const orderSupplier = await createOrderSupplier(currency);
    const order = await createOrder({
      supplierId: orderSupplier,
      currency,
      userId: storekeeperId,
      lines: [{ itemId: wire.id, quantity: "5.000", unitPrice: "12.0000" }],
    });
    const number = uniqueCode("PO-SPOOL");
    const answer = (await ok(
      await sendJson(
        "POST",
        `/api/v1/purchase-orders/${order.id}/receipts`,
        {
          lines: [
            {
              lineId: order.lineIds[0],
              lot: number,
              supplierBatch: "Q-HEAT-88",
              location: rack,
              grossKg: 5.6,
              tareKg: 0.6,
            },
          ],
        },
        storekeeper,
      ),
    )) as { receipt: { lines: { movementId: number }[] } };
    const [lot] = await testDb()
      .select()
      .from(lots)
      .where(and(eq(lots.itemId, wire.id), eq(lots.lotNumber, number)));
    expect(lot).toMatchObject({
      supplierId: orderSupplier,
      purchaseOrderId: order.id,
      supplierBatch: "Q-HEAT-88",
      receiptMovementId: answer.receipt.lines[0]!.movementId,
    });
    // The lot page names the order and the supplier's heat.
    const page = await get(`/stock/lots/${lot!.id}`, manager);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(`PO-${String(order.id).padStart(6, "0")}`);
    expect(html).toContain("Q-HEAT-88");
  });
});

describe("where used", () => {
  let lotId = 0;

  beforeAll(async () => {
    // Order A takes 0.5 kg and 0.2 kg and brings 0.1 kg back; order B takes 0.9 kg.
    await issue(orderA, 0.5);
    await issue(orderB, 0.9);
    await issue(orderA, 0.2);
    await ok(
      await movement({
        type: "return",
        sku: wire.sku,
        lot: heat,
        location: rack,
        quantity: 0.1,
        reference: `BO-${orderA}`,
      }),
    );
    // A plain issue to a workshop job is no build order's.
    await ok(
      await movement({
        type: "issue",
        sku: wire.sku,
        lot: heat,
        location: rack,
        quantity: 0.25,
        reference: "JOB-17",
      }),
    );
  });

  it("lists both build orders that drew from the lot, with quantities equal to the journal", async () => {
    const answer = (await ok(
      await get(`/api/v1/lots/${heat}/where-used`, manager),
      200,
    )) as {
      lot: Record<string, unknown>;
      uses: Record<string, unknown>[];
      otherIssues: { count: number; quantity: number };
    };
    lotId = answer.lot.id as number;
    expect(answer.lot).toEqual({
      id: lotId,
      number: heat,
      sku: wire.sku,
      supplier: { id: supplierId, name: expect.any(String) },
      supplierBatch: "H-55102-7",
    });
    expect(answer.uses.map((use) => use.buildOrderId)).toEqual([
      orderA,
      orderB,
    ]);
    for (const use of answer.uses) {
      const orderId = use.buildOrderId as number;
      const issued = await journalSum(lotId, orderId, "issue");
      const returned = await journalSum(lotId, orderId, "return");
      expect(use.issued).toBeCloseTo(issued, 9);
      expect(use.returned).toBeCloseTo(returned, 9);
      expect(use.net).toBeCloseTo(issued - returned, 9);
    }
    // Worked by hand from the movements above: A 0.5 + 0.2 = 0.7 kg issued, 0.1 back, 0.6 net; B 0.9 kg.
    expect(answer.uses[0]).toMatchObject({
      reference: `BO-${orderA}`,
      revision: 1,
      motorQuantity: 2,
      issued: 0.7,
      returned: 0.1,
      net: 0.6,
      unit: "kg",
    });
    expect(answer.uses[1]).toMatchObject({
      reference: `BO-${orderB}`,
      motorQuantity: 3,
      issued: 0.9,
      returned: 0,
      net: 0.9,
    });
    expect(
      Date.parse(answer.uses[0]!.firstIssuedAt as string),
    ).toBeLessThanOrEqual(Date.parse(answer.uses[0]!.lastMovementAt as string));
    expect(answer.otherIssues).toEqual({ count: 1, quantity: 0.25 });
  });

  it("shows the build orders on the lot page and in its CSV", async () => {
    const page = await get(`/stock/lots/${lotId}`, manager);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(`BO-${orderA}`);
    expect(html).toContain(`BO-${orderB}`);
    const csv = await get(`/stock/lots/${lotId}/where-used.csv`, manager);
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(csv.headers.get("content-disposition")).toMatch(
      /^attachment; filename="lot-/,
    );
    const rows = (await csv.text()).trim().split("\r\n");
    expect(rows).toHaveLength(3);
    expect(rows[1]).toContain(`,BO-${orderA},`);
    expect(rows[1]).toContain(",0.7,0.1,0.6,kg,");
  });

  it("lists, from a build order, every lot that went into it (API, page and CSV)", async () => {
    const answer = (await ok(
      await get(`/api/v1/build-orders/${orderA}/lots`, manager),
      200,
    )) as { reference: string; lots: Record<string, unknown>[] };
    expect(answer.reference).toBe(`BO-${orderA}`);
    expect(answer.lots).toEqual([
      expect.objectContaining({
        lotId,
        lot: heat,
        sku: wire.sku,
        supplierBatch: "H-55102-7",
        onHold: false,
        issued: 0.7,
        returned: 0.1,
        net: 0.6,
        unit: "kg",
      }),
    ]);
    const page = await (await get(`/build-orders/${orderA}`, manager)).text();
    expect(page).toContain("Lots in this build");
    expect(page).toContain(`/stock/lots/${lotId}`);
    const csv = await get(`/build-orders/${orderA}/lots.csv`, manager);
    expect(csv.status).toBe(200);
    expect((await csv.text()).split("\r\n")[1]).toContain(
      `BO-${orderA},${wire.sku},`,
    );
  });

  it("links the lot from the item page and the journal", async () => {
    const item = await (
      await get(`/stock/items/${encodeURIComponent(wire.sku)}`, manager)
    ).text();
    expect(item).toContain(`href="/stock/lots/${lotId}"`);
    const journal = await (
      await get(`/stock/journal?sku=${encodeURIComponent(wire.sku)}`, manager)
    ).text();
    expect(journal).toContain(`href="/stock/lots/${lotId}"`);
  });
});

describe("finding a lot by number in the API", () => {
  it("answers 404 for an unknown lot, 409 for a number several items share, and ?sku= narrows it", async () => {
    const unknown = await get(
      `/api/v1/lots/${uniqueCode("NONE")}/where-used`,
      manager,
    );
    expect(unknown.status).toBe(404);
    expect((await unknown.json()).error.message).toMatch(/^No lot/);

    const shared = uniqueCode("SHARED");
    const part = await createPartItem(buyer, "pcs", "Magnet spacer");
    for (const sku of [wire.sku, part.sku])
      await receive(storekeeper, {
        sku,
        lot: shared,
        location: rack,
        quantity: 2,
        unitCost: 1,
      });
    const ambiguous = await get(`/api/v1/lots/${shared}/where-used`, manager);
    expect(ambiguous.status).toBe(409);
    const message = (await ambiguous.json()).error.message as string;
    expect(message).toContain(wire.sku);
    expect(message).toContain(part.sku);

    const narrowed = await get(
      `/api/v1/lots/${shared}/where-used?sku=${encodeURIComponent(part.sku)}`,
      manager,
    );
    expect(narrowed.status).toBe(200);
    expect((await narrowed.json()).lot).toMatchObject({
      number: shared,
      sku: part.sku,
      supplier: null,
    });
    const wrongSku = await get(
      `/api/v1/lots/${heat}/where-used?sku=${encodeURIComponent(part.sku)}`,
      manager,
    );
    expect(wrongSku.status).toBe(404);
    const documents = await get(
      `/api/v1/lots/${shared}/documents?sku=${encodeURIComponent(wire.sku)}`,
      manager,
    );
    expect(documents.status).toBe(200);
    expect((await documents.json()).documents).toEqual([]);
  });

  it("answers 404 for a build order that does not exist", async () => {
    const response = await get("/api/v1/build-orders/2147483000/lots", manager);
    expect(response.status).toBe(404);
  });
});
