import { describe, expect, it } from "vitest";
import {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  feetToMetres,
  inchesToMm,
  kelvinToCelsius,
  kgToPounds,
  metresToFeet,
  mmToInches,
  perKmToPerThousandFeet,
  perThousandFeetToPerKm,
  poundsToKg,
} from "./units";
import { EngineeringInputError } from "./errors";

describe("unit conversions", () => {
  it("use the exact defining factors", () => {
    // International yard and pound agreement (1959): 1 in = 25.4 mm, 1 ft = 0.3048 m, 1 lb = 0.45359237 kg.
    expect(inchesToMm(1)).toBe(25.4);
    expect(feetToMetres(1)).toBe(0.3048);
    expect(poundsToKg(1)).toBe(0.45359237);
    // 12 in = 1 ft, both sides from their own factor (same agreement).
    expect(inchesToMm(12) / 1000).toBeCloseTo(feetToMetres(1), 15);
    // 0.005 in = 0.127 mm: AWG 36 (ASTM B258).
    expect(inchesToMm(0.005)).toBeCloseTo(0.127, 15);
  });

  it("agree with GNU units the other way round", () => {
    // GNU units: "1000 m" → ft 3280.8399; "1 kg" → lb 2.2046226.
    expect(metresToFeet(1000)).toBeCloseTo(3280.8399, 4);
    expect(kgToPounds(1)).toBeCloseTo(2.2046226, 7);
  });

  it("go there and back", () => {
    for (const value of [-40, 0, 0.001, 1, 25.4, 1234.5]) {
      expect(mmToInches(inchesToMm(value))).toBeCloseTo(value, 12);
      expect(metresToFeet(feetToMetres(value))).toBeCloseTo(value, 12);
      expect(kgToPounds(poundsToKg(value))).toBeCloseTo(value, 12);
      expect(fahrenheitToCelsius(celsiusToFahrenheit(value))).toBeCloseTo(
        value,
        12,
      );
      expect(kelvinToCelsius(celsiusToKelvin(value))).toBeCloseTo(value, 12);
      expect(perKmToPerThousandFeet(perThousandFeetToPerKm(value))).toBeCloseTo(
        value,
        12,
      );
    }
  });

  it("put the temperature fixed points where they belong", () => {
    // SI Brochure (BIPM): T/K = t/°C + 273.15; °F = °C · 9/5 + 32.
    expect(celsiusToKelvin(0)).toBe(273.15);
    expect(celsiusToFahrenheit(0)).toBe(32);
    expect(celsiusToFahrenheit(100)).toBe(212);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(kelvinToCelsius(0)).toBe(-273.15);
  });

  it("convert per-1000-ft to per-km", () => {
    // Brief: AWG 18 is 6.386 Ω/1000 ft = 20.95 Ω/km; AWG 24 is 25.67 Ω/1000 ft = 84.22 Ω/km.
    expect(perThousandFeetToPerKm(6.386)).toBeCloseTo(20.95, 2);
    expect(perThousandFeetToPerKm(25.67)).toBeCloseTo(84.22, 2);
  });
});

describe("refusals (issue 19, fix 6)", () => {
  const fieldOf = (run: () => unknown) => {
    try {
      run();
    } catch (error) {
      if (error instanceof EngineeringInputError) return error.field;
      throw error;
    }
    return undefined;
  };

  it("refuse NaN and infinities, naming the argument", () => {
    expect(fieldOf(() => inchesToMm(Number.NaN))).toBe("inches");
    expect(fieldOf(() => mmToInches(Number.POSITIVE_INFINITY))).toBe("mm");
    expect(fieldOf(() => poundsToKg(Number.NaN))).toBe("pounds");
    expect(fieldOf(() => perThousandFeetToPerKm(Number.NaN))).toBe(
      "valuePerThousandFeet",
    );
  });

  it("refuse temperatures below absolute zero (0 K = −273.15 °C = −459.67 °F, SI Brochure)", () => {
    expect(fieldOf(() => celsiusToKelvin(-300))).toBe("celsius");
    expect(fieldOf(() => kelvinToCelsius(-1))).toBe("kelvin");
    expect(fieldOf(() => fahrenheitToCelsius(-500))).toBe("fahrenheit");
    expect(fieldOf(() => celsiusToFahrenheit(-273.2))).toBe("celsius");
    expect(celsiusToKelvin(-273.15)).toBe(0);
  });
});
