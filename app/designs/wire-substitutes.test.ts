import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "~/engineering/errors";
import { checkFourCoil, WIRE_080 } from "./design-lines.test-support";
import {
  proposeWireSubstitutes,
  type StockedWire,
  type WireSubstituteQuery,
} from "./wire-substitutes";

/** An IEC copper wire item in stock, class 155. */
function stocked(
  itemId: number,
  diameterMm: number,
  overrides: Partial<StockedWire> = {},
): StockedWire {
  return {
    ...WIRE_080,
    itemId,
    sku: `CU-${diameterMm.toFixed(2)}`,
    name: `Copper ${diameterMm} mm`,
    size: { standard: "IEC", diameterMm },
    insulation: "grade2",
    onHandKg: 5,
    unitCost: 12_0000n,
    ...overrides,
  };
}

/** The brief's worked check 4 coil wound from 1.00 mm copper (item 1), one strand. */
const line = checkFourCoil({
  wire: { ...stocked(1, 1.0), sku: "CU-1.00" },
});

const query = (
  candidates: StockedWire[],
  more: Partial<WireSubstituteQuery> = {},
): WireSubstituteQuery => ({
  line,
  lineUnitCost: 12_0000n,
  ratedCurrentA: null,
  insulationClassC: 155,
  candidates,
  ...more,
});

describe("substitutes from stock for a coil line (issue 19)", () => {
  it("offers n strands whose copper area is within ±3 %, closest first", () => {
    // Against 1 × 1.00²: 4 × 0.50² = 1.0000 (0 %), 2 × 0.71² = 1.0082 (+0.82 %),
    // 3 × 0.56² = 0.9408 (−5.92 %, outside ±3 %) — worked by hand (units -t '2*0.71^2' → 1.0082).
    const found = proposeWireSubstitutes(
      query([stocked(2, 0.71), stocked(3, 0.5), stocked(4, 0.56)]),
    );
    expect(found.map((s) => [s.sku, s.strands])).toEqual([
      ["CU-0.50", 4],
      ["CU-0.71", 2],
    ]);
    expect(found[0]!.areaChangePercent).toBeCloseTo(0, 9);
    expect(found[1]!.areaChangePercent).toBeCloseTo(0.82, 9);
  });

  it("widens with the tolerance", () => {
    const found = proposeWireSubstitutes(
      query([stocked(4, 0.56)], { tolerance: 0.1 }),
    );
    expect(found.map((s) => [s.sku, s.strands])).toEqual([["CU-0.56", 3]]);
    expect(found[0]!.areaChangePercent).toBeCloseTo(-5.92, 9);
  });

  it("gives the change in resistance, mass and cost per motor", () => {
    const [twoOf071] = proposeWireSubstitutes(
      query([stocked(2, 0.71, { unitCost: 13_5000n })]),
    );
    // R ∝ 1/area: units -t '1/(2*0.71^2)' → 0.99186669, so −0.8133 %.
    expect(twoOf071!.resistanceChangePercent).toBeCloseTo(-0.813331, 5);
    // Masses of 6.400 m (worked check 4) of copper at 8.89 g/cm³ (brief; worked check 3
    // gives 698.2 g per 100 m of 1.00 mm): units -t '6.4 m * pi/4 * (1 mm)^2 * 8.89 g/cm^3' g
    // → 44.686014; with 2 × 0.71 mm → 45.052439.
    expect(twoOf071!.massChangeKg * 1000).toBeCloseTo(45.052439 - 44.686014, 5);
    // Cost at moving average cost: 0.0446860 kg × 12.0000 = 0.5362; 0.0450524 kg × 13.5000
    // = 0.6082 (each rounded to 0.0001 as the design costing does) → +0.0720 per motor.
    expect(twoOf071!.costPerMotorChange).toBe(0.072);
    expect(twoOf071!.onHandKg).toBe(5);
  });

  it("gives the change of copper loss at the rated current", () => {
    // 10 A, worked check 5: 21.95 W at 20 °C for the 0.80 mm coil; here for 1.00 mm the loss
    // scales with R: 0.99186669 × P − P.
    const [sub] = proposeWireSubstitutes(
      query([stocked(2, 0.71)], { ratedCurrentA: 10 }),
    );
    // P(1.00 mm) = 10² × 0.0172414 Ω·mm²/m × 6.4 m / (π/4 mm²) (IEC 60028 ρ20):
    // units -t '100 * 0.0172414 * 6.4 / (pi/4)' → 14.049557 W
    expect(sub!.copperLossChangeW).toBeCloseTo(14.049557 * (0.99186669 - 1), 4);
  });

  it("leaves out other conductors, empty stock, a lower thermal class and the line itself", () => {
    const found = proposeWireSubstitutes(
      query([
        stocked(5, 0.5, { conductor: "aluminium" }),
        stocked(6, 0.5, { onHandKg: 0 }),
        stocked(7, 0.5, { thermalClassC: 130 }),
        { ...line.wire, name: "itself", onHandKg: 3, unitCost: null },
      ]),
    );
    expect(found).toEqual([]);
  });

  it("drops a substitute that passes a more serious fill limit over its enamel", () => {
    // Slot 100 mm², 2 coil sides. 1.00 mm grade 2 (max overall 1.093 mm, IEC 60317-0-1, from
    // memory in the brief): units -t '80 * pi/4 * (1.093 mm)^2 / (100 mm^2)' → 0.7506 (above 0.45
    // only). 4 × 0.50 mm grade 2 (0.566 mm, IEC 60317-0-1): '320 * pi/4 * (0.566 mm)^2 /
    // (100 mm^2)' → 0.8051, above π/4 — same copper, but it does not fit as well.
    const slotted = { ...line, slot: { areaMm2: 100, coilSidesPerSlot: 2 } };
    const found = proposeWireSubstitutes(
      query([stocked(3, 0.5)], { line: slotted }),
    );
    expect(found).toEqual([]);
    const unslotted = proposeWireSubstitutes(query([stocked(3, 0.5)]));
    expect(unslotted).toHaveLength(1);
    expect(unslotted[0]!.grossFill).toBeNull();
  });

  it("leaves out, in a slot, a wire whose overall diameter is unknown", () => {
    // AWG 30 (bare 0.2546 mm, ASTM B258): 15 strands are −2.74 % of 1.00 mm (by hand:
    // 15 × 0.2546² = 0.9723); no NEMA row or estimate for its build, so no gross fill.
    const awg30: StockedWire = {
      ...stocked(8, 0.25),
      sku: "CU-AWG30",
      size: { standard: "AWG", size: "30" },
      insulation: "heavy",
    };
    const slotted = { ...line, slot: { areaMm2: 200, coilSidesPerSlot: 2 } };
    expect(proposeWireSubstitutes(query([awg30], { line: slotted }))).toEqual(
      [],
    );
    const [free] = proposeWireSubstitutes(query([awg30]));
    expect(free?.strands).toBe(15);
    expect(free?.areaChangePercent).toBeCloseTo(-2.74, 1);
  });

  it("refuses a tolerance outside 0–25 %, a NaN class or a negative current, naming each", () => {
    const fieldOf = (more: Partial<WireSubstituteQuery>) => {
      try {
        proposeWireSubstitutes(query([], more));
      } catch (error) {
        expect(error).toBeInstanceOf(EngineeringInputError);
        return (error as EngineeringInputError).field;
      }
      return null;
    };
    for (const tolerance of [-0.01, 0.5, Number.NaN])
      expect(fieldOf({ tolerance })).toBe("tolerance");
    expect(fieldOf({ insulationClassC: Number.NaN })).toBe("insulationClassC");
    expect(fieldOf({ ratedCurrentA: -1 })).toBe("ratedCurrentA");
    expect(fieldOf({ line: { ...line, strandsInHand: 0 } })).toBe(
      "strandsInHand",
    );
  });
});
