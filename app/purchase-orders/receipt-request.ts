/**
 * A delivery received against a purchase order: one entry per spool or lot, each naming
 * the order line it fills, its lot, where it goes, and its quantity (wire: the spool's
 * gross and tare weights instead, or as well). The body of
 * POST /api/v1/purchase-orders/:orderId/receipts and, through `receiptFormSchema`, the
 * /stock/receive form: both accept and refuse the same things. No unit cost: it comes from
 * the order line. Pure.
 */
import { z } from "zod";
import { formNumber } from "~/lib/number-text";
import { quantityField } from "~/stock/movement-request";

/** The most spools or lots one receipt may book. */
export const maxReceiptEntries = 200;

const text = (label: string, max: number) =>
  z
    .string({ error: `Give the ${label}.` })
    .trim()
    .min(1, `Give the ${label}.`)
    .max(max, `Use at most ${max} characters.`);

export const receiptEntrySchema = z
  .object({
    lineId: z
      .number({ error: "Choose the order line." })
      .int("Choose the order line.")
      .min(1, "Choose the order line.")
      .max(2_147_483_647, "Choose the order line."),
    lot: z
      .string()
      .trim()
      .max(40, "Use at most 40 characters.")
      .optional()
      .transform((value) => (value ? value : undefined)),
    location: text("location", 40),
    /** The supplier's lot or heat number, kept on a new lot. */
    supplierBatch: z
      .string()
      .trim()
      .max(60, "Use at most 60 characters.")
      .optional()
      .transform((value) => (value ? value : undefined)),
    quantity: quantityField().optional(),
    grossKg: quantityField("gross weight").optional(),
    tareKg: quantityField("tare weight").optional(),
  })
  .superRefine((value, context) => {
    const problem = (path: string, message: string) =>
      context.addIssue({ code: "custom", path: [path], message });
    if (value.grossKg === undefined) {
      if (value.quantity === undefined)
        problem("quantity", "Give the quantity.");
      else if (value.quantity <= 0n)
        problem("quantity", "The quantity received must be more than 0.");
      if (value.tareKg !== undefined)
        problem("grossKg", "Give the gross weight with the tare.");
      return;
    }
    if (value.grossKg <= 0n)
      problem("grossKg", "The gross weight must be more than 0.");
    if (value.tareKg !== undefined && value.tareKg < 0n)
      problem("tareKg", "The tare weight cannot be negative.");
    if (
      value.tareKg !== undefined &&
      value.grossKg > 0n &&
      value.grossKg <= value.tareKg
    )
      problem("grossKg", "The gross weight must be more than the tare weight.");
  });

export const receiptRequestSchema = z.object({
  lines: z
    .array(receiptEntrySchema, { error: "Give the lines received." })
    .min(1, "Receive at least one spool or lot.")
    .max(
      maxReceiptEntries,
      `At most ${maxReceiptEntries} spools or lots at once.`,
    ),
});

export type ReceiptEntry = z.output<typeof receiptEntrySchema>;
export type ReceiptRequest = z.output<typeof receiptRequestSchema>;

const numberFields = ["lineId", "quantity", "grossKg", "tareKg"] as const;

/** The form's text fields as the request: numbers read (a decimal comma allowed), empty fields left out. */
function formValuesToReceipt(values: unknown): unknown {
  if (!values || typeof values !== "object") return values;
  const lines = (values as { lines?: unknown }).lines;
  if (!Array.isArray(lines)) return { lines: [] };
  return {
    lines: lines.map((line: unknown) => {
      if (!line || typeof line !== "object") return line;
      const entry: Record<string, unknown> = {
        ...(line as Record<string, unknown>),
      };
      for (const field of numberFields) entry[field] = formNumber(entry[field]);
      for (const [key, value] of Object.entries(entry))
        if (value === "") entry[key] = undefined;
      return entry;
    }),
  };
}

export const receiptFormSchema = z.preprocess(
  formValuesToReceipt,
  receiptRequestSchema,
);

/** A refusal's field as the API names it ("lines.0.grossKg") as the form names it ("lines[0].grossKg"). */
export function receiptFormField(field: string | undefined): string {
  return (field ?? "").replace(/^lines\.(\d+)\./, "lines[$1].");
}
