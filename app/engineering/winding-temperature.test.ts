import { describe, expect, it } from "vitest";
import { expectWithinRelative } from "./printed-value.test-support";
import { windingTemperature } from "./winding-temperature";

/**
 * The brief's worked check 4 coil: R20 = 0.21952 Ω (copper, α20 = 0.00393 /K, IEC 60028),
 * at 10 A: P(T) = 100 · 0.21952 · (1 + 0.00393 · (T − 20)) W.
 */
const lossAt = (temperatureC: number) =>
  100 * 0.21952 * (1 + 0.00393 * (temperatureC - 20));

describe("winding temperature from a thermal resistance", () => {
  it("2 K/W in 40 °C air settles at 97.229 °C and 28.615 W (hand-worked closed form)", () => {
    // T = T_amb + R_th·I²·R20·(1 + α(T − 20)) is linear in T, so by hand
    //   T = (T_amb + R_th·I²·R20·(1 − 20α)) / (1 − R_th·I²·R20·α)
    //     = (40 + 2·100·0.21952·0.9214) / (1 − 2·100·0.21952·0.00393) = 97.229365 °C
    // (GNU units: units -t '(40 + 2*100*0.21952*(1-20*0.00393))/(1-2*100*0.21952*0.00393)').
    // P = 21.952 · (1 + 0.00393 · 77.229) = 28.6147 W; check: 40 + 2 · 28.6147 = 97.229.
    const result = windingTemperature(
      { ambientC: 40, thermalResistanceKPerW: 2 },
      lossAt,
    );
    expectWithinRelative(result.temperatureC, 97.229365, 1e-6);
    expectWithinRelative(result.lossW, 28.61465, 1e-5);
    expect(result.method).toBe("thermal-resistance");
    expect(result.iterations).toBeGreaterThan(3);
  });

  it("refuses runaway (R_th·I²·R20·α = 1.73 > 1), naming the thermal resistance", () => {
    // 20 · 100 · 0.21952 · 0.00393 = 1.7254: each kelvin adds 1.73 K more.
    expect(() =>
      windingTemperature({ ambientC: 40, thermalResistanceKPerW: 20 }, lossAt),
    ).toThrowError(
      expect.objectContaining({
        field: "thermal.thermalResistanceKPerW",
        message: expect.stringContaining("Thermal runaway") as string,
      }) as Error,
    );
  });

  it("refuses a steady state beyond 400 °C (8 K/W settles at 651 °C by the closed form)", () => {
    // (40 + 8·21.952·0.9214) / (1 − 8·21.952·0.00393) = 201.81 / 0.30985 = 651.3 °C.
    expect(() =>
      windingTemperature({ ambientC: 40, thermalResistanceKPerW: 8 }, lossAt),
    ).toThrowError(
      expect.objectContaining({
        field: "thermal.thermalResistanceKPerW",
      }) as Error,
    );
  });

  it("with no loss stays at ambient", () => {
    const result = windingTemperature(
      { ambientC: 25, thermalResistanceKPerW: 3 },
      () => 0,
    );
    expect(result.temperatureC).toBe(25);
  });

  it("refuses a negative or NaN thermal resistance and an ambient of 1000 °C", () => {
    expect(() =>
      windingTemperature({ ambientC: 40, thermalResistanceKPerW: -1 }, lossAt),
    ).toThrowError(
      expect.objectContaining({
        field: "thermal.thermalResistanceKPerW",
      }) as Error,
    );
    expect(() =>
      windingTemperature(
        { ambientC: 40, thermalResistanceKPerW: Number.NaN },
        lossAt,
      ),
    ).toThrowError(
      expect.objectContaining({
        field: "thermal.thermalResistanceKPerW",
      }) as Error,
    );
    expect(() =>
      windingTemperature({ ambientC: 1000, thermalResistanceKPerW: 1 }, lossAt),
    ).toThrowError(
      expect.objectContaining({ field: "thermal.ambientC" }) as Error,
    );
  });
});

describe("winding temperature from a given rise", () => {
  it("40 °C + 60 K = 100 °C; loss 21.952 · (1 + 0.00393 · 80) = 28.854 W (hand-worked)", () => {
    const result = windingTemperature(
      { ambientC: 40, temperatureRiseK: 60 },
      lossAt,
    );
    expect(result.temperatureC).toBe(100);
    expectWithinRelative(result.lossW, 28.85371, 1e-6);
    expect(result.iterations).toBe(0);
  });

  it("refuses a negative rise and one that passes 400 °C", () => {
    expect(() =>
      windingTemperature({ ambientC: 40, temperatureRiseK: -5 }, lossAt),
    ).toThrowError(
      expect.objectContaining({ field: "thermal.temperatureRiseK" }) as Error,
    );
    expect(() =>
      windingTemperature({ ambientC: 40, temperatureRiseK: 380 }, lossAt),
    ).toThrowError(
      expect.objectContaining({ field: "thermal.temperatureRiseK" }) as Error,
    );
  });
});
