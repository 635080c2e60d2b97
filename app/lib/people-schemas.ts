import { z } from "zod";
import { roles } from "./roles";
import { emailField } from "./account-schemas";

const roleList = z
  .array(z.enum(roles), { error: "Choose at least one role." })
  .min(1, "Choose at least one role.");

export const inviteSchema = z.object({
  name: z
    .string({ error: "Enter the person's name." })
    .trim()
    .min(1, "Enter the person's name.")
    .max(120, "Use at most 120 characters."),
  email: emailField,
  roles: roleList,
});

export const personUpdateSchema = z.discriminatedUnion("intent", [
  z.object({ intent: z.literal("save-roles"), roles: roleList }),
  z.object({ intent: z.literal("deactivate") }),
  z.object({ intent: z.literal("reactivate") }),
  z.object({ intent: z.literal("resend-invitation") }),
]);
