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

/**
 * The day of a time, or a calendar day ("2026-12-02"), as people read it: "2 Dec 2026"
 * (formatDateTime without the time of day).
 */
export function formatDay(value: string): string {
  const time = /^\d{4}-\d{2}-\d{2}$/.test(value) ? `${value}T00:00:00Z` : value;
  return formatDateTime(time).split(", ")[0] ?? value;
}

/** The time of day of a time: "14:05" (UTC; the caller says so). */
export function formatTimeOfDay(value: string): string {
  return (formatDateTime(value).split(", ")[1] ?? "").replace(" UTC", "");
}

/** Money in the company currency, to the cent, without the currency: "1,234.50". */
export function formatAmount(value: number): string {
  return formatQuantity(value, "", 2);
}

/** A price as a file gives it, "14.2000" → "14.20": at least two places, the rest only where they count. */
export function formatPriceText(decimal: string): string {
  return Number(decimal).toLocaleString("en-GB", {
    minimumFractionDigits: 2,
    maximumFractionDigits: 4,
    useGrouping: false,
  });
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
