import { describe, expect, it } from "vitest";
import {
  coolingPracticeFor,
  currentDensityAPerMm2,
  currentDensityPractice,
} from "./current-density";
import { expectWithinRelative } from "./printed-value.test-support";

describe("current density J = I / (strands × area)", () => {
  it("10 A in one 0.80 mm strand: 10 / 0.502655 = 19.894 A/mm² (hand-worked)", () => {
    // π/4 · 0.8² = 0.502655 mm².
    expectWithinRelative(currentDensityAPerMm2(10, 1, 0.502655), 19.8944, 1e-5);
  });

  it("two strands in hand share the current: half the density", () => {
    expectWithinRelative(currentDensityAPerMm2(10, 2, 0.502655), 9.9472, 1e-5);
  });

  it("judges against the common-practice ranges (from memory): 6 natural, 10 fan-cooled", () => {
    expect(currentDensityPractice).toEqual({
      naturalCoolingAPerMm2: 6,
      fanCooledAPerMm2: 10,
    });
    expect(coolingPracticeFor(5.9)).toBe("natural");
    expect(coolingPracticeFor(8)).toBe("fan");
    expect(coolingPracticeFor(19.9)).toBe("liquid-or-short-duty");
  });

  it("refuses a negative current and zero strands, naming the field", () => {
    expect(() => currentDensityAPerMm2(-1, 1, 1)).toThrowError(
      expect.objectContaining({ field: "currentA" }) as Error,
    );
    expect(() => currentDensityAPerMm2(1, 0, 1)).toThrowError(
      expect.objectContaining({ field: "strandsInHand" }) as Error,
    );
  });
});
