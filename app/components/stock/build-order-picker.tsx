/**
 * The issue form's choice of build order: the open orders that need the item (the server
 * lists them), each with what it holds. Issuing to one goes through the order's own issue,
 * so what it holds goes down and what it has been issued goes up.
 */
import { Link } from "react-router";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export interface PickableOrder {
  id: number;
  reference: string;
  design: string;
  required: number;
  reserved: number;
  issued: number;
  held: { lot: string | null; location: string; quantity: number }[];
}

export function BuildOrderPicker({
  orders,
  unit,
  value,
  onChange,
  errors,
}: {
  orders: PickableOrder[];
  unit: string;
  /** The chosen order's id as text; "" for none. */
  value: string;
  onChange: (value: string) => void;
  errors?: string[];
}) {
  const chosen = orders.find((order) => String(order.id) === value);
  const describedBy = [
    "movement-buildOrderId-hint",
    errors ? "movement-buildOrderId-error" : null,
  ]
    .filter(Boolean)
    .join(" ");
  return (
    <div className="rounded-md border border-graphite-100 bg-graphite-50 px-4 py-3">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <label htmlFor="movement-buildOrderId" className="field-label">
          Build order
        </label>
        {chosen ? (
          <Link
            to={`/build-orders/${chosen.id}`}
            className="text-sm text-copper-700 underline underline-offset-2"
          >
            Open {chosen.reference}
          </Link>
        ) : (
          <Link
            to="/build-orders"
            className="text-sm text-copper-700 underline underline-offset-2"
          >
            All build orders
          </Link>
        )}
      </div>
      <select
        id="movement-buildOrderId"
        name="buildOrderId"
        className="field-input mt-1 min-h-12 text-lg"
        value={value}
        onChange={(event) => onChange(event.target.value)}
        aria-invalid={errors ? true : undefined}
        aria-describedby={describedBy}
      >
        <option value="">Not for a build order</option>
        {orders.map((order) => {
          const held = order.reserved;
          return (
            <option key={order.id} value={order.id} disabled={held <= 0}>
              {order.reference} · {order.design} ·{" "}
              {held > 0
                ? `holds ${formatStockQuantity(held, unit)}`
                : "holds none: reserve on the order first"}
            </option>
          );
        })}
      </select>
      <p
        id="movement-buildOrderId-hint"
        className="mt-1 text-xs text-graphite-500"
      >
        {orders.length === 0
          ? "No open build order needs this item."
          : chosen
            ? `${chosen.reference} needs ${formatStockQuantity(chosen.required, unit)}, has been issued ${formatStockQuantity(chosen.issued, unit)} and holds ${formatStockQuantity(chosen.reserved, unit)}. The issue takes what it holds on the lot you choose.`
            : "Stock for a build takes what its order holds: choose the order here."}
      </p>
      {errors ? (
        <p id="movement-buildOrderId-error" className="field-error">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

/** What the chosen order holds on a balance ("lot|location"), for the lot choice. */
export function heldOnBalance(
  order: PickableOrder | undefined,
  balanceKey: string,
): number | null {
  const spot = order?.held.find(
    (held) => `${held.lot ?? ""}|${held.location}` === balanceKey,
  );
  return spot ? spot.quantity : null;
}
