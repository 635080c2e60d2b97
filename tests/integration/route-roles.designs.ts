/** Route × role rows of the design pages and API (see route-roles.test.ts). */
import type { RouteRoleRow } from "../support/route-role-row";

export const designRouteRows: RouteRoleRow[] = [];
