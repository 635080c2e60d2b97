import { createColumnHelper } from "~/lib/table-columns";
import { useMemo } from "react";
import { DataTableView } from "~/components/data-table-view";
import {
  numberSources,
  SourceList,
  SourceRef,
} from "~/components/source-notes";
import { formatQuantity } from "~/lib/format";
import type { listConductorMaterials } from "~/reference/reference-tables.server";

export type ConductorMaterialRow = Awaited<
  ReturnType<typeof listConductorMaterials>
>[number];

/** Resistivity of the International Annealed Copper Standard, Ω·mm²/m: 100 % IACS by definition (1/58). */
const IACS_RESISTIVITY = 1 / 58;

const column = createColumnHelper<ConductorMaterialRow>();

function columnsFor(notes: Map<string, number>) {
  return [
    column.accessor("name", {
      header: "Material",
      cell: (info) => <span className="font-medium">{info.getValue()}</span>,
    }),
    column.accessor("resistivity20OhmMm2PerM", {
      header: "Resistivity at 20 °C",
      meta: { numeric: true },
      cell: (info) => formatQuantity(info.getValue(), "Ω·mm²/m", 6),
    }),
    column.accessor(
      (row) => (IACS_RESISTIVITY / row.resistivity20OhmMm2PerM) * 100,
      {
        id: "conductivity",
        header: "Conductivity",
        meta: { numeric: true },
        cell: (info) => formatQuantity(info.getValue(), "% IACS", 1),
      },
    ),
    column.accessor("temperatureCoefficient20PerK", {
      header: "Temperature coefficient α20",
      meta: { numeric: true },
      cell: (info) => formatQuantity(info.getValue(), "/K", 5),
    }),
    column.accessor("densityGPerCm3", {
      header: "Density",
      meta: { numeric: true },
      cell: (info) => formatQuantity(info.getValue(), "g/cm³", 3),
    }),
    column.display({
      id: "source",
      header: "Source",
      cell: ({ row }) => (
        <SourceRef
          notes={notes}
          prefix="conductor"
          source={row.original.source}
        />
      ),
    }),
  ];
}

export function ConductorMaterialTable({
  rows,
}: {
  rows: ConductorMaterialRow[];
}) {
  const notes = useMemo(
    () => numberSources(rows.map((row) => row.source)),
    [rows],
  );
  const columns = useMemo(() => columnsFor(notes), [notes]);
  return (
    <div className="space-y-4">
      <p className="max-w-3xl text-sm text-graphite-700">
        Resistance at another temperature: R(T) = R20 · (1 + α20 · (T − 20 °C)).
        Conductivity in % IACS is 1/58 Ω·mm²/m divided by the resistivity.
      </p>
      <DataTableView
        caption="Conductor materials"
        columns={columns}
        rows={rows}
        sortable
      />
      <SourceList notes={notes} prefix="conductor" />
    </div>
  );
}
