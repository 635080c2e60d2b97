/** Route × role rows of the purchase-order API (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

// No order has this id: once the role check passes, the answer is 404 (or 400 for a missing body).
const noOrder = "/api/v1/purchase-orders/999999999";

export const purchaseOrderRouteRows: RouteRoleRow[] = [
  // Everyone signed in reads orders; buyers (and admins) create them (no body: 400).
  {
    file: "routes/api.v1.purchase-orders.ts",
    method: "GET",
    path: "/api/v1/purchase-orders",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.purchase-orders.ts",
    method: "POST",
    path: "/api/v1/purchase-orders",
    expect: { anonymous: 401, ...byCapability("orderPurchases", 400) },
  },
  {
    file: "routes/api.v1.purchase-order.ts",
    method: "GET",
    path: noOrder,
    expect: { anonymous: 401, signedIn: 404 },
  },
  // The order takes GET and PATCH: a POST is 405 once the role check passes.
  {
    file: "routes/api.v1.purchase-order.ts",
    method: "POST",
    path: noOrder,
    expect: { anonymous: 401, ...byCapability("orderPurchases", 405) },
  },
  {
    file: "routes/api.v1.purchase-order.ts",
    method: "PATCH",
    path: noOrder,
    expect: { anonymous: 401, ...byCapability("orderPurchases", 400) },
  },
  ...(["send", "cancel", "close"] as const).flatMap((step): RouteRoleRow[] => [
    {
      file: `routes/api.v1.purchase-order-${step}.ts`,
      method: "POST",
      path: `${noOrder}/${step}`,
      expect: { anonymous: 401, ...byCapability("orderPurchases", 404) },
    },
    {
      file: `routes/api.v1.purchase-order-${step}.ts`,
      method: "GET",
      path: `${noOrder}/${step}`,
      expect: { anonymous: 401, signedIn: 405 },
    },
  ]),
];
