/**
 * Issue 19, fixes 2, 6 and 8 through the API: magnets past their usable temperature,
 * the knee check, nonsense coil input answered with 400 (never 500), and IEC sizes
 * between the R20/R40 steps for estimates and stock items.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";
import { closeTestDatabase, testDatabase } from "../support/test-database";

let builder = "";
let buyer = "";

beforeAll(async () => {
  builder = await signInAs("builder");
  buyer = await signInAs("buyer");
});

afterAll(async () => {
  await closeTestDatabase();
});

interface ApiError {
  error: { message: string; fields: Record<string, string[]> };
}

const post = (path: string, body: unknown, cookie = builder) =>
  sendJson("POST", path, body, cookie);

const disc = { kind: "disc", diameterMm: 10, thicknessMm: 5 };

describe("POST /api/v1/magnet-estimates past the usable temperature", () => {
  it("refuses N42 at 400 °C with 400 on temperatureC: above the Curie point (310 °C)", async () => {
    // Before issue 19 this answered 200 with Br 0.707 T.
    const response = await post("/api/v1/magnet-estimates", {
      grade: "N42",
      shape: disc,
      temperatureC: 400,
    });
    expect(response.status).toBe(400);
    const body = (await response.json()) as ApiError;
    expect(body.error.fields.temperatureC![0]).toContain("Curie temperature");
  });

  it("refuses N42 at 200 °C: past the linear Br model, which stops at 150 °C", async () => {
    const response = await post("/api/v1/magnet-estimates", {
      grade: "N42",
      shape: disc,
      temperatureC: 200,
    });
    expect(response.status).toBe(400);
    const body = (await response.json()) as ApiError;
    expect(body.error.fields.temperatureC![0]).toContain("150 °C");
  });

  it("answers the knee check: a thin N42 over 5 mm at 150 °C passes it", async () => {
    // Hand-worked in app/engineering/magnet-estimate.test.ts: H_m = −698.50 kA/m
    // (GNU units), knee 0.9 × 210.1 = 189.09 kA/m.
    const response = await post("/api/v1/magnet-estimates", {
      grade: "N42",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 1 },
      temperatureC: 150,
      magnetLengthMm: 1,
      airGapMm: 5,
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.hcjKAm).toBeCloseTo(210.1, 6);
    expect(body.workingPoint.selfFieldKAm).toBeCloseTo(-698.5, 1);
    expect(body.workingPoint.pastKnee).toBe(true);
    expect(body.warnings.map((w: { code: string }) => w.code)).toContain(
      "past-the-knee",
    );
    expect(body.temperatureRange).toMatchObject({
      minC: -70,
      maxC: 150,
      curieTemperatureC: 310,
    });
  });

  it("takes typed SmCo properties by their own material's limits", async () => {
    // Sm2Co17 at 300 °C is inside its range (Curie 825 °C); as NdFeB it would not be.
    const properties = {
      name: "Data sheet 2:17",
      br20T: 1.08,
      brTemperatureCoefficientPerK: -0.0003,
      densityGPerCm3: 8.4,
      maxWorkingTemperatureC: 350,
      material: "sm2co17",
      hcjKAm: 1433,
      hcjTemperatureCoefficientPerK: -0.002,
    };
    const response = await post("/api/v1/magnet-estimates", {
      properties,
      shape: disc,
      temperatureC: 300,
    });
    expect(response.status, await response.clone().text()).toBe(200);
    // Hand-worked: 1433 × (1 − 0.002 × 280) = 1433 × 0.44 = 630.52 kA/m.
    expect((await response.json()).hcjKAm).toBeCloseTo(630.52, 6);
  });

  it.each([
    ["br20T", { br20T: -1.3 }],
    ["demagnetisingFieldKAm", { demagnetisingFieldKAm: -5 }],
    ["count", { count: 0 }],
    ["temperatureC", { temperatureC: -80 }],
  ])("refuses a bad %s with 400 naming it", async (field, change) => {
    const response = await post("/api/v1/magnet-estimates", {
      grade: "N42",
      shape: disc,
      ...change,
    });
    expect(response.status).toBe(400);
    expect(
      Object.keys(((await response.json()) as ApiError).error.fields),
    ).toContain(field);
  });

  it("lists each grade's HcJ coefficient and Curie temperature", async () => {
    const grades = (await (
      await get("/api/v1/magnet-grades", builder)
    ).json()) as {
      name: string;
      hcjTemperatureCoefficientPerK: number | null;
      curieTemperatureC: number | null;
    }[];
    expect(grades.find((grade) => grade.name === "N42")).toMatchObject({
      hcjTemperatureCoefficientPerK: -0.006,
      curieTemperatureC: 310,
    });
    expect(grades.find((grade) => grade.name === "C5 (Y30)")).toMatchObject({
      hcjTemperatureCoefficientPerK: 0.0027,
      curieTemperatureC: 450,
    });
  });
});

/** Worked check 4 of the engineering brief. */
const workedCoil = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

describe("POST /api/v1/coil-estimates with nonsense (fix 6) and in-between sizes (fix 8)", () => {
  it.each([
    ["turns", { turns: -5 }],
    ["strandsInHand", { strandsInHand: 0 }],
    ["coilCount", { coilCount: -3 }],
    ["temperatureC", { temperatureC: 1000 }],
    ["leadLengthMm", { leadLengthMm: -1 }],
    ["currentA", { currentA: -10 }],
    ["wire.diameterMm", { wire: { standard: "IEC", diameterMm: 6.3 } }],
    ["wire.diameterMm", { wire: { standard: "IEC", diameterMm: 0.3505 } }],
  ])("answers 400 (not 500) naming %s", async (field, change) => {
    const response = await post("/api/v1/coil-estimates", {
      ...workedCoil,
      ...change,
    });
    expect(response.status).toBe(400);
    const body = (await response.json()) as ApiError;
    expect(Object.keys(body.error.fields).join(" ")).toContain(field);
  });

  it("estimates 0.350 mm grade 2, its overall diameter interpolated and flagged", async () => {
    const response = await post("/api/v1/coil-estimates", {
      ...workedCoil,
      wire: { standard: "IEC", diameterMm: 0.35 },
      insulation: "grade2",
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    expect(body.wire.bareDiameterMm).toBe(0.35);
    // 0.239 + 0.5 × (0.566 − 0.239) = 0.4025 mm between the 0.200 and 0.500 mm rows.
    expect(body.wire.overallDiameterMm).toBeCloseTo(0.4025, 9);
    expect(body.wire.overallDiameterIsEstimate).toBe(true);
  });
});

describe("stock items of IEC sizes between the steps (fix 8)", () => {
  it("creates a 0.350 mm grade 2 wire item and refuses 0.3505 mm and 6 mm with 400 on size", async () => {
    const sku = `W035-${randomBytes(3).toString("hex").toUpperCase()}`;
    const wire = {
      kind: "wire",
      sku,
      name: "Enamelled copper 0.35 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.35",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
    };
    const created = await post("/api/v1/items", wire, buyer);
    expect(created.status, await created.clone().text()).toBe(201);
    const [rows] = await testDatabase().query(
      "SELECT w.size_label FROM wire_items w JOIN items i ON i.id = w.item_id WHERE i.sku = ?",
      [sku],
    );
    expect(rows).toEqual([{ size_label: "0.350" }]);

    for (const size of ["0.3505", "6"]) {
      const refused = await post(
        "/api/v1/items",
        { ...wire, sku: `${sku}X`, size },
        buyer,
      );
      expect(refused.status).toBe(400);
      expect(
        Object.keys(((await refused.json()) as ApiError).error.fields),
      ).toContain("size");
    }
    const [none] = await testDatabase().query(
      "SELECT COUNT(*) AS n FROM items WHERE sku = ?",
      [`${sku}X`],
    );
    expect(none).toEqual([{ n: 0 }]);
  });
});
