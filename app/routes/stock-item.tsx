import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { createColumnHelper } from "@tanstack/react-table";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stock-item";
import { requireRole, requireUser } from "~/auth/guard.server";
import { SummaryFigure } from "~/components/summary-figure";
import { BelowReorderMark } from "~/components/below-reorder-mark";
import { DataTable } from "~/components/data-table";
import { MagnetHandlingCaution } from "~/components/magnet-handling-caution";
import { OnHandChart } from "~/components/on-hand-chart";
import { QuantityField } from "~/components/quantity-field";
import {
  MagnetAttributeList,
  WireAttributeList,
  type MagnetAttributes,
  type WireAttributes,
} from "~/components/stock-item-attributes";
import { FormMessages, TextField } from "~/components/text-field";
import type { ConductorKey } from "~/engineering/reference-data";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { pageCountOf, pageFromSearch } from "~/lib/search-params";
import { redirectWithFlash } from "~/lib/flash.server";
import { userHasRole } from "~/lib/roles";
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
  findItemAttributes,
  listOnHandHistory,
} from "~/stock/item-details.server";
import { findItemBySku } from "~/stock/items.server";
import { listMovements } from "~/stock/movement-journal.server";
import { ItemBestPricesPanel } from "~/components/item-best-prices";
import { PriceHistoryChart } from "~/components/price-history-chart";
import {
  bestPricesOf,
  loadItemPricing,
  priceHistoryOf,
} from "~/purchasing/item-prices.server";
import { quantityToPrice } from "~/stock/reorder-quantities";
import { todayUtc } from "~/purchasing/current-entries";
import { readItemPriceQuantity } from "~/purchasing/price-quantity-query";
import { quantityFromNumber } from "~/lib/decimal-amounts";
import { isDomainError } from "~/lib/domain-error";
import {
  formatMoney,
  formatSignedStockQuantity,
  formatStockQuantity,
  formatUnitCost,
  itemKindLabel,
  movementTypeLabels,
} from "~/stock/stock-quantity-text";
import {
  magnetShapeOf,
  magnetStockFigures,
  wireStockFigures,
} from "~/stock/stocked-item-figures";

const movementPageSize = 20;

function notFound(sku: string): never {
  throw data(
    { message: `No item with SKU "${sku}" is in the catalogue.` },
    { status: 404 },
  );
}

async function attributesOf(item: {
  id: number;
  kind: "wire" | "magnet" | "part";
  onHand: number;
}) {
  const found = await findItemAttributes(item.id, item.kind);
  if (found?.kind === "wire") {
    let figures = null;
    try {
      figures = wireStockFigures({
        conductor: found.conductor as ConductorKey,
        standard: found.standard,
        sizeLabel: found.sizeLabel,
        onHandKg: item.onHand,
      });
    } catch {
      // A size or conductor the engineering tables no longer know: show the attributes without figures.
    }
    return { ...found, figures } satisfies WireAttributes;
  }
  if (found?.kind === "magnet") {
    const shape = magnetShapeOf(found.shape, found.dimensionsMm);
    let figures = null;
    if (found.grade && shape) {
      try {
        figures = magnetStockFigures({
          grade: found.grade,
          shape,
          pieces: item.onHand,
        });
      } catch {
        // Stored dimensions the estimate refuses: show them without a mass.
      }
    }
    const grade = found.grade
      ? {
          name: found.grade.name,
          material: found.grade.material,
          maxWorkingTemperatureC: found.grade.maxWorkingTemperatureC,
          densityGPerCm3: found.grade.densityGPerCm3,
        }
      : null;
    return {
      kind: "magnet",
      gradeKey: found.gradeKey,
      grade,
      shape,
      coating: found.coating,
      magnetisation: found.magnetisation,
      figures: figures && {
        massPerPieceKg: figures.massPerPieceKg,
        totalMassKg: figures.totalMassKg,
      },
    } satisfies MagnetAttributes;
  }
  return null;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const found = await findItemBySku(params.sku);
  if (!found) notFound(params.sku);
  const { id, ...item } = found;
  const url = new URL(request.url);
  const [attributes, movementCount, history] = await Promise.all([
    attributesOf(found),
    countItemMovements(id),
    listOnHandHistory(id),
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
    now: new Date().toISOString(),
    movements,
    page,
    pageCount,
    movementCount,
    can: {
      reorder: userHasRole(user, ["buyer", "storekeeper"]),
      catalogue: userHasRole(user, ["buyer"]),
      importPrices: userHasRole(user, ["buyer"]),
      record: userHasRole(user, ["storekeeper"]),
    },
  };
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, ["buyer", "storekeeper"]);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (changesCatalogue(intent) && !userHasRole(user, ["buyer"])) {
    throw data(
      {
        message:
          "Storekeepers change the reorder point and quantity only; renaming and archiving need the role buyer.",
      },
      { status: 403 },
    );
  }
  if (!(await findItemBySku(params.sku))) notFound(params.sku);
  const submission = parseWithZod(formData, { schema: itemChangeSchema });
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
    const result = error.field
      ? submission.reply({ fieldErrors: { [error.field]: [error.message] } })
      : submission.reply({ formErrors: [error.message] });
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

type LoaderData = Route.ComponentProps["loaderData"];
type Balance = LoaderData["item"]["balances"][number];
type Movement = LoaderData["movements"][number];

function balanceColumns(unit: string, isWire: boolean) {
  const column = createColumnHelper<Balance>();
  return [
    column.accessor("location", {
      header: "Location",
      cell: (info) => (
        <>
          <span className="font-medium">{info.getValue()}</span>{" "}
          <span className="text-graphite-500">
            {info.row.original.locationName}
          </span>
        </>
      ),
    }),
    column.accessor("lot", {
      header: "Lot",
      cell: (info) => info.getValue() ?? "—",
    }),
    ...(isWire
      ? [
          column.accessor("tareKg", {
            header: "Spool tare",
            cell: (info) => {
              const tare = info.getValue();
              return tare === null ? "—" : formatQuantity(tare, "kg", 3);
            },
            meta: { numeric: true },
          }),
        ]
      : []),
    column.accessor("onHand", {
      header: "On hand",
      cell: (info) => formatStockQuantity(info.getValue(), unit),
      meta: { numeric: true },
    }),
    column.accessor("reserved", {
      header: "Reserved",
      cell: (info) => formatStockQuantity(info.getValue(), unit),
      meta: { numeric: true },
    }),
  ];
}

function movementColumns(unit: string) {
  const column = createColumnHelper<Movement>();
  return [
    column.accessor("createdAt", {
      header: "When",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatDateTime(info.getValue())}
        </span>
      ),
    }),
    column.accessor("type", {
      header: "Movement",
      cell: (info) => movementTypeLabels[info.getValue()] ?? info.getValue(),
    }),
    column.accessor("lot", {
      header: "Lot",
      cell: (info) => info.getValue() ?? "—",
    }),
    column.accessor("location", { header: "Location" }),
    column.accessor("quantity", {
      header: "Change",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatSignedStockQuantity(info.getValue(), unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("itemOnHandAfter", {
      header: "On hand after",
      cell: (info) => (
        <span className="whitespace-nowrap">
          {formatStockQuantity(info.getValue(), unit)}
        </span>
      ),
      meta: { numeric: true },
    }),
    column.accessor("unitCost", {
      header: "Unit cost",
      cell: (info) => {
        const cost = info.getValue();
        return cost === null ? (
          "—"
        ) : (
          <span className="whitespace-nowrap">
            {formatUnitCost(cost, unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.display({
      id: "reference",
      header: "Reference and note",
      cell: ({ row }) =>
        [row.original.reference, row.original.note]
          .filter(Boolean)
          .join(" · ") || "—",
    }),
    column.accessor("user", { header: "By" }),
  ];
}

export default function StockItem({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const {
    item,
    attributes,
    history,
    now,
    movements,
    page,
    pageCount,
    movementCount,
    can,
    prices,
    priceQuantity,
    priceHistory,
  } = loaderData;
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const [reorderForm, reorderFields] = useForm({
    id: "reorder",
    lastResult:
      actionData?.intent === "reorder" ? actionData.result : undefined,
    defaultValue: {
      reorderPoint: String(item.reorderPoint),
      reorderQuantity: String(item.reorderQuantity),
    },
    constraint: getZodConstraint(reorderFormSchema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) =>
      parseWithZod(formData, { schema: reorderFormSchema }),
  });
  const [renameForm, renameFields] = useForm({
    id: "rename",
    lastResult: actionData?.intent === "rename" ? actionData.result : undefined,
    defaultValue: { name: item.name },
    constraint: getZodConstraint(renameFormSchema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: ({ formData }) =>
      parseWithZod(formData, { schema: renameFormSchema }),
  });
  const otherErrors =
    actionData &&
    actionData.intent !== "reorder" &&
    actionData.intent !== "rename"
      ? actionData.result.error?.[""]
      : undefined;
  const unit = item.unit;
  const sku = encodeURIComponent(item.sku);

  return (
    <div className="space-y-6">
      <p className="text-sm">
        <Link
          to="/stock"
          className="text-copper-700 underline underline-offset-2"
        >
          ← Stock
        </Link>
      </p>

      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="text-sm font-medium text-graphite-500">
            {itemKindLabel(item.kind)} · SKU{" "}
            <span className="text-graphite-900">{item.sku}</span>
          </p>
          <h1 className="mt-1 text-2xl font-semibold">{item.name}</h1>
          <p className="mt-1 flex flex-wrap items-center gap-2 text-graphite-700">
            {item.sizeOrGrade || null}
            {item.active ? null : (
              <span className="rounded border border-graphite-300 px-1.5 py-0.5 text-xs font-medium text-graphite-700">
                Archived
              </span>
            )}
            {item.belowReorder ? <BelowReorderMark /> : null}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link to={`/stock/journal?sku=${sku}`} className="button-quiet">
            Journal for this item
          </Link>
          {can.record ? (
            <Link to={`/stock/record?sku=${sku}`} className="button-primary">
              Record movement
            </Link>
          ) : null}
        </div>
      </div>

      <FormMessages errors={otherErrors ?? undefined} />

      <dl className="panel grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-6">
        <SummaryFigure
          label="On hand"
          value={formatStockQuantity(item.onHand, unit)}
          emphasis
        />
        <SummaryFigure
          label="Reserved"
          value={formatStockQuantity(item.reserved, unit)}
        />
        <SummaryFigure
          label="Available"
          value={formatStockQuantity(item.available, unit)}
          emphasis
        />
        <SummaryFigure
          label="Reorder point"
          value={
            item.reorderPoint > 0
              ? formatStockQuantity(item.reorderPoint, unit)
              : "not set"
          }
        />
        <SummaryFigure
          label="Average cost"
          value={formatUnitCost(item.averageCost, unit)}
        />
        <SummaryFigure label="Value" value={formatMoney(item.value)} />
      </dl>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="space-y-6">
          {attributes ? (
            <section aria-labelledby="attributes-heading" className="panel">
              <h2
                id="attributes-heading"
                className="mb-2 text-lg font-semibold"
              >
                {attributes.kind === "wire" ? "Wire" : "Magnet"}
              </h2>
              {attributes.kind === "wire" ? (
                <WireAttributeList wire={attributes} onHandKg={item.onHand} />
              ) : (
                <MagnetAttributeList magnet={attributes} pieces={item.onHand} />
              )}
            </section>
          ) : null}
          {attributes?.kind === "magnet" ? <MagnetHandlingCaution /> : null}

          <section aria-labelledby="balances-heading" className="space-y-2">
            <h2 id="balances-heading" className="text-lg font-semibold">
              Where it is
            </h2>
            <DataTable
              caption={`On hand of ${item.sku} by location and lot`}
              columns={balanceColumns(unit, item.kind === "wire")}
              rows={item.balances}
              emptyText="Nothing on hand."
            />
          </section>

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

          <section aria-labelledby="chart-heading" className="panel">
            <h2 id="chart-heading" className="mb-3 text-lg font-semibold">
              On hand over time
            </h2>
            <OnHandChart
              points={history}
              now={now}
              unit={unit}
              reorderPoint={item.reorderPoint}
            />
          </section>
        </div>

        <div className="space-y-6">
          {can.reorder ? (
            <section aria-labelledby="reorder-heading" className="panel">
              <h2 id="reorder-heading" className="mb-1 text-lg font-semibold">
                Reorder point
              </h2>
              <p className="mb-3 text-sm text-graphite-500">
                When the available stock falls below the reorder point, buyers
                hear of it. 0 turns the alert off.
              </p>
              <Form
                method="post"
                {...getFormProps(reorderForm)}
                className="space-y-4"
              >
                <input type="hidden" name="intent" value="reorder" />
                <FormMessages
                  id={reorderForm.errorId}
                  errors={reorderForm.errors}
                />
                <QuantityField
                  field={reorderFields.reorderPoint}
                  label="Reorder point"
                  unit={unit}
                />
                <QuantityField
                  field={reorderFields.reorderQuantity}
                  label="Reorder quantity"
                  unit={unit}
                  hint="How much to order at a time"
                />
                <button type="submit" className="button-quiet" disabled={busy}>
                  Save reorder point
                </button>
              </Form>
            </section>
          ) : (
            <section
              aria-labelledby="reorder-heading"
              className="panel text-sm"
            >
              <h2 id="reorder-heading" className="mb-2 text-lg font-semibold">
                Reorder point
              </h2>
              <p>
                {item.reorderPoint > 0
                  ? `${formatStockQuantity(item.reorderPoint, unit)}; order ${formatStockQuantity(item.reorderQuantity, unit)} at a time.`
                  : "Not set."}
              </p>
            </section>
          )}

          {can.catalogue ? (
            <section
              aria-labelledby="catalogue-heading"
              className="panel space-y-4"
            >
              <h2 id="catalogue-heading" className="text-lg font-semibold">
                Catalogue entry
              </h2>
              <Form
                method="post"
                {...getFormProps(renameForm)}
                className="space-y-3"
              >
                <input type="hidden" name="intent" value="rename" />
                <FormMessages
                  id={renameForm.errorId}
                  errors={renameForm.errors}
                />
                <TextField
                  field={renameFields.name}
                  label="Name"
                  autoComplete="off"
                />
                <button type="submit" className="button-quiet" disabled={busy}>
                  Save name
                </button>
              </Form>
              <Form method="post" className="border-t border-rule pt-4">
                <p className="mb-2 text-sm text-graphite-700">
                  {item.active
                    ? "Archiving hides the item from the stock list; its history stays."
                    : "This item is archived: it shows in the stock list only with archived items included."}
                </p>
                <button
                  type="submit"
                  name="intent"
                  value={item.active ? "archive" : "restore"}
                  className="button-quiet"
                  disabled={busy}
                >
                  {item.active ? "Archive item" : "Restore item"}
                </button>
              </Form>
            </section>
          ) : null}
        </div>
      </div>

      <section aria-labelledby="movements-heading" className="space-y-2">
        <h2 id="movements-heading" className="text-lg font-semibold">
          Movements{" "}
          <span className="font-normal text-graphite-500">
            · {formatQuantity(movementCount, "")}, newest first
          </span>
        </h2>
        <DataTable
          caption={`Movements of ${item.sku}, newest first`}
          columns={movementColumns(unit)}
          rows={movements}
          page={page}
          pageCount={pageCount}
          pageHref={(target) =>
            `/stock/items/${sku}?page=${target}${priceQuantity.text ? `&quantity=${encodeURIComponent(priceQuantity.text)}` : ""}`
          }
          emptyText="No movements yet."
        />
      </section>
    </div>
  );
}
