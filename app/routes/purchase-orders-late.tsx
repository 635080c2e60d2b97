import type { Route } from "./+types/purchase-orders-late";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { lateLineColumns } from "~/components/purchase-orders/open-line-columns";
import { formatDay, formatQuantity } from "~/lib/format";
import { pageFromSearch, readPageOrLast } from "~/lib/search-params";
import { todayUtc } from "~/lib/calendar-days";
import {
  lateLinesPageSize,
  listLateLines,
} from "~/purchase-orders/open-order-lines.server";

/** Every open order line whose expected day has passed, longest late first (everyone signed in reads it). */
export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const today = todayUtc();
  const { lines, total, page, pageCount } = await readPageOrLast(
    pageFromSearch(new URL(request.url).searchParams.get("page")),
    lateLinesPageSize,
    (page) => listLateLines({ today, page }),
  );
  return { today, lines, total, page, pageCount };
}

export const meta: Route.MetaFunction = () => [
  { title: "Late order lines · Turnledger" },
];

export default function LateOrderLines({ loaderData }: Route.ComponentProps) {
  const { today, lines, total, page, pageCount } = loaderData;
  return (
    <div className="space-y-4">
      <div>
        <h1 className="text-2xl font-semibold">Late order lines</h1>
        <p className="mt-1 max-w-3xl text-sm text-graphite-700">
          Lines of sent orders whose expected day has passed and that have not
          arrived in full, as of {formatDay(today)} (UTC). A line is expected on
          its requested day, else on the order day plus the lead time. Chase the
          supplier, or close the order short when the rest will not come.
        </p>
      </div>
      <DataTable
        caption={`${formatQuantity(total, total === 1 ? "late line" : "late lines")}, longest late first`}
        columns={lateLineColumns}
        rows={lines}
        page={page}
        pageCount={pageCount}
        pageHref={(next) => `?page=${next}`}
        emptyText="No order line is late."
      />
    </div>
  );
}
