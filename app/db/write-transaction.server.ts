/**
 * The one way to run a write transaction: `writeTransaction(work)` runs `work` in a
 * transaction of the one database client and, when MariaDB rolled it back because of
 * other writers (a deadlock, a lock wait timeout, a Galera certification conflict —
 * `write-conflicts.ts` says which errors and why), runs the whole of `work` again in a
 * new transaction, a bounded number of times with jittered backoff. After the last
 * attempt it throws `DatabaseBusyError`, which every route answers with 503 "busy, try
 * again" (server/database-unavailable.ts).
 *
 * Rules for `work` (docs/decisions/027-retries-and-galera-safe-statements.md):
 * - read everything a decision rests on inside it, through `tx`: nothing from a failed
 *   attempt may be carried into the next (no outer variables assigned and kept);
 * - no side effect that must happen once (SMTP, alerts' e-mail hand-off, anything
 *   outside the database) inside it: do those after `writeTransaction` returns.
 *
 * `db.transaction` is not called anywhere else in app/ (an ESLint rule says so).
 */
import type { MySqlTransactionConfig } from "drizzle-orm/mysql-core";
import { areaLogger } from "~/observability/logger.server";
import { countTransactionRetry } from "~/observability/metrics.server";
import { db, type Transaction } from "./client.server";
import {
  runWithRetries,
  type ConflictReason,
  type RetryHooks,
} from "./write-conflicts";

export interface WriteTransactionOptions {
  /** The transaction's isolation level (the build-order transactions use READ COMMITTED). */
  isolationLevel?: MySqlTransactionConfig["isolationLevel"];
  /** What the transaction does, for the log when it is retried ("stock movement"). */
  label?: string;
}

const retryLog = areaLogger("db");

function noteRetry(label: string | undefined) {
  return (reason: ConflictReason, retry: number, delayMs: number) => {
    countTransactionRetry(reason);
    retryLog.info(
      { transaction: label ?? "write transaction", reason, retry, delayMs },
      "write transaction retried",
    );
  };
}

/** Runs `work` in one transaction, all of it again on a write conflict; see the module comment. */
export function writeTransaction<T>(
  work: (tx: Transaction) => Promise<T>,
  options: WriteTransactionOptions = {},
): Promise<T> {
  const config = options.isolationLevel
    ? { isolationLevel: options.isolationLevel }
    : undefined;
  // eslint-disable-next-line no-restricted-syntax -- the one place a transaction begins
  return runWithRetries(() => db.transaction(work, config), {
    onRetry: noteRetry(options.label),
  });
}

/**
 * The same retries for work that is not one `db.transaction`: a single statement on a
 * hot row (an atomic counter's upsert), or the price-list import's transaction on its
 * own connection. `attempt` must begin, write and commit (or roll back) on its own.
 */
export function retryWriteConflicts<T>(
  attempt: () => Promise<T>,
  options: Pick<WriteTransactionOptions, "label"> &
    Pick<RetryHooks, "policy"> = {},
): Promise<T> {
  return runWithRetries(attempt, {
    policy: options.policy,
    onRetry: noteRetry(options.label),
  });
}
