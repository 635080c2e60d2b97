/** Route × role rows of the buying plan's page and API (see route-roles.test.ts). */
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

export const buyingPlanRouteRows: RouteRoleRow[] = [
  // Everyone signed in reads the plan.
  {
    file: "routes/buying-plan.tsx",
    method: "GET",
    path: "/buying-plan",
    expect: { anonymous: 302, signedIn: 200 },
  },
  // Buyers (and admins) make draft orders from it; an empty choice gets a message.
  {
    file: "routes/buying-plan.tsx",
    method: "POST",
    path: "/buying-plan",
    expect: { anonymous: 302, ...byCapability("orderPurchases", 400) },
  },
  {
    file: "routes/api.v1.buying-plan.ts",
    method: "GET",
    path: "/api/v1/buying-plan",
    expect: { anonymous: 401, signedIn: 200 },
  },
  // The plan's API takes GET only.
  {
    file: "routes/api.v1.buying-plan.ts",
    method: "POST",
    path: "/api/v1/buying-plan",
    expect: { anonymous: 401, signedIn: 405 },
  },
];
