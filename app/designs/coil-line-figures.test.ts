import { describe, expect, it } from "vitest";
import { expectMatchesPrinted } from "~/engineering/printed-value.test-support";
import { formatExactDecimal, type ExactDecimal } from "~/pricing/money";
import { coilLineFigures, type CoilLineFigures } from "./coil-line-figures";
import {
  checkFourCoil,
  fieldOfError,
  seededRandom,
  WIRE_080,
} from "./design-lines.test-support";

const kgText = (value: ExactDecimal) => formatExactDecimal(value);

function splitSumDigits(figures: CoilLineFigures): bigint {
  const split = figures.drawnMassSplit;
  return (
    split.activeKg.digits +
    split.endTurnKg.digits +
    split.leadsAndScrapKg.digits
  );
}

describe("worked check 4 of the engineering brief, as a design coil line", () => {
  // Brief, worked check 4: with two 150 mm leads 6.700 m, 0.22981 Ω, 29.94 g; with 3 % scrap
  // 6.901 m and 30.84 g drawn from stock, resistance unchanged.
  const withLeadsAndScrap = checkFourCoil({
    leadLengthMm: 150,
    scrapPercent: 3,
  });

  it("copper length 6.700 m, drawn 6.901 m and 30.84 g (bare), MLT 160 mm, active share 0.625", () => {
    const figures = coilLineFigures(withLeadsAndScrap);
    expectMatchesPrinted(figures.copperLengthM, "6.700");
    expectMatchesPrinted(figures.drawnLengthM, "6.901");
    expectMatchesPrinted(figures.drawnMassKg * 1000, "30.84");
    expect(figures.massBasis).toBe("bare");
    expect(figures.meanTurnLengthMm).toBe(160);
    // active ÷ (active + end turn) = 50 ÷ 80 (brief).
    expect(figures.activeShare).toBeCloseTo(0.625, 15);
    expect(figures.bareDiameterMm).toBe(0.8);
  });

  it("resistance 0.22981 Ω at 20 °C, scrap excluded (brief)", () => {
    const figures = coilLineFigures(withLeadsAndScrap);
    expectMatchesPrinted(figures.resistance20PerCoilOhm, "0.22981");
    expect(figures.resistancePerCoilOhm).toBe(figures.resistance20PerCoilOhm);
    expect(
      coilLineFigures(checkFourCoil({ leadLengthMm: 150 }))
        .resistance20PerCoilOhm,
    ).toBe(figures.resistance20PerCoilOhm);
  });

  it("splits the drawn 30.84 g into active, end-turn and leads + scrap that add up exactly", () => {
    // Bare copper 0.80 mm: π/4 · 0.64 mm² · 8.89 g/cm³ = 4.468601 g/m. GNU units:
    //   units -t '4 m * pi/4 * (0.8 mm)^2 * 8.89 g/cm^3' g               → 17.874406 (active 4.000 m)
    //   units -t '2.4 m * pi/4 * (0.8 mm)^2 * 8.89 g/cm^3' g             → 10.724643 (end turns 2.400 m)
    //   units -t '(0.3 m + 0.03*6.7 m) * pi/4 * (0.8 mm)^2 * 8.89 g/cm^3' g → 2.2387693 (leads 0.300 m + scrap 0.201 m)
    //   units -t '1.03*6.7 m * pi/4 * (0.8 mm)^2 * 8.89 g/cm^3' g        → 30.837818 (drawn)
    // To 0.1 mg: 0.0308378 kg = 0.0178744 + 0.0107246 + 0.0022388 (the leftover 0.1 mg goes to
    // the largest remainder, 2.23877 g).
    const figures = coilLineFigures(withLeadsAndScrap);
    expect(kgText(figures.drawnMass)).toBe("0.0308378");
    expect(kgText(figures.drawnMassSplit.activeKg)).toBe("0.0178744");
    expect(kgText(figures.drawnMassSplit.endTurnKg)).toBe("0.0107246");
    expect(kgText(figures.drawnMassSplit.leadsAndScrapKg)).toBe("0.0022388");
    expect(splitSumDigits(figures)).toBe(figures.drawnMass.digits);
  });

  it("without leads or scrap, leads + scrap is exactly zero and active : end turn is 50 : 30", () => {
    // 6.4 m · 4.468601 g/m = 28.59905 g → 0.0285990 kg (brief: 28.60 g); 0.625 of it is
    // 178743.75 and 0.375 is 107246.25 tenths of a milligram: the spare one goes to active.
    const figures = coilLineFigures(checkFourCoil());
    expectMatchesPrinted(figures.drawnMassKg * 1000, "28.60");
    expect(kgText(figures.drawnMassSplit.activeKg)).toBe("0.0178744");
    expect(kgText(figures.drawnMassSplit.endTurnKg)).toBe("0.0107246");
    expect(figures.drawnMassSplit.leadsAndScrapKg.digits).toBe(0n);
    expect(splitSumDigits(figures)).toBe(figures.drawnMass.digits);
  });

  it("uses the enamelled mass when the wire's linear mass is known (worked by hand)", () => {
    // 6.901 m drawn × 4.6 g/m enamelled (a supplier's figure, invented for the test):
    //   units -t '6.901 m * 4.6 g/m' g → 31.7446
    const figures = coilLineFigures({
      ...withLeadsAndScrap,
      wire: { ...WIRE_080, enamelledLinearMassKgPerM: 0.0046 },
    });
    expect(figures.massBasis).toBe("enamelled");
    expect(kgText(figures.drawnMass)).toBe("0.0317446");
    expect(splitSumDigits(figures)).toBe(figures.drawnMass.digits);
  });
});

describe("worked check 5 of the engineering brief: copper loss at 10 A", () => {
  it("21.95 W at 20 °C and 30.58 W at 120 °C for the coil without leads", () => {
    expectMatchesPrinted(
      coilLineFigures(checkFourCoil(), 10).copperLossW ?? NaN,
      "21.95",
    );
    const hot = coilLineFigures(
      checkFourCoil({ operatingTemperatureC: 120 }),
      10,
    );
    expectMatchesPrinted(hot.copperLossW ?? NaN, "30.58");
    expect(hot.operatingTemperatureC).toBe(120);
  });

  it("is I²R per coil times the coils per motor, and null without a current", () => {
    const six = coilLineFigures(checkFourCoil({ coilsPerMotor: 6 }), 10);
    // 6 × 21.95 W = 131.7 W (brief, worked check 5, times six coils).
    expectMatchesPrinted((six.copperLossW ?? NaN) / 6, "21.95");
    // Hand-worked: 6 × (10 A)² × 6.4 m / (58 S·m/mm² × π/4 × 0.64 mm²) = 131.71 W
    // (GNU units "600*6.4/(58*pi/4*0.8^2)" → 131.71444).
    expectMatchesPrinted(six.copperLossW ?? NaN, "131.71");
    expect(coilLineFigures(checkFourCoil()).copperLossW).toBeNull();
  });
});

describe("current density and AC figures at the electrical frequency", () => {
  it("19.89 A/mm² at 10 A in 0.80 mm wire; skin depth 9.346 mm at 50 Hz and 4.169 mm at 350 Hz, 120 °C", () => {
    // GNU units: '10/(pi/4*0.64)' → 19.894368 A/mm².
    const cold = coilLineFigures(checkFourCoil(), 10, 50);
    expectMatchesPrinted(cold.currentDensityAPerMm2 ?? NaN, "19.89");
    // Copper 1/58 Ω·mm²/m (IEC 60028): 'sqrt(1.7241e-8 ohm m/(pi*50 Hz*mu0))' mm → 9.3457973.
    expectMatchesPrinted(cold.skinDepthMm ?? NaN, "9.346");
    // 0.80 mm wire is a tenth of the skin depth: one layer's AC ÷ DC is 1 to four places
    // (Dowell's low-frequency series 1 + Δ⁴/45 for one layer).
    expectMatchesPrinted(cold.acResistanceRatio ?? NaN, "1.0000");
    // At 120 °C ρ rises by 1 + 0.00393 × 100 (IEC 60028):
    // 'sqrt(1.7241e-8 ohm m*(1+0.00393*100)/(pi*350 Hz*mu0))' mm → 4.1691056.
    const hot = coilLineFigures(
      checkFourCoil({ operatingTemperatureC: 120 }),
      10,
      350,
    );
    expectMatchesPrinted(hot.skinDepthMm ?? NaN, "4.169");
  });

  it("gives no AC figures without a frequency, and no current density without a current", () => {
    const figures = coilLineFigures(checkFourCoil());
    expect(figures.currentDensityAPerMm2).toBeNull();
    expect(figures.skinDepthMm).toBeNull();
    expect(figures.acResistanceRatio).toBeNull();
  });
});

describe("scaling with coils and strands", () => {
  it("coils per motor multiply length and mass, not the resistance of one coil", () => {
    const one = coilLineFigures(checkFourCoil({ leadLengthMm: 150 }));
    const four = coilLineFigures(
      checkFourCoil({ leadLengthMm: 150, coilsPerMotor: 4 }),
    );
    // Hand-worked from worked check 4 with leads (6.700 m, 29.94 g, 0.22981 Ω per coil):
    // four coils 26.8 m and 119.76 g (GNU units "4*6.7*8.89*pi/4*0.8^2" → 119.75852 g),
    // force length 4 × 2 × 40 × 0.05 m = 16 m; one coil's resistance stays 0.22981 Ω.
    expect(four.copperLengthM).toBeCloseTo(26.8, 12);
    expectMatchesPrinted(four.drawnMassKg * 1000, "119.76");
    expectMatchesPrinted(four.resistance20PerCoilOhm, "0.22981");
    expect(four.resistance20PerCoilOhm).toBe(one.resistance20PerCoilOhm);
    expect(four.forceLengthM).toBeCloseTo(16, 12);
  });

  it("R ∝ 1/strands and drawn mass ∝ strands, forceLength unchanged (seeded random lines)", () => {
    const random = seededRandom(46);
    for (let run = 0; run < 50; run += 1) {
      const base = checkFourCoil({
        turns: 1 + Math.floor(random() * 200),
        activeLengthMm: 5 + random() * 200,
        endTurnLengthMm: random() * 100,
        leadLengthMm: random() * 300,
        scrapPercent: random() * 10,
        operatingTemperatureC: 20 + random() * 130,
      });
      const strands = 2 + Math.floor(random() * 6);
      const one = coilLineFigures(base);
      const many = coilLineFigures({ ...base, strandsInHand: strands });
      expect(many.resistancePerCoilOhm * strands).toBeCloseTo(
        one.resistancePerCoilOhm,
        12,
      );
      expect(many.drawnMassKg / one.drawnMassKg).toBeCloseTo(strands, 12);
      expect(many.forceLengthM).toBe(one.forceLengthM);
      expect(splitSumDigits(many)).toBe(many.drawnMass.digits);
      expect(splitSumDigits(one)).toBe(one.drawnMass.digits);
    }
  });
});

describe("input the figures cannot use", () => {
  it.each([
    ["turns", { turns: 0 }],
    ["strandsInHand", { strandsInHand: 1.5 }],
    ["activeLengthMm", { activeLengthMm: 0 }],
    ["endTurnLengthMm", { endTurnLengthMm: -1 }],
    ["coilsPerMotor", { coilsPerMotor: 0 }],
    ["scrapPercent", { scrapPercent: -3 }],
    [
      "wire.diameterMm",
      { wire: { ...WIRE_080, size: { standard: "IEC", diameterMm: 6.3 } } },
    ],
  ] as const)("refuses a bad %s with a field-named error", (field, change) => {
    expect(fieldOfError(() => coilLineFigures(checkFourCoil(change)))).toBe(
      field,
    );
  });
});
