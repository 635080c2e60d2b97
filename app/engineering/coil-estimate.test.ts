import { describe, expect, it } from "vitest";
import {
  conductorSplit,
  estimateCoil,
  type CoilEstimateInput,
} from "./coil-estimate";
import { EngineeringInputError } from "./errors";
import { conductorForceN, torqueNm } from "./force-and-torque";
import { expectMatchesPrinted } from "./printed-value.test-support";
import { IEC_NOMINAL_DIAMETERS } from "./reference-data";
import type { WireSpec } from "./wire-geometry";

/** Brief, worked check 4: l_active 50 mm, l_end 30 mm, N 40, 0.80 mm copper, one strand. */
const CHECK_4_COIL: CoilEstimateInput = {
  conductor: "copper",
  wire: { standard: "IEC", diameterMm: 0.8 },
  turns: 40,
  activeLengthMm: 50,
  endTurnLengthMm: 30,
};

describe("worked check 4: a coil of 0.80 mm copper (brief)", () => {
  it("without leads: MLT 160 mm, 6.400 m, 0.21952 Ω, 28.60 g", () => {
    const result = estimateCoil(CHECK_4_COIL);
    expect(result.meanTurnLengthMm).toBe(160);
    expectMatchesPrinted(result.perCoil.conductorLengthM, "6.400");
    expectMatchesPrinted(result.perCoil.resistance20Ohm, "0.21952");
    expectMatchesPrinted(result.perCoil.woundMassKg * 1000, "28.60");
    expect(result.perCoil.resistanceOhm).toBe(result.perCoil.resistance20Ohm);
    expect(result.wire.bareDiameterMm).toBe(0.8);
    expect(result.wire.overallDiameterMm).toBeNull();
    expect(result.copperLossW).toBeNull();
  });

  it("with two 150 mm leads: 6.700 m, 0.22981 Ω, 29.94 g", () => {
    const result = estimateCoil({ ...CHECK_4_COIL, leadLengthMm: 150 });
    expectMatchesPrinted(result.perCoil.conductorLengthM, "6.700");
    expectMatchesPrinted(result.perCoil.resistance20Ohm, "0.22981");
    expectMatchesPrinted(result.perCoil.woundMassKg * 1000, "29.94");
  });

  it("with 3 % scrap: 6.901 m and 30.84 g drawn from stock, resistance unchanged", () => {
    const withLeads = estimateCoil({ ...CHECK_4_COIL, leadLengthMm: 150 });
    const withScrap = estimateCoil({
      ...CHECK_4_COIL,
      leadLengthMm: 150,
      scrapPercent: 3,
    });
    expectMatchesPrinted(withScrap.perCoil.purchasedLengthM, "6.901");
    expectMatchesPrinted(withScrap.perCoil.purchasedMassKg * 1000, "30.84");
    expectMatchesPrinted(withScrap.perCoil.resistance20Ohm, "0.22981");
    expect(withScrap.perCoil.resistance20Ohm).toBe(
      withLeads.perCoil.resistance20Ohm,
    );
    expect(withScrap.perCoil.conductorLengthM).toBe(
      withLeads.perCoil.conductorLengthM,
    );
    expect(withScrap.perCoil.woundMassKg).toBe(withLeads.perCoil.woundMassKg);
  });

  it("splits the turn into active share 50 / (50 + 30)", () => {
    expect(estimateCoil(CHECK_4_COIL).activeShare).toBeCloseTo(0.625, 15);
  });
});

describe("worked check 5: copper loss of that coil without leads at 10 A (brief)", () => {
  it("is 21.95 W at 20 °C and 30.58 W at 120 °C", () => {
    expectMatchesPrinted(
      estimateCoil({ ...CHECK_4_COIL, currentA: 10 }).copperLossW ?? NaN,
      "21.95",
    );
    expectMatchesPrinted(
      estimateCoil({ ...CHECK_4_COIL, currentA: 10, temperatureC: 120 })
        .copperLossW ?? NaN,
      "30.58",
    );
  });

  it("counts every coil and is zero at zero current", () => {
    // Hand-worked: 12 coils × 10² A² × 6.4 m / (58 S·m/mm² × π/4 × 0.8² mm²) = 263.43 W
    // (GNU units "1200*6.4/(58*pi/4*0.8^2)" → 263.42887).
    expectMatchesPrinted(
      estimateCoil({ ...CHECK_4_COIL, currentA: 10, coilCount: 12 })
        .copperLossW ?? NaN,
      "263.43",
    );
    expect(estimateCoil({ ...CHECK_4_COIL, currentA: 0 }).copperLossW).toBe(0);
  });
});

describe("worked check 8: force and torque from the active length (brief)", () => {
  it("0.45 N per 0.05 m conductor at 0.9 T and 10 A", () => {
    // Brief: F = B·I·L = 0.9 T · 10 A · 0.05 m = 0.45 N.
    expect(conductorForceN(0.9, 10, 0.05)).toBeCloseTo(0.45, 12);
  });

  it("48 such conductors at r = 30 mm: 0.648 N·m, from forceLengthM, whatever the end turns", () => {
    // 24 turns of a coil with 50 mm active sides: 2 × 24 = 48 active conductors of 0.05 m.
    for (const endTurnLengthMm of [0, 30, 300]) {
      const coil = estimateCoil({
        ...CHECK_4_COIL,
        turns: 24,
        endTurnLengthMm,
        leadLengthMm: 200,
      });
      // 48 conductors × 0.05 m = 2.4 m.
      expect(coil.perCoil.forceLengthM).toBeCloseTo(2.4, 12);
      const force = conductorForceN(0.9, 10, coil.perCoil.forceLengthM);
      expectMatchesPrinted(torqueNm(force, 0.03), "0.648");
    }
  });
});

describe("AWG wire and strands in hand", () => {
  it("uses the formula diameter and the published overall diameter", () => {
    const result = estimateCoil({
      ...CHECK_4_COIL,
      wire: { standard: "AWG", size: "18" },
      insulation: "heavy",
    });
    // ASTM B258 formula: AWG 18 = 1.0237 mm (brief); NEMA MW 1000 heavy 0.0437 in (brief).
    expect(Math.abs(result.wire.bareDiameterMm - 1.0237)).toBeLessThan(1e-4);
    // 0.0437 in = 1.10998 mm (GNU units "0.0437 in" → mm).
    expectMatchesPrinted(result.wire.overallDiameterMm ?? NaN, "1.10998");
    expect(result.wire.overallDiameterIsEstimate).toBe(false);
    // Brief AWG table: AWG 18 area 0.8230 mm² (GNU units → 0.82304683).
    expectMatchesPrinted(result.wire.areaMm2, "0.8230");
  });

  it("puts strands in parallel: twice the conductor, half the resistance, same force length", () => {
    const one = estimateCoil({ ...CHECK_4_COIL, leadLengthMm: 150 });
    const two = estimateCoil({
      ...CHECK_4_COIL,
      leadLengthMm: 150,
      strandsInHand: 2,
    });
    // Hand-worked from worked check 4 with leads (6.700 m, 0.22981 Ω, 29.94 g): two strands
    // wind 13.4 m, 0.11491 Ω between the leads (GNU units "6.7/(58*pi/4*0.8^2)/2"
    // → 0.11490712), 59.88 g (GNU units "2*6.7*8.89*pi/4*0.8^2" → 59.879259 g).
    expectMatchesPrinted(one.perCoil.resistance20Ohm, "0.22981");
    expect(two.perCoil.conductorLengthM).toBeCloseTo(13.4, 12);
    expectMatchesPrinted(two.perCoil.resistance20Ohm, "0.11491");
    expectMatchesPrinted(two.perCoil.woundMassKg * 1000, "59.88");
    // Contract: forceLengthM = 2 × turns × active length, not multiplied by strands.
    expect(two.perCoil.forceLengthM).toBe(one.perCoil.forceLengthM);
  });

  it("throws EngineeringInputError with the field for an unknown wire", () => {
    const fieldOf = (
      wire: WireSpec,
      insulation?: CoilEstimateInput["insulation"],
    ) => {
      try {
        estimateCoil({ ...CHECK_4_COIL, wire, insulation });
      } catch (error) {
        if (error instanceof EngineeringInputError) return error.field;
        throw error;
      }
      return undefined;
    };
    expect(fieldOf({ standard: "AWG", size: "50" })).toBe("wire.size");
    // IEC 60317-0-1 runs from 0.020 mm to 5.000 mm (brief): 6.3 mm is past it.
    expect(fieldOf({ standard: "IEC", diameterMm: 6.3 })).toBe(
      "wire.diameterMm",
    );
    expect(fieldOf({ standard: "IEC", diameterMm: 0.8 }, "triple")).toBe(
      "insulation",
    );
  });
});

/** mulberry32: a small seeded PRNG so the random cases are the same on every run. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A random coil with every optional field filled in. */
type RandomCoil = Required<
  Omit<
    CoilEstimateInput,
    | "insulation"
    | "currentA"
    | "frequencyHz"
    | "harmonics"
    | "layersPerCoil"
    | "thermal"
  >
> & { currentA: number };

function randomCoils(count: number, seed: number): RandomCoil[] {
  const random = seededRandom(seed);
  const between = (low: number, high: number) => low + (high - low) * random();
  const integer = (low: number, high: number) =>
    Math.floor(between(low, high + 1));
  const pick = <T>(items: readonly T[]): T => {
    const item = items[integer(0, items.length - 1)];
    if (item === undefined) throw new Error("empty list");
    return item;
  };
  return Array.from({ length: count }, () => ({
    conductor: pick(["copper", "aluminium"] as const),
    wire:
      random() < 0.5
        ? { standard: "AWG" as const, size: String(integer(0, 40)) }
        : {
            standard: "IEC" as const,
            diameterMm: pick(IEC_NOMINAL_DIAMETERS).diameterMm,
          },
    turns: integer(1, 400),
    strandsInHand: integer(1, 8),
    activeLengthMm: between(1, 400),
    endTurnLengthMm: between(0.5, 200),
    leadLengthMm: between(0, 500),
    coilCount: integer(1, 48),
    temperatureC: between(-40, 200),
    scrapPercent: between(0, 15),
    currentA: between(0, 50),
  }));
}

const relativeClose = (actual: number, expected: number, relative = 1e-12) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(
    relative * Math.abs(expected),
  );

describe("properties over 300 random coils (seeded)", () => {
  const coils = randomCoils(300, 20260517);

  it("doubling the end turns leaves forceLengthM unchanged while resistance and mass grow", () => {
    // Brief: end turns add length, mass and resistance but no force (common practice).
    for (const coil of coils) {
      const base = estimateCoil(coil);
      const longerEnds = estimateCoil({
        ...coil,
        endTurnLengthMm: 2 * coil.endTurnLengthMm,
      });
      expect(longerEnds.perCoil.forceLengthM).toBe(base.perCoil.forceLengthM);
      expect(longerEnds.total.forceLengthM).toBe(base.total.forceLengthM);
      expect(longerEnds.perCoil.resistanceOhm).toBeGreaterThan(
        base.perCoil.resistanceOhm,
      );
      expect(longerEnds.perCoil.resistance20Ohm).toBeGreaterThan(
        base.perCoil.resistance20Ohm,
      );
      expect(longerEnds.perCoil.woundMassKg).toBeGreaterThan(
        base.perCoil.woundMassKg,
      );
      expect(longerEnds.activeShare).toBeLessThan(base.activeShare);
    }
  });

  it("doubling the active length doubles forceLengthM", () => {
    // Brief: doubling a coil's active length doubles force and EMF (common practice).
    for (const coil of coils) {
      const base = estimateCoil(coil);
      const longer = estimateCoil({
        ...coil,
        activeLengthMm: 2 * coil.activeLengthMm,
      });
      relativeClose(longer.perCoil.forceLengthM, 2 * base.perCoil.forceLengthM);
    }
  });

  it("resistance is proportional to length and inversely proportional to strands", () => {
    // Brief: R = ρ(T) · (N · MLT + 2 · l_lead) / (strands · A).
    for (const coil of coils) {
      const base = estimateCoil(coil);
      const factor = 1 + 3 * Math.abs(Math.sin(coil.turns));
      const scaled = estimateCoil({
        ...coil,
        activeLengthMm: factor * coil.activeLengthMm,
        endTurnLengthMm: factor * coil.endTurnLengthMm,
        leadLengthMm: factor * coil.leadLengthMm,
      });
      relativeClose(
        scaled.perCoil.conductorLengthM,
        factor * base.perCoil.conductorLengthM,
        1e-9,
      );
      relativeClose(
        scaled.perCoil.resistanceOhm,
        factor * base.perCoil.resistanceOhm,
        1e-9,
      );

      const moreStrands = estimateCoil({
        ...coil,
        strandsInHand: coil.strandsInHand + 3,
      });
      relativeClose(
        moreStrands.perCoil.resistanceOhm * (coil.strandsInHand + 3),
        base.perCoil.resistanceOhm * coil.strandsInHand,
        1e-9,
      );
      // Resistance per metre of wound conductor, times strands², is ρ(T)/A for every coil of this wire.
      relativeClose(
        (moreStrands.perCoil.resistanceOhm /
          moreStrands.perCoil.conductorLengthM) *
          (coil.strandsInHand + 3) ** 2,
        (base.perCoil.resistanceOhm / base.perCoil.conductorLengthM) *
          coil.strandsInHand ** 2,
        1e-9,
      );
    }
  });

  it("every field of a hand-worked aluminium coil (replaces restating the contract's formulas)", () => {
    // Hand-worked. Aluminium 1350-O: ρ20 0.027899 Ω·mm²/m (ASTM B233), α20 0.00403 /K,
    // 2.703 g/cm³ (brief). IEC 1.000 mm (A = π/4 = 0.785398 mm²), 3 strands, N 25,
    // active 80 mm, end turn 40 mm, leads 100 mm, 6 coils, 100 °C, 5 % scrap, 12 A.
    const result = estimateCoil({
      conductor: "aluminium",
      wire: { standard: "IEC", diameterMm: 1 },
      turns: 25,
      strandsInHand: 3,
      activeLengthMm: 80,
      endTurnLengthMm: 40,
      leadLengthMm: 100,
      coilCount: 6,
      temperatureC: 100,
      scrapPercent: 5,
      currentA: 12,
    });
    // MLT = 2·80 + 2·40 = 240 mm; one strand (25·240 + 2·100) mm = 6.2 m; 3 strands 18.6 m.
    expect(result.meanTurnLengthMm).toBe(240);
    expect(result.perCoil.conductorLengthM).toBeCloseTo(18.6, 12);
    // Drawn from stock: 18.6 m × 1.05 = 19.53 m.
    expect(result.perCoil.purchasedLengthM).toBeCloseTo(19.53, 12);
    // 18.6 m × 2.703 g/cm³ × 0.785398 mm² = 39.4865 g; 19.53 m → 41.4608 g
    // (GNU units "18.6*2.703*pi/4/1000" → 0.039486521 kg).
    expectMatchesPrinted(result.perCoil.woundMassKg * 1000, "39.4865");
    expectMatchesPrinted(result.perCoil.purchasedMassKg * 1000, "41.4608");
    // R20 = 0.027899 × 6.2 / (3 × 0.785398) = 0.0734124 Ω (GNU units → 0.073412361);
    // at 100 °C × (1 + 0.00403 × 80) = 0.0970805 Ω (GNU units → 0.097080506).
    expectMatchesPrinted(result.perCoil.resistance20Ohm, "0.0734124");
    expectMatchesPrinted(result.perCoil.resistanceOhm, "0.0970805");
    // Force length 2 × 25 × 0.08 m = 4 m; active share 80 / 120.
    expect(result.perCoil.forceLengthM).toBeCloseTo(4, 12);
    expectMatchesPrinted(result.activeShare, "0.666667");
    // Six coils in series: 111.6 m, 0.440474 Ω at 20 °C, 24 m of force length.
    expect(result.total.conductorLengthM).toBeCloseTo(111.6, 12);
    expectMatchesPrinted(result.total.resistance20Ohm, "0.440474");
    expect(result.total.forceLengthM).toBeCloseTo(24, 12);
    // Loss 6 × 12² × 0.0970805 = 83.8776 W (GNU units → 83.877557).
    expectMatchesPrinted(result.copperLossW ?? NaN, "83.8776");
  });
});

describe("conductorSplit", () => {
  it("splits worked check 4 with leads into 4.0 m active, 2.4 m end turns, 0.3 m leads (brief, worked check 4)", () => {
    const input = {
      conductor: "copper" as const,
      wire: { standard: "IEC" as const, diameterMm: 0.8 },
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      leadLengthMm: 150,
      strandsInHand: 2,
    };
    const split = conductorSplit(input);
    // 2 strands × 40 turns × 2 sides × 50 mm = 8.0 m; × 30 mm = 4.8 m; 2 strands × 2 × 150 mm = 0.6 m.
    expect(split.activeM).toBeCloseTo(8.0, 12);
    expect(split.endTurnM).toBeCloseTo(4.8, 12);
    expect(split.leadM).toBeCloseTo(0.6, 12);
    // 8.0 + 4.8 + 0.6 = 13.4 m, what estimateCoil winds: 2 × (40 × 160 mm + 2 × 150 mm).
    expect(estimateCoil(input).perCoil.conductorLengthM).toBeCloseTo(13.4, 12);
  });
});
