import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/purchase-order-new";
import { requireCapability } from "~/auth/guard.server";
import { NewOrderForm } from "~/components/purchase-orders/new-order-form";
import { OrderFromAlertPanel } from "~/components/purchase-orders/order-from-alert-panel";
import { isDomainError } from "~/lib/domain-error";
import { redirectWithFlash } from "~/lib/flash.server";
import { idFromText } from "~/lib/search-params";
import {
  fromAlertFormSchema,
  newOrderFormSchema,
  orderFormFieldOf,
} from "~/purchase-orders/purchase-order-page-forms";
import {
  createOrderFromAlert,
  createPurchaseOrder,
} from "~/purchase-orders/purchase-order-writes.server";
import { listSuppliers } from "~/purchasing/suppliers.server";
import { refusalReply } from "~/lib/refusal-reply";

export async function loader({ request }: Route.LoaderArgs) {
  await requireCapability(request, "orderPurchases");
  const search = new URL(request.url).searchParams;
  const suppliers = await listSuppliers();
  return {
    suppliers: suppliers.map(({ id, name, currency, orderEmail, email }) => ({
      id,
      name,
      currency,
      // Orders go to the order address, else the supplier's general one.
      orderEmail: orderEmail || email,
    })),
    supplierId: idFromText(search.get("supplier")),
    alertId: idFromText(search.get("alert")),
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "orderPurchases");
  const formData = await request.formData();
  const fromAlert = formData.get("intent") === "from-alert";
  const submission = parseForm(formData, {
    schema: fromAlert ? fromAlertFormSchema : newOrderFormSchema,
    disableAutoCoercion: true,
  });
  if (submission.status !== "success")
    return data({ fromAlert, result: submission.reply() }, { status: 400 });
  try {
    const value = submission.value;
    const order =
      "alertId" in value
        ? await createOrderFromAlert(value.alertId, user.id)
        : await createPurchaseOrder(value, user.id);
    return redirectWithFlash(`/purchase-orders/${order.id}`, {
      code: fromAlert ? "purchase-order-from-alert" : "purchase-order-created",
      id: order.id,
    });
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const field = fromAlert ? "" : orderFormFieldOf(error.field);
    const result = refusalReply(submission, field, error.message);
    return data(
      { fromAlert, result },
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "New purchase order · Turnledger" },
];

export default function PurchaseOrderNew({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const alertErrors = actionData?.fromAlert
    ? Object.values(actionData.result.error ?? {}).flatMap((each) => each ?? [])
    : undefined;
  return (
    <div className="mx-auto max-w-5xl space-y-6">
      <div>
        <h1 className="text-2xl font-semibold">New purchase order</h1>
        <p className="mt-1 text-graphite-500">
          Saved as a draft: change it freely until it is sent. Lines without a
          price of your own take the supplier&apos;s price list at the ordered
          quantity.
        </p>
      </div>
      <OrderFromAlertPanel
        alertId={loaderData.alertId}
        errors={alertErrors?.length ? alertErrors : undefined}
      />
      <NewOrderForm
        suppliers={loaderData.suppliers}
        supplierId={loaderData.supplierId}
        lastResult={actionData?.fromAlert ? undefined : actionData?.result}
      />
    </div>
  );
}
