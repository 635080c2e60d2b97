import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import { expectMatchesPrinted } from "./printed-value.test-support";
import { massFromLengthKg, maxLengthFromMassM, spoolNetMassKg } from "./spool";
import { wireProperties } from "./wire-geometry";

describe("spool weigh-back", () => {
  it("worked check 6: gross 5.40 kg, tare 0.60 kg of 0.50 mm copper: net 4.80 kg, at most 2749.9 m", () => {
    // Brief, worked check 6.
    const net = spoolNetMassKg(5.4, 0.6);
    expectMatchesPrinted(net, "4.80");
    const { linearMassKgPerM } = wireProperties({
      conductor: "copper",
      wire: { standard: "IEC", diameterMm: 0.5 },
    });
    expectMatchesPrinted(maxLengthFromMassM(net, linearMassKgPerM), "2749.9");
    // Hand-worked: 100 m × 8.89 g/cm³ × π/4 × 0.25 mm² = 174.555 g
    // (GNU units "100*8.89*pi/4*0.5^2" → 174.55474).
    expectMatchesPrinted(
      massFromLengthKg(100, linearMassKgPerM) * 1000,
      "174.555",
    );
  });

  it("rejects a tare above the gross", () => {
    expect(() => spoolNetMassKg(0.5, 0.6)).toThrow(EngineeringInputError);
    expect(spoolNetMassKg(0.6, 0.6)).toBe(0);
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

  it("names the field of a negative, NaN or infinite quantity", () => {
    expect(fieldOf(() => spoolNetMassKg(-5.4, 0.6))).toBe("grossKg");
    expect(fieldOf(() => spoolNetMassKg(5.4, Number.NaN))).toBe("tareKg");
    expect(fieldOf(() => maxLengthFromMassM(-1, 0.0017))).toBe("netMassKg");
    expect(fieldOf(() => maxLengthFromMassM(1, 0))).toBe("linearMassKgPerM");
    // Before the fix: −10 m gave a negative mass.
    expect(fieldOf(() => massFromLengthKg(-10, 0.0017))).toBe("lengthM");
    expect(
      fieldOf(() => massFromLengthKg(Number.POSITIVE_INFINITY, 0.0017)),
    ).toBe("lengthM");
    expect(fieldOf(() => massFromLengthKg(10, -0.0017))).toBe(
      "linearMassKgPerM",
    );
  });
});
