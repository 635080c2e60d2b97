/** Where a purchase order stands from draft to received: a filled share of four steps, then the words. */
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { purchaseOrderStatusLabels } from "~/purchase-orders/purchase-order-status";

const statusLooks: Record<
  PurchaseOrderStatus,
  { steps: number; tone: string }
> = {
  draft: { steps: 1, tone: "border-graphite-300 text-graphite-700" },
  sent: { steps: 2, tone: "border-field/50 text-field" },
  partly_received: {
    steps: 3,
    tone: "border-copper-500/60 text-copper-700",
  },
  received: { steps: 4, tone: "border-ok/50 text-ok" },
  closed_short: { steps: 4, tone: "border-caution/50 text-caution" },
  cancelled: { steps: 0, tone: "border-danger/40 text-danger" },
};

export function PurchaseOrderStatusBadge({
  status,
}: {
  status: PurchaseOrderStatus;
}) {
  const look = statusLooks[status];
  return (
    <span
      className={`inline-flex items-center gap-1.5 rounded border bg-sheet px-1.5 py-0.5 text-xs font-medium whitespace-nowrap ${look.tone}`}
    >
      <span aria-hidden="true" className="inline-flex gap-0.5">
        {[1, 2, 3, 4].map((step) => (
          <span
            key={step}
            className={`h-2 w-1.5 rounded-[1px] bg-current ${step <= look.steps ? "" : "opacity-20"}`}
          />
        ))}
      </span>
      {purchaseOrderStatusLabels[status]}
    </span>
  );
}
