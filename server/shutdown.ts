/**
 * What server.js calls to stop the app gracefully (on SIGTERM or SIGINT), and
 * the checks of the settings that govern it. Re-exported by server/app.ts, so
 * the built server carries it (server.js cannot import app code directly).
 *
 * `stopGracefully`: marks the process as stopping (/readyz answers 503 from
 * then on), drains the HTTP server (server/http-drain.ts) for up to
 * SHUTDOWN_GRACE_MS, waits a few seconds more for e-mail being handed to SMTP
 * (a message not handed over stays unsent in the outbox for
 * `npm run mail:retry`: nothing is lost), and closes the database pool (a
 * transaction still open is rolled back by MariaDB). Bounded throughout, so a
 * service manager's kill (systemd's 90 s, a container's 30 s) never comes
 * first with the default grace. See docs/decisions/026-readiness-and-graceful-stop.md.
 */
import { pool } from "~/db/client.server";
import { deliveriesFinished } from "~/mail/mailer.server";
import { readOperatingSettings } from "~/operations/operating-settings";
import { markStopping } from "~/operations/server-stopping";
import type { HttpDrain } from "./http-drain";

export { HttpDrain } from "./http-drain";

/** Longest wait for e-mail deliveries under way once the requests are done. */
const mailDeliveryWaitMs = 5_000;
/** Longest wait for the pool's connections to say goodbye to MariaDB. */
const poolCloseWaitMs = 3_000;

/** Why this server must not start with its readiness and stopping settings; empty when it may. */
export function operatingSettingProblems(
  env: NodeJS.ProcessEnv = process.env,
): string[] {
  return readOperatingSettings(env).problems;
}

/** True when `work` finished within `ms`. */
async function finishedWithin(work: Promise<unknown>, ms: number) {
  let timer: NodeJS.Timeout | undefined;
  try {
    return await Promise.race([
      work.then(() => true),
      new Promise<false>((resolve) => {
        timer = setTimeout(() => resolve(false), ms);
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

let poolClosing: Promise<void> | undefined;

/** Ends the app's database pool once (its connections close after their current statement). */
export function closeDatabasePool(): Promise<void> {
  poolClosing ??= pool.end();
  return poolClosing;
}

/** Where stopping reports what it does: the app's logger (pino's call shape). */
export interface StopLog {
  info(fields: object, message: string): void;
  warn(fields: object, message: string): void;
}

/** Stops the app as described above; resolves when it may exit. */
export async function stopGracefully(
  drain: HttpDrain,
  signal: string,
  log: StopLog,
): Promise<void> {
  markStopping();
  const graceMs = readOperatingSettings().settings.shutdownGraceMs;
  log.info(
    { signal, graceMs, requestsInFlight: drain.requestsInFlight },
    `${signal}: stopping; requests in flight get up to ${graceMs / 1000} s (SHUTDOWN_GRACE_MS)`,
  );
  const { finishedInTime, cutOff } = await drain.stop(graceMs);
  if (!finishedInTime)
    log.warn(
      { cutOff, graceMs },
      `${cutOff} request(s) still unanswered after ${graceMs / 1000} s were cut off; their open transactions are rolled back`,
    );
  if (!(await finishedWithin(deliveriesFinished(), mailDeliveryWaitMs)))
    log.warn(
      {},
      "e-mail still being handed to SMTP is left unsent in the outbox; `npm run mail:retry` sends it",
    );
  if (!(await finishedWithin(closeDatabasePool(), poolCloseWaitMs)))
    log.warn(
      {},
      "the database pool did not close in time; MariaDB rolls back what was left open",
    );
}
