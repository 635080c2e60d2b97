import { userCan, type Capability } from "~/lib/capabilities";
import { roles, type Role } from "~/lib/roles";
import type { HandlerMethod } from "./route-handlers";

export type Who = "anonymous" | Role;
/** A person holding two roles, e.g. "buyer+storekeeper". */
export type RolePair = `${Role}+${Role}`;
export type Caller = Who | RolePair;

/** One route × method of the route × role table (tests/integration/route-roles.test.ts). */
export interface RouteRoleRow {
  file: string;
  method: HandlerMethod;
  path: string;
  /**
   * Expected status per caller; `signedIn` covers every role not named. A
   * person with two roles gets what the more trusted of them gets, unless the
   * row names the pair.
   */
  expect: Partial<Record<Caller, number>> & { signedIn?: number };
  /** The request ends the session it is sent with: each caller signs in afresh for it. */
  endsSession?: boolean;
}

/**
 * The expectations of a row whose route checks a capability, read from the one
 * table the guard and the pages read (app/lib/capabilities.ts): `passed` — what
 * the route answers once the check passes — for each role that has the
 * capability (admins have all), 403 for each role that has not. Every role is
 * named, so a route whose guard asks the wrong capability answers differently.
 */
export function byCapability(
  capability: Capability,
  passed: number,
): Record<Role, number> {
  return Object.fromEntries(
    roles.map((role) => [
      role,
      userCan({ roles: [role] }, capability) ? passed : 403,
    ]),
  ) as Record<Role, number>;
}

/**
 * The people with several roles the table also asks as: every pair of the roles
 * below admin (admins pass every role check by themselves).
 */
export const rolePairs: RolePair[] = roles
  .filter((role) => role !== "admin")
  .flatMap((first, index, others) =>
    others.slice(index + 1).map((second): RolePair => `${first}+${second}`),
  );

export function rolesOf(caller: Exclude<Caller, "anonymous">): Role[] {
  return caller.split("+") as Role[];
}

/**
 * The status a caller should get. A pair gets the union of its roles: what the
 * roles that pass the role check get (they must agree), or 403 when none does.
 */
export function expectedStatus(row: RouteRoleRow, caller: Caller): number {
  const named = row.expect[caller];
  if (named !== undefined) return named;
  const where = `${row.method} ${row.path}`;
  if (caller === "anonymous") throw new Error(`no expectation for ${where}`);
  const held = rolesOf(caller);
  if (held.length === 1) {
    const status = row.expect.signedIn;
    if (status === undefined)
      throw new Error(`no expectation for ${caller} on ${where}`);
    return status;
  }
  const passing = [
    ...new Set(
      held
        .map((role) => expectedStatus(row, role))
        .filter((status) => status !== 403),
    ),
  ];
  if (passing.length > 1)
    throw new Error(
      `${caller} on ${where}: its roles get ${passing.join(" and ")}; name the pair in the row`,
    );
  return passing[0] ?? 403;
}
