/**
 * The new-item form: the catalogue's create schema with the form's own
 * needs added. The size is always text (a select's value: "0000" must not
 * become 0), the selects ask for a choice, pieces are whole, and a magnet's
 * shape must be one that can be made. Shared by the browser's check and the
 * server.
 */
import { z } from "zod";
import { isEngineeringInputError } from "~/engineering/errors";
import { magnetVolumeMm3 } from "~/engineering/magnet-estimate";
import { ENAMELS, iecDiameterProblem } from "~/engineering/reference-data";
import { insulationKeys } from "~/lib/estimate-requests";
import {
  magnetItemSchema,
  partItemSchema,
  wireItemSchema,
} from "./item-schemas";

const enamelKeys = ENAMELS.map((enamel) => enamel.key) as [string, ...string[]];

/** The selects' messages ask for a choice; the API's list the allowed values. */
export const newItemFormSchema = z
  .discriminatedUnion(
    "kind",
    [
      wireItemSchema.extend({
        size: z
          .string({ error: "Choose the size." })
          .trim()
          .min(1, "Choose the size."),
        insulation: z.enum(insulationKeys, { error: "Choose the insulation." }),
        enamel: z.enum(enamelKeys, { error: "Choose the enamel." }),
      }),
      magnetItemSchema.extend({
        grade: z
          .string({ error: "Choose the grade." })
          .trim()
          .min(1, "Choose the grade.")
          .max(40),
      }),
      partItemSchema,
    ],
    { error: "Choose what kind of item this is: wire, magnet or other part." },
  )
  .superRefine((value, context) => {
    const countedInPieces =
      value.kind === "magnet" ||
      (value.kind === "part" && value.unit === "pcs");
    if (countedInPieces) {
      for (const field of ["reorderPoint", "reorderQuantity"] as const) {
        if (!Number.isInteger(value[field])) {
          context.addIssue({
            code: "custom",
            path: [field],
            message: "Pieces are counted whole: give a whole number.",
          });
        }
      }
    }
    if (value.kind === "wire" && value.standard === "IEC") {
      const diameterMm = value.size === "" ? Number.NaN : Number(value.size);
      const problem = iecDiameterProblem(diameterMm);
      if (problem) {
        context.addIssue({ code: "custom", path: ["size"], message: problem });
      }
    }
    if (value.kind === "magnet") {
      try {
        magnetVolumeMm3(value.shape);
      } catch (error) {
        if (!isEngineeringInputError(error)) throw error;
        context.addIssue({
          code: "custom",
          path: error.field.split("."),
          message: error.message,
        });
      }
    }
  });

export type NewItemForm = z.output<typeof newItemFormSchema>;

/** The unit an item of the form's kind is kept in. */
export { unitOfNewItem } from "./new-item-unit";
