import { count, isNull, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { mailOutbox, users } from "~/db/schema";

/** The admin's start-page figures: people by state and mail waiting to go out. */
export async function adminFigures() {
  const [people] = await db
    .select({
      active: sql<number>`SUM(${users.active} = 1 AND ${users.passwordHash} IS NOT NULL)`,
      pending: sql<number>`SUM(${users.active} = 1 AND ${users.passwordHash} IS NULL)`,
      deactivated: sql<number>`SUM(${users.active} = 0)`,
    })
    .from(users);
  const [mail] = await db
    .select({ unsent: count() })
    .from(mailOutbox)
    .where(isNull(mailOutbox.sentAt));
  return {
    activePeople: Number(people?.active ?? 0),
    pendingInvitations: Number(people?.pending ?? 0),
    deactivatedPeople: Number(people?.deactivated ?? 0),
    unsentMail: mail?.unsent ?? 0,
  };
}
