/** Creating and changing catalogue items: the API body and the item form share these. */
import { z } from "zod";
import { ENAMELS, THERMAL_CLASSES } from "~/engineering/reference-data";
import { insulationKeys, magnetShapeSchema } from "~/lib/estimate-requests";

const quantityField = (label: string) =>
  z
    .number({ error: `The ${label} must be a number.` })
    .min(0, `The ${label} cannot be negative.`)
    .max(1_000_000_000, `The ${label} is out of range.`)
    .refine(
      (value) => Math.abs(Math.round(value * 1000) - value * 1000) < 1e-6,
      `The ${label} has at most 3 decimals.`,
    );

const common = {
  sku: z
    .string({ error: "Give the SKU." })
    .trim()
    .min(1, "Give the SKU.")
    .max(40, "A SKU has at most 40 characters.")
    .regex(
      /^[A-Za-z0-9][A-Za-z0-9._/-]*$/,
      "A SKU uses letters, digits and . _ / - only.",
    ),
  name: z
    .string({ error: "Give the name." })
    .trim()
    .min(1, "Give the name.")
    .max(160, "Use at most 160 characters."),
  reorderPoint: quantityField("reorder point").default(0),
  reorderQuantity: quantityField("reorder quantity").default(0),
};

const thermalClassValues = THERMAL_CLASSES.map((row) => row.classC) as number[];

export const wireItemSchema = z.object({
  kind: z.literal("wire"),
  ...common,
  conductor: z.enum(["copper", "aluminium"], {
    error: "The conductor must be copper or aluminium.",
  }),
  standard: z.enum(["AWG", "IEC"], {
    error: "The standard must be AWG or IEC.",
  }),
  size: z
    .union([z.string(), z.number()], { error: "Give the size." })
    .transform((value) => String(value).trim()),
  insulation: z.enum(insulationKeys, {
    error: `The insulation must be one of ${insulationKeys.join(", ")}.`,
  }),
  thermalClass: z
    .number({ error: "Give the thermal class." })
    .refine(
      (value) => thermalClassValues.includes(value),
      `The thermal class must be one of ${thermalClassValues.join(", ")}.`,
    ),
  enamel: z.enum(ENAMELS.map((enamel) => enamel.key) as [string, ...string[]], {
    error: `The enamel must be one of ${ENAMELS.map((enamel) => enamel.key).join(", ")}.`,
  }),
});

export const magnetItemSchema = z.object({
  kind: z.literal("magnet"),
  ...common,
  grade: z
    .string({ error: "Give the grade." })
    .trim()
    .min(1, "Give the grade.")
    .max(40),
  shape: magnetShapeSchema,
  coating: z
    .string({ error: "Give the coating (e.g. NiCuNi)." })
    .trim()
    .min(1, "Give the coating (e.g. NiCuNi).")
    .max(40),
  magnetisation: z
    .string({ error: "Give the magnetisation direction." })
    .trim()
    .min(1, "Give the magnetisation direction.")
    .max(60),
});

export const partItemSchema = z.object({
  kind: z.literal("part"),
  ...common,
  unit: z.enum(["pcs", "m", "kg"], { error: "The unit must be pcs, m or kg." }),
});

export const itemCreateSchema = z.discriminatedUnion(
  "kind",
  [wireItemSchema, magnetItemSchema, partItemSchema],
  {
    error: "The kind must be wire, magnet or part.",
  },
);

export type ItemCreateInput = z.output<typeof itemCreateSchema>;

export const itemPatchSchema = z
  .object({
    name: common.name.optional(),
    reorderPoint: quantityField("reorder point").optional(),
    reorderQuantity: quantityField("reorder quantity").optional(),
    active: z.boolean({ error: "active must be true or false." }).optional(),
  })
  .refine(
    (value) => Object.values(value).some((field) => field !== undefined),
    {
      message:
        "Give at least one of name, reorderPoint, reorderQuantity, active.",
    },
  );

export type ItemPatchInput = z.output<typeof itemPatchSchema>;
