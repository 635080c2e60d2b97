/** The order's history: each change of status, when and by whom. */
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import { buildOrderStatusLabels } from "~/build-orders/build-order-status";
import { formatDateTime } from "~/lib/format";

type BuildOrderEvent = BuildOrderDetails["events"][number];

/** "Made as draft", "Draft → Stock held", or "Changed" when the status stayed. */
function eventTitle(event: BuildOrderEvent): string {
  if (event.fromStatus === null)
    return `Made as ${buildOrderStatusLabels[event.toStatus].toLowerCase()}`;
  if (event.fromStatus === event.toStatus) return "Changed";
  return `${buildOrderStatusLabels[event.fromStatus]} → ${buildOrderStatusLabels[event.toStatus]}`;
}

export function HistoryPanel({ order }: { order: BuildOrderDetails }) {
  return (
    <section aria-labelledby="history-heading" className="panel">
      <h2 id="history-heading" className="mb-3 text-lg font-semibold">
        History
      </h2>
      <ol className="space-y-3 border-l-2 border-rule pl-4">
        {order.events.map((event, index) => (
          <li key={index} className="text-sm">
            <p className="font-medium">{eventTitle(event)}</p>
            <p className="text-graphite-500">
              {formatDateTime(event.at)} · {event.by}
            </p>
            {event.note ? (
              <p className="text-graphite-700">{event.note}</p>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
