/** The order's history from its events: what changed, who changed it and when, newest last. */
import { formatDateTime } from "~/lib/format";

export interface OrderEvent {
  kind: string;
  detail: string;
  person: string;
  at: Date;
}

const kindTitles: Record<string, string> = {
  created: "Drafted",
  edited: "Edited",
  "line-added": "Line added",
  "line-changed": "Line changed",
  "line-removed": "Line removed",
  "price-overridden": "Price overridden",
  sent: "Sent",
  received: "Delivery received",
  cancelled: "Cancelled",
  "closed-short": "Closed short",
};

export function OrderHistoryPanel({ events }: { events: OrderEvent[] }) {
  return (
    <section aria-labelledby="order-history-heading" className="panel">
      <h2 id="order-history-heading" className="mb-3 text-lg font-semibold">
        History
      </h2>
      {events.length === 0 ? (
        <p className="text-sm text-graphite-500">Nothing recorded yet.</p>
      ) : (
        <ol className="space-y-3 border-l-2 border-rule pl-4">
          {events.map((event, index) => (
            <li key={`${event.at.valueOf()}-${index}`} className="text-sm">
              <p className="font-medium">
                {kindTitles[event.kind] ?? event.kind}
              </p>
              <p className="text-graphite-500">
                {formatDateTime(event.at)} · {event.person}
              </p>
              {event.detail ? (
                <p className="text-graphite-700">{event.detail}</p>
              ) : null}
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
