import { formatNumber, formatQuantity } from "~/lib/format";
import { createColumnHelper } from "~/lib/table-columns";
import { Form, Link } from "react-router";
import type { Route } from "./+types/best-prices";
import { requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import {
  derivedBaseText,
  UnpricedReasons,
} from "~/components/item-best-prices";
import { readPageOrLast } from "~/lib/search-params";
import {
  bestPriceListPageSize,
  listBestPrices,
} from "~/purchasing/best-price-list.server";
import { readBestPriceListQuery } from "~/purchasing/price-quantity-query";
import { countText, perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export async function loader({ request }: Route.LoaderArgs) {
  await requireUser(request);
  const query = readBestPriceListQuery(new URL(request.url).searchParams);
  const list = await readPageOrLast(query.page, bestPriceListPageSize, (page) =>
    listBestPrices({ search: query.search, quantity: query.quantity, page }),
  );
  return {
    ...list,
    search: query.search,
    quantityText: query.text,
    quantityError: query.error ?? null,
  };
}

export const meta: Route.MetaFunction = () => [
  { title: "Best prices · Turnledger" },
];

type Row = Route.ComponentProps["loaderData"]["rows"][number];

const money = (value: number, currency: string, decimals = 4) =>
  formatQuantity(value, currency, decimals);

function columns(quantityText: string) {
  const column = createColumnHelper<Row>();
  const itemHref = (sku: string) =>
    `/stock/items/${encodeURIComponent(sku)}${quantityText ? `?quantity=${encodeURIComponent(quantityText)}` : ""}`;
  return [
    column.accessor("sku", {
      header: "Item",
      cell: (info) => (
        <span>
          <Link
            to={itemHref(info.getValue())}
            className="font-medium text-copper-700 underline-offset-2 hover:underline"
          >
            {info.getValue()}
          </Link>
          <span className="block text-xs text-graphite-500">
            {info.row.original.name}
          </span>
        </span>
      ),
    }),
    column.accessor("quantity", {
      header: "Quantity",
      meta: { numeric: true },
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ),
    }),
    column.display({
      id: "supplier",
      header: "Cheapest supplier",
      cell: ({ row }) => {
        const best = row.original.best;
        if (!best) return <span className="text-graphite-500">—</span>;
        return (
          <span>
            {best.supplier}
            <span className="block text-xs text-graphite-500">
              {best.supplierSku}
              {best.leadTimeDays !== null
                ? ` · ${countText(best.leadTimeDays, "day")}`
                : ""}
              {row.original.otherOffers > 0
                ? ` · ${countText(row.original.otherOffers, "other offer")}`
                : ""}
            </span>
            {best.metalBaseDerivedFrom ? (
              <span className="block text-xs text-caution">
                {derivedBaseText(best.metalBaseDerivedFrom, best.currency)}
              </span>
            ) : null}
          </span>
        );
      },
    }),
    column.display({
      id: "unitPrice",
      header: "Per unit",
      meta: { numeric: true },
      cell: ({ row }) =>
        row.original.best ? (
          <span className="whitespace-nowrap font-medium">
            {money(row.original.best.unitPrice, row.original.companyCurrency)}/
            {perUnitWord(row.original.unit)}
          </span>
        ) : (
          "—"
        ),
    }),
    column.display({
      id: "total",
      header: "Total",
      meta: { numeric: true },
      cell: ({ row }) =>
        row.original.best ? (
          <span className="whitespace-nowrap">
            {money(row.original.best.total, row.original.companyCurrency, 2)}
          </span>
        ) : (
          "—"
        ),
    }),
    column.display({
      id: "unpriced",
      header: "Not priced",
      cell: ({ row }) =>
        row.original.cannotPrice.length === 0 ? (
          ""
        ) : (
          <ul className="space-y-1">
            {row.original.cannotPrice.map((offer) => (
              <li key={`${offer.supplier}-${offer.supplierSku}`}>
                <span className="text-sm">
                  {offer.supplier}{" "}
                  <span className="text-graphite-500">{offer.supplierSku}</span>
                </span>
                <UnpricedReasons reasons={offer.reasons} />
              </li>
            ))}
          </ul>
        ),
    }),
  ];
}

export default function BestPrices({ loaderData }: Route.ComponentProps) {
  const { rows, page, pageCount, total, search, quantityText, quantityError } =
    loaderData;
  const pageHref = (target: number) => {
    const params = new URLSearchParams();
    if (search) params.set("search", search);
    if (quantityText) params.set("quantity", quantityText);
    params.set("page", String(target));
    return `/best-prices?${params}`;
  };
  return (
    <div className="space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Best prices</h1>
        <p className="mt-1 text-sm text-graphite-500">
          Every item a supplier quotes, with its cheapest offer today in the
          company currency. Leave the quantity blank to price each item at its
          suggested order (the reorder quantity, or the shortfall when that is
          larger; one unit when neither is set) — the quantity its page and its
          low-stock e-mail use.
        </p>
      </header>
      <Form
        method="get"
        className="panel flex flex-wrap items-end gap-4 py-4"
        aria-label="Choose items and quantity"
      >
        <div className="w-64">
          <label htmlFor="best-prices-search" className="field-label">
            Search
          </label>
          <input
            id="best-prices-search"
            type="search"
            name="search"
            defaultValue={search}
            maxLength={80}
            placeholder="SKU, name, size or grade"
            className="field-input"
          />
        </div>
        <div className="w-48">
          <label htmlFor="best-prices-quantity" className="field-label">
            Quantity{" "}
            <span className="font-normal text-graphite-500">
              (in each item's unit)
            </span>
          </label>
          <input
            id="best-prices-quantity"
            name="quantity"
            inputMode="decimal"
            autoComplete="off"
            defaultValue={quantityText}
            placeholder="suggested order"
            className="field-input"
            aria-invalid={quantityError ? true : undefined}
            aria-describedby={
              quantityError ? "best-prices-quantity-error" : undefined
            }
          />
        </div>
        <button type="submit" className="button-primary">
          Show prices
        </button>
        {quantityError ? (
          <p
            id="best-prices-quantity-error"
            className="w-full text-sm text-caution"
          >
            {quantityError}
          </p>
        ) : null}
      </Form>
      <p className="text-sm text-graphite-500">
        {total === 1 ? "1 item" : `${formatNumber(total)} items`} quoted
        {search ? ` matching “${search}”` : ""}.
      </p>
      <DataTable
        caption="Quoted items with their cheapest offer"
        columns={columns(quantityText)}
        rows={rows}
        page={page}
        pageCount={pageCount}
        pageHref={pageHref}
        emptyText={
          search
            ? "No quoted item matches that search."
            : "No supplier has quoted an item yet. Import a price list first."
        }
      />
    </div>
  );
}
