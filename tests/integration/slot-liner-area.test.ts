/**
 * The revision's slot liner and separator area (issue 19, fix 1) through the design API:
 * given on creation, changed by PATCH, refused at or above the slot area with nothing
 * written, copied to the next revision, and taken off the slot for the gross fill the
 * costing answers.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";
import { createIecWireItem } from "../support/substitute-fixtures";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let builder = "";
let fineSku = "";
beforeAll(async () => {
  builder = await signInAs("builder");
  fineSku = (await createIecWireItem(await signInAs("buyer"), "0.2")).sku;
});
afterAll(closeTestDatabase);

const revisionPath = (id: number, revision = 1) =>
  `/api/v1/designs/${id}/revisions/${revision}`;

async function newDesign(extra: Record<string, unknown>): Promise<Response> {
  return sendJson(
    "POST",
    "/api/v1/designs",
    {
      name: uniqueCode("Lined stator"),
      poles: 14,
      slots: 12,
      ratedCurrentA: 0.1,
      torqueBasis: "estimated",
      insulationClassC: 155,
      ...extra,
    },
    builder,
  );
}

describe("slotLinerAreaMm2", () => {
  it("refuses a liner filling the slot on creation, naming the field", async () => {
    const response = await newDesign({ slotAreaMm2: 60, slotLinerAreaMm2: 60 });
    expect(response.status).toBe(400);
    expect((await response.json()).error.fields).toHaveProperty(
      "slotLinerAreaMm2",
    );
  });

  it("is stored, changed, refused past the slot, copied, and taken off for the gross fill", async () => {
    const created = await newDesign({ slotAreaMm2: 60, slotLinerAreaMm2: 4 });
    expect(created.status, await created.clone().text()).toBe(201);
    const id = ((await created.json()) as { id: number }).id;
    expect(
      (await (await get(revisionPath(id), builder)).json()).slotLinerAreaMm2,
    ).toBe(4);

    // The winding: IEC 0.20 mm grade 2, 668 turns, two coil sides.
    const patched = await sendJson(
      "PATCH",
      revisionPath(id),
      {
        slotLinerAreaMm2: 6,
        lines: [
          {
            kind: "coil",
            sku: fineSku,
            turns: 668,
            strandsInHand: 1,
            activeLengthMm: 50,
            endTurnLengthMm: 30,
            leadLengthMm: 0,
            coilsPerMotor: 1,
            scrapPercent: 0,
            operatingTemperatureC: 20,
          },
        ],
      },
      builder,
    );
    expect(patched.status, await patched.clone().text()).toBe(200);
    expect((await patched.json()).slotLinerAreaMm2).toBe(6);

    // Only the slot area named, now below the stored liner: refused, nothing written.
    const shrunk = await sendJson(
      "PATCH",
      revisionPath(id),
      { slotAreaMm2: 5 },
      builder,
    );
    expect(shrunk.status).toBe(400);
    expect((await shrunk.json()).error.fields).toHaveProperty(
      "slotLinerAreaMm2",
    );
    const kept = await (await get(revisionPath(id), builder)).json();
    expect(kept).toMatchObject({ slotAreaMm2: 60, slotLinerAreaMm2: 6 });

    // units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2 - 6 mm^2)' → 1.1099371;
    // units -t '1336 * pi/4 * (0.2 mm)^2 / (60 mm^2)' → 0.69952796 (max overall 0.239 mm: IEC 60317-0-1).
    const costing = await (
      await get(`${revisionPath(id)}/costing`, builder)
    ).json();
    expect(costing.coils[0].grossFill).toBeCloseTo(1.1099371, 6);
    expect(costing.coils[0].copperFill).toBeCloseTo(0.69952796, 7);
    expect(costing.warnings[0].code).toBe("above-hexagonal-packing-limit");

    expect(
      (await sendJson("POST", `${revisionPath(id)}/release`, {}, builder))
        .status,
    ).toBeLessThan(300);
    const next = await sendJson(
      "POST",
      `/api/v1/designs/${id}/revisions`,
      {},
      builder,
    );
    expect(next.status).toBe(201);
    expect(
      (await (await get(revisionPath(id, 2), builder)).json()).slotLinerAreaMm2,
    ).toBe(6);
  });
});
