import { parseForm } from "~/lib/parse-form";
import { data, Link, useNavigate, useSearchParams } from "react-router";
import type { Route } from "./+types/stock-record";
import { requireCapability } from "~/auth/guard.server";
import { listOrdersToIssueItem } from "~/build-orders/build-order-issue-choices.server";
import { isBuildOrderError } from "~/build-orders/build-order-errors";
import { issueMovementToBuildOrder } from "~/build-orders/build-order-issues.server";
import { useFlash } from "~/components/flash-message";
import { ScanPanel } from "~/components/labels/scan-panel";
import { PrintLabelsLinks } from "~/components/labels/print-labels-links";
import { receivedLotsToLabel } from "~/labels/label-data.server";
import { recordPageAfterScan, scanFillText } from "~/labels/scan-targets";
import { idFromText } from "~/lib/search-params";
import { ItemSkuSearch } from "~/components/stock/item-sku-search";
import { MovementTypeNav } from "~/components/stock/movement-type-nav";
import { RecordMovementForm } from "~/components/stock/record-movement-form";
import { userCan } from "~/lib/capabilities";
import { redirectWithFlash } from "~/lib/flash.server";
import { companyCurrency, listSuppliers } from "~/purchasing/suppliers.server";
import { findItemBySku, listLocations } from "~/stock/items.server";
import { formFieldOf, movementFormSchema } from "~/stock/movement-form";
import {
  chosenMovementType,
  movementHelp,
} from "~/stock/record-movement-texts";
import { isDomainError } from "~/lib/domain-error";
import { recordMovement } from "~/stock/stock-movements.server";
import { usualLocationOf } from "~/stock/usual-location.server";
import { wireMetresPerKg } from "~/stock/wire-length.server";
import { refusalReply } from "~/lib/refusal-reply";

export async function loader({ request }: Route.LoaderArgs) {
  const user = await requireCapability(request, "recordStock");
  const url = new URL(request.url);
  const type = chosenMovementType(url.searchParams.get("type"));
  const sku = url.searchParams.get("sku")?.trim() ?? "";
  // A scanned label's lot and location, chosen in the form (app/labels/scan-targets.ts).
  const scanned = {
    lot: url.searchParams.get("lot")?.trim().slice(0, 40) || null,
    location: url.searchParams.get("location")?.trim().slice(0, 20) || null,
  };
  const item = sku ? await findItemBySku(sku) : null;
  const receivedMovement = idFromText(url.searchParams.get("received"));
  const [
    metresPerKg,
    locations,
    usualLocation,
    currency,
    orders,
    suppliers,
    receivedLots,
  ] = await Promise.all([
    item?.kind === "wire" ? wireMetresPerKg(item.id) : null,
    listLocations(),
    item && type === "receipt" ? usualLocationOf(item.id) : null,
    companyCurrency(),
    item && type === "issue" ? listOrdersToIssueItem(item.id) : [],
    item && type === "receipt" ? listSuppliers() : [],
    receivedMovement !== null && userCan(user, "printLabels")
      ? receivedLotsToLabel({ movementId: receivedMovement })
      : [],
  ]);
  return {
    type,
    sku,
    scanned,
    item: item ? { ...item, id: undefined } : null,
    metresPerKg,
    notFound: Boolean(sku) && !item,
    locations,
    usualLocation,
    currency,
    orders,
    // A receipt may name who supplied it: a new lot keeps it.
    suppliers: suppliers.map(({ id, name }) => ({ id, name })),
    canReceiveOrders: userCan(user, "receivePurchases"),
    receivedLots,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireCapability(request, "recordStock");
  const formData = await request.formData();
  const submission = parseForm(formData, {
    schema: movementFormSchema,
    disableAutoCoercion: true,
  });
  if (submission.status !== "success") {
    return data(submission.reply(), { status: 400 });
  }
  const { buildOrderId } = submission.value;
  try {
    // An issue to a build order goes through the order's own issue: one way to issue to it.
    const { movement } =
      buildOrderId === undefined
        ? await recordMovement(submission.value, user.id)
        : await issueMovementToBuildOrder(
            { ...submission.value, buildOrderId },
            user.id,
          );
    const params = new URLSearchParams({
      type: movement.type,
      sku: movement.sku,
    });
    // A receipt's lot gets its label offered (its movement's id, never words, in the address).
    if (movement.type === "receipt")
      params.set("received", String(movement.id));
    throw await redirectWithFlash(
      `/stock/record?${params}`,
      buildOrderId === undefined
        ? { code: "movement-recorded", id: movement.id }
        : { code: "order-issued", id: movement.id },
    );
  } catch (error) {
    if (!isDomainError(error) && !isBuildOrderError(error)) throw error;
    const field = formFieldOf(
      error.field,
      submission.value.type,
      buildOrderId !== undefined,
      submission.value.grossKg !== undefined,
    );
    return data(refusalReply(submission, field, error.message), {
      status: error.status === 404 ? 400 : error.status,
    });
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Record movement · Turnledger" },
];

export default function StockRecord({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { type, sku, item, scanned } = loaderData;
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  // Another type, item, scanned lot or location, or a movement just recorded (its
  // message) starts the form afresh: no weight or count left from before.
  const recorded = useFlash()?.key ?? "";
  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <h1 className="text-2xl font-semibold">Record movement</h1>
      <PrintLabelsLinks
        lots={loaderData.receivedLots}
        sheetHref={`/labels/lots?ids=${loaderData.receivedLots.map((lot) => lot.lotId).join(",")}`}
      />
      <MovementTypeNav type={type} sku={sku} />
      <p className="text-graphite-700">{movementHelp[type]}</p>
      {/* Outside the keyed part: what the last scan filled stays said after the page follows it. */}
      <ScanPanel
        hint="Scan a spool, batch or bin label into this field (or type the code under its QR code, e.g. L123 or BMAIN-A3, then Enter): the item, lot and location are filled."
        onFound={(answer) => {
          void navigate(recordPageAfterScan(searchParams, type, answer));
          return { filled: true, text: scanFillText(answer) };
        }}
      />
      <div
        key={`${type}|${sku}|${scanned.lot}|${scanned.location}|${recorded}`}
        className="space-y-6"
      >
        {type === "receipt" && loaderData.canReceiveOrders ? (
          <p className="rounded-md border border-copper-300 bg-copper-50/40 px-4 py-3">
            A delivery for a purchase order?{" "}
            <Link
              to="/stock/receive"
              className="font-medium text-copper-700 underline-offset-2 hover:underline"
            >
              Receive against an order
            </Link>{" "}
            — its unit cost comes from the order. Below: a receipt without an
            order (samples, returns).
          </p>
        ) : null}
        <ItemSkuSearch
          type={type}
          sku={sku}
          location={scanned.location}
          found={Boolean(item)}
          notFound={loaderData.notFound}
        />
        {item ? (
          <RecordMovementForm
            type={type}
            sku={sku}
            item={item}
            scanned={scanned}
            locations={loaderData.locations}
            usualLocation={loaderData.usualLocation}
            currency={loaderData.currency}
            orders={loaderData.orders}
            suppliers={loaderData.suppliers}
            metresPerKg={loaderData.metresPerKg}
            lastResult={actionData}
          />
        ) : null}
      </div>
    </div>
  );
}
