/** Where the item is: its on hand and reserved by location and lot (a spool's tare too). */
import { DataTable } from "~/components/data-table";
import { balanceColumns, type ItemBalanceRow } from "~/stock/item-page-columns";

export function ItemBalancesPanel({
  sku,
  unit,
  isWire,
  balances,
}: {
  sku: string;
  unit: string;
  isWire: boolean;
  balances: ItemBalanceRow[];
}) {
  return (
    <section aria-labelledby="balances-heading" className="space-y-2">
      <h2 id="balances-heading" className="text-lg font-semibold">
        Where it is
      </h2>
      <DataTable
        caption={`On hand of ${sku} by location and lot`}
        columns={balanceColumns(unit, isWire)}
        rows={balances}
        emptyText="Nothing on hand."
      />
    </section>
  );
}
