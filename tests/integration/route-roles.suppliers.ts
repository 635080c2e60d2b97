/**
 * Route × role rows of one supplier's page and API, and the best-prices list (see
 * route-roles.test.ts). Everyone signed in reads suppliers and prices; buyers (and admins)
 * change a supplier. No supplier has id 2147483647, so readers get 404 after the role
 * check and buyers get 404 (page) or 400 (API, no JSON body) before anything changes.
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const supplierRouteRows: RouteRoleRow[] = [
  {
    file: "routes/supplier.tsx",
    method: "GET",
    path: "/suppliers/2147483647",
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/supplier.tsx",
    method: "POST",
    path: "/suppliers/2147483647",
    expect: { anonymous: 302, ...byCapability("keepSuppliers", 404) },
  },
  {
    file: "routes/best-prices.tsx",
    method: "GET",
    path: "/best-prices?search=cu&quantity=25",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/api.v1.supplier.ts",
    method: "GET",
    path: "/api/v1/suppliers/2147483647",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.supplier.ts",
    method: "PATCH",
    path: "/api/v1/suppliers/2147483647",
    expect: { anonymous: 401, ...byCapability("keepSuppliers", 400) },
  },
  {
    file: "routes/api.v1.supplier.ts",
    method: "POST",
    path: "/api/v1/suppliers/2147483647",
    expect: { anonymous: 401, ...byCapability("keepSuppliers", 405) },
  },
];
