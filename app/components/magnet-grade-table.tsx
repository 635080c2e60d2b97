import { createColumnHelper } from "~/lib/table-columns";
import {
  DataTableView,
  type TableFacet,
  type TableSearch,
} from "~/components/data-table-view";
import type { MagnetMaterial } from "~/engineering/reference-data";
import { formatQuantity } from "~/lib/format";
import {
  isMagnetMaterial,
  magnetMaterialLabels,
  compareMagnetGrades,
} from "~/reference/magnet-materials";
import {
  formatPercentPerKelvin,
  formatRange,
} from "~/reference/quantity-display";
import type { listMagnetGradeRows } from "~/reference/reference-tables.server";

export type MagnetGradeRow = Awaited<
  ReturnType<typeof listMagnetGradeRows>
>[number];

const column = createColumnHelper<MagnetGradeRow>();

const nowrap = (text: string) => (
  <span className="whitespace-nowrap">{text}</span>
);

/** The source, folded: written out in every row it would make each row tall. */
function SourceNote({ source }: { source: string }) {
  return (
    <details className="text-xs text-graphite-700">
      <summary className="cursor-pointer text-copper-700">Source</summary>
      <p className="mt-1 w-72 whitespace-normal">{source}</p>
    </details>
  );
}

const columns = [
  column.accessor("name", {
    header: "Grade",
    cell: ({ row }) => (
      <div className="space-y-0.5">
        <div className="whitespace-nowrap font-medium">{row.original.name}</div>
        {row.original.coercivityFallsWhenCold ? (
          <div className="whitespace-nowrap text-xs text-caution">
            Weakest when cold
          </div>
        ) : null}
        <SourceNote source={row.original.source} />
      </div>
    ),
    sortingFn: (a, b) => compareMagnetGrades(a.original, b.original),
  }),
  column.accessor("material", {
    header: "Material",
    cell: (info) =>
      nowrap(
        magnetMaterialLabels[info.getValue() as MagnetMaterial] ??
          info.getValue(),
      ),
  }),
  column.accessor((row) => (row.brMinT + row.brMaxT) / 2, {
    id: "br",
    header: "Br at 20 °C",
    meta: { numeric: true },
    cell: ({ row }) =>
      nowrap(formatRange(row.original.brMinT, row.original.brMaxT, "T", 2)),
  }),
  column.accessor("hcbMinKAm", {
    header: "HcB min.",
    meta: { numeric: true },
    cell: (info) => nowrap(formatQuantity(info.getValue(), "kA/m")),
  }),
  column.accessor("hcjMinKAm", {
    header: "HcJ min.",
    meta: { numeric: true },
    cell: (info) => nowrap(formatQuantity(info.getValue(), "kA/m")),
  }),
  column.accessor((row) => row.bhMaxMaxKJm3, {
    id: "bhMax",
    header: "(BH)max",
    meta: { numeric: true },
    cell: ({ row }) =>
      nowrap(
        formatRange(
          row.original.bhMaxMinKJm3,
          row.original.bhMaxMaxKJm3,
          "kJ/m³",
          0,
        ),
      ),
  }),
  column.accessor("maxWorkingTemperatureC", {
    header: "Max. working temp.",
    meta: { numeric: true },
    cell: (info) => nowrap(formatQuantity(info.getValue(), "°C")),
  }),
  column.accessor("brTemperatureCoefficientPerK", {
    header: "Br temp. coefficient",
    meta: { numeric: true },
    cell: (info) => nowrap(formatPercentPerKelvin(info.getValue())),
  }),
  column.accessor("hcjTemperatureCoefficientPerK", {
    header: "HcJ temp. coefficient",
    meta: { numeric: true },
    cell: (info) => {
      const value = info.getValue();
      if (value === null) return nowrap("not given");
      const text = formatPercentPerKelvin(value, 2);
      return nowrap(value > 0 ? `+${text}` : text);
    },
  }),
  column.accessor("curieTemperatureC", {
    header: "Curie temp.",
    meta: { numeric: true },
    cell: (info) => {
      const value = info.getValue();
      return nowrap(value === null ? "not given" : formatQuantity(value, "°C"));
    },
  }),
  column.accessor("densityGPerCm3", {
    header: "Density",
    meta: { numeric: true },
    cell: (info) => nowrap(formatQuantity(info.getValue(), "g/cm³", 2)),
  }),
  column.accessor("recoilPermeability", {
    header: "μrec",
    meta: { numeric: true },
    cell: (info) => formatQuantity(info.getValue(), "", 2),
  }),
  column.accessor((row) => (row.builtIn ? "Built in" : "Added"), {
    id: "origin",
    header: "Origin",
    cell: ({ row }) =>
      row.original.builtIn ? (
        "Built in"
      ) : (
        <span className="text-copper-700">
          Added by {row.original.addedByName}
        </span>
      ),
  }),
];

const search: TableSearch = {
  label: "Find a grade",
  placeholder: "e.g. N42SH",
  columnIds: ["name"],
};
const facets: TableFacet[] = [
  {
    columnId: "material",
    label: "Material",
    optionLabel: (value) =>
      isMagnetMaterial(value) ? magnetMaterialLabels[value] : value,
  },
  { columnId: "origin", label: "Origin" },
];

export function MagnetGradeTable({ rows }: { rows: MagnetGradeRow[] }) {
  return (
    <div className="space-y-4">
      <p className="max-w-3xl text-sm text-graphite-700">
        Ranges are from makers&rsquo; published tables, which differ by
        1&ndash;3 %; coercivities are minimums. The maximum working temperature
        also depends on the magnet&rsquo;s shape and load line: a thin magnet in
        a large air gap demagnetises sooner. Br falls reversibly with
        temperature by its coefficient, and for good once the working
        temperature is passed.
      </p>
      <DataTableView
        caption="Magnet grades"
        columns={columns}
        rows={rows}
        sortable
        initialSorting={[{ id: "name", desc: false }]}
        search={search}
        facets={facets}
      />
    </div>
  );
}
