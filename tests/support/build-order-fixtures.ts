/** Items, stock and build-order figures for the build-order tests, through the real API and database. */
import { expect } from "vitest";
import { sendJson } from "./app-client";
import { eq, sql, sum } from "drizzle-orm";
import {
  buildOrderLines,
  buildOrderReservations,
  items,
  stockBalances,
} from "~/db/schema";
import { testDb, uniqueCode } from "./test-database";

async function created(response: Response): Promise<void> {
  expect(response.status, await response.clone().text()).toBe(201);
}

/** A wire item (0.80 mm IEC copper, grade 2); returns its SKU and id. */
export async function createWireItem(buyer: string) {
  const sku = uniqueCode("CU080");
  await created(
    await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "wire",
        sku,
        name: "Enamelled copper 0.80 mm grade 2",
        conductor: "copper",
        standard: "IEC",
        size: "0.8",
        insulation: "grade2",
        thermalClass: 180,
        enamel: "polyesterimide",
      },
      buyer,
    ),
  );
  return { sku, id: await itemIdOf(sku) };
}

export async function createMagnetItem(buyer: string) {
  const sku = uniqueCode("N42SH");
  await created(
    await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "magnet",
        sku,
        name: "N42SH block 20×10×5",
        grade: "N42SH",
        shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
        coating: "NiCuNi",
        magnetisation: "through 5 mm",
      },
      buyer,
    ),
  );
  return { sku, id: await itemIdOf(sku) };
}

export async function createPartItem(
  buyer: string,
  unit = "pcs",
  name = "Bearing 6001-2RS",
) {
  const sku = uniqueCode("BRG");
  await created(
    await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name, unit },
      buyer,
    ),
  );
  return { sku, id: await itemIdOf(sku) };
}

export async function itemIdOf(sku: string): Promise<number> {
  const [row] = await testDb()
    .select({ id: items.id })
    .from(items)
    .where(eq(items.sku, sku));
  return row!.id;
}

/** Records a receipt through the stock API. */
export async function receive(
  storekeeper: string,
  body: Record<string, unknown>,
): Promise<void> {
  await created(
    await sendJson(
      "POST",
      "/api/v1/stock-movements",
      { type: "receipt", ...body },
      storekeeper,
    ),
  );
}

const toNumber = (value: string | number) => Number(value);

/** The kept figures of an item and the sums they must equal. */
export async function reservationBooks(itemId: number) {
  const db = testDb();
  const [item] = await db
    .select({ onHand: items.onHand, reserved: items.reserved })
    .from(items)
    .where(eq(items.id, itemId));
  const balanceRows = await db
    .select({
      lotId: stockBalances.lotId,
      locationId: stockBalances.locationId,
      onHand: stockBalances.onHand,
      reserved: stockBalances.reserved,
    })
    .from(stockBalances)
    .where(eq(stockBalances.itemId, itemId));
  const heldRows = await db
    .select({
      lotId: buildOrderReservations.lotId,
      locationId: buildOrderReservations.locationId,
      quantity: sum(buildOrderReservations.quantity),
    })
    .from(buildOrderReservations)
    .where(eq(buildOrderReservations.itemId, itemId))
    .groupBy(buildOrderReservations.lotId, buildOrderReservations.locationId);
  const [lines] = await db
    .select({
      reserved: sql<string>`COALESCE(SUM(${buildOrderLines.reserved}), 0)`,
    })
    .from(buildOrderLines)
    .where(eq(buildOrderLines.itemId, itemId));
  const balances = balanceRows.map((row) => ({
    key: `${row.lotId}:${row.locationId}`,
    onHand: toNumber(row.onHand),
    reserved: toNumber(row.reserved),
  }));
  const held = new Map(
    heldRows.map((row) => [
      `${row.lotId}:${row.locationId}`,
      toNumber(row.quantity ?? 0),
    ]),
  );
  const grams = (value: number) => Math.round(value * 1000);
  return {
    onHand: toNumber(item!.onHand),
    reserved: toNumber(item!.reserved),
    balances,
    held,
    /** Σ build_order_reservations of the item, in grams (thousandths). */
    heldTotal: grams(
      [...held.values()].reduce((total, value) => total + value, 0),
    ),
    linesReserved: grams(toNumber(lines!.reserved)),
    grams,
  };
}
