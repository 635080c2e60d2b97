/**
 * How a person reads numbers, money, days and times: their locale and time zone,
 * chosen on the account page. Stored values stay exact and UTC; only what is shown
 * (app/lib/format.ts) and what is typed in number fields (app/lib/number-text.ts)
 * follow these. Pure: runs in Node and in the browser.
 */

/** The locales a person can choose, in the order the account page lists them. */
export const supportedLocales = [
  "en-GB",
  "en-US",
  "de-DE",
  "fr-FR",
  "fi-FI",
] as const;

export type SupportedLocale = (typeof supportedLocales)[number];

/** Each locale as its own speakers name it, with the English name for everyone else. */
export const localeLabels: Record<SupportedLocale, string> = {
  "en-GB": "English (United Kingdom)",
  "en-US": "English (United States)",
  "de-DE": "Deutsch (Deutschland) — German",
  "fr-FR": "Français (France) — French",
  "fi-FI": "Suomi (Suomi) — Finnish",
};

export interface DisplaySettings {
  locale: SupportedLocale;
  /** An IANA time zone name, "Europe/Helsinki"; "UTC" until the person chooses. */
  timeZone: string;
}

/** What everyone sees until they choose: British English and UTC. */
export const defaultDisplaySettings: DisplaySettings = {
  locale: "en-GB",
  timeZone: "UTC",
};

export function isSupportedLocale(value: unknown): value is SupportedLocale {
  return (
    typeof value === "string" &&
    (supportedLocales as readonly string[]).includes(value)
  );
}

/** The longest time zone name we store (IANA names are far shorter). */
export const maxTimeZoneLength = 64;

/** True for a time zone this runtime's Intl knows ("Europe/Berlin", "UTC"). */
export function isTimeZone(value: unknown): value is string {
  if (typeof value !== "string" || value === "") return false;
  if (value.length > maxTimeZoneLength) return false;
  try {
    new Intl.DateTimeFormat("en-GB", { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

/**
 * The supported locale closest to what a browser asks for (navigator.languages):
 * the exact tag first, then the same language ("de-AT" → "de-DE", "en" → "en-GB"),
 * else null.
 */
export function closestSupportedLocale(
  requested: readonly string[],
): SupportedLocale | null {
  for (const tag of requested) {
    const exact = supportedLocales.find(
      (locale) => locale.toLowerCase() === tag.toLowerCase(),
    );
    if (exact) return exact;
  }
  for (const tag of requested) {
    const language = tag.split("-")[0]?.toLowerCase();
    const sameLanguage = supportedLocales.find(
      (locale) => locale.split("-")[0] === language,
    );
    if (sameLanguage) return sameLanguage;
  }
  return null;
}

/** A person's stored choices (null where they have not chosen) with the defaults filled in. */
export function displaySettingsOf(stored: {
  locale: string | null;
  timeZone: string | null;
}): DisplaySettings {
  return {
    locale: isSupportedLocale(stored.locale)
      ? stored.locale
      : defaultDisplaySettings.locale,
    timeZone: isTimeZone(stored.timeZone)
      ? stored.timeZone
      : defaultDisplaySettings.timeZone,
  };
}

/** The decimal mark and the thousands separator a locale writes. */
export function numberMarksOf(locale: SupportedLocale): {
  decimal: "." | ",";
  group: "," | "." | " ";
} {
  switch (locale) {
    case "en-GB":
    case "en-US":
      return { decimal: ".", group: "," };
    case "de-DE":
      return { decimal: ",", group: "." };
    case "fr-FR":
    case "fi-FI":
      return { decimal: ",", group: " " };
  }
}
