/**
 * How much mail is waiting in the outbox, and since when: for the readiness
 * check (/readyz, "is mail stuck?") and the metrics.
 *
 * A message is waiting until SMTP has accepted it (`sent_at` set by
 * app/mail/mailer.server.ts). That includes messages SMTP refused that
 * `npm run mail:retry` will try again; it leaves out the ones the retry has
 * given up on after {@link deliveryAttemptsBeforeGivingUp} tries, which stay
 * on the admin's Outbox page and are nobody's backlog any more (else a single
 * address that never accepts mail would hold the backlog "stuck" for ever).
 */
import { and, count, isNull, lt, min } from "drizzle-orm";
import { db } from "~/db/client.server";
import { mailOutbox } from "~/db/schema";

/** The tries after which `retryUnsentMail` (app/mail/mailer.server.ts) leaves a message alone; keep the two the same. */
export const deliveryAttemptsBeforeGivingUp = 50;

export interface OutboxBacklog {
  /** Messages SMTP has not accepted yet and that will still be tried. */
  unsent: number;
  /** When the oldest of them was queued; null when none waits. */
  oldestUnsentAt: Date | null;
}

/**
 * The one query behind {@link outboxBacklog}. The index
 * `mail_outbox_unsent_idx` (sent_at, created_at) finds the unsent rows
 * without reading the sent ones, however many years of sent mail the table
 * holds (tests/integration/readiness.test.ts reads the query plan).
 */
export function outboxBacklogQuery() {
  return db
    .select({ unsent: count(), oldestUnsentAt: min(mailOutbox.createdAt) })
    .from(mailOutbox)
    .where(
      and(
        isNull(mailOutbox.sentAt),
        lt(mailOutbox.attempts, deliveryAttemptsBeforeGivingUp),
      ),
    );
}

/** The outbox's backlog now. */
export async function outboxBacklog(): Promise<OutboxBacklog> {
  const [row] = await outboxBacklogQuery();
  // MIN() is read through the column, so it arrives as a Date (UTC).
  return {
    unsent: row?.unsent ?? 0,
    oldestUnsentAt: row?.oldestUnsentAt ?? null,
  };
}
