/**
 * The one place numbers, quantities, days and times are formatted for people, in the
 * locale and time zone of the person reading (app/lib/display-settings.ts).
 *
 * Whose settings apply is asked of one source, so that no page passes them along:
 * - on the server, the request being answered (app/lib/display-settings.server.ts
 *   installs a source that reads the person the guard signed in; API requests and
 *   scripts get the defaults, en-GB and UTC);
 * - in the browser, the settings the app shell rendered with (useDisplaySettings
 *   in app/routes/app-shell.tsx), so hydration sees the same texts as the server.
 *
 * CSV files, PDFs for suppliers and the API never use this module: they write
 * machine-neutral ISO days and times and plain decimals.
 */
import {
  defaultDisplaySettings,
  type DisplaySettings,
} from "./display-settings";

let browserSettings: DisplaySettings = defaultDisplaySettings;
let settingsSource: () => DisplaySettings = () => browserSettings;

/** The server's source of settings: the request being answered (display-settings.server.ts). */
export function setDisplaySettingsSource(source: () => DisplaySettings): void {
  settingsSource = source;
}

/** In the browser: the signed-in person's settings, set by the app shell before its page renders. */
export function setBrowserDisplaySettings(settings: DisplaySettings): void {
  browserSettings = settings;
}

/** The settings texts are formatted in right now. */
export function currentDisplaySettings(): DisplaySettings {
  return settingsSource();
}

/** Intl formatters are costly to build: one per locale, time zone and options. */
const formatterCache = new Map<
  string,
  Intl.NumberFormat | Intl.DateTimeFormat
>();

/**
 * The number formatter for `options`, which `name` stands for (each caller's own short
 * name: the options are not serialised on every call, as this runs for every number shown).
 */
function numberFormat(
  name: string,
  options: Intl.NumberFormatOptions,
  locale = currentDisplaySettings().locale,
): Intl.NumberFormat {
  const key = `n|${locale}|${name}`;
  let format = formatterCache.get(key) as Intl.NumberFormat | undefined;
  if (!format) {
    format = new Intl.NumberFormat(locale, options);
    formatterCache.set(key, format);
  }
  return format;
}

function dateFormat(
  options: Intl.DateTimeFormatOptions,
  settings: DisplaySettings,
): Intl.DateTimeFormat {
  const key = `d|${settings.locale}|${settings.timeZone}|${JSON.stringify(options)}`;
  let format = formatterCache.get(key) as Intl.DateTimeFormat | undefined;
  if (!format) {
    format = new Intl.DateTimeFormat(settings.locale, {
      ...options,
      timeZone: settings.timeZone,
    });
    formatterCache.set(key, format);
  }
  return format;
}

const dateTimeOptions: Intl.DateTimeFormatOptions = {
  day: "numeric",
  month: "short",
  year: "numeric",
  hour: "numeric",
  minute: "2-digit",
  timeZoneName: "short",
};

function toDate(value: Date | string): Date {
  return typeof value === "string" ? new Date(value) : value;
}

const calendarDayPattern = /^\d{4}-\d{2}-\d{2}$/;

/**
 * A moment with its zone, in the reader's locale and time zone:
 * "2 Dec 2026, 14:05 UTC" (en-GB, UTC), "2. Dez. 2026, 15:05 MEZ" (de-DE, Berlin).
 */
export function formatDateTime(
  value: Date | string | null | undefined,
): string {
  if (!value) return "—";
  return dateFormat(dateTimeOptions, currentDisplaySettings()).format(
    toDate(value),
  );
}

/** How much of a day to write: all of it, or the parts a chart axis or column header needs. */
const dayStyles = {
  /** "2 Dec 2026", "Dec 2, 2026", "02.12.2026". */
  medium: { dateStyle: "medium" },
  /** "2 Dec", "Dec 2", "2. Dez.". */
  dayMonth: { day: "numeric", month: "short" },
  /** "Dec 2026", "Dez. 2026". */
  monthYear: { month: "short", year: "numeric" },
  /** "Dec 26", "Dez. 26". */
  monthShortYear: { month: "short", year: "2-digit" },
} as const satisfies Record<string, Intl.DateTimeFormatOptions>;

export type DayStyle = keyof typeof dayStyles;

/**
 * A calendar day ("2026-12-02") or the day of a moment, as the reader writes days:
 * "2 Dec 2026", "Dec 2, 2026", "02.12.2026". A calendar day is the same day
 * everywhere; a moment falls on its day in the reader's time zone.
 */
export function formatDay(
  value: string | Date,
  style: DayStyle = "medium",
): string {
  const settings = currentDisplaySettings();
  if (typeof value === "string" && calendarDayPattern.test(value)) {
    return dateFormat(dayStyles[style], {
      locale: settings.locale,
      timeZone: "UTC",
    }).format(new Date(`${value}T00:00:00Z`));
  }
  return dateFormat(dayStyles[style], settings).format(toDate(value));
}

/** The time of day of a moment in the reader's time zone: "14:05", "2:05 PM". */
export function formatTimeOfDay(value: string | Date): string {
  return dateFormat(
    { hour: "numeric", minute: "2-digit" },
    currentDisplaySettings(),
  ).format(toDate(value));
}

/** The reader's time zone as a short name beside a time: "UTC", "MEZ", "UTC+2". */
export function timeZoneLabel(at: Date = new Date()): string {
  const parts = dateFormat(
    { timeZoneName: "short" },
    currentDisplaySettings(),
  ).formatToParts(at);
  return parts.find((part) => part.type === "timeZoneName")?.value ?? "";
}

/** Money in the company currency, to the cent, without the currency: "1,234.50", "1.234,50". */
export function formatAmount(value: number): string {
  return formatQuantity(value, "", 2);
}

/**
 * A price as a file gives it, "14.2000" → "14.20" ("14,20" in de-DE): at least two
 * places, the rest only where they count, no grouping.
 */
export function formatPriceText(decimal: string): string {
  return numberFormat("price", {
    minimumFractionDigits: 2,
    maximumFractionDigits: 4,
    useGrouping: false,
  }).format(Number(decimal));
}

/** A number with its unit, e.g. formatQuantity(1.2345, "kg", 3) → "1.235 kg" ("1,235 kg" in de-DE). */
export function formatQuantity(
  value: number,
  unit: string,
  decimals = 0,
): string {
  const number = numberFormat(`fixed ${decimals}`, {
    minimumFractionDigits: decimals,
    maximumFractionDigits: decimals,
  }).format(value);
  return unit ? `${number}\u00a0${unit}` : number;
}

/** A number with up to `maxDecimals` places, only those that count: 2.5 → "2.5", 1234 → "1,234". */
export function formatNumber(value: number, maxDecimals = 3): string {
  return numberFormat(`up to ${maxDecimals}`, {
    maximumFractionDigits: maxDecimals,
  }).format(value);
}

/**
 * A number as the reader types it back into a field: their decimal mark, every
 * place the value has and no grouping, so reading it again gives the same value
 * ("1,25" in de-DE, never "1.250", which there reads as a thousands group).
 */
export function formatNumberForField(
  value: number | string | null | undefined,
): string {
  if (value === null || value === undefined || value === "") return "";
  const number = typeof value === "number" ? value : Number(value);
  if (!Number.isFinite(number)) return String(value);
  return numberFormat("field", {
    maximumFractionDigits: 20,
    useGrouping: false,
  }).format(number);
}
