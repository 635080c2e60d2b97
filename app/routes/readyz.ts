import { checkReadiness } from "~/operations/readiness.server";

/**
 * GET /readyz → whether a load balancer should send this server requests:
 * 200 `{ status: "ready", checks }`, or 503 `{ status: "not ready", failed,
 * checks }` with Retry-After while the server is stopping, the database does
 * not answer, its migrations are not this version's, or the outbox is stuck
 * (app/operations/readiness.ts). Anyone may ask, like /healthz (the liveness
 * check): it tells states and minutes, never hosts or error messages.
 */
export async function loader() {
  const { ready, failed, checks } = await checkReadiness();
  const headers = { "Cache-Control": "no-store" };
  if (ready) return Response.json({ status: "ready", checks }, { headers });
  return Response.json(
    { status: "not ready", failed, checks },
    { status: 503, headers: { ...headers, "Retry-After": "5" } },
  );
}
