/**
 * Route × role rows of the lot pages, certificates, where-used downloads and the lot API
 * (see route-roles.test.ts): everyone signed in reads; storekeepers, buyers (and admins)
 * attach certificates. The paths name no lot or order that exists, so a caller that passes
 * the guard gets 404; the API tells the methods it takes (405).
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

const noLot = "/stock/lots/2147483647";
const noOrder = 2_147_483_647;

export const lotRouteRows: RouteRoleRow[] = [
  {
    file: "routes/stock-lot.tsx",
    method: "GET",
    path: noLot,
    expect: { anonymous: 302, signedIn: 404 },
  },
  // The certificate upload: the guard first, then the lot (none here).
  {
    file: "routes/stock-lot.tsx",
    method: "POST",
    path: noLot,
    expect: { anonymous: 302, ...byCapability("attachLotDocuments", 404) },
  },
  {
    file: "routes/stock-lot-document.ts",
    method: "GET",
    path: `${noLot}/documents/1`,
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/stock-lot-where-used.ts",
    method: "GET",
    path: `${noLot}/where-used.csv`,
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/build-order-lots-export.ts",
    method: "GET",
    path: `/build-orders/${noOrder}/lots.csv`,
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/api.v1.lot-where-used.ts",
    method: "GET",
    path: "/api/v1/lots/NO-SUCH-LOT-X/where-used",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.lot-where-used.ts",
    method: "POST",
    path: "/api/v1/lots/NO-SUCH-LOT-X/where-used",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.lot-documents.ts",
    method: "GET",
    path: "/api/v1/lots/NO-SUCH-LOT-X/documents",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.lot-documents.ts",
    method: "POST",
    path: "/api/v1/lots/NO-SUCH-LOT-X/documents",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.build-order-lots.ts",
    method: "GET",
    path: `/api/v1/build-orders/${noOrder}/lots`,
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.build-order-lots.ts",
    method: "POST",
    path: `/api/v1/build-orders/${noOrder}/lots`,
    expect: { anonymous: 401, signedIn: 405 },
  },
];
