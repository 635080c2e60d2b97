/**
 * Who takes each step of a build order (admins take any), shared by the order page and
 * the API so the two cannot disagree. Pure.
 */
import type { Role } from "~/lib/roles";
import type { BuildOrderIntent } from "./build-order-forms";

/** The role each step of the order needs, by the page form's intent. */
export const buildOrderStepRoles = {
  reserve: ["builder"],
  cancel: ["builder"],
  complete: ["builder"],
  quantity: ["builder"],
  issue: ["storekeeper"],
} as const satisfies Record<BuildOrderIntent, readonly Role[]>;

/**
 * The steps the API takes at POST /api/v1/build-orders/:orderId/:step (a new number of
 * motors is a PATCH of the order itself).
 */
export const buildOrderApiSteps = [
  "reserve",
  "issue",
  "cancel",
  "complete",
] as const satisfies readonly BuildOrderIntent[];
export type BuildOrderApiStep = (typeof buildOrderApiSteps)[number];

/** The API step a path segment names, or null. */
export function buildOrderApiStepOf(
  value: string | undefined,
): BuildOrderApiStep | null {
  return (buildOrderApiSteps as readonly string[]).includes(value ?? "")
    ? (value as BuildOrderApiStep)
    : null;
}
