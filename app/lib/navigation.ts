import type { Role } from "./roles";

export interface NavigationItem {
  to: string;
  label: string;
  /** Who sees the item; empty means everyone signed in. */
  roles: readonly Role[];
  /** Lit only on this exact address, not on the pages below it (which have their own items). */
  exact?: boolean;
}

/** The app shell's menu. Pages check roles themselves; this only decides what is shown. */
export const navigationItems: readonly NavigationItem[] = [
  { to: "/", label: "Start", roles: [], exact: true },
  { to: "/stock", label: "Stock", roles: [], exact: true },
  { to: "/stock/record", label: "Record movement", roles: ["storekeeper"] },
  { to: "/stock/journal", label: "Journal", roles: [] },
  { to: "/suppliers", label: "Suppliers", roles: [] },
  { to: "/best-prices", label: "Best prices", roles: [] },
  { to: "/prices", label: "Metal base & rates", roles: [] },
  { to: "/alerts", label: "Alerts", roles: [] },
  { to: "/insight", label: "Cost insight", roles: [] },
  { to: "/designs", label: "Designs", roles: [] },
  { to: "/build-orders", label: "Build orders", roles: [] },
  { to: "/tools/coil-estimator", label: "Coil estimator", roles: [] },
  { to: "/tools/magnet-estimator", label: "Magnet estimator", roles: [] },
  { to: "/reference", label: "Reference", roles: [] },
  { to: "/admin/people", label: "People", roles: ["admin"] },
  { to: "/admin/outbox", label: "Outbox", roles: ["admin"] },
];

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
