/**
 * Quantities as the reference and estimator pages show them, built on the
 * one formatter (formatQuantity), so the unit always stands beside the number.
 */
import { formatQuantity } from "~/lib/format";

/** Decimals that show `significant` significant figures of `value` (never negative). */
export function decimalsForSignificant(
  value: number,
  significant: number,
): number {
  if (value === 0 || !Number.isFinite(value)) return 0;
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  return Math.max(0, significant - 1 - magnitude);
}

/** A value to `significant` significant figures with its unit: 0.0005093 mm², 107.2 mm². */
export function formatSignificant(
  value: number,
  unit: string,
  significant = 4,
): string {
  return formatQuantity(
    value,
    unit,
    decimalsForSignificant(value, significant),
  );
}

/** A mass given in kg: grams below 1 kg (7.50 g), kilograms above (1.250 kg). */
export function formatMass(kg: number): string {
  if (kg < 1)
    return formatQuantity(
      kg * 1000,
      "g",
      kg * 1000 < 10 ? 2 : kg * 1000 < 100 ? 1 : 0,
    );
  return formatQuantity(kg, "kg", 3);
}

/** A range with one unit: "1.28–1.32 T"; one value when both ends agree. */
export function formatRange(
  min: number,
  max: number,
  unit: string,
  decimals: number,
): string {
  if (min === max) return formatQuantity(min, unit, decimals);
  return `${formatQuantity(min, "", decimals)}–${formatQuantity(max, unit, decimals)}`;
}

/** A temperature coefficient given per kelvin, shown in %/K: −0.0012 → "−0.120 %/K". */
export function formatPercentPerKelvin(perK: number, decimals = 3): string {
  return formatQuantity(perK * 100, "%/K", decimals).replace(/^-/, "−");
}
