import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let mainStore = "";
let benchBin = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  mainStore = await createLocation(uniqueCode("ST"));
  benchBin = await createLocation(uniqueCode("BN"));
});
afterAll(closeTestDatabase);

async function createWire(sku = uniqueCode("CU")): Promise<string> {
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: "Enamelled copper 0.50 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.5",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
      reorderPoint: 2,
      reorderQuantity: 10,
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

async function createMagnet(sku = uniqueCode("MG")): Promise<string> {
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "magnet",
      sku,
      name: "N42SH block",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      coating: "NiCuNi",
      magnetisation: "through 5 mm",
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

const move = (body: Record<string, unknown>, cookie = storekeeper) =>
  sendJson("POST", "/api/v1/stock-movements", body, cookie);

async function itemBalance(sku: string) {
  return (await (await get(`/api/v1/items/${sku}`, storekeeper)).json()) as {
    onHand: number;
    reserved: number;
    available: number;
    averageCost: number;
    balances: { lot: string | null; location: string; onHand: number }[];
  };
}

async function movementCount(): Promise<number> {
  const [rows] = await testDatabase().query(
    "SELECT COUNT(*) AS n FROM stock_movements",
  );
  return Number((rows as { n: number }[])[0]!.n);
}

describe("receipts, weigh-back issues, transfers and counts", () => {
  it("receives a spool by gross and tare and issues by weighing it back", async () => {
    const sku = await createWire();
    // Spool gross 5.40 kg, tare 0.60 kg → net 4.80 kg (engineering brief, worked check 6).
    const receipt = await move({
      type: "receipt",
      sku,
      lot: "SP-1",
      location: mainStore,
      grossKg: 5.4,
      tareKg: 0.6,
      unitCost: 14.2,
      spoolType: "DIN 250",
    });
    expect(receipt.status).toBe(201);
    const received = await receipt.json();
    expect(received.movement.quantity).toBe(4.8);
    expect(received.balance).toEqual({
      onHand: 4.8,
      reserved: 0,
      available: 4.8,
    });

    // Weighed back at 4.15 kg gross: net now 3.55 kg, so 1.25 kg left the spool.
    const issue = await move({
      type: "issue",
      sku,
      lot: "SP-1",
      location: mainStore,
      grossKg: 4.15,
      reference: "JOB-1001",
    });
    expect(issue.status).toBe(201);
    const issued = await issue.json();
    expect(issued.movement.quantity).toBe(-1.25);
    expect(issued.balance.onHand).toBe(3.55);
  });

  it("values stock at the moving average cost", async () => {
    const sku = await createWire();
    await move({
      type: "receipt",
      sku,
      lot: "A",
      location: mainStore,
      quantity: 10,
      unitCost: 12,
    });
    await move({
      type: "receipt",
      sku,
      lot: "B",
      location: mainStore,
      quantity: 5,
      unitCost: 15,
    });
    // (10 kg × 12 + 5 kg × 15) / 15 kg = 13 per kg (moving average, worked by hand).
    const item = await itemBalance(sku);
    expect(item.averageCost).toBe(13);
    await move({
      type: "issue",
      sku,
      lot: "A",
      location: mainStore,
      quantity: 4,
    });
    expect((await itemBalance(sku)).averageCost).toBe(13);
  });

  it("moves stock between locations in two legs and records a count's difference", async () => {
    const sku = await createMagnet();
    await move({
      type: "receipt",
      sku,
      location: mainStore,
      quantity: 200,
      unitCost: 0.85,
    });
    const transfer = await move({
      type: "transfer",
      sku,
      location: mainStore,
      toLocation: benchBin,
      quantity: 50,
    });
    expect(transfer.status).toBe(201);
    const [legs] = await testDatabase().query(
      "SELECT m.quantity, l.code FROM stock_movements m JOIN locations l ON l.id = m.location_id WHERE m.transfer_id = ? ORDER BY m.id",
      [(await transfer.json()).movement.id],
    );
    expect(
      (legs as { quantity: string; code: string }[]).map((leg) => [
        leg.code,
        Number(leg.quantity),
      ]),
    ).toEqual([
      [mainStore, -50],
      [benchBin, 50],
    ]);
    const count = await move({
      type: "count",
      sku,
      location: benchBin,
      quantity: 47,
      note: "three chipped, set aside",
    });
    expect(count.status).toBe(201);
    expect((await count.json()).movement.quantity).toBe(-3);
    const item = await itemBalance(sku);
    expect(item.onHand).toBe(197);
    expect(
      item.balances.map((balance) => [balance.location, balance.onHand]).sort(),
    ).toEqual(
      [
        [mainStore, 150],
        [benchBin, 47],
      ].sort(),
    );
  });
});

describe("never below zero", () => {
  it("refuses taking more pieces than are there, naming them as words", async () => {
    const sku = await createMagnet();
    const received = await move({
      type: "receipt",
      sku,
      location: mainStore,
      quantity: 1,
      unitCost: 0.85,
    });
    expect(received.status, await received.clone().text()).toBe(201);
    const refused = await move({
      type: "issue",
      sku,
      location: mainStore,
      quantity: 2,
    });
    expect(refused.status).toBe(409);
    // English: "1 piece", "2 pieces" (CLDR plural rules), never "1 pcs".
    expect((await refused.json()).error.message).toBe(
      `Only 1 piece of ${sku} at ${mainStore}; cannot take 2 pieces.`,
    );
    expect((await itemBalance(sku)).onHand).toBe(1);
  });

  it("lets exactly 20 of 50 concurrent 1 kg issues through a 20 kg lot", async () => {
    const sku = await createWire();
    await move({
      type: "receipt",
      sku,
      lot: "RACE",
      location: mainStore,
      quantity: 20,
      unitCost: 10,
    });
    const before = await movementCount();
    const answers = await Promise.all(
      Array.from({ length: 50 }, () =>
        move({
          type: "issue",
          sku,
          lot: "RACE",
          location: mainStore,
          quantity: 1,
        }),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    expect(statuses.filter((status) => status === 201)).toHaveLength(20);
    expect(statuses.filter((status) => status === 409)).toHaveLength(30);
    const item = await itemBalance(sku);
    expect(item.onHand).toBe(0);
    expect(await movementCount()).toBe(before + 20);
    const refused = await answers
      .find((answer) => answer.status === 409)!
      .json();
    expect(refused.error.message).toMatch(/cannot take 1 kg/);
  });

  it("keeps every balance equal to the sum of its movements over 2,000 random movements", async () => {
    const skus = [
      await createWire(),
      await createWire(),
      await createMagnet(),
      await createMagnet(),
    ];
    const places = [mainStore, benchBin];
    let seed = 20261202;
    const random = () => {
      seed = (seed * 1103515245 + 12345) % 2147483648;
      return seed / 2147483648;
    };
    const pick = <T>(list: readonly T[]) =>
      list[Math.floor(random() * list.length)]!;
    let created = 0;
    let refused = 0;
    for (let batch = 0; batch < 100; batch += 1) {
      const requests = Array.from({ length: 20 }, () => {
        const sku = pick(skus);
        const wire = sku.startsWith("CU");
        const lot = wire ? pick(["L1", "L2", "L3"]) : undefined;
        const quantity = wire
          ? Math.round(random() * 3000) / 1000 + 0.001
          : 1 + Math.floor(random() * 20);
        const type = pick([
          "receipt",
          "receipt",
          "issue",
          "issue",
          "transfer",
          "scrap",
          "return",
          "count",
          "adjustment",
        ] as const);
        const location = pick(places);
        const body: Record<string, unknown> = {
          type,
          sku,
          lot,
          location,
          quantity,
        };
        if (type === "receipt") body.unitCost = 5 + Math.floor(random() * 10);
        if (type === "transfer")
          body.toLocation = places.find((place) => place !== location);
        if (type === "adjustment") {
          body.quantity = random() < 0.5 ? quantity : -quantity;
          body.note = "property test";
        }
        if (type === "count")
          body.quantity = wire
            ? Math.round(random() * 5000) / 1000
            : Math.floor(random() * 30);
        return move(body);
      });
      for (const answer of await Promise.all(requests)) {
        if (answer.status === 201) created += 1;
        else if (answer.status === 409 || answer.status === 400) refused += 1;
        else
          throw new Error(
            `unexpected ${answer.status}: ${await answer.text()}`,
          );
      }
    }
    expect(created + refused).toBe(2000);
    expect(created).toBeGreaterThan(1000);

    const [mismatches] = await testDatabase().query(
      `SELECT b.item_id, b.lot_id, b.location_id, b.on_hand, COALESCE(SUM(m.quantity), 0) AS moved
         FROM stock_balances b
         LEFT JOIN stock_movements m ON m.item_id = b.item_id AND m.lot_id = b.lot_id AND m.location_id = b.location_id
        GROUP BY b.item_id, b.lot_id, b.location_id, b.on_hand
       HAVING b.on_hand <> moved OR b.on_hand < 0`,
    );
    expect(mismatches).toEqual([]);
    const [itemMismatches] = await testDatabase().query(
      `SELECT i.sku FROM items i LEFT JOIN stock_balances b ON b.item_id = i.id
        GROUP BY i.id, i.sku, i.on_hand HAVING i.on_hand <> COALESCE(SUM(b.on_hand), 0)`,
    );
    expect(itemMismatches).toEqual([]);
  });
});

describe("who may record, and bad input", () => {
  it("refuses buyers, builders and managers with 403 and writes nothing", async () => {
    const sku = await createMagnet();
    const before = await movementCount();
    for (const role of ["buyer", "builder", "manager"] as const) {
      const cookie = await signInAs(role);
      const answer = await move(
        { type: "receipt", sku, location: mainStore, quantity: 5, unitCost: 1 },
        cookie,
      );
      expect(answer.status).toBe(403);
    }
    expect(await movementCount()).toBe(before);
  });

  it.each([
    [
      "unknown SKU",
      { type: "receipt", sku: "NO-SUCH-SKU", quantity: 1, unitCost: 1 },
      400,
      "sku",
    ],
    [
      "wrong unit",
      { type: "receipt", quantity: 1, unit: "kg", unitCost: 1 },
      400,
      "unit",
    ],
    [
      "negative receipt",
      { type: "receipt", quantity: -5, unitCost: 1 },
      400,
      "quantity",
    ],
    [
      "fractional pieces",
      { type: "receipt", quantity: 1.5, unitCost: 1 },
      400,
      "quantity",
    ],
    [
      "non-numeric quantity",
      { type: "receipt", quantity: "ten", unitCost: 1 },
      400,
      "quantity",
    ],
    [
      "transfer to the same location",
      { type: "transfer", quantity: 1, toLocation: "SAME" },
      400,
      "toLocation",
    ],
    [
      "unknown location",
      { type: "receipt", quantity: 1, unitCost: 1, location: "NOWHERE" },
      400,
      "location",
    ],
    ["receipt without cost", { type: "receipt", quantity: 1 }, 400, "unitCost"],
    ["unknown type", { type: "gift", quantity: 1 }, 400, "type"],
  ])("refuses %s and writes nothing", async (_label, change, status, field) => {
    const sku = await createMagnet();
    const before = await movementCount();
    const body = { sku, location: mainStore, ...change } as Record<
      string,
      unknown
    >;
    if (body.toLocation === "SAME") body.toLocation = mainStore;
    const answer = await move(body);
    expect(answer.status).toBe(status);
    const error = (await answer.json()).error;
    expect(Object.keys(error.fields)).toContain(field);
    expect(await movementCount()).toBe(before);
  });

  it("refuses a gross weight below the tare on a receipt and on a weigh-back", async () => {
    const sku = await createWire();
    const receipt = await move({
      type: "receipt",
      sku,
      lot: "T1",
      location: mainStore,
      grossKg: 0.5,
      tareKg: 0.6,
      unitCost: 10,
    });
    expect(receipt.status).toBe(400);
    expect((await receipt.json()).error.fields.grossKg).toBeTruthy();
    await move({
      type: "receipt",
      sku,
      lot: "T1",
      location: mainStore,
      grossKg: 3.6,
      tareKg: 0.6,
      unitCost: 10,
    });
    const before = await movementCount();
    const weighBack = await move({
      type: "issue",
      sku,
      lot: "T1",
      location: mainStore,
      grossKg: 0.4,
    });
    expect(weighBack.status).toBe(400);
    expect(await movementCount()).toBe(before);
  });
});

describe("items API", () => {
  it("creates, reads, lists and changes items with the role rules", async () => {
    const sku = await createWire();
    expect(
      (
        await sendJson(
          "POST",
          "/api/v1/items",
          { kind: "part", sku, name: "dup", unit: "pcs" },
          buyer,
        )
      ).status,
    ).toBe(409);
    const unknownSize = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "wire",
        sku: uniqueCode("CU"),
        name: "x",
        conductor: "copper",
        standard: "AWG",
        size: "99",
        insulation: "heavy",
        thermalClass: 155,
        enamel: "polyester",
      },
      buyer,
    );
    expect(unknownSize.status).toBe(400);
    expect((await unknownSize.json()).error.fields.size).toBeTruthy();
    expect(
      (
        await sendJson(
          "POST",
          "/api/v1/items",
          { kind: "part", sku: uniqueCode("P"), name: "x", unit: "pcs" },
          storekeeper,
        )
      ).status,
    ).toBe(403);

    const patchReorder = await sendJson(
      "PATCH",
      `/api/v1/items/${sku}`,
      { reorderPoint: 3.5 },
      storekeeper,
    );
    expect(patchReorder.status).toBe(200);
    expect((await patchReorder.json()).reorderPoint).toBe(3.5);
    expect(
      (
        await sendJson(
          "PATCH",
          `/api/v1/items/${sku}`,
          { name: "renamed" },
          storekeeper,
        )
      ).status,
    ).toBe(403);
    const builder = await signInAs("builder");
    expect(
      (
        await sendJson(
          "PATCH",
          `/api/v1/items/${sku}`,
          { reorderPoint: 1 },
          builder,
        )
      ).status,
    ).toBe(403);

    const list = (await (
      await get(`/api/v1/items?search=${sku}&pageSize=5`, builder)
    ).json()) as {
      items: { sku: string; unit: string; belowReorder: boolean }[];
      total: number;
    };
    expect(list.total).toBe(1);
    expect(list.items[0]).toMatchObject({
      sku,
      unit: "kg",
      belowReorder: true,
    });
    expect((await get("/api/v1/items?pageSize=9999", builder)).status).toBe(
      400,
    );
    const locationsList = (await (
      await get("/api/v1/locations", builder)
    ).json()) as { code: string }[];
    expect(locationsList.map((location) => location.code)).toContain(mainStore);
  });
});

describe("items API refuses impossible items", () => {
  it("refuses a ring whose hole is wider than the ring and a fractional piece count", async () => {
    const ring = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "magnet",
        sku: uniqueCode("MG"),
        name: "bad ring",
        grade: "N42SH",
        shape: {
          kind: "ring",
          outerDiameterMm: 10,
          innerDiameterMm: 12,
          thicknessMm: 2,
        },
        coating: "NiCuNi",
        magnetisation: "axial",
      },
      buyer,
    );
    expect(ring.status).toBe(400);
    expect(Object.keys((await ring.json()).error.fields)[0]).toMatch(
      /^shape\./,
    );
    const fractional = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku: uniqueCode("P"),
        name: "bearing",
        unit: "pcs",
        reorderPoint: 2.5,
      },
      buyer,
    );
    expect(fractional.status).toBe(400);
    expect((await fractional.json()).error.fields.reorderPoint).toBeTruthy();
  });
});
