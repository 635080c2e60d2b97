import { describe, expect, it } from "vitest";
import { expectMatchesPrinted } from "./printed-value.test-support";
import {
  defaultCoilPitch,
  windingFactors,
  windingInfeasibility,
  type WindingInput,
} from "./winding-factor";

function fieldOf(input: WindingInput): string | undefined {
  return windingInfeasibility(input)?.field;
}

function harmonic(input: WindingInput, order: number): number {
  const found = windingFactors(input).harmonics.find((h) => h.order === order);
  if (!found) throw new Error(`order ${order} not reported`);
  return found.factor;
}

describe("fundamental winding factors against published tables", () => {
  // Fractional-slot concentrated (tooth-coil) windings. Values as printed in the tables of
  // Libert and Soulard, "Investigation on pole-slot combinations for permanent-magnet
  // machines with concentrated windings" (ICEM 2004), and Meier's thesis (KTH 2008) —
  // from memory: the printed pages were not at hand to re-check.
  it("12 slots / 10 poles, double layer: 0.933 (Libert & Soulard; from memory)", () => {
    expectMatchesPrinted(
      windingFactors({ slots: 12, poles: 10, layers: 2 }).fundamental,
      "0.933",
    );
  });

  it("12 slots / 10 poles, single layer: 0.966 (Libert & Soulard; from memory)", () => {
    expectMatchesPrinted(
      windingFactors({ slots: 12, poles: 10, layers: 1 }).fundamental,
      "0.966",
    );
  });

  it("12 slots / 8 poles, double layer: 0.866 (Libert & Soulard; from memory)", () => {
    expectMatchesPrinted(
      windingFactors({ slots: 12, poles: 8, layers: 2 }).fundamental,
      "0.866",
    );
  });

  it("9 slots / 8 poles, double layer: 0.945 (Libert & Soulard; from memory)", () => {
    expectMatchesPrinted(
      windingFactors({ slots: 9, poles: 8, layers: 2 }).fundamental,
      "0.945",
    );
  });

  it("24 slots / 22 poles: 0.949 double layer, 0.958 single layer (Meier 2008; from memory)", () => {
    expectMatchesPrinted(
      windingFactors({ slots: 24, poles: 22, layers: 2 }).fundamental,
      "0.949",
    );
    expectMatchesPrinted(
      windingFactors({ slots: 24, poles: 22, layers: 1 }).fundamental,
      "0.958",
    );
  });

  // Distributed windings, closed form k_w = k_d · k_p with k_d = sin(q·α/2) ÷ (q·sin(α/2))
  // and k_p = sin(y/τ · 90°) (Pyrhönen, Jokinen and Hrabovcová, Design of Rotating Electrical
  // Machines, ch. 2), worked by hand here; the code adds phasors instead.
  it("24 slots / 4 poles, full pitch (q = 2, α = 30°): k_d = sin 30° ÷ (2 sin 15°) = 0.9659", () => {
    // 0.5 ÷ (2 × 0.258819) = 0.965926; k_p = 1 (y = 6 = Q/2p).
    const factors = windingFactors({ slots: 24, poles: 4, layers: 2 });
    expect(factors.coilPitch).toBe(6);
    expectMatchesPrinted(factors.fundamental, "0.9659");
    expect(factors.kind).toBe("distributed");
  });

  it("36 slots / 4 poles, pitch 7/9 (q = 3, α = 20°): 0.9598 × sin 70° = 0.9019", () => {
    // k_d = sin 30° ÷ (3 sin 10°) = 0.5 ÷ 0.520945 = 0.959795; k_p = sin(7/9 × 90°) = sin 70°
    // = 0.939693; product 0.901912. Textbooks print 0.902 for this classic short-pitched winding.
    expectMatchesPrinted(
      windingFactors({ slots: 36, poles: 4, layers: 2, coilPitch: 7 })
        .fundamental,
      "0.9019",
    );
  });
});

describe("harmonic winding factors, worked by hand", () => {
  it("12 slots / 10 poles double layer, 5th and 7th: sin² 15° = 0.0670; 11th and 13th equal the fundamental", () => {
    // Slot pitch α = 5 × 30° = 150° electrical; tooth coils (y = 1). Pitch factor
    // k_p5 = |sin(5 × 150°/2)| = |sin 375°| = sin 15°. Phase A's four coils (slots 0, 1, 6, 7;
    // the 2nd and 3rd reversed) sit at 0°, 150° + 180°, 900° + 180°, 1050° at ν = 1; times 5:
    // 0°, 930° ≡ 210°, 4680° ≡ 0°, 5250° ≡ 210°, so k_d5 = |2 + 2e^{j210°}| ÷ 4 = |cos 105°|
    // = sin 15°. k_w5 = sin² 15° = 0.066987. Libert & Soulard print 0.067 (from memory).
    const input = { slots: 12, poles: 10, layers: 2 };
    expectMatchesPrinted(harmonic(input, 5), "0.0670");
    expectMatchesPrinted(harmonic(input, 7), "0.0670");
    // 11 × 150° ≡ −150° and 13 × 150° ≡ 150°: the slot harmonics see the fundamental's star.
    expectMatchesPrinted(harmonic(input, 11), "0.9330");
    expectMatchesPrinted(harmonic(input, 13), "0.9330");
  });

  it("36 slots / 4 poles pitch 7/9: 5th 0.0378, 7th 0.1359 (k_d · k_p by hand)", () => {
    // ν = 5: k_d5 = sin 150° ÷ (3 sin 50°) = 0.5 ÷ 2.298133 = 0.217568; k_p5 = |sin 350°| =
    // 0.173648 → 0.037780. ν = 7: k_d7 = |sin 210°| ÷ (3 sin 70°) = 0.5 ÷ 2.819078 =
    // 0.177363; k_p7 = |sin 490°| = sin 130° = 0.766044 → 0.135868.
    const input = { slots: 36, poles: 4, layers: 2, coilPitch: 7 };
    expectMatchesPrinted(harmonic(input, 5), "0.0378");
    expectMatchesPrinted(harmonic(input, 7), "0.1359");
  });

  it("reports odd orders to the 19th without the triplens for 3 phases", () => {
    const orders = windingFactors({
      slots: 12,
      poles: 10,
      layers: 2,
    }).harmonics.map((h) => h.order);
    expect(orders).toEqual([1, 5, 7, 11, 13, 17, 19]);
  });
});

describe("the coil pitch", () => {
  it("is 1 (tooth coils) below 1.5 slots per pole, and a tie goes to the shorter pitch", () => {
    expect(defaultCoilPitch(12, 10)).toBe(1); // 1.2 slots per pole
    expect(defaultCoilPitch(12, 8)).toBe(1); // 1.5: tie, shorter
    expect(defaultCoilPitch(9, 6)).toBe(1); // 1.5
    expect(defaultCoilPitch(24, 4)).toBe(6); // full pitch
    expect(defaultCoilPitch(18, 8)).toBe(2); // 2.25
    expect(defaultCoilPitch(3, 4)).toBe(1); // 0.75, at least 1
  });
});

describe("refusals name the field", () => {
  it("odd poles, unbalanced slot/pole/phase combinations, an odd slot count in one layer", () => {
    expect(fieldOf({ slots: 12, poles: 9, layers: 2 })).toBe("poles");
    // 10 slots, 3 phases, t = GCD(10, 4) = 2: 10 ÷ 6 is not whole.
    expect(fieldOf({ slots: 10, poles: 8, layers: 2 })).toBe("slots");
    // 12 slots, 6 poles (q = 2/3 with t = 3): 12 ÷ 9 is not whole.
    expect(fieldOf({ slots: 12, poles: 6, layers: 2 })).toBe("slots");
    // 9 slots / 8 poles is fine in two layers, but a single layer needs an even slot count.
    expect(fieldOf({ slots: 9, poles: 8, layers: 1 })).toBe("layers");
    expect(fieldOf({ slots: 12, poles: 10, layers: 3 })).toBe("layers");
    expect(fieldOf({ slots: 12, poles: 10, layers: 2, phases: 2 })).toBe(
      "phases",
    );
  });

  it("nonsense numbers: NaN, negative, fractional, a pitch past the slots", () => {
    expect(fieldOf({ slots: Number.NaN, poles: 10, layers: 2 })).toBe("slots");
    expect(fieldOf({ slots: -12, poles: 10, layers: 2 })).toBe("slots");
    expect(fieldOf({ slots: 12.5, poles: 10, layers: 2 })).toBe("slots");
    expect(fieldOf({ slots: 12, poles: 0, layers: 2 })).toBe("poles");
    expect(fieldOf({ slots: 12, poles: 10, layers: 2, coilPitch: 12 })).toBe(
      "coilPitch",
    );
    expect(fieldOf({ slots: 12, poles: 10, layers: 2, coilPitch: 0 })).toBe(
      "coilPitch",
    );
  });

  it("the message says why", () => {
    expect(
      windingInfeasibility({ slots: 10, poles: 8, layers: 2 })?.message,
    ).toMatch(/cannot make a balanced 3-phase winding/);
  });

  it("five phases: 10 slots / 8 poles is balanced (10 ÷ (5 × 2) = 1)", () => {
    // Tooth coils, α = 4 × 36° = 144°. Five belts of 36°: phase A takes coils at 0° and,
    // reversed, 180° + 144° × … — by hand k_w1 = k_d · k_p = 1 × sin 72° = 0.9511 (the
    // two A coils' phasors coincide, the coil spans 144°).
    const factors = windingFactors({
      slots: 10,
      poles: 8,
      layers: 2,
      phases: 5,
    });
    expectMatchesPrinted(factors.fundamental, "0.9511");
    expect(factors.coilsPerPhase).toBe(2);
  });
});
