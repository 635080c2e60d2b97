import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import { assessWireSlotFill } from "./wire-slot-fill";

describe("slot fill of a catalogue wire size", () => {
  it("works the issue's case from the IEC table: 0.20 mm grade 2 cannot fit", () => {
    // IEC 60317-0-1 max overall 0.239 mm (brief); units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2)' → 0.99894342
    const fill = assessWireSlotFill({
      wire: { standard: "IEC", diameterMm: 0.2 },
      insulation: "grade2",
      turns: 668,
      coilSidesPerSlot: 2,
      slotAreaMm2: 60,
    });
    expect(fill.overallDiameterMm).toBe(0.239);
    expect(fill.overallDiameterIsEstimate).toBe(false);
    expect(fill.grossFill).toBeCloseTo(0.99894342, 7);
    expect(fill.fits).toBe(false);
    expect(fill.limit).toBeCloseTo(0.90689968, 8); // units -t 'pi/sqrt(12)'
    expect(fill.message).toContain("cannot fit");
  });

  it("assumes heavy build for AWG when no insulation is given, and says so", () => {
    // AWG 24 heavy: max overall 0.0227 in (NEMA MW 1000, brief); bare by ASTM B258.
    // units -t '100 * pi/4 * (0.0227 in)^2 / (50 mm^2)' → 0.52220259
    // units -t '100 * pi/4 * (0.127 mm * 92^((36-24)/39))^2 / (50 mm^2)' → 0.40946062
    const fill = assessWireSlotFill({
      wire: { standard: "AWG", size: "24" },
      turns: 100,
      slotAreaMm2: 50,
    });
    expect(fill.insulation).toBe("heavy");
    expect(fill.insulationAssumed).toBe(true);
    expect(fill.grossFill).toBeCloseTo(0.52220259, 6);
    expect(fill.copperFill).toBeCloseTo(0.40946062, 6);
    // Copper 0.41 is within the 0.45 random-wound practice (a copper fill), and 0.52 over
    // the enamel is below π/4: no limit passed; fits is judged against π/√12 = 0.9069.
    expect(fill.warning).toBeNull();
    expect(fill.limitPassed).toBeNull();
    expect(fill.limit).toBeCloseTo(0.90689968, 7);
    expect(fill.fits).toBe(true);
  });

  it("refuses an insulation of the other standard, naming it", () => {
    expect(() =>
      assessWireSlotFill({
        wire: { standard: "AWG", size: "24" },
        insulation: "grade2",
        turns: 10,
        slotAreaMm2: 50,
      }),
    ).toThrow(EngineeringInputError);
  });

  it("judges the random-wound practice on copper fill: 0.48 copper warns whatever the enamel", () => {
    // AWG 24 heavy, 118 turns in 50 mm²: copper fill 118/100 × 0.40946062 = 0.48316 (ASTM B258,
    // units -t '118 * pi/4 * (0.127 mm * 92^((36-24)/39))^2 / (50 mm^2)' → 0.48316353);
    // gross 118/100 × 0.52220259 = 0.61620 (NEMA MW 1000 0.0227 in), below π/4.
    const fill = assessWireSlotFill({
      wire: { standard: "AWG", size: "24" },
      turns: 118,
      slotAreaMm2: 50,
    });
    expect(fill.copperFill).toBeCloseTo(0.48316353, 6);
    expect(fill.warning?.code).toBe("above-random-round-wire-practice");
    expect(fill.limitPassed).toBe(0.45);
    expect(fill.fits).toBe(true);
  });
});
