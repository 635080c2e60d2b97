/**
 * Counting attempts (sign-in guesses, reset requests) per rule and subject in
 * fixed windows, in the database so every app process sees the same counts.
 * A count is taken with one atomic upsert before the attempt is made, so
 * parallel requests each see their own number and never more of them pass
 * than the limit allows (docs/decisions/017).
 */
import { and, eq, lt, or, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  retryWriteConflicts,
  writeTransaction,
} from "~/db/write-transaction.server";
import { attemptCounters, type attemptRules } from "~/db/schema";

export type AttemptRule = (typeof attemptRules)[number];

export interface AttemptLimit {
  rule: AttemptRule;
  /** Attempts allowed in one window. */
  limit: number;
  windowMs: number;
}

export interface CountedAttempt {
  rule: AttemptRule;
  subject: string;
  /** This attempt's number in its window, 1 for the first. */
  attempts: number;
  windowEndsAt: Date;
}

export interface LimitedAttempts {
  counted: CountedAttempt[];
  /** The first limit this attempt went over, and when its window ends; null when within every limit. */
  over: { rule: AttemptRule; retryAfterSeconds: number } | null;
}

const subjectOf = (subject: string) => subject.slice(0, 254);

/** Counts one attempt under each limit's subject, in one transaction, and says whether it went over any. */
export async function countAttempts(
  attempts: { limit: AttemptLimit; subject: string }[],
): Promise<LimitedAttempts> {
  await pruneEndedWindows(new Date());
  // Parallel upserts of one new key can deadlock; a retry counts afresh at its own time.
  const counted = await writeTransaction(
    async (tx) => {
      const now = new Date();
      const rows = attempts.map(
        ({ limit, subject }) =>
          sql`(${limit.rule}, ${subjectOf(subject)}, 1, ${new Date(now.getTime() + limit.windowMs)})`,
      );
      // Assignments run left to right: `attempts` still sees the old window end.
      await tx.execute(sql`
        INSERT INTO attempt_counters (rule, subject, attempts, window_ends_at)
        VALUES ${sql.join(rows, sql`, `)}
        ON DUPLICATE KEY UPDATE
          attempts = IF(window_ends_at <= ${now}, 1, attempts + 1),
          window_ends_at = IF(window_ends_at <= ${now}, VALUES(window_ends_at), window_ends_at)`);
      // The rows stay locked by this transaction: what it reads is its own count.
      return tx
        .select()
        .from(attemptCounters)
        .where(
          or(
            ...attempts.map(({ limit, subject }) => keyIs(limit.rule, subject)),
          ),
        );
    },
    { label: "attempt count" },
  );
  const inOrder = attempts.map(({ limit, subject }) => {
    const row = counted.find(
      (candidate) =>
        candidate.rule === limit.rule &&
        candidate.subject === subjectOf(subject),
    );
    if (!row) throw new Error(`No count for ${limit.rule} after counting it.`);
    return row;
  });
  const overIndex = attempts.findIndex(
    ({ limit }, index) => inOrder[index]!.attempts > limit.limit,
  );
  const overRow = inOrder[overIndex];
  return {
    counted: inOrder,
    over: overRow
      ? {
          rule: overRow.rule,
          retryAfterSeconds: Math.max(
            1,
            Math.ceil((overRow.windowEndsAt.getTime() - Date.now()) / 1000),
          ),
        }
      : null,
  };
}

/** Takes counted attempts back (the attempt was not made after all), in their own window only. */
export async function releaseAttempts(
  counted: readonly CountedAttempt[],
): Promise<void> {
  if (counted.length === 0) return;
  await retryWriteConflicts(
    () =>
      db
        .update(attemptCounters)
        .set({ attempts: sql`GREATEST(${attemptCounters.attempts} - 1, 0)` })
        .where(
          or(
            ...counted.map((attempt) =>
              and(
                keyIs(attempt.rule, attempt.subject),
                eq(attemptCounters.windowEndsAt, attempt.windowEndsAt),
              ),
            ),
          ),
        ),
    { label: "attempt release" },
  );
}

/** Forgets every attempt counted for a subject under a rule. */
export async function clearAttempts(
  rule: AttemptRule,
  subject: string,
): Promise<void> {
  await retryWriteConflicts(
    () => db.delete(attemptCounters).where(keyIs(rule, subject)),
    { label: "attempt clear" },
  );
}

function keyIs(rule: AttemptRule, subject: string) {
  return and(
    eq(attemptCounters.rule, rule),
    eq(attemptCounters.subject, subjectOf(subject)),
  );
}

/** Rows whose window ended are counted afresh anyway: removed once a minute per process, a day late. */
let lastPruned = 0;
async function pruneEndedWindows(now: Date): Promise<void> {
  if (now.getTime() - lastPruned < 60_000) return;
  lastPruned = now.getTime();
  await retryWriteConflicts(
    () =>
      db
        .delete(attemptCounters)
        .where(
          lt(
            attemptCounters.windowEndsAt,
            new Date(now.getTime() - 24 * 60 * 60 * 1000),
          ),
        ),
    { label: "attempt prune" },
  );
}
