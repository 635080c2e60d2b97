import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import { conductorForceN, torqueNm } from "./force-and-torque";
import { expectMatchesPrinted } from "./printed-value.test-support";

function fieldOf(calculate: () => unknown): string | undefined {
  try {
    calculate();
  } catch (error) {
    if (error instanceof EngineeringInputError) return error.field;
    throw error;
  }
  return undefined;
}

describe("worked check 8 of the engineering brief", () => {
  it("0.9 T, 10 A, 0.05 m: 0.45 N per conductor; 48 of them at 30 mm: 0.648 N·m", () => {
    // GNU units: units -t '0.9 T * 10 A * 0.05 m' N → 0.45;
    // units -t '48 * 0.45 N * 30 mm' 'N*m' → 0.648.
    expectMatchesPrinted(conductorForceN(0.9, 10, 0.05), "0.45");
    expectMatchesPrinted(torqueNm(48 * 0.45, 0.03), "0.648");
  });
});

describe("refusals name the input", () => {
  it("negative, NaN and infinite magnitudes", () => {
    expect(fieldOf(() => conductorForceN(-0.9, 10, 0.05))).toBe("fluxDensityT");
    expect(fieldOf(() => conductorForceN(0.9, Number.NaN, 0.05))).toBe(
      "currentA",
    );
    expect(fieldOf(() => conductorForceN(0.9, 10, -1))).toBe("activeLengthM");
    expect(fieldOf(() => torqueNm(Number.POSITIVE_INFINITY, 0.03))).toBe(
      "forceN",
    );
    expect(fieldOf(() => torqueNm(1, -0.03))).toBe("radiusM");
  });
});
