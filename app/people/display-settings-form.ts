/**
 * The account page's choice of locale and time zone, checked the same way in the
 * browser and on the server. Pure.
 */
import { z } from "zod";
import {
  isTimeZone,
  maxTimeZoneLength,
  supportedLocales,
} from "~/lib/display-settings";

export const displaySettingsSchema = z.object({
  locale: z.enum(supportedLocales, {
    error: "Choose one of the listed ways of writing numbers and days.",
  }),
  timeZone: z
    .string({ error: "Choose a time zone." })
    .max(maxTimeZoneLength, "Choose a time zone from the list.")
    .refine(isTimeZone, "Choose a time zone from the list."),
});

/** Every time zone this runtime knows, UTC first, then by name. */
export function timeZoneChoices(): string[] {
  const zones = Intl.supportedValuesOf("timeZone").filter(
    (zone) => zone !== "UTC",
  );
  return ["UTC", ...zones];
}
