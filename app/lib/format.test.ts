import { afterEach, describe, expect, it } from "vitest";
import { defaultDisplaySettings, supportedLocales } from "./display-settings";
import {
  formatAmount,
  formatDateTime,
  formatDay,
  formatNumberForField,
  formatPriceText,
  formatQuantity,
  formatTimeOfDay,
  setBrowserDisplaySettings,
} from "./format";

// Expected texts worked by hand from the en-GB number format (comma thousands, point decimals).
describe("money and price texts", () => {
  it("writes an amount to the cent, grouped, without a currency", () => {
    expect(formatAmount(1234.5)).toBe("1,234.50");
    expect(formatAmount(0)).toBe("0.00");
  });

  it("writes a file's price with two to four places and no grouping", () => {
    expect(formatPriceText("14.2000")).toBe("14.20");
    expect(formatPriceText("0.85125")).toBe("0.8513");
    expect(formatPriceText("12345.6")).toBe("12345.60");
  });
});

describe("formatQuantity", () => {
  it("puts the unit beside the number, with a no-break space", () => {
    expect(formatQuantity(1.2345, "kg", 3)).toBe("1.235\u00a0kg");
    expect(formatQuantity(12500, "pcs")).toBe("12,500\u00a0pcs");
  });
});

describe("formatDateTime", () => {
  it("shows UTC so server and browser render the same text", () => {
    expect(formatDateTime(new Date("2026-12-02T14:05:00Z"))).toBe(
      "2 Dec 2026, 14:05 UTC",
    );
    expect(formatDateTime(null)).toBe("—");
  });
});

describe("formatDay and formatTimeOfDay", () => {
  it("write the day and the time of day as formatDateTime does", () => {
    expect(formatDay("2026-12-02")).toBe("2 Dec 2026");
    expect(formatDay("2026-12-02T23:59:00Z")).toBe("2 Dec 2026");
    expect(formatDay("2026-01-05T00:00:00.000Z")).toBe("5 Jan 2026");
    expect(formatTimeOfDay("2026-12-02T14:05:00Z")).toBe("14:05");
  });
});

// Local times checked with GNU date, e.g. `TZ=Europe/Berlin date -d 2026-12-02T14:05:00Z`
// → 15:05 CET; `TZ=Pacific/Auckland date -d 2026-12-02T14:05:00Z` → 3 Dec 03:05 NZDT.
// Number and day patterns as CLDR writes them (from memory of CLDR's de, fr, fi and
// en-US data: de "1.234,50" and "02.12.2026", fr "1 234,50" with a narrow no-break
// space, fi "1 234,50" with a no-break space and "2.12.2026", en-US "Dec 2, 2026").
describe("each person's locale and time zone", () => {
  afterEach(() => setBrowserDisplaySettings(defaultDisplaySettings));
  const at = new Date("2026-12-02T14:05:00Z");

  it("writes amounts with the locale's marks", () => {
    const amounts = Object.fromEntries(
      supportedLocales.map((locale) => {
        setBrowserDisplaySettings({ locale, timeZone: "UTC" });
        return [locale, formatAmount(1234.5)];
      }),
    );
    expect(amounts).toEqual({
      "en-GB": "1,234.50",
      "en-US": "1,234.50",
      "de-DE": "1.234,50",
      "fr-FR": "1\u202f234,50",
      "fi-FI": "1\u00a0234,50",
    });
  });

  it("shows a moment in the person's time zone, with the zone named", () => {
    setBrowserDisplaySettings({ locale: "de-DE", timeZone: "Europe/Berlin" });
    expect(formatDateTime(at)).toBe("2. Dez. 2026, 15:05 MEZ");
    expect(formatTimeOfDay(at)).toBe("15:05");
    setBrowserDisplaySettings({
      locale: "en-US",
      timeZone: "America/New_York",
    });
    expect(formatDateTime(at)).toBe("Dec 2, 2026, 9:05 AM EST");
    setBrowserDisplaySettings({
      locale: "en-GB",
      timeZone: "Pacific/Auckland",
    });
    // 14:05 UTC is already the next day in Auckland.
    expect(formatDay(at.toISOString())).toBe("3 Dec 2026");
  });

  it("keeps a calendar day the same day in every time zone", () => {
    setBrowserDisplaySettings({
      locale: "de-DE",
      timeZone: "Pacific/Auckland",
    });
    expect(formatDay("2026-12-02")).toBe("02.12.2026");
    setBrowserDisplaySettings({
      locale: "en-US",
      timeZone: "America/New_York",
    });
    expect(formatDay("2026-12-02")).toBe("Dec 2, 2026");
    setBrowserDisplaySettings({ locale: "fi-FI", timeZone: "Europe/Helsinki" });
    expect(formatDay("2026-12-02")).toBe("2.12.2026");
  });

  it("writes prices and quantities in the locale, field values without grouping", () => {
    setBrowserDisplaySettings({ locale: "de-DE", timeZone: "UTC" });
    expect(formatPriceText("14.2000")).toBe("14,20");
    expect(formatQuantity(1234.5, "kg", 3)).toBe("1.234,500\u00a0kg");
    expect(formatNumberForField(1250.5)).toBe("1250,5");
    expect(formatNumberForField("0.1250")).toBe("0,125");
  });
});
