/** Items, stock and build-order figures for the build-order tests, through the real API and database. */
import { expect } from "vitest";
import { sendJson } from "./app-client";
import { testDatabase, uniqueCode } from "./test-database";

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
  const [rows] = await testDatabase().query(
    "SELECT id FROM items WHERE sku = ?",
    [sku],
  );
  return (rows as { id: number }[])[0]!.id;
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
  const db = testDatabase();
  const [itemRows] = await db.query(
    "SELECT on_hand, reserved FROM items WHERE id = ?",
    [itemId],
  );
  const [balanceRows] = await db.query(
    "SELECT lot_id, location_id, on_hand, reserved FROM stock_balances WHERE item_id = ?",
    [itemId],
  );
  const [heldRows] = await db.query(
    "SELECT lot_id, location_id, SUM(quantity) AS quantity FROM build_order_reservations WHERE item_id = ? GROUP BY lot_id, location_id",
    [itemId],
  );
  const [lineRows] = await db.query(
    "SELECT COALESCE(SUM(reserved), 0) AS reserved FROM build_order_lines WHERE item_id = ?",
    [itemId],
  );
  const item = (itemRows as { on_hand: string; reserved: string }[])[0]!;
  const balances = (
    balanceRows as {
      lot_id: number;
      location_id: number;
      on_hand: string;
      reserved: string;
    }[]
  ).map((row) => ({
    key: `${row.lot_id}:${row.location_id}`,
    onHand: toNumber(row.on_hand),
    reserved: toNumber(row.reserved),
  }));
  const held = new Map(
    (
      heldRows as { lot_id: number; location_id: number; quantity: string }[]
    ).map((row) => [
      `${row.lot_id}:${row.location_id}`,
      toNumber(row.quantity),
    ]),
  );
  const grams = (value: number) => Math.round(value * 1000);
  return {
    onHand: toNumber(item.on_hand),
    reserved: toNumber(item.reserved),
    balances,
    held,
    /** Σ build_order_reservations of the item, in grams (thousandths). */
    heldTotal: grams([...held.values()].reduce((sum, value) => sum + value, 0)),
    linesReserved: grams(
      toNumber((lineRows as { reserved: string }[])[0]!.reserved),
    ),
    grams,
  };
}
