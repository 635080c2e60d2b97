/**
 * Gathers what /readyz decides on (app/operations/readiness.ts): the
 * stopping flag, whether the database answers, its migrations against this
 * build's, and the outbox's oldest unsent e-mail. Each database question has
 * a time limit, so a load balancer's probe gets an answer before its own
 * timeout. Why the server is not ready goes to the server's log (once per
 * change, not on every probe); the caller sees states only.
 */
import { poolFigures } from "~/db/pool-figures.server";
import { schemaStatus } from "~/db/schema-version.server";
import { outboxBacklog } from "~/mail/outbox-backlog.server";
import { areaLogger } from "~/observability/logger.server";
import { readOperatingSettings } from "./operating-settings";
import {
  judgeReadiness,
  type Readiness,
  type ReadinessFacts,
} from "./readiness";
import { isStopping } from "./server-stopping";

const healthLog = areaLogger("health");

/** Longest wait for each database question: below a load balancer's usual 5 s probe timeout. */
const questionTimeoutMs = 2_000;

class NoAnswerInTime extends Error {}

async function answerInTime<T>(question: Promise<T>): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  try {
    return await Promise.race([
      question,
      new Promise<never>((_resolve, reject) => {
        timer = setTimeout(
          () =>
            reject(
              new NoAnswerInTime(
                `no answer within ${questionTimeoutMs / 1000} s`,
              ),
            ),
          questionTimeoutMs,
        );
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

/** What the database answered last time it did, for a probe that finds the pool full. */
let lastAnswered: Pick<ReadinessFacts, "schema" | "oldestUnsentAt"> | null =
  null;

/** The facts, asking the database only what the answers before allow. */
async function gatherFacts(now: Date): Promise<ReadinessFacts> {
  const facts: ReadinessFacts = {
    stopping: isStopping(),
    databaseUp: null,
    schema: null,
    oldestUnsentAt: undefined,
    outboxMaxAgeMinutes: readOperatingSettings().settings.outboxMaxAgeMinutes,
    now,
  };
  // A stopping server is not ready whatever the database says; its pool is closing.
  if (facts.stopping) return facts;
  try {
    facts.schema = (await answerInTime(schemaStatus())).kind;
    // The outbox table is as this version knows it only when the database
    // has all of this version's migrations (ahead: a newer one's on top).
    const knownTables = facts.schema === "current" || facts.schema === "newer";
    if (knownTables && facts.outboxMaxAgeMinutes !== null)
      facts.oldestUnsentAt = (
        await answerInTime(outboxBacklog())
      ).oldestUnsentAt;
    facts.databaseUp = true;
    lastAnswered = {
      schema: facts.schema,
      oldestUnsentAt: facts.oldestUnsentAt,
    };
  } catch (error) {
    // Every connection lent out and requests queued: the questions waited for
    // a connection, not for the database, which is busy answering them. A
    // load balancer that took every busy server out would turn load into an
    // outage, so the last answers stand.
    if (
      error instanceof NoAnswerInTime &&
      lastAnswered &&
      poolFigures().waiting > 0
    ) {
      healthLog.warn(
        "/readyz: every database connection is busy; the last answers stand",
      );
      return { ...facts, databaseUp: true, ...lastAnswered };
    }
    // The reason goes to the server's log, never to the caller: a driver's
    // message names hosts, users and databases.
    healthLog.error({ err: error }, "/readyz: the database did not answer");
    facts.databaseUp = false;
    facts.schema = null;
    facts.oldestUnsentAt = undefined;
  }
  return facts;
}

/** What the log last said about readiness, so a change is logged once. */
let lastLogged = "ready";

/** Why the server is not ready, in words an operator can act on. */
function reasons(readiness: Readiness): string {
  return readiness.failed
    .map((name) => {
      const check = readiness.checks[name];
      if (name === "outbox" && "oldestUnsentMinutes" in check)
        return `outbox stuck (the oldest unsent e-mail has waited ${check.oldestUnsentMinutes} min, more than READY_OUTBOX_MAX_AGE_MINUTES=${check.maxAgeMinutes}; see the admin's Outbox and run npm run mail:retry)`;
      if (name === "migrations")
        return check.state === "behind"
          ? "migrations behind (run npm run db:migrate with this version)"
          : "migrations foreign (the database was migrated by another line of Turnledger, or DATABASE_URL names the wrong database)";
      return `${name} ${check.state}`;
    })
    .join("; ");
}

function logChange(readiness: Readiness) {
  const ahead = readiness.checks.migrations.state === "ahead";
  const summary = !readiness.ready
    ? reasons(readiness)
    : ahead
      ? "ready, migrations ahead"
      : "ready";
  if (summary === lastLogged) return;
  lastLogged = summary;
  if (readiness.ready && ahead)
    healthLog.warn(
      "/readyz: a newer version has migrated the database; this server still serves but will refuse to start again: replace it with the new version",
    );
  else if (readiness.ready) healthLog.info("/readyz: ready again");
  else
    healthLog.warn(
      { failed: readiness.failed, checks: readiness.checks },
      `/readyz: not ready: ${summary}`,
    );
}

/** Whether this server should be sent requests now, and why not. */
export async function checkReadiness(now = new Date()): Promise<Readiness> {
  const readiness = judgeReadiness(await gatherFacts(now));
  logChange(readiness);
  return readiness;
}
