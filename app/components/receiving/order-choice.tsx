/**
 * Choosing the order a delivery is received against: type its number ("PO-000123",
 * "123") or pick one of the orders still waiting for deliveries.
 */
import { Form, Link } from "react-router";
import { formatDay } from "~/lib/format";
import { TableScroll } from "~/components/table-scroll";

export interface ReceivableOrder {
  id: number;
  number: string;
  supplier: string;
  orderedOn: string | null;
  statusLabel: string;
}

export function OrderChoice({
  typed,
  problem,
  orders,
}: {
  /** The number as typed, kept in the field. */
  typed: string;
  /** Why the typed number shows no order, if it does not. */
  problem: string | null;
  orders: ReceivableOrder[];
}) {
  return (
    <section className="panel space-y-4" aria-labelledby="choose-order">
      <h2 id="choose-order" className="text-lg font-semibold">
        Which order did the delivery come for?
      </h2>
      <Form method="get" className="flex flex-wrap items-end gap-3">
        <div className="grow">
          <label htmlFor="order-number" className="field-label">
            Order number
          </label>
          <input
            key={typed}
            id="order-number"
            name="order"
            defaultValue={typed}
            placeholder="PO-000123 or 123"
            autoComplete="off"
            className="field-input min-h-12 text-lg"
            aria-invalid={problem ? true : undefined}
            aria-describedby={problem ? "order-number-error" : undefined}
          />
          {problem ? (
            <p id="order-number-error" className="field-error">
              {problem}
            </p>
          ) : null}
        </div>
        <button type="submit" className="button-primary min-h-12">
          Show the order
        </button>
      </Form>
      {orders.length > 0 ? (
        <TableScroll label="Orders waiting for deliveries">
          <table className="w-full text-sm">
            <caption className="sr-only">Orders waiting for deliveries</caption>
            <thead className="text-left text-graphite-500">
              <tr>
                <th className="py-1 font-medium">Order</th>
                <th className="py-1 font-medium">Supplier</th>
                <th className="py-1 font-medium">Sent</th>
                <th className="py-1 font-medium">Status</th>
              </tr>
            </thead>
            <tbody>
              {orders.map((order) => (
                <tr key={order.id} className="border-t border-graphite-100">
                  <td className="py-2">
                    <Link
                      to={`?order=${order.number}`}
                      className="font-medium text-copper-700 underline-offset-2 hover:underline"
                    >
                      {order.number}
                    </Link>
                  </td>
                  <td className="py-2">{order.supplier}</td>
                  <td className="py-2 tabular-nums">
                    {order.orderedOn ? formatDay(order.orderedOn) : "—"}
                  </td>
                  <td className="py-2">{order.statusLabel}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </TableScroll>
      ) : (
        <p className="text-graphite-500">
          No order is waiting for a delivery. A receipt without an order is
          recorded on the record page.
        </p>
      )}
    </section>
  );
}
