/**
 * Telling "the database is down or unreachable" apart from every other
 * database error. Such an error is answered with 503 "database unavailable"
 * (JSON for /api/…, the error page otherwise), never with 500: see
 * docs/decisions/013-database-and-mail-faults.md.
 */

/** What the user reads while the database cannot be reached. */
export const databaseUnavailableMessage =
  "The database is unavailable. Try again in a moment.";

/** Error codes mysql2 reports when the database cannot be reached or went away. */
const unavailableCodes = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ECONNABORTED",
  "ETIMEDOUT",
  "EPIPE",
  "ENOTFOUND",
  "EHOSTUNREACH",
  "PROTOCOL_CONNECTION_LOST",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  // The server is shutting down, or ended this connection on its way down.
  "ER_SERVER_SHUTDOWN",
  "ER_CONNECTION_KILLED",
  "ER_CON_COUNT_ERROR",
]);

/**
 * A Galera node that is up but not part of the cluster's primary component
 * (joining, catching up by IST/SST, or cut off from the majority) refuses
 * every query with 1047 ER_UNKNOWN_COM_ERROR "WSREP has not yet prepared node
 * for application use": for the app, its database is unavailable until the
 * node is Synced (docs/decisions/028-galera-test-cluster.md).
 */
function isGaleraNodeNotReady(error: unknown): boolean {
  const { code, sqlMessage, message } = error as {
    code?: unknown;
    sqlMessage?: unknown;
    message?: unknown;
  };
  return (
    code === "ER_UNKNOWN_COM_ERROR" &&
    /WSREP/.test(String(sqlMessage ?? message))
  );
}

/** True when an error means "the database is down or unreachable". */
export function isDatabaseUnavailable(error: unknown): boolean {
  let current: unknown = error;
  for (let depth = 0; current && depth < 5; depth += 1) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && unavailableCodes.has(code)) return true;
    if (isGaleraNodeNotReady(current)) return true;
    // mysql2 marks errors that end the connection (network, protocol) as fatal.
    if ((current as { fatal?: unknown }).fatal === true) return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
}

/**
 * A short account of why the database is unavailable, for the log: the code and
 * message of the driver's error, never the (possibly huge) query the
 * query builder wraps around it.
 */
export function unavailableReason(error: unknown): string {
  let current: unknown = error;
  for (let depth = 0; current && depth < 5; depth += 1) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" || (current as { fatal?: unknown }).fatal) {
      const message = (current as { message?: unknown }).message;
      return `${typeof code === "string" ? code : "fatal"}: ${String(message).slice(0, 200)}`;
    }
    current = (current as { cause?: unknown }).cause;
  }
  return "unknown";
}

/** True when an insert or update broke a unique key. */
export function isDuplicateKey(error: unknown): boolean {
  let current: unknown = error;
  for (let depth = 0; current && depth < 5; depth += 1) {
    if ((current as { code?: unknown }).code === "ER_DUP_ENTRY") return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
}
