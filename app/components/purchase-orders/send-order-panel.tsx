/** Send, in two steps: says where the order goes and that its lines are then fixed. */
import { useState } from "react";
import { Form, useNavigation } from "react-router";
import { FormMessages } from "~/components/text-field";

export function SendOrderPanel({
  number,
  orderEmail,
  errors,
}: {
  number: string;
  orderEmail: string | null;
  errors?: string[];
}) {
  const [asking, setAsking] = useState(false);
  const busy = useNavigation().state !== "idle";
  return (
    <section aria-labelledby="send-order-heading" className="panel space-y-3">
      <h2 id="send-order-heading" className="text-lg font-semibold">
        Send
      </h2>
      <FormMessages errors={errors} />
      {orderEmail ? (
        <p className="text-sm text-graphite-700">
          Send e-mails {number} to <strong>{orderEmail}</strong> with the order
          attached as a PDF and a CSV file. Its lines are then fixed and their
          quantities count as stock on order.
        </p>
      ) : (
        <p className="text-sm text-caution">
          The supplier has no address for orders: add one on its page first.
        </p>
      )}
      {asking ? (
        <Form method="post" aria-label={`Send ${number}`} className="space-y-2">
          <input type="hidden" name="intent" value="send" />
          <p className="text-sm font-medium">
            Send {number} now? This cannot be undone.
          </p>
          <div className="flex flex-wrap gap-2">
            <button type="submit" className="button-primary" disabled={busy}>
              {busy ? "Sending…" : `Yes, send ${number}`}
            </button>
            <button
              type="button"
              className="button-quiet"
              onClick={() => setAsking(false)}
            >
              Not yet
            </button>
          </div>
        </Form>
      ) : (
        <button
          type="button"
          className="button-primary w-full"
          disabled={!orderEmail}
          onClick={() => setAsking(true)}
        >
          Send to supplier…
        </button>
      )}
    </section>
  );
}
