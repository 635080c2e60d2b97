/** The build orders a lot went into, issues net of returns, with its CSV download. */
import { DataTable } from "~/components/data-table";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import type { LotUse, OtherIssues } from "~/lots/where-used.server";
import { lotUseColumns } from "./lot-columns";

export function LotWhereUsedPanel({
  lotId,
  lotNumber,
  unit,
  uses,
  otherIssues,
}: {
  lotId: number;
  lotNumber: string;
  unit: string;
  uses: LotUse[];
  otherIssues: OtherIssues;
}) {
  return (
    <section aria-labelledby="where-used-heading" className="space-y-2">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="where-used-heading" className="text-lg font-semibold">
          Where it was used
        </h2>
        <a
          href={`/stock/lots/${lotId}/where-used.csv`}
          download
          className="text-sm text-copper-700 underline-offset-2 hover:underline"
        >
          Download as CSV
        </a>
      </div>
      <DataTable
        caption={`Build orders that drew from lot ${lotNumber}`}
        columns={lotUseColumns}
        rows={uses}
        emptyText="No build order has drawn from this lot."
      />
      {otherIssues.count > 0 ? (
        <p className="text-sm text-graphite-700">
          Also issued without a build order: {otherIssues.count}{" "}
          {otherIssues.count === 1 ? "issue" : "issues"},{" "}
          {formatStockQuantity(otherIssues.quantity, unit)} (see the item's
          movements).
        </p>
      ) : null}
    </section>
  );
}
