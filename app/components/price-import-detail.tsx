import { createColumnHelper } from "~/lib/table-columns";
import { CsvDownloadLink } from "~/components/csv-download-link";
import { DataTable } from "~/components/data-table";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { perUnitWord } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

interface ImportLine {
  id: number;
  supplierSku: string;
  itemSku: string;
  unit: string;
  minQuantity: number;
  unitPrice: number | null;
  adderPerKg: number | null;
  conductor: string | null;
  currency: string;
  validFrom: string;
  line: number | null;
}

export interface OpenedImport {
  id: number;
  supplier: string;
  fileName: string;
  fileSha256: string;
  rowCount: number;
  createdItems: number;
  user: string;
  createdAt: Date | string;
  mapping: [string, string][];
  lines: ImportLine[];
  page: number;
  pageCount: number;
}

/** How a price line reads: a price per unit, or an adder per kg on the metal base. */
export function priceOrAdder(line: ImportLine): string {
  if (line.adderPerKg !== null) {
    const metal = line.conductor ? `${line.conductor} base` : "metal base";
    return `${metal} + ${formatQuantity(line.adderPerKg, `${line.currency}/kg`, 4)}`;
  }
  if (line.unitPrice !== null)
    return formatQuantity(
      line.unitPrice,
      `${line.currency}/${perUnitWord(line.unit)}`,
      4,
    );
  return "—";
}

/** Our field names as people read them; a field not listed shows as stored. */
const mappedFieldLabels: Record<string, string> = {
  supplierSku: "Supplier SKU",
  description: "Description",
  standard: "Standard",
  size: "Size",
  insulation: "Insulation",
  grade: "Grade",
  conductor: "Conductor",
  price: "Price per unit",
  adderPerKg: "Adder per kg",
  currency: "Currency",
  minQuantity: "From quantity",
  validFrom: "Valid from",
};

const column = createColumnHelper<ImportLine>();
const columns = [
  column.accessor("line", {
    header: "File line",
    meta: { numeric: true },
    cell: (info) => info.getValue() ?? "—",
  }),
  column.accessor("supplierSku", { header: "Supplier SKU" }),
  column.accessor("itemSku", { header: "Item SKU" }),
  column.accessor("minQuantity", {
    header: "From quantity",
    meta: { numeric: true },
    cell: (info) =>
      formatStockQuantity(info.getValue(), info.row.original.unit),
  }),
  column.display({
    id: "price",
    header: "Price or adder",
    meta: { numeric: true },
    cell: ({ row }) => priceOrAdder(row.original),
  }),
  column.accessor("currency", { header: "Currency" }),
  column.accessor("validFrom", {
    header: "Valid from",
    cell: (info) => <span className="tabular-nums">{info.getValue()}</span>,
  }),
];

/** One committed import: who, when, the column mapping used, and its price lines a page at a time. */
export function PriceImportDetail({ opened }: { opened: OpenedImport }) {
  return (
    <div className="space-y-6">
      <div className="grid gap-6 md:grid-cols-2">
        <section aria-labelledby="import-facts-heading" className="panel">
          <h2 id="import-facts-heading" className="mb-3 text-lg font-semibold">
            The file
          </h2>
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
            <dt className="text-graphite-500">Supplier</dt>
            <dd>{opened.supplier}</dd>
            <dt className="text-graphite-500">Imported</dt>
            <dd>
              {formatDateTime(opened.createdAt)} by {opened.user}
            </dd>
            <dt className="text-graphite-500">Rows</dt>
            <dd className="tabular-nums">
              {formatQuantity(opened.rowCount, "")}
            </dd>
            <dt className="text-graphite-500">New items created</dt>
            <dd className="tabular-nums">
              {formatQuantity(opened.createdItems, "")}
            </dd>
            <dt className="text-graphite-500">SHA-256</dt>
            <dd
              className="truncate font-mono text-xs"
              title={opened.fileSha256}
            >
              {opened.fileSha256}
            </dd>
          </dl>
        </section>
        <section aria-labelledby="import-mapping-heading" className="panel">
          <h2
            id="import-mapping-heading"
            className="mb-3 text-lg font-semibold"
          >
            Column mapping
          </h2>
          {opened.mapping.length === 0 ? (
            <p className="text-sm text-graphite-500">No mapping was stored.</p>
          ) : (
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
              {opened.mapping.map(([field, header]) => (
                <div key={field} className="contents">
                  <dt className="text-graphite-500">
                    {mappedFieldLabels[field] ?? field}
                  </dt>
                  <dd>
                    from column <q className="font-medium">{header}</q>
                  </dd>
                </div>
              ))}
            </dl>
          )}
        </section>
      </div>
      <DataTable
        caption={`Price lines written by ${opened.fileName}`}
        columns={columns}
        rows={opened.lines}
        page={opened.page}
        pageCount={opened.pageCount}
        pageHref={(page) => `?import=${opened.id}&page=${page}`}
        emptyText="This import wrote no price lines."
      />
      <CsvDownloadLink
        href={`/suppliers/imports/${opened.id}/lines.csv`}
        table={`every price line of ${opened.fileName}`}
      />
    </div>
  );
}
