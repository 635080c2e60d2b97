import type { Role } from "~/lib/roles";

export type Who = "anonymous" | Role;

/** One route × method of the route × role table (tests/integration/route-roles.test.ts). */
export interface RouteRoleRow {
  file: string;
  method: "GET" | "POST" | "PATCH" | "PUT";
  path: string;
  /** Expected status per caller; `signedIn` covers every role not named. */
  expect: Partial<Record<Who, number>> & { signedIn?: number };
}
