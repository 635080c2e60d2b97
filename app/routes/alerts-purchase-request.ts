import { data } from "react-router";
import type { Route } from "./+types/alerts-purchase-request";
import { purchaseRequestCsv } from "~/alerts/low-stock";
import { purchaseRequestsBySupplier } from "~/alerts/purchase-requests.server";
import { requireCapability } from "~/auth/guard.server";
import { todayUtc } from "~/lib/calendar-days";

/** GET /alerts/purchase-request.csv?supplier=Name (buyer, admin): the supplier's draft purchase request. */
export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "draftPurchaseRequests");
  const supplier = new URL(request.url).searchParams.get("supplier") ?? "";
  const lines = (await purchaseRequestsBySupplier()).get(supplier);
  if (!lines)
    throw data(
      {
        message: `No item with an open alert is quoted by "${supplier}".`,
      },
      { status: 404 },
    );
  const fileName = `purchase-request-${supplier.replace(/[^A-Za-z0-9-]+/g, "-").slice(0, 60)}-${todayUtc()}.csv`;
  return new Response(purchaseRequestCsv(lines), {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "X-Content-Type-Options": "nosniff",
    },
  });
}
