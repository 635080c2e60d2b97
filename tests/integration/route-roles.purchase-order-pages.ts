/** Route × role rows of the purchase-order pages (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

// No order has this id: once the role check passes, the answer is 404.
const noOrder = "/purchase-orders/999999999";

export const purchaseOrderPageRows: RouteRoleRow[] = [
  // Everyone signed in reads orders; buyers (and admins) write them.
  {
    file: "routes/purchase-orders.tsx",
    method: "GET",
    path: "/purchase-orders",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/purchase-order-new.tsx",
    method: "GET",
    path: "/purchase-orders/new",
    expect: { anonymous: 302, ...byCapability("orderPurchases", 200) },
  },
  // An empty form: field messages, nothing written.
  {
    file: "routes/purchase-order-new.tsx",
    method: "POST",
    path: "/purchase-orders/new",
    expect: { anonymous: 302, ...byCapability("orderPurchases", 400) },
  },
  {
    file: "routes/purchase-order.tsx",
    method: "GET",
    path: noOrder,
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/purchase-order.tsx",
    method: "POST",
    path: noOrder,
    expect: { anonymous: 302, ...byCapability("orderPurchases", 404) },
  },
  {
    file: "routes/purchase-order-print.tsx",
    method: "GET",
    path: `${noOrder}/print`,
    expect: { anonymous: 302, signedIn: 404 },
  },
];
