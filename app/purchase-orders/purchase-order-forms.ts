/**
 * What the purchase-order API accepts, as Zod schemas: JSON numbers for quantities (in the
 * item's unit) and prices (in the order's currency) become exact thousandths and
 * ten-thousandths, days are YYYY-MM-DD. The inputs the write functions take are the
 * schemas' output types.
 */
import { searchTextParam } from "~/lib/list-filters";
import { z } from "zod";
import { purchaseOrderStatuses } from "~/db/tables/purchase-order-enums";
import { quantityFromNumber, unitCostFromNumber } from "~/lib/decimal-amounts";
import { dayParam, pageParam, pageSizeParam } from "~/lib/search-params";

const quantity = z
  .number({
    error: (issue) =>
      issue.input === undefined
        ? "Give the quantity."
        : "The quantity must be a number.",
  })
  .gt(0, "The quantity must be more than 0.")
  .max(100_000_000, "The quantity is out of range.")
  .transform((value, context) => {
    const scaled = quantityFromNumber(value);
    if (scaled === null) {
      context.addIssue({
        code: "custom",
        message: "The quantity has at most 3 decimals.",
      });
      return z.NEVER;
    }
    return scaled;
  });

const unitPrice = z
  .number({ error: "The unit price must be a number." })
  .min(0, "The unit price cannot be negative.")
  .max(1_000_000_000, "The unit price is out of range.")
  .transform((value, context) => {
    const scaled = unitCostFromNumber(value);
    if (scaled === null) {
      context.addIssue({
        code: "custom",
        message: "The unit price has at most 4 decimals.",
      });
      return z.NEVER;
    }
    return scaled;
  });

const sku = z
  .string({ error: "Give the SKU." })
  .trim()
  .min(1, "Give the SKU.")
  .max(40, "A SKU has at most 40 characters.");

const overrideReason = z
  .string({ error: "The reason must be text." })
  .trim()
  .max(300, "Use at most 300 characters.")
  .optional()
  .transform((value) => value || undefined);

const requestedDate = dayParam(
  "requestedDate",
  "The requested date must be a day written YYYY-MM-DD.",
);

const currency = z
  .string({ error: "The currency must be a three-letter code such as EUR." })
  .trim()
  .regex(
    /^[A-Za-z]{3}$/,
    "The currency must be a three-letter code such as EUR.",
  )
  .transform((value) => value.toUpperCase());

const notes = z
  .string({ error: "The notes must be text." })
  .max(1000, "Use at most 1,000 characters.");

/** One new line: our SKU and the quantity; a price given by hand overrides the price list. */
export const newOrderLineSchema = z.object({
  sku,
  quantity,
  unitPrice: unitPrice.optional(),
  overrideReason,
  requestedDate: requestedDate.optional(),
});
/** A new line as the write functions take it: quantity in thousandths, price in ten-thousandths. */
export interface NewOrderLine {
  sku: string;
  quantity: bigint;
  unitPrice?: bigint;
  overrideReason?: string;
  /** YYYY-MM-DD */
  requestedDate?: string;
}

/** POST /api/v1/purchase-orders */
export const purchaseOrderCreateSchema = z.object({
  supplierId: z
    .number({ error: "Give the supplier's id." })
    .int("The supplier's id is a whole number.")
    .min(1, "The supplier's id is a whole number from 1.")
    .max(2_147_483_647, "No supplier has that id."),
  currency: currency.optional(),
  notes: notes.optional(),
  lines: z
    .array(newOrderLineSchema, { error: "Give the lines as a list." })
    .max(200, "An order has at most 200 lines."),
});
export type PurchaseOrderCreateInput = z.output<
  typeof purchaseOrderCreateSchema
>;

/** A change to a line of a draft: only the fields given change; requestedDate null clears it. */
export const orderLineChangeSchema = z.object({
  id: z
    .number({ error: "Give the line's id." })
    .int("A line id is a whole number.")
    .min(1, "A line id is a whole number from 1."),
  remove: z.literal(true, { error: "remove can only be true." }).optional(),
  quantity: quantity.optional(),
  /** A number overrides the price; null goes back to the price list. */
  unitPrice: unitPrice.nullable().optional(),
  overrideReason,
  requestedDate: requestedDate.nullable().optional(),
});
export type OrderLineChange = z.output<typeof orderLineChangeSchema>;

/**
 * PATCH /api/v1/purchase-orders/:orderId: currency, notes, and line edits. Each entry of
 * `lines` without an id is a new line; with an id it changes that line, or removes it with
 * `remove: true`. Lines not named are kept as they are.
 */
export const purchaseOrderPatchSchema = z.object({
  currency: currency.optional(),
  notes: notes.optional(),
  lines: z
    .array(z.union([orderLineChangeSchema, newOrderLineSchema]), {
      error: "Give the lines as a list.",
    })
    .max(200, "An order has at most 200 lines.")
    .optional(),
});

/** What `updateDraftOrder` takes. */
export interface DraftOrderPatch {
  currency?: string;
  notes?: string;
  add?: NewOrderLine[];
  change?: OrderLineChange[];
  remove?: number[];
}

/** The API's PATCH body as a patch: new lines, changes and removals apart. */
export function draftPatchOf(
  body: z.output<typeof purchaseOrderPatchSchema>,
): DraftOrderPatch {
  const add: NewOrderLine[] = [];
  const change: OrderLineChange[] = [];
  const remove: number[] = [];
  for (const line of body.lines ?? []) {
    if ("id" in line) {
      if (line.remove) remove.push(line.id);
      else change.push(line);
    } else add.push(line);
  }
  return {
    ...(body.currency === undefined ? {} : { currency: body.currency }),
    ...(body.notes === undefined ? {} : { notes: body.notes }),
    ...(add.length ? { add } : {}),
    ...(change.length ? { change } : {}),
    ...(remove.length ? { remove } : {}),
  };
}

/** POST …/cancel and …/close: an optional reason. */
export const endOrderSchema = z.object({
  reason: z
    .string({ error: "The reason must be text." })
    .trim()
    .max(500, "Use at most 500 characters.")
    .optional()
    .transform((value) => value || undefined),
});

/** GET /api/v1/purchase-orders?status=&supplierId=&page=&pageSize= */
export const purchaseOrderListQuerySchema = z.object({
  /** An order number or part of the supplier's name. */
  search: searchTextParam,
  status: z
    .enum(purchaseOrderStatuses, {
      error: `status must be one of ${purchaseOrderStatuses.join(", ")}.`,
    })
    .optional(),
  supplierId: z.coerce
    .number({ error: "supplierId must be a whole number." })
    .int("supplierId must be a whole number.")
    .min(1, "supplierId must be a whole number from 1.")
    .max(2_147_483_647, "supplierId must be a whole number from 1.")
    .optional(),
  page: pageParam,
  pageSize: pageSizeParam("pageSize", 200, 50),
});
export type PurchaseOrderListQuery = z.output<
  typeof purchaseOrderListQuerySchema
>;
