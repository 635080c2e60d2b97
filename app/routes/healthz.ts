import { sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { areaLogger } from "~/observability/logger.server";

const healthLog = areaLogger("health");

/** GET /healthz → { status, database } for load balancers: 200 when the database answers, else 503. */
export async function loader() {
  const started = performance.now();
  try {
    await db.execute(sql`SELECT 1`);
    return Response.json(
      {
        status: "ok",
        database: {
          state: "up",
          latencyMs: Math.round(performance.now() - started),
        },
      },
      { headers: { "Cache-Control": "no-store" } },
    );
  } catch (error) {
    // The reason goes to the server's log, never to the caller: anyone may
    // ask /healthz, and a driver's message names hosts, users and databases.
    healthLog.error({ err: error }, "/healthz: the database did not answer");
    return Response.json(
      { status: "unavailable", database: { state: "down" } },
      {
        status: 503,
        headers: { "Cache-Control": "no-store", "Retry-After": "5" },
      },
    );
  }
}
