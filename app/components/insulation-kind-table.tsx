import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { DataTableView, type TableFacet } from "~/components/data-table-view";
import {
  numberSources,
  SourceList,
  SourceRef,
} from "~/components/source-notes";
import type { listInsulationKinds } from "~/reference/reference-tables.server";

export type InsulationKindRow = Awaited<
  ReturnType<typeof listInsulationKinds>
>[number];

const column = createColumnHelper<InsulationKindRow>();

function columnsFor(notes: Map<string, number>) {
  return [
    column.accessor("name", {
      header: "Insulation",
      cell: (info) => <span className="font-medium">{info.getValue()}</span>,
    }),
    column.accessor("standard", { header: "Standard" }),
    column.accessor(
      (row) =>
        row.standard === "AWG"
          ? "Film build (NEMA MW 1000)"
          : "Grade (IEC 60317-0-1)",
      {
        id: "kind",
        header: "Kind",
      },
    ),
    column.accessor("key", {
      header: "Key in the API",
      cell: (info) => <code>{info.getValue()}</code>,
    }),
    column.display({
      id: "source",
      header: "Source",
      cell: ({ row }) => (
        <SourceRef
          notes={notes}
          prefix="insulation"
          source={row.original.source}
        />
      ),
    }),
  ];
}

const facets: TableFacet[] = [{ columnId: "standard", label: "Standard" }];

export function InsulationKindTable({ rows }: { rows: InsulationKindRow[] }) {
  const notes = useMemo(
    () => numberSources(rows.map((row) => row.source)),
    [rows],
  );
  const columns = useMemo(() => columnsFor(notes), [notes]);
  return (
    <div className="space-y-4">
      <p className="max-w-3xl text-sm text-graphite-700">
        The enamel build over the bare conductor: IEC wire comes in grades 1 to
        3 (thin to thick), AWG wire in single, heavy and triple film builds. A
        thicker build adds to the overall diameter and so to the space a coil
        takes in the slot; published maximum overall diameters are in the wire
        sizes table.
      </p>
      <DataTableView
        caption="Insulation kinds"
        columns={columns}
        rows={rows}
        sortable
        facets={facets}
      />
      <SourceList notes={notes} prefix="insulation" />
    </div>
  );
}
