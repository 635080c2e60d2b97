import { formatNumber } from "~/lib/format";
/**
 * The settings of readiness and stopping, read from the environment and
 * checked: a wrong value is refused with a message that says what to write,
 * never read as some other number (server.js refuses to start on one).
 *
 * - READY_OUTBOX_MAX_AGE_MINUTES (default 30; 0 turns the check off): /readyz
 *   answers 503 once the oldest unsent e-mail has waited longer than this.
 * - SHUTDOWN_GRACE_MS (default 20,000): how long a stopping server lets
 *   requests in flight finish before it closes their connections.
 *
 * See docs/decisions/026-readiness-and-graceful-stop.md for the defaults.
 */

export interface OperatingSettings {
  /** Minutes the oldest unsent e-mail may wait before the server is not ready; null: never. */
  outboxMaxAgeMinutes: number | null;
  /** Milliseconds requests in flight get to finish once the server is told to stop. */
  shutdownGraceMs: number;
}

export const defaultOutboxMaxAgeMinutes = 30;
export const defaultShutdownGraceMs = 20_000;

/** A whole number from `min` to `max`, the default when unset or blank, else a message. */
function wholeNumber(
  name: string,
  setting: string | undefined,
  fallback: number,
  range: { min: number; max: number; unit: string; hint: string },
): number | string {
  if (setting === undefined || setting.trim() === "") return fallback;
  const value = Number(setting.trim());
  if (
    !/^\d+$/.test(setting.trim()) ||
    !Number.isSafeInteger(value) ||
    value < range.min ||
    value > range.max
  )
    return `${name} must be a whole number of ${range.unit} from ${range.min} to ${range.max} (got "${setting}"); ${range.hint}`;
  return value;
}

/** The settings, or the problems with them (each a sentence naming the variable). */
export function readOperatingSettings(env: NodeJS.ProcessEnv = process.env): {
  settings: OperatingSettings;
  problems: string[];
} {
  const outbox = wholeNumber(
    "READY_OUTBOX_MAX_AGE_MINUTES",
    env.READY_OUTBOX_MAX_AGE_MINUTES,
    defaultOutboxMaxAgeMinutes,
    {
      min: 0,
      max: 10_080,
      unit: "minutes",
      hint: `leave it unset for ${defaultOutboxMaxAgeMinutes}, or 0 to leave the outbox out of readiness.`,
    },
  );
  const grace = wholeNumber(
    "SHUTDOWN_GRACE_MS",
    env.SHUTDOWN_GRACE_MS,
    defaultShutdownGraceMs,
    {
      min: 0,
      max: 600_000,
      unit: "milliseconds",
      hint: `leave it unset for ${formatNumber(defaultShutdownGraceMs)}, and keep it below the time your service manager waits before it kills the process.`,
    },
  );
  const problems = [outbox, grace].filter(
    (value): value is string => typeof value === "string",
  );
  return {
    settings: {
      outboxMaxAgeMinutes:
        typeof outbox === "number"
          ? outbox === 0
            ? null
            : outbox
          : defaultOutboxMaxAgeMinutes,
      shutdownGraceMs:
        typeof grace === "number" ? grace : defaultShutdownGraceMs,
    },
    problems,
  };
}
