/**
 * Substitutes from stock (issue 19) against the real server and database: wire items with
 * stock received through the ledger, a released design, the proposals, applying one to a
 * new draft revision and to a draft, and every refusal writing nothing.
 */
import { count, eq, inArray } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { designLines, designRevisions } from "~/db/schema";
import { get, sendJson, signInAs } from "../support/app-client";
import { createPartItem } from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  createIecWireItem,
  receiveSpool,
} from "../support/substitute-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
let rack = "";

let original: { sku: string; id: number };
let twoOf071: { sku: string; id: number };
let notInStock: { sku: string; id: number };
let aluminium: { sku: string; id: number };
let design: { designId: number; revision: number; revisionId: number };

const path = (revision: number, line: number, query = "") =>
  `/api/v1/designs/${design.designId}/revisions/${revision}/lines/${line}/substitutes${query}`;

/** Revisions of the design and lines of all of them: what a refusal must leave as it was. */
async function written() {
  const db = testDb();
  const revisions = await db
    .select({ id: designRevisions.id })
    .from(designRevisions)
    .where(eq(designRevisions.designId, design.designId));
  const [lines] = await db
    .select({ lines: count() })
    .from(designLines)
    .where(
      inArray(
        designLines.revisionId,
        revisions.map((row) => row.id),
      ),
    );
  const rows = await db
    .select({
      itemId: designLines.itemId,
      strands: designLines.strandsInHand,
    })
    .from(designLines)
    .where(
      inArray(
        designLines.revisionId,
        revisions.map((row) => row.id),
      ),
    );
  return { revisions: revisions.length, lines: lines!.lines, rows };
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  rack = await createLocation(uniqueCode("SUB"));
  original = await createIecWireItem(buyer, "1.0");
  twoOf071 = await createIecWireItem(buyer, "0.71");
  notInStock = await createIecWireItem(buyer, "0.5");
  aluminium = await createIecWireItem(buyer, "0.71", "aluminium");
  await receiveSpool(storekeeper, rack, original.sku, 5, 12);
  await receiveSpool(storekeeper, rack, twoOf071.sku, 3, 13.5);
  await receiveSpool(storekeeper, rack, aluminium.sku, 3, 4);
  const part = await createPartItem(buyer);
  // The brief's worked check 4 coil (40 turns, active 50 mm, end turn 30 mm) in 1.00 mm copper.
  design = await createDesign([
    {
      kind: "coil",
      itemId: original.id,
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
    },
    { kind: "part", itemId: part.id, quantityPerMotor: "1" },
  ]);
  // A 200 mm² slot, two coil sides (the fixture's default), for the gross fill.
  await testDb()
    .update(designRevisions)
    .set({ slotAreaMm2: "200" })
    .where(eq(designRevisions.id, design.revisionId));
});
afterAll(closeTestDatabase);

interface SubstituteJson {
  sku: string;
  strands: number;
  areaChangePercent: number;
  resistanceChangePercent: number;
  grossFill: number | null;
  costPerMotorChange: number | null;
  onHandKg: number;
}

describe("GET …/lines/:line/substitutes", () => {
  it("proposes wire in stock within ±3 % of the copper area that fits, with the changes", async () => {
    const response = await get(path(1, 1), storekeeper);
    expect(response.status, await response.clone().text()).toBe(200);
    const body = (await response.json()) as {
      substitutes: SubstituteJson[];
      tolerancePercent: number;
    };
    expect(body.tolerancePercent).toBe(3);
    const mine = body.substitutes.filter((entry) =>
      [twoOf071.sku, notInStock.sku, aluminium.sku].includes(entry.sku),
    );
    // 0.50 mm has no stock and aluminium is another conductor: only 2 × 0.71 mm.
    expect(mine.map((entry) => [entry.sku, entry.strands])).toEqual([
      [twoOf071.sku, 2],
    ]);
    const [proposal] = mine;
    // By hand: 2 × 0.71² / 1.00² = 1.0082 (+0.82 %); R ∝ 1/area → 1/1.0082 − 1 = −0.8133 %
    // (units -t '1/(2*0.71^2)' → 0.99186669).
    expect(proposal!.areaChangePercent).toBeCloseTo(0.82, 9);
    expect(proposal!.resistanceChangePercent).toBeCloseTo(-0.813331, 5);
    expect(proposal!.onHandKg).toBe(3);
    // 0.0446860 kg × 12 = 0.5362 → 0.0450524 kg × 13.5 = 0.6082: +0.0720 per motor
    // (masses: units -t '6.4 m * pi/4 * (1 mm)^2 * 8.89 g/cm^3' g → 44.686014, and with
    // 2 × 0.71 mm → 45.052439; the design costing rounds each cost to 0.0001).
    expect(proposal!.costPerMotorChange).toBe(0.072);
    expect(proposal!.grossFill).toBeGreaterThan(0.3);
    expect(proposal!.grossFill).toBeLessThan(0.45);
    // Closest area first.
    const areas = body.substitutes.map((entry) =>
      Math.abs(entry.areaChangePercent),
    );
    expect(areas).toEqual([...areas].sort((a, b) => a - b));
  });

  it("takes the tolerance from ?tolerance= and refuses a bad one naming it", async () => {
    const wide = await get(path(1, 1, "?tolerance=10"), storekeeper);
    expect((await wide.json()).tolerancePercent).toBe(10);
    for (const bad of ["abc", "40", "-1"]) {
      const response = await get(path(1, 1, `?tolerance=${bad}`), builder);
      expect(response.status).toBe(400);
      expect((await response.json()).error.fields).toHaveProperty("tolerance");
    }
  });

  it("answers 404 for an unknown revision or line and 409 for a part line", async () => {
    expect((await get(path(9, 1), builder)).status).toBe(404);
    expect((await get(path(1, 9), builder)).status).toBe(404);
    const part = await get(path(1, 2), builder);
    expect(part.status).toBe(409);
    expect((await part.json()).error.message).toContain(
      "not a wire (coil) line",
    );
  });
});

describe("POST …/lines/:line/substitutes", () => {
  it("refuses, writing nothing: a choice not among the substitutes, a part line, a storekeeper", async () => {
    const before = await written();
    const outOfStock = await sendJson(
      "POST",
      path(1, 1),
      { sku: notInStock.sku, strands: 4 },
      builder,
    );
    expect(outOfStock.status).toBe(409);
    expect((await outOfStock.json()).error.message).toContain(
      "not among the substitutes",
    );
    const partLine = await sendJson(
      "POST",
      path(1, 2),
      { sku: twoOf071.sku, strands: 2 },
      builder,
    );
    expect(partLine.status).toBe(409);
    const badBody = await sendJson(
      "POST",
      path(1, 1),
      { sku: twoOf071.sku, strands: 0 },
      builder,
    );
    expect(badBody.status).toBe(400);
    expect((await badBody.json()).error.fields).toHaveProperty("strands");
    const storekeeperTry = await sendJson(
      "POST",
      path(1, 1),
      { sku: twoOf071.sku, strands: 2 },
      storekeeper,
    );
    expect(storekeeperTry.status).toBe(403);
    expect(await written()).toEqual(before);
  });

  it("applies one to a released revision as a new draft revision (201), then refuses while that draft exists", async () => {
    const before = await written();
    const response = await sendJson(
      "POST",
      path(1, 1),
      { sku: twoOf071.sku, strands: 2 },
      builder,
    );
    expect(response.status, await response.clone().text()).toBe(201);
    const body = await response.json();
    expect(body).toMatchObject({ revision: 2, status: "draft" });
    expect(body.slotAreaMm2).toBe(200);
    expect(body.lines[0]).toMatchObject({
      kind: "coil",
      sku: twoOf071.sku,
      strandsInHand: 2,
      turns: 40,
    });
    expect(body.lines[1].kind).toBe("part");
    const after = await written();
    expect(after.revisions).toBe(before.revisions + 1);
    expect(after.lines).toBe(before.lines + 2);

    // Revision 1 is unchanged; a second try names the draft and writes nothing.
    const again = await sendJson(
      "POST",
      path(1, 1),
      { sku: twoOf071.sku, strands: 2 },
      builder,
    );
    expect(again.status).toBe(409);
    expect((await again.json()).error.message).toContain(
      "Revision 2 of this design is a draft already",
    );
    expect(await written()).toEqual(after);
  });

  it("changes the line in place on a draft (200)", async () => {
    const before = await written();
    const response = await sendJson(
      "POST",
      path(2, 1),
      { sku: original.sku, strands: 1 },
      builder,
    );
    expect(response.status, await response.clone().text()).toBe(200);
    const body = await response.json();
    expect(body.revision).toBe(2);
    expect(body.lines[0]).toMatchObject({
      sku: original.sku,
      strandsInHand: 1,
    });
    const after = await written();
    expect(after.revisions).toBe(before.revisions);
    expect(after.lines).toBe(before.lines);
  });
});

describe("when nothing in stock fits", () => {
  it("lists no substitutes and refuses to apply one with 409, writing nothing", async () => {
    // An aluminium line in a class 250 motor (IEC 60085's highest class here): the only other
    // aluminium wire in stock is class 200 or lower, so nothing can stand in for it.
    const aluminiumDesign = await createDesign(
      [
        {
          kind: "coil",
          itemId: aluminium.id,
          turns: 40,
          activeLengthMm: 50,
          endTurnLengthMm: 30,
        },
      ],
      { name: uniqueCode("Nothing-fits actuator") },
    );
    await testDb()
      .update(designRevisions)
      .set({ insulationClassC: 250 })
      .where(eq(designRevisions.id, aluminiumDesign.revisionId));
    const linePath = `/api/v1/designs/${aluminiumDesign.designId}/revisions/1/lines/1/substitutes?tolerance=0`;
    const listed = await get(linePath, storekeeper);
    expect(listed.status).toBe(200);
    expect((await listed.json()).substitutes).toEqual([]);

    const revisionsBefore = await testDb()
      .select({ id: designRevisions.id })
      .from(designRevisions)
      .where(eq(designRevisions.designId, aluminiumDesign.designId));
    const refused = await sendJson(
      "POST",
      linePath,
      { sku: twoOf071.sku, strands: 2 },
      builder,
    );
    expect(refused.status).toBe(409);
    expect((await refused.json()).error.message).toContain(
      "Nothing in stock can stand in",
    );
    const revisionsAfter = await testDb()
      .select({ id: designRevisions.id })
      .from(designRevisions)
      .where(eq(designRevisions.designId, aluminiumDesign.designId));
    expect(revisionsAfter).toEqual(revisionsBefore);
  });
});
