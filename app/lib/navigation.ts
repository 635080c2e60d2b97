import type { Role } from "./roles";

export interface NavigationItem {
  to: string;
  label: string;
  /** Who sees the item; empty means everyone signed in. */
  roles: readonly Role[];
}

/** The app shell's menu. Pages check roles themselves; this only decides what is shown. */
export const navigationItems: readonly NavigationItem[] = [
  { to: "/", label: "Start", roles: [] },
  { to: "/admin/people", label: "People", roles: ["admin"] },
  { to: "/admin/outbox", label: "Outbox", roles: ["admin"] },
];

/** Each role's first look at Turnledger, shown on the start page. */
export const roleStartNotes: Record<Role, { title: string; text: string }> = {
  admin: {
    title: "Admin",
    text: "Invite people, give them roles, and read the mail the system has sent.",
  },
  buyer: {
    title: "Buying",
    text: "Suppliers, price lists, the metal base price and reorder points land here as they are built.",
  },
  builder: {
    title: "Building",
    text: "Coil and motor designs, their bills of materials and build orders land here as they are built.",
  },
  storekeeper: {
    title: "Store",
    text: "Receipts, issues, counts and the spool weigh-back land here as they are built.",
  },
  manager: {
    title: "Costs",
    text: "Stock value, shortages and the cost per motor and per N·m land here as they are built.",
  },
};
