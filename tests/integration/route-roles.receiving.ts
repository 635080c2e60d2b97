/**
 * Route × role rows of receiving against purchase orders (see route-roles.test.ts):
 * storekeepers (and admins) receive; everyone signed in is told which method the API takes.
 * A POST without a JSON body answers 400 after the role check, before any order is read.
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const receivingRouteRows: RouteRoleRow[] = [
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
