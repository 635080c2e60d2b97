import { describe, expect, it } from "vitest";
import {
  HEXAGONAL_PACKING_FILL_LIMIT,
  SQUARE_PACKING_FILL_LIMIT,
  assessSlotFill,
  slotFillFactor,
  slotFillWarning,
} from "./slot-fill";

describe("slot fill factor k = N · strands · A_bare / A_slot (brief)", () => {
  it("counts every strand of every turn", () => {
    // 40 turns of 0.80 mm (0.16π mm²) in a 60 mm² slot: 40 · 0.16π / 60.
    const bareAreaMm2 = (Math.PI / 4) * 0.8 ** 2;
    expect(
      slotFillFactor({ turns: 40, bareAreaMm2, slotAreaMm2: 60 }),
    ).toBeCloseTo((40 * 0.16 * Math.PI) / 60, 12);
    expect(
      slotFillFactor({
        turns: 40,
        strandsInHand: 3,
        bareAreaMm2,
        slotAreaMm2: 60,
      }),
    ).toBeCloseTo((120 * 0.16 * Math.PI) / 60, 12);
  });

  it("names the geometric limits π/√12 = 0.9069 and π/4 = 0.785", () => {
    // Brief: hexagonal π/√12 = 0.9069, square π/4 = 0.785.
    expect(HEXAGONAL_PACKING_FILL_LIMIT).toBeCloseTo(0.9069, 4);
    expect(SQUARE_PACKING_FILL_LIMIT).toBeCloseTo(0.785, 3);
  });

  it("warns above 0.45 for random round wire, above π/4 and above π/√12", () => {
    // Common practice (brief): random-wound round wire 0.35–0.45.
    expect(slotFillWarning(0.4)).toBeNull();
    expect(slotFillWarning(0.45)).toBeNull();
    expect(slotFillWarning(0.46)?.code).toBe(
      "above-random-round-wire-practice",
    );
    expect(slotFillWarning(0.7)?.code).toBe("above-random-round-wire-practice");
    expect(slotFillWarning(0.79)?.code).toBe("above-square-packing-limit");
    expect(slotFillWarning(0.9)?.code).toBe("above-square-packing-limit");
    expect(slotFillWarning(0.91)?.code).toBe("above-hexagonal-packing-limit");
    expect(slotFillWarning(0.91)?.message).toContain("0.910");
  });

  it("returns the factor with its warning", () => {
    const bareAreaMm2 = (Math.PI / 4) * 1.0 ** 2;
    // 60 turns of 1.00 mm in 100 mm²: 60 · π/4 / 100 = 0.471.
    const result = assessSlotFill({ turns: 60, bareAreaMm2, slotAreaMm2: 100 });
    expect(result.fillFactor).toBeCloseTo((60 * Math.PI) / 400, 12);
    expect(result.fillWarning?.limit).toBe(0.45);
  });
});
