/**
 * Route × role rows of labels and scanning (see route-roles.test.ts): storekeepers (and
 * admins) print labels; everyone signed in may look a scanned code up and follow it. Each
 * row names nothing that exists, so it answers the same on any database: 404 after the
 * role check.
 */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const labelRouteRows: RouteRoleRow[] = [
  {
    file: "routes/labels-lots.tsx",
    method: "GET",
    path: "/labels/lots?ids=2147483647",
    expect: { anonymous: 302, ...byCapability("printLabels", 404) },
  },
  {
    file: "routes/label-lot.tsx",
    method: "GET",
    path: "/labels/lots/2147483647",
    expect: { anonymous: 302, ...byCapability("printLabels", 404) },
  },
  {
    file: "routes/labels-locations.tsx",
    method: "GET",
    path: "/labels/locations?codes=NO-SUCH-BIN-Q",
    expect: { anonymous: 302, ...byCapability("printLabels", 404) },
  },
  {
    file: "routes/label-location.tsx",
    method: "GET",
    path: "/labels/locations/NO-SUCH-BIN-Q",
    expect: { anonymous: 302, ...byCapability("printLabels", 404) },
  },
  {
    file: "routes/scan.tsx",
    method: "GET",
    path: "/scan/L2147483647",
    expect: { anonymous: 302, signedIn: 404 },
  },
  {
    file: "routes/api.v1.scan-lookup.ts",
    method: "GET",
    path: "/api/v1/scan-lookup?code=L2147483647",
    expect: { anonymous: 401, signedIn: 404 },
  },
  {
    file: "routes/api.v1.scan-lookup.ts",
    method: "POST",
    path: "/api/v1/scan-lookup?code=L1",
    expect: { anonymous: 401, signedIn: 405 },
  },
];
