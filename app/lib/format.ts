/** The one place numbers, quantities and times are formatted for people. */

const dateTimeFormat = new Intl.DateTimeFormat("en-GB", {
  dateStyle: "medium",
  timeStyle: "short",
  timeZone: "UTC",
});

/** A time as "2 Dec 2026, 14:05 UTC". Server and browser agree, so pages hydrate cleanly. */
export function formatDateTime(
  value: Date | string | null | undefined,
): string {
  if (!value) return "—";
  const date = typeof value === "string" ? new Date(value) : value;
  return `${dateTimeFormat.format(date)} UTC`;
}

/** A number with its unit, e.g. formatQuantity(1.2345, "kg", 3) → "1.235 kg". */
export function formatQuantity(
  value: number,
  unit: string,
  decimals = 0,
): string {
  const number = value.toLocaleString("en-GB", {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  });
  return unit ? `${number}\u00a0${unit}` : number;
}
