/** The purchase-order list's filters: one status (or all) as links, one supplier (or all) as a choice. */
import { Form, Link } from "react-router";
import { purchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
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
    <div className="flex flex-wrap items-end justify-between gap-3">
      <nav aria-label="Filter by status">
        <ul className="flex flex-wrap gap-2 text-sm">
          {[undefined, ...purchaseOrderStatuses].map((status) => {
            const current = status === filter.status;
            return (
              <li key={status ?? "all"}>
                <Link
                  to={purchaseOrderListHref({ ...filter, status })}
                  aria-current={current ? "page" : undefined}
                  className={`inline-flex min-h-9 items-center rounded-md border px-3 font-medium ${
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
      <Form
        method="get"
        aria-label="Filter by supplier"
        className="flex items-end gap-2"
      >
        {filter.status ? (
          <input type="hidden" name="status" value={filter.status} />
        ) : null}
        <div>
          <label htmlFor="order-supplier-filter" className="field-label">
            Supplier
          </label>
          <select
            id="order-supplier-filter"
            name="supplier"
            defaultValue={filter.supplierId ?? ""}
            className="field-input min-w-56"
          >
            <option value="">All suppliers</option>
            {suppliers.map((supplier) => (
              <option key={supplier.id} value={supplier.id}>
                {supplier.name}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className="button-quiet min-h-10">
          Show
        </button>
      </Form>
    </div>
  );
}
