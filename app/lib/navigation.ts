import { userCan, type Capability } from "./capabilities";
import type { Role } from "./roles";

export interface NavigationItem {
  to: string;
  label: string;
  /** Shown to those who have it — or any of them, when a list (app/lib/capabilities.ts); without one, to everyone signed in. */
  capability?: Capability | readonly Capability[];
  /** Lit only on this exact address, not on the pages below it (which have their own items). */
  exact?: boolean;
}

/** The app shell's menu. Pages check capabilities themselves; this only decides what is shown. */
export const navigationItems: readonly NavigationItem[] = [
  { to: "/", label: "Start", exact: true },
  { to: "/stock", label: "Stock", exact: true },
  { to: "/stock/record", label: "Record movement", capability: "recordStock" },
  { to: "/stock/journal", label: "Journal" },
  {
    to: "/stocktakes",
    label: "Stocktakes",
    capability: ["startStocktakes", "countStock", "approveStocktakes"],
  },
  { to: "/suppliers", label: "Suppliers" },
  { to: "/best-prices", label: "Best prices" },
  { to: "/prices", label: "Metal base & rates" },
  { to: "/purchase-orders", label: "Purchase orders" },
  { to: "/buying-plan", label: "Buying plan" },
  { to: "/alerts", label: "Alerts" },
  { to: "/insight", label: "Cost insight" },
  { to: "/designs", label: "Designs" },
  { to: "/build-orders", label: "Build orders" },
  { to: "/tools/coil-estimator", label: "Coil estimator" },
  { to: "/tools/magnet-estimator", label: "Magnet estimator" },
  { to: "/reference", label: "Reference" },
  { to: "/admin/people", label: "People", capability: "managePeople" },
  { to: "/admin/outbox", label: "Outbox", capability: "readOutbox" },
];

/** True when the menu item is for this user. */
export function showsNavigationItem(
  item: NavigationItem,
  user: { roles: readonly Role[] } | null | undefined,
): boolean {
  if (!item.capability) return true;
  const needed: readonly Capability[] =
    typeof item.capability === "string" ? [item.capability] : item.capability;
  return needed.some((capability) => userCan(user, capability));
}

/** What each role is trusted with (the product brief's role table), shown on the start page. */
export const roleDuties: Record<Role, { title: string; duties: string[] }> = {
  admin: {
    title: "Admin",
    duties: [
      "Invite people and give them roles",
      "Deactivate people who leave",
      "Read every e-mail Turnledger sends",
      "Do anything the other roles can",
    ],
  },
  buyer: {
    title: "Buying",
    duties: [
      "Keep suppliers and import their price lists",
      "Keep the metal base price and currency rates",
      "Set reorder points and hear about low stock",
    ],
  },
  builder: {
    title: "Building",
    duties: [
      "Design coils and motors and their bills of materials",
      "Release design revisions",
      "Create build orders and reserve stock for them",
    ],
  },
  storekeeper: {
    title: "Store",
    duties: [
      "Record receipts, issues, returns, transfers and scrap",
      "Count bins and record the difference",
      "Weigh spools back to issue wire by mass",
    ],
  },
  manager: {
    title: "Costs",
    duties: [
      "Read stock value and what is short",
      "Read cost per motor and per N·m of torque",
      "See where the money goes: active copper, end turns, magnets",
    ],
  },
};
