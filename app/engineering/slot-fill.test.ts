import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import {
  COPPER_BASIS_NOTE,
  HEXAGONAL_PACKING_FILL_LIMIT,
  SQUARE_PACKING_FILL_LIMIT,
  assessSlotFill,
  slotFillMessage,
  slotFillWarning,
  type SlotFillInput,
} from "./slot-fill";

/**
 * Issue 19's case: IEC 0.20 mm grade 2, 668 turns × 2 coil sides in a 60 mm² slot.
 * Maximum overall diameter 0.239 mm (IEC 60317-0-1, brief's table: agrees across two
 * transcriptions of the standard).
 *
 * Worked by hand: conductors = 668 × 2 = 1336.
 *   bare:  π/4 × 0.200² = 0.031416 mm²; × 1336 = 41.972 mm²; ÷ 60 = 0.6995
 *   gross: π/4 × 0.239² = 0.044863 mm²; × 1336 = 59.937 mm²; ÷ 60 = 0.9989
 * GNU units: units -t '1336 * pi/4 * (0.2 mm)^2 / (60 mm^2)'   → 0.69952796
 *            units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2)' → 0.99894342
 *            units -t 'pi/sqrt(12)'                            → 0.90689968
 */
const issueCase: SlotFillInput = {
  turns: 668,
  coilSidesPerSlot: 2,
  strands: 1,
  bareDiameterMm: 0.2,
  overallDiameterMm: 0.239,
  slotAreaMm2: 60,
};

describe("slot fill judged over the enamel (issue 19, fix 1)", () => {
  it("finds the issue's winding cannot fit: copper 0.700, gross 0.999 > π/√12", () => {
    const fill = assessSlotFill(issueCase);
    expect(fill.copperFill).toBeCloseTo(0.69952796, 7); // GNU units, above
    expect(fill.grossFill).toBeCloseTo(0.99894342, 7); // GNU units, above
    expect(fill.judgedOn).toBe("gross");
    expect(fill.fits).toBe(false);
    expect(fill.warning?.code).toBe("above-hexagonal-packing-limit");
    expect(fill.warning?.message).toContain("0.999");
    expect(slotFillMessage(fill)).toContain("cannot fit");
  });

  it("subtracts the liner and separator area from the slot for gross fill only", () => {
    // 6 mm² of liner: units -t '1336 * pi/4 * (0.239 mm)^2 / (60 mm^2 - 6 mm^2)' → 1.1099371
    const fill = assessSlotFill({ ...issueCase, linerAreaMm2: 6 });
    expect(fill.grossFill).toBeCloseTo(1.1099371, 6);
    expect(fill.copperFill).toBeCloseTo(0.69952796, 7);
    expect(fill.wireAreaMm2).toBe(54);
  });

  it("counts every strand in hand like a turn", () => {
    // 334 turns × 2 strands is the same copper as 668 turns × 1 (worked by hand).
    const fill = assessSlotFill({ ...issueCase, turns: 334, strands: 2 });
    expect(fill.grossFill).toBeCloseTo(0.99894342, 7);
  });

  it("judges on copper fill with a note when the overall diameter is unknown", () => {
    const fill = assessSlotFill({ ...issueCase, overallDiameterMm: null });
    expect(fill.grossFill).toBeNull();
    expect(fill.judgedOn).toBe("copper");
    expect(fill.note).toBe(COPPER_BASIS_NOTE);
    expect(fill.note).toContain("understates");
    // 0.700 passes only the random-wound practice on copper; it still fits geometrically.
    expect(fill.warning?.code).toBe("above-random-round-wire-practice");
    expect(fill.warning?.message).toMatch(/^Copper fill 0\.700/);
    expect(fill.fits).toBe(true);
  });

  it("stays quiet for a slot a random winding fills comfortably", () => {
    // 100 turns × 2 sides of 0.50 mm grade 2 (max overall 0.566 mm, IEC 60317-0-1) in 150 mm²:
    // units -t '200 * pi/4 * (0.566 mm)^2 / (150 mm^2)' → 0.33547602
    const fill = assessSlotFill({
      turns: 100,
      coilSidesPerSlot: 2,
      bareDiameterMm: 0.5,
      overallDiameterMm: 0.566,
      slotAreaMm2: 150,
    });
    expect(fill.grossFill).toBeCloseTo(0.33547602, 7);
    expect(fill.warning).toBeNull();
    expect(fill.fits).toBe(true);
  });
});

describe("the limits (brief: π/√12 = 0.9069 hexagonal, π/4 = 0.785 square; 0.45 random-wound, common practice)", () => {
  it("are the published values", () => {
    // units -t 'pi/sqrt(12)' → 0.90689968; units -t 'pi/4' → 0.78539816
    expect(HEXAGONAL_PACKING_FILL_LIMIT).toBeCloseTo(0.90689968, 8);
    expect(SQUARE_PACKING_FILL_LIMIT).toBeCloseTo(0.78539816, 8);
  });

  it("warn from the least to the most serious", () => {
    expect(slotFillWarning(0.45)).toBeNull();
    expect(slotFillWarning(0.46)?.code).toBe(
      "above-random-round-wire-practice",
    );
    expect(slotFillWarning(0.785)?.code).toBe(
      "above-random-round-wire-practice",
    );
    expect(slotFillWarning(0.79)?.code).toBe("above-square-packing-limit");
    expect(slotFillWarning(0.906)?.code).toBe("above-square-packing-limit");
    expect(slotFillWarning(0.91)?.code).toBe("above-hexagonal-packing-limit");
  });
});

describe("refuses input no slot can have, naming the field", () => {
  const refusals: [string, Partial<SlotFillInput>][] = [
    ["turns", { turns: 0 }],
    ["turns", { turns: -5 }],
    ["turns", { turns: 2.5 }],
    ["turns", { turns: Number.NaN }],
    ["strands", { strands: 0 }],
    ["coilSidesPerSlot", { coilSidesPerSlot: 0 }],
    ["bareDiameterMm", { bareDiameterMm: 0 }],
    ["slotAreaMm2", { slotAreaMm2: 0 }],
    ["slotAreaMm2", { slotAreaMm2: Number.POSITIVE_INFINITY }],
    ["linerAreaMm2", { linerAreaMm2: -1 }],
    ["linerAreaMm2", { linerAreaMm2: 60 }],
    ["linerAreaMm2", { linerAreaMm2: Number.NaN }],
    ["overallDiameterMm", { overallDiameterMm: 0.19 }],
    ["overallDiameterMm", { overallDiameterMm: Number.NaN }],
  ];
  it.each(refusals)("%s: %o", (field, change) => {
    let thrown: unknown;
    try {
      assessSlotFill({ ...issueCase, ...change });
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(EngineeringInputError);
    expect((thrown as EngineeringInputError).field).toBe(field);
  });
});
