/**
 * Substitutes from stock (issue 19): wire items made through the items API, stock received
 * through the ledger at a moving average cost, and a released design whose one coil line is
 * the brief's worked check 4 coil (40 turns, active 50 mm, end turn 30 mm) in 1.00 mm copper,
 * in a 200 mm² slot with two coil sides.
 */
import { eq } from "drizzle-orm";
import { expect } from "vitest";
import { designRevisions } from "~/db/schema";
import { sendJson, signInAs } from "./app-client";
import { createPartItem, itemIdOf, receive } from "./build-order-fixtures";
import { createDesign } from "./design-fixtures";
import { createLocation, testDb, uniqueCode } from "./test-database";

export interface StockedWireFixture {
  sku: string;
  id: number;
}

/** An IEC wire item, grade 2, class 180. */
export async function createIecWireItem(
  buyer: string,
  diameter: string,
  conductor = "copper",
): Promise<StockedWireFixture> {
  const sku = uniqueCode(`W${diameter.replace(".", "")}`);
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: `Enamelled ${conductor} ${diameter} mm grade 2`,
      conductor,
      standard: "IEC",
      size: diameter,
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return { sku, id: await itemIdOf(sku) };
}

/** Receives `kg` of a wire on one new spool at `unitCost` per kg. */
export async function receiveSpool(
  storekeeper: string,
  location: string,
  sku: string,
  kg: number,
  unitCost: number,
): Promise<void> {
  await receive(storekeeper, {
    sku,
    lot: uniqueCode("SP"),
    location,
    quantity: kg,
    unitCost,
  });
}

/**
 * 1.00 mm copper (5 kg at 12.00/kg) and 0.71 mm copper (3 kg at 13.50/kg) in stock, 0.50 mm
 * copper without stock, and a released design of the 1.00 mm wire (line 1) and a part (line 2).
 */
export async function createSubstituteScene() {
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const rack = await createLocation(uniqueCode("SUB"));
  const original = await createIecWireItem(buyer, "1.0");
  const twoOf071 = await createIecWireItem(buyer, "0.71");
  const notInStock = await createIecWireItem(buyer, "0.5");
  await receiveSpool(storekeeper, rack, original.sku, 5, 12);
  await receiveSpool(storekeeper, rack, twoOf071.sku, 3, 13.5);
  const part = await createPartItem(buyer);
  const design = await createDesign(
    [
      {
        kind: "coil",
        itemId: original.id,
        turns: 40,
        activeLengthMm: 50,
        endTurnLengthMm: 30,
      },
      { kind: "part", itemId: part.id, quantityPerMotor: "1" },
    ],
    { name: uniqueCode("Stock-swap outrunner") },
  );
  await testDb()
    .update(designRevisions)
    .set({ slotAreaMm2: "200" })
    .where(eq(designRevisions.id, design.revisionId));
  return { original, twoOf071, notInStock, design, buyer, storekeeper };
}
