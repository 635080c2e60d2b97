import {
  buildOrderStatusLabels,
  type BuildOrderStatus,
} from "~/build-orders/build-order-status";

/** Where an order stands on its way from draft to built: a filled share of four steps, then the words. */
const statusLooks: Record<BuildOrderStatus, { steps: number; tone: string }> = {
  draft: { steps: 1, tone: "border-graphite-300 text-graphite-700" },
  reserved: { steps: 2, tone: "border-field/50 text-field" },
  in_progress: { steps: 3, tone: "border-copper-500/60 text-copper-700" },
  complete: { steps: 4, tone: "border-ok/50 text-ok" },
  cancelled: { steps: 0, tone: "border-danger/40 text-danger" },
};

export function BuildOrderStatusBadge({
  status,
}: {
  status: BuildOrderStatus;
}) {
  const look = statusLooks[status];
  return (
    <span
      className={`inline-flex items-center gap-1.5 whitespace-nowrap rounded border bg-sheet px-1.5 py-0.5 text-xs font-medium ${look.tone}`}
    >
      <span aria-hidden="true" className="inline-flex gap-0.5">
        {[1, 2, 3, 4].map((step) => (
          <span
            key={step}
            className={`h-2 w-1.5 rounded-[1px] ${
              status === "cancelled"
                ? "bg-current opacity-25"
                : step <= look.steps
                  ? "bg-current"
                  : "bg-current opacity-20"
            }`}
          />
        ))}
      </span>
      {buildOrderStatusLabels[status]}
    </span>
  );
}
