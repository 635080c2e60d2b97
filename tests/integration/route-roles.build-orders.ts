/** Route × role rows of the build-order pages and API (see route-roles.test.ts). */
import type { RouteRoleRow } from "../support/route-role-row";

export const buildOrderRouteRows: RouteRoleRow[] = [];
