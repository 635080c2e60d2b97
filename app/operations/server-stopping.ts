/**
 * Whether this server process has been told to stop (SIGTERM or SIGINT,
 * server.js). Set once and never cleared: /readyz answers 503 from then on,
 * so a load balancer takes the server out while its last requests finish.
 *
 * Kept on globalThis, as the database pool is (app/db/client.server.ts): the
 * dev server reloads modules, and server.js and the routes must see one flag.
 */
const state = globalThis as unknown as { turnledgerStoppingSince?: Date };

/** Marks the process as stopping; a second call keeps the first time. */
export function markStopping(now = new Date()): void {
  state.turnledgerStoppingSince ??= now;
}

/** True once the process has been told to stop. */
export function isStopping(): boolean {
  return state.turnledgerStoppingSince !== undefined;
}
