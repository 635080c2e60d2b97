import { parseForm } from "~/lib/parse-form";
import { data, Link } from "react-router";
import type { Route } from "./+types/stock-receive";
import { requireCapability } from "~/auth/guard.server";
import { useFlash } from "~/components/flash-message";
import { PrintLabelsLinks } from "~/components/labels/print-labels-links";
import { OrderChoice } from "~/components/receiving/order-choice";
import { ReceiveOrderForm } from "~/components/receiving/receive-order-form";
import { receivedLotsToLabel } from "~/labels/label-data.server";
import { userCan } from "~/lib/capabilities";
import { isDomainError } from "~/lib/domain-error";
import { redirectWithFlash } from "~/lib/flash.server";
import {
  purchaseOrderIdFromNumber,
  purchaseOrderNumber,
} from "~/purchase-orders/purchase-order-status";
import { receiveAgainstOrder } from "~/purchase-orders/receive-against-order.server";
import {
  receiptFormField,
  receiptFormSchema,
} from "~/purchase-orders/receipt-request";
import {
  findReceivingOrder,
  listReceivableOrders,
} from "~/purchase-orders/receiving-page.server";
import { listLocations } from "~/stock/items.server";
import { refusalReply } from "~/lib/refusal-reply";
import { idFromText } from "~/lib/search-params";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireCapability(request, "receivePurchases");
  const params = new URL(request.url).searchParams;
  const typed = params.get("order")?.trim() ?? "";
  const orderId = typed ? purchaseOrderIdFromNumber(typed) : null;
  // The delivery just received (its id in the address after the redirect): its lots' labels.
  const receiptId = idFromText(params.get("received"));
  const [orders, order, locations, receivedLots] = await Promise.all([
    listReceivableOrders(),
    orderId === null ? null : findReceivingOrder(orderId),
    listLocations(),
    receiptId !== null && userCan(user, "printLabels")
      ? receivedLotsToLabel({ purchaseReceiptId: receiptId })
      : [],
  ]);
  const problem = !typed
    ? null
    : orderId === null
      ? `"${typed.slice(0, 40)}" is not an order number: type it as PO-000123 or 123.`
      : !order
        ? `There is no order ${purchaseOrderNumber(orderId)}.`
        : order.receivable
          ? null
          : `${order.number} is ${order.statusLabel.toLowerCase()}: nothing is received against it.`;
  return {
    typed,
    problem,
    orders,
    order: order?.receivable ? order : null,
    locations,
    received:
      receiptId !== null && receivedLots.length > 0
        ? { receiptId, lots: receivedLots }
        : null,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "receivePurchases");
  const formData = await request.formData();
  const submission = parseForm(formData, {
    schema: receiptFormSchema,
    disableAutoCoercion: true,
  });
  if (submission.status !== "success")
    return data(submission.reply(), { status: 400 });
  const orderId = purchaseOrderIdFromNumber(
    String(formData.get("orderId") ?? ""),
  );
  if (orderId === null)
    return data(submission.reply({ formErrors: ["Choose the order first."] }), {
      status: 400,
    });
  try {
    const { receipt, order } = await receiveAgainstOrder(
      orderId,
      submission.value,
      user.id,
    );
    const received = `received=${receipt.id}`;
    throw await redirectWithFlash(
      order.status === "received"
        ? `/stock/receive?${received}`
        : `/stock/receive?order=${order.number}&${received}`,
      { code: "purchase-received", id: receipt.id },
    );
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const field = receiptFormField(error.field);
    return data(refusalReply(submission, field, error.message), {
      status: error.status === 404 ? 400 : error.status,
    });
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Receive against an order · Turnledger" },
];

export default function StockReceive({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { order } = loaderData;
  // A delivery just received (its message) starts the form afresh.
  const received = useFlash()?.key ?? "";
  return (
    <div className="mx-auto max-w-4xl space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">Receive against an order</h1>
        <p className="mt-1 text-graphite-700">
          Weigh in each spool or count each lot of a delivery against the order
          it came for. The unit cost comes from the order. A delivery without an
          order is recorded on the{" "}
          <Link
            to="/stock/record?type=receipt"
            className="text-copper-700 underline underline-offset-2"
          >
            record page
          </Link>
          .
        </p>
      </div>
      {loaderData.received ? (
        <PrintLabelsLinks
          lots={loaderData.received.lots}
          sheetHref={`/labels/lots?receipt=${loaderData.received.receiptId}`}
        />
      ) : null}
      <OrderChoice
        typed={order?.number ?? loaderData.typed}
        problem={loaderData.problem}
        orders={loaderData.orders}
      />
      {order ? (
        <section aria-labelledby="order-heading" className="space-y-3">
          <h2 id="order-heading" className="text-lg font-semibold">
            <Link
              to={`/purchase-orders/${order.id}`}
              className="text-copper-700 underline underline-offset-2"
            >
              {order.number}
            </Link>{" "}
            · {order.supplier}{" "}
            <span className="font-normal text-graphite-500">
              · {order.statusLabel}, prices in {order.currency}
            </span>
          </h2>
          <ReceiveOrderForm
            key={`${order.id}|${received}`}
            order={order}
            locations={loaderData.locations}
            lastResult={actionData}
          />
        </section>
      ) : null}
    </div>
  );
}
