/** A person's locale and time zone, as stored on their row (app/db/tables/accounts.ts). */
import { and, eq, isNull } from "drizzle-orm";
import { db } from "~/db/client.server";
import { users } from "~/db/schema";
import { retryWriteConflicts } from "~/db/write-transaction.server";
import {
  closestSupportedLocale,
  isTimeZone,
  type DisplaySettings,
} from "~/lib/display-settings";

/** Saves the person's choice from the account page. */
export async function saveDisplaySettings(
  userId: string,
  settings: DisplaySettings,
): Promise<void> {
  await retryWriteConflicts(
    () =>
      db
        .update(users)
        .set({ locale: settings.locale, timeZone: settings.timeZone })
        .where(eq(users.id, userId)),
    { label: "display settings" },
  );
}

/**
 * At sign-in, what the browser says (navigator.languages, its time zone) fills in
 * whatever the person has not chosen yet; a choice made on the account page stays.
 * Unknown or unsupported values are ignored: the defaults apply.
 */
export async function adoptBrowserDisplaySettings(
  userId: string,
  browser: { languages: string; timeZone: string },
): Promise<void> {
  const locale = closestSupportedLocale(
    browser.languages
      .split(",")
      .map((tag) => tag.trim())
      .filter((tag) => tag !== "")
      .slice(0, 10),
  );
  const timeZone = isTimeZone(browser.timeZone) ? browser.timeZone : null;
  if (locale === null && timeZone === null) return;
  await retryWriteConflicts(
    async () => {
      if (locale !== null)
        await db
          .update(users)
          .set({ locale })
          .where(and(eq(users.id, userId), isNull(users.locale)));
      if (timeZone !== null)
        await db
          .update(users)
          .set({ timeZone })
          .where(and(eq(users.id, userId), isNull(users.timeZone)));
    },
    { label: "display settings from the browser" },
  );
}
