import { data } from "react-router";
import type { Route } from "./+types/build-order-pick-list";
import { requireUser } from "~/auth/guard.server";
import { findBuildOrder } from "~/build-orders/build-order-details.server";
import { buildOrderIdFromPath } from "~/build-orders/build-order-path";
import {
  buildOrderReference,
  buildOrderStatusLabels,
  canReserve,
} from "~/build-orders/build-order-status";
import { pickList } from "~/build-orders/pick-list";
import { PrintSheet, printCell, writeInCell } from "~/components/print-page";
import { formatDateTime, formatDay } from "~/lib/format";
import { countText } from "~/lib/unit-text";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

/**
 * A build order's pick list on paper: each line still to issue with what to take from
 * which location and lot (the rule is in app/build-orders/pick-list.ts), a box to tick
 * when taken, never a lot on hold. Everyone who may read the order may print it.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = buildOrderIdFromPath(params.orderId, (message) =>
    data({ message }, { status: 404 }),
  );
  const order = await findBuildOrder(id);
  if (!order)
    throw data(
      { message: `No build order ${buildOrderReference(id)}.` },
      { status: 404 },
    );
  return {
    order: {
      id: order.id,
      reference: order.reference,
      status: order.status,
      design: order.design,
      revision: order.revision,
      quantity: order.quantity,
    },
    lines: pickList(order.lines, canReserve(order.status)),
    printedAt: new Date().toISOString(),
  };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `Pick list ${loaderData ? loaderData.order.reference : ""} (print) · Turnledger`,
  },
];

const columns = [
  "Location",
  "Lot",
  "Received",
  "From",
  "Take",
  "Taken",
] as const;

export default function BuildOrderPickList({
  loaderData,
}: Route.ComponentProps) {
  const { order, lines, printedAt } = loaderData;
  const anyFree = lines.some((line) =>
    line.rows.some((row) => row.source === "free"),
  );
  return (
    <PrintSheet
      back={{
        to: `/build-orders/${order.id}`,
        text: `Back to ${order.reference}`,
      }}
      title={`Pick list ${order.reference}`}
      facts={[
        { label: "Design", value: order.design.name },
        { label: "Revision", value: order.revision },
        { label: "Motors", value: countText(order.quantity, "motor") },
        { label: "Status", value: buildOrderStatusLabels[order.status] },
        { label: "Printed", value: formatDateTime(printedAt) },
      ]}
    >
      {lines.length === 0 ? (
        <p>
          Nothing left to pick: {order.reference} is{" "}
          {buildOrderStatusLabels[order.status].toLowerCase()}
          {canReserve(order.status) ? " and every line is issued" : ""}.
        </p>
      ) : (
        <>
          <p className="mb-3">
            Take what the order holds first, oldest lot first. Tick each row
            when it is on the trolley; write the quantity if it differs. Lots on
            hold are not listed: leave them on the shelf.
            {anyFree
              ? " Rows marked “not held” are free stock: have them reserved for the order before issuing."
              : ""}
          </p>
          <table className="w-full border-collapse border border-graphite-700">
            <caption className="sr-only">
              What to take for {order.reference}, by item, location and lot
            </caption>
            <thead>
              <tr className="bg-graphite-50 text-left">
                {columns.map((column) => (
                  <th
                    key={column}
                    scope="col"
                    className={`${printCell} ${column === "Taken" ? "w-[22mm]" : ""} ${column === "Take" ? "text-right" : ""}`}
                  >
                    {column}
                  </th>
                ))}
              </tr>
            </thead>
            {lines.map((line) => (
              <tbody key={line.sku} className="break-inside-avoid">
                <tr className="bg-graphite-50">
                  <th
                    scope="rowgroup"
                    colSpan={4}
                    className={`${printCell} text-left`}
                  >
                    {line.sku} <span className="font-normal">{line.name}</span>
                  </th>
                  <td className={`${printCell} text-right tabular-nums`}>
                    {formatStockQuantity(line.toIssue, line.unit)}
                  </td>
                  <td className={printCell} />
                </tr>
                {line.rows.map((row) => (
                  <tr key={`${row.source}:${row.lot ?? ""}@${row.location}`}>
                    <td className={`${printCell} font-mono font-semibold`}>
                      {row.location}
                    </td>
                    <td className={printCell}>{row.lot ?? "—"}</td>
                    <td className={`${printCell} whitespace-nowrap`}>
                      {row.receivedOn ? formatDay(row.receivedOn) : "—"}
                    </td>
                    <td className={printCell}>
                      {row.source === "free" ? (
                        <span className="font-semibold text-caution">
                          not held
                        </span>
                      ) : (
                        "held for the order"
                      )}
                    </td>
                    <td className={`${printCell} text-right tabular-nums`}>
                      {formatStockQuantity(row.quantity, line.unit)}
                    </td>
                    <td
                      className={writeInCell}
                      aria-label="Taken: blank, to tick"
                    />
                  </tr>
                ))}
                {line.short > 0 ? (
                  <tr>
                    <td colSpan={6} className={`${printCell} text-danger`}>
                      Short {formatStockQuantity(line.short, line.unit)}: no
                      free stock covers it.
                    </td>
                  </tr>
                ) : null}
                {line.heldOnHeldLots > 0 ? (
                  <tr>
                    <td colSpan={6} className={`${printCell} text-caution`}>
                      {formatStockQuantity(line.heldOnHeldLots, line.unit)} held
                      for the order is on a lot on hold and left off.
                    </td>
                  </tr>
                ) : null}
              </tbody>
            ))}
          </table>
          <p className="mt-4">
            Picked by: ____________________ Date: ___________
          </p>
        </>
      )}
    </PrintSheet>
  );
}
