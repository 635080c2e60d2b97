/**
 * What each step of a build order needs (admins take any), shared by the order page and
 * the API so the two cannot disagree. Pure.
 */
import type { Capability } from "~/lib/capabilities";
import type { BuildOrderIntent } from "./build-order-forms";

/** What each step of the order needs (app/lib/capabilities.ts), by the page form's intent. */
export const buildOrderStepCapabilities = {
  reserve: "runBuildOrders",
  cancel: "runBuildOrders",
  complete: "runBuildOrders",
  quantity: "runBuildOrders",
  plannedStart: "runBuildOrders",
  issue: "issueToBuildOrders",
} as const satisfies Record<BuildOrderIntent, Capability>;

/**
 * The steps the API takes at POST /api/v1/build-orders/:orderId/:step (a new number of
 * motors or planned start is a PATCH of the order itself).
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
