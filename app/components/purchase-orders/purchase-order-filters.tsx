/** The purchase-order list's filters: one status (or all) as links, then the shared search box with the supplier. */
import { Link } from "react-router";
import {
  FilterChoice,
  ListSearchForm,
} from "~/components/lists/list-search-form";
import { purchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import { isFiltered } from "~/lib/list-filters";
import {
  purchaseOrderListHref,
  type PurchaseOrderListFilter,
} from "~/purchase-orders/purchase-order-list-address";
import { purchaseOrderStatusLabels } from "~/purchase-orders/purchase-order-status";

export function PurchaseOrderFilters({
  filter,
  suppliers,
}: {
  filter: PurchaseOrderListFilter;
  suppliers: { id: number; name: string }[];
}) {
  return (
    <div className="space-y-3">
      <nav aria-label="Filter by status">
        <ul className="flex flex-wrap gap-2 text-sm">
          {[undefined, ...purchaseOrderStatuses].map((status) => {
            const current = status === filter.status;
            return (
              <li key={status ?? "all"}>
                <Link
                  to={purchaseOrderListHref({ ...filter, status })}
                  aria-current={current ? "page" : undefined}
                  className={`inline-flex min-h-9 items-center rounded-md border px-3 font-medium touch:min-h-11 touch:min-w-11 touch:justify-center ${
                    current
                      ? "border-graphite-800 bg-graphite-800 text-white"
                      : "border-graphite-300 bg-sheet text-graphite-800 hover:border-graphite-500"
                  }`}
                >
                  {status ? purchaseOrderStatusLabels[status] : "All"}
                </Link>
              </li>
            );
          })}
        </ul>
      </nav>
      <ListSearchForm
        path="/purchase-orders"
        label="Search the purchase orders"
        search={{ value: filter.search, placeholder: "PO-000123 or supplier" }}
        filtered={isFiltered({
          search: filter.search,
          supplier: filter.supplierId,
        })}
        keep={{ status: filter.status }}
      >
        <FilterChoice
          name="supplier"
          label="Supplier"
          value={filter.supplierId ? String(filter.supplierId) : undefined}
          allLabel="All suppliers"
          options={suppliers.map((supplier) => ({
            value: String(supplier.id),
            label: supplier.name,
          }))}
        />
      </ListSearchForm>
    </div>
  );
}
