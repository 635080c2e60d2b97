import { describe, expect, it } from "vitest";
import {
  closestSupportedLocale,
  displaySettingsOf,
  isTimeZone,
} from "./display-settings";

describe("display settings", () => {
  it("takes the closest supported locale a browser asks for", () => {
    expect(closestSupportedLocale(["de-AT", "en-US"])).toBe("en-US");
    expect(closestSupportedLocale(["de-AT"])).toBe("de-DE");
    expect(closestSupportedLocale(["fi"])).toBe("fi-FI");
    expect(closestSupportedLocale(["en"])).toBe("en-GB");
    expect(closestSupportedLocale(["ja-JP"])).toBeNull();
    expect(closestSupportedLocale([])).toBeNull();
  });

  it("knows IANA time zone names and refuses others", () => {
    expect(isTimeZone("Europe/Helsinki")).toBe(true);
    expect(isTimeZone("UTC")).toBe(true);
    expect(isTimeZone("Mars/Olympus_Mons")).toBe(false);
    expect(isTimeZone("")).toBe(false);
    expect(isTimeZone("x".repeat(65))).toBe(false);
  });

  it("fills what a person has not chosen with en-GB and UTC", () => {
    expect(displaySettingsOf({ locale: null, timeZone: null })).toEqual({
      locale: "en-GB",
      timeZone: "UTC",
    });
    expect(
      displaySettingsOf({ locale: "fr-FR", timeZone: "Europe/Paris" }),
    ).toEqual({ locale: "fr-FR", timeZone: "Europe/Paris" });
    expect(displaySettingsOf({ locale: "xx-XX", timeZone: "Nowhere" })).toEqual(
      { locale: "en-GB", timeZone: "UTC" },
    );
  });
});
