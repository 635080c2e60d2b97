/**
 * The one table of who may do what: each capability names the roles that have it
 * (admins have every capability, as the product brief's role table says). The server
 * checks with requireCapability / refuseUnless (app/auth/guard.server.ts), pages show
 * controls with userCan, and the route × role test (tests/integration/route-roles.test.ts)
 * expects its allow/deny answers from this same table.
 *
 * The order of each list is the order the refusal names them in: "This needs the role
 * buyer or storekeeper."
 */
import { userHasRole, type Role } from "./roles";

export const capabilityRoles = {
  /** Record receipts, issues, returns, transfers, counts and scrap. */
  recordStock: ["storekeeper"],
  /** Add items, rename and archive them. */
  keepCatalogue: ["buyer"],
  /** Set an item's reorder point and reorder quantity. */
  keepReorderLevels: ["buyer", "storekeeper"],
  /** Add and change suppliers. */
  keepSuppliers: ["buyer"],
  /** Import suppliers' price lists. */
  importPriceLists: ["buyer"],
  /** Keep the metal base price and the currency rates. */
  keepPrices: ["buyer"],
  /** Hear about low stock (alert e-mails, the open alerts on the start page). */
  hearLowStockAlerts: ["buyer"],
  /** Draft purchase requests from the open alerts. */
  draftPurchaseRequests: ["buyer"],
  /** Create, edit, send, cancel and close purchase orders; turn the buying plan into orders. */
  orderPurchases: ["buyer"],
  /** Book deliveries against purchase orders. */
  receivePurchases: ["storekeeper"],
  /** Create designs, edit draft revisions and start new revisions. */
  editDesigns: ["builder"],
  /** Release a design revision. */
  releaseDesigns: ["builder"],
  /** Create build orders. */
  createBuildOrders: ["builder"],
  /** Reserve stock for a build order, change its quantity, complete or cancel it. */
  runBuildOrders: ["builder"],
  /** Issue stock to a build order. */
  issueToBuildOrders: ["storekeeper"],
  /** Take any step on a build order's page (each step then needs its own capability). */
  takeBuildOrderSteps: ["builder", "storekeeper"],
  /** Invite people, give them roles, deactivate them. */
  managePeople: ["admin"],
  /** Read every e-mail Turnledger sends. */
  readOutbox: ["admin"],
  /** Add a magnet grade to the reference tables. */
  addMagnetGrades: ["admin"],
  /** Put a lot on hold (quality block) and release it. */
  holdLots: ["storekeeper"],
  /** Print labels with scan codes for lots, magnet batches and locations. */
  printLabels: ["storekeeper"],
  /** Attach mill and test certificates to a lot. */
  attachLotDocuments: ["storekeeper", "buyer"],
  /** Start and cancel stocktakes. */
  startStocktakes: ["storekeeper"],
  /** Enter counts on a stocktake's count sheet. */
  countStock: ["storekeeper"],
  /** Review a stocktake's variances, ask for recounts and approve it (posting the differences). */
  approveStocktakes: ["manager"],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof capabilityRoles;

/** The roles that have the capability, admins besides. */
export function rolesWith(capability: Capability): readonly Role[] {
  return capabilityRoles[capability];
}

/** True when the user has the capability (admins have all). */
export function userCan(
  user: { roles: readonly Role[] } | null | undefined,
  capability: Capability,
): boolean {
  return userHasRole(user, capabilityRoles[capability]);
}

/** The refusal's words: "This needs the role buyer or storekeeper." (or "This step needs …"). */
export function needsRoleMessage(
  capability: Capability,
  what = "This",
): string {
  return `${what} needs the role ${rolesWith(capability).join(" or ")}.`;
}

const article = (role: Role) => (/^[aeiou]/.test(role) ? "an" : "a");

/**
 * Who may do it, as the start of a sentence: "A buyer or an admin" (admins last, as
 * they may do anything). For a page that cannot offer the step itself.
 */
export function whoCanText(capability: Capability): string {
  const named = [...rolesWith(capability), "admin" as const].filter(
    (role, index, all) => all.indexOf(role) === index,
  );
  const words = named.map((role) => `${article(role)} ${role}`);
  const text =
    words.length === 1
      ? words[0]!
      : `${words.slice(0, -1).join(", ")} or ${words.at(-1)!}`;
  return text.charAt(0).toUpperCase() + text.slice(1);
}
