import type { Role } from "~/lib/roles";

/**
 * The demo company's people: invented, one per role. Their password is
 * DEMO_PASSWORD, or "turnledger-demo" when it is not set.
 */
export const demoCompany = "Harrowgate Drive Works (demo)";

export const demoPeople: { email: string; name: string; roles: Role[] }[] = [
  { email: "admin@turnledger.test", name: "Maren Holt", roles: ["admin"] },
  { email: "buyer@turnledger.test", name: "Tobias Reyne", roles: ["buyer"] },
  {
    email: "builder@turnledger.test",
    name: "Ines Calloway",
    roles: ["builder"],
  },
  {
    email: "storekeeper@turnledger.test",
    name: "Piet Varga",
    roles: ["storekeeper"],
  },
  {
    email: "manager@turnledger.test",
    name: "Selma Odueke",
    roles: ["manager"],
  },
];

/** The demo people's password (one rule for the seed, the tests and the app's refusal of it). */
export { demoPassword } from "~/auth/demo-password.server";

/** The id the seed gives the demo storekeeper (who records the demo store's movements). */
export const demoStorekeeperId = "demo-04-storekeeper";
