/**
 * The purchase-order pages' forms as Zod schemas, shared by the browser (Conform checks
 * before sending) and the server (the same check again): the new order, the draft's
 * edit, send, cancel and close short, and the order made from a low-stock alert. Text
 * fields become the domain's values: quantities in thousandths of the item's unit,
 * prices in ten-thousandths of the order's currency (a decimal comma allowed). Pure.
 */
import { z } from "zod";
import { isCalendarDate } from "~/lib/calendar-days";
import { quantityFromNumber, unitCostFromNumber } from "~/lib/decimal-amounts";
import { formNumber } from "~/lib/number-text";
import { idFromText } from "~/lib/search-params";
import { isoCurrency } from "~/purchasing/supplier-schemas";
import type { DraftOrderPatch } from "./purchase-order-forms";

import { maxOrderLines } from "./max-order-lines";

export { maxOrderLines };

const formObject = (values: unknown): Record<string, unknown> =>
  values && typeof values === "object" && !Array.isArray(values)
    ? { ...(values as Record<string, unknown>) }
    : {};

function withoutEmpty(values: Record<string, unknown>) {
  for (const [key, value] of Object.entries(values))
    if (value === "" || (typeof value === "string" && value.trim() === ""))
      values[key] = undefined;
  return values;
}

const optionalText = (label: string, max: number) =>
  z
    .string({ error: `The ${label} must be text.` })
    .trim()
    .max(max, `The ${label} has at most ${max} characters.`)
    .optional()
    .transform((value) => value || undefined);

/** A number typed in a field, kept exactly at `scale` decimals as a whole number of parts. */
const scaledNumber = (
  label: string,
  decimals: 3 | 4,
  toScaled: (value: number) => bigint | null,
  least: "positive" | "zero",
) =>
  z
    .number({
      error: (issue) =>
        issue.input === undefined
          ? `Give the ${label}.`
          : `The ${label} must be a number.`,
    })
    .refine(
      (value) => (least === "positive" ? value > 0 : value >= 0),
      least === "positive"
        ? `The ${label} must be more than 0.`
        : `The ${label} cannot be negative.`,
    )
    .refine((value) => value <= 1_000_000_000, `The ${label} is out of range.`)
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

const lineId = z
  .string()
  .optional()
  .transform((value, context) => {
    if (value === undefined) return undefined;
    const id = idFromText(value);
    if (id === null) {
      context.addIssue({ code: "custom", message: "Unknown order line." });
      return z.NEVER;
    }
    return id;
  });

/** One line as typed: our SKU, the quantity in the item's unit, and optionally a date and a price of the buyer's own. */
const lineSchema = z.preprocess(
  (values) => {
    const line = formObject(values);
    return withoutEmpty({
      id: line.id,
      sku: line.sku,
      quantity: formNumber(line.quantity),
      requestedDate: line.requestedDate,
      unitPrice: formNumber(line.unitPrice),
      overrideReason: line.overrideReason,
    });
  },
  z
    .object({
      id: lineId,
      sku: z
        .string({ error: "Give the item's SKU." })
        .trim()
        .min(1, "Give the item's SKU.")
        .max(40, "The SKU has at most 40 characters."),
      quantity: scaledNumber("quantity", 3, quantityFromNumber, "positive"),
      requestedDate: z
        .string()
        .trim()
        .refine(isCalendarDate, "Give the date as YYYY-MM-DD, a real day.")
        .optional(),
      unitPrice: scaledNumber(
        "unit price",
        4,
        unitCostFromNumber,
        "zero",
      ).optional(),
      overrideReason: optionalText("reason", 300),
    })
    .superRefine((line, context) => {
      if (line.unitPrice !== undefined && !line.overrideReason)
        context.addIssue({
          code: "custom",
          path: ["overrideReason"],
          message:
            "Say why this price replaces the supplier's price list (it is kept with the line).",
        });
      if (line.unitPrice === undefined && line.overrideReason)
        context.addIssue({
          code: "custom",
          path: ["unitPrice"],
          message: "Give the price the reason is for, or clear the reason.",
        });
    }),
);

export type OrderLineInput = z.output<typeof lineSchema>;

const lines = z
  .array(lineSchema, { error: "Add at least one line." })
  .min(1, "Add at least one line.")
  .max(maxOrderLines, `An order has at most ${maxOrderLines} lines.`);

const currency = z.preprocess(
  (value) =>
    typeof value === "string" && value.trim() === "" ? undefined : value,
  isoCurrency.optional(),
);

const notes = optionalText("notes", 1000);

/** The new-order form: supplier, currency (the supplier's when left empty), notes and lines. */
export const newOrderFormSchema = z.object({
  supplierId: z
    .string({ error: "Choose the supplier." })
    .transform((value, context) => {
      const id = idFromText(value);
      if (id === null) {
        context.addIssue({ code: "custom", message: "Choose the supplier." });
        return z.NEVER;
      }
      return id;
    }),
  currency,
  notes,
  lines,
});
export type NewOrderForm = z.output<typeof newOrderFormSchema>;

/** The draft's edit on the order page: every line as it should be (a line with an id is kept, one without is added, one left out is removed). */
export const draftFormSchema = z.object({
  intent: z.literal("save"),
  currency,
  notes,
  lines,
});
export type DraftForm = z.output<typeof draftFormSchema>;

const reason = (what: string) =>
  z
    .string({ error: `Say why the order is ${what}.` })
    .trim()
    .min(1, `Say why the order is ${what}.`)
    .max(500, "Use at most 500 characters.");

export const sendFormSchema = z.object({ intent: z.literal("send") });
export const cancelFormSchema = z.object({
  intent: z.literal("cancel"),
  reason: reason("cancelled"),
});
export const closeFormSchema = z.object({
  intent: z.literal("close"),
  reason: reason("closed short"),
});

/** The steps of the order page, by the form's intent. */
export const orderPageIntents = ["save", "send", "cancel", "close"] as const;
export type OrderPageIntent = (typeof orderPageIntents)[number];

export const orderPageSchemas = {
  save: draftFormSchema,
  send: sendFormSchema,
  cancel: cancelFormSchema,
  close: closeFormSchema,
} as const;

export function isOrderPageIntent(value: unknown): value is OrderPageIntent {
  return (orderPageIntents as readonly unknown[]).includes(value);
}

/** The "Order" button of a low-stock alert: which alert to make a draft order from. */
export const fromAlertFormSchema = z.object({
  intent: z.literal("from-alert"),
  alertId: z
    .string({ error: "Choose an alert." })
    .transform((value, context) => {
      const id = idFromText(value);
      if (id === null) {
        context.addIssue({ code: "custom", message: "Choose an alert." });
        return z.NEVER;
      }
      return id;
    }),
});

/**
 * Where a refusal from the domain shows on the form: "lines.2.quantity" and
 * "lines[2].quantity" both name the third line's quantity field ("lines[2].quantity"
 * in Conform's names); any other field name is kept; none is the whole form ("").
 */
export function orderFormFieldOf(field: string | undefined): string {
  if (!field) return "";
  const dotted = /^lines\.(\d+)\.(\w+)$/.exec(field);
  if (dotted) return `lines[${dotted[1]}].${dotted[2]}`;
  return field;
}

/** A draft's line as stored, for {@link draftPatchFromForm}. */
export interface StoredDraftLine {
  id: number;
  sku: string;
  /** Thousandths of the item's unit. */
  quantity: bigint;
  requestedDate: string | null;
  /** Ten-thousandths: the buyer's own price, or null when the price list prices the line. */
  overridePrice: bigint | null;
  overrideReason: string | null;
}

/** What the draft's edit form changes, as the domain's patch takes it. */
export type DraftPatchFromForm = DraftOrderPatch;

/**
 * The draft's edit as a patch of only what differs from the stored order: a line with
 * an id is changed where its fields differ (a price emptied goes back to the price list,
 * a date emptied is cleared), a line without one is added, a stored line left out is
 * removed. A line whose SKU was changed is removed and added anew (the item is the line).
 * Throws RangeError for an id that is not one of the order's lines.
 */
export function draftPatchFromForm(
  stored: { currency: string; notes: string; lines: StoredDraftLine[] },
  form: DraftForm,
): {
  patch: DraftPatchFromForm;
  /** The form's line (0, 1, 2 …) of each added and each changed line, in the patch's order. */
  positions: { add: number[]; change: number[] };
} {
  const byId = new Map(stored.lines.map((line) => [line.id, line]));
  const add: NonNullable<DraftPatchFromForm["add"]> = [];
  const change: NonNullable<DraftPatchFromForm["change"]> = [];
  const kept = new Set<number>();
  const positions = { add: [] as number[], change: [] as number[] };
  for (const [index, { id, ...line }] of form.lines.entries()) {
    const before = id === undefined ? undefined : byId.get(id);
    if (id !== undefined && !before)
      throw new RangeError(`line ${id} is not on this order`);
    if (!before || before.sku.toLowerCase() !== line.sku.toLowerCase()) {
      add.push(line);
      positions.add.push(index);
      continue;
    }
    kept.add(before.id);
    // No reason given keeps the line's own (the domain's rule); a changed price brings its reason.
    const changed: NonNullable<DraftPatchFromForm["change"]>[number] = {
      id: before.id,
      overrideReason: undefined,
    };
    let differs = false;
    if (line.quantity !== before.quantity) {
      changed.quantity = line.quantity;
      differs = true;
    }
    if ((line.requestedDate ?? null) !== before.requestedDate) {
      changed.requestedDate = line.requestedDate ?? null;
      differs = true;
    }
    if (
      (line.unitPrice ?? null) !== before.overridePrice ||
      (line.overrideReason ?? null) !== before.overrideReason
    ) {
      changed.unitPrice = line.unitPrice ?? null;
      changed.overrideReason = line.overrideReason;
      differs = true;
    }
    if (differs) {
      change.push(changed);
      positions.change.push(index);
    }
  }
  const remove = stored.lines
    .filter((line) => !kept.has(line.id))
    .map((line) => line.id);
  const notes = form.notes ?? "";
  return {
    patch: {
      ...(form.currency && form.currency !== stored.currency
        ? { currency: form.currency }
        : {}),
      ...(notes !== stored.notes ? { notes } : {}),
      ...(add.length ? { add } : {}),
      ...(change.length ? { change } : {}),
      ...(remove.length ? { remove } : {}),
    },
    positions,
  };
}

/**
 * Where a refusal of the draft's patch shows on the edit form: "add.1.sku" (and
 * "lines.1.sku", as updateDraftOrder names the added lines by their place among the
 * added) names the second added line, "change.0.quantity" the first changed one, each
 * found on the form by {@link draftPatchFromForm}'s positions; "currency", "notes" and
 * "lines" (the lines as a whole) are fields of their own; anything else is about the
 * whole form ("").
 */
export function draftRefusalField(
  field: string | undefined,
  positions: { add: number[]; change: number[] } | undefined,
): string {
  if (!field) return "";
  if (field === "currency" || field === "notes" || field === "lines")
    return field;
  const match = /^(add|change|lines)[.[](\d+)]?\.(\w+)$/.exec(field);
  const index = match
    ? positions?.[match[1] === "change" ? "change" : "add"][Number(match[2])]
    : undefined;
  return match && index !== undefined ? `lines[${index}].${match[3]}` : "";
}
