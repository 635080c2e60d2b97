/** Route × role rows of the cost insight page and API (see route-roles.test.ts). */
import type { RouteRoleRow } from "../support/route-role-row";

export const insightRouteRows: RouteRoleRow[] = [];
