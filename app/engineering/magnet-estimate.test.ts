import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import {
  airGapFluxDensityT,
  coercivityAtTemperatureKAm,
  estimateMagnet,
  magnetTemperatureRange,
  magnetVolumeMm3,
  massKgFromVolume,
  remanenceAtTemperatureT,
} from "./magnet-estimate";
import { findMagnetGrade } from "./reference-data";
import { expectMatchesPrinted } from "./printed-value.test-support";

/** The field of the EngineeringInputError `run` throws; undefined when it throws none. */
function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.field;
    throw error;
  }
  return undefined;
}

/** The message of the EngineeringInputError `run` throws. */
function messageOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.message;
    throw error;
  }
  throw new Error("expected an EngineeringInputError");
}

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
    // Hand-worked: 1.1752 T · 4 mm / (4 mm + 1.05 · 1 mm) = 4.7008 / 5.05 = 0.93085 T
    // (GNU units: "1.1752*4/5.05" → 0.93085149).
    expectMatchesPrinted(hot.airGapFluxDensityT ?? NaN, "0.93085");
    expect(hot.br20IsGradeMiddle).toBe(false);
  });
});

describe("magnet volume", () => {
  it("block, disc and ring", () => {
    expect(
      magnetVolumeMm3({ kind: "block", lengthMm: 10, widthMm: 5, heightMm: 2 }),
    ).toBe(100);
    // Hand-worked: disc 10 mm × 2 mm: π·5²·2 = 50π = 157.07963 mm³ (GNU units "50*pi").
    expectMatchesPrinted(
      magnetVolumeMm3({ kind: "disc", diameterMm: 10, thicknessMm: 2 }),
      "157.07963",
    );
    // Hand-worked: ring 10/4 × 2 mm: π/4·(100 − 16)·2 = 42π = 131.94689 mm³ (GNU units "42*pi").
    expectMatchesPrinted(
      magnetVolumeMm3({
        kind: "ring",
        outerDiameterMm: 10,
        innerDiameterMm: 4,
        thicknessMm: 2,
      }),
      "131.94689",
    );
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
    // Hand-worked: π/4 · (60² − 50²) · 30 = 8250π = 25918.139 mm³, a quarter 6479.5348 mm³
    // (GNU units "pi/4*(60^2-50^2)*30").
    expectMatchesPrinted(ring, "25918.139");
    expectMatchesPrinted(fullArc, "25918.139");
    expectMatchesPrinted(quarterArc, "6479.5348");
  });

  it("rejects impossible shapes with the field", () => {
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
    // 16 pieces × 0.75 g = 12 g.
    expect(result.totalMassKg).toBeCloseTo(0.012, 15);
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
    // Brief: Sm2Co17 Br 1.00–1.16 T (middle 1.08 T), −0.03 %/K. Hand-worked at 150 °C:
    // 130 K × 0.03 %/K = 3.9 % lost, 1.08 T × 0.961 = 1.03788 T. NdFeB N42 (1.30 T,
    // −0.12 %/K) loses 15.6 % over the same 130 K: 1.30 × 0.844 = 1.0972 T.
    const smco = estimateMagnet({ grade: "Sm2Co17", shape, temperatureC: 150 });
    expectMatchesPrinted(smco.brT, "1.03788");
    const ndfeb = estimateMagnet({ grade: "N42", shape, temperatureC: 150 });
    expectMatchesPrinted(ndfeb.brT, "1.0972");
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
      estimateMagnet({ grade: "N42", shape, temperatureC: 120 }).warnings[0]
        ?.message,
    ).toContain("80 °C");
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
    // Past ferrite's 250 °C rating (brief) the estimate refuses (decision 038).
    expect(
      fieldOf(() => estimateMagnet({ grade: "C5", shape, temperatureC: 260 })),
    ).toBe("temperatureC");
    // NdFeB's coercivity falls when hot, never this note.
    expect(
      estimateMagnet({ grade: "N42SH", shape, temperatureC: -30 }).warnings,
    ).toEqual([]);
  });
});

describe("usable temperature range (issue 19, fix 2)", () => {
  const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;

  it("refuses N42 at 400 °C: above the Curie temperature of sintered NdFeB (310 °C, magnetsales.com table)", () => {
    // Before the fix the line gave 1.30 · (1 − 0.0012 · 380) = 0.707 T at 400 °C.
    const run = () =>
      estimateMagnet({ grade: "N42", shape, temperatureC: 400 });
    expect(fieldOf(run)).toBe("temperatureC");
    expect(messageOf(run)).toContain("Curie temperature");
    expect(messageOf(run)).toContain("310 °C");
  });

  it("refuses N42 at 1000 °C, and the bare Br line too where it would go negative", () => {
    // Before the fix: 1.30 · (1 − 0.0012 · 980) = −0.229 T.
    expect(
      fieldOf(() =>
        estimateMagnet({ grade: "N42", shape, temperatureC: 1000 }),
      ),
    ).toBe("temperatureC");
    expect(fieldOf(() => remanenceAtTemperatureT(1.3, -0.0012, 1000))).toBe(
      "temperatureC",
    );
  });

  it("refuses N42 at 200 °C: below the Curie point but past the linear Br model (published over −50…150 °C)", () => {
    // US patent 4,902,360 (background): −0.08…−0.12 %/K over −50…150 °C. N42 is rated
    // to 80 °C (brief), so the line is used to 150 °C and no further.
    const run = () =>
      estimateMagnet({ grade: "N42", shape, temperatureC: 200 });
    expect(fieldOf(run)).toBe("temperatureC");
    expect(messageOf(run)).toContain("150 °C");
    const at150 = estimateMagnet({ grade: "N42", shape, temperatureC: 150 });
    expect(at150.warnings.map((w) => w.code)).toEqual([
      "above-max-working-temperature",
    ]);
    expect(at150.temperatureRange.maxC).toBe(150);
  });

  it("uses a grade's own rating when it is above the material's linear limit", () => {
    // Brief: suffix AH is rated to 220 °C, EH to 200 °C.
    expect(
      estimateMagnet({ grade: "N35AH", shape, temperatureC: 220 }).warnings,
    ).toEqual([]);
    expect(
      fieldOf(() =>
        estimateMagnet({ grade: "N35AH", shape, temperatureC: 221 }),
      ),
    ).toBe("temperatureC");
    expect(
      estimateMagnet({ grade: "N38EH", shape }).temperatureRange.maxC,
    ).toBe(200);
  });

  it("gives SmCo its much higher limits", () => {
    // SmCo5 rated to 250 °C (brief, magnetsales.com), Curie 750 °C; Sm2Co17 rated to 350 °C
    // (magnetsales.com grades; brief 300–350 °C), Curie 825 °C.
    expect(
      estimateMagnet({ grade: "SmCo5", shape, temperatureC: 250 })
        .temperatureRange,
    ).toMatchObject({ maxC: 250, curieTemperatureC: 750 });
    expect(
      fieldOf(() =>
        estimateMagnet({ grade: "SmCo5", shape, temperatureC: 300 }),
      ),
    ).toBe("temperatureC");
    expect(
      estimateMagnet({ grade: "Sm2Co17", shape, temperatureC: 340 }).warnings[0]
        ?.code,
    ).toBe("above-max-working-temperature");
  });

  it("refuses below −70 °C and NaN", () => {
    expect(
      fieldOf(() => estimateMagnet({ grade: "N42", shape, temperatureC: -71 })),
    ).toBe("temperatureC");
    expect(
      fieldOf(() =>
        estimateMagnet({ grade: "N42", shape, temperatureC: Number.NaN }),
      ),
    ).toBe("temperatureC");
  });

  it("uses a typed grade's own Curie temperature when it gives one", () => {
    const grade = {
      ...findMagnetGrade("N42")!,
      key: "custom",
      maxWorkingTemperatureC: 300,
      curieTemperatureC: 280,
    };
    // Rated 300 °C but Curie at 280 °C: the model stops at 279 °C.
    expect(magnetTemperatureRange(grade).maxC).toBe(279);
    expect(
      messageOf(() => estimateMagnet({ grade, shape, temperatureC: 290 })),
    ).toContain("280 °C");
  });
});

describe("coercivity at temperature", () => {
  const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;

  it("NdFeB loses HcJ as it warms: N42 at 150 °C keeps 22 % of its 955 kA/m", () => {
    // Hand-worked: β −0.6 %/K (makers' tables −0.5…−0.6 %/K), 130 K → 78 % lost,
    // 955 kA/m × 0.22 = 210.1 kA/m (GNU units: "955*(1-0.006*130)" → 210.1).
    const estimate = estimateMagnet({ grade: "N42", shape, temperatureC: 150 });
    expectMatchesPrinted(estimate.hcjKAm ?? NaN, "210.1");
    expect(estimate.hcjTemperatureCoefficientPerK).toBe(-0.006);
    expect(estimate.hcjCoefficientIsMaterialTypical).toBe(false);
  });

  it("ferrite gains HcJ as it warms and loses it in the cold", () => {
    // Hand-worked: β +0.27 %/K (hsmagnets.com), C5 HcJ 180 kA/m at 20 °C.
    // −40 °C: 180 × (1 − 0.0027 · 60) = 180 × 0.838 = 150.84 kA/m.
    // 100 °C: 180 × (1 + 0.0027 · 80) = 180 × 1.216 = 218.88 kA/m.
    expectMatchesPrinted(
      estimateMagnet({ grade: "C5", shape, temperatureC: -40 }).hcjKAm ?? NaN,
      "150.84",
    );
    expectMatchesPrinted(
      estimateMagnet({ grade: "C5", shape, temperatureC: 100 }).hcjKAm ?? NaN,
      "218.88",
    );
  });

  it("SmCo5 loses it slowly", () => {
    // Hand-worked: β −0.28 %/K (sdmmagnetic.com SmCo5 table), HcJ 1194 kA/m:
    // 200 °C → 1194 × (1 − 0.0028 · 180) = 1194 × 0.496 = 592.224 kA/m.
    expectMatchesPrinted(
      coercivityAtTemperatureKAm(1194, -0.0028, 200),
      "592.224",
    );
  });

  it("uses the material's typical coefficient for a grade that gives none", () => {
    const grade = {
      ...findMagnetGrade("N42")!,
      hcjTemperatureCoefficientPerK: null,
    };
    const estimate = estimateMagnet({ grade, shape, temperatureC: 100 });
    expect(estimate.hcjCoefficientIsMaterialTypical).toBe(true);
    // 955 × (1 − 0.006 · 80) = 955 × 0.52 = 496.6 kA/m.
    expectMatchesPrinted(estimate.hcjKAm ?? NaN, "496.6");
  });

  it("refuses nonsense", () => {
    expect(fieldOf(() => coercivityAtTemperatureKAm(-1, -0.006, 20))).toBe(
      "hcjKAm",
    );
    expect(fieldOf(() => coercivityAtTemperatureKAm(955, -0.006, 300))).toBe(
      "temperatureC",
    );
  });
});

describe("working point and the knee (irreversible demagnetisation)", () => {
  const shape = {
    kind: "block",
    lengthMm: 20,
    widthMm: 10,
    heightMm: 1,
  } as const;

  it("a thin N42 over a large gap at 150 °C passes the knee", () => {
    // Hand-worked. Br(150 °C) = 1.30 × (1 − 0.0012 · 130) = 1.0972 T;
    // l_m 1 mm, g 5 mm, μrec 1.05: B_m = 1.0972 / (1 + 5.25) = 0.175552 T;
    // H_m = −Br · g / (μ0 · (l_m + μrec · g)) = −1.0972 T · 5 mm / (μ0 · 6.25 mm)
    //     = −698.50 kA/m (GNU units: "1.0972 T * 5 mm / (mu0 * 6.25 mm)" "kA/m" → 698.49921).
    // HcJ(150 °C) = 210.1 kA/m; knee ≈ 0.9 × 210.1 = 189.09 kA/m (common practice, from memory).
    const estimate = estimateMagnet({
      grade: "N42",
      shape,
      temperatureC: 150,
      magnetLengthMm: 1,
      airGapMm: 5,
    });
    const point = estimate.workingPoint!;
    expectMatchesPrinted(point.fluxDensityT, "0.175552");
    expectMatchesPrinted(point.selfFieldKAm, "-698.50");
    expectMatchesPrinted(point.kneeFieldKAm, "189.09");
    expect(point.pastKnee).toBe(true);
    expect(estimate.warnings.map((w) => w.code)).toContain("past-the-knee");
  });

  it("the same thin magnet at 20 °C stays above the knee, just", () => {
    // H_m = 1.30 T · 5 mm / (μ0 · 6.25 mm) = 827.61 kA/m (GNU units → 827.6057) against
    // a knee of 0.9 × 955 = 859.5 kA/m.
    const point = estimateMagnet({
      grade: "N42",
      shape,
      magnetLengthMm: 1,
      airGapMm: 5,
    }).workingPoint!;
    expectMatchesPrinted(point.demagnetisingFieldKAm, "827.61");
    expect(point.pastKnee).toBe(false);
  });

  it("a thick N42 at 20 °C works far from the knee, unless the winding adds enough field", () => {
    // l_m 10 mm, g 1 mm: H_m = 1.30 T · 1 mm / (μ0 · 11.05 mm) = 93.62 kA/m
    // (GNU units → 93.620555), knee 859.5 kA/m.
    const thick = {
      kind: "block",
      lengthMm: 20,
      widthMm: 10,
      heightMm: 10,
    } as const;
    const estimate = estimateMagnet({
      grade: "N42",
      shape: thick,
      magnetLengthMm: 10,
      airGapMm: 1,
    });
    expectMatchesPrinted(estimate.workingPoint!.selfFieldKAm, "-93.62");
    expect(estimate.workingPoint!.pastKnee).toBe(false);
    expect(estimate.warnings).toEqual([]);
    // With 800 kA/m from the winding: 93.62 + 800 = 893.62 > 859.5.
    const loaded = estimateMagnet({
      grade: "N42",
      shape: thick,
      magnetLengthMm: 10,
      airGapMm: 1,
      demagnetisingFieldKAm: 800,
    });
    expect(loaded.workingPoint!.pastKnee).toBe(true);
  });

  it("has no working point without the length, the gap or an HcJ", () => {
    expect(estimateMagnet({ grade: "N42", shape }).workingPoint).toBeNull();
    const noHcj = { ...findMagnetGrade("N42")!, hcjMinKAm: 0 };
    expect(
      estimateMagnet({ grade: noHcj, shape, magnetLengthMm: 1, airGapMm: 1 })
        .workingPoint,
    ).toBeNull();
  });

  it("refuses a negative Br, a recoil permeability below 1 and a negative field", () => {
    expect(
      fieldOf(() =>
        airGapFluxDensityT({
          brT: -1.3,
          magnetLengthMm: 4,
          airGapMm: 1,
          recoilPermeability: 1.05,
        }),
      ),
    ).toBe("br20T");
    expect(
      fieldOf(() =>
        airGapFluxDensityT({
          brT: 1.3,
          magnetLengthMm: 4,
          airGapMm: 1,
          recoilPermeability: 0.5,
        }),
      ),
    ).toBe("recoilPermeability");
    expect(
      fieldOf(() =>
        estimateMagnet({
          grade: "N42",
          shape,
          magnetLengthMm: 1,
          airGapMm: 1,
          demagnetisingFieldKAm: -5,
        }),
      ),
    ).toBe("demagnetisingFieldKAm");
  });
});

describe("refusals of nonsense input (issue 19, fix 6)", () => {
  const shape = { kind: "disc", diameterMm: 10, thicknessMm: 5 } as const;

  it("names the field", () => {
    expect(
      fieldOf(() => estimateMagnet({ grade: "N42", shape, count: 0 })),
    ).toBe("count");
    expect(
      fieldOf(() => estimateMagnet({ grade: "N42", shape, count: -3 })),
    ).toBe("count");
    expect(
      fieldOf(() => estimateMagnet({ grade: "N42", shape, count: 1.5 })),
    ).toBe("count");
    expect(
      fieldOf(() => estimateMagnet({ grade: "N42", shape, br20T: -1.3 })),
    ).toBe("br20T");
    expect(fieldOf(() => remanenceAtTemperatureT(-1.3, -0.0012, 20))).toBe(
      "br20T",
    );
    expect(
      fieldOf(() => remanenceAtTemperatureT(1.3, -0.0012, Number.NaN)),
    ).toBe("temperatureC");
    expect(
      fieldOf(() =>
        estimateMagnet({
          grade: "N42",
          shape,
          magnetLengthMm: 4,
          airGapMm: Number.POSITIVE_INFINITY,
        }),
      ),
    ).toBe("airGapMm");
    expect(fieldOf(() => massKgFromVolume(-100, 7.5))).toBe("volumeMm3");
    expect(fieldOf(() => massKgFromVolume(100, 0))).toBe("densityGPerCm3");
  });
});
