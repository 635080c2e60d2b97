import { describe, expect, it } from "vitest";
import {
  endTurnFactor,
  endTurnLengthFromSlotPitchMm,
  endTurnLengthFromToothMm,
  slotPitchMm,
} from "./end-turn-length";
import { EngineeringInputError } from "./errors";
import { expectMatchesPrinted } from "./printed-value.test-support";

describe("end-turn length from the tooth geometry (Bianchi, Bolognani and Frare 2006)", () => {
  it("tooth coil: (π/4)·(τ_u + w_t)", () => {
    // Hand-worked: τ_u 10 mm, w_t 6 mm: (π/4)·16 mm = 4π mm = 12.566371 mm
    // (GNU units "4*pi"; brief formula, Bianchi 2006).
    expectMatchesPrinted(
      endTurnLengthFromToothMm({ slotPitchMm: 10, toothWidthMm: 6 }),
      "12.566371",
    );
  });

  it("distributed coil adds τ_u·K_ov·(y − 1) with K_ov = 1.8", () => {
    // Hand-worked, y = 3: 12.566371 + 10 · 1.8 · 2 = 48.566371 mm (GNU units
    // "4*pi+36"; brief formula, Bianchi 2006).
    expectMatchesPrinted(
      endTurnLengthFromToothMm({
        slotPitchMm: 10,
        toothWidthMm: 6,
        coilThrowSlots: 3,
      }),
      "48.566371",
    );
    // A different overhang factor replaces 1.8: 12.566371 + 10 · 1.5 · 2 = 42.566371 mm.
    expectMatchesPrinted(
      endTurnLengthFromToothMm({
        slotPitchMm: 10,
        toothWidthMm: 6,
        coilThrowSlots: 3,
        overhangFactor: 1.5,
      }),
      "42.566371",
    );
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
    // Hand-worked: r 60 mm, Q 12 slots: 2π·60/12 = 10π = 31.415927 mm (GNU units "10*pi").
    expectMatchesPrinted(slotPitchMm(60, 12), "31.415927");
    expect(() => slotPitchMm(60, 0)).toThrow(EngineeringInputError);
    expect(() => slotPitchMm(60, 2.5)).toThrow(EngineeringInputError);
  });

  it("k_c = (π/2)·y distributed, 1.36 single-layer and 0.93 double-layer tooth coils", () => {
    // Brief (Magnussen and Sadarangani 2003).
    // (π/2) · 5 = 7.8539816 (GNU units "2.5*pi").
    expectMatchesPrinted(endTurnFactor("distributed", 5), "7.8539816");
    expect(endTurnFactor("single-layer-tooth-coil")).toBe(1.36);
    expect(endTurnFactor("double-layer-tooth-coil")).toBe(0.93);
  });

  it("l_end = k_c · τ_s", () => {
    // Hand-worked, r 60 mm, Q 12: τ_s = 10π = 31.415927 mm; double-layer tooth coil
    // 0.93 · 31.415927 = 29.216812 mm; single-layer 1.36 · 31.415927 = 42.725660 mm;
    // distributed y = 2: π · 10π = 98.696044 mm (GNU units "9.3*pi", "13.6*pi", "10*pi^2").
    expectMatchesPrinted(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "double-layer-tooth-coil",
      }),
      "29.216812",
    );
    expectMatchesPrinted(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "single-layer-tooth-coil",
      }),
      "42.725660",
    );
    expectMatchesPrinted(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 60,
        slotCount: 12,
        layout: "distributed",
        coilThrowSlots: 2,
      }),
      "98.696044",
    );
  });

  it("the distributed end turn is half a circle spanning y slot pitches", () => {
    // Hand-worked: 36 slots at r 80 mm, full pitch of a 4-pole winding y = 9 spans a
    // quarter of the circle, 2π·80/4 = 40π = 125.66 mm; half the circumference of a circle
    // of that diameter is π · 40π / 2 = 20π² = 197.39209 mm (GNU units "20*pi^2").
    expectMatchesPrinted(
      endTurnLengthFromSlotPitchMm({
        radiusMm: 80,
        slotCount: 36,
        layout: "distributed",
        coilThrowSlots: 9,
      }),
      "197.39209",
    );
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
