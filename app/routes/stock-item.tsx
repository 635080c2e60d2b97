import { getZodConstraint } from "@conform-to/zod/v4";
import { parseForm } from "~/lib/parse-form";
import { data } from "react-router";
import type { Route } from "./+types/stock-item";
import {
  refuseUnless,
  requireCapability,
  requireUser,
} from "~/auth/guard.server";
import { ItemBestPricesPanel } from "~/components/item-best-prices";
import { PriceHistoryChart } from "~/components/price-history-chart";
import { CatalogueEntryPanel } from "~/components/stock/catalogue-entry-panel";
import { ItemAttributesPanel } from "~/components/stock/item-attributes-panel";
import { ItemBalancesPanel } from "~/components/stock/item-balances-panel";
import { ItemMovementsPanel } from "~/components/stock/item-movements-panel";
import { ItemOnHandPanel } from "~/components/stock/item-on-hand-panel";
import { ItemOrderLinesPanel } from "~/components/stock/item-order-lines-panel";
import { ItemPageHeading } from "~/components/stock/item-page-heading";
import { ItemSummaryFigures } from "~/components/stock/item-summary-figures";
import { ReorderPointPanel } from "~/components/stock/reorder-point-panel";
import { FormMessages } from "~/components/text-field";
import { pageCountOf, pageFromSearch } from "~/lib/search-params";
import { redirectWithFlash } from "~/lib/flash.server";
import { userCan } from "~/lib/capabilities";
import { updateItem } from "~/stock/catalogue.server";
import {
  changesCatalogue,
  itemChangeSchema,
  itemPatchOf,
  renameFormSchema,
  reorderFormSchema,
} from "~/stock/item-change-form";
import {
  countItemMovements,
  listOnHandHistory,
} from "~/stock/item-details.server";
import { itemPageAttributes } from "~/stock/item-page-attributes.server";
import { findItemBySku } from "~/stock/items.server";
import { listMovements } from "~/stock/movement-journal.server";
import {
  bestPricesOf,
  loadItemPricing,
  priceHistoryOf,
} from "~/purchasing/item-prices.server";
import { quantityToPrice } from "~/stock/reorder-quantities";
import { todayUtc } from "~/lib/calendar-days";
import { readItemPriceQuantity } from "~/purchasing/price-quantity-query";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { isDomainError } from "~/lib/domain-error";
import {
  itemOrderLinesLimit,
  openOrderLinesOfItem,
} from "~/purchase-orders/open-order-lines.server";
import { refusalReply } from "~/lib/refusal-reply";
import { BackLink } from "~/components/back-link";

const movementPageSize = 20;

function notFound(sku: string): never {
  throw data(
    { message: `No item with SKU "${sku}" is in the catalogue.` },
    { status: 404 },
  );
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const found = await findItemBySku(params.sku);
  if (!found) notFound(params.sku);
  const { id, ...item } = found;
  const url = new URL(request.url);
  const [attributes, movementCount, history, orderLines] = await Promise.all([
    itemPageAttributes(found),
    countItemMovements(id),
    listOnHandHistory(id),
    openOrderLinesOfItem(id, todayUtc()),
  ]);
  // A page past the end (a typed address) shows the last one.
  const pageCount = pageCountOf(movementCount, movementPageSize);
  const page = Math.min(
    pageFromSearch(url.searchParams.get("page")),
    pageCount,
  );
  const { movements } = await listMovements({
    itemId: id,
    page,
    pageSize: movementPageSize,
  });
  // Prices for the quantity the buyer asks (?quantity=), else the item's own rule, the one
  // its low-stock e-mail uses: today's and the last year's.
  const asked = readItemPriceQuantity(url.searchParams);
  const priceQuantity =
    asked.quantity ??
    quantityToPrice({
      available: quantityFromNumber(item.available) ?? 0n,
      reorderPoint: quantityFromNumber(item.reorderPoint) ?? 0n,
      reorderQuantity: quantityFromNumber(item.reorderQuantity) ?? 0n,
    });
  const today = todayUtc();
  const pricing = await loadItemPricing(item.sku);
  return {
    prices: pricing && bestPricesOf(pricing, priceQuantity, today),
    priceQuantity: { text: asked.text, error: asked.error },
    priceHistory: pricing && priceHistoryOf(pricing, priceQuantity, today),
    item,
    attributes,
    history,
    orderLines: orderLines.map((line) => ({ ...line, unit: item.unit })),
    orderLinesLimit: itemOrderLinesLimit,
    now: new Date().toISOString(),
    movements,
    page,
    pageCount,
    movementCount,
    // The forms' constraints for their first render; their checks load after hydration.
    constraints: {
      reorder: getZodConstraint(reorderFormSchema),
      rename: getZodConstraint(renameFormSchema),
    },
    can: {
      reorder: userCan(user, "keepReorderLevels"),
      catalogue: userCan(user, "keepCatalogue"),
      importPrices: userCan(user, "importPriceLists"),
      record: userCan(user, "recordStock"),
    },
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireCapability(request, "keepReorderLevels");
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (changesCatalogue(intent))
    refuseUnless(
      request,
      user,
      "keepCatalogue",
      "Storekeepers change the reorder point and quantity only; renaming and archiving need the role buyer.",
    );
  if (!(await findItemBySku(params.sku))) notFound(params.sku);
  const submission = parseForm(formData, { schema: itemChangeSchema });
  if (submission.status !== "success") {
    return data(
      { intent: String(intent ?? ""), result: submission.reply() },
      { status: 400 },
    );
  }
  try {
    await updateItem(params.sku, itemPatchOf(submission.value));
  } catch (error) {
    if (!isDomainError(error)) throw error;
    const result = refusalReply(submission, error.field, error.message);
    return data(
      { intent: submission.value.intent, result },
      { status: error.status },
    );
  }
  return redirectWithFlash(`/stock/items/${encodeURIComponent(params.sku)}`, {
    code: `item-${submission.value.intent}`,
  });
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `${loaderData.item.sku} ${loaderData.item.name}` : "Item"} · Stock · Turnledger`,
  },
];

export default function StockItem({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { item, attributes, can, prices, priceQuantity, priceHistory } =
    loaderData;
  const otherErrors =
    actionData &&
    actionData.intent !== "reorder" &&
    actionData.intent !== "rename"
      ? actionData.result.error?.[""]
      : undefined;

  return (
    <div className="space-y-6">
      <p className="text-sm">
        <BackLink to="/stock">Stock</BackLink>
      </p>
      <ItemPageHeading item={item} canRecord={can.record} />
      <FormMessages errors={otherErrors ?? undefined} />
      <ItemSummaryFigures item={item} />

      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          {attributes ? (
            <ItemAttributesPanel attributes={attributes} onHand={item.onHand} />
          ) : null}
          <ItemBalancesPanel
            sku={item.sku}
            unit={item.unit}
            isWire={item.kind === "wire"}
            balances={item.balances}
          />
          <ItemOrderLinesPanel
            sku={item.sku}
            unit={item.unit}
            onOrder={item.onOrder}
            lines={loaderData.orderLines}
            limit={loaderData.orderLinesLimit}
          />
          {prices ? (
            <ItemBestPricesPanel
              prices={prices}
              quantityChoice={{
                ...priceQuantity,
                defaultNote:
                  item.belowReorder || item.reorderQuantity > 0
                    ? "the suggested order"
                    : "one unit",
              }}
            />
          ) : null}
          {priceHistory ? (
            <PriceHistoryChart
              history={priceHistory}
              canImport={can.importPrices}
            />
          ) : null}
          <ItemOnHandPanel
            points={loaderData.history}
            now={loaderData.now}
            unit={item.unit}
            reorderPoint={item.reorderPoint}
          />
        </div>

        <div className="space-y-6">
          <ReorderPointPanel
            item={item}
            canSet={can.reorder}
            constraint={loaderData.constraints.reorder}
            lastResult={
              actionData?.intent === "reorder" ? actionData.result : undefined
            }
          />
          {can.catalogue ? (
            <CatalogueEntryPanel
              item={item}
              constraint={loaderData.constraints.rename}
              lastResult={
                actionData?.intent === "rename" ? actionData.result : undefined
              }
            />
          ) : null}
        </div>
      </div>

      <ItemMovementsPanel
        sku={item.sku}
        unit={item.unit}
        movements={loaderData.movements}
        movementCount={loaderData.movementCount}
        page={loaderData.page}
        pageCount={loaderData.pageCount}
        priceQuantityText={priceQuantity.text}
      />
    </div>
  );
}
