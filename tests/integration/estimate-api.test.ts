import { beforeAll, describe, expect, it } from "vitest";
import { get, sendJson, signInAs } from "../support/app-client";

let cookie = "";
beforeAll(async () => {
  cookie = await signInAs("builder");
});

const post = (path: string, body: unknown) =>
  sendJson("POST", path, body, cookie);

/** Worked check 4 of the engineering brief: 0.80 mm copper, N 40, active 50 mm, end 30 mm. */
const workedCoil = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

function expectClose(actual: number, expected: number, relative: number) {
  expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(relative);
}

describe("POST /api/v1/coil-estimates", () => {
  it("answers the brief's worked check 4 (MLT 160 mm, 6.400 m, 0.21952 Ω, 28.60 g)", async () => {
    const response = await post("/api/v1/coil-estimates", workedCoil);
    expect(response.status).toBe(200);
    const body = await response.json();
    // Source: engineering brief, worked check 4 (printed to 4–5 significant figures).
    expect(body.meanTurnLengthMm).toBe(160);
    expectClose(body.perCoil.conductorLengthM, 6.4, 1e-9);
    expectClose(body.perCoil.resistance20Ohm, 0.21952, 5e-5);
    expectClose(body.perCoil.woundMassKg, 0.0286, 2e-3);
    expect(body.activeShare).toBeCloseTo(50 / 80, 12);
    expect(body.perCoil.forceLengthM).toBeCloseTo(2 * 40 * 0.05, 12);
    expect(body.copperLossW).toBeNull();
    expect(body.wire.overallDiameterMm).toBeNull();
  });

  it("adds leads, scrap, temperature, coils and loss as the contract says (worked checks 4 and 5)", async () => {
    const response = await post("/api/v1/coil-estimates", {
      ...workedCoil,
      leadLengthMm: 150,
      scrapPercent: 3,
      coilCount: 12,
      temperatureC: 120,
      currentA: 10,
    });
    const body = await response.json();
    // Source: engineering brief, worked check 4: with two 150 mm leads 6.700 m, 0.22981 Ω, 29.94 g;
    // 3 % scrap → 6.901 m and 30.84 g drawn from stock, resistance unchanged.
    expectClose(body.perCoil.conductorLengthM, 6.7, 1e-9);
    expectClose(body.perCoil.resistance20Ohm, 0.22981, 5e-5);
    expectClose(body.perCoil.purchasedLengthM, 6.901, 1e-4);
    expectClose(body.perCoil.purchasedMassKg, 0.03084, 2e-3);
    // Source: worked check 3 ratio 3.0580/2.1952 for 20 → 120 °C copper (IEC 60028 α20 0.00393).
    expectClose(
      body.perCoil.resistanceOhm / body.perCoil.resistance20Ohm,
      3.058 / 2.1952,
      1e-4,
    );
    for (const field of [
      "conductorLengthM",
      "purchasedLengthM",
      "woundMassKg",
      "resistanceOhm",
      "forceLengthM",
    ]) {
      expectClose(body.total[field], 12 * body.perCoil[field], 1e-12);
    }
    expectClose(body.copperLossW, 12 * 100 * body.perCoil.resistanceOhm, 1e-12);
  });

  it("accepts AWG sizes with insulation (ASTM B258 formula: AWG 20 = 0.81182 mm)", async () => {
    const response = await post("/api/v1/coil-estimates", {
      ...workedCoil,
      wire: { standard: "AWG", size: "20" },
      insulation: "heavy",
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    // Source: engineering brief, worked check 1 (ASTM B258 formula).
    expectClose(body.wire.bareDiameterMm, 0.81182, 1e-5);
    expect(body.wire.overallDiameterMm).toBeGreaterThan(
      body.wire.bareDiameterMm,
    );
  });

  it.each([
    ["turns", { turns: 0 }],
    ["turns", { turns: -3 }],
    ["turns", { turns: 2.5 }],
    ["turns", { turns: "forty" }],
    ["turns", { turns: 100_001 }],
    ["wire", { wire: undefined }],
    ["wire.size", { wire: { standard: "AWG", size: "99" } }],
    ["wire.diameterMm", { wire: { standard: "IEC", diameterMm: 0.8105 } }],
    ["activeLengthMm", { activeLengthMm: 0 }],
    ["activeLengthMm", { activeLengthMm: 100_001 }],
    ["endTurnLengthMm", { endTurnLengthMm: -1 }],
    ["conductor", { conductor: "gold" }],
    ["insulation", { insulation: "heavy" }],
    ["scrapPercent", { scrapPercent: -2 }],
  ])("refuses a bad %s with 400 naming the field", async (field, change) => {
    const response = await post("/api/v1/coil-estimates", {
      ...workedCoil,
      ...change,
    });
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { message: string; fields: Record<string, string[]> };
    };
    expect(Object.keys(body.error.fields)).toContain(field);
    expect(body.error.fields[field]![0]!.length).toBeGreaterThan(5);
  });

  it("refuses Infinity and NaN spelt in JSON", async () => {
    for (const raw of ['{"turns": 1e999}', '{"turns": NaN}']) {
      const body = JSON.stringify(workedCoil).replace(
        '"turns":40',
        raw.slice(1, -1),
      );
      const base = (await import("../support/app-client")).baseUrl();
      const response = await fetch(`${base}/api/v1/coil-estimates`, {
        method: "POST",
        headers: {
          "Content-Type": "application/json",
          Cookie: cookie,
          Origin: base,
        },
        body,
      });
      expect(response.status).toBe(400);
      expect(await response.text()).not.toContain('NaN"');
    }
  });

  it("needs a signed-in caller and POST", async () => {
    expect(
      (await sendJson("POST", "/api/v1/coil-estimates", workedCoil)).status,
    ).toBe(401);
    expect((await get("/api/v1/coil-estimates", cookie)).status).toBe(405);
  });
});

describe("POST /api/v1/magnet-estimates", () => {
  it("answers the brief's worked check 7 (B_g = 1.0297 T; Br 1.1752 T at 100 °C)", async () => {
    const at20 = await post("/api/v1/magnet-estimates", {
      grade: "N42",
      br20T: 1.3,
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 4 },
      magnetLengthMm: 4,
      airGapMm: 1,
    });
    expect(at20.status).toBe(200);
    const body = await at20.json();
    // Source: engineering brief, worked check 7 (Hanselman: B_g = Br·l_m/(l_m + μ_rec·g)).
    expectClose(body.airGapFluxDensityT, 1.0297, 5e-5);
    // Volume 20 × 10 × 4 mm = 800 mm³; NdFeB about 7.5 g/cm³ (brief) → 6.0 g.
    expectClose(body.massPerPieceKg, 0.006, 1e-9);

    const at100 = await (
      await post("/api/v1/magnet-estimates", {
        grade: "N42",
        br20T: 1.3,
        temperatureC: 100,
        shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
      })
    ).json();
    expectClose(at100.brT, 1.1752, 5e-5);
    // 100 °C is above N42's 80 °C working limit (brief: no suffix → 80 °C).
    expect(
      at100.warnings.map((warning: { code: string }) => warning.code),
    ).toContain("above-max-working-temperature");
  });

  it("refuses an unknown grade, both grade and properties, and impossible shapes", async () => {
    const unknown = await post("/api/v1/magnet-estimates", {
      grade: "N99",
      shape: { kind: "disc", diameterMm: 5, thicknessMm: 1 },
    });
    expect(unknown.status).toBe(400);
    expect((await unknown.json()).error.fields.grade).toBeTruthy();
    const ring = await post("/api/v1/magnet-estimates", {
      grade: "N42SH",
      shape: {
        kind: "ring",
        outerDiameterMm: 10,
        innerDiameterMm: 12,
        thicknessMm: 2,
      },
    });
    expect(ring.status).toBe(400);
  });
});

describe("reference lists", () => {
  it("lists AWG 0000–46 and the IEC diameters, and needs a standard", async () => {
    const awg = (await (
      await get("/api/v1/wire-sizes?standard=AWG", cookie)
    ).json()) as { size: string }[];
    expect(awg).toHaveLength(50);
    expect(awg[0]!.size).toBe("0000");
    const iec = (await (
      await get("/api/v1/wire-sizes?standard=IEC", cookie)
    ).json()) as { size: string }[];
    expect(iec.map((row) => row.size)).toContain("0.800");
    expect((await get("/api/v1/wire-sizes", cookie)).status).toBe(400);
  });

  it("lists magnet grades with their working temperature (brief: SH → 150 °C)", async () => {
    const grades = (await (
      await get("/api/v1/magnet-grades", cookie)
    ).json()) as {
      name: string;
      maxWorkingTemperatureC: number;
    }[];
    expect(
      grades.find((grade) => grade.name === "N42SH")?.maxWorkingTemperatureC,
    ).toBe(150);
  });
});
