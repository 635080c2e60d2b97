/** Error codes mysql2 reports when the database cannot be reached. */
const unavailableCodes = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "PROTOCOL_CONNECTION_LOST",
  "ER_SERVER_SHUTDOWN",
  "ER_CON_COUNT_ERROR",
  "PROTOCOL_SEQUENCE_TIMEOUT",
  "ENOTFOUND",
  "EHOSTUNREACH",
]);

/** True when an error means "the database is down or unreachable". */
export function isDatabaseUnavailable(error: unknown): boolean {
  let current: unknown = error;
  for (let depth = 0; current && depth < 5; depth += 1) {
    const code = (current as { code?: unknown }).code;
    if (typeof code === "string" && unavailableCodes.has(code)) return true;
    if ((current as { fatal?: unknown }).fatal === true) return true;
    current = (current as { cause?: unknown }).cause;
  }
  return false;
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
