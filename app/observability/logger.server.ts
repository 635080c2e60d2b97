/**
 * The server's one logger (pino): JSON lines on stdout, one per request
 * (server/app.ts) and one per event worth an operator's eye, each with the
 * request id of the request it happened in. Development (`npm run dev`) gets
 * pino-pretty's readable lines instead; a production server never loads it.
 * LOG_LEVEL sets the level (default info). See docs/decisions/024.
 *
 * What is never logged: request bodies, query strings, headers. The redaction
 * below is the second line of defence for fields that carry secrets should
 * one reach a log call (an error's SQL parameters, a header object).
 */
import pino, { type Logger } from "pino";
import { currentRequest } from "./request-context.server";

const censor = "[redacted]";

/** Paths pino blanks out wherever they appear in a log line. */
export const redactedPaths = [
  "password",
  "*.password",
  "token",
  "*.token",
  "oneTimeLink",
  "*.oneTimeLink",
  "link",
  "*.link",
  "headers.authorization",
  "headers.cookie",
  'headers["set-cookie"]',
  "*.headers.authorization",
  "*.headers.cookie",
  '*.headers["set-cookie"]',
  // A failed query's values (mysql2 `sql` with the values filled in,
  // Drizzle's `params`) may hold a password hash, a token hash or an e-mail.
  "err.sql",
  "err.params",
  "err.cause.sql",
  "err.cause.params",
];

/**
 * Drizzle writes a failed query's values into the error's message (and so its
 * stack): "Failed query: …\nparams: a@b.example,…". They are cut out here;
 * the query itself, with its placeholders, stays.
 */
function withoutQueryValues(text: unknown): unknown {
  if (typeof text !== "string") return text;
  return text.replace(
    /\nparams: [\s\S]*?(?=\n {4}at |\ncaused by: |$)/,
    `\nparams: ${censor}`,
  );
}

/** pino's error serializer (type, message, stack, cause), without query values. */
function serializeError(error: unknown) {
  const serialized = pino.stdSerializers.err(error as Error) as unknown;
  if (!serialized || typeof serialized !== "object") return serialized;
  const fields = serialized as Record<string, unknown>;
  return {
    ...fields,
    message: withoutQueryValues(fields.message),
    stack: withoutQueryValues(fields.stack),
  };
}

function createLogger(): Logger {
  const developing = process.env.NODE_ENV === "development";
  return pino({
    level: process.env.LOG_LEVEL || "info",
    timestamp: pino.stdTimeFunctions.isoTime,
    redact: { paths: redactedPaths, censor },
    serializers: { err: serializeError },
    // Every line written while answering a request names it.
    mixin() {
      const request = currentRequest();
      return request ? { requestId: request.requestId } : {};
    },
    // pino-pretty is a development dependency, resolved by name in pino's
    // worker thread only here: a production install does not need it.
    transport: developing
      ? {
          target: "pino-pretty",
          options: {
            translateTime: "SYS:HH:MM:ss.l",
            ignore: "pid,hostname",
            singleLine: true,
          },
        }
      : undefined,
  });
}

// One logger per process, kept across the dev server's module reloads.
const globalForLogger = globalThis as unknown as {
  turnledgerLogger?: Logger;
};

export const logger = (globalForLogger.turnledgerLogger ??= createLogger());

export { withoutQueryValues };

/** A logger for one area of the app ("db", "mail", "alerts", "http"…): its lines carry `area`. */
export function areaLogger(area: string): Logger {
  return logger.child({ area });
}

const errorLog = areaLogger("errors");
const loggedErrors = new WeakSet<object>();

/**
 * Logs an unexpected error with its stack, once: React Router's handleError,
 * the streaming renderer and the page wrappers may each see the same error,
 * and only the first of them writes it.
 */
export function logServerError(error: unknown, message: string): void {
  if (typeof error === "object" && error !== null) {
    if (loggedErrors.has(error)) return;
    loggedErrors.add(error);
  }
  errorLog.error({ err: error }, message);
}
