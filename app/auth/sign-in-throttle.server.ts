import { and, asc, count, eq, gte, lt } from "drizzle-orm";
import { db } from "~/db/client.server";
import { failedSignIns } from "~/db/schema";

/** After this many failures for one e-mail from one address within the window, refuse. */
export const maxFailedSignIns = 5;
export const throttleWindowMs = 15 * 60 * 1000;

function normalise(email: string): string {
  return email.trim().toLowerCase();
}

/** Seconds until the next attempt is allowed, or 0 when it is allowed now. */
export async function signInRetryAfterSeconds(
  email: string,
  ipAddress: string,
): Promise<number> {
  const since = new Date(Date.now() - throttleWindowMs);
  const where = and(
    eq(failedSignIns.email, normalise(email)),
    eq(failedSignIns.ipAddress, ipAddress),
    gte(failedSignIns.attemptedAt, since),
  );
  const [counted] = await db
    .select({ failures: count() })
    .from(failedSignIns)
    .where(where);
  const failures = counted?.failures ?? 0;
  if (failures < maxFailedSignIns) return 0;
  // The window frees up when the oldest failure that still counts falls out of it.
  const [oldest] = await db
    .select({ attemptedAt: failedSignIns.attemptedAt })
    .from(failedSignIns)
    .where(where)
    .orderBy(asc(failedSignIns.attemptedAt))
    .offset(failures - maxFailedSignIns)
    .limit(1);
  const freeAt =
    (oldest?.attemptedAt.getTime() ?? Date.now()) + throttleWindowMs;
  return Math.max(1, Math.ceil((freeAt - Date.now()) / 1000));
}

export async function recordFailedSignIn(
  email: string,
  ipAddress: string,
): Promise<void> {
  await db.insert(failedSignIns).values({
    email: normalise(email).slice(0, 254),
    ipAddress,
    attemptedAt: new Date(),
  });
  // Keep the table small: rows older than the window never count again.
  await db
    .delete(failedSignIns)
    .where(
      lt(
        failedSignIns.attemptedAt,
        new Date(Date.now() - 2 * throttleWindowMs),
      ),
    );
}

export async function clearFailedSignIns(
  email: string,
  ipAddress: string,
): Promise<void> {
  await db
    .delete(failedSignIns)
    .where(
      and(
        eq(failedSignIns.email, normalise(email)),
        eq(failedSignIns.ipAddress, ipAddress),
      ),
    );
}
