import type { Role } from "~/lib/roles";
import { demoPeople } from "./demo-people";

/**
 * The id the seed gives the demo person whose first role is `role`:
 * "demo-02-buyer". The demo modules record their work under these people.
 */
export function demoPersonId(role: Role): string {
  const index = demoPeople.findIndex((person) => person.roles[0] === role);
  if (index === -1) throw new Error(`The demo has no ${role}.`);
  return `demo-${String(index + 1).padStart(2, "0")}-${role}`;
}
