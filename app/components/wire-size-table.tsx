import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import {
  DataTableView,
  type TableFacet,
  type TableSearch,
} from "~/components/data-table-view";
import {
  numberSources,
  SourceList,
  SourceRef,
} from "~/components/source-notes";
import { formatQuantity } from "~/lib/format";
import {
  decimalsForSignificant,
  formatSignificant,
} from "~/reference/quantity-display";
import type { listWireSizeRows } from "~/reference/reference-tables.server";

export type WireSizeRow = Awaited<ReturnType<typeof listWireSizeRows>>[number];

const column = createColumnHelper<WireSizeRow>();

/** AWG aught sizes as people also write them: 0000 → "4/0". */
function sizeLabel(row: WireSizeRow): string {
  if (row.standard === "AWG" && /^0+$/.test(row.size))
    return `${row.size} (${row.size.length}/0)`;
  return row.size;
}

function columnsFor(notes: Map<string, number>) {
  return [
    column.accessor("standard", { header: "Standard" }),
    column.accessor("size", {
      header: "Size",
      cell: (info) => (
        <span className="font-medium">{sizeLabel(info.row.original)}</span>
      ),
      // A size sorts by how thick it is, whatever the standard.
      sortingFn: (a, b) =>
        a.original.bareDiameterMm - b.original.bareDiameterMm,
    }),
    column.accessor((row) => (row.series ? row.series.toUpperCase() : ""), {
      id: "series",
      header: "Series",
      cell: (info) => info.getValue() || "—",
    }),
    column.accessor("bareDiameterMm", {
      header: "Bare diameter, mm",
      meta: { numeric: true },
      cell: (info) => (
        <span className="whitespace-nowrap">
          {/* AWG by the ASTM B258 formula to 0.0001 mm; IEC nominal sizes as printed, to 0.001 mm. */}
          {formatQuantity(
            info.getValue(),
            "mm",
            info.row.original.standard === "AWG" ? 4 : 3,
          )}
        </span>
      ),
    }),
    column.accessor("bareDiameterIn", {
      header: "Bare diameter, in",
      meta: { numeric: true },
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatQuantity(
            info.getValue(),
            "in",
            Math.max(4, decimalsForSignificant(info.getValue(), 3)),
          )}
        </span>
      ),
    }),
    column.accessor("areaMm2", {
      header: "Area",
      meta: { numeric: true },
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatSignificant(info.getValue(), "mm²", 4)}
        </span>
      ),
    }),
    column.display({
      id: "overall",
      header: "Published max. overall diameter",
      cell: ({ row }) =>
        row.original.overallDiameters.length === 0 ? (
          <span className="text-graphite-500">—</span>
        ) : (
          <ul>
            {row.original.overallDiameters.map((overall) => (
              <li key={overall.insulation} className="whitespace-nowrap">
                {overall.insulation}:{" "}
                {/* As published: IEC to 0.001 mm; AWG from 0.0001 in, which is 0.0025 mm. */}
                {formatQuantity(
                  overall.maxOverallDiameterMm,
                  "mm",
                  row.original.standard === "AWG" ? 4 : 3,
                )}{" "}
                <SourceRef
                  notes={notes}
                  prefix="wire"
                  source={overall.source}
                />
              </li>
            ))}
          </ul>
        ),
    }),
    column.display({
      id: "source",
      header: "Source",
      cell: ({ row }) => (
        <SourceRef notes={notes} prefix="wire" source={row.original.source} />
      ),
    }),
  ];
}

const search: TableSearch = {
  label: "Find a size",
  placeholder: "e.g. 20 or 0.800",
  columnIds: ["size"],
};
const facets: TableFacet[] = [{ columnId: "standard", label: "Standard" }];

export function WireSizeTable({ rows }: { rows: WireSizeRow[] }) {
  const notes = useMemo(
    () =>
      numberSources(
        rows.flatMap((row) => [
          row.source,
          ...row.overallDiameters.map((overall) => overall.source),
        ]),
      ),
    [rows],
  );
  const columns = useMemo(() => columnsFor(notes), [notes]);
  return (
    <div className="space-y-4">
      <p className="max-w-3xl text-sm text-graphite-700">
        AWG diameters are the ASTM B258 formula, unrounded; the standard&rsquo;s
        printed table rounds to 0.0001 in (AWG 20: 0.8118 mm by the formula,
        0.8128 mm in the table). IEC 60317-0-1 nominal diameters follow the R20
        series with R40 sizes between. Areas are of the bare conductor. Maximum
        overall diameters are given only where a published value is known.
      </p>
      <DataTableView
        caption="Wire sizes"
        columns={columns}
        rows={rows}
        sortable
        search={search}
        facets={facets}
      />
      <SourceList notes={notes} prefix="wire" />
    </div>
  );
}
