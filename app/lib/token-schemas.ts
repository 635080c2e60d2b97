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
  })
  .refine((value) => value.scope === "all" || value.roles.length > 0, {
    path: ["roles"],
    message: "Choose at least one role.",
  });

export function tokenExpiry(
  lifetime: (typeof tokenLifetimes)[number],
  now = new Date(),
): Date | null {
  if (lifetime === "never") return null;
  return new Date(now.getTime() + Number(lifetime) * 24 * 60 * 60 * 1000);
}
