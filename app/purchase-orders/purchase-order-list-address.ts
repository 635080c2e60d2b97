/** The purchase-order list's address: the status and supplier it is filtered by, and the page. Pure. */
import {
  purchaseOrderStatuses,
  type PurchaseOrderStatus,
} from "~/db/tables/purchase-order-enums";
import { listHref, searchMaxLength } from "~/lib/list-filters";
import { idFromText, pageFromSearch } from "~/lib/search-params";

export interface PurchaseOrderListFilter {
  /** An order number ("PO-000123", "123") or part of the supplier's name. */
  search?: string;
  status?: PurchaseOrderStatus;
  supplierId?: number;
}

/** The filter and page an address asks for; anything not understood is left out (all orders, page 1). */
export function purchaseOrderListQueryFrom(params: URLSearchParams): {
  filter: PurchaseOrderListFilter;
  page: number;
} {
  const status = params.get("status") ?? "";
  const supplierId = idFromText(params.get("supplier"));
  const search = params.get("search")?.trim().slice(0, searchMaxLength);
  return {
    filter: {
      search: search || undefined,
      status: (purchaseOrderStatuses as readonly string[]).includes(status)
        ? (status as PurchaseOrderStatus)
        : undefined,
      supplierId: supplierId ?? undefined,
    },
    page: pageFromSearch(params.get("page")),
  };
}

/** "/purchase-orders?status=sent&supplier=4&page=2", leaving out the defaults (all, page 1). */
export function purchaseOrderListHref(
  filter: PurchaseOrderListFilter,
  page = 1,
): string {
  return listHref("/purchase-orders", {
    search: filter.search,
    status: filter.status,
    supplier: filter.supplierId,
    page,
  });
}
