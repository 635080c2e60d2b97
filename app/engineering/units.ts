/**
 * Unit conversions with exact defining factors.
 *
 * - 1 in = 25.4 mm exactly and 1 ft = 0.3048 m exactly (international yard and
 *   pound agreement, 1959).
 * - 1 lb = 0.45359237 kg exactly (same agreement).
 * - T[K] = T[°C] + 273.15 and T[°F] = T[°C] · 9/5 + 32 (SI Brochure, BIPM).
 *
 * Every conversion refuses NaN and ±Infinity, and the temperature conversions refuse a
 * temperature below absolute zero, with an {@link EngineeringInputError} naming the
 * argument.
 */

import { EngineeringInputError, requireFinite } from "./errors";

/** Throws when `kelvin` is below absolute zero (0 K). */
function requireAboveAbsoluteZero(kelvin: number, field: string): void {
  if (kelvin < 0) {
    throw new EngineeringInputError(
      field,
      "The temperature cannot be below absolute zero (−273.15 °C, −459.67 °F, 0 K).",
    );
  }
}

/** Millimetres in one inch (exact). */
export const MM_PER_INCH = 25.4;
/** Metres in one foot (exact). */
export const METRES_PER_FOOT = 0.3048;
/** Kilograms in one avoirdupois pound (exact). */
export const KG_PER_POUND = 0.45359237;
/** Kelvin at 0 °C (exact). */
export const KELVIN_AT_ZERO_CELSIUS = 273.15;

/** Inches → millimetres. */
export function inchesToMm(inches: number): number {
  requireFinite(inches, "inches", "The value");
  return inches * MM_PER_INCH;
}

/** Millimetres → inches. */
export function mmToInches(mm: number): number {
  requireFinite(mm, "mm", "The value");
  return mm / MM_PER_INCH;
}

/** Feet → metres. */
export function feetToMetres(feet: number): number {
  requireFinite(feet, "feet", "The value");
  return feet * METRES_PER_FOOT;
}

/** Metres → feet. */
export function metresToFeet(metres: number): number {
  requireFinite(metres, "metres", "The value");
  return metres / METRES_PER_FOOT;
}

/** Pounds (avoirdupois) → kilograms. */
export function poundsToKg(pounds: number): number {
  requireFinite(pounds, "pounds", "The value");
  return pounds * KG_PER_POUND;
}

/** Kilograms → pounds (avoirdupois). */
export function kgToPounds(kg: number): number {
  requireFinite(kg, "kg", "The value");
  return kg / KG_PER_POUND;
}

/** Degrees Celsius → degrees Fahrenheit. */
export function celsiusToFahrenheit(celsius: number): number {
  requireFinite(celsius, "celsius", "The value");
  requireAboveAbsoluteZero(celsius + KELVIN_AT_ZERO_CELSIUS, "celsius");
  return (celsius * 9) / 5 + 32;
}

/** Degrees Fahrenheit → degrees Celsius. */
export function fahrenheitToCelsius(fahrenheit: number): number {
  requireFinite(fahrenheit, "fahrenheit", "The value");
  const celsius = ((fahrenheit - 32) * 5) / 9;
  requireAboveAbsoluteZero(celsius + KELVIN_AT_ZERO_CELSIUS, "fahrenheit");
  return celsius;
}

/** Degrees Celsius → kelvin. */
export function celsiusToKelvin(celsius: number): number {
  requireFinite(celsius, "celsius", "The value");
  requireAboveAbsoluteZero(celsius + KELVIN_AT_ZERO_CELSIUS, "celsius");
  return celsius + KELVIN_AT_ZERO_CELSIUS;
}

/** Kelvin → degrees Celsius. */
export function kelvinToCelsius(kelvin: number): number {
  requireFinite(kelvin, "kelvin", "The value");
  requireAboveAbsoluteZero(kelvin, "kelvin");
  return kelvin - KELVIN_AT_ZERO_CELSIUS;
}

/**
 * A linear quantity per 1000 ft → the same quantity per km (e.g. Ω/1000 ft → Ω/km).
 * 1000 ft = 0.3048 km, so multiply by 1/0.3048.
 */
export function perThousandFeetToPerKm(valuePerThousandFeet: number): number {
  requireFinite(valuePerThousandFeet, "valuePerThousandFeet", "The value");
  return valuePerThousandFeet / METRES_PER_FOOT;
}

/** A linear quantity per km → the same quantity per 1000 ft (e.g. Ω/km → Ω/1000 ft). */
export function perKmToPerThousandFeet(valuePerKm: number): number {
  requireFinite(valuePerKm, "valuePerKm", "The value");
  return valuePerKm * METRES_PER_FOOT;
}
