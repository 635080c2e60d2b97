/** Route × role rows of the printouts and CSV exports of issue 21 (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const exportRouteRows: RouteRoleRow[] = [
  // Anyone who reads the build order may print its pick list; no such order: 404.
  {
    file: "routes/build-order-pick-list.tsx",
    method: "GET",
    path: "/build-orders/999999999/pick-list",
    expect: { anonymous: 302, signedIn: 404 },
  },
  // Those who count stock (as a stocktake's printed sheet); no such location: 404.
  {
    file: "routes/location-count-sheet.tsx",
    method: "GET",
    path: "/stock/locations/NO-SUCH-BIN-X/count-sheet",
    expect: { anonymous: 302, ...byCapability("countStock", 404) },
  },
  // As the past imports page: anyone signed in; no such import: 404.
  {
    file: "routes/price-import-lines-export.ts",
    method: "GET",
    path: "/suppliers/imports/999999999/lines.csv",
    expect: { anonymous: 302, signedIn: 404 },
  },
  // As the insight page: anyone signed in.
  {
    file: "routes/insight-export.ts",
    method: "GET",
    path: "/insight/csv/stock-by-kind",
    expect: { anonymous: 302, signedIn: 200 },
  },
];
