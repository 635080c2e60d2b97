/** The five roles of Turnledger; a person may hold several. */
export const roles = [
  "admin",
  "buyer",
  "builder",
  "storekeeper",
  "manager",
] as const;

export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  admin: "Admin",
  buyer: "Buyer",
  builder: "Builder",
  storekeeper: "Storekeeper",
  manager: "Manager",
};

export function isRole(value: string): value is Role {
  return (roles as readonly string[]).includes(value);
}

/**
 * True when the user holds one of the roles; admins may do anything.
 * The building block of the capability table (app/lib/capabilities.ts): pages and
 * routes ask userCan and requireCapability, never this.
 */
export function userHasRole(
  user: { roles: readonly Role[] } | null | undefined,
  allowed: readonly Role[],
): boolean {
  if (!user) return false;
  return (
    user.roles.includes("admin") ||
    user.roles.some((role) => allowed.includes(role))
  );
}
