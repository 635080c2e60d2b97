/**
 * The steps of an order's page (save the draft, send, cancel, close short), from the
 * checked form to the domain's write, and a refusal back to the field it is about. The
 * writes are the domain's own (purchase-order-writes.server.ts); this only translates.
 */
import type { z } from "zod";
import type { FlashCode } from "~/lib/flash-messages";
import { isDomainError } from "~/lib/domain-error";
import type { PurchaseOrderView } from "./purchase-order-details.server";
import {
  draftPatchFromForm,
  draftRefusalField,
  type orderPageSchemas,
  type StoredDraftLine,
} from "./purchase-order-page-forms";
import {
  cancelPurchaseOrder,
  closePurchaseOrderShort,
  sendPurchaseOrder,
  updateDraftOrder,
} from "./purchase-order-writes.server";

type StepValue = z.output<
  (typeof orderPageSchemas)[keyof typeof orderPageSchemas]
>;

export type OrderPageStepOutcome =
  | { ok: true; flash: FlashCode & `purchase-order-${string}` }
  | { ok: false; status: number; message: string; field: string };

/** The draft's lines as the edit form compares them. */
function storedDraftOf(order: PurchaseOrderView) {
  return {
    currency: order.currency,
    notes: order.notes,
    lines: order.lines.map((line): StoredDraftLine => ({
      id: line.id,
      sku: line.sku,
      quantity: line.quantity,
      requestedDate: line.requestedDate,
      overridePrice: line.priceSource === "override" ? line.unitPrice : null,
      overrideReason: line.overrideReason,
    })),
  };
}

export async function runOrderPageStep(
  order: PurchaseOrderView,
  value: StepValue,
  userId: string,
): Promise<OrderPageStepOutcome> {
  let positions: { add: number[]; change: number[] } | undefined;
  try {
    switch (value.intent) {
      case "save": {
        const planned = draftPatchFromForm(storedDraftOf(order), value);
        positions = planned.positions;
        if (Object.keys(planned.patch).length > 0)
          await updateDraftOrder(order.id, planned.patch, userId);
        return { ok: true, flash: "purchase-order-saved" };
      }
      case "send":
        await sendPurchaseOrder(order.id, userId);
        return { ok: true, flash: "purchase-order-sent" };
      case "cancel":
        await cancelPurchaseOrder(order.id, value.reason, userId);
        return { ok: true, flash: "purchase-order-cancelled" };
      case "close":
        await closePurchaseOrderShort(order.id, value.reason, userId);
        return { ok: true, flash: "purchase-order-closed" };
    }
  } catch (error) {
    if (error instanceof RangeError && value.intent === "save")
      return {
        ok: false,
        status: 409,
        message:
          "The order changed since this page was loaded: reload it and make the change again.",
        field: "",
      };
    if (!isDomainError(error)) throw error;
    return {
      ok: false,
      status: error.status === 404 ? 400 : error.status,
      message: error.message,
      field:
        value.intent === "save"
          ? draftRefusalField(error.field, positions)
          : value.intent === "send"
            ? ""
            : error.field === "reason"
              ? "reason"
              : "",
    };
  }
}
