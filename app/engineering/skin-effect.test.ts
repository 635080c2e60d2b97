import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import { expectWithinRelative } from "./printed-value.test-support";
import {
  dowellResistanceFactor,
  harmonicLosses,
  roundConductorPenetrationRatio,
  skinDepthMm,
} from "./skin-effect";
import { resistivityOhmMm2PerM } from "./wire-geometry";

const copper20 = resistivityOhmMm2PerM("copper", 20);

describe("skin depth of copper", () => {
  it("matches GNU units at 50 Hz, 1 kHz and 10 kHz (IEC 60028 copper at 20 °C)", () => {
    // GNU units 2.22: units -t 'sqrt(1|58 ohm mm^2/m / (pi 50 Hz mu0))' mm → 9.3459001
    expectWithinRelative(skinDepthMm(copper20, 50), 9.3459001, 1e-6);
    // … 1000 Hz → 2.0898068
    expectWithinRelative(skinDepthMm(copper20, 1000), 2.0898068, 1e-6);
    // … 10000 Hz → 0.66085493
    expectWithinRelative(skinDepthMm(copper20, 10_000), 0.66085493, 1e-6);
  });

  it("agrees with published tables within the spread of the resistivity they use", () => {
    // Published skin-effect table for copper (launchloop.com "Skin Depth", after the
    // Wikipedia skin-effect article; ρ = 1.7 × 10⁻⁸ Ω·m, two figures): 60 Hz 8.5 mm,
    // 1 kHz 2.1 mm, 20 kHz 0.46 mm. Our ρ is 1.724 × 10⁻⁸, so ours are up to 0.7 % deeper.
    expectWithinRelative(skinDepthMm(copper20, 60), 8.5, 0.01);
    expectWithinRelative(skinDepthMm(copper20, 1000), 2.1, 0.01);
    expectWithinRelative(skinDepthMm(copper20, 20_000), 0.46, 0.02);
    // Wikipedia's skin-effect table (from memory; ρ = 1.68 × 10⁻⁸ Ω·m): 50 Hz 9.22 mm,
    // 10 kHz 0.65 mm. √(1.7241/1.68) = 1.013, so ours are 1.3 % deeper.
    expectWithinRelative(skinDepthMm(copper20, 50), 9.22 * 1.013, 0.002);
    expectWithinRelative(skinDepthMm(copper20, 10_000), 0.65 * 1.013, 0.005);
  });

  it("deepens as copper warms: δ ∝ √ρ, ρ(120 °C) = ρ20 · 1.393 (IEC 60028, α 0.00393)", () => {
    // Hand-worked: 9.3459 mm · √1.393 = 9.3459 · 1.18025 = 11.0305 mm at 50 Hz, 120 °C.
    const hot = resistivityOhmMm2PerM("copper", 120);
    expectWithinRelative(skinDepthMm(hot, 50), 11.0305, 1e-4);
  });

  it("refuses a frequency of zero, a negative one, NaN and above 10 MHz, naming frequencyHz", () => {
    for (const frequency of [0, -50, Number.NaN, 2e7]) {
      expect(() => skinDepthMm(copper20, frequency)).toThrowError(
        expect.objectContaining({ field: "frequencyHz" }) as Error,
      );
    }
  });
});

describe("Dowell's R_ac/R_dc (Proc. IEE 1966)", () => {
  it("tends to 1 as Δ → 0, for one layer and for ten", () => {
    expect(dowellResistanceFactor(0, 1)).toBe(1);
    expect(dowellResistanceFactor(1e-4, 10)).toBeCloseTo(1, 10);
    expect(dowellResistanceFactor(0.01, 10)).toBeCloseTo(1, 5);
  });

  it("one layer at Δ = 1: 1.0856357 (hand-worked with GNU units' sinh, sin, cosh, cos)", () => {
    // Δ·(sinh2 + sin2)/(cosh2 − cos2) = (3.6268604 + 0.90929743)/(3.7621957 + 0.41614684)
    //   = 4.5361578 / 4.1783425 = 1.0856357 (units -t '(sinh(2)+sin(2))/(cosh(2)-cos(2))').
    expectWithinRelative(dowellResistanceFactor(1, 1), 1.0856357, 1e-7);
  });

  it("two layers at Δ = 1: 1.4060091 (hand-worked)", () => {
    // + (2·(4 − 1)/3)·(sinh1 − sin1)/(cosh1 + cos1) = 2 · 0.33373022 / 2.0833829
    //   = 0.3203734; 1.0856357 + 0.3203734 = 1.4060091.
    expectWithinRelative(dowellResistanceFactor(1, 2), 1.4060091, 1e-7);
  });

  it("follows the published low-frequency series 1 + (5m² − 1)/45 · Δ⁴", () => {
    // Series of Dowell's expression (C. R. Sullivan's litz-wire notes, appendix; Hurley,
    // Gath and Breslin, IEEE Trans. Power Electronics 15(2), 2000): valid while Δ ≪ 1.
    for (const [delta, layers] of [
      [0.2, 1],
      [0.2, 3],
      [0.3, 2],
      [0.1, 10],
    ] as const) {
      const series = 1 + ((5 * layers * layers - 1) / 45) * delta ** 4;
      expectWithinRelative(dowellResistanceFactor(delta, layers), series, 2e-4);
    }
  });

  it("tends to Δ·(1 + 2(m² − 1)/3) at high Δ (hyperbolic ratios → 1, sin/cos bounded)", () => {
    // Hand-worked: Δ = 10, m = 2 → 10 · (1 + 2) = 30; Δ = 10, m = 1 → 10.
    expectWithinRelative(dowellResistanceFactor(10, 2), 30, 1e-3);
    expectWithinRelative(dowellResistanceFactor(10, 1), 10, 1e-3);
    expectWithinRelative(
      dowellResistanceFactor(100, 3),
      100 * (1 + 16 / 3),
      1e-12,
    );
  });

  it("rises steadily with Δ for three layers (no dip in Dowell's curves of F_R)", () => {
    let previous = 1;
    for (let delta = 0.1; delta < 5; delta += 0.1) {
      const value = dowellResistanceFactor(delta, 3);
      expect(value).toBeGreaterThan(previous);
      previous = value;
    }
  });

  it("refuses fewer than one layer, naming layersPerCoil", () => {
    expect(() => dowellResistanceFactor(1, 0)).toThrowError(
      EngineeringInputError,
    );
    expect(() => dowellResistanceFactor(1, Number.NaN)).toThrowError(
      expect.objectContaining({ field: "layersPerCoil" }) as Error,
    );
  });
});

describe("round conductors as equal-area squares", () => {
  it("Δ of 1.00 mm wire at 1.10 mm pitch, δ = 0.66085 mm: hand-worked 1.2037", () => {
    // h = 1.00·√(π/4) = 0.886227 mm; η = 0.886227/1.10 = 0.805661; √η = 0.897586;
    // Δ = 0.886227/0.660855 · 0.897586 = 1.341033 · 0.897586 = 1.203690.
    expectWithinRelative(
      roundConductorPenetrationRatio(1.0, 1.1, 0.66085493),
      1.20369,
      1e-5,
    );
  });

  it("refuses a pitch smaller than the wire", () => {
    expect(() => roundConductorPenetrationRatio(1.0, 0.9, 0.66)).toThrowError(
      EngineeringInputError,
    );
  });
});

describe("loss with harmonics, P = Σ I_h² R_ac(f_h)", () => {
  it("adds the fundamental and the 5th and 7th, each at its own resistance (hand-worked)", () => {
    // R_ac(f) = 0.1 Ω · (1 + f/1000) for the test: 50 Hz → 0.105 Ω, 250 Hz → 0.125 Ω,
    // 350 Hz → 0.135 Ω. 10² · 0.105 + 2² · 0.125 + 1² · 0.135 = 10.5 + 0.5 + 0.135 = 11.135 W.
    const result = harmonicLosses(
      50,
      10,
      [
        { order: 5, currentA: 2 },
        { order: 7, currentA: 1 },
      ],
      (f) => 0.1 * (1 + f / 1000),
    );
    expect(result.losses.map((h) => h.frequencyHz)).toEqual([50, 250, 350]);
    expectWithinRelative(result.lossW, 11.135, 1e-12);
  });

  it("refuses a repeated order and order 1, naming the harmonic", () => {
    expect(() =>
      harmonicLosses(
        50,
        10,
        [
          { order: 3, currentA: 1 },
          { order: 3, currentA: 2 },
        ],
        () => 1,
      ),
    ).toThrowError(
      expect.objectContaining({ field: "harmonics.1.order" }) as Error,
    );
    expect(() =>
      harmonicLosses(50, 10, [{ order: 1, currentA: 1 }], () => 1),
    ).toThrowError(
      expect.objectContaining({ field: "harmonics.0.order" }) as Error,
    );
  });
});
