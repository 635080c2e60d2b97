/**
 * GNU units as an independent reference for the AWG formula: its definitions file
 * defines wiregauge(g) = 1/200 in · 92^((36 − g)/39) (Debian package "units").
 * This test uses Node APIs; it never runs in the browser.
 */

import { spawnSync } from "node:child_process";
import { existsSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { awgFormulaDiameterMm, findAwgSize } from "./reference-data";
import { awgBareDiameterMm } from "./wire-geometry";

const UNITS_PATH = "/usr/bin/units";

/** Diameter in mm from GNU units, at its maximum 15 significant digits. */
function unitsWireGaugeMm(gaugeNumber: number): number {
  if (!existsSync(UNITS_PATH)) {
    throw new Error(
      `GNU units is missing at ${UNITS_PATH}: install the Debian package "units" (apt-get install units). ` +
        "This test is the independent check of the AWG formula and does not skip.",
    );
  }
  // -t: terse output (the number only); -d 15: 15 significant digits (the default 8 is too coarse for 1e-9).
  const result = spawnSync(
    UNITS_PATH,
    ["-t", "-d", "15", `wiregauge(${gaugeNumber})`, "mm"],
    {
      encoding: "utf8",
    },
  );
  if (result.error) throw result.error;
  if (result.status !== 0) {
    throw new Error(
      `units failed for wiregauge(${gaugeNumber}): ${result.stderr}`,
    );
  }
  const value = Number(result.stdout.trim());
  if (!Number.isFinite(value)) {
    throw new Error(
      `units printed "${result.stdout.trim()}" for wiregauge(${gaugeNumber})`,
    );
  }
  return value;
}

describe("AWG formula against GNU units wiregauge()", () => {
  it("finds GNU units installed", () => {
    expect(
      existsSync(UNITS_PATH),
      `GNU units is missing at ${UNITS_PATH}: apt-get install units`,
    ).toBe(true);
  });

  it("agrees for AWG 0 to 40 within 1e-9 relative", () => {
    for (let gauge = 0; gauge <= 40; gauge += 1) {
      const reference = unitsWireGaugeMm(gauge);
      const ours = awgBareDiameterMm(String(gauge));
      expect(
        Math.abs(ours - reference) / reference,
        `AWG ${gauge}: ${ours} vs units ${reference}`,
      ).toBeLessThan(1e-9);
    }
  });

  it("agrees for 00, 000 and 0000 with n = −1, −2, −3 (ASTM B258)", () => {
    for (const label of ["00", "000", "0000"]) {
      const size = findAwgSize(label);
      expect(size).toBeDefined();
      const gaugeNumber = -(label.length - 1);
      const reference = unitsWireGaugeMm(gaugeNumber);
      expect(
        Math.abs(awgFormulaDiameterMm(gaugeNumber) - reference) / reference,
      ).toBeLessThan(1e-9);
      expect(
        Math.abs(awgBareDiameterMm(label) - reference) / reference,
      ).toBeLessThan(1e-9);
    }
  });
});
