import { describe, expect, it } from "vitest";
import { expectMatchesPrinted } from "~/engineering/printed-value.test-support";
import { parseMoney } from "~/pricing/money";
import { costDesign } from "./design-costing";
import type { CoilLine, DesignLine } from "./design-lines";
import {
  checkFourCoil,
  fieldOfError,
  n42shMagnets,
  partLine,
  WIRE_080,
} from "./design-lines.test-support";
import {
  airGapFluxDensityFor,
  DEFAULT_POLE_COVERAGE,
  DEFAULT_POLE_COVERAGE_SOURCE,
  estimateTorque,
  type TorqueEstimateInput,
} from "./torque-estimate";

/** B_g 0.9 T, 10 A, r 30 mm, k given or default. */
function torqueOf(
  lines: DesignLine[],
  overrides: Partial<TorqueEstimateInput> = {},
) {
  return estimateTorque({
    lines,
    fluxDensity: { source: "typed", fluxDensityT: 0.9 },
    ratedCurrentA: 10,
    airGapRadiusMm: 30,
    ...overrides,
  });
}

describe("worked check 8 of the engineering brief", () => {
  it("48 conductors of 0.05 m at 0.9 T, 10 A, r 30 mm: 0.648 N·m (k = 1)", () => {
    // One coil of 24 turns with 50 mm sides has 48 active conductors of 0.05 m:
    // forceLength 2 × 24 × 0.05 m = 2.4 m. 0.9 T × 10 A × 2.4 m × 0.03 m = 0.648 N·m
    // (GNU units: units -t '0.9 T * 10 A * 2.4 m * 0.03 m' 'N*m' → 0.648).
    const estimate = torqueOf([checkFourCoil({ turns: 24 })], {
      poleCoverage: 1,
    });
    expect(estimate.forceLengthM).toBeCloseTo(2.4, 12);
    expectMatchesPrinted(estimate.torqueNm, "0.648");
    expect(estimate.basis).toBe("first-order");
    expect(estimate.poleCoverageSource).toBe("given");
  });
});

describe("a hand-computed design with the default k", () => {
  it("6 coils of worked check 4 at k 0.8: 0.8 × 0.9 T × 10 A × 24 m × 0.03 m = 5.184 N·m", () => {
    // forceLength per coil 2 × 40 × 0.050 m = 4.0 m; × 6 coils = 24 m.
    // GNU units: units -t '0.8 * 0.9 T * 10 A * 24 m * 0.03 m' 'N*m' → 5.184.
    const estimate = torqueOf([
      checkFourCoil({ coilsPerMotor: 6, leadLengthMm: 150, scrapPercent: 5 }),
      n42shMagnets(),
      partLine(3, "BRG-608", "pcs", "1"),
    ]);
    expect(estimate.poleCoverage).toBe(DEFAULT_POLE_COVERAGE);
    expect(estimate.poleCoverageSource).toBe(DEFAULT_POLE_COVERAGE_SOURCE);
    expect(DEFAULT_POLE_COVERAGE_SOURCE).toMatch(/common practice/);
    expect(estimate.forceLengthM).toBeCloseTo(24, 12);
    expectMatchesPrinted(estimate.torqueNm, "5.184");
  });

  it("strands in hand share the coil's current and leave the estimate unchanged (coil estimator's forceLengthM)", () => {
    const one = torqueOf([checkFourCoil()]);
    const three = torqueOf([checkFourCoil({ strandsInHand: 3 })]);
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
    const lines = [checkFourCoil()];
    const fromMagnet = torqueOf(lines, { fluxDensity: magnet });
    const typed = torqueOf(lines, {
      fluxDensity: { source: "typed", fluxDensityT: fromMagnet.fluxDensityT },
    });
    expect(fromMagnet.torqueNm).toBe(typed.torqueNm);
    // 0.8 × 1.0297 T × 10 A × 4.0 m × 0.03 m = 0.98851 N·m (by hand, B_g rounded).
    expect(fromMagnet.torqueNm).toBeCloseTo(0.98851, 4);
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
    const line = checkFourCoil({ coilsPerMotor: 12, leadLengthMm: 150 });
    const longer = { ...line, endTurnLengthMm: 2 * line.endTurnLengthMm };
    expect(torqueOf([longer]).torqueNm).toBe(torqueOf([line]).torqueNm);
    expect(costPerNm(longer)! > costPerNm(line)!).toBe(true);
  });

  it("doubling the active length doubles the estimate", () => {
    // Force and EMF double with the active length (brief, "Coils"; common practice).
    const line = checkFourCoil({ coilsPerMotor: 12, leadLengthMm: 150 });
    const longer = { ...line, activeLengthMm: 2 * line.activeLengthMm };
    expect(torqueOf([longer]).torqueNm).toBeCloseTo(
      2 * torqueOf([line]).torqueNm,
      12,
    );
  });

  it("is zero for a design without coil lines", () => {
    expect(torqueOf([n42shMagnets()]).torqueNm).toBe(0);
  });
});

describe("refusals", () => {
  it("refuses k outside (0, 1], a radius ≤ 0 and a negative current", () => {
    const lines = [checkFourCoil()];
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
  });
});
