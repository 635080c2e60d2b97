/**
 * When a write transaction is run again, and how long to wait first: the pure half of
 * `write-transaction.server.ts` (no database, no framework), tested beside itself.
 *
 * A transaction is retried when MariaDB rolled it back because of other writers, and
 * only then:
 *
 * - 1213 `ER_LOCK_DEADLOCK` — InnoDB chose it as a deadlock's victim, and also what a
 *   Galera node answers when the transaction lost certification to a conflicting write
 *   set committed on another node ("Deadlock: wsrep aborted transaction", SQLSTATE
 *   40001; MariaDB's Galera test results `galera_certification_double_failure.result`,
 *   `galera_bf_abort.result`). MariaDB's error reference: "try restarting transaction".
 * - 1205 `ER_LOCK_WAIT_TIMEOUT` — it waited `innodb_lock_wait_timeout` for a row lock
 *   another transaction held. InnoDB rolls back only the statement by default; the
 *   helper rolls back the rest before trying again.
 *
 * Not retried (see docs/decisions/027): 1180 `ER_ERROR_DURING_COMMIT` (MariaDB's
 * reference lists a backup lock, disk and engine errors; on Galera a write set larger
 * than `wsrep_max_ws_size` — none goes away by running the same transaction again),
 * 1047 `ER_UNKNOWN_COM_ERROR` "WSREP has not yet prepared node for application use" (the
 * node left the primary component: that is an outage of this node, not a conflict).
 */

/** What the user reads when the retries ran out. */
export const databaseBusyMessage =
  "The database is busy with other changes. Try again in a moment.";

/** Seconds a client is asked to wait before sending the change again. */
export const databaseBusyRetryAfterSeconds = 2;

export type ConflictReason = "deadlock" | "lock_wait_timeout";

const conflictByErrno = new Map<number, ConflictReason>([
  [1213, "deadlock"],
  [1205, "lock_wait_timeout"],
]);
const conflictByCode = new Map<string, ConflictReason>([
  ["ER_LOCK_DEADLOCK", "deadlock"],
  ["ER_LOCK_WAIT_TIMEOUT", "lock_wait_timeout"],
]);

/**
 * Why MariaDB rolled the transaction back because of other writers, or null for any
 * other error. Looks through the query builder's wrapping (`cause`) to the driver's error.
 */
export function conflictReasonOf(error: unknown): ConflictReason | null {
  let current: unknown = error;
  for (let depth = 0; current && depth < 5; depth += 1) {
    const { errno, code } = current as { errno?: unknown; code?: unknown };
    if (typeof errno === "number" && conflictByErrno.has(errno))
      return conflictByErrno.get(errno)!;
    if (typeof code === "string" && conflictByCode.has(code))
      return conflictByCode.get(code)!;
    current = (current as { cause?: unknown }).cause;
  }
  return null;
}

/** Thrown when a write transaction lost to other writers on every attempt: answered 503. */
export class DatabaseBusyError extends Error {
  readonly attempts: number;
  readonly reason: ConflictReason;
  constructor(attempts: number, reason: ConflictReason, cause: unknown) {
    super(databaseBusyMessage, { cause });
    this.name = "DatabaseBusyError";
    this.attempts = attempts;
    this.reason = reason;
  }
}

export function isDatabaseBusy(error: unknown): error is DatabaseBusyError {
  return error instanceof DatabaseBusyError;
}

export interface RetryPolicy {
  /** Attempts in all, the first included. */
  maxAttempts: number;
  /** The ceiling of the first wait, in ms; each later ceiling is twice the one before. */
  baseDelayMs: number;
  /** No wait is longer than this. */
  maxDelayMs: number;
  /**
   * Lock wait timeouts allowed before giving up: each one has already waited
   * `innodb_lock_wait_timeout` (50 s by default), so a few are plenty.
   */
  maxLockWaitTimeouts: number;
}

/**
 * Eight attempts, waits of at most 15, 30, 60 … 800 ms (about 1.75 s in all at worst).
 * More than the usual five: on a Galera cluster every app server's transactions on one
 * hot balance row certify against each other, and a request that loses several rounds
 * in a row under a burst should still get its answer rather than a 503.
 */
export const defaultRetryPolicy: RetryPolicy = {
  maxAttempts: 8,
  baseDelayMs: 15,
  maxDelayMs: 800,
  maxLockWaitTimeouts: 3,
};

/**
 * The wait before retry number `retry` (1 for the first retry): "equal jitter" — half of
 * the exponential ceiling plus a random part of the other half, so transactions that
 * collided spread out instead of colliding again, and none retries at once
 * (M. Brooker, "Exponential Backoff And Jitter", AWS Architecture Blog, 2015).
 */
export function retryDelayMs(
  retry: number,
  policy: RetryPolicy = defaultRetryPolicy,
  random: () => number = Math.random,
): number {
  const ceiling = Math.min(
    policy.maxDelayMs,
    policy.baseDelayMs * 2 ** Math.max(0, retry - 1),
  );
  return Math.round(ceiling / 2 + random() * (ceiling / 2));
}

export interface RetryHooks {
  policy?: RetryPolicy;
  sleep?: (ms: number) => Promise<void>;
  random?: () => number;
  /** Told before every retry (for counting and logging). */
  onRetry?: (reason: ConflictReason, retry: number, delayMs: number) => void;
}

const sleepFor = (ms: number) =>
  new Promise<void>((resolve) => setTimeout(resolve, ms));

/**
 * Runs `attempt` until it succeeds, throws an error that is not a conflict (thrown on
 * unchanged), or has lost `maxAttempts` times or timed out waiting for a lock
 * `maxLockWaitTimeouts` times (then `DatabaseBusyError`). `attempt` must
 * be whole: it begins its transaction, reads what it decides on, writes and commits.
 */
export async function runWithRetries<T>(
  attempt: () => Promise<T>,
  hooks: RetryHooks = {},
): Promise<T> {
  const policy = hooks.policy ?? defaultRetryPolicy;
  const sleep = hooks.sleep ?? sleepFor;
  let lockWaitTimeouts = 0;
  for (let attemptNumber = 1; ; attemptNumber += 1) {
    try {
      return await attempt();
    } catch (error) {
      const reason = conflictReasonOf(error);
      if (reason === null) throw error;
      if (reason === "lock_wait_timeout") lockWaitTimeouts += 1;
      if (
        attemptNumber >= policy.maxAttempts ||
        lockWaitTimeouts >= policy.maxLockWaitTimeouts
      )
        throw new DatabaseBusyError(attemptNumber, reason, error);
      const delay = retryDelayMs(attemptNumber, policy, hooks.random);
      hooks.onRetry?.(reason, attemptNumber, delay);
      await sleep(delay);
    }
  }
}
