/** The build-order list's status filter: all orders, or the orders of one status (the search is kept). */
import { Link } from "react-router";
import type { BuildOrderListFilter } from "~/build-orders/build-order-list-address";
import { buildOrderListHref } from "~/build-orders/build-order-list-href";
import {
  buildOrderStatusLabels,
  type BuildOrderStatus,
} from "~/build-orders/build-order-status";
import { buildOrderStatuses } from "~/db/tables/build-order-enums";

export function BuildOrderStatusFilter({
  filter,
}: {
  filter: BuildOrderListFilter;
}) {
  const status: BuildOrderStatus | null = filter.status ?? null;
  return (
    <nav aria-label="Filter by status">
      <ul className="flex flex-wrap gap-2 text-sm">
        {[null, ...buildOrderStatuses].map((candidate) => (
          <li key={candidate ?? "all"}>
            <Link
              to={buildOrderListHref({
                ...filter,
                status: candidate ?? undefined,
              })}
              aria-current={candidate === status ? "page" : undefined}
              className={`inline-flex min-h-9 items-center rounded-md border px-3 font-medium ${
                candidate === status
                  ? "border-graphite-800 bg-graphite-800 text-white"
                  : "border-graphite-300 bg-sheet text-graphite-800 hover:border-graphite-500"
              }`}
            >
              {candidate ? buildOrderStatusLabels[candidate] : "All"}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
