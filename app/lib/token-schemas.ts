import { z } from "zod";
import { roles } from "./roles";

export const tokenLifetimes = ["30", "90", "365", "never"] as const;

export const createTokenSchema = z
  .object({
    name: z
      .string({ error: "Name the token after the tool that will use it." })
      .trim()
      .min(1, "Name the token after the tool that will use it.")
      .max(80, "Use at most 80 characters."),
    /** "all": the token acts with whatever roles its owner holds at each use; "chosen": only `roles`. */
    scope: z
      .enum(["all", "chosen"], {
        error: "Choose which roles the token acts with.",
      })
      .default("all"),
    roles: z
      .array(z.enum(roles), { error: "Choose at least one role." })
      .default([]),
    lifetimeDays: z
      .enum(tokenLifetimes, { error: "Choose how long the token lives." })
      .default("90"),
    /** Asked again, so a session left open is not enough to make a token. */
    currentPassword: z
      .string({ error: "Enter your current password." })
      .max(1000),
  })
  .refine((value) => value.scope === "all" || value.roles.length > 0, {
    path: ["roles"],
    message: "Choose at least one role.",
  });

/**
 * Tokens live a year at most; only admins may make one that never expires, for
 * themselves (a token acts for its owner only). Changing an admin's roles
 * revokes every token they have, so a never-expiring one ends with the role.
 */
export function lifetimeAllowed(
  lifetime: (typeof tokenLifetimes)[number],
  ownerIsAdmin: boolean,
): boolean {
  return lifetime !== "never" || ownerIsAdmin;
}

export const lifetimeTooLongMessage =
  "A token lives a year at most; only admins may make one that never expires.";

export function tokenExpiry(
  lifetime: (typeof tokenLifetimes)[number],
  now = new Date(),
): Date | null {
  if (lifetime === "never") return null;
  return new Date(now.getTime() + Number(lifetime) * 24 * 60 * 60 * 1000);
}
