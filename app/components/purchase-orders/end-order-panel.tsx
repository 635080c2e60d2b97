/** "End the order": cancel (a draft, or sent with nothing received) or close short (sent, partly received), each with its reason. */
import type { SubmissionResult } from "@conform-to/react";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import {
  canCancel,
  canCloseShort,
} from "~/purchase-orders/purchase-order-status";
import { EndOrderForm } from "./end-order-form";

export function EndOrderPanel({
  orderNumber,
  status,
  cancelResult,
  closeResult,
}: {
  orderNumber: string;
  status: PurchaseOrderStatus;
  cancelResult?: SubmissionResult<string[]>;
  closeResult?: SubmissionResult<string[]>;
}) {
  if (!canCancel(status) && !canCloseShort(status)) return null;
  return (
    <section aria-labelledby="end-order-heading" className="panel space-y-4">
      <h2 id="end-order-heading" className="text-lg font-semibold">
        End the order
      </h2>
      {canCancel(status) ? (
        <EndOrderForm
          step="cancel"
          orderNumber={orderNumber}
          lastResult={cancelResult}
        />
      ) : null}
      {canCloseShort(status) ? (
        <EndOrderForm
          step="close"
          orderNumber={orderNumber}
          lastResult={closeResult}
        />
      ) : null}
    </section>
  );
}
