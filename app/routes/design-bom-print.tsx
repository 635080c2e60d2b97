import { createColumnHelper } from "~/lib/table-columns";
import { data } from "react-router";
import type { Route } from "./+types/design-bom-print";
import { requireUser } from "~/auth/guard.server";
import { PrintBar } from "~/components/print-page";
import { DataTable } from "~/components/data-table";
import {
  CostQueryForm,
  DesignCostFigures,
  perMotorText,
} from "~/components/design/cost-panel";
import { DesignCostSplit } from "~/components/design/cost-split";
import { DesignFieldsSummary } from "~/components/design/fields-summary";
import { DesignInsulationCaution } from "~/components/design/insulation-caution";
import { DesignWarningList } from "~/components/design/line-tables";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import { buildQuantity } from "~/designs/bom-csv";
import { costBasisLabels, costQuerySearch } from "~/designs/cost-basis";
import { readCostQuery } from "~/designs/design-page";
import { costingDay, loadDesignPage } from "~/designs/design-page.server";
import { designParams } from "~/designs/design-params";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { formatMass, formatSignificant } from "~/reference/quantity-display";
import { countText, moneyText, quantityText } from "~/lib/unit-text";

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const ids = designParams(params);
  const query = readCostQuery(new URL(request.url).searchParams);
  const page = ids ? await loadDesignPage(ids, query) : null;
  if (!page)
    throw data(
      { message: "There is no such design revision." },
      { status: 404 },
    );
  return {
    ...page,
    costQuery: query,
    day: costingDay(),
    /** Stock each line draws for the build, in its unit, rounded up as a build order reserves it. */
    buildQuantities: page.costing.lines.map((line) =>
      buildQuantity(line.perMotorQuantity, page.costing.quantity),
    ),
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: loaderData
      ? `BOM ${loaderData.revision.name} rev. ${loaderData.revision.revision} · Turnledger`
      : "BOM · Turnledger",
  },
];

type LoaderData = Route.ComponentProps["loaderData"];

interface BomRow {
  position: number;
  itemName: string;
  line: LoaderData["costing"]["lines"][number];
  forBuild: number;
}
const bomColumn = createColumnHelper<BomRow>();
const kindNames: Record<string, string> = {
  coil: "Coil",
  magnet: "Magnet",
  part: "Part",
};

function bomColumns(currency: string, quantity: number) {
  return [
    bomColumn.accessor("position", {
      header: "Line",
      meta: { numeric: true },
    }),
    bomColumn.display({
      id: "item",
      header: "Item",
      cell: ({ row }) => (
        <div>
          <div className="font-medium">{row.original.itemName}</div>
          <div className="text-xs text-graphite-500">
            {kindNames[row.original.line.kind] ?? row.original.line.kind} ·{" "}
            {row.original.line.sku}
          </div>
        </div>
      ),
    }),
    bomColumn.display({
      id: "perMotor",
      header: "Per motor",
      meta: { numeric: true },
      cell: ({ row }) => perMotorText(row.original.line),
    }),
    bomColumn.display({
      id: "forBuild",
      header: `For ${countText(quantity, "motor")}`,
      meta: { numeric: true },
      cell: ({ row }) =>
        quantityText(
          row.original.forBuild,
          row.original.line.unit,
          row.original.line.unit === "pcs" ? 0 : 3,
        ),
    }),
    bomColumn.display({
      id: "unitPrice",
      header: "Unit price",
      meta: { numeric: true },
      cell: ({ row }) =>
        moneyText(
          row.original.line.unitPrice,
          currency,
          row.original.line.unit,
        ),
    }),
    bomColumn.display({
      id: "cost",
      header: "Cost per motor",
      meta: { numeric: true },
      cell: ({ row }) =>
        row.original.line.cost === null
          ? "no price"
          : moneyText(row.original.line.cost, currency),
    }),
    bomColumn.display({
      id: "source",
      header: "Price source",
      cell: ({ row }) => (
        <span className="text-xs">
          {row.original.line.priceSource ?? "no price"}
        </span>
      ),
    }),
  ];
}

interface CoilRow {
  position: number;
  itemName: string;
  figures: LoaderData["costing"]["coils"][number];
  input: LoaderData["lines"][number]["input"];
}
const coilColumn = createColumnHelper<CoilRow>();
const coilColumns = [
  coilColumn.accessor("position", { header: "Line", meta: { numeric: true } }),
  coilColumn.display({
    id: "wire",
    header: "Wire and winding",
    cell: ({ row }) => {
      const input = row.original.input;
      return (
        <div>
          <div className="font-medium">{row.original.itemName}</div>
          {input.kind === "coil" ? (
            <div className="text-xs text-graphite-700">
              {countText(input.turns, "turn")} ×{" "}
              {formatQuantity(input.strandsInHand, "in hand")} ·{" "}
              {countText(input.coilsPerMotor, "coil")} · active{" "}
              {formatQuantity(input.activeLengthMm, "mm", 1)} · end turn{" "}
              {formatQuantity(input.endTurnLengthMm, "mm", 1)} · leads{" "}
              {formatQuantity(input.leadLengthMm, "mm", 0)} · scrap{" "}
              {formatQuantity(input.scrapPercent, "%", 1)}
            </div>
          ) : null}
        </div>
      );
    },
  }),
  coilColumn.display({
    id: "copper",
    header: "Copper per motor",
    meta: { numeric: true },
    cell: ({ row }) =>
      formatQuantity(row.original.figures.copperLengthM, "m", 3),
  }),
  coilColumn.display({
    id: "drawn",
    header: "Drawn from stock",
    meta: { numeric: true },
    cell: ({ row }) =>
      `${formatMass(row.original.figures.drawnMassKg)}${row.original.figures.massBasis === "bare" ? " (bare conductor)" : ""}`,
  }),
  coilColumn.display({
    id: "r",
    header: "R per coil, 20 °C / hot",
    meta: { numeric: true },
    cell: ({ row }) =>
      `${formatSignificant(row.original.figures.resistance20PerCoilOhm, "Ω", 4)} / ${formatSignificant(row.original.figures.resistancePerCoilOhm, "Ω", 4)} at ${formatQuantity(row.original.figures.operatingTemperatureC, "°C", 0)}`,
  }),
  coilColumn.display({
    id: "active",
    header: "Active share",
    meta: { numeric: true },
    cell: ({ row }) =>
      formatQuantity(row.original.figures.activeShare * 100, "%", 1),
  }),
  coilColumn.display({
    id: "loss",
    header: "Copper loss",
    meta: { numeric: true },
    cell: ({ row }) =>
      row.original.figures.copperLossW === null
        ? "—"
        : formatQuantity(row.original.figures.copperLossW, "W", 2),
  }),
];

/** The revision's bill of materials on paper: every line with its price and source, the coils, the split. */
export default function DesignBomPrint({ loaderData }: Route.ComponentProps) {
  const { revision, lines, costing, costQuery, day, buildQuantities } =
    loaderData;
  const base = `/designs/${revision.designId}/revisions/${revision.revision}`;
  const query = costQuerySearch(costQuery);
  const bomRows: BomRow[] = costing.lines.map((line, index) => ({
    position: index + 1,
    itemName: lines[index]?.itemName ?? "",
    line,
    forBuild: buildQuantities[index] ?? 0,
  }));
  const coilRows: CoilRow[] = costing.coils.flatMap((figures) => {
    const line = lines[figures.line - 1];
    return line
      ? [
          {
            position: figures.line,
            itemName: line.itemName,
            figures,
            input: line.input,
          },
        ]
      : [];
  });
  const hasMagnets = lines.some((line) => line.kind === "magnet");

  return (
    <div className="space-y-6">
      <PrintBar back={{ to: `${base}${query}`, text: "Back to the design" }} />
      <div className="print:hidden">
        <CostQueryForm query={costQuery} />
      </div>

      <header className="border-b border-rule pb-4">
        <p className="text-sm text-graphite-500">
          Bill of materials · Turnledger
        </p>
        <h1 className="text-2xl font-semibold">
          {revision.name}, revision {revision.revision}
        </h1>
        <p className="mt-1 text-sm text-graphite-700">
          {revision.motorType ? `${revision.motorType} · ` : ""}
          {revision.status === "released"
            ? `released ${formatDateTime(revision.releasedAt)}`
            : "DRAFT: not released, may still change"}{" "}
          · costed for {countText(costing.quantity, "motor")} at the{" "}
          {costBasisLabels[costing.basis].toLowerCase()}, prices of {day} (UTC),
          in {costing.currency}
        </p>
        {revision.description ? (
          <p className="mt-2 text-sm">{revision.description}</p>
        ) : null}
      </header>

      <DesignFieldsSummary revision={revision} />

      <section aria-labelledby="bom-heading" className="space-y-2">
        <h2 id="bom-heading" className="text-lg font-semibold">
          Lines
        </h2>
        <DataTable
          caption="Bill of materials: each line per motor and for the build, with its price and source"
          columns={bomColumns(costing.currency, costing.quantity)}
          rows={bomRows}
          emptyText="This revision has no lines."
        />
        {!costing.complete ? (
          <p className="text-sm font-medium text-caution">
            Incomplete: lines without a price are left out of the cost.
          </p>
        ) : null}
      </section>

      {coilRows.length > 0 ? (
        <section aria-labelledby="coil-figures-heading" className="space-y-2">
          <h2 id="coil-figures-heading" className="text-lg font-semibold">
            Coils
          </h2>
          <DataTable
            caption="Coil figures per motor"
            columns={coilColumns}
            rows={coilRows}
          />
        </section>
      ) : null}

      <DesignWarningList
        warnings={costing.warnings}
        label="Checks of the design"
      />

      <section
        aria-labelledby="print-cost-heading"
        className="space-y-4 break-inside-avoid"
      >
        <h2 id="print-cost-heading" className="text-lg font-semibold">
          Cost per motor
        </h2>
        <DesignCostFigures
          costing={costing}
          torqueBasis={revision.torqueBasis}
        />
        <DesignCostSplit
          split={costing.split}
          currency={costing.currency}
          id="print-cost-split"
        />
      </section>

      <DesignInsulationCaution insulationClassC={revision.insulationClassC} />
      {hasMagnets ? <MagnetHandlingCaution /> : null}
    </div>
  );
}
