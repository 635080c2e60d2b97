/**
 * What the costing and insight APIs say about a cost beside its figure: the torque "per
 * N·m" is over (rated, or the first-order estimate when no rated torque is given), the
 * current-density check of a coil, and the price basis of the insight, switched by its
 * query. Real HTTP against the built app and the test database.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, signInAs } from "../support/app-client";
import { createPricedReleasedDesign } from "../support/insight-fixtures";
import { closeTestDatabase, testDatabase } from "../support/test-database";

let manager = "";
let designId = 0;
let revisionId = 0;

beforeAll(async () => {
  manager = await signInAs("manager");
  ({ designId } = await createPricedReleasedDesign());
  const [rows] = await testDatabase().query(
    "SELECT id FROM design_revisions WHERE design_id = ? AND revision = 1",
    [designId],
  );
  revisionId = (rows as { id: number }[])[0]!.id;
});
afterAll(closeTestDatabase);

interface Costing {
  basis: string;
  costPerMotor: number;
  ratedTorqueNm: number | null;
  costPerNm: number | null;
  perNmTorque: { torqueNm: number; source: string } | null;
  warnings: { code: string; line: number; message: string }[];
}

async function costing(query = ""): Promise<Costing> {
  const response = await get(
    `/api/v1/designs/${designId}/revisions/1/costing${query}`,
    manager,
  );
  expect(response.status, await response.clone().text()).toBe(200);
  return (await response.json()) as Costing;
}

/** Cost ÷ torque to 0.0001, half away from zero, as the costing rounds (positive figures). */
const perNm = (cost: number, torque: number) =>
  Math.round((cost / torque) * 10_000) / 10_000;

describe("cost per N·m without a rated torque", () => {
  it("is over the first-order estimate, and says so", async () => {
    // No rated torque; air gap r 30 mm, B_g 0.9 T, α_p 0.8, 10 A RMS phase current, twelve
    // coils of 40 turns with 50 mm active sides on 12 slots / 14 poles, double layer, star:
    // T = 3 · √2 · k_w1 · N_ph · B̂₁ · r · L · I with k_w1 = 0.9330 (Libert & Soulard's table,
    // from memory), N_ph = 160, B̂₁ = (4/π) · 0.9 T · sin 72° = 1.0898305 T: 10.3537 N·m
    // (by hand; GNU units: units -t '10 A * 3*sqrt(2) * sin(75deg)^2 * 160 * (4/pi * 0.9 T *
    // sin(72 deg)) * 30 mm * 50 mm' 'N m' → 10.353662).
    await testDatabase().query(
      `UPDATE design_revisions SET rated_torque_nm = NULL, air_gap_radius_mm = 30,
         air_gap_flux_density_t = 0.9, pole_coverage = 0.8 WHERE id = ?`,
      [revisionId],
    );
    await testDatabase().query(
      `UPDATE design_lines SET coils_per_motor = 12 WHERE revision_id = ? AND kind = 'coil'`,
      [revisionId],
    );
    const result = await costing();
    expect(result.ratedTorqueNm).toBeNull();
    expect(result.perNmTorque?.source).toBe("estimated");
    expect(result.perNmTorque?.torqueNm).toBeCloseTo(10.3537, 4);
    expect(result.costPerNm).toBe(
      perNm(
        result.costPerMotor,
        Number(result.perNmTorque!.torqueNm.toFixed(6)),
      ),
    );

    // The insight gives the same, marked the same way.
    const insight = await get(`/api/v1/insight/designs?perPage=50`, manager);
    const mine = (
      (await insight.json()) as (Costing & { designId: number })[]
    ).find((design) => design.designId === designId)!;
    expect(mine.perNmTorque?.source).toBe("estimated");
    expect(mine.costPerNm).toBe(result.costPerNm);
  });

  it("is over the rated torque when one is given", async () => {
    await testDatabase().query(
      "UPDATE design_revisions SET rated_torque_nm = 0.5 WHERE id = ?",
      [revisionId],
    );
    const result = await costing();
    expect(result.perNmTorque).toEqual({ torqueNm: 0.5, source: "rated" });
    expect(result.costPerNm).toBe(perNm(result.costPerMotor, 0.5));
  });
});

describe("the current-density check", () => {
  it("warns at 10 A in 0.8 mm copper (19.9 A/mm², above fan cooling)", async () => {
    // 10 A ÷ (π/4 · 0.8² mm²) = 10 ÷ 0.502655 = 19.894 A/mm² (by hand; GNU units:
    // units -t '10 A / (pi/4 * (0.8 mm)^2)' 'A/mm^2' → 19.894368). Ranges: common
    // practice, from memory (about 5–6 natural cooling, about 10 fan-cooled).
    const result = await costing();
    const warning = result.warnings.find((entry) =>
      entry.code.startsWith("current-density"),
    );
    expect(warning?.code).toBe("current-density-above-fan-cooling");
    expect(warning?.line).toBe(1);
    expect(warning?.message).toContain("19.9 A/mm²");
  });

  it("does not warn at 3 A (5.97 A/mm²)", async () => {
    await testDatabase().query(
      "UPDATE design_revisions SET rated_current_a = 3 WHERE id = ?",
      [revisionId],
    );
    const result = await costing();
    expect(
      result.warnings.filter((entry) => entry.code.startsWith("current")),
    ).toEqual([]);
    await testDatabase().query(
      "UPDATE design_revisions SET rated_current_a = 10 WHERE id = ?",
      [revisionId],
    );
  });
});

describe("the insight's price basis", () => {
  interface InsightDesign {
    designId: number;
    basis: string;
    costPerMotor: number;
    complete: boolean;
  }
  async function insight(query: string): Promise<InsightDesign> {
    const response = await get(
      `/api/v1/insight/designs?perPage=50${query}`,
      manager,
    );
    expect(response.status, await response.clone().text()).toBe(200);
    return ((await response.json()) as InsightDesign[]).find(
      (design) => design.designId === designId,
    )!;
  }

  it("is the best supplier price by default and the stock average when asked", async () => {
    expect((await insight("")).basis).toBe("best-price");
    // None of the fixture's items was ever received, so no line has a stock average:
    // the same design costed at the stock average is incomplete, and says its basis.
    const average = await insight("&basis=stock-average");
    expect(average.basis).toBe("stock-average");
    expect(average.complete).toBe(false);
    const designCosting = await costing("?basis=stock-average");
    expect(average.costPerMotor).toBe(designCosting.costPerMotor);
  });

  it("refuses a basis it does not know with the parameter named", async () => {
    const response = await get(
      "/api/v1/insight/designs?basis=cheapest",
      manager,
    );
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { message: string; fields?: Record<string, unknown> };
    };
    expect(JSON.stringify(body.error)).toContain("basis");
  });
});
