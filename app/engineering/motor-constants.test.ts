import { describe, expect, it } from "vitest";
import { EngineeringInputError } from "./errors";
import {
  electricalFrequencyHz,
  fundamentalFluxDensityT,
  motorConstants,
  windingResistance,
  type MotorConstantsInput,
} from "./motor-constants";
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

/**
 * HAND-WORKED EXAMPLE (each step checked with GNU units):
 * 12 slots / 10 poles, double layer, 3 phases in star, one path; 12 tooth coils of 40 turns,
 * coil sides 50 mm long in the field; flat-topped field 0.9 T under magnets covering 0.8 of
 * each pole pitch; air-gap radius 30 mm.
 *
 * 1. k_w1 = sin² 75° = 0.9330127 (12 s / 10 p table value 0.933; winding-factor.test.ts).
 * 2. B̂₁ = (4/π) · 0.9 T · sin(0.8 · 90°) = 1.0898305 T
 *    (units -t '4/pi * 0.9 T * sin(72 deg)' T → 1.0898305).
 * 3. N_ph = 12 coils × 40 turns ÷ 3 phases ÷ 1 path = 160 turns.
 * 4. Ke_ph = √2 · 0.9330127 · 160 · 1.0898305 T · 30 mm · 50 mm = 0.34512208 V·s/rad
 *    (units -t 'sqrt(2)*sin(75deg)^2*160*1.0898305 T*30 mm*50 mm' 'V s' → 0.34512208).
 * 5. Kt = 3 · Ke_ph = 1.0353662 N·m/A; 10 A RMS → 10.353662 N·m.
 * 6. Ke_LL,rms (star) = √3 · 0.34512208 = 0.59776898 V·s/rad; peak × √2 = 0.84537299.
 * Cross-check with the old average-force estimate: 0.8 × 0.9 T × 10 A × (2 × 40 × 0.05 m
 * × 12) × 0.03 m = 10.368 N·m, within 0.2 % — the two views of the same machine agree.
 */
const handWorked: MotorConstantsInput = {
  phases: 3,
  connection: "star",
  parallelPaths: 1,
  coils: [{ coils: 12, turnsPerCoil: 40, activeLengthMm: 50 }],
  windingFactor: 0.9330127,
  fundamentalFluxDensityT: 1.0898305,
  airGapRadiusMm: 30,
};

describe("the fundamental of a flat-topped field", () => {
  it("0.9 T over 0.8 of the pole pitch: 1.0898 T (hand-worked, GNU units)", () => {
    expectMatchesPrinted(fundamentalFluxDensityT(0.9, 0.8), "1.08983");
  });

  it("full coverage is the square wave: 4/π = 1.2732 of the flat top", () => {
    // Fourier series of a square wave: first term 4/π (any table of Fourier series).
    expectMatchesPrinted(fundamentalFluxDensityT(1, 1), "1.27324");
  });
});

describe("Kt and Ke of the hand-worked winding", () => {
  const constants = motorConstants(handWorked);

  it("series turns 160, Ke_ph 0.34512 V·s/rad, Kt 1.03537 N·m/A", () => {
    expect(constants.seriesTurnsPerPhase).toBe(160);
    expect(constants.coilsPerPhase).toBe(4);
    expectMatchesPrinted(constants.kePhaseRmsVsPerRad, "0.345122");
    expectMatchesPrinted(constants.ktNmPerA, "1.035366");
    expectMatchesPrinted(constants.ktLineNmPerA, "1.035366");
  });

  it("Ke line to line: 0.59777 V·s/rad RMS, 0.84537 peak", () => {
    // units -t "sqrt(3)*0.34512208" → 0.59776898; × sqrt(2) → 0.84537299.
    expectMatchesPrinted(constants.keLineToLineRmsVsPerRad, "0.597769");
    expectMatchesPrinted(constants.keLineToLinePeakVsPerRad, "0.84537");
  });

  it("Kt = √3 · Ke_LL,rms: the data-sheet rule Kt [N·m/A] = 0.0165 × Ke [V rms/krpm] (from memory)", () => {
    // Ke in V rms per 1000 rpm: Ke_LL [V·s/rad] × 1000 × 2π/60.
    const keVPerKrpm =
      (constants.keLineToLineRmsVsPerRad * 1000 * 2 * Math.PI) / 60;
    // 0.0165 is printed to 3 figures: √3 × 60/(2π·1000) = 0.016540 (GNU units).
    expect(constants.ktLineNmPerA / keVPerKrpm).toBeCloseTo(0.0165, 4);
  });

  it("two parallel paths halve the series turns and Kt", () => {
    const twoPaths = motorConstants({ ...handWorked, parallelPaths: 2 });
    expect(twoPaths.seriesTurnsPerPhase).toBe(80);
    expectMatchesPrinted(twoPaths.ktNmPerA, "0.517683");
  });

  it("delta: Ke_LL is the phase's; per line ampere Kt ÷ √3, still √3 × Ke_LL", () => {
    const delta = motorConstants({ ...handWorked, connection: "delta" });
    expectMatchesPrinted(delta.keLineToLineRmsVsPerRad, "0.345122");
    expectMatchesPrinted(delta.ktNmPerA, "1.035366");
    // 1.0353662 ÷ √3 = 0.59776895 ≈ √3 × 0.34512208 = 0.59776898 (GNU units).
    expectMatchesPrinted(delta.ktLineNmPerA, "0.597769");
  });
});

describe("terminal resistance from the coils", () => {
  // Coil of the brief's worked check 4: 0.21952 Ω at 20 °C. 12 coils, 3 phases.
  const coils = [{ coils: 12, resistancePerCoilOhm: 0.21952 }];

  it("star, one path: R_ph = 4 × 0.21952 = 0.87808 Ω, R_LL = 1.75616 Ω", () => {
    const r = windingResistance({
      phases: 3,
      connection: "star",
      parallelPaths: 1,
      coils,
    });
    expectMatchesPrinted(r.phaseOhm, "0.87808");
    expectMatchesPrinted(r.lineToLineOhm, "1.75616");
  });

  it("delta: R_LL = R_ph ∥ 2 R_ph = (2/3) × 0.87808 = 0.585387 Ω", () => {
    // 0.87808 × 1.75616 ÷ (0.87808 + 1.75616) = 0.585387 (by hand, as two resistors in parallel).
    const r = windingResistance({
      phases: 3,
      connection: "delta",
      parallelPaths: 1,
      coils,
    });
    expectMatchesPrinted(r.lineToLineOhm, "0.585387");
  });

  it("two paths of 2 coils: each path 0.43904 Ω, two in parallel 0.21952 Ω", () => {
    const r = windingResistance({
      phases: 3,
      connection: "star",
      parallelPaths: 2,
      coils,
    });
    expectMatchesPrinted(r.phaseOhm, "0.21952");
  });
});

describe("electrical frequency", () => {
  it("10 poles at 3000 rpm: 5 × 50 = 250 Hz", () => {
    expect(electricalFrequencyHz(10, 3000)).toBe(250);
  });
});

describe("refusals name the field", () => {
  it("coils that do not split into phases or paths, nonsense numbers", () => {
    expect(
      fieldOf(() =>
        motorConstants({
          ...handWorked,
          coils: [{ coils: 10, turnsPerCoil: 40, activeLengthMm: 50 }],
        }),
      ),
    ).toBe("coils");
    expect(
      fieldOf(() => motorConstants({ ...handWorked, parallelPaths: 3 })),
    ).toBe("parallelPaths");
    expect(
      fieldOf(() => motorConstants({ ...handWorked, parallelPaths: 0 })),
    ).toBe("parallelPaths");
    expect(
      fieldOf(() => motorConstants({ ...handWorked, windingFactor: 1.2 })),
    ).toBe("windingFactor");
    expect(
      fieldOf(() =>
        motorConstants({ ...handWorked, fundamentalFluxDensityT: Number.NaN }),
      ),
    ).toBe("fluxDensity");
    expect(
      fieldOf(() => motorConstants({ ...handWorked, airGapRadiusMm: -1 })),
    ).toBe("airGapRadiusMm");
    expect(
      fieldOf(() =>
        motorConstants({
          ...handWorked,
          coils: [{ coils: 12, turnsPerCoil: -5, activeLengthMm: 50 }],
        }),
      ),
    ).toBe("coils[0].turnsPerCoil");
    expect(
      fieldOf(() =>
        motorConstants({ ...handWorked, connection: "zigzag" as "star" }),
      ),
    ).toBe("phaseConnection");
    expect(fieldOf(() => fundamentalFluxDensityT(0.9, 0))).toBe("poleCoverage");
    expect(fieldOf(() => fundamentalFluxDensityT(-0.1, 0.8))).toBe(
      "fluxDensity",
    );
    expect(fieldOf(() => electricalFrequencyHz(9, 3000))).toBe("poles");
    expect(fieldOf(() => electricalFrequencyHz(10, Number.NaN))).toBe(
      "ratedSpeedRpm",
    );
    expect(
      fieldOf(() =>
        windingResistance({
          phases: 3,
          connection: "star",
          parallelPaths: 1,
          coils: [
            { coils: 12, resistancePerCoilOhm: Number.POSITIVE_INFINITY },
          ],
        }),
      ),
    ).toBe("coils[0].resistancePerCoilOhm");
  });
});
