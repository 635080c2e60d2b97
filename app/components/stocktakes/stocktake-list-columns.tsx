/** The columns of the stocktake list: reference, status, locations, progress, who started it and when. */
import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import { formatDateTime } from "~/lib/format";
import type { StocktakeSummary } from "~/stocktakes/stocktakes.server";
import { StocktakeStatusBadge } from "./stocktake-status-badge";

const column = createColumnHelper<StocktakeSummary>();

export const stocktakeListColumns = [
  column.accessor("reference", {
    header: "Stocktake",
    cell: (info) => (
      <Link
        to={`/stocktakes/${info.row.original.id}`}
        className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("status", {
    header: "Status",
    cell: (info) => <StocktakeStatusBadge status={info.getValue()} />,
  }),
  column.accessor("locations", {
    header: "Locations",
    cell: (info) => info.getValue().join(", ") || "—",
  }),
  column.display({
    id: "progress",
    header: "Counted",
    cell: ({ row }) => (
      <span className="whitespace-nowrap">
        {row.original.counted} of {row.original.lines}
      </span>
    ),
    meta: { numeric: true },
  }),
  column.accessor("startedBy", { header: "Started by" }),
  column.accessor("startedAt", {
    header: "Started",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("note", { header: "Note" }),
];
