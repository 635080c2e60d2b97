/** Reached with ?alert=: makes the draft order from that low-stock alert, or says why it could not. */
import { Form } from "react-router";
import { FormMessages } from "~/components/text-field";

export function OrderFromAlertPanel({
  alertId,
  errors,
}: {
  alertId: number | null;
  errors?: string[];
}) {
  if (alertId === null && !errors) return null;
  return (
    <section aria-labelledby="from-alert-heading" className="panel space-y-3">
      <h2 id="from-alert-heading" className="text-lg font-semibold">
        From a low-stock alert
      </h2>
      <FormMessages errors={errors} />
      {alertId !== null ? (
        <Form method="post" className="flex flex-wrap items-center gap-3">
          <input type="hidden" name="intent" value="from-alert" />
          <input type="hidden" name="alertId" value={alertId} />
          <p className="text-sm text-graphite-700">
            A draft for the alert&apos;s item at its reorder quantity, from the
            supplier with the best price.
          </p>
          <button type="submit" className="button-primary">
            Make the draft order
          </button>
        </Form>
      ) : null}
    </section>
  );
}
