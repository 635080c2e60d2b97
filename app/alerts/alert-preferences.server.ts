/** Each person's choice of how to hear about low stock (see app/alerts/low-stock.ts alertModeOf). */
import { eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { alertPreferences } from "~/db/schema";
import type { AlertMailMode } from "~/db/tables/alert-enums";

export async function alertPreferenceOf(
  userId: string,
): Promise<AlertMailMode | null> {
  const [row] = await db
    .select({ mode: alertPreferences.mode })
    .from(alertPreferences)
    .where(eq(alertPreferences.userId, userId))
    .limit(1);
  return row?.mode ?? null;
}

export async function setAlertPreference(
  userId: string,
  mode: AlertMailMode,
): Promise<void> {
  await db
    .insert(alertPreferences)
    .values({ userId, mode })
    .onDuplicateKeyUpdate({ set: { mode } });
}
