/**
 * Whether this server should be sent requests (/readyz), decided from facts
 * gathered elsewhere (app/operations/readiness.server.ts), so the rule can be
 * tested without a database. Ready when all of these hold:
 *
 * - the server has not been told to stop (it is finishing its last requests);
 * - the database answers;
 * - the database has this build's migrations: not behind (`npm run db:migrate`
 *   has not run) and not foreign (the wrong database, or an edited migration).
 *   Ahead — a newer version migrated the database while this server runs — is
 *   still ready, with the state shown: during an upgrade the old servers keep
 *   serving while the new ones start (most releases only add tables and
 *   columns; README "Upgrading"), and taking them all out of the load balancer
 *   at the moment of `db:migrate` would stop the shop. An old server that
 *   restarts refuses to start against it (server/deployment-checks.ts);
 * - the outbox is not stuck: its oldest unsent e-mail has waited no longer
 *   than the limit (READY_OUTBOX_MAX_AGE_MINUTES; none when the check is off).
 *
 * What it reports is safe for anyone to read: states and minutes, never a
 * host, a driver's message or a migration's name.
 */

import type { SchemaStatus } from "~/db/migration-history";

/** How the database's migrations compare with the build's (app/db/schema-version.server.ts). */
export type SchemaKind = SchemaStatus["kind"];

export interface ReadinessFacts {
  stopping: boolean;
  /** Null when the database was not asked (the server is stopping). */
  databaseUp: boolean | null;
  /** Null when not known (the database was down or not asked). */
  schema: SchemaKind | null;
  /** When the oldest unsent e-mail was queued: null when none waits, undefined when not known. */
  oldestUnsentAt: Date | null | undefined;
  /** The limit in minutes; null when the outbox check is off. */
  outboxMaxAgeMinutes: number | null;
  now: Date;
}

export type CheckName = "server" | "database" | "migrations" | "outbox";

export interface Readiness {
  ready: boolean;
  /** The checks that failed, in the order they are listed in `checks`. */
  failed: CheckName[];
  checks: {
    server: { ok: boolean; state: "running" | "stopping" };
    database: { ok: boolean; state: "up" | "down" | "not checked" };
    migrations: {
      ok: boolean;
      state: "current" | "behind" | "ahead" | "foreign" | "not checked";
    };
    outbox: {
      ok: boolean;
      state: "flowing" | "stuck" | "not checked" | "off";
      /** Whole minutes the oldest unsent e-mail has waited; null when none waits. */
      oldestUnsentMinutes?: number | null;
      maxAgeMinutes?: number;
    };
  };
}

const schemaStates = {
  current: "current",
  older: "behind",
  newer: "ahead",
  foreign: "foreign",
} as const;

const minute = 60_000;

export function judgeReadiness(facts: ReadinessFacts): Readiness {
  const checks: Readiness["checks"] = {
    server: facts.stopping
      ? { ok: false, state: "stopping" }
      : { ok: true, state: "running" },
    database:
      facts.databaseUp === null
        ? { ok: false, state: "not checked" }
        : { ok: facts.databaseUp, state: facts.databaseUp ? "up" : "down" },
    migrations:
      facts.schema === null
        ? { ok: false, state: "not checked" }
        : {
            ok: facts.schema === "current" || facts.schema === "newer",
            state: schemaStates[facts.schema],
          },
    outbox: outboxCheck(facts),
  };
  // A check that could not run is not a reason of its own: the one that
  // stopped it (stopping, or the database down) is.
  const failed = (Object.keys(checks) as CheckName[]).filter(
    (name) => !checks[name].ok && checks[name].state !== "not checked",
  );
  const ready = Object.values(checks).every((check) => check.ok);
  return { ready, failed: ready ? [] : failed, checks };
}

function outboxCheck(facts: ReadinessFacts): Readiness["checks"]["outbox"] {
  if (facts.outboxMaxAgeMinutes === null) return { ok: true, state: "off" };
  const maxAgeMinutes = facts.outboxMaxAgeMinutes;
  if (facts.oldestUnsentAt === undefined)
    return { ok: false, state: "not checked", maxAgeMinutes };
  if (facts.oldestUnsentAt === null)
    return {
      ok: true,
      state: "flowing",
      oldestUnsentMinutes: null,
      maxAgeMinutes,
    };
  const waitedMs = Math.max(
    0,
    facts.now.getTime() - facts.oldestUnsentAt.getTime(),
  );
  const stuck = waitedMs > maxAgeMinutes * minute;
  return {
    ok: !stuck,
    state: stuck ? "stuck" : "flowing",
    oldestUnsentMinutes: Math.floor(waitedMs / minute),
    maxAgeMinutes,
  };
}
