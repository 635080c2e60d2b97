import { createColumnHelper } from "~/lib/table-columns";
import { data, Link } from "react-router";
import type { Route } from "./+types/price-imports";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  IgnoredFilters,
  ListEmptyText,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import {
  listHref,
  readListFilters,
  searchPageSchema,
} from "~/lib/list-filters";
import { EmptyState } from "~/components/empty-state";
import { PriceImportDetail } from "~/components/price-import-detail";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { userCan } from "~/lib/capabilities";
import {
  idFromText,
  pageFromSearch,
  readPageOrLast,
} from "~/lib/search-params";
import {
  findPriceImport,
  importLinePageSize,
  importPageSize,
  listImportLines,
  listPriceImports,
} from "~/purchasing/import-history.server";

async function openedImport(value: string, page: number) {
  const id = idFromText(value);
  const found = id === null ? null : await findPriceImport(id);
  if (!found) {
    throw data(
      { message: `There is no price-list import number ${value}.` },
      { status: 404 },
    );
  }
  const { lines, ...paging } = await readPageOrLast(
    page,
    importLinePageSize,
    (page) => listImportLines(found.id, page),
  );
  return {
    ...found,
    lines,
    page: paging.page,
    pageCount: paging.pageCount,
  };
}

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const search = new URL(request.url).searchParams;
  const page = pageFromSearch(search.get("page"));
  const importParam = search.get("import");
  if (importParam !== null) {
    return {
      opened: await openedImport(importParam, page),
      list: null,
      canImport: userCan(user, "importPriceLists"),
    };
  }
  const { query, ignored } = readListFilters(searchPageSchema, search);
  const { imports, ...paging } = await readPageOrLast(
    query.page,
    importPageSize,
    (asked) => listPriceImports(asked, query.search),
  );
  return {
    opened: null,
    list: {
      imports,
      page: paging.page,
      pageCount: paging.pageCount,
      search: query.search,
      ignored,
    },
    canImport: userCan(user, "importPriceLists"),
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: loaderData?.opened
      ? `${loaderData.opened.fileName} · Past imports · Turnledger`
      : "Past imports · Turnledger",
  },
];

type PriceImport = NonNullable<
  Route.ComponentProps["loaderData"]["list"]
>["imports"][number];
const column = createColumnHelper<PriceImport>();
const columns = [
  column.accessor("createdAt", {
    header: "When",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  column.accessor("supplier", { header: "Supplier" }),
  column.accessor("fileName", {
    header: "File",
    cell: (info) => (
      <Link
        to={`?import=${info.row.original.id}`}
        className="font-medium text-copper-700 underline-offset-2 hover:underline"
      >
        {info.getValue()}
      </Link>
    ),
  }),
  column.accessor("rowCount", {
    header: "Rows",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), ""),
  }),
  column.accessor("createdItems", {
    header: "New items",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), ""),
  }),
  column.accessor("user", { header: "By" }),
];

export default function PriceImports({ loaderData }: Route.ComponentProps) {
  const { opened, list, canImport } = loaderData;
  return (
    <div className="space-y-4">
      <div className="mb-4 flex flex-wrap items-baseline justify-between gap-3">
        <h1 className="text-2xl font-semibold">
          {opened ? `Import of ${opened.fileName}` : "Past imports"}
        </h1>
        <nav aria-label="Price lists" className="flex gap-4 text-sm">
          <Link
            to="/suppliers"
            className="font-medium text-copper-700 underline-offset-2 hover:underline"
          >
            Suppliers
          </Link>
          {opened ? (
            <Link
              to="/suppliers/imports"
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              All past imports
            </Link>
          ) : null}
          {canImport ? (
            <Link
              to="/suppliers/import"
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              Import a price list
            </Link>
          ) : null}
        </nav>
      </div>
      {opened ? <PriceImportDetail opened={opened} /> : null}
      {list ? (
        <>
          <ListSearchForm
            path="/suppliers/imports"
            label="Search the past imports"
            search={{ value: list.search, placeholder: "File or supplier" }}
            filtered={Boolean(list.search)}
          />
          <IgnoredFilters names={list.ignored} />
          <DataTable
            caption="Committed price-list files, newest first"
            columns={columns}
            rows={list.imports}
            page={list.page}
            pageCount={list.pageCount}
            pageHref={(page) =>
              listHref("/suppliers/imports", { search: list.search, page })
            }
            emptyText={
              <ListEmptyText
                filtered={Boolean(list.search)}
                clearHref="/suppliers/imports"
                emptyText={
                  <EmptyState
                    message="No price list has been imported yet."
                    next={{
                      capability: "importPriceLists",
                      to: "/suppliers/import",
                      label: "Import a price list",
                      does: "import price lists",
                    }}
                  />
                }
              />
            }
          />
        </>
      ) : null}
    </div>
  );
}
