/** "Issued to the build": every issue to the order, newest first. */
import { DataTable } from "~/components/data-table";
import { issuedStockColumns, type IssuedStock } from "./issued-stock-columns";

export function IssuedStockPanel({
  reference,
  issues,
}: {
  reference: string;
  issues: IssuedStock[];
}) {
  return (
    <section aria-labelledby="issues-heading" className="space-y-2">
      <h2 id="issues-heading" className="text-lg font-semibold">
        Issued to the build
      </h2>
      <DataTable
        caption={`Stock issued to ${reference}`}
        columns={issuedStockColumns}
        rows={issues}
      />
    </section>
  );
}
