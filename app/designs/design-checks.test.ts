import { describe, expect, it } from "vitest";
import {
  coilCurrentDensityAPerMm2,
  coilSlotFill,
  coilSlotFillFactor,
  currentDensityWarning,
  designCheckNames,
  designWarnings,
  magnetTemperatureWarning,
  thermalClassName,
  wireClassWarning,
} from "./design-checks";
import {
  checkFourCoil,
  n42shMagnets,
  partLine,
  WIRE_080,
} from "./design-lines.test-support";

describe("wire thermal class against the design's insulation class (IEC 60085; brief)", () => {
  it("warns when the wire's class is below the design's", () => {
    const line = checkFourCoil({ wire: { ...WIRE_080, thermalClassC: 130 } });
    const warning = wireClassWarning(line, 0, 155);
    expect(warning?.code).toBe("wire-class-below-insulation-class");
    expect(warning?.message).toContain("130 (B)");
    expect(warning?.message).toContain("155 (F)");
  });

  it("accepts a wire of the same class or higher", () => {
    expect(wireClassWarning(checkFourCoil(), 0, 155)).toBeNull();
    expect(
      wireClassWarning(
        checkFourCoil({ wire: { ...WIRE_080, thermalClassC: 180 } }),
        0,
        155,
      ),
    ).toBeNull();
  });

  it("names classes by IEC 60085 letter where the reference data has one", () => {
    expect(thermalClassName(180)).toBe("180 (H)");
    expect(thermalClassName(105)).toBe("105");
  });
});

describe("slot fill judged over the enamel (issue 19, fix 1)", () => {
  // IEC 0.20 mm grade 2, max overall 0.239 mm (IEC 60317-0-1, brief's table), 668 turns ×
  // 2 coil sides in 60 mm². By hand: 1336 × π/4 × 0.239² / 60 = 0.999 (GNU units:
  // units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2)' → 0.99894342); copper 0.700.
  const fine = {
    ...WIRE_080,
    sku: "CU-0.20-G2",
    size: { standard: "IEC" as const, diameterMm: 0.2 },
    insulation: "grade2" as const,
  };
  const issueCoil = checkFourCoil({
    wire: fine,
    turns: 668,
    slot: { areaMm2: 60, coilSidesPerSlot: 2 },
  });

  it("warns that the issue's winding cannot fit (gross 0.999 > π/√12), not a mild 0.700", () => {
    const [warning] = designWarnings({
      lines: [issueCoil],
      insulationClassC: null,
    });
    expect(warning?.code).toBe("above-hexagonal-packing-limit");
    expect(warning?.message).toContain("0.999");
    expect(coilSlotFillFactor(issueCoil)).toBeCloseTo(0.69952796, 7);
  });

  it("takes the liner off the slot for the gross fill", () => {
    // 60 − 10 mm² liner: units -t '1336 * pi/4 * (0.239 mm)^2 / (50 mm^2)' → 1.1987321
    const lined = checkFourCoil({
      wire: fine,
      turns: 668,
      slot: { areaMm2: 60, linerAreaMm2: 10, coilSidesPerSlot: 2 },
    });
    expect(coilSlotFill(lined)?.grossFill).toBeCloseTo(1.1987321, 6);
  });

  it("says it judged on copper fill when the wire's insulation is not catalogued", () => {
    const [warning] = designWarnings({
      lines: [{ ...issueCoil, wire: { ...fine, insulation: null } }],
      insulationClassC: null,
    });
    expect(warning?.code).toBe("above-random-round-wire-practice");
    expect(warning?.message).toContain("understates");
  });
});

describe("slot fill (brief: k = N · strands · A_bare / A_slot; 0.45 for random round wire is common practice)", () => {
  const doubleLayer = (areaMm2: number) =>
    checkFourCoil({ slot: { areaMm2, coilSidesPerSlot: 2 } });

  it("counts both coil sides of a double-layer slot (worked by hand)", () => {
    // 2 sides × 40 turns × π/4 · (0.8 mm)² / 100 mm²:
    // units -t '80 * pi/4 * (0.8 mm)^2 / 100 mm^2' 1 → 0.40212386
    expect(coilSlotFillFactor(doubleLayer(100))).toBeCloseTo(0.40212386, 8);
    expect(coilSlotFillFactor(checkFourCoil())).toBeNull();
  });

  it("warns above 0.45 and not below", () => {
    // 80 mm²: units -t '80 * pi/4 * (0.8 mm)^2 / 80 mm^2' 1 → 0.50265482
    const warnings = designWarnings({
      lines: [doubleLayer(100), doubleLayer(80)],
      insulationClassC: 155,
    });
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatchObject({
      code: "above-random-round-wire-practice",
      lineIndex: 1,
      sku: WIRE_080.sku,
    });
  });

  it("passes on the packing limits' warnings (π/4 = 0.785, brief)", () => {
    // 50 mm²: 0.80425 > π/4.
    const [warning] = designWarnings({
      lines: [doubleLayer(50)],
      insulationClassC: null,
    });
    expect(warning?.code).toBe("above-square-packing-limit");
  });
});

describe("magnet temperature against the grade's maximum working temperature (brief: SH 150 °C)", () => {
  it("warns above 150 °C for N42SH, not at 150 °C or with no temperature", () => {
    expect(
      magnetTemperatureWarning(n42shMagnets({ operatingTemperatureC: 160 }), 0)
        ?.code,
    ).toBe("magnet-above-max-working-temperature");
    expect(
      magnetTemperatureWarning(n42shMagnets({ operatingTemperatureC: 150 }), 0),
    ).toBeNull();
    expect(magnetTemperatureWarning(n42shMagnets(), 0)).toBeNull();
  });
});

describe("designWarnings", () => {
  it("lists every warning in line order with the line's index", () => {
    const warnings = designWarnings({
      lines: [
        partLine(3, "BRG-608", "pcs", "1"),
        n42shMagnets({ operatingTemperatureC: 170 }),
        checkFourCoil({
          wire: { ...WIRE_080, thermalClassC: 130 },
          slot: { areaMm2: 80, coilSidesPerSlot: 2 },
        }),
      ],
      insulationClassC: 155,
    });
    expect(
      warnings.map((warning) => [warning.lineIndex, warning.code]),
    ).toEqual([
      [1, "magnet-above-max-working-temperature"],
      [2, "wire-class-below-insulation-class"],
      [2, "above-random-round-wire-practice"],
    ]);
  });

  it("skips the class check when the design has no insulation class", () => {
    const line = checkFourCoil({ wire: { ...WIRE_080, thermalClassC: 130 } });
    expect(designWarnings({ lines: [line], insulationClassC: null })).toEqual(
      [],
    );
  });
});

describe("current density at the rated current (ranges: common practice, from memory)", () => {
  const wire050 = {
    ...WIRE_080,
    sku: "CU-0.50-G2",
    size: { standard: "IEC" as const, diameterMm: 0.5 },
  };

  it("is I ÷ (π/4 · d²): 6 A in 0.5 mm copper is 30.56 A/mm² (worked by hand)", () => {
    // By hand: π · 0.25² = 0.196350 mm²; 6 ÷ 0.196350 = 30.5577 A/mm². GNU units agrees:
    // units -t '6 A / (pi * (0.25 mm)^2)' 'A/mm^2' → 30.557749
    expect(
      coilCurrentDensityAPerMm2(checkFourCoil({ wire: wire050 }), 6),
    ).toBeCloseTo(30.5577, 4);
  });

  it("shares the current between strands in hand", () => {
    // 10 A in 2 × 0.8 mm: 10 ÷ (2 · π · 0.4²) = 10 ÷ 1.005310 = 9.9472 A/mm² (by hand;
    // units -t '10 A / (2 * pi * (0.4 mm)^2)' 'A/mm^2' → 9.9471839).
    expect(
      coilCurrentDensityAPerMm2(checkFourCoil({ strandsInHand: 2 }), 10),
    ).toBeCloseTo(9.9472, 4);
  });

  it("is not worked out without a positive current", () => {
    expect(coilCurrentDensityAPerMm2(checkFourCoil(), 0)).toBeNull();
    expect(coilCurrentDensityAPerMm2(checkFourCoil(), null)).toBeNull();
  });

  it("warns above fan cooling at 30.6 A/mm², naming the figure and the practice", () => {
    const warning = currentDensityWarning(
      checkFourCoil({ wire: wire050 }),
      0,
      6,
    );
    expect(warning?.code).toBe("current-density-above-fan-cooling");
    expect(warning?.message).toContain("30.6 A/mm²");
    expect(warning?.message).toContain("from memory");
  });

  it("warns above natural cooling between 6 and 10 A/mm², and not at or below 6", () => {
    // 0.8 mm: A = 0.502655 mm². 4 A → 7.958 A/mm²; 3 A → 5.968 A/mm² (by hand; GNU units
    // gives 7.9577472 and 5.9683104 for '4 A / (pi/4 * (0.8 mm)^2)' and the same at 3 A).
    expect(currentDensityWarning(checkFourCoil(), 0, 4)?.code).toBe(
      "current-density-above-natural-cooling",
    );
    expect(currentDensityWarning(checkFourCoil(), 0, 3)).toBeNull();
  });

  it("is among the design's warnings when the rated current is given", () => {
    const warnings = designWarnings({
      lines: [checkFourCoil({ wire: wire050 })],
      insulationClassC: 155,
      ratedCurrentA: 6,
    });
    expect(warnings.map((warning) => warning.code)).toEqual([
      "current-density-above-fan-cooling",
    ]);
    expect(designCheckNames[warnings[0]!.code]).toBe("Current density");
  });
});
