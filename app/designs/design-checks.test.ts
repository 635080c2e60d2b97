import { describe, expect, it } from "vitest";
import {
  coilSlotFillFactor,
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
