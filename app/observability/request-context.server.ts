/**
 * What the server knows about the request being answered, reachable from any
 * code that runs for it (log lines, the guard) without passing it along:
 * an AsyncLocalStorage filled by server/app.ts for each request.
 */
import { AsyncLocalStorage } from "node:async_hooks";
import type { DisplaySettings } from "~/lib/display-settings";

export interface RequestContext {
  /** The id in the answer's X-Request-Id header (app/observability/request-id.ts). */
  readonly requestId: string;
  /** The signed-in person's user id, once the guard has resolved them. */
  personId: string | null;
  /** How the signed-in person reads numbers and times, for the pages they are sent (app/lib/format.ts). */
  display: DisplaySettings | null;
}

// One store per process, kept across the dev server's module reloads.
const globalForContext = globalThis as unknown as {
  turnledgerRequestContext?: AsyncLocalStorage<RequestContext>;
};
const storage = (globalForContext.turnledgerRequestContext ??=
  new AsyncLocalStorage<RequestContext>());

/** Runs `work` (and everything it starts) as part of the request `context`. */
export function runWithRequestContext<T>(
  context: RequestContext,
  work: () => T,
): T {
  return storage.run(context, work);
}

/** The request being answered, or undefined outside a request (scripts, timers). */
export function currentRequest(): RequestContext | undefined {
  return storage.getStore();
}

/** Records who is signed in for the request being answered (app/auth/guard.server.ts). */
export function noteSignedInPerson(personId: string): void {
  const context = storage.getStore();
  if (context) context.personId = personId;
}

/** Records how the signed-in person reads numbers and times, for the page being answered. */
export function noteDisplaySettings(settings: DisplaySettings): void {
  const context = storage.getStore();
  if (context) context.display = settings;
}
