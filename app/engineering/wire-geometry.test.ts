import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import {
  expectMatchesPrinted,
  expectWithinRelative,
} from "./printed-value.test-support";
import {
  ASTM_B258_ROUNDED_DIAMETERS,
  ESTIMATE_RANGE_MM,
  IEC_NOMINAL_DIAMETERS,
  estimateMaxOverallDiameterMm,
  findAwgSize,
} from "./reference-data";
import { inchesToMm, mmToInches, perKmToPerThousandFeet } from "./units";
import {
  awgBareDiameterMm,
  bareDiameterMm,
  circleAreaMm2,
  linearMassKgPerM,
  metresPerKg,
  overallDiameter,
  resistancePerMetreOhm,
  wireProperties,
  type WireSpec,
} from "./wire-geometry";

function fieldOf(run: () => unknown): string | undefined {
  try {
    run();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.field;
    throw error;
  }
  return undefined;
}

describe("AWG bare diameter (ASTM B258)", () => {
  // Brief, AWG table: formula mm, ASTM rounded table mm, area mm², copper Ω/km at 20 °C.
  const briefRows = [
    {
      awg: "10",
      formulaMm: 2.5882,
      tableMm: "2.5883",
      area: "5.261",
      ohmPerKm: "3.277",
    },
    {
      awg: "14",
      formulaMm: 1.6277,
      tableMm: "1.6281",
      area: "2.081",
      ohmPerKm: "8.286",
    },
    {
      awg: "18",
      formulaMm: 1.0237,
      tableMm: "1.0236",
      area: "0.8230",
      ohmPerKm: "20.95",
    },
    {
      awg: "20",
      formulaMm: 0.8118,
      tableMm: "0.8128",
      area: "0.5176",
      ohmPerKm: "33.31",
    },
    {
      awg: "24",
      formulaMm: 0.5106,
      tableMm: "0.5105",
      area: "0.2047",
      ohmPerKm: "84.22",
    },
    {
      awg: "30",
      formulaMm: 0.2546,
      tableMm: "0.2540",
      area: "0.05093",
      ohmPerKm: "338.6",
    },
    {
      awg: "36",
      formulaMm: 0.127,
      tableMm: "0.1270",
      area: "0.01267",
      ohmPerKm: "1361",
    },
  ];

  it.each(briefRows)(
    "AWG $awg: formula within 1e-4 mm of the brief (ASTM B258 formula)",
    (row) => {
      expect(
        Math.abs(awgBareDiameterMm(row.awg) - row.formulaMm),
      ).toBeLessThanOrEqual(1e-4);
    },
  );

  it.each(briefRows)(
    "AWG $awg: the rounded ASTM table is the formula to 0.0001 in (ASTM B258 table, brief)",
    (row) => {
      const tableIn = ASTM_B258_ROUNDED_DIAMETERS.find(
        (entry) => entry.label === row.awg,
      )?.diameterIn;
      if (tableIn === undefined)
        throw new Error(`no table row for AWG ${row.awg}`);
      // The table is rounded to 0.0001 in, so the formula lies within half of that.
      expect(
        Math.abs(mmToInches(awgBareDiameterMm(row.awg)) - tableIn),
      ).toBeLessThanOrEqual(0.00005 + 1e-12);
      // The brief's mm column is the table's inches × 25.4 mm/in, to 0.0001 mm.
      expectMatchesPrinted(inchesToMm(tableIn), row.tableMm);
    },
  );

  it.each(briefRows)(
    "AWG $awg: area and copper Ω/km at 20 °C round to the brief's values",
    (row) => {
      const wire: WireSpec = { standard: "AWG", size: row.awg };
      const area = circleAreaMm2(bareDiameterMm(wire));
      expectMatchesPrinted(area, row.area);
      // Brief: Cu Ω/km at 20 °C from ρ = 1/58 Ω·mm²/m (IEC 60028) and the formula diameter.
      expectMatchesPrinted(
        resistancePerMetreOhm("copper", area, 20) * 1000,
        row.ohmPerKm,
      );
    },
  );

  it("worked check 1: AWG 20 is 0.81182 mm by formula, 0.8128 mm in the rounded table", () => {
    // Brief, worked check 1.
    expectMatchesPrinted(awgBareDiameterMm("20"), "0.81182");
    const tableIn =
      ASTM_B258_ROUNDED_DIAMETERS.find((entry) => entry.label === "20")
        ?.diameterIn ?? NaN;
    expectMatchesPrinted(inchesToMm(tableIn), "0.8128");
  });

  it("worked check 2: AWG 18 copper at 20 °C is 20.95 Ω/km", () => {
    // Brief, worked check 2.
    const properties = wireProperties({
      conductor: "copper",
      wire: { standard: "AWG", size: "18" },
    });
    expectMatchesPrinted(properties.resistancePerMetreOhm * 1000, "20.95");
  });

  it("matches the handbook resistance tables within ±0.5 %", () => {
    // Brief: handbook magnet-wire tables, AWG 18 6.386 Ω/1000 ft, AWG 24 25.67 Ω/1000 ft
    // (rounded diameters, so ±0.5 %).
    const perThousandFeet = (size: string) =>
      perKmToPerThousandFeet(
        wireProperties({ conductor: "copper", wire: { standard: "AWG", size } })
          .resistancePerMetreOhm * 1000,
      );
    expectWithinRelative(perThousandFeet("18"), 6.386, 0.005);
    expectWithinRelative(perThousandFeet("24"), 25.67, 0.005);
    // The same in Ω/km: 20.95 and 84.22.
    expectWithinRelative(perThousandFeet("18") / 0.3048, 20.95, 0.005);
    expectWithinRelative(perThousandFeet("24") / 0.3048, 84.22, 0.005);
  });

  it("accepts the aught aliases and rejects unknown sizes with the field wire.size", () => {
    expect(awgBareDiameterMm("4/0")).toBe(awgBareDiameterMm("0000"));
    // ASTM B258: 0000 = 0.4600 in.
    expect(mmToInches(awgBareDiameterMm("4/0"))).toBeCloseTo(0.46, 12);
    expect(fieldOf(() => awgBareDiameterMm("47"))).toBe("wire.size");
    expect(fieldOf(() => awgBareDiameterMm("twenty"))).toBe("wire.size");
  });
});

describe("IEC bare diameter", () => {
  it("is the nominal diameter, R20/R40 step or not (issue 19, fix 8)", () => {
    expect(bareDiameterMm({ standard: "IEC", diameterMm: 0.8 })).toBe(0.8);
    expect(bareDiameterMm({ standard: "IEC", diameterMm: 1.06 })).toBe(1.06);
    // Commonly stocked sizes between the steps (issue 19): refused before the fix.
    for (const diameterMm of [0.35, 0.55, 0.65, 1.3, 0.81]) {
      expect(bareDiameterMm({ standard: "IEC", diameterMm })).toBe(diameterMm);
    }
    // The standard's range is 0.020 mm to 5.000 mm (brief).
    expect(bareDiameterMm({ standard: "IEC", diameterMm: 0.02 })).toBe(0.02);
    expect(bareDiameterMm({ standard: "IEC", diameterMm: 5 })).toBe(5);
    for (const diameterMm of [0.019, 5.001, 6.3, 0, -0.5, Number.NaN]) {
      expect(
        fieldOf(() => bareDiameterMm({ standard: "IEC", diameterMm })),
      ).toBe("wire.diameterMm");
    }
    // Nominal diameters are printed to 0.001 mm: 0.3505 mm is not one.
    expect(
      fieldOf(() => bareDiameterMm({ standard: "IEC", diameterMm: 0.3505 })),
    ).toBe("wire.diameterMm");
  });

  it("interpolates the overall diameter of 0.350 mm grade 2 between the published rows, flagged", () => {
    // Hand-worked. The published IEC 60317-0-1 grade 2 rows either side of 0.350 mm are
    // 0.200 mm → 0.239 mm and 0.500 mm → 0.566 mm (brief, two transcriptions):
    // 0.239 + (0.350 − 0.200)/(0.500 − 0.200) × (0.566 − 0.239) = 0.239 + 0.5 × 0.327
    // = 0.4025 mm.
    const result = overallDiameter(
      { standard: "IEC", diameterMm: 0.35 },
      "grade2",
    );
    expectMatchesPrinted(result.overallDiameterMm ?? NaN, "0.4025");
    expect(result.overallDiameterIsEstimate).toBe(true);
    expect(result.overallDiameterSource).toContain("interpolated");
    expect(result.overallDiameterSource).toContain("0.200 mm");
    expect(result.overallDiameterSource).toContain("0.500 mm");
    // 0.650 mm grade 1 between 0.500 (0.544) and 1.000 (1.062):
    // 0.544 + 0.3 × 0.518 = 0.6994 mm.
    expectMatchesPrinted(
      overallDiameter({ standard: "IEC", diameterMm: 0.65 }, "grade1")
        .overallDiameterMm ?? NaN,
      "0.6994",
    );
    // It lies between the values for its neighbouring steps 0.335 and 0.355 mm.
    const below = overallDiameter(
      { standard: "IEC", diameterMm: 0.335 },
      "grade2",
    ).overallDiameterMm!;
    const above = overallDiameter(
      { standard: "IEC", diameterMm: 0.355 },
      "grade2",
    ).overallDiameterMm!;
    expect(result.overallDiameterMm!).toBeGreaterThan(below);
    expect(result.overallDiameterMm!).toBeLessThan(above);
  });

  it("falls back to the fitted estimate beyond the published rows (1.300 mm), still flagged", () => {
    const result = overallDiameter(
      { standard: "IEC", diameterMm: 1.3 },
      "grade2",
    );
    expect(result.overallDiameterIsEstimate).toBe(true);
    expect(result.overallDiameterSource).toContain("fitted");
    // Above the bare 1.300 mm and above the published 1.000 mm grade 2 row's 1.093 mm.
    expect(result.overallDiameterMm!).toBeGreaterThan(1.3);
  });
});

describe("resistance, mass and length per mass", () => {
  it("worked check 3: 100 m of 1.00 mm copper", () => {
    // Brief, worked check 3: 2.1952 Ω at 20 °C, 3.0580 Ω at 120 °C, bare mass 698.2 g.
    const at20 = wireProperties({
      conductor: "copper",
      wire: { standard: "IEC", diameterMm: 1.0 },
    });
    const at120 = wireProperties({
      conductor: "copper",
      wire: { standard: "IEC", diameterMm: 1.0 },
      temperatureC: 120,
    });
    expectMatchesPrinted(at20.resistancePerMetreOhm * 100, "2.1952");
    expectMatchesPrinted(at120.resistancePerMetreOhm * 100, "3.0580");
    expectMatchesPrinted(at120.resistancePerMetre20Ohm * 100, "2.1952");
    expectMatchesPrinted(at20.linearMassKgPerM * 100 * 1000, "698.2");
  });

  it("follows R(T) = R20 · (1 + α20 · (T − 20)) for aluminium too", () => {
    // Brief: R(T) = R20 (1 + α20 (T − 20)); annealed aluminium 1350-O ρ20 0.027899 Ω·mm²/m
    // (ASTM B233), α20 0.00403 /K (brief). Worked by hand for 2 mm: area π = 3.14159 mm²,
    // R20 = 0.027899 / 3.14159 = 0.0088805 Ω/m (GNU units: 0.0088805275); at 75 °C
    // × (1 + 0.00403 × 55) = 1.22165 → 0.010849 Ω/m.
    const area = circleAreaMm2(2);
    expect(resistancePerMetreOhm("aluminium", area, 20)).toBeCloseTo(
      0.0088805,
      7,
    );
    expect(resistancePerMetreOhm("aluminium", area, 75)).toBeCloseTo(
      0.010849,
      6,
    );
    // Below 20 °C the resistance falls.
    expect(resistancePerMetreOhm("copper", area, -20)).toBeLessThan(
      resistancePerMetreOhm("copper", area, 20),
    );
  });

  it("gives metres per kg of bare wire", () => {
    // Hand-worked, 0.50 mm copper: 8.89 g/cm³ × π/4 × 0.25 mm² = 1.74555 g/m, so
    // 1000 g / 1.74555 g/m = 572.886 m/kg (GNU units "1000/(8.89*pi/4*0.5^2)" → 572.88618;
    // brief worked check 6: 4.80 kg ↔ 2749.9 m).
    expectMatchesPrinted(metresPerKg("copper", circleAreaMm2(0.5)), "572.886");
    // Density g/cm³ × area mm² = g/m: 1 mm² of copper weighs 8.89 g/m (IEC 60028 density).
    expect(linearMassKgPerM("copper", 1)).toBeCloseTo(0.00889, 15);
    expect(linearMassKgPerM("aluminium", 1)).toBeCloseTo(0.002703, 15);
  });
});

describe("overall diameter", () => {
  it("gives the IEC 60317-0-1 rows of the brief exactly, not flagged as estimates", () => {
    // Brief, IEC 60317-0-1 maximum overall diameters.
    const rows: [number, "grade1" | "grade2" | "grade3", number][] = [
      [0.2, "grade1", 0.226],
      [0.2, "grade2", 0.239],
      [0.2, "grade3", 0.252],
      [0.5, "grade1", 0.544],
      [0.5, "grade2", 0.566],
      [0.5, "grade3", 0.587],
      [1.0, "grade1", 1.062],
      [1.0, "grade2", 1.093],
      [1.0, "grade3", 1.124],
    ];
    for (const [diameterMm, grade, expected] of rows) {
      const result = overallDiameter({ standard: "IEC", diameterMm }, grade);
      expect(result.overallDiameterMm).toBe(expected);
      expect(result.overallDiameterIsEstimate).toBe(false);
      expect(result.overallDiameterSource).toContain("IEC 60317-0-1");
    }
  });

  it("gives the NEMA MW 1000 rows for AWG 18 and 24 in mm", () => {
    // Brief, NEMA MW 1000: AWG 18 heavy 0.0437 in, AWG 24 triple 0.0238 in.
    const heavy18 = overallDiameter({ standard: "AWG", size: "18" }, "heavy");
    // 0.0437 in = 1.10998 mm (GNU units "0.0437 in" → mm).
    expectMatchesPrinted(heavy18.overallDiameterMm ?? NaN, "1.10998");
    expect(heavy18.overallDiameterIsEstimate).toBe(false);
    expect(
      overallDiameter({ standard: "AWG", size: "24" }, "triple")
        .overallDiameterMm,
    ).toBeCloseTo(0.60452, 12); // 0.0238 in = 0.60452 mm (GNU units).
  });

  it("estimates other sizes near the published rows, flagged, and gives null further away", () => {
    const estimate = overallDiameter(
      { standard: "IEC", diameterMm: 0.8 },
      "grade2",
    );
    expect(estimate.overallDiameterIsEstimate).toBe(true);
    expect(estimate.overallDiameterSource).toContain("ESTIMATE");
    // Between the published 0.500 and 1.000 mm rows, and the increment between theirs (0.066 and 0.093 mm).
    const increment = (estimate.overallDiameterMm ?? NaN) - 0.8;
    expect(increment).toBeGreaterThan(0.066);
    expect(increment).toBeLessThan(0.093);

    const awg20 = overallDiameter({ standard: "AWG", size: "20" }, "heavy");
    expect(awg20.overallDiameterIsEstimate).toBe(true);
    // Between the AWG 24 and AWG 18 heavy-build increments (NEMA MW 1000, brief): 0.0026 and 0.0034 in.
    const awg20IncrementIn = mmToInches(
      (awg20.overallDiameterMm ?? NaN) - awgBareDiameterMm("20"),
    );
    expect(awg20IncrementIn).toBeGreaterThan(0.0026 - 0.0001);
    expect(awg20IncrementIn).toBeLessThan(0.0034 + 0.0001);

    expect(
      overallDiameter({ standard: "IEC", diameterMm: 0.02 }, "grade1")
        .overallDiameterMm,
    ).toBeNull();
    expect(
      overallDiameter({ standard: "IEC", diameterMm: 4.0 }, "grade2")
        .overallDiameterMm,
    ).toBeNull();
    expect(
      overallDiameter({ standard: "AWG", size: "4/0" }, "heavy")
        .overallDiameterMm,
    ).toBeNull();
    expect(
      overallDiameter({ standard: "AWG", size: "40" }, "single")
        .overallDiameterMm,
    ).toBeNull();
  });

  it("reproduces the published rows from the fitted estimate (fit residuals)", () => {
    // IEC rows (brief): the three-point fit is within 0.002 mm of every row.
    expect(
      Math.abs(
        (estimateMaxOverallDiameterMm("IEC", 0.5, "grade2") ?? NaN) - 0.566,
      ),
    ).toBeLessThan(0.002);
    expect(
      Math.abs(
        (estimateMaxOverallDiameterMm("IEC", 0.2, "grade3") ?? NaN) - 0.252,
      ),
    ).toBeLessThan(0.002);
    // AWG rows (brief): the two-point fit passes through both.
    const bare18 = findAwgSize("18")?.bareDiameterMm ?? NaN;
    expect(estimateMaxOverallDiameterMm("AWG", bare18, "single")).toBeCloseTo(
      1.07696, // 0.0424 in (GNU units → 1.07696 mm)
      9,
    );
  });

  it("grows with the grade or build and is always over the bare diameter", () => {
    for (const row of IEC_NOMINAL_DIAMETERS) {
      const wire: WireSpec = { standard: "IEC", diameterMm: row.diameterMm };
      const [g1, g2, g3] = (["grade1", "grade2", "grade3"] as const).map(
        (grade) => overallDiameter(wire, grade).overallDiameterMm,
      );
      const inRange =
        row.diameterMm >= ESTIMATE_RANGE_MM.IEC.min &&
        row.diameterMm <= ESTIMATE_RANGE_MM.IEC.max;
      if (!inRange) {
        expect([g1, g2, g3]).toEqual([null, null, null]);
        continue;
      }
      if (g1 == null || g2 == null || g3 == null)
        throw new Error(`missing estimate at ${row.diameterMm}`);
      expect(g1).toBeGreaterThan(row.diameterMm);
      expect(g2).toBeGreaterThan(g1);
      expect(g3).toBeGreaterThan(g2);
    }
    for (let gauge = 14; gauge <= 28; gauge += 1) {
      const wire: WireSpec = { standard: "AWG", size: String(gauge) };
      const [single, heavy, triple] = (
        ["single", "heavy", "triple"] as const
      ).map((build) => overallDiameter(wire, build).overallDiameterMm);
      if (single == null || heavy == null || triple == null)
        throw new Error(`missing estimate at AWG ${gauge}`);
      expect(single).toBeGreaterThan(awgBareDiameterMm(String(gauge)));
      expect(heavy).toBeGreaterThan(single);
      expect(triple).toBeGreaterThan(heavy);
    }
  });

  it("is null without insulation and rejects insulation of the other standard", () => {
    expect(
      overallDiameter({ standard: "IEC", diameterMm: 0.5 }).overallDiameterMm,
    ).toBeNull();
    expect(
      overallDiameter({ standard: "IEC", diameterMm: 0.5 }, null)
        .overallDiameterIsEstimate,
    ).toBe(false);
    expect(
      fieldOf(() =>
        overallDiameter({ standard: "IEC", diameterMm: 0.5 }, "heavy"),
      ),
    ).toBe("insulation");
    expect(
      fieldOf(() => overallDiameter({ standard: "AWG", size: "18" }, "grade2")),
    ).toBe("insulation");
  });
});

describe("refusals (issue 19, fix 6)", () => {
  it("name the field of NaN, negative or infinite input", () => {
    expect(fieldOf(() => circleAreaMm2(-1))).toBe("diameterMm");
    expect(fieldOf(() => circleAreaMm2(Number.NaN))).toBe("diameterMm");
    // Before the fix: a negative section gave a negative mass and resistance.
    expect(fieldOf(() => linearMassKgPerM("copper", -0.5))).toBe("areaMm2");
    expect(fieldOf(() => resistancePerMetreOhm("copper", 0))).toBe("areaMm2");
    expect(fieldOf(() => metresPerKg("copper", 0))).toBe("areaMm2");
    expect(
      fieldOf(() => resistancePerMetreOhm("copper", 0.5, Number.NaN)),
    ).toBe("temperatureC");
    // Copper's linear R(T) would reach zero at 20 − 1/0.00393 = −234.5 °C; the model is
    // used from −70 °C to 400 °C.
    expect(fieldOf(() => resistancePerMetreOhm("copper", 0.5, -300))).toBe(
      "temperatureC",
    );
    expect(
      fieldOf(() =>
        wireProperties({
          conductor: "copper",
          wire: { standard: "IEC", diameterMm: 0.5 },
          temperatureC: Number.POSITIVE_INFINITY,
        }),
      ),
    ).toBe("temperatureC");
    expect(fieldOf(() => resistancePerMetreOhm("gold" as "copper", 0.5))).toBe(
      "conductor",
    );
  });
});
