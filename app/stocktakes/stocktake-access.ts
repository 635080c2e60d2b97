/**
 * Who reads stocktakes: whoever starts, counts or approves them (storekeepers,
 * managers, admins). Each step then needs its own capability (app/lib/capabilities.ts).
 * Pure: pages and the guard below both ask it.
 */
import { userCan, type Capability } from "~/lib/capabilities";
import type { Role } from "~/lib/roles";

export const stocktakeCapabilities = [
  "startStocktakes",
  "countStock",
  "approveStocktakes",
] as const satisfies readonly Capability[];

export function canReadStocktakes(
  user: { roles: readonly Role[] } | null | undefined,
): boolean {
  return stocktakeCapabilities.some((capability) => userCan(user, capability));
}

export const stocktakeReadersMessage =
  "Stocktakes are for the roles storekeeper or manager.";
