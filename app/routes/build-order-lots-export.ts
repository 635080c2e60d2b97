import type { Route } from "./+types/build-order-lots-export";
import { requireUser } from "~/auth/guard.server";
import { buildOrderReference } from "~/build-orders/build-order-status";
import { idFromText } from "~/lib/search-params";
import { buildOrderLotsCsv, csvName } from "~/lots/where-used-csv";
import { buildOrderExists, buildOrderLots } from "~/lots/where-used.server";

/** GET /build-orders/:orderId/lots.csv — every lot that went into the order, issues net of returns, as CSV. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = idFromText(params.orderId);
  if (id === null || !(await buildOrderExists(id)))
    return new Response("No such build order.\n", {
      status: 404,
      headers: { "Content-Type": "text/plain; charset=utf-8" },
    });
  const reference = buildOrderReference(id);
  return new Response(buildOrderLotsCsv(reference, await buildOrderLots(id)), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${csvName(reference, "lots")}"`,
      "Cache-Control": "no-store",
    },
  });
}
