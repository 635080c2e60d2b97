/** Route × role rows of the stocktake pages (see route-roles.test.ts). */
import { roles, type Role } from "~/lib/roles";
import { canReadStocktakes } from "~/stocktakes/stocktake-access";
import { byCapability, type RouteRoleRow } from "../support/route-role-row";

// No stocktake has this id: once the role check passes, the answer is 404.
const noStocktake = "/stocktakes/999999999";

/** Those who start, count or approve stocktakes read them (storekeepers, managers, admins); others 403. */
function byStocktakeReader(passed: number): Record<Role, number> {
  return Object.fromEntries(
    roles.map((role) => [
      role,
      canReadStocktakes({ roles: [role] }) ? passed : 403,
    ]),
  ) as Record<Role, number>;
}

export const stocktakeRouteRows: RouteRoleRow[] = [
  {
    file: "routes/stocktakes.tsx",
    method: "GET",
    path: "/stocktakes",
    expect: { anonymous: 302, ...byStocktakeReader(200) },
  },
  // An empty start form: field messages for those who may start one.
  {
    file: "routes/stocktakes.tsx",
    method: "POST",
    path: "/stocktakes",
    expect: { anonymous: 302, ...byCapability("startStocktakes", 400) },
  },
  {
    file: "routes/stocktake.tsx",
    method: "GET",
    path: noStocktake,
    expect: { anonymous: 302, ...byStocktakeReader(404) },
  },
  // Each step then needs its own capability (recount and approve: approveStocktakes; cancel: startStocktakes).
  {
    file: "routes/stocktake.tsx",
    method: "POST",
    path: noStocktake,
    expect: { anonymous: 302, ...byStocktakeReader(404) },
  },
  {
    file: "routes/stocktake-count.tsx",
    method: "GET",
    path: `${noStocktake}/count`,
    expect: { anonymous: 302, ...byCapability("countStock", 404) },
  },
  {
    file: "routes/stocktake-count.tsx",
    method: "POST",
    path: `${noStocktake}/count`,
    expect: { anonymous: 302, ...byCapability("countStock", 404) },
  },
  {
    file: "routes/stocktake-print.tsx",
    method: "GET",
    path: `${noStocktake}/print`,
    expect: { anonymous: 302, ...byCapability("countStock", 404) },
  },
];
