/**
 * The winding's operating temperature and its loss there, found together: the loss heats
 * the winding, and a hotter winding has more resistance and so more loss.
 *
 * - From a thermal resistance R_th (K/W, winding to ambient): T = T_amb + R_th · P(T),
 *   solved by fixed-point iteration from T_amb. P(T) grows with T (R = R20·(1 + α(T − 20))),
 *   so the iteration climbs steadily; for DC loss it converges when R_th · I² · R20 · α < 1
 *   and otherwise runs away: the loss then rises faster with temperature than the winding
 *   can shed it, and no steady temperature exists (hand-derived; see the tests).
 * - From a temperature rise the person gives (measured, or from a maker's rating):
 *   T = T_amb + ΔT, and the loss at T.
 *
 * A temperature above 400 °C (beyond every enamel's thermal class, IEC 60085 tops out at
 * 220 °C for common wire) is refused as runaway.
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";

/** Highest temperature the iteration follows, °C (the estimate's temperature limit). */
export const MAX_WINDING_TEMPERATURE_C = 400;

const TOLERANCE_K = 1e-6;
const MAX_ITERATIONS = 10_000;

export type ThermalInput =
  | {
      ambientC: number;
      thermalResistanceKPerW: number;
      temperatureRiseK?: undefined;
    }
  | {
      ambientC: number;
      temperatureRiseK: number;
      thermalResistanceKPerW?: undefined;
    };

export interface WindingTemperature {
  /** Operating temperature of the winding, °C. */
  temperatureC: number;
  /** Loss at that temperature, W. */
  lossW: number;
  /** Fixed-point steps taken (0 when the temperature rise was given). */
  iterations: number;
  method: "thermal-resistance" | "temperature-rise";
}

function checkAmbient(ambientC: number): void {
  if (!Number.isFinite(ambientC) || ambientC < -70 || ambientC > 300) {
    throw new EngineeringInputError(
      "thermal.ambientC",
      "The ambient temperature must be between −70 and 300 °C.",
    );
  }
}

/**
 * The operating temperature and loss of a winding whose loss at temperature T (°C) is
 * `lossAtW(T)` watts. Throws with field "thermal.thermalResistanceKPerW" on runaway.
 */
export function windingTemperature(
  thermal: ThermalInput,
  lossAtW: (temperatureC: number) => number,
): WindingTemperature {
  checkAmbient(thermal.ambientC);
  if (thermal.temperatureRiseK !== undefined) {
    requireNonNegative(
      thermal.temperatureRiseK,
      "thermal.temperatureRiseK",
      "The temperature rise",
    );
    const temperatureC = thermal.ambientC + thermal.temperatureRiseK;
    if (temperatureC > MAX_WINDING_TEMPERATURE_C) {
      throw new EngineeringInputError(
        "thermal.temperatureRiseK",
        `Ambient plus rise is ${temperatureC} °C, above the ${MAX_WINDING_TEMPERATURE_C} °C the estimate follows.`,
      );
    }
    return {
      temperatureC,
      lossW: lossAtW(temperatureC),
      iterations: 0,
      method: "temperature-rise",
    };
  }

  const rth = thermal.thermalResistanceKPerW;
  requirePositive(
    rth,
    "thermal.thermalResistanceKPerW",
    "The thermal resistance",
  );
  let temperatureC = thermal.ambientC;
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration += 1) {
    const next = thermal.ambientC + rth * lossAtW(temperatureC);
    if (!Number.isFinite(next) || next > MAX_WINDING_TEMPERATURE_C) break;
    if (Math.abs(next - temperatureC) < TOLERANCE_K) {
      return {
        temperatureC: next,
        lossW: lossAtW(next),
        iterations: iteration,
        method: "thermal-resistance",
      };
    }
    temperatureC = next;
  }
  throw new EngineeringInputError(
    "thermal.thermalResistanceKPerW",
    `Thermal runaway: with ${rth} K/W the loss rises faster with temperature than the winding sheds it, and the winding passes ${MAX_WINDING_TEMPERATURE_C} °C without settling. Lower the current, the resistance or the thermal resistance (better cooling).`,
  );
}
