import { data } from "react-router";
import type { Route } from "./+types/purchase-order-print";
import { requireUser } from "~/auth/guard.server";
import { PrintBar } from "~/components/print-page";
import { PurchaseOrderSheet } from "~/components/purchase-orders/purchase-order-sheet";
import { db } from "~/db/client.server";
import { idFromText } from "~/lib/search-params";
import { loadPurchaseOrder } from "~/purchase-orders/purchase-order-details.server";
import { purchaseOrderDocument } from "~/purchase-orders/purchase-order-document";
import {
  companyName,
  documentInputOf,
} from "~/purchase-orders/purchase-order-mail.server";

export async function loader({ request, params }: Route.LoaderArgs) {
  await requireUser(request);
  const id = idFromText(params.orderId);
  const order = id === null ? null : await loadPurchaseOrder(id);
  if (!order)
    throw data(
      { message: "There is no such purchase order." },
      { status: 404 },
    );
  const document = purchaseOrderDocument(
    documentInputOf(order, await companyName(db)),
  );
  return { id: order.id, document };
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? loaderData.document.title : "Purchase order"} · Turnledger`,
  },
];

/** The order on paper, as the supplier receives it in the PDF. */
export default function PurchaseOrderPrint({
  loaderData,
}: Route.ComponentProps) {
  const { id, document } = loaderData;
  return (
    <div className="space-y-6">
      <PrintBar
        back={{ to: `/purchase-orders/${id}`, text: "Back to the order" }}
      />
      <PurchaseOrderSheet document={document} />
    </div>
  );
}
