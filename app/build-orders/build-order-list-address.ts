/** The build-order list's address: the status it is filtered by and the page. Pure. */
import { buildOrderStatuses } from "~/db/tables/build-order-enums";
import type { BuildOrderStatus } from "./build-order-status";

/** The status a `?status=` value names, or undefined for any other text. */
export function buildOrderStatusFrom(
  value: string | null,
): BuildOrderStatus | undefined {
  return (buildOrderStatuses as readonly string[]).includes(value ?? "")
    ? (value as BuildOrderStatus)
    : undefined;
}

/** "/build-orders?status=reserved&page=2", leaving out what is the default (all, page 1). */
export function buildOrderListHref(
  status: string | null | undefined,
  page = 1,
): string {
  const params = new URLSearchParams();
  if (status) params.set("status", status);
  if (page > 1) params.set("page", String(page));
  const query = params.toString();
  return `/build-orders${query ? `?${query}` : ""}`;
}
