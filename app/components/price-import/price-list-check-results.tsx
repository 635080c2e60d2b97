/**
 * Step 3 of a price-list import: what the dry run found — the counts, the
 * warnings, the first rows as they will be stored with the catalogue item each
 * prices, and the rows that cannot be imported (the first 1,000 of them, with
 * how many more there are).
 */
import type { ColumnDef } from "@tanstack/react-table";
import { DataTable } from "~/components/data-table";
import { formatQuantity, formatPriceText } from "~/lib/format";
import { moreLineErrorsText } from "~/price-lists/line-errors";
import type { LineError } from "~/price-lists/parse-price-list";
import type { PriceListRow } from "~/price-lists/price-list-rows";
import { countText, perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import {
  describeMatch,
  type PreviewRow,
} from "~/purchasing/price-import-preview";
import { ImportWarnings } from "./import-warnings";
import type { PriceListCheck } from "./price-list-upload";

function sizeOrGrade(row: PriceListRow): string {
  if (row.kind === "wire")
    return row.standard === "AWG" ? `AWG ${row.size}` : `${row.size} mm`;
  if (row.kind === "magnet") return row.grade;
  return "—";
}

function CatalogueItem({ row }: { row: PreviewRow }) {
  const { match } = row;
  return (
    <div>
      <span className="font-medium">{match.sku}</span>
      <span
        className={`block text-xs ${match.newItem ? "font-medium text-caution" : "text-graphite-500"}`}
      >
        {match.newItem
          ? describeMatch(match)
          : `${match.name} · ${describeMatch(match)}`}
      </span>
    </div>
  );
}

const rowColumns: ColumnDef<PreviewRow, unknown>[] = [
  { accessorKey: "line", header: "Line", meta: { numeric: true } },
  { accessorKey: "supplierSku", header: "Supplier SKU" },
  {
    id: "catalogueItem",
    header: "Catalogue item",
    accessorFn: (row) => row.match.sku,
    cell: ({ row }) => <CatalogueItem row={row.original} />,
  },
  { accessorKey: "description", header: "Description" },
  { accessorKey: "kind", header: "Kind" },
  { id: "sizeOrGrade", header: "Size or grade", accessorFn: sizeOrGrade },
  {
    id: "price",
    header: "Price",
    meta: { numeric: true },
    accessorFn: (row) =>
      row.price !== null
        ? `${formatPriceText(row.price)} ${row.currency}/${perUnitWord(row.unit)}`
        : `adder ${formatPriceText(row.adderPerKg ?? "0")} ${row.currency}/kg`,
  },
  {
    id: "minQuantity",
    header: "From quantity",
    meta: { numeric: true },
    accessorFn: (row) => formatStockQuantity(Number(row.minQuantity), row.unit),
  },
  { accessorKey: "validFrom", header: "Valid from" },
  { id: "terms", header: "Lead time, pack", accessorFn: termsText },
];

/** "14 days · packs of 5.000 kg"; "—" when the row gives neither. */
function termsText(row: PriceListRow): string {
  const terms = [
    row.leadTimeDays === null ? null : countText(row.leadTimeDays, "day"),
    row.packQuantity === null
      ? null
      : `packs of ${formatStockQuantity(Number(row.packQuantity), row.unit)}`,
  ].filter((term) => term !== null);
  return terms.length > 0 ? terms.join(" · ") : "—";
}

const invalidColumns: ColumnDef<LineError, unknown>[] = [
  { accessorKey: "line", header: "Line", meta: { numeric: true } },
  {
    accessorKey: "message",
    header: "Why it cannot be imported",
    cell: ({ row }) => row.original.message.replace(/^Line \d+:\s*/, ""),
  },
];

function Count({
  label,
  value,
  tone,
}: {
  label: string;
  value: number;
  tone?: "danger";
}) {
  return (
    <div className="rounded-md border border-rule bg-white px-4 py-3">
      <dt className="text-sm text-graphite-500">{label}</dt>
      <dd
        className={`text-2xl font-semibold ${tone === "danger" && value > 0 ? "text-danger" : "text-graphite-900"}`}
      >
        {formatQuantity(value, "")}
      </dd>
    </div>
  );
}

export function InvalidRowsTable({
  invalid,
  invalidCount = invalid.length,
}: {
  /** The first lines that cannot be imported (the API lists 1,000 at most). */
  invalid: LineError[];
  /** How many lines cannot be imported in all. */
  invalidCount?: number;
}) {
  const more = moreLineErrorsText(invalid.length, invalidCount);
  return (
    <section aria-labelledby="invalid-rows-heading" className="space-y-2">
      <h3 id="invalid-rows-heading" className="font-semibold text-danger">
        {invalidCount === 1
          ? "1 row cannot be imported"
          : `${formatQuantity(invalidCount, "")} rows cannot be imported`}
      </h3>
      <div
        className="max-h-96 overflow-y-auto rounded-lg"
        tabIndex={0}
        role="region"
        aria-label="Rows that cannot be imported (scrolls)"
      >
        <DataTable
          caption="Rows that cannot be imported"
          columns={invalidColumns}
          rows={invalid}
        />
      </div>
      {more ? (
        <p className="text-sm text-graphite-700">
          {more}. The first {formatQuantity(invalid.length, "")} are listed: fix
          them in the file, choose it again and check again to see the next.
        </p>
      ) : null}
    </section>
  );
}

export function PriceListCheckResults({ check }: { check: PriceListCheck }) {
  return (
    <div className="space-y-5">
      <dl className="grid gap-3 sm:grid-cols-4">
        <Count label="Rows to import" value={check.valid} />
        <Count label="Matched to catalogue items" value={check.matched} />
        <Count label="New catalogue items" value={check.newItems} />
        <Count
          label="Rows with problems"
          value={check.invalidCount}
          tone="danger"
        />
      </dl>
      <ImportWarnings warnings={check.warnings} />
      {check.invalidCount > 0 ? (
        <InvalidRowsTable
          invalid={check.invalid}
          invalidCount={check.invalidCount}
        />
      ) : null}
      <section aria-labelledby="first-rows-heading" className="space-y-2">
        <h3 id="first-rows-heading" className="font-semibold">
          {check.valid > check.rows.length
            ? `The first ${check.rows.length} rows as they will be stored`
            : "The rows as they will be stored"}
        </h3>
        <DataTable
          caption="Rows as they will be stored"
          columns={rowColumns}
          rows={check.rows}
          emptyText="No row of the file can be imported."
        />
      </section>
    </div>
  );
}
