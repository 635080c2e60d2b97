import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { DataTableView, type TableSearch } from "~/components/data-table-view";
import {
  numberSources,
  SourceList,
  SourceRef,
} from "~/components/source-notes";
import { formatQuantity } from "~/lib/format";
import type { listThermalClasses } from "~/reference/reference-tables.server";

export type ThermalClassRow = Awaited<
  ReturnType<typeof listThermalClasses>
>[number];

const column = createColumnHelper<ThermalClassRow>();

function columnsFor(notes: Map<string, number>) {
  return [
    column.accessor("classC", {
      header: "Thermal class",
      cell: (info) => <span className="font-medium">{info.getValue()}</span>,
    }),
    column.accessor("letter", { header: "Letter" }),
    column.accessor("classC", {
      id: "temperature",
      header: "Temperature rating",
      meta: { numeric: true },
      cell: (info) => formatQuantity(info.getValue(), "°C"),
    }),
    column.accessor(
      (row) => row.enamels.map((enamel) => enamel.name).join(", "),
      {
        id: "enamels",
        header: "Typical enamels",
        cell: ({ row }) => (
          <ul>
            {row.original.enamels.map((enamel) => (
              <li key={enamel.name}>
                {enamel.name}
                {enamel.classRange ? (
                  <span className="text-graphite-500">
                    {" "}
                    (
                    {enamel.classRange[0] === enamel.classRange[1]
                      ? `class ${enamel.classRange[0]}`
                      : `classes ${enamel.classRange[0]}–${enamel.classRange[1]}`}
                    {enamel.solderable ? ", solderable" : ""})
                  </span>
                ) : null}
              </li>
            ))}
          </ul>
        ),
      },
    ),
    column.display({
      id: "source",
      header: "Source",
      cell: ({ row }) => (
        <SourceRef
          notes={notes}
          prefix="thermal"
          source={row.original.source}
        />
      ),
    }),
  ];
}

const search: TableSearch = {
  label: "Find an enamel or class",
  placeholder: "e.g. polyimide",
  columnIds: ["enamels", "letter"],
};

export function ThermalClassTable({ rows }: { rows: ThermalClassRow[] }) {
  const notes = useMemo(
    () => numberSources(rows.map((row) => row.source)),
    [rows],
  );
  const columns = useMemo(() => columnsFor(notes), [notes]);
  return (
    <div className="space-y-4">
      <p className="max-w-3xl rounded-md border border-caution/40 bg-caution/5 px-3 py-2 text-sm text-graphite-800">
        The wire&rsquo;s thermal class must be at least the motor&rsquo;s
        insulation class.
      </p>
      <DataTableView
        caption="Thermal classes"
        columns={columns}
        rows={rows}
        sortable
        search={search}
      />
      <SourceList notes={notes} prefix="thermal" />
    </div>
  );
}
