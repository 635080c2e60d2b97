import { createColumnHelper } from "~/lib/table-columns";
import { Link } from "react-router";
import type { Route } from "./+types/stock-journal";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  FilterChoice,
  FilterText,
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
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
import { isFiltered, listHref, readListFilters } from "~/lib/list-filters";
import {
  movementJournalFilterSchema,
  movementJournalQuerySchema,
} from "~/stock/movement-journal-query";
import { listMovements } from "~/stock/movement-journal.server";
import { LotLink } from "~/stock/item-page-columns";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  // Filters the page cannot use are left out and named; a page that is no page is corrected.
  const { query, ignored } = readListFilters(
    movementJournalQuerySchema,
    new URL(request.url).searchParams,
  );
  const { hasMore, movements, nextCursor, previousCursor } =
    await listMovements(query);
  return {
    movements,
    hasMore,
    nextCursor,
    previousCursor,
    page: query.page,
    // The filters alone (no page), for the form, the page links and the CSV link.
    filters: movementJournalFilterSchema.parse(query),
    ignored,
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
  const { movements, hasMore, nextCursor, previousCursor, page, filters } =
    loaderData;
  const { ignored } = loaderData;
  const filtered = isFiltered(filters);
  // The links carry where this page starts and ends, so the next page is read from the
  // journal's index at that place (keyset) however deep it is; the first page needs none.
  const newerLink =
    page - 1 <= 1 || !previousCursor
      ? listHref("/stock/journal", filters)
      : listHref("/stock/journal", {
          ...filters,
          page: page - 1,
          before: previousCursor,
        });
  const olderLink = listHref("/stock/journal", {
    ...filters,
    page: page + 1,
    after: nextCursor,
  });
  return (
    <div className="space-y-5">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-semibold">Movement journal</h1>
          <p className="mt-1 text-graphite-500">
            Every stock movement, newest first. Movements are never edited; a
            correction is a new movement.
          </p>
        </div>
        <a
          href={listHref("/stock/journal.csv", filters)}
          download
          className="button-quiet"
        >
          Download CSV
        </a>
      </div>
      <ListSearchForm
        path="/stock/journal"
        label="Filter the journal"
        search={{
          name: "sku",
          label: "Item SKU",
          value: filters.sku,
          placeholder: "WIRE-CU-0.50",
        }}
        filtered={filtered}
      >
        <FilterText name="lot" label="Lot" value={filters.lot} />
        <FilterText
          name="reference"
          label="Reference"
          value={filters.reference}
        />
        <FilterText
          name="user"
          label="Person (name or e-mail)"
          value={filters.user}
          maxLength={254}
        />
        <FilterChoice
          name="type"
          label="Type"
          value={filters.type}
          options={movementTypes.map((type) => ({ value: type, label: type }))}
        />
        <FilterText name="from" label="From" type="date" value={filters.from} />
        <FilterText name="to" label="To" type="date" value={filters.to} />
      </ListSearchForm>
      <IgnoredFilters names={ignored} />
      <DataTable
        caption="Stock movements"
        columns={columns}
        rows={movements}
        emptyText={
          <ListEmptyText
            filtered={filtered}
            clearHref="/stock/journal"
            emptyText="No movements yet: receipts, issues and counts appear here as they are recorded."
          />
        }
      />
      <nav
        aria-label="Journal pages"
        className="flex items-center justify-between text-sm"
      >
        <span className="text-graphite-500">Page {page}</span>
        <span className="flex gap-2">
          {page > 1 ? (
            <Link className="button-quiet" to={newerLink}>
              Newer
            </Link>
          ) : null}
          {hasMore ? (
            <Link className="button-quiet" to={olderLink}>
              Older
            </Link>
          ) : null}
        </span>
      </nav>
    </div>
  );
}
