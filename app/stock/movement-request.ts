/**
 * The body of POST /api/v1/stock-movements, validated and turned into exact
 * amounts (thousandths of the unit; ten-thousandths of money per unit).
 * Shared by the API and the record-movement forms.
 */
import { z } from "zod";
import {
  buildOrderIdInReference,
  buildOrderReference,
} from "~/build-orders/build-order-status";
import { movementTypes } from "~/db/tables/stock-enums";
import { quantityFromNumber, unitCostFromNumber } from "~/lib/decimal-amounts";

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
/** An exact quantity (thousandths of the unit), for other requests that move stock (a receipt against an order). */
export const quantityField = quantity;
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
    /** A receipt's supplier, by id (optional): a new lot keeps it as its origin. */
    supplierId: z
      .number({ error: "supplierId must be a whole number." })
      .int("supplierId must be a whole number.")
      .min(1, "supplierId must be at least 1.")
      .max(2_147_483_647, "supplierId is out of range.")
      .optional(),
    reference: optionalText(80),
    note: optionalText(500),
    /** An issue to this build order: it takes what the order holds and counts as issued to it. */
    buildOrderId: z
      .number({ error: "buildOrderId must be a whole number." })
      .int("buildOrderId must be a whole number.")
      .min(1, "buildOrderId must be at least 1.")
      .max(2_147_483_647, "buildOrderId is out of range.")
      .optional(),
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
    // An issue by weighing back and by quantity at once would leave one of them unread.
    if (
      value.type === "issue" &&
      value.quantity !== undefined &&
      value.grossKg !== undefined
    )
      problem(
        "grossKg",
        "Give the quantity or the spool's gross weight, not both.",
      );
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
    if (value.supplierId !== undefined && value.type !== "receipt")
      problem("supplierId", "A supplier is named only on a receipt.");
    if (value.type === "adjustment" && !value.note)
      problem("note", "Say why stock is adjusted.");
    refineBuildOrderIssue(value, problem);
  });

/** How to issue to a build order, for a reference that names one on a plain issue. */
export function issueToBuildOrderHelp(orderId: number): string {
  const reference = buildOrderReference(orderId);
  return `${reference} is a build order: issue to it through the order, so it counts against what the order holds — choose ${reference} under “Build order” on this page, send buildOrderId: ${orderId} with the issue, or use Issue on the order's page (/build-orders/${orderId}).`;
}

/**
 * An issue names its build order by buildOrderId, never only in the free-text reference:
 * a plain issue with "BO-12" would lower the stock while the order still held it.
 */
function refineBuildOrderIssue(
  value: {
    type: string;
    reference?: string;
    buildOrderId?: number;
  },
  problem: (path: string, message: string) => void,
) {
  if (value.buildOrderId === undefined) {
    const named = buildOrderIdInReference(value.reference);
    if (value.type === "issue" && named !== null)
      problem("reference", issueToBuildOrderHelp(named));
    return;
  }
  if (value.type !== "issue") {
    problem(
      "buildOrderId",
      "Stock goes to a build order by an issue: buildOrderId is only for issues.",
    );
    return;
  }
  const named = buildOrderIdInReference(value.reference);
  if (named !== null && named !== value.buildOrderId)
    problem(
      "reference",
      `The reference names ${buildOrderReference(named)}, but the issue is to ${buildOrderReference(value.buildOrderId)}.`,
    );
}

export type MovementRequest = z.output<typeof movementRequestSchema>;
