/**
 * Route × role rows of what is on order (see route-roles.test.ts): the late order lines
 * page, which everyone signed in reads.
 */
import type { RouteRoleRow } from "../support/route-role-row";

export const onOrderRouteRows: RouteRoleRow[] = [
  {
    file: "routes/purchase-orders-late.tsx",
    method: "GET",
    path: "/purchase-orders/late",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/purchase-orders-late.tsx",
    method: "GET",
    path: "/purchase-orders/late?page=999999",
    expect: { anonymous: 302, signedIn: 200 },
  },
];
