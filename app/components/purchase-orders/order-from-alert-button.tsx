/** A low-stock alert's "Order" button for buyers: makes a draft order for the item from the alert and opens it. */
import { Form } from "react-router";

export function OrderFromAlertButton({
  alertId,
  sku,
}: {
  alertId: number;
  sku: string;
}) {
  return (
    <Form method="post" action="/purchase-orders/new">
      <input type="hidden" name="intent" value="from-alert" />
      <input type="hidden" name="alertId" value={alertId} />
      <button
        type="submit"
        className="button-quiet whitespace-nowrap"
        aria-label={`Order ${sku}`}
      >
        Order
      </button>
    </Form>
  );
}
