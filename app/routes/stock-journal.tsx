import { createColumnHelper } from "@tanstack/react-table";
import { Form, Link, useSearchParams } from "react-router";
import type { Route } from "./+types/stock-journal";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  ReceiptOrderLink,
  referenceBesides,
} from "~/components/stock/receipt-order-link";
import { movementTypes } from "~/db/tables/stock-enums";
import { formatDateTime, formatQuantity } from "~/lib/format";
import {
  formatStockQuantity,
  formatUnitCost,
} from "~/stock/stock-quantity-text";
import { readSearchLeniently, searchParamsObject } from "~/lib/search-params";
import { movementJournalQuerySchema } from "~/stock/movement-journal-query";
import { listMovements } from "~/stock/movement-journal.server";
import { LotLink } from "~/stock/item-page-columns";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  // Filters the page cannot use are left out and named; a page that is no page is corrected.
  const { query, errors } = readSearchLeniently(
    movementJournalQuerySchema,
    searchParamsObject(new URL(request.url).searchParams),
  );
  const { hasMore, movements } = await listMovements(query);
  return {
    movements,
    hasMore,
    page: query.page,
    filters: query,
    ignored: Object.values(errors).flat(),
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Movement journal · Turnledger" },
];

type Movement = Route.ComponentProps["loaderData"]["movements"][number];
const column = createColumnHelper<Movement>();
const columns = [
  column.accessor("createdAt", {
    header: "When",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("type", { header: "Type" }),
  column.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <Link
        to={`/stock/items/${encodeURIComponent(info.getValue())}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("lot", {
    header: "Lot",
    cell: (info) => (
      <LotLink lotId={info.row.original.lotId} lot={info.getValue()} />
    ),
  }),
  column.accessor("location", { header: "Location" }),
  column.accessor("quantity", {
    header: "Change",
    meta: { numeric: true },
    cell: (info) => {
      const value = info.getValue();
      return (
        <span className={value < 0 ? "text-danger" : "text-ok"}>
          {value > 0 ? "+" : value < 0 ? "−" : ""}
          {formatStockQuantity(Math.abs(value), info.row.original.unit)}
        </span>
      );
    },
  }),
  column.accessor("itemOnHandAfter", {
    header: "Item on hand after",
    meta: { numeric: true },
    cell: (info) =>
      formatStockQuantity(info.getValue(), info.row.original.unit),
  }),
  column.display({
    id: "details",
    header: "Reference and note",
    cell: ({ row }) => {
      const movement = row.original;
      const parts = [
        referenceBesides(movement.reference, movement.purchaseOrderId),
        movement.grossKg !== null
          ? `weighed ${formatQuantity(movement.grossKg, "kg", 3)} gross`
          : null,
        movement.countedQuantity !== null
          ? `counted ${formatStockQuantity(movement.countedQuantity, movement.unit)}`
          : null,
        movement.unitCost !== null
          ? `at ${formatUnitCost(movement.unitCost, movement.unit)}`
          : null,
        movement.note,
      ].filter(Boolean);
      const order = (
        <ReceiptOrderLink
          type={movement.type}
          purchaseOrderId={movement.purchaseOrderId}
        />
      );
      return (
        <span className="text-graphite-700">
          {movement.type === "receipt" ? (
            <>
              {order}
              {parts.length ? " · " : ""}
            </>
          ) : null}
          {parts.join(" · ") || (movement.type === "receipt" ? "" : "—")}
        </span>
      );
    },
  }),
  column.accessor("user", { header: "By" }),
];

export default function StockJournal({ loaderData }: Route.ComponentProps) {
  const { movements, hasMore, page, filters, ignored } = loaderData;
  const [searchParams] = useSearchParams();
  const pageLink = (target: number) => {
    const next = new URLSearchParams(searchParams);
    next.set("page", String(target));
    return `?${next}`;
  };
  return (
    <div className="space-y-5">
      <div>
        <h1 className="text-2xl font-semibold">Movement journal</h1>
        <p className="mt-1 text-graphite-500">
          Every stock movement, newest first. Movements are never edited; a
          correction is a new movement.
        </p>
      </div>
      <Form
        method="get"
        className="panel grid gap-3 sm:grid-cols-3 lg:grid-cols-6"
        aria-label="Filter the journal"
      >
        <label className="block">
          <span className="field-label">Type</span>
          <select
            name="type"
            defaultValue={filters.type ?? ""}
            className="field-input"
          >
            <option value="">all</option>
            {movementTypes.map((type) => (
              <option key={type} value={type}>
                {type}
              </option>
            ))}
          </select>
        </label>
        <label className="block">
          <span className="field-label">Item SKU</span>
          <input
            name="sku"
            defaultValue={filters.sku ?? ""}
            className="field-input"
          />
        </label>
        <label className="block">
          <span className="field-label">Person (e-mail)</span>
          <input
            name="user"
            type="email"
            defaultValue={filters.user ?? ""}
            className="field-input"
          />
        </label>
        <label className="block">
          <span className="field-label">From</span>
          <input
            name="from"
            type="date"
            defaultValue={filters.from ?? ""}
            className="field-input"
          />
        </label>
        <label className="block">
          <span className="field-label">To</span>
          <input
            name="to"
            type="date"
            defaultValue={filters.to ?? ""}
            className="field-input"
          />
        </label>
        <div className="flex items-end gap-2">
          <button type="submit" className="button-primary">
            Filter
          </button>
          <Link to="/stock/journal" className="button-quiet">
            Clear
          </Link>
        </div>
      </Form>
      {ignored.length > 0 ? (
        <p
          role="alert"
          className="rounded-md border border-caution/40 bg-caution/5 px-3 py-2 text-sm text-graphite-800"
        >
          Left out of the filter because their values in the address were not
          understood: {ignored.join(" ")}
        </p>
      ) : null}
      <DataTable
        caption="Stock movements"
        columns={columns}
        rows={movements}
        emptyText="No movements match."
      />
      <nav
        aria-label="Journal pages"
        className="flex items-center justify-between text-sm"
      >
        <span className="text-graphite-500">Page {page}</span>
        <span className="flex gap-2">
          {page > 1 ? (
            <Link className="button-quiet" to={pageLink(page - 1)}>
              Newer
            </Link>
          ) : null}
          {hasMore ? (
            <Link className="button-quiet" to={pageLink(page + 1)}>
              Older
            </Link>
          ) : null}
        </span>
      </nav>
    </div>
  );
}
