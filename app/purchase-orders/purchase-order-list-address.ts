/** The purchase-order list's address: the status and supplier it is filtered by, and the page. Pure. */
import {
  purchaseOrderStatuses,
  type PurchaseOrderStatus,
} from "~/db/tables/purchase-order-enums";
import { idFromText, pageFromSearch } from "~/lib/search-params";

export interface PurchaseOrderListFilter {
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
  return {
    filter: {
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
  const params = new URLSearchParams();
  if (filter.status) params.set("status", filter.status);
  if (filter.supplierId) params.set("supplier", String(filter.supplierId));
  if (page > 1) params.set("page", String(page));
  const query = params.toString();
  return `/purchase-orders${query ? `?${query}` : ""}`;
}
