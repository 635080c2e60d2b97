/**
 * Route × role rows of the cost insight page and API (see route-roles.test.ts).
 *
 * Every signed-in role may read the insight: the product's role table lets everyone read
 * stock, designs and costs (the design costing API is open to all signed-in people too).
 * A bad what-if is refused (400) only after the sign-in check: anonymous callers get 401
 * from the API whatever the query; the page shows the bad field beside its box (200).
 */
import type { RouteRoleRow } from "../support/route-role-row";

export const insightRouteRows: RouteRoleRow[] = [
  {
    file: "routes/insight.tsx",
    method: "GET",
    path: "/insight",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/insight.tsx",
    method: "GET",
    path: "/insight?copperBase=not-a-price",
    expect: { anonymous: 302, signedIn: 200 },
  },
  {
    file: "routes/api.v1.insight-designs.ts",
    method: "GET",
    path: "/api/v1/insight/designs?copperBase=10.5&quantity=100",
    expect: { anonymous: 401, signedIn: 200 },
  },
  {
    file: "routes/api.v1.insight-designs.ts",
    method: "GET",
    path: "/api/v1/insight/designs?copperBase=not-a-price",
    expect: { anonymous: 401, signedIn: 400 },
  },
  {
    file: "routes/api.v1.insight-stock-value.ts",
    method: "GET",
    path: "/api/v1/insight/stock-value",
    expect: { anonymous: 401, signedIn: 200 },
  },
  // Read-only: other methods answer 405 after the sign-in check.
  {
    file: "routes/api.v1.insight-designs.ts",
    method: "POST",
    path: "/api/v1/insight/designs",
    expect: { anonymous: 401, signedIn: 405 },
  },
  {
    file: "routes/api.v1.insight-stock-value.ts",
    method: "POST",
    path: "/api/v1/insight/stock-value",
    expect: { anonymous: 401, signedIn: 405 },
  },
];
