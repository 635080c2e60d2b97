/**
 * The stocktake pages' forms as Zod schemas shared by browser and server: starting a
 * stocktake (locations, or items by SKU), entering a count (a quantity, or a spool's
 * gross and tare), adding a line found on the shelf, and the reviewer's steps.
 * Quantities become thousandths of their unit. Pure.
 */
import { z } from "zod";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { formNumber } from "~/lib/number-text";

/** The most locations or SKUs one stocktake starts with. */
export const maxStartChoices = 200;

function formObject(values: unknown): Record<string, unknown> {
  const form =
    values && typeof values === "object"
      ? { ...(values as Record<string, unknown>) }
      : {};
  for (const [key, value] of Object.entries(form))
    if (value === "") form[key] = undefined;
  return form;
}

const note = z
  .string({ error: "The note must be text." })
  .trim()
  .max(300, "Use at most 300 characters.")
  .optional()
  .transform((value) => value ?? "");

/** "CU-050, MG-N42 MG-N45" → ["CU-050", "MG-N42", "MG-N45"] (commas, spaces or new lines between). */
export function skuList(text: string | undefined): string[] {
  if (!text) return [];
  return [...new Set(text.split(/[\s,;]+/).filter((sku) => sku.length > 0))];
}

const asList = (value: unknown) =>
  value === undefined ? [] : Array.isArray(value) ? value : [value];

export const startFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return {
      intent: form.intent,
      locations: asList(form.locations),
      skus: form.skus,
      note: form.note,
    };
  },
  z
    .object({
      intent: z.literal("start"),
      locations: z
        .array(
          z
            .string({ error: "Choose locations from the list." })
            .trim()
            .min(1)
            .max(20, "A location code has at most 20 characters."),
        )
        .max(maxStartChoices, `Choose at most ${maxStartChoices} locations.`),
      skus: z
        .string({ error: "The SKUs must be text." })
        .max(4000, "Give at most 4,000 characters of SKUs.")
        .optional(),
      note,
    })
    .transform((value) => ({ ...value, skus: skuList(value.skus) }))
    .superRefine((value, context) => {
      if (value.locations.length === 0 && value.skus.length === 0)
        context.addIssue({
          code: "custom",
          path: ["locations"],
          message: "Choose at least one location, or give the SKUs to count.",
        });
      if (value.locations.length > 0 && value.skus.length > 0)
        context.addIssue({
          code: "custom",
          path: ["skus"],
          message: "Count by locations or by items, not both.",
        });
      if (value.skus.length > maxStartChoices)
        context.addIssue({
          code: "custom",
          path: ["skus"],
          message: `Give at most ${maxStartChoices} SKUs.`,
        });
      if (value.skus.some((sku) => sku.length > 40))
        context.addIssue({
          code: "custom",
          path: ["skus"],
          message: "A SKU has at most 40 characters.",
        });
    }),
);
export type StartStocktakeInput = z.output<typeof startFormSchema>;

const amount = (label: string, allowZero: boolean) =>
  z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a number.`,
    })
    .min(0, `The ${label} cannot be negative.`)
    .refine(
      (value) => allowZero || value > 0,
      `The ${label} must be more than 0.`,
    )
    .max(1_000_000_000, `The ${label} is out of range.`)
    .transform((value, context) => {
      const scaled = quantityFromNumber(value);
      if (scaled === null) {
        context.addIssue({
          code: "custom",
          message: `The ${label} has at most 3 decimals.`,
        });
        return z.NEVER;
      }
      return scaled;
    });

const lineId = z
  .number({ error: "Choose a line of the sheet." })
  .int("Choose a line of the sheet.")
  .min(1, "Choose a line of the sheet.")
  .max(2_147_483_647, "Choose a line of the sheet.");

/** One line of the count sheet: the quantity found, or a spool's gross weight (and tare). */
export const countFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return {
      intent: form.intent,
      lineId: formNumber(form.lineId),
      quantity: formNumber(form.quantity),
      grossKg: formNumber(form.grossKg),
      tareKg: formNumber(form.tareKg),
    };
  },
  z
    .object({
      intent: z.literal("count"),
      lineId,
      quantity: amount("quantity counted", true).optional(),
      grossKg: amount("gross weight", false).optional(),
      tareKg: amount("tare", true).optional(),
    })
    .superRefine((value, context) => {
      if (value.quantity === undefined && value.grossKg === undefined)
        context.addIssue({
          code: "custom",
          path: ["quantity"],
          message: "Give the quantity counted (0 when the place is empty).",
        });
      if (value.quantity !== undefined && value.grossKg !== undefined)
        context.addIssue({
          code: "custom",
          path: ["grossKg"],
          message: "Give the quantity or the gross weight, not both.",
        });
    })
    // A tare without a gross weight is the sheet's default tare left as it was: not used.
    .transform((value) =>
      value.grossKg === undefined ? { ...value, tareKg: undefined } : value,
    ),
);
export type CountInput = z.output<typeof countFormSchema>;

const code = (label: string, max: number) =>
  z
    .string({ error: `Give the ${label}.` })
    .trim()
    .min(1, `Give the ${label}.`)
    .max(max, `The ${label} has at most ${max} characters.`);

/** A line found on the shelf that the sheet does not have: an existing lot of an item at a covered location. */
export const addLineFormSchema = z.preprocess(
  (values) => formObject(values),
  z.object({
    intent: z.literal("add"),
    sku: code("SKU", 40),
    lot: z
      .string({ error: "The lot must be text." })
      .trim()
      .max(40, "The lot has at most 40 characters.")
      .optional()
      .transform((value) => value || undefined),
    location: code("location", 20),
  }),
);
export type AddLineInput = z.output<typeof addLineFormSchema>;

/** The reviewer's request to count a line again. */
export const recountFormSchema = z.preprocess(
  (values) => {
    const form = formObject(values);
    return { intent: form.intent, lineId: formNumber(form.lineId) };
  },
  z.object({ intent: z.literal("recount"), lineId }),
);

export const approveFormSchema = z.object({ intent: z.literal("approve") });
export const cancelFormSchema = z.object({ intent: z.literal("cancel") });

/** The steps the stocktake page takes, each with its own form. */
export const stocktakeIntents = ["recount", "approve", "cancel"] as const;
export type StocktakeIntent = (typeof stocktakeIntents)[number];

export function isStocktakeIntent(value: unknown): value is StocktakeIntent {
  return (
    typeof value === "string" &&
    (stocktakeIntents as readonly string[]).includes(value)
  );
}

/** The count sheet's two forms. */
export const countSheetIntents = ["count", "add"] as const;
export type CountSheetIntent = (typeof countSheetIntents)[number];

export function isCountSheetIntent(value: unknown): value is CountSheetIntent {
  return (
    typeof value === "string" &&
    (countSheetIntents as readonly string[]).includes(value)
  );
}
