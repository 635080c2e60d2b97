import { describe, expect, it } from "vitest";
import {
  ASTM_B258_ROUNDED_DIAMETERS,
  AWG_SIZES,
  CONDUCTOR_MATERIALS,
  ENAMELS,
  IEC_NOMINAL_DIAMETERS,
  INSULATION_KINDS,
  MAGNET_GRADES,
  PUBLISHED_MAX_OVERALL_DIAMETERS,
  THERMAL_CLASSES,
  awgFormulaDiameterMm,
  conductorMaterial,
  findAwgSize,
  findIecDiameter,
  findIecNominalDiameter,
  iecDiameterProblem,
  findMagnetGrade,
  isWireClassSufficient,
} from "./reference-data";
import { EngineeringInputError } from "./errors";

/** μ0, H/m (CODATA; 4π·10⁻⁷ to better than 1e-9). */
const MU_0 = 4 * Math.PI * 1e-7;

describe("every reference row names its source", () => {
  const tables: [string, readonly { source: string }[]][] = [
    ["conductor materials", CONDUCTOR_MATERIALS],
    ["AWG sizes", AWG_SIZES],
    ["ASTM rounded table", ASTM_B258_ROUNDED_DIAMETERS],
    ["IEC nominal diameters", IEC_NOMINAL_DIAMETERS],
    ["insulation kinds", INSULATION_KINDS],
    ["published overall diameters", PUBLISHED_MAX_OVERALL_DIAMETERS],
    ["enamels", ENAMELS],
    ["thermal classes", THERMAL_CLASSES],
    ["magnet grades", MAGNET_GRADES],
  ];
  it.each(tables)("%s", (_name, rows) => {
    expect(rows.length).toBeGreaterThan(0);
    for (const row of rows)
      expect(row.source.trim().length).toBeGreaterThan(10);
  });
});

describe("conductor materials", () => {
  it("copper follows IEC 60028", () => {
    const copper = conductorMaterial("copper");
    // IEC 60028: 58 MS/m, i.e. ρ20 = 1/58 Ω·mm²/m = 0.0172414 (brief).
    expect(1 / copper.resistivity20OhmMm2PerM).toBeCloseTo(58, 12);
    expect(copper.resistivity20OhmMm2PerM).toBeCloseTo(0.0172414, 7);
    // IEC 60028: α20 = 0.00393 /K, 8.89 g/cm³ (brief).
    expect(copper.temperatureCoefficient20PerK).toBe(0.00393);
    expect(copper.densityGPerCm3).toBe(8.89);
  });

  it("aluminium magnet wire is annealed 1350-O: 61.8 % IACS, not the hard-drawn 61 %", () => {
    const aluminium = conductorMaterial("aluminium");
    const copper = conductorMaterial("copper");
    // ASTM B233, aluminium 1350-O (annealed, as magnet wire is): ρ20 = 0.027899 Ω·mm²/m,
    // 61.8 % IACS; IACS is the IEC 60028 copper, 1/58 Ω·mm²/m. The hard-drawn overhead-line
    // value (IEC 60889 / ASTM B230, 0.028264, 61 % IACS) made resistance 1.3 % high.
    expect(aluminium.resistivity20OhmMm2PerM).toBe(0.027899);
    expect(
      (copper.resistivity20OhmMm2PerM / aluminium.resistivity20OhmMm2PerM) *
        100,
    ).toBeCloseTo(61.8, 1);
    expect(aluminium.temperatureCoefficient20PerK).toBe(0.00403);
    expect(aluminium.densityGPerCm3).toBe(2.703);
  });

  it("rejects an unknown conductor with a field", () => {
    expect(() => conductorMaterial("silver")).toThrow(EngineeringInputError);
    try {
      conductorMaterial("silver");
    } catch (error) {
      expect((error as EngineeringInputError).field).toBe("conductor");
    }
  });
});

describe("AWG sizes", () => {
  it("run from 0000 to 46 with n = −3 … 46", () => {
    const labels = AWG_SIZES.map((size) => size.label);
    expect(labels.slice(0, 5)).toEqual(["0000", "000", "00", "0", "1"]);
    expect(labels.at(-1)).toBe("46");
    expect(AWG_SIZES).toHaveLength(50);
    // ASTM B258: 0, 00, 000, 0000 take n = 0, −1, −2, −3 (brief).
    expect(findAwgSize("0000")?.gaugeNumber).toBe(-3);
    expect(findAwgSize("00")?.gaugeNumber).toBe(-1);
    expect(findAwgSize("0")?.gaugeNumber).toBe(0);
  });

  it("accept 4/0 … 1/0 as aliases and nothing outside the range", () => {
    expect(findAwgSize("4/0")?.label).toBe("0000");
    expect(findAwgSize("3/0")?.label).toBe("000");
    expect(findAwgSize("2/0")?.label).toBe("00");
    expect(findAwgSize("1/0")?.label).toBe("0");
    expect(findAwgSize(" AWG 20 ")?.label).toBe("20");
    expect(findAwgSize("47")).toBeUndefined();
    expect(findAwgSize("5/0")).toBeUndefined();
    expect(findAwgSize("020")).toBeUndefined();
  });

  it("halve the diameter every six sizes (ratio 92^(6/39) = 2.0050)", () => {
    // Brief (ASTM B258): six sizes halve the diameter, ratio 2.0050.
    for (let index = 0; index + 6 < AWG_SIZES.length; index += 1) {
      const larger = AWG_SIZES[index];
      const smaller = AWG_SIZES[index + 6];
      if (!larger || !smaller) throw new Error("missing row");
      expect(larger.bareDiameterMm / smaller.bareDiameterMm).toBeCloseTo(
        2.005,
        4,
      );
    }
  });

  it("AWG 36 is exactly 0.005 in", () => {
    // ASTM B258 defines AWG 36 = 0.0050 in and AWG 0000 = 0.4600 in.
    expect(findAwgSize("36")?.bareDiameterMm).toBeCloseTo(0.127, 12);
    expect((findAwgSize("0000")?.bareDiameterMm ?? 0) / 25.4).toBeCloseTo(
      0.46,
      12,
    );
  });
});

describe("IEC 60317-0-1 nominal diameters", () => {
  // R40 preferred numbers (ISO 3), as listed in the task; R20 is every other from 1.00.
  const r40 = [
    1.0, 1.06, 1.12, 1.18, 1.25, 1.32, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2.0, 2.12,
    2.24, 2.36, 2.5, 2.65, 2.8, 3.0, 3.15, 3.35, 3.55, 3.75, 4.0, 4.25, 4.5,
    4.75, 5.0, 5.3, 5.6, 6.0, 6.3, 6.7, 7.1, 7.5, 8.0, 8.5, 9.0, 9.5,
  ];

  it("contain the brief's R20 list, each marked r20", () => {
    // Brief (IEC 60317-0-1): 0.100 … 2.000 mm R20 list.
    const briefR20 = [
      0.1, 0.112, 0.125, 0.14, 0.16, 0.18, 0.2, 0.224, 0.25, 0.28, 0.315, 0.355,
      0.4, 0.45, 0.5, 0.56, 0.63, 0.71, 0.8, 0.9, 1.0, 1.12, 1.25, 1.4, 1.6,
      1.8, 2.0,
    ];
    for (const diameter of briefR20) {
      expect(findIecNominalDiameter(diameter)?.series, `${diameter} mm`).toBe(
        "r20",
      );
    }
  });

  it("contain every R20 and R40 value from 0.100 mm to 5.000 mm with the right mark", () => {
    const expected = [
      ...r40.map((value, index) => ({
        diameterMm: value / 10,
        series: index % 2 === 0 ? "r20" : "r40",
      })),
      ...r40
        .filter((value) => value <= 5)
        .map((value, index) => ({
          diameterMm: value,
          series: index % 2 === 0 ? "r20" : "r40",
        })),
    ];
    for (const row of expected) {
      expect(
        findIecNominalDiameter(row.diameterMm)?.series,
        `${row.diameterMm} mm`,
      ).toBe(row.series);
    }
  });

  it("run from 0.020 mm to 5.000 mm, rising, R20 and R40 alternating", () => {
    expect(IEC_NOMINAL_DIAMETERS[0]?.diameterMm).toBe(0.02);
    expect(IEC_NOMINAL_DIAMETERS.at(-1)?.diameterMm).toBe(5);
    // 28 sizes in 0.020–0.095, 40 in 0.100–0.950, 29 in 1.00–5.00.
    expect(IEC_NOMINAL_DIAMETERS).toHaveLength(28 + 40 + 29);
    IEC_NOMINAL_DIAMETERS.forEach((row, index) => {
      const previous = IEC_NOMINAL_DIAMETERS[index - 1];
      if (previous) {
        expect(row.diameterMm).toBeGreaterThan(previous.diameterMm);
        expect(row.series).not.toBe(previous.series);
      }
    });
  });

  it("spell fine sizes to 0.001 mm (0.0315 → 0.032) — rounding from memory", () => {
    for (const diameter of [
      0.021, 0.022, 0.032, 0.036, 0.043, 0.048, 0.063, 0.071,
    ]) {
      expect(findIecNominalDiameter(diameter), `${diameter} mm`).toBeDefined();
    }
    expect(findIecNominalDiameter(0.0315)).toBeUndefined();
  });

  it("match a typed diameter only when it is a nominal size", () => {
    expect(findIecNominalDiameter(0.8)?.diameterMm).toBe(0.8);
    expect(findIecNominalDiameter(0.85)?.series).toBe("r40");
    expect(findIecNominalDiameter(0.81)).toBeUndefined();
    expect(findIecNominalDiameter(5.3)).toBeUndefined();
    expect(findIecNominalDiameter(0.019)).toBeUndefined();
  });
});

describe("insulation", () => {
  it("has the IEC 60317-0-1 overall diameters of the brief", () => {
    const rows = PUBLISHED_MAX_OVERALL_DIAMETERS.filter(
      (row) => row.standard === "IEC",
    );
    const table = Object.fromEntries(
      rows.map((row) => [
        `${row.size} ${row.insulation}`,
        row.maxOverallDiameterMm,
      ]),
    );
    // Brief, IEC 60317-0-1 maximum overall diameter.
    expect(table).toEqual({
      "0.200 grade1": 0.226,
      "0.200 grade2": 0.239,
      "0.200 grade3": 0.252,
      "0.500 grade1": 0.544,
      "0.500 grade2": 0.566,
      "0.500 grade3": 0.587,
      "1.000 grade1": 1.062,
      "1.000 grade2": 1.093,
      "1.000 grade3": 1.124,
    });
    // Brief: the 1.000 mm row is from memory and one transcription; the source must say so.
    for (const row of rows.filter((r) => r.size === "1.000"))
      expect(row.source).toContain("from memory");
  });

  it("has the NEMA MW 1000 builds for AWG 18 and 24", () => {
    const row = (size: string, insulation: string) =>
      PUBLISHED_MAX_OVERALL_DIAMETERS.find(
        (r) =>
          r.standard === "AWG" &&
          r.size === size &&
          r.insulation === insulation,
      );
    // Brief, NEMA MW 1000: AWG 18 0.0424 / 0.0437 / 0.0452 in; AWG 24 0.0217 / 0.0227 / 0.0238 in.
    expect(row("18", "single")?.maxOverallDiameterIn).toBe(0.0424);
    expect(row("18", "heavy")?.maxOverallDiameterIn).toBe(0.0437);
    expect(row("18", "triple")?.maxOverallDiameterIn).toBe(0.0452);
    expect(row("24", "single")?.maxOverallDiameterIn).toBe(0.0217);
    expect(row("24", "heavy")?.maxOverallDiameterIn).toBe(0.0227);
    expect(row("24", "triple")?.maxOverallDiameterIn).toBe(0.0238);
    // 0.0437 in = 1.10998 mm (GNU units "0.0437 in" → mm).
    expect(row("18", "heavy")?.maxOverallDiameterMm).toBeCloseTo(1.10998, 12);
  });
});

describe("thermal classes (IEC 60085)", () => {
  it("are 130 B, 155 F, 180 H, 200 N, 220 R", () => {
    expect(THERMAL_CLASSES.map((row) => `${row.classC}${row.letter}`)).toEqual([
      "130B",
      "155F",
      "180H",
      "200N",
      "220R",
    ]);
  });

  it("list the brief's typical enamels", () => {
    const enamels = (classC: number) =>
      THERMAL_CLASSES.find((row) => row.classC === classC)?.typicalEnamels;
    // Brief: polyurethane 130–155 (solderable), polyester/polyesterimide 155–180,
    // polyamide-imide overcoat 200, polyimide 220.
    expect(enamels(130)).toEqual(["polyurethane"]);
    expect(enamels(155)).toEqual([
      "polyurethane",
      "polyester",
      "polyesterimide",
    ]);
    expect(enamels(180)).toEqual(["polyester", "polyesterimide"]);
    expect(enamels(200)).toEqual(["polyamide-imide-overcoat"]);
    expect(enamels(220)).toEqual(["polyimide"]);
    expect(
      ENAMELS.filter((enamel) => enamel.solderable).map((enamel) => enamel.key),
    ).toEqual(["polyurethane"]);
  });

  it("require the wire's class to be at least the motor's", () => {
    // Brief: the wire's class must be at least the motor's insulation class.
    expect(isWireClassSufficient(155, 155)).toBe(true);
    expect(isWireClassSufficient(180, 155)).toBe(true);
    expect(isWireClassSufficient(130, 155)).toBe(false);
  });
});

describe("magnet grades", () => {
  // Brief: sintered NdFeB table (makers' published tables).
  const briefNdfeb = {
    N35: { br: [1.17, 1.22], hcj: 955, bh: [263, 287] },
    N38: { br: [1.22, 1.25], hcj: 955, bh: [287, 310] },
    N42: { br: [1.28, 1.32], hcj: 955, bh: [318, 342] },
    N45: { br: [1.32, 1.38], hcj: 955, bh: [342, 366] },
    N48: { br: [1.37, 1.42], hcj: 876, bh: [366, 390] },
    N52: { br: [1.42, 1.48], hcj: 876, bh: [390, 422] },
  };
  // Brief: suffix → HcJ min kA/m and max working temperature °C.
  const briefSuffix = {
    M: [1114, 100],
    H: [1353, 120],
    SH: [1592, 150],
    UH: [1990, 180],
    EH: [2388, 200],
    AH: [2786, 220],
  } as const;

  it("carry the brief's values for every sintered NdFeB grade", () => {
    const ndfeb = MAGNET_GRADES.filter(
      (grade) => grade.material === "sintered-ndfeb",
    );
    expect(ndfeb.length).toBeGreaterThanOrEqual(6);
    for (const grade of ndfeb) {
      const base = grade.name.slice(0, 3) as keyof typeof briefNdfeb;
      const expected = briefNdfeb[base];
      expect(expected, grade.name).toBeDefined();
      expect([grade.brMinT, grade.brMaxT]).toEqual(expected.br);
      expect([grade.bhMaxMinKJm3, grade.bhMaxMaxKJm3]).toEqual(expected.bh);
      const suffix = grade.temperatureSuffix;
      if (suffix === "" || suffix === null) {
        expect(grade.hcjMinKAm).toBe(expected.hcj);
        expect(grade.maxWorkingTemperatureC).toBe(80);
      } else {
        expect([grade.hcjMinKAm, grade.maxWorkingTemperatureC]).toEqual(
          briefSuffix[suffix],
        );
      }
      // Brief: αBr −0.12 %/K, 7.5 g/cm³, μrec 1.05.
      expect(grade.brTemperatureCoefficientPerK).toBe(-0.0012);
      expect(grade.densityGPerCm3).toBe(7.5);
      expect(grade.recoilPermeability).toBe(1.05);
      // HcB is not in the brief: its source must say it is from memory.
      expect(grade.source).toContain("from memory");
    }
  });

  it("offer every base grade without suffix and no high-Br grade with a very high suffix", () => {
    for (const name of [
      "N35",
      "N38",
      "N42",
      "N45",
      "N48",
      "N52",
      "N42SH",
      "N35AH",
      "N38EH",
      "N48SH",
      "N52H",
    ]) {
      expect(findMagnetGrade(name), name).toBeDefined();
    }
    // Common practice: N52 only up to about H/SH; EH and AH only in the low-Br grades.
    for (const name of ["N52UH", "N52EH", "N48UH", "N45EH", "N42AH"]) {
      expect(findMagnetGrade(name), name).toBeUndefined();
    }
  });

  it("carry the brief's values for SmCo5, Sm2Co17 and ferrite", () => {
    const smco5 = findMagnetGrade("SmCo5");
    // Brief: SmCo5 Br 0.80–1.00 T, 250 °C, −0.045 %/K, 8.3 g/cm³.
    expect(
      smco5 && [
        smco5.brMinT,
        smco5.brMaxT,
        smco5.maxWorkingTemperatureC,
        smco5.densityGPerCm3,
      ],
    ).toEqual([0.8, 1.0, 250, 8.3]);
    expect(smco5?.brTemperatureCoefficientPerK).toBeCloseTo(-0.00045, 12);
    const sm2co17 = findMagnetGrade("sm2co17");
    // Brief: Sm2Co17 Br 1.00–1.16 T, 300–350 °C, −0.03 %/K, 8.4 g/cm³.
    expect(
      sm2co17 && [sm2co17.brMinT, sm2co17.brMaxT, sm2co17.densityGPerCm3],
    ).toEqual([1.0, 1.16, 8.4]);
    expect(sm2co17?.maxWorkingTemperatureC).toBeGreaterThanOrEqual(300);
    expect(sm2co17?.maxWorkingTemperatureC).toBeLessThanOrEqual(350);
    expect(sm2co17?.brTemperatureCoefficientPerK).toBeCloseTo(-0.0003, 12);
    const ferrite = findMagnetGrade("Y30");
    // Brief: hard ferrite C5 ≈ Y30, Br 0.37–0.40 T, −0.20 %/K, 4.9 g/cm³, about 250 °C, coercivity falls when cold.
    expect(findMagnetGrade("C5")).toBe(ferrite);
    expect(
      ferrite && [
        ferrite.brMinT,
        ferrite.brMaxT,
        ferrite.densityGPerCm3,
        ferrite.maxWorkingTemperatureC,
      ],
    ).toEqual([0.37, 0.4, 4.9, 250]);
    expect(ferrite?.brTemperatureCoefficientPerK).toBeCloseTo(-0.002, 12);
    expect(ferrite?.coercivityFallsWhenCold).toBe(true);
    expect(findMagnetGrade("bonded ndfeb")?.source).toContain("from memory");
  });

  it("are physically consistent", () => {
    for (const grade of MAGNET_GRADES) {
      expect(grade.brMinT, grade.name).toBeLessThan(grade.brMaxT);
      expect(grade.bhMaxMinKJm3, grade.name).toBeLessThan(grade.bhMaxMaxKJm3);
      // Physics: (BH)max of a magnet cannot exceed Br²/(4μ0) (ideal straight-line magnet with μrec = 1).
      expect(grade.bhMaxMaxKJm3 * 1000, grade.name).toBeLessThanOrEqual(
        grade.brMaxT ** 2 / (4 * MU_0),
      );
      // Physics: on a straight recoil line HcB ≤ Br/(μ0·μrec), and HcB ≤ HcJ always.
      expect(grade.hcbMinKAm * 1000, grade.name).toBeLessThanOrEqual(
        grade.brMinT / (MU_0 * grade.recoilPermeability),
      );
      expect(grade.hcbMinKAm, grade.name).toBeLessThanOrEqual(grade.hcjMinKAm);
      expect(grade.brTemperatureCoefficientPerK, grade.name).toBeLessThan(0);
    }
    const keys = MAGNET_GRADES.map((grade) => grade.key);
    expect(new Set(keys).size).toBe(keys.length);
  });

  it("raise HcJ and working temperature with each suffix", () => {
    const n35 = MAGNET_GRADES.filter((grade) => grade.name.startsWith("N35"));
    for (let index = 1; index < n35.length; index += 1) {
      const previous = n35[index - 1];
      const current = n35[index];
      if (!previous || !current) throw new Error("missing row");
      expect(current.hcjMinKAm).toBeGreaterThan(previous.hcjMinKAm);
      expect(current.maxWorkingTemperatureC).toBeGreaterThan(
        previous.maxWorkingTemperatureC,
      );
    }
  });
});

describe("lookups refuse nonsense (issue 19, fix 6)", () => {
  it("find nothing for NaN, non-strings or sizes outside the tables", () => {
    expect(findIecNominalDiameter(Number.NaN)).toBeUndefined();
    expect(findAwgSize(20 as unknown as string)).toBeUndefined();
    expect(findMagnetGrade(undefined as unknown as string)).toBeUndefined();
    expect(findIecDiameter(Number.POSITIVE_INFINITY)).toBeUndefined();
  });

  it("refuse an AWG gauge number outside −3 … 46 or a NaN thermal class with the field", () => {
    const fieldOf = (run: () => unknown) => {
      try {
        run();
      } catch (error) {
        if (error instanceof EngineeringInputError) return error.field;
        throw error;
      }
      return undefined;
    };
    expect(fieldOf(() => awgFormulaDiameterMm(47))).toBe("wire.size");
    expect(fieldOf(() => awgFormulaDiameterMm(20.5))).toBe("wire.size");
    expect(fieldOf(() => isWireClassSufficient(Number.NaN, 155))).toBe(
      "wire.thermalClassC",
    );
  });
});

describe("IEC sizes between the R20/R40 steps (issue 19, fix 8)", () => {
  it("accept 0.350 mm with its neighbouring steps 0.335 and 0.355 (R40, ISO 3)", () => {
    // ISO 3 R40 around 3.5: 3.15, 3.35, 3.55 → 0.315, 0.335, 0.355 mm.
    expect(findIecDiameter(0.35)).toMatchObject({
      diameterMm: 0.35,
      series: null,
      below: 0.335,
      above: 0.355,
    });
    expect(findIecDiameter(1.3)).toMatchObject({ below: 1.25, above: 1.32 });
    expect(findIecDiameter(0.8)).toMatchObject({ series: "r20" });
  });

  it("refuse sizes outside 0.020–5.000 mm or finer than 0.001 mm, saying why", () => {
    expect(findIecDiameter(6)).toBeUndefined();
    expect(iecDiameterProblem(6)).toContain("0.020 mm to 5.000 mm");
    expect(findIecDiameter(0.3505)).toBeUndefined();
    expect(iecDiameterProblem(0.3505)).toContain("0.001 mm");
    expect(iecDiameterProblem(0.35)).toBeNull();
  });
});

describe("magnet temperature data (issue 19, fix 2)", () => {
  it("every built-in grade has an HcJ coefficient and a Curie temperature, and its rating is below the Curie point", () => {
    for (const grade of MAGNET_GRADES) {
      expect(grade.hcjTemperatureCoefficientPerK, grade.name).not.toBeNull();
      expect(grade.curieTemperatureC, grade.name).not.toBeNull();
      expect(grade.maxWorkingTemperatureC).toBeLessThan(
        grade.curieTemperatureC!,
      );
    }
  });

  it("carry the published Curie temperatures and the sign of the HcJ coefficient", () => {
    // magnetsales.com: NdFeB 310 °C, SmCo 1:5 750 °C, SmCo 2:17 825 °C; Sr-ferrite 450 °C
    // (vectormagnets.com comparison table).
    expect(findMagnetGrade("N42")!.curieTemperatureC).toBe(310);
    expect(findMagnetGrade("SmCo5")!.curieTemperatureC).toBe(750);
    expect(findMagnetGrade("Sm2Co17")!.curieTemperatureC).toBe(825);
    expect(findMagnetGrade("Y30")!.curieTemperatureC).toBe(450);
    // NdFeB −0.5…−0.6 %/K (makers' tables), SmCo5 −0.28 %/K (sdmmagnetic.com),
    // ferrite +0.27 %/K (hsmagnets.com): HcJ rises with temperature only for ferrite.
    expect(findMagnetGrade("N42")!.hcjTemperatureCoefficientPerK).toBe(-0.006);
    expect(findMagnetGrade("N35AH")!.hcjTemperatureCoefficientPerK).toBe(
      -0.0045,
    );
    expect(findMagnetGrade("SmCo5")!.hcjTemperatureCoefficientPerK).toBe(
      -0.0028,
    );
    expect(findMagnetGrade("Y30")!.hcjTemperatureCoefficientPerK).toBe(0.0027);
    for (const grade of MAGNET_GRADES) {
      const coefficient = grade.hcjTemperatureCoefficientPerK!;
      if (grade.material === "hard-ferrite") {
        expect(coefficient).toBeGreaterThan(0);
      } else {
        expect(coefficient, grade.name).toBeGreaterThanOrEqual(-0.006);
        expect(coefficient, grade.name).toBeLessThan(0);
      }
    }
  });
});
