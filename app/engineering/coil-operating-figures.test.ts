import { describe, expect, it } from "vitest";
import { estimateCoil, type CoilEstimateInput } from "./coil-estimate";
import { expectWithinRelative } from "./printed-value.test-support";

/** Brief, worked check 4: 40 turns of 0.80 mm copper, MLT 160 mm, 6.400 m, 0.21952 Ω at 20 °C. */
const CHECK_4: CoilEstimateInput = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

describe("current density on the coil", () => {
  it("10 A in 0.80 mm: 19.894 A/mm² (10 / (π/4 · 0.64), GNU units)", () => {
    const result = estimateCoil({ ...CHECK_4, currentA: 10 });
    expectWithinRelative(
      result.perCoil.currentDensityAPerMm2!,
      19.894368,
      1e-7,
    );
  });

  it("is null without a current, and so are the AC figures without a frequency", () => {
    const result = estimateCoil(CHECK_4);
    expect(result.perCoil.currentDensityAPerMm2).toBeNull();
    expect(result.perCoil.skinDepthMm).toBeNull();
    expect(result.perCoil.acResistanceOhm).toBeNull();
    expect(result.perCoil.acResistanceRatio).toBeNull();
    expect(result.acLoss).toBeNull();
    expect(result.operatingPoint).toBeNull();
  });
});

describe("AC resistance of the check-4 coil at 10 kHz, four layers, 20 °C", () => {
  // Bare wire, no insulation given: pitch = bare diameter, so η = √(π/4) and
  // Δ = 0.8·√(π/4)/0.66085493 · √√(π/4) = 1.0099532; Dowell with m = 4 evaluated in GNU
  // units: 1.0099532·((sinh 2Δ + sin 2Δ)/(cosh 2Δ − cos 2Δ) + 10·(sinh Δ − sin Δ)/(cosh Δ + cos Δ))
  // = 2.7529527. R_ac = 0.21952406 · 2.7529527 = 0.604338 Ω.
  const result = estimateCoil({
    ...CHECK_4,
    currentA: 10,
    frequencyHz: 10_000,
    layersPerCoil: 4,
  });

  it("skin depth 0.66085 mm, R_ac/R_dc 2.75295, R_ac 0.604338 Ω", () => {
    expectWithinRelative(result.perCoil.skinDepthMm!, 0.66085493, 1e-6);
    expectWithinRelative(result.perCoil.acResistanceRatio!, 2.7529527, 1e-6);
    expectWithinRelative(
      result.perCoil.acResistanceOhm!,
      0.21952406 * 2.7529527,
      1e-6,
    );
  });

  it("loss 10² · 0.604338 = 60.434 W per coil; the DC fields are unchanged", () => {
    expectWithinRelative(result.acLoss!.lossPerCoilW, 60.4338, 1e-5);
    expect(result.acLoss!.layersAssumed).toBe(false);
    expectWithinRelative(result.perCoil.resistance20Ohm, 0.21952406, 1e-7);
    expectWithinRelative(result.copperLossW!, 21.952406, 1e-7);
  });

  it("one layer is assumed, and flagged, when no layer count is given", () => {
    const single = estimateCoil({
      ...CHECK_4,
      currentA: 10,
      frequencyHz: 10_000,
    });
    expect(single.acLoss!.layersPerCoil).toBe(1);
    expect(single.acLoss!.layersAssumed).toBe(true);
    expect(single.perCoil.acResistanceRatio!).toBeLessThan(
      result.perCoil.acResistanceRatio!,
    );
  });
});

describe("harmonics: P = Σ I_h² R_ac(f_h)", () => {
  it("adds the 5th and 7th at their own AC resistance", () => {
    const base = { ...CHECK_4, currentA: 10, layersPerCoil: 4 };
    const at = (frequencyHz: number) =>
      estimateCoil({ ...base, frequencyHz }).perCoil.acResistanceOhm!;
    const result = estimateCoil({
      ...base,
      frequencyHz: 1000,
      harmonics: [
        { order: 5, currentA: 2 },
        { order: 7, currentA: 1 },
      ],
    });
    expect(result.acLoss!.harmonics.map((h) => h.frequencyHz)).toEqual([
      1000, 5000, 7000,
    ]);
    const expected = 100 * at(1000) + 4 * at(5000) + 1 * at(7000);
    expectWithinRelative(result.acLoss!.lossPerCoilW, expected, 1e-12);
    expect(result.acLoss!.lossPerCoilW).toBeGreaterThan(105 * 0.21952406);
  });

  it("refuses harmonics without a frequency (frequencyHz) or without a current (currentA)", () => {
    const harmonics = [{ order: 3, currentA: 1 }];
    expect(() =>
      estimateCoil({ ...CHECK_4, currentA: 10, harmonics }),
    ).toThrowError(expect.objectContaining({ field: "frequencyHz" }) as Error);
    expect(() =>
      estimateCoil({ ...CHECK_4, frequencyHz: 50, harmonics }),
    ).toThrowError(expect.objectContaining({ field: "currentA" }) as Error);
  });

  it("refuses zero layers, naming layersPerCoil", () => {
    expect(() =>
      estimateCoil({ ...CHECK_4, frequencyHz: 50, layersPerCoil: 0 }),
    ).toThrowError(
      expect.objectContaining({ field: "layersPerCoil" }) as Error,
    );
  });
});

describe("litz and flat wire coils", () => {
  it("40 turns of 100 × 0.100 mm litz: 0.143305 Ω and 45.580 g (take-up 1.02)", () => {
    // GNU units: 6.4 m · (1/58) / (100 · π/4 · 0.01) · 1.02 = 0.14330531 Ω;
    // 8.89 · 100 · π/4 · 0.01 · 6.4 · 1.02 / 1000 = 0.045579734 kg.
    const result = estimateCoil({
      ...CHECK_4,
      wire: {
        standard: "litz",
        strands: 100,
        strandWire: { standard: "IEC", diameterMm: 0.1 },
      },
      currentA: 10,
    });
    expectWithinRelative(result.perCoil.resistance20Ohm, 0.14330531, 1e-7);
    expectWithinRelative(result.perCoil.woundMassKg, 0.045579734, 1e-7);
    expectWithinRelative(result.perCoil.conductorLengthM, 6.4, 1e-12);
    // 10 A over 0.785398 mm² of copper = 12.732 A/mm².
    expectWithinRelative(result.perCoil.currentDensityAPerMm2!, 12.7324, 1e-5);
    expect(result.wire.kind).toBe("litz");
    expect(result.wire.litz!.strands).toBe(100);
  });

  it("litz keeps R_ac/R_dc far lower than solid wire of the same copper at 50 kHz", () => {
    const litz = estimateCoil({
      ...CHECK_4,
      wire: {
        standard: "litz",
        strands: 100,
        strandWire: { standard: "IEC", diameterMm: 0.1 },
      },
      frequencyHz: 50_000,
      layersPerCoil: 4,
    });
    const solid = estimateCoil({
      ...CHECK_4,
      wire: { standard: "IEC", diameterMm: 1.0 },
      frequencyHz: 50_000,
      layersPerCoil: 4,
    });
    expect(litz.perCoil.acResistanceRatio!).toBeLessThan(
      solid.perCoil.acResistanceRatio! / 3,
    );
  });

  it("40 turns of 2.00 × 8.00 mm flat copper: 0.0070565 Ω (GNU units)", () => {
    // 6.4 · (1/58) / (2·8 − (4 − π)·0.65²) = 0.0070565037 Ω.
    const result = estimateCoil({
      ...CHECK_4,
      wire: { standard: "rectangular", thicknessMm: 2, widthMm: 8 },
      insulation: "grade2",
    });
    expectWithinRelative(result.perCoil.resistance20Ohm, 0.0070565037, 1e-7);
    expect(result.wire.kind).toBe("rectangular");
    expect(result.wire.rectangular!.cornerRadiusMm).toBe(0.65);
    expect(result.wire.overallDiameterMm).toBeNull();
  });

  it("a flat conductor wound on edge has more eddy loss than wound flat", () => {
    const flat = {
      standard: "rectangular" as const,
      thicknessMm: 2,
      widthMm: 8,
    };
    const base = {
      ...CHECK_4,
      frequencyHz: 1000,
      layersPerCoil: 3,
      insulation: "grade2" as const,
    };
    const flatwise = estimateCoil({ ...base, wire: flat });
    const edgewise = estimateCoil({
      ...base,
      wire: { ...flat, edgewise: true },
    });
    expect(edgewise.perCoil.acResistanceRatio!).toBeGreaterThan(
      flatwise.perCoil.acResistanceRatio!,
    );
  });
});

describe("operating temperature", () => {
  it("2 K/W in 40 °C air: 97.229 °C and 28.615 W per coil (closed form, see winding-temperature tests)", () => {
    const result = estimateCoil({
      ...CHECK_4,
      coilCount: 12,
      currentA: 10,
      thermal: { ambientC: 40, thermalResistanceKPerW: 2 },
    });
    // With R20 = 0.21952406 (unrounded), GNU units:
    // (40 + 2·100·R20·(1 − 20α))/(1 − 2·100·R20·α) = 97.230644 °C;
    // 100 · R20 · (1 + 0.00393 · 77.230644) = 28.615322 W.
    expectWithinRelative(result.operatingPoint!.temperatureC, 97.230644, 1e-6);
    expectWithinRelative(result.operatingPoint!.lossPerCoilW, 28.615322, 1e-6);
    expectWithinRelative(
      result.operatingPoint!.totalLossW,
      12 * result.operatingPoint!.lossPerCoilW,
      1e-12,
    );
    expect(result.operatingPoint!.acResistanceOhm).toBeNull();
  });

  it("refuses a thermal input without a current, naming currentA", () => {
    expect(() =>
      estimateCoil({
        ...CHECK_4,
        thermal: { ambientC: 40, temperatureRiseK: 60 },
      }),
    ).toThrowError(expect.objectContaining({ field: "currentA" }) as Error);
  });
});
