/**
 * The body of POST /api/v1/stock-movements, validated and turned into exact
 * amounts (thousandths of the unit; ten-thousandths of money per unit).
 * Shared by the API and the record-movement forms.
 */
import { z } from "zod";
import { movementTypes } from "~/db/tables/stock-enums";
import { quantityFromNumber, unitCostFromNumber } from "./decimal-amounts";

/** The largest quantity (or unit cost) a movement may carry; also the largest a price is asked for. */
export const maxStockQuantity = 1_000_000_000;
const maxQuantity = maxStockQuantity;

function amount(
  label: string,
  toScaled: (value: number) => bigint | null,
  decimals: number,
) {
  return z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a number.`,
    })
    .min(-maxQuantity, `The ${label} is out of range.`)
    .max(maxQuantity, `The ${label} is out of range.`)
    .transform((value, context) => {
      const scaled = toScaled(value);
      if (scaled === null) {
        context.addIssue({
          code: "custom",
          message: `The ${label} has at most ${decimals} decimals.`,
        });
        return z.NEVER;
      }
      return scaled;
    });
}

const quantity = (label = "quantity") => amount(label, quantityFromNumber, 3);
const code = (label: string) =>
  z
    .string({ error: `Give the ${label}.` })
    .trim()
    .min(1, `Give the ${label}.`)
    .max(40);
const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .optional()
    .transform((value) => (value ? value : undefined));

export const movementRequestSchema = z
  .object({
    type: z.enum(movementTypes, {
      error: `The type must be one of ${movementTypes.join(", ")}.`,
    }),
    sku: code("SKU"),
    lot: optionalText(40),
    location: code("location"),
    toLocation: optionalText(20),
    quantity: quantity().optional(),
    unit: z
      .enum(["kg", "pcs", "m"], { error: "The unit must be kg, pcs or m." })
      .optional(),
    unitCost: amount("unit cost", unitCostFromNumber, 4).optional(),
    grossKg: quantity("gross weight").optional(),
    tareKg: quantity("tare weight").optional(),
    spoolType: optionalText(40),
    supplierBatch: optionalText(60),
    reference: optionalText(80),
    note: optionalText(500),
  })
  .superRefine((value, context) => {
    const problem = (path: string, message: string) =>
      context.addIssue({ code: "custom", path: [path], message });
    const weighed = value.grossKg !== undefined;
    if (
      value.quantity === undefined &&
      !(weighed && (value.type === "receipt" || value.type === "issue"))
    ) {
      problem("quantity", "Give the quantity.");
    }
    if (value.quantity !== undefined) {
      if (value.type === "adjustment" && value.quantity === 0n)
        problem(
          "quantity",
          "An adjustment changes stock: give a quantity other than 0.",
        );
      if (value.type === "count" && value.quantity < 0n)
        problem("quantity", "A count cannot be negative.");
      if (
        !["adjustment", "count"].includes(value.type) &&
        value.quantity <= 0n
      ) {
        problem(
          "quantity",
          `The quantity of a ${value.type} must be more than 0.`,
        );
      }
    }
    if (value.grossKg !== undefined && value.grossKg <= 0n)
      problem("grossKg", "The gross weight must be more than 0.");
    if (value.tareKg !== undefined && value.tareKg < 0n)
      problem("tareKg", "The tare weight cannot be negative.");
    if (
      value.grossKg !== undefined &&
      !["receipt", "issue"].includes(value.type)
    ) {
      problem("grossKg", "Gross weight is for receipts and weigh-back issues.");
    }
    if (value.type === "receipt") {
      if (value.unitCost === undefined)
        problem("unitCost", "Give the unit cost of the receipt.");
      else if (value.unitCost < 0n)
        problem("unitCost", "The unit cost cannot be negative.");
    }
    if (value.type === "transfer") {
      if (!value.toLocation)
        problem("toLocation", "Give the location the stock goes to.");
      else if (value.toLocation === value.location)
        problem("toLocation", "A transfer needs two different locations.");
    }
    if (value.type === "adjustment" && !value.note)
      problem("note", "Say why stock is adjusted.");
  });

export type MovementRequest = z.output<typeof movementRequestSchema>;
