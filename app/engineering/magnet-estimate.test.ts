import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import {
  airGapFluxDensityT,
  estimateMagnet,
  magnetVolumeMm3,
  massKgFromVolume,
  remanenceAtTemperatureT,
} from "./magnet-estimate";
import { expectMatchesPrinted } from "./printed-value.test-support";

describe("worked check 7 (brief)", () => {
  it("Br 1.30 T, l_m 4 mm, g 1 mm, μ_rec 1.05: B_g = 1.0297 T (Hanselman)", () => {
    expectMatchesPrinted(
      airGapFluxDensityT({
        brT: 1.3,
        magnetLengthMm: 4,
        airGapMm: 1,
        recoilPermeability: 1.05,
      }),
      "1.0297",
    );
  });

  it("Br 1.30 T at 100 °C with αBr −0.12 %/K: 1.1752 T", () => {
    expectMatchesPrinted(remanenceAtTemperatureT(1.3, -0.0012, 100), "1.1752");
  });

  it("through estimateMagnet with a NdFeB grade (μrec 1.05, αBr −0.12 %/K)", () => {
    const shape = {
      kind: "block",
      lengthMm: 20,
      widthMm: 10,
      heightMm: 4,
    } as const;
    const cold = estimateMagnet({
      grade: "N42SH",
      shape,
      br20T: 1.3,
      magnetLengthMm: 4,
      airGapMm: 1,
    });
    expectMatchesPrinted(cold.airGapFluxDensityT ?? NaN, "1.0297");
    const hot = estimateMagnet({
      grade: "N42SH",
      shape,
      br20T: 1.3,
      magnetLengthMm: 4,
      airGapMm: 1,
      temperatureC: 100,
    });
    expectMatchesPrinted(hot.brT, "1.1752");
    // B_g scales with Br: 1.1752 · 4 / 5.05.
    expect(hot.airGapFluxDensityT).toBeCloseTo((1.1752 * 4) / 5.05, 10);
    expect(hot.br20IsGradeMiddle).toBe(false);
  });
});

describe("magnet volume", () => {
  it("block, disc and ring", () => {
    expect(
      magnetVolumeMm3({ kind: "block", lengthMm: 10, widthMm: 5, heightMm: 2 }),
    ).toBe(100);
    // Disc 10 mm × 2 mm: π·5²·2 = 50π mm³.
    expect(
      magnetVolumeMm3({ kind: "disc", diameterMm: 10, thicknessMm: 2 }),
    ).toBeCloseTo(50 * Math.PI, 10);
    // Ring 10/4 × 2 mm: π/4·(100 − 16)·2 = 42π mm³.
    expect(
      magnetVolumeMm3({
        kind: "ring",
        outerDiameterMm: 10,
        innerDiameterMm: 4,
        thicknessMm: 2,
      }),
    ).toBeCloseTo(42 * Math.PI, 10);
  });

  it("an arc of 360° is a ring, of 90° a quarter of it", () => {
    const ring = magnetVolumeMm3({
      kind: "ring",
      outerDiameterMm: 60,
      innerDiameterMm: 50,
      thicknessMm: 30,
    });
    const fullArc = magnetVolumeMm3({
      kind: "arc",
      innerRadiusMm: 25,
      outerRadiusMm: 30,
      angleDeg: 360,
      axialLengthMm: 30,
    });
    const quarterArc = magnetVolumeMm3({
      kind: "arc",
      innerRadiusMm: 25,
      outerRadiusMm: 30,
      angleDeg: 90,
      axialLengthMm: 30,
    });
    expect(fullArc).toBeCloseTo(ring, 9);
    expect(quarterArc).toBeCloseTo(ring / 4, 9);
  });

  it("rejects impossible shapes with the field", () => {
    const fieldOf = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        if (error instanceof EngineeringInputError) return error.field;
        throw error;
      }
      return undefined;
    };
    expect(
      fieldOf(() =>
        magnetVolumeMm3({
          kind: "arc",
          innerRadiusMm: 30,
          outerRadiusMm: 25,
          angleDeg: 30,
          axialLengthMm: 10,
        }),
      ),
    ).toBe("shape.innerRadiusMm");
    expect(
      fieldOf(() =>
        magnetVolumeMm3({
          kind: "arc",
          innerRadiusMm: 20,
          outerRadiusMm: 25,
          angleDeg: 400,
          axialLengthMm: 10,
        }),
      ),
    ).toBe("shape.angleDeg");
    expect(
      fieldOf(() =>
        magnetVolumeMm3({
          kind: "ring",
          outerDiameterMm: 10,
          innerDiameterMm: 10,
          thicknessMm: 2,
        }),
      ),
    ).toBe("shape.innerDiameterMm");
    expect(
      fieldOf(() =>
        magnetVolumeMm3({
          kind: "block",
          lengthMm: 0,
          widthMm: 5,
          heightMm: 2,
        }),
      ),
    ).toBe("shape.lengthMm");
    expect(
      fieldOf(() =>
        estimateMagnet({
          grade: "N99",
          shape: { kind: "disc", diameterMm: 5, thicknessMm: 1 },
        }),
      ),
    ).toBe("grade");
  });
});

describe("magnet mass and remanence", () => {
  it("mass from the grade density, per piece and for the count", () => {
    // 100 mm³ = 0.1 cm³; NdFeB 7.5 g/cm³ (brief) → 0.75 g.
    expect(massKgFromVolume(100, 7.5)).toBeCloseTo(0.00075, 15);
    const result = estimateMagnet({
      grade: "N35",
      shape: { kind: "block", lengthMm: 10, widthMm: 5, heightMm: 2 },
      count: 16,
    });
    expect(result.volumeMm3).toBe(100);
    expect(result.volumeM3).toBeCloseTo(1e-7, 20);
    expect(result.massPerPieceKg).toBeCloseTo(0.00075, 15);
    expect(result.totalMassKg).toBeCloseTo(16 * 0.00075, 15);
    // Ferrite 4.9 g/cm³ (brief).
    const ferrite = estimateMagnet({
      grade: "Y30",
      shape: { kind: "block", lengthMm: 10, widthMm: 5, heightMm: 2 },
    });
    expect(ferrite.massPerPieceKg).toBeCloseTo(0.00049, 15);
  });

  it("uses the middle of the grade's Br range unless a Br is given", () => {
    const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;
    // Brief: N42 Br 1.28–1.32 T → 1.30 T.
    const n42 = estimateMagnet({ grade: "N42", shape });
    expect(n42.br20T).toBeCloseTo(1.3, 12);
    expect(n42.br20IsGradeMiddle).toBe(true);
    expect(n42.brT).toBeCloseTo(1.3, 12);
    expect(n42.airGapFluxDensityT).toBeNull();
    expect(estimateMagnet({ grade: "N42", shape, br20T: 1.31 }).br20T).toBe(
      1.31,
    );
  });

  it("Sm2Co17 loses far less Br with heat than NdFeB (−0.03 vs −0.12 %/K)", () => {
    const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;
    // Brief: Sm2Co17 −0.03 %/K → 1.08 T · (1 − 0.0003 · 130) at 150 °C.
    const smco = estimateMagnet({ grade: "Sm2Co17", shape, temperatureC: 150 });
    expect(smco.brT).toBeCloseTo(1.08 * (1 - 0.0003 * 130), 12);
  });
});

describe("magnet warnings", () => {
  const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;

  it("warn above the grade's maximum working temperature", () => {
    // Brief: no suffix 80 °C, SH 150 °C.
    expect(
      estimateMagnet({ grade: "N42", shape, temperatureC: 80 }).warnings,
    ).toEqual([]);
    expect(
      estimateMagnet({ grade: "N42", shape, temperatureC: 81 }).warnings.map(
        (w) => w.code,
      ),
    ).toEqual(["above-max-working-temperature"]);
    expect(
      estimateMagnet({ grade: "N42SH", shape, temperatureC: 120 }).warnings,
    ).toEqual([]);
    expect(
      estimateMagnet({ grade: "N42SH", shape, temperatureC: 160 }).warnings[0]
        ?.message,
    ).toContain("150 °C");
  });

  it("notes for ferrite that its coercivity falls when cold, only below the catalogue's 20 °C", () => {
    // Brief: ferrite's coercivity falls when cold, so its risk is at low temperature. Data
    // sheets give HcJ at 20 °C (common practice) and hard ferrite's HcJ rises with
    // temperature (about +0.2…+0.4 %/K, from memory), so only below 20 °C is it weaker.
    const cold = estimateMagnet({ grade: "C5", shape, temperatureC: -30 });
    expect(cold.warnings.map((w) => w.code)).toEqual([
      "coercivity-falls-when-cold",
    ]);
    expect(cold.warnings[0]!.message).toContain("-30 °C");
    for (const temperatureC of [20, 80, 150]) {
      const warm = estimateMagnet({ grade: "C5", shape, temperatureC });
      expect(warm.warnings).toEqual([]);
    }
    const tooHot = estimateMagnet({ grade: "C5", shape, temperatureC: 260 });
    expect(tooHot.warnings.map((w) => w.code)).toEqual([
      "above-max-working-temperature",
    ]);
    // NdFeB's coercivity falls when hot, never this note.
    expect(
      estimateMagnet({ grade: "N42SH", shape, temperatureC: -30 }).warnings,
    ).toEqual([]);
  });
});
