/**
 * The engineering operations (estimates and reference tables) answer as the contract
 * says (docs/decisions/046): each status one the operation documents, each body matching
 * its documented schema, for round, litz and flat wire, with and without the AC and
 * thermal figures, and for magnets of a grade and of typed properties.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiDocument } from "~/api-contract/document";
import { kestrelToothCoil } from "~/api-contract/schemas/engineering";
import { baseUrl, bearerTokenAs, sendWithToken } from "../support/app-client";
import { contractProblems, expectConforming } from "../support/api-contract";
import { closeTestDatabase } from "../support/test-database";

let builder = "";
let storekeeper = "";

beforeAll(async () => {
  builder = await bearerTokenAs("builder");
  storekeeper = await bearerTokenAs("storekeeper");
});
afterAll(closeTestDatabase);

/** The Kestrel 60-30 outrunner's tooth coil (seed/demo-designs.ts), without a current. */
const kestrelCoil = { ...kestrelToothCoil, currentA: null };

async function answerOf(
  method: "GET" | "POST",
  path: string,
  authorization: string,
  status: number,
  body?: unknown,
) {
  const response = await sendWithToken(method, path, authorization, body);
  expect(response.status, await response.clone().text()).toBe(status);
  return expectConforming(response, method, path.split("?")[0]!);
}

describe("the engineering operations against the contract", () => {
  it("documents examples that conform to their own answers", () => {
    const examples: [string, string, string][] = [
      ["POST", "/api/v1/coil-estimates", "CoilEstimate"],
      ["POST", "/api/v1/magnet-estimates", "MagnetEstimate"],
      ["POST", "/api/v1/winding-factors", "WindingFactors"],
      ["POST", "/api/v1/slot-fills", "SlotFill"],
      ["GET", "/api/v1/wire-sizes", "WireSizeList"],
    ];
    const schemas = apiDocument().components?.schemas ?? {};
    for (const [method, path, id] of examples) {
      const example = (schemas[id] as { example?: unknown }).example;
      expect(example, id).toBeDefined();
      expect(
        contractProblems(method, path, 200, "application/json", example),
      ).toEqual([]);
    }
    const grade = (schemas.MagnetGrade as { example?: unknown }).example;
    expect(
      contractProblems(
        "GET",
        "/api/v1/magnet-grades",
        200,
        "application/json",
        [grade],
      ),
    ).toEqual([]);
  });

  it("estimates coils of round, litz and flat wire, with AC and thermal figures", async () => {
    const round = await answerOf(
      "POST",
      "/api/v1/coil-estimates",
      builder,
      200,
      {
        ...kestrelCoil,
        currentA: 6,
        frequencyHz: 175,
        harmonics: [{ order: 5, currentA: 0.4 }],
        thermal: { ambientC: 40, thermalResistanceKPerW: 2 },
      },
    );
    expect(round).toMatchObject({
      wire: { kind: "round", litz: null, rectangular: null },
      operatingPoint: { method: "thermal-resistance" },
    });

    const litz = await answerOf(
      "POST",
      "/api/v1/coil-estimates",
      storekeeper,
      200,
      {
        ...kestrelCoil,
        wire: {
          standard: "litz",
          strands: 100,
          strandWire: { standard: "IEC", diameterMm: 0.1 },
        },
        insulation: null,
      },
    );
    expect(litz).toMatchObject({
      wire: { kind: "litz" },
      copperLossW: null,
      acLoss: null,
      operatingPoint: null,
    });

    const flat = await answerOf(
      "POST",
      "/api/v1/coil-estimates",
      builder,
      200,
      {
        ...kestrelCoil,
        wire: {
          standard: "rectangular",
          thicknessMm: 2,
          widthMm: 8,
          edgewise: true,
        },
        insulation: "grade1",
        currentA: 20,
        thermal: { ambientC: 25, temperatureRiseK: 60 },
      },
    );
    expect(flat).toMatchObject({
      wire: { kind: "rectangular", rectangular: { edgewise: true } },
      operatingPoint: { method: "temperature-rise" },
    });
  });

  it("refuses a coil as documented: a bad body, a size the tables lack, no sign-in", async () => {
    const bad = await answerOf("POST", "/api/v1/coil-estimates", builder, 400, {
      ...kestrelCoil,
      turns: 0,
    });
    expect(bad).toMatchObject({
      error: { fields: { turns: expect.any(Array) } },
    });

    await answerOf("POST", "/api/v1/coil-estimates", builder, 400, {
      ...kestrelCoil,
      wire: { standard: "AWG", size: "99" },
    });

    await answerOf("POST", "/api/v1/coil-estimates", builder, 400, {
      ...kestrelCoil,
      harmonics: [{ order: 3, currentA: 1 }],
    });

    const anonymous = await fetch(`${baseUrl()}/api/v1/coil-estimates`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify(kestrelCoil),
    });
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "POST", "/api/v1/coil-estimates");
  });

  it("estimates magnets of a grade and of typed properties, and refuses as documented", async () => {
    const n42sh = await answerOf(
      "POST",
      "/api/v1/magnet-estimates",
      builder,
      200,
      {
        grade: "N42SH",
        shape: { kind: "block", lengthMm: 30, widthMm: 12, heightMm: 4 },
        count: 14,
        temperatureC: 150,
        magnetLengthMm: 4,
        airGapMm: 0.8,
        demagnetisingFieldKAm: 900,
      },
    );
    expect(n42sh).toMatchObject({
      gradeName: "N42SH",
      workingPoint: { pastKnee: true },
    });
    expect(
      (n42sh as { warnings: { code: string }[] }).warnings.map((w) => w.code),
    ).toEqual(["past-the-knee"]);

    const typed = await answerOf(
      "POST",
      "/api/v1/magnet-estimates",
      storekeeper,
      200,
      {
        properties: {
          name: "Maker sheet ferrite",
          material: "hard-ferrite",
          br20T: 0.4,
          brTemperatureCoefficientPerK: -0.002,
          densityGPerCm3: 4.9,
          maxWorkingTemperatureC: 250,
        },
        shape: {
          kind: "arc",
          innerRadiusMm: 24,
          outerRadiusMm: 28,
          angleDeg: 30,
          axialLengthMm: 25,
        },
        temperatureC: -20,
      },
    );
    expect(typed).toMatchObject({ hcjKAm: null, workingPoint: null });

    await answerOf("POST", "/api/v1/magnet-estimates", builder, 400, {
      grade: "N99XYZ",
      shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
    });
    await answerOf("POST", "/api/v1/magnet-estimates", builder, 400, {
      grade: "N42SH",
      shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
      temperatureC: 390,
    });
    await answerOf("POST", "/api/v1/magnet-estimates", builder, 400, {
      shape: { kind: "disc", diameterMm: 10, thicknessMm: 2 },
    });
  });

  it("calculates winding factors and refuses an unbalanced winding as documented", async () => {
    const kestrel = await answerOf(
      "POST",
      "/api/v1/winding-factors",
      builder,
      200,
      {
        slots: 12,
        poles: 14,
        layers: 2,
      },
    );
    expect(kestrel).toMatchObject({ kind: "concentrated", coilPitch: 1 });
    await answerOf("POST", "/api/v1/winding-factors", storekeeper, 200, {
      slots: 36,
      poles: 4,
      layers: 1,
      coilPitch: 9,
    });
    const unbalanced = await answerOf(
      "POST",
      "/api/v1/winding-factors",
      builder,
      400,
      {
        slots: 13,
        poles: 4,
        layers: 2,
      },
    );
    expect(unbalanced).toMatchObject({ error: { fields: expect.any(Object) } });
    await answerOf("POST", "/api/v1/winding-factors", builder, 400, {
      slots: 12,
      poles: 14,
      layers: 3,
    });
  });

  it("assesses slot fills, judged on gross and on copper fill, and refuses as documented", async () => {
    const gross = await answerOf("POST", "/api/v1/slot-fills", builder, 200, {
      wire: { standard: "IEC", diameterMm: 0.5 },
      insulation: "grade2",
      strands: 2,
      turns: 18,
      coilSidesPerSlot: 2,
      slotAreaMm2: 38,
    });
    expect(gross).toMatchObject({
      judgedOn: "gross",
      insulationAssumed: false,
    });
    const crowded = await answerOf(
      "POST",
      "/api/v1/slot-fills",
      storekeeper,
      200,
      {
        wire: { standard: "AWG", size: "20" },
        turns: 120,
        coilSidesPerSlot: 2,
        slotAreaMm2: 95,
        linerAreaMm2: 8,
      },
    );
    expect(crowded).toMatchObject({ insulation: "heavy", fits: false });
    expect((crowded as { limitCode: string | null }).limitCode).not.toBeNull();

    await answerOf("POST", "/api/v1/slot-fills", builder, 400, {
      wire: { standard: "IEC", diameterMm: 0.5 },
      turns: 18,
      slotAreaMm2: 38,
      linerAreaMm2: 40,
    });
    await answerOf("POST", "/api/v1/slot-fills", builder, 400, {
      wire: { standard: "IEC", diameterMm: 77 },
      turns: 18,
      slotAreaMm2: 38,
    });
  });

  it("lists wire sizes and magnet grades, and refuses a bad standard as documented", async () => {
    const awg = (await answerOf(
      "GET",
      "/api/v1/wire-sizes?standard=AWG",
      builder,
      200,
    )) as {
      size: string;
    }[];
    expect(awg.map((size) => size.size)).toContain("20");
    const iec = (await answerOf(
      "GET",
      "/api/v1/wire-sizes?standard=IEC",
      storekeeper,
      200,
    )) as {
      size: string;
    }[];
    expect(iec.map((size) => size.size)).toContain("0.500");

    const bad = await answerOf(
      "GET",
      "/api/v1/wire-sizes?standard=SWG",
      builder,
      400,
    );
    expect(bad).toMatchObject({
      error: { fields: { standard: expect.any(Array) } },
    });
    await answerOf("GET", "/api/v1/wire-sizes", builder, 400);

    const grades = (await answerOf(
      "GET",
      "/api/v1/magnet-grades",
      storekeeper,
      200,
    )) as {
      name: string;
    }[];
    expect(grades.map((grade) => grade.name)).toContain("N42SH");

    const anonymous = await fetch(`${baseUrl()}/api/v1/magnet-grades`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", "/api/v1/magnet-grades");
  });
});
