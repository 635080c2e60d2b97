/**
 * The build order an address names ("/build-orders/12", "/api/v1/build-orders/12"), read
 * one way for the page and the API. Pure.
 */
import { idFromText } from "~/lib/search-params";

/**
 * The order id of the path segment; otherwise throws what `refuse` makes of the
 * not-found text (the page throws a 404 page, the API a 404 JSON answer).
 */
export function buildOrderIdFromPath(
  value: string | undefined,
  refuse: (message: string) => unknown,
): number {
  const id = idFromText(value);
  if (id === null) throw refuse(`No build order "${value ?? ""}".`);
  return id;
}
