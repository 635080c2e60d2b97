/**
 * Route × role rows of receiving against purchase orders (see route-roles.test.ts):
 * storekeepers (and admins) receive, on the page and through the API; everyone signed in is
 * told which method the API takes.
 * A POST without a JSON body answers 400 after the role check, before any order is read.
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const receivingRouteRows: RouteRoleRow[] = [
  {
    file: "routes/stock-receive.tsx",
    method: "GET",
    path: "/stock/receive",
    expect: { anonymous: 302, ...byCapability("receivePurchases", 200) },
  },
  // An empty form: no lines received, a field message (400) after the role check.
  {
    file: "routes/stock-receive.tsx",
    method: "POST",
    path: "/stock/receive",
    expect: { anonymous: 302, ...byCapability("receivePurchases", 400) },
  },
  {
    file: "routes/api.v1.purchase-order-receipts.ts",
    method: "GET",
    path: "/api/v1/purchase-orders/2147483647/receipts",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.purchase-order-receipts.ts",
    method: "POST",
    path: "/api/v1/purchase-orders/2147483647/receipts",
    expect: { anonymous: 401, ...byCapability("receivePurchases", 400) },
  },
];
