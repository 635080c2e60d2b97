/** The lots that went into a build order (issues net of returns), with its CSV download. */
import { DataTable } from "~/components/data-table";
import type { BuildOrderLot } from "~/lots/where-used.server";
import { buildOrderLotColumns } from "./lot-columns";

export function BuildOrderLotsPanel({
  orderId,
  reference,
  lots,
}: {
  orderId: number;
  reference: string;
  lots: BuildOrderLot[];
}) {
  return (
    <section aria-labelledby="order-lots-heading" className="space-y-2">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id="order-lots-heading" className="text-lg font-semibold">
          Lots in this build
        </h2>
        <a
          href={`/build-orders/${orderId}/lots.csv`}
          download
          className="text-sm text-copper-700 underline-offset-2 hover:underline"
        >
          Download as CSV
        </a>
      </div>
      <DataTable
        caption={`Lots that went into ${reference}`}
        columns={buildOrderLotColumns}
        rows={lots}
        emptyText="No lot has been issued to this build yet."
      />
    </section>
  );
}
