import { describe, expect, it } from "vitest";
import {
  endTurnFactor,
  endTurnLengthFromSlotPitchMm,
  endTurnLengthFromToothMm,
  slotPitchMm,
} from "./end-turn-length";
import { EngineeringInputError } from "./errors";

describe("end-turn length from the tooth geometry (Bianchi, Bolognani and Frare 2006)", () => {
  it("tooth coil: (π/4)·(τ_u + w_t)", () => {
    // τ_u 10 mm, w_t 6 mm: (π/4)·16 mm = 4π mm (brief formula, Bianchi 2006).
    expect(
      endTurnLengthFromToothMm({ slotPitchMm: 10, toothWidthMm: 6 }),
    ).toBeCloseTo(4 * Math.PI, 12);
  });

  it("distributed coil adds τ_u·K_ov·(y − 1) with K_ov = 1.8", () => {
    // y = 3: 4π + 10 · 1.8 · 2 = 4π + 36 mm (brief formula, Bianchi 2006).
    expect(
      endTurnLengthFromToothMm({
        slotPitchMm: 10,
        toothWidthMm: 6,
        coilThrowSlots: 3,
      }),
    ).toBeCloseTo(4 * Math.PI + 36, 12);
    // A different overhang factor replaces 1.8.
    expect(
      endTurnLengthFromToothMm({
        slotPitchMm: 10,
        toothWidthMm: 6,
        coilThrowSlots: 3,
        overhangFactor: 1.5,
      }),
    ).toBeCloseTo(4 * Math.PI + 30, 12);
  });

  it("rejects a coil throw below one slot", () => {
    expect(() =>
      endTurnLengthFromToothMm({
        slotPitchMm: 10,
        toothWidthMm: 6,
        coilThrowSlots: 0,
      }),
    ).toThrow(EngineeringInputError);
    expect(() =>
      endTurnLengthFromToothMm({ slotPitchMm: 0, toothWidthMm: 6 }),
    ).toThrow(EngineeringInputError);
  });
});

describe("end-turn length from the slot pitch (Magnussen and Sadarangani, IEMDC 2003)", () => {
  it("slot pitch τ_s = 2πr/Q", () => {
    // r 60 mm, Q 12 slots: 2π·60/12 = 10π mm.
    expect(slotPitchMm(60, 12)).toBeCloseTo(10 * Math.PI, 12);
    expect(() => slotPitchMm(60, 0)).toThrow(EngineeringInputError);
    expect(() => slotPitchMm(60, 2.5)).toThrow(EngineeringInputError);
  });

  it("k_c = (π/2)·y distributed, 1.36 single-layer and 0.93 double-layer tooth coils", () => {
    // Brief (Magnussen and Sadarangani 2003).
    expect(endTurnFactor("distributed", 5)).toBeCloseTo(2.5 * Math.PI, 12);
    expect(endTurnFactor("single-layer-tooth-coil")).toBe(1.36);
    expect(endTurnFactor("double-layer-tooth-coil")).toBe(0.93);
  });

  it("l_end = k_c · τ_s", () => {
    // r 60 mm, Q 12: τ_s = 10π mm; double-layer tooth coil 0.93 · 10π; distributed y = 2: π · 10π.
    expect(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "double-layer-tooth-coil",
      }),
    ).toBeCloseTo(9.3 * Math.PI, 12);
    expect(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "single-layer-tooth-coil",
      }),
    ).toBeCloseTo(13.6 * Math.PI, 12);
    expect(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "distributed",
        coilThrowSlots: 2,
      }),
    ).toBeCloseTo(10 * Math.PI * Math.PI, 12);
  });

  it("the distributed end turn is half a circle spanning y slot pitches", () => {
    // (π/2)·y·τ_s = π · (y·τ_s) / 2: half the circumference of a circle of diameter y·τ_s.
    for (const coilThrowSlots of [1, 2, 3, 5, 9]) {
      const span = coilThrowSlots * slotPitchMm(80, 36);
      expect(
        endTurnLengthFromSlotPitchMm({
          radiusMm: 80,
          slotCount: 36,
          layout: "distributed",
          coilThrowSlots,
        }),
      ).toBeCloseTo((Math.PI * span) / 2, 12);
    }
  });
});

describe("refusals (issue 19, fix 6)", () => {
  const fieldOf = (run: () => unknown) => {
    try {
      run();
    } catch (error) {
      if (error instanceof EngineeringInputError) return error.field;
      throw error;
    }
    return undefined;
  };

  it("a tooth as wide as or wider than the slot pitch leaves no slot", () => {
    // τ_u = tooth width + slot width: before the fix a 14 mm tooth in a 12 mm pitch gave
    // (π/4)·26 = 20.4 mm as if the coil had somewhere to lie.
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({ slotPitchMm: 12, toothWidthMm: 14 }),
      ),
    ).toBe("toothWidthMm");
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({ slotPitchMm: 12, toothWidthMm: 12 }),
      ),
    ).toBe("toothWidthMm");
  });

  it("negative, NaN and infinite lengths, and an unknown layout", () => {
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({ slotPitchMm: -12, toothWidthMm: 6 }),
      ),
    ).toBe("slotPitchMm");
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({
          slotPitchMm: Number.POSITIVE_INFINITY,
          toothWidthMm: 6,
        }),
      ),
    ).toBe("slotPitchMm");
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({ slotPitchMm: 12, toothWidthMm: Number.NaN }),
      ),
    ).toBe("toothWidthMm");
    expect(
      fieldOf(() =>
        endTurnLengthFromToothMm({
          slotPitchMm: 12,
          toothWidthMm: 6,
          overhangFactor: -1.8,
        }),
      ),
    ).toBe("overhangFactor");
    expect(fieldOf(() => slotPitchMm(-40, 12))).toBe("radiusMm");
    expect(fieldOf(() => slotPitchMm(40, -12))).toBe("slotCount");
    expect(fieldOf(() => slotPitchMm(40, 0))).toBe("slotCount");
    expect(
      fieldOf(() =>
        endTurnFactor("hairpin" as Parameters<typeof endTurnFactor>[0]),
      ),
    ).toBe("layout");
  });
});
