import { describe, expect, it } from "vitest";
import { expectMatchesPrinted } from "~/engineering/printed-value.test-support";
import { parseMoney } from "~/pricing/money";
import { costDesign } from "./design-costing";
import type { CoilLine, DesignLine } from "./design-lines";
import {
  checkFourCoil,
  fieldOfError,
  n42shMagnets,
  WIRE_080,
} from "./design-lines.test-support";
import {
  airGapFluxDensityFor,
  DEFAULT_POLE_COVERAGE,
  DEFAULT_POLE_COVERAGE_SOURCE,
  estimateTorque,
  type DesignWinding,
  type TorqueEstimateInput,
} from "./torque-estimate";

/** 12 slots / 10 poles, double layer, 3 phases in star, one path. */
const WINDING: DesignWinding = {
  slots: 12,
  poles: 10,
  layers: 2,
  phases: 3,
  connection: "star",
  parallelPaths: 1,
};

/** B_g 0.9 T, 10 A RMS phase current, r 30 mm, α_p given or default. */
function torqueOf(
  lines: DesignLine[],
  overrides: Partial<TorqueEstimateInput> = {},
) {
  return estimateTorque({
    lines,
    winding: WINDING,
    fluxDensity: { source: "typed", fluxDensityT: 0.9 },
    ratedCurrentA: 10,
    airGapRadiusMm: 30,
    ...overrides,
  });
}

/** Twelve coils of worked check 4 (40 turns, 50 mm active sides): one per tooth. */
const twelveCoils = (overrides: Partial<CoilLine> = {}) =>
  checkFourCoil({ coilsPerMotor: 12, ...overrides });

describe("a hand-worked 12-slot, 10-pole motor (motor-constants.test.ts works the same case)", () => {
  it("T = 3 · √2 · 0.93301 · 160 · 1.08983 T · 0.03 m · 0.05 m · 10 A = 10.3537 N·m", () => {
    // k_w1 = 0.9330 (12 s / 10 p double layer: 0.933 in Libert & Soulard's table, from memory);
    // B̂₁ = (4/π) · 0.9 T · sin 72° = 1.0898305 T; N_ph = 12 × 40 ÷ 3 = 160.
    // GNU units: units -t '10 A * 3*sqrt(2) * sin(75deg)^2 * 160 * (4/pi * 0.9 T * sin(72 deg))
    //   * 30 mm * 50 mm' 'N m' → 10.353662.
    const estimate = torqueOf([twelveCoils(), n42shMagnets()]);
    expectMatchesPrinted(estimate.windingFactor, "0.9330");
    expectMatchesPrinted(estimate.fundamentalFluxDensityT, "1.08983");
    expect(estimate.constants.seriesTurnsPerPhase).toBe(160);
    expectMatchesPrinted(estimate.torqueNm, "10.3537");
    expect(estimate.basis).toBe("first-order");
    expect(estimate.poleCoverage).toBe(DEFAULT_POLE_COVERAGE);
    expect(estimate.poleCoverageSource).toBe(DEFAULT_POLE_COVERAGE_SOURCE);
    expect(DEFAULT_POLE_COVERAGE_SOURCE).toMatch(/common practice/);
    expect(estimate.currentBasis).toMatch(/RMS phase current/);
  });

  it("agrees within 0.2 % with the average-force view: 0.8 × 0.9 T × 10 A × 48 m × 0.03 m = 10.368 N·m", () => {
    // The old first-order figure k · B · I · ΣL · r (brief, worked check 8 scaled to 12 coils);
    // the two describe the same machine, so they must not drift apart.
    const estimate = torqueOf([twelveCoils()]);
    expect(estimate.forceLengthM).toBeCloseTo(48, 12);
    expect(Math.abs(estimate.torqueNm / 10.368 - 1)).toBeLessThan(0.002);
  });

  it("two parallel paths: each coil carries half the phase current, torque halves (5.1768 N·m)", () => {
    const estimate = torqueOf([twelveCoils()], {
      winding: { ...WINDING, parallelPaths: 2 },
    });
    expectMatchesPrinted(estimate.torqueNm, "5.1768");
  });

  it("strands in hand share the coil's current and leave the estimate unchanged", () => {
    const one = torqueOf([twelveCoils()]);
    const three = torqueOf([twelveCoils({ strandsInHand: 3 })]);
    expect(three.torqueNm).toBe(one.torqueNm);
  });
});

describe("air-gap flux density from a magnet (brief, worked check 7; Hanselman)", () => {
  const magnet = {
    source: "magnet",
    br20T: 1.3,
    brTemperatureCoefficientPerK: -0.0012,
    magnetTemperatureC: 20,
    magnetLengthMm: 4,
    airGapMm: 1,
    recoilPermeability: 1.05,
  } as const;

  it("Br 1.30 T, l_m 4 mm, g 1 mm, μ_rec 1.05: B_g = 1.0297 T", () => {
    expectMatchesPrinted(airGapFluxDensityFor(magnet), "1.0297");
  });

  it("at 100 °C Br is 1.1752 T, so B_g = 1.1752 × 4 / 5.05 = 0.93085 T", () => {
    // GNU units: units -t '1.1752 T * 4 mm / (4 mm + 1.05 * 1 mm)' T → 0.93085149
    expectMatchesPrinted(
      airGapFluxDensityFor({ ...magnet, magnetTemperatureC: 100 }),
      "0.93085",
    );
  });

  it("feeds the torque like a typed value", () => {
    const lines = [twelveCoils()];
    const fromMagnet = torqueOf(lines, { fluxDensity: magnet });
    const typed = torqueOf(lines, {
      fluxDensity: { source: "typed", fluxDensityT: fromMagnet.fluxDensityT },
    });
    expect(fromMagnet.torqueNm).toBe(typed.torqueNm);
    // Torque is proportional to B_g: 10.353662 N·m × 1.0297 / 0.9 = 11.8457 N·m (by hand, B_g rounded).
    expect(fromMagnet.torqueNm).toBeCloseTo(11.8457, 2);
  });
});

describe("what the issue asks of the estimate (issue #6)", () => {
  const price = new Map([
    [WIRE_080.itemId, { unitPrice: parseMoney("12.50"), source: "test" }],
  ]);

  function costPerNm(line: CoilLine) {
    const torque = torqueOf([line]).torqueNm;
    return costDesign({
      lines: [line],
      quantity: 1,
      currency: "EUR",
      prices: price,
      ratedTorqueNm: torque,
    }).costPerNm;
  }

  it("doubling the end-turn length leaves the estimate unchanged and raises cost per N·m", () => {
    // End turns lie outside the field (brief, "Coils"; common practice).
    const line = twelveCoils({ leadLengthMm: 150 });
    const longer = { ...line, endTurnLengthMm: 2 * line.endTurnLengthMm };
    expect(torqueOf([longer]).torqueNm).toBe(torqueOf([line]).torqueNm);
    expect(costPerNm(longer)! > costPerNm(line)!).toBe(true);
  });

  it("doubling the active length doubles the estimate", () => {
    // Force and EMF double with the active length (brief, "Coils"; common practice).
    const line = twelveCoils({ leadLengthMm: 150 });
    const longer = { ...line, activeLengthMm: 2 * line.activeLengthMm };
    expect(torqueOf([longer]).torqueNm).toBeCloseTo(
      2 * torqueOf([line]).torqueNm,
      12,
    );
  });

  it("refuses a design without coil lines rather than answering 0 N·m", () => {
    expect(fieldOfError(() => torqueOf([n42shMagnets()]))).toBe("coils");
  });
});

describe("refusals", () => {
  it("refuses α_p outside (0, 1], a radius ≤ 0 and a negative or NaN current", () => {
    const lines = [twelveCoils()];
    expect(fieldOfError(() => torqueOf(lines, { poleCoverage: 1.2 }))).toBe(
      "poleCoverage",
    );
    expect(fieldOfError(() => torqueOf(lines, { poleCoverage: 0 }))).toBe(
      "poleCoverage",
    );
    expect(fieldOfError(() => torqueOf(lines, { airGapRadiusMm: 0 }))).toBe(
      "airGapRadiusMm",
    );
    expect(fieldOfError(() => torqueOf(lines, { ratedCurrentA: -1 }))).toBe(
      "ratedCurrentA",
    );
    expect(
      fieldOfError(() => torqueOf(lines, { ratedCurrentA: Number.NaN })),
    ).toBe("ratedCurrentA");
  });

  it("refuses a winding that cannot be balanced, and coils that do not split into phases or paths", () => {
    expect(
      fieldOfError(() =>
        torqueOf([twelveCoils()], {
          winding: { ...WINDING, slots: 10, poles: 8 },
        }),
      ),
    ).toBe("slots");
    expect(
      fieldOfError(() => torqueOf([checkFourCoil({ coilsPerMotor: 10 })])),
    ).toBe("coils");
    expect(
      fieldOfError(() =>
        torqueOf([twelveCoils()], {
          winding: { ...WINDING, parallelPaths: 3 },
        }),
      ),
    ).toBe("parallelPaths");
  });
});
