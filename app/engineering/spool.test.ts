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
    expect(
      massFromLengthKg(
        maxLengthFromMassM(net, linearMassKgPerM),
        linearMassKgPerM,
      ),
    ).toBeCloseTo(net, 12);
  });

  it("rejects a tare above the gross", () => {
    expect(() => spoolNetMassKg(0.5, 0.6)).toThrow(EngineeringInputError);
    expect(spoolNetMassKg(0.6, 0.6)).toBe(0);
  });
});
