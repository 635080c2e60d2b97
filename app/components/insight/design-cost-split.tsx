/**
 * Where the money per N·m goes: the stacked chart of the ranked designs, cheapest first,
 * with the designs it leaves out under it, and beside it the chart's figures as a table.
 */
import { useMemo } from "react";
import { InsightCsvLink } from "./insight-csv-link";
import { DataTable } from "~/components/data-table";
import type { DesignInsight } from "~/insight/design-insight.server";
import { costBasisText } from "../design/price-basis-note";
import { splitColumns } from "./design-columns";
import { costChartRows, type InsightDesignsData } from "./design-insight-text";
import { DesignsNotRanked } from "./designs-not-ranked";
import { lazyFigure } from "../lazy-figure";
import { keepServerDrawing } from "../server-drawing";

const InsightCostChart = keepServerDrawing(
  lazyFigure(
    () =>
      import("./insight-cost-chart").then((module) => module.InsightCostChart),
    { aspectRatio: "720 / 300" },
  ),
  "block",
);

type Ranking = Record<
  "ranked" | "incomplete" | "withoutTorque",
  DesignInsight[]
>;

export function DesignCostSplit({
  ranking,
  currency,
  basis,
}: {
  ranking: Ranking;
  currency: string;
  basis: InsightDesignsData["basis"];
}) {
  // One column list for every render: new cell functions would make React build
  // every cell again.
  const columns = useMemo(() => splitColumns(), []);
  return (
    <div className="grid items-start gap-6 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
      <div className="panel break-inside-avoid">
        <h3 className="mb-2 text-sm font-semibold">
          Where the money per N·m goes, cheapest first
        </h3>
        <InsightCostChart
          currency={currency}
          basis={costBasisText(basis)}
          rows={costChartRows(ranking.ranked)}
        />
        <DesignsNotRanked
          incomplete={ranking.incomplete}
          withoutTorque={ranking.withoutTorque}
          currency={currency}
        />
      </div>
      <div className="break-inside-avoid">
        <DataTable
          caption={`Cost per N·m by part, ${currency} per N·m at the ${costBasisText(basis)} (the chart's figures)`}
          columns={columns}
          rows={[
            ...ranking.ranked,
            ...ranking.incomplete,
            ...ranking.withoutTorque,
          ]}
        />
        <InsightCsvLink table="cost-per-nm" what="cost per N·m by part" />
        <p className="mt-1 text-xs text-graphite-500">
          In {currency} per N·m of rated torque; the five parts add up to the
          total exactly.
        </p>
      </div>
    </div>
  );
}
