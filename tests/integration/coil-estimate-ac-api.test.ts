import { beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";

let cookie = "";
beforeAll(async () => {
  cookie = await signInAs("builder");
});

const post = (body: unknown) =>
  sendJson("POST", "/api/v1/coil-estimates", body, cookie);

/** Worked check 4 of the engineering brief: 0.80 mm copper, N 40, active 50 mm, end 30 mm. */
const workedCoil = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

function expectClose(actual: number, expected: number, relative: number) {
  expect(
    Math.abs(actual - expected) / expected,
    `${actual} should be within ${relative} of ${expected}`,
  ).toBeLessThanOrEqual(relative);
}

describe("POST /api/v1/coil-estimates: current density and AC resistance", () => {
  it("answers at 10 kHz in four layers with the figures worked by hand", async () => {
    const response = await post({
      ...workedCoil,
      currentA: 10,
      frequencyHz: 10_000,
      layersPerCoil: 4,
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    // GNU units: skin depth of IEC 60028 copper at 10 kHz, 20 °C: 0.66085493 mm.
    expectClose(body.perCoil.skinDepthMm, 0.66085493, 1e-6);
    // Dowell, m = 4, Δ = 1.0099532 (bare pitch), evaluated in GNU units: 2.7529527.
    expectClose(body.perCoil.acResistanceRatio, 2.7529527, 1e-6);
    expectClose(body.perCoil.acResistanceOhm, 0.21952406 * 2.7529527, 1e-6);
    // 10 A / (π/4 · 0.8²) = 19.894368 A/mm².
    expectClose(body.perCoil.currentDensityAPerMm2, 19.894368, 1e-7);
    expectClose(body.acLoss.lossPerCoilW, 100 * 0.21952406 * 2.7529527, 1e-6);
    // The existing fields are as before: worked check 4's 0.21952 Ω and 21.952 W.
    expectClose(body.perCoil.resistance20Ohm, 0.21952, 5e-5);
    expectClose(body.copperLossW, 21.952, 5e-5);
    expect(body.total.currentDensityAPerMm2).toBeUndefined();
  });

  it("gives the four new fields as null without a current or a frequency", async () => {
    const body = await (await post(workedCoil)).json();
    expect(body.perCoil).toMatchObject({
      currentDensityAPerMm2: null,
      skinDepthMm: null,
      acResistanceOhm: null,
      acResistanceRatio: null,
    });
    expect(body.acLoss).toBeNull();
    expect(body.operatingPoint).toBeNull();
  });

  it("adds harmonics at their own frequencies", async () => {
    const body = await (
      await post({
        ...workedCoil,
        currentA: 10,
        frequencyHz: 50,
        harmonics: [
          { order: 5, currentA: 2 },
          { order: 7, currentA: 1 },
        ],
      })
    ).json();
    expect(
      body.acLoss.harmonics.map((h: { frequencyHz: number }) => h.frequencyHz),
    ).toEqual([50, 250, 350]);
    // At 50–350 Hz a 0.8 mm wire has R_ac ≈ R_dc (Δ ≤ 0.3): loss ≈ (100 + 4 + 1) · 0.21952 W.
    expectClose(body.acLoss.lossPerCoilW, 105 * 0.21952406, 1e-3);
  });

  it("takes litz wire: 100 × 0.100 mm, 0.143305 Ω (take-up 1.02, GNU units)", async () => {
    const response = await post({
      ...workedCoil,
      wire: {
        standard: "litz",
        strands: 100,
        strandWire: { standard: "IEC", diameterMm: 0.1 },
      },
      insulation: "grade1",
      currentA: 5,
      frequencyHz: 50_000,
      layersPerCoil: 2,
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    expectClose(body.perCoil.resistance20Ohm, 0.14330531, 1e-7);
    expect(body.wire.kind).toBe("litz");
    expect(body.wire.litz.strandInsulationAssumed).toBe(false);
    expect(body.perCoil.acResistanceRatio).toBeGreaterThan(1);
  });

  it("takes flat wire: 2.00 × 8.00 mm, 0.0070565 Ω (IEC 60317-0-2 corner 0.65 mm, GNU units)", async () => {
    const response = await post({
      ...workedCoil,
      wire: { standard: "rectangular", thicknessMm: 2, widthMm: 8 },
      insulation: "grade2",
    });
    expect(response.status).toBe(200);
    const body = await response.json();
    expectClose(body.perCoil.resistance20Ohm, 0.0070565037, 1e-7);
    expectClose(body.wire.areaMm2, 15.637323, 1e-7);
    expectClose(body.wire.rectangular.overallWidthMm, 8.19, 1e-12);
  });

  it("finds the operating temperature from a thermal resistance: 97.2306 °C", async () => {
    const body = await (
      await post({
        ...workedCoil,
        currentA: 10,
        thermal: { ambientC: 40, thermalResistanceKPerW: 2 },
      })
    ).json();
    // Closed form (40 + 2·100·R20·(1 − 20α))/(1 − 2·100·R20·α), R20 0.21952406, α 0.00393.
    expectClose(body.operatingPoint.temperatureC, 97.230644, 1e-6);
    expectClose(body.operatingPoint.lossPerCoilW, 28.615322, 1e-6);
  });

  it.each([
    ["frequencyHz", { frequencyHz: -5 }],
    ["frequencyHz", { frequencyHz: 2e7 }],
    ["frequencyHz", { harmonics: [{ order: 3, currentA: 1 }], currentA: 10 }],
    ["currentA", { harmonics: [{ order: 3, currentA: 1 }], frequencyHz: 50 }],
    [
      "harmonics.0.order",
      { harmonics: [{ order: 1, currentA: 1 }], frequencyHz: 50, currentA: 1 },
    ],
    [
      "harmonics.1.order",
      {
        harmonics: [
          { order: 3, currentA: 1 },
          { order: 3, currentA: 1 },
        ],
        frequencyHz: 50,
        currentA: 1,
      },
    ],
    ["layersPerCoil", { layersPerCoil: 0, frequencyHz: 50 }],
    [
      "thermal.thermalResistanceKPerW",
      {
        currentA: 10,
        thermal: {
          ambientC: 40,
          thermalResistanceKPerW: 2,
          temperatureRiseK: 50,
        },
      },
    ],
    [
      "thermal.thermalResistanceKPerW",
      { currentA: 10, thermal: { ambientC: 40, thermalResistanceKPerW: 20 } },
    ],
    [
      "thermal.ambientC",
      { currentA: 10, thermal: { ambientC: 900, temperatureRiseK: 5 } },
    ],
    ["currentA", { thermal: { ambientC: 40, temperatureRiseK: 50 } }],
    [
      "wire.strands",
      {
        wire: {
          standard: "litz",
          strands: 1,
          strandWire: { standard: "IEC", diameterMm: 0.1 },
        },
      },
    ],
    [
      "wire.strandWire.diameterMm",
      {
        wire: {
          standard: "litz",
          strands: 10,
          strandWire: { standard: "IEC", diameterMm: 6.3 },
        },
      },
    ],
    [
      "wire.thicknessMm",
      { wire: { standard: "rectangular", thicknessMm: 0.5, widthMm: 3 } },
    ],
    [
      "wire.widthMm",
      { wire: { standard: "rectangular", thicknessMm: 1, widthMm: 12 } },
    ],
    [
      "wire.cornerRadiusMm",
      {
        wire: {
          standard: "rectangular",
          thicknessMm: 2,
          widthMm: 8,
          cornerRadiusMm: 1.5,
        },
      },
    ],
    [
      "insulation",
      {
        wire: { standard: "rectangular", thicknessMm: 2, widthMm: 8 },
        insulation: "grade3",
      },
    ],
  ])("refuses a bad %s with 400 naming the field", async (field, change) => {
    const response = await post({ ...workedCoil, ...change });
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { message: string; fields: Record<string, string[]> };
    };
    expect(Object.keys(body.error.fields)).toContain(field);
    expect(body.error.fields[field]![0]!.length).toBeGreaterThan(5);
  });
});
