import type { SubmissionResult } from "@conform-to/react";
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/purchase-order";
import { requireCapability, requireUser } from "~/auth/guard.server";
import { DataTable } from "~/components/data-table";
import { DraftEditForm } from "~/components/purchase-orders/draft-edit-form";
import { EndOrderPanel } from "~/components/purchase-orders/end-order-panel";
import { OrderHeading } from "~/components/purchase-orders/order-heading";
import { OrderHistoryPanel } from "~/components/purchase-orders/order-history-panel";
import { orderLineColumns } from "~/components/purchase-orders/order-line-columns";
import { OrderReceiptsPanel } from "~/components/purchase-orders/order-receipts-panel";
import { SendOrderPanel } from "~/components/purchase-orders/send-order-panel";
import { userCan } from "~/lib/capabilities";
import { redirectWithFlash } from "~/lib/flash.server";
import { idFromText } from "~/lib/search-params";
import { loadPurchaseOrder } from "~/purchase-orders/purchase-order-details.server";
import { runOrderPageStep } from "~/purchase-orders/purchase-order-page-steps.server";
import {
  isOrderPageIntent,
  orderPageSchemas,
  type OrderPageIntent,
} from "~/purchase-orders/purchase-order-page-forms";
import { canEdit, canReceive } from "~/purchase-orders/purchase-order-status";
import { refusalReply } from "~/lib/refusal-reply";

async function orderOr404(value: string | undefined) {
  const id = idFromText(value);
  const order = id === null ? null : await loadPurchaseOrder(id);
  if (!order)
    throw data(
      { message: "There is no such purchase order." },
      { status: 404 },
    );
  return order;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const order = await orderOr404(params.orderId);
  return {
    order,
    can: {
      order: userCan(user, "orderPurchases"),
      receive: userCan(user, "receivePurchases"),
      printLabels: userCan(user, "printLabels"),
    },
  };
}

interface StepAnswer {
  intent: OrderPageIntent | "";
  result: SubmissionResult<string[]>;
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  const order = await orderOr404(params.orderId);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (!isOrderPageIntent(intent))
    return data<StepAnswer>(
      {
        intent: "",
        result: {
          status: "error",
          error: { "": ["Choose a step: save, send, cancel or close short."] },
        },
      },
      { status: 400 },
    );
  const submission = parseForm(formData, {
    schema: orderPageSchemas[intent],
    disableAutoCoercion: true,
  });
  if (submission.status !== "success")
    return data<StepAnswer>(
      { intent, result: submission.reply() },
      { status: 400 },
    );
  const outcome = await runOrderPageStep(order, submission.value, user.id);
  if (outcome.ok)
    return redirectWithFlash(`/purchase-orders/${order.id}`, {
      code: outcome.flash,
      id: order.id,
    });
  const result = refusalReply(submission, outcome.field, outcome.message);
  return data<StepAnswer>({ intent, result }, { status: outcome.status });
}

/** A refused send, or a step the page does not know: said above the Send button. */
function sendErrors(answer: StepAnswer | undefined) {
  if (answer?.intent !== "send" && answer?.intent !== "") return undefined;
  return Object.values(answer.result.error ?? {}).flatMap((each) => each ?? []);
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `${loaderData.order.number} ${loaderData.order.supplier.name}` : "Purchase order"} · Turnledger`,
  },
];

export default function PurchaseOrder({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { order, can } = loaderData;
  const answer = actionData as StepAnswer | undefined;
  const resultFor = (intent: OrderPageIntent) =>
    answer?.intent === intent ? answer.result : undefined;
  const editing = can.order && canEdit(order.status);
  return (
    <div className="space-y-6">
      <OrderHeading
        order={order}
        canReceiveHere={can.receive && canReceive(order.status)}
      />
      {/* The lines take the page's whole width: a sent order's columns (received, open) fit. */}
      <DataTable
        caption={`Lines of ${order.number}`}
        columns={orderLineColumns(order.currency, order.status !== "draft")}
        rows={order.lines}
        emptyText="This order has no lines yet."
      />
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="min-w-0 space-y-6">
          {editing ? (
            <DraftEditForm order={order} lastResult={resultFor("save")} />
          ) : null}
          <OrderReceiptsPanel order={order} canPrintLabels={can.printLabels} />
        </div>
        <div className="space-y-6">
          {editing ? (
            <SendOrderPanel
              number={order.number}
              orderEmail={order.supplier.orderEmail || order.supplier.email}
              errors={sendErrors(answer)}
            />
          ) : null}
          {can.order ? (
            <EndOrderPanel
              orderNumber={order.number}
              status={order.status}
              cancelResult={resultFor("cancel")}
              closeResult={resultFor("close")}
            />
          ) : null}
          <OrderHistoryPanel events={order.events} />
        </div>
      </div>
    </div>
  );
}
