import { describe, expect, it } from "vitest";
import {
  expectMatchesPrinted,
  expectWithinRelative,
} from "./printed-value.test-support";
import {
  litzAcResistanceFactor,
  litzBundleDiameterMm,
  litzResistancePerLength,
  litzTakeUpFactor,
  litzWire,
} from "./litz-wire";
import {
  MU_0_H_PER_M,
  dowellResistanceFactor,
  roundConductorPenetrationRatio,
  skinDepthMm,
} from "./skin-effect";
import { resistivityOhmMm2PerM } from "./wire-geometry";

describe("litz DC resistance", () => {
  it("take-up k1: 1.02, 1.04, 1.06 for one, two, three or more bunching steps (IEC 60317-11 via Elektrisola)", () => {
    expect(litzTakeUpFactor(1)).toBeCloseTo(1.02, 12);
    expect(litzTakeUpFactor(2)).toBeCloseTo(1.04, 12);
    expect(litzTakeUpFactor(3)).toBeCloseTo(1.06, 12);
    expect(litzTakeUpFactor(5)).toBeCloseTo(1.06, 12);
  });

  it("New England Wire's worked example: 450 × 40 AWG, 5x3/30/40, 2.70 Ω/1000 ft", () => {
    // New England Wire, litz technical information, formula 3 and its example: strand
    // 1152.3 Ω/1000 ft (their table, 40 AWG maximum), +1.5 % per bunching (two) and
    // +2.5 % per cabling (one), over 450 strands: "2.70 ohms/1000 ft".
    const takeUp = 1.015 ** 2 * 1.025;
    expectMatchesPrinted(litzResistancePerLength(1152.3, 450, takeUp), "2.70");
  });

  it("100 × 0.100 mm copper, one bunching: 2.19525 Ω/m ÷ 100 × 1.02 = 0.0223916 Ω/m (hand-worked)", () => {
    // One 0.100 mm strand: (1/58) / (π/4 · 0.01) = 2.19525 Ω/m (IEC 60028 copper, 20 °C).
    expectWithinRelative(
      litzResistancePerLength(2.19525, 100, litzTakeUpFactor(1)),
      0.0223916,
      1e-5,
    );
  });

  it("refuses one strand, a take-up below 1 and zero bunching steps, each naming its field", () => {
    expect(() => litzResistancePerLength(1, 1, 1.02)).toThrowError(
      expect.objectContaining({ field: "wire.strands" }) as Error,
    );
    expect(() => litzResistancePerLength(1, 10, 0.98)).toThrowError(
      expect.objectContaining({ field: "wire.takeUpFactor" }) as Error,
    );
    expect(() => litzTakeUpFactor(0)).toThrowError(
      expect.objectContaining({ field: "wire.bunchingSteps" }) as Error,
    );
  });
});

describe("litz bundle", () => {
  it("100 strands of 0.117 mm overall at packing 0.75: 1.3510 mm, as the rule OD ≈ 1.155·d·√n", () => {
    // Hand-worked: 0.117 · √(100/0.75) = 0.117 · 11.5470 = 1.35100 mm. Rule of thumb
    // (common practice, from memory): 1.155 · 0.117 · 10 = 1.35135 mm.
    expectWithinRelative(litzBundleDiameterMm(0.117, 100), 1.351, 1e-4);
    expectWithinRelative(
      litzBundleDiameterMm(0.117, 100),
      1.155 * 0.117 * 10,
      5e-4,
    );
  });

  it("100 × IEC 0.100 mm: 0.78540 mm² of copper, the area of one 1.000 mm wire", () => {
    // Hand-worked: 100 · π/4 · 0.1² = 0.785398 mm² = π/4 · 1.000².
    const wire = litzWire({
      standard: "litz",
      strands: 100,
      strandWire: { standard: "IEC", diameterMm: 0.1 },
    });
    expectWithinRelative(wire.copperAreaMm2, 0.785398, 1e-6);
    expectWithinRelative(wire.equalAreaDiameterMm, 1.0, 1e-9);
    expect(wire.strandInsulation).toBe("grade1");
    expect(wire.strandInsulationAssumed).toBe(true);
    expect(wire.takeUpFactor).toBeCloseTo(1.02, 12);
    expect(wire.bundleDiameterMm).toBeGreaterThan(1.0);
  });

  it("refuses a packing factor above hexagonal packing, naming wire.packingFactor", () => {
    expect(() => litzBundleDiameterMm(0.1, 100, 0.95)).toThrowError(
      expect.objectContaining({ field: "wire.packingFactor" }) as Error,
    );
  });
});

describe("litz AC resistance (strand-level Dowell)", () => {
  const copper = resistivityOhmMm2PerM("copper", 20);

  it("is 1 at very low frequency", () => {
    const factor = litzAcResistanceFactor({
      strandBareDiameterMm: 0.1,
      strands: 400,
      bundleDiameterMm: 2.7,
      layers: 2,
      skinDepthMm: skinDepthMm(copper, 1),
    });
    expect(factor).toBeCloseTo(1, 8);
  });

  it("agrees with Sullivan's published litz formula to within π/3 (the equal-area square)", () => {
    // C. R. Sullivan, "Optimal choice for number of strands in a litz-wire transformer
    // winding", IEEE Trans. Power Electronics 14(2), 1999, eq. (2) (from memory):
    //   F_R = 1 + (π ω μ0)² N² n² d⁶ k / (768 ρ² b²), k = 1 for many strands.
    // A coil of m = 2 layers whose bundles (D = 2.7 mm) touch across the breadth b has
    // N/b = m/D. 400 strands of 0.1 mm copper at 20 kHz, 20 °C:
    const frequencyHz = 20_000;
    const omega = 2 * Math.PI * frequencyHz;
    const rhoOhmM = copper * 1e-6;
    const d = 0.1e-3;
    const D = 2.7e-3;
    const m = 2;
    const n = 400;
    const sullivan =
      ((Math.PI * omega * MU_0_H_PER_M) ** 2 * m * m * n * n * d ** 6) /
      (768 * rhoOhmM ** 2 * D ** 2);
    const ours =
      litzAcResistanceFactor({
        strandBareDiameterMm: 0.1,
        strands: n,
        bundleDiameterMm: 2.7,
        layers: m,
        skinDepthMm: skinDepthMm(copper, frequencyHz),
      }) - 1;
    // Hand derivation: Dowell's low-frequency term for many layers is m_eff²Δ⁴/9 with
    // Δ⁴ = h⁶·n/(δ⁴·p²), h = d·√(π/4), which is π/3 times Sullivan's term; Sullivan's
    // appendix notes the equal-area square overstates the low-frequency loss of round wire.
    expectWithinRelative(ours / sullivan, Math.PI / 3, 0.002);
    expect(sullivan).toBeGreaterThan(0.05); // the proximity loss is not negligible here
  });

  it("beats a solid wire of the same copper in the same two layers at 100 kHz", () => {
    // 400 × 0.1 mm (2.0 mm² copper) against 1.6 mm solid wire (2.01 mm²), touching turns.
    const delta = skinDepthMm(copper, 100_000);
    const litz = litzAcResistanceFactor({
      strandBareDiameterMm: 0.1,
      strands: 400,
      bundleDiameterMm: 2.7,
      layers: 2,
      skinDepthMm: delta,
    });
    // Solid: Δ = (1.4180/0.20898)·√(1.4180/1.6) = 6.388, F_R ≈ 6.388 · (1 + 2) = 19.2.
    const solid = dowellResistanceFactor(
      roundConductorPenetrationRatio(1.6, 1.6, delta),
      2,
    );
    expectWithinRelative(solid, 19.16, 0.005);
    expect(litz).toBeGreaterThan(1);
    expect(litz).toBeLessThan(solid / 4);
  });
});

describe("litz strand sizes", () => {
  it("refuses a strand size outside IEC 60317-0-1's 0.020–5.000 mm, naming wire.strandWire.diameterMm", () => {
    expect(() =>
      litzWire({
        standard: "litz",
        strands: 10,
        strandWire: { standard: "IEC", diameterMm: 6.3 },
      }),
    ).toThrowError(
      expect.objectContaining({ field: "wire.strandWire.diameterMm" }) as Error,
    );
  });
});
