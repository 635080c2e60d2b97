/**
 * The item page's forms: reorder point and quantity (buyers, storekeepers,
 * admins), and the catalogue changes (rename, archive, restore: buyers and
 * admins). The fields and their messages are the item API's own.
 */
import { z } from "zod";
import { itemPatchSchema, type ItemPatchInput } from "./item-schemas";

const patchFields = itemPatchSchema.shape;

export const reorderFormSchema = z.object({
  intent: z.literal("reorder"),
  reorderPoint: patchFields.reorderPoint.unwrap(),
  reorderQuantity: patchFields.reorderQuantity.unwrap(),
});

export const renameFormSchema = z.object({
  intent: z.literal("rename"),
  name: patchFields.name.unwrap(),
});

export const itemChangeSchema = z.discriminatedUnion(
  "intent",
  [
    reorderFormSchema,
    renameFormSchema,
    z.object({ intent: z.literal("archive") }),
    z.object({ intent: z.literal("restore") }),
  ],
  { error: "Choose what to change: reorder, rename, archive or restore." },
);

export type ItemChange = z.output<typeof itemChangeSchema>;

/** Changes only buyers and admins make; storekeepers change the reorder fields only. */
export function changesCatalogue(intent: unknown): boolean {
  return intent === "rename" || intent === "archive" || intent === "restore";
}

/** The form's change as the catalogue's update takes it. */
export function itemPatchOf(change: ItemChange): ItemPatchInput {
  switch (change.intent) {
    case "reorder":
      return {
        reorderPoint: change.reorderPoint,
        reorderQuantity: change.reorderQuantity,
      };
    case "rename":
      return { name: change.name };
    case "archive":
      return { active: false };
    case "restore":
      return { active: true };
  }
}
