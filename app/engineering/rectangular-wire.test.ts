import { describe, expect, it } from "vitest";
import { expectWithinRelative } from "./printed-value.test-support";
import {
  nominalCornerRadiusMm,
  rectangularAreaMm2,
  rectangularPerMetre,
  rectangularSlotFill,
  rectangularWire,
} from "./rectangular-wire";

describe("IEC 60317-0-2 corner radius by thickness (from memory)", () => {
  it("is half the thickness up to 1.00 mm, then 0.50, 0.65, 0.80, 1.00 mm", () => {
    expect(nominalCornerRadiusMm(0.8)).toBeCloseTo(0.4, 12);
    expect(nominalCornerRadiusMm(1.0)).toBeCloseTo(0.5, 12);
    expect(nominalCornerRadiusMm(1.25)).toBe(0.5);
    expect(nominalCornerRadiusMm(1.6)).toBe(0.5);
    expect(nominalCornerRadiusMm(2.0)).toBe(0.65);
    expect(nominalCornerRadiusMm(2.24)).toBe(0.65);
    expect(nominalCornerRadiusMm(3.15)).toBe(0.8);
    expect(nominalCornerRadiusMm(4.0)).toBe(1.0);
  });

  it("refuses thicknesses outside 0.80–5.60 mm, naming wire.thicknessMm", () => {
    for (const thickness of [0.5, 6, Number.NaN, -1]) {
      expect(() => nominalCornerRadiusMm(thickness)).toThrowError(
        expect.objectContaining({ field: "wire.thicknessMm" }) as Error,
      );
    }
  });
});

describe("conductor area A = a·b − (4 − π)·r²", () => {
  it("1.00 × 5.00 mm: 4.7854 mm², the maker's formula S = a·b − 0.2146·a² for r = a/2", () => {
    // Published section formula of a flat-wire maker (rvyuan.com "formula" page):
    // S = T·B − 0.2146·T² = 5.00 − 0.2146 = 4.7854 mm².
    const wire = rectangularWire({
      standard: "rectangular",
      thicknessMm: 1,
      widthMm: 5,
    });
    expectWithinRelative(wire.areaMm2, 4.7854, 1e-5);
  });

  it("0.80 × 4.00 mm: 3.2 − 0.2146 · 0.64 = 3.06266 mm² by the same published formula", () => {
    const wire = rectangularWire({
      standard: "rectangular",
      thicknessMm: 0.8,
      widthMm: 4,
    });
    expectWithinRelative(wire.areaMm2, 3.2 - 0.2146 * 0.64, 2e-5);
  });

  it("2.00 × 8.00 mm, r 0.65 mm: 15.637323 mm²; 4.00 × 10.00 mm, r 1.00 mm: 39.141593 mm²", () => {
    // GNU units: units -t '2*8-(4-pi)*0.65^2' → 15.637323; '4*10-(4-pi)*1^2' → 39.141593.
    expectWithinRelative(
      rectangularWire({ standard: "rectangular", thicknessMm: 2, widthMm: 8 })
        .areaMm2,
      15.637323,
      1e-7,
    );
    expectWithinRelative(
      rectangularWire({ standard: "rectangular", thicknessMm: 4, widthMm: 10 })
        .areaMm2,
      39.141593,
      1e-7,
    );
  });

  it("a sharp-cornered bar (r = 0) is a·b", () => {
    expect(rectangularAreaMm2(2, 8, 0)).toBe(16);
  });

  it("refuses a radius over half the thickness, a width out of range and a 10:1 strip", () => {
    expect(() => rectangularAreaMm2(2, 8, 1.2)).toThrowError(
      expect.objectContaining({ field: "wire.cornerRadiusMm" }) as Error,
    );
    expect(() =>
      rectangularWire({ standard: "rectangular", thicknessMm: 2, widthMm: 20 }),
    ).toThrowError(expect.objectContaining({ field: "wire.widthMm" }) as Error);
    expect(() =>
      rectangularWire({ standard: "rectangular", thicknessMm: 1, widthMm: 10 }),
    ).toThrowError(expect.objectContaining({ field: "wire.widthMm" }) as Error);
  });
});

describe("overall size, mass, resistance and fill", () => {
  const wire = rectangularWire(
    { standard: "rectangular", thicknessMm: 2, widthMm: 8 },
    "grade2",
  );

  it("grade 2 adds at most 0.19 mm to each side (IEC 60317-0-2, from memory): 2.19 × 8.19 mm", () => {
    expect(wire.overallThicknessMm).toBeCloseTo(2.19, 12);
    expect(wire.overallWidthMm).toBeCloseTo(8.19, 12);
  });

  it("refuses grade 3 and AWG builds for flat wire, naming insulation", () => {
    expect(() =>
      rectangularWire(
        { standard: "rectangular", thicknessMm: 2, widthMm: 8 },
        "grade3",
      ),
    ).toThrowError(expect.objectContaining({ field: "insulation" }) as Error);
  });

  it("copper 2.00 × 8.00 mm: 1.10258 mΩ/m and 139.016 g/m at 20 °C (GNU units)", () => {
    // units -t '(1|58)/(2*8-(4-pi)*0.65^2)' → 0.0011025787 Ω/m (IEC 60028 copper);
    // units -t '8.89*(2*8-(4-pi)*0.65^2)/1000' → 0.1390158 kg/m (8.89 g/cm³).
    const perMetre = rectangularPerMetre("copper", wire.areaMm2);
    expectWithinRelative(perMetre.resistancePerMetreOhm, 0.0011025787, 1e-7);
    expectWithinRelative(perMetre.linearMassKgPerM, 0.1390158, 1e-6);
  });

  it("20 conductors in a 400 mm² slot with 20 mm² of liner: copper 0.8230, gross 0.9440, fits", () => {
    // units -t '20*(2*8-(4-pi)*0.65^2)/380' → 0.82301699; '20*2.19*8.19/380' → 0.94400526.
    const fill = rectangularSlotFill({
      wire,
      conductorsInSlot: 20,
      slotAreaMm2: 400,
      linerAreaMm2: 20,
    });
    expectWithinRelative(fill.copperFill, 0.82301699, 1e-7);
    expectWithinRelative(fill.grossFill!, 0.94400526, 1e-7);
    expect(fill.fits).toBe(true);
  });

  it("refuses a liner that fills the slot, naming linerAreaMm2", () => {
    expect(() =>
      rectangularSlotFill({
        wire,
        conductorsInSlot: 2,
        slotAreaMm2: 50,
        linerAreaMm2: 50,
      }),
    ).toThrowError(expect.objectContaining({ field: "linerAreaMm2" }) as Error);
  });
});
