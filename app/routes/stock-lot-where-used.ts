import type { Route } from "./+types/stock-lot-where-used";
import { requireUser } from "~/auth/guard.server";
import { findLot, lotIdFromPath } from "~/lots/lot-details.server";
import { csvName, lotWhereUsedCsv } from "~/lots/where-used-csv";
import { lotWhereUsed } from "~/lots/where-used.server";

/** GET /stock/lots/:lotId/where-used.csv — the lot's build orders, issues net of returns, as CSV. */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = lotIdFromPath(params.lotId);
  const lot = id === null ? null : await findLot(id);
  if (!lot)
    return new Response("No such lot.\n", {
      status: 404,
      headers: { "Content-Type": "text/plain; charset=utf-8" },
    });
  const { uses } = await lotWhereUsed(lot.id, lot.item.unit);
  return new Response(
    lotWhereUsedCsv({ number: lot.number, sku: lot.item.sku }, uses),
    {
      headers: {
        "Content-Type": "text/csv; charset=utf-8",
        "Content-Disposition": `attachment; filename="${csvName("lot", lot.item.sku, lot.number, "where-used")}"`,
        "Cache-Control": "no-store",
      },
    },
  );
}
