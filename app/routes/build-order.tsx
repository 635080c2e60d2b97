import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { createColumnHelper } from "@tanstack/react-table";
import { useState } from "react";
import { data, Form, Link, useNavigation } from "react-router";
import type { z } from "zod";
import type { Route } from "./+types/build-order";
import { requireRole, requireUser } from "~/auth/guard.server";
import { MeasureField } from "~/components/measure-field";
import { SummaryFigure } from "~/components/summary-figure";
import {
  cancelBuildOrder,
  changeBuildOrderQuantity,
  completeBuildOrder,
} from "~/build-orders/build-order-closing.server";
import {
  findBuildOrder,
  type BuildOrderDetails,
} from "~/build-orders/build-order-details.server";
import {
  isBuildOrderError,
  type Shortage,
} from "~/build-orders/build-order-errors";
import {
  intentSchemas,
  isBuildOrderIntent,
  issueFormFieldOf,
  quantityFormSchema,
  type BuildOrderIntent,
} from "~/build-orders/build-order-forms";
import { issueToBuildOrder } from "~/build-orders/build-order-issues.server";
import { reserveBuildOrderStock } from "~/build-orders/build-order-reservations.server";
import {
  buildOrderReference,
  buildOrderStatusLabels,
  canCancel,
  canChangeQuantity,
  canComplete,
  canIssue,
  canReserve,
} from "~/build-orders/build-order-status";
import { BuildOrderStatusBadge } from "~/components/build-order-status-badge";
import { DataTable } from "~/components/data-table";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages } from "~/components/text-field";
import type { FlashNote } from "~/lib/flash-messages";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatDateTime, formatQuantity } from "~/lib/format";
import { userHasRole } from "~/lib/roles";
import { isDomainError } from "~/lib/domain-error";
import {
  formatMoney,
  formatStockQuantity,
  formatUnitCost,
} from "~/stock/stock-quantity-text";
import { PriceBasisNote } from "~/components/design/price-basis-note";
import { countText } from "~/lib/unit-text";

function orderIdOf(value: string | undefined): number {
  const id = Number(value);
  if (!/^\d{1,9}$/.test(value ?? "") || id < 1)
    throw data({ message: `No build order "${value}".` }, { status: 404 });
  return id;
}

async function orderOr404(id: number): Promise<BuildOrderDetails> {
  const order = await findBuildOrder(id);
  if (!order)
    throw data(
      { message: `No build order ${buildOrderReference(id)}.` },
      { status: 404 },
    );
  return order;
}

export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireUser(request);
  const order = await orderOr404(orderIdOf(params.orderId));
  return {
    order,
    can: {
      build: userHasRole(user, ["builder"]),
      issue: userHasRole(user, ["storekeeper"]),
    },
  };
}

/** Who takes each step of the page (admins take any). */
const intentRoles = {
  reserve: ["builder"],
  cancel: ["builder"],
  complete: ["builder"],
  quantity: ["builder"],
  issue: ["storekeeper"],
} as const satisfies Record<BuildOrderIntent, readonly string[]>;

interface StepAnswer {
  intent: string;
  result: SubmissionResult<string[]>;
  shortages?: Shortage[];
}

function stepRefused(
  intent: string,
  result: SubmissionResult<string[]>,
  status: number,
  shortages?: Shortage[],
) {
  return data<StepAnswer>({ intent, result, shortages }, { status });
}

/** Back to the order's page, with the message of the step taken. */
async function done(orderId: number, note: FlashNote): Promise<never> {
  throw await redirectWithFlash(`/build-orders/${orderId}`, note);
}

export async function action({ request, params }: Route.ActionArgs) {
  const user = await requireRole(request, ["builder", "storekeeper"]);
  const id = orderIdOf(params.orderId);
  const formData = await request.formData();
  const intent = formData.get("intent");
  if (isBuildOrderIntent(intent) && !userHasRole(user, intentRoles[intent])) {
    throw data(
      {
        message: `This step needs the role ${intentRoles[intent].join(" or ")}.`,
      },
      { status: 403 },
    );
  }
  await orderOr404(id);
  if (!isBuildOrderIntent(intent)) {
    return stepRefused(
      "",
      {
        status: "error",
        error: { "": ["Choose a step: reserve, issue, complete or cancel."] },
      },
      400,
    );
  }
  const submission = parseWithZod(formData, {
    schema: intentSchemas[intent],
    disableAutoCoercion: true,
  });
  if (submission.status !== "success")
    return stepRefused(intent, submission.reply(), 400);
  const value = submission.value;
  try {
    switch (value.intent) {
      case "reserve": {
        const reserved = await reserveBuildOrderStock(id, user.id, {
          partial: value.partial,
        });
        return done(id, {
          code:
            reserved.reserved.length === 0
              ? "order-already-held"
              : "order-reserved",
          id,
        });
      }
      case "issue": {
        const { movement } = await issueToBuildOrder(id, value, user.id);
        return done(id, { code: "order-issued", id: movement.id });
      }
      case "cancel": {
        await cancelBuildOrder(id, user.id, value.note);
        return done(id, { code: "order-cancelled", id });
      }
      case "complete": {
        await completeBuildOrder(id, user.id, value.note);
        return done(id, { code: "order-built", id });
      }
      case "quantity": {
        const changed = await changeBuildOrderQuantity(
          id,
          value.quantity,
          user.id,
        );
        return done(id, {
          code:
            changed.released.length > 0
              ? "order-quantity-changed-released"
              : "order-quantity-changed",
          id,
        });
      }
    }
  } catch (error) {
    if (isBuildOrderError(error) || isDomainError(error)) {
      const field =
        intent === "issue"
          ? issueFormFieldOf(error.field)
          : intent === "quantity" && error.field === "quantity"
            ? "quantity"
            : "";
      const result = submission.reply(
        field
          ? { fieldErrors: { [field]: [error.message] } }
          : { formErrors: [error.message] },
      );
      return stepRefused(
        intent,
        result,
        error.status === 404 ? 400 : error.status,
        isBuildOrderError(error) ? error.shortages : undefined,
      );
    }
    throw error;
  }
  return null;
}

export const meta: Route.MetaFunction = ({ data: loaderData }) => [
  {
    title: `${loaderData ? `${loaderData.order.reference} ${loaderData.order.design.name}` : "Build order"} · Turnledger`,
  },
];

type Order = Route.ComponentProps["loaderData"]["order"];
type Line = Order["lines"][number];
type Issue = Line["issues"][number] & { sku: string; unit: string };

function place(row: { lot: string | null; location: string }) {
  return row.lot ? `lot ${row.lot} · ${row.location}` : row.location;
}

const lineColumn = createColumnHelper<Line>();
const quantityCell =
  (key: "required" | "reserved" | "issued" | "toReserve" | "available") =>
  (info: { row: { original: Line } }) => (
    <span className="whitespace-nowrap">
      {formatStockQuantity(info.row.original[key], info.row.original.unit)}
    </span>
  );
const lineColumns = [
  lineColumn.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <>
        <Link
          to={`/stock/items/${encodeURIComponent(info.getValue())}`}
          className="font-medium whitespace-nowrap text-copper-700 underline-offset-2 hover:underline"
        >
          {info.getValue()}
        </Link>
        <span className="block text-xs text-graphite-500">
          {info.row.original.name}
        </span>
      </>
    ),
  }),
  lineColumn.accessor("required", {
    header: "Needed",
    cell: quantityCell("required"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("reserved", {
    header: "Held",
    cell: quantityCell("reserved"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("issued", {
    header: "Issued",
    cell: quantityCell("issued"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("toReserve", {
    header: "Still to hold",
    cell: quantityCell("toReserve"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("available", {
    header: "Free in store",
    cell: quantityCell("available"),
    meta: { numeric: true },
  }),
  lineColumn.accessor("short", {
    header: "Short",
    cell: (info) =>
      info.getValue() > 0 ? (
        <span className="font-semibold whitespace-nowrap text-danger">
          {formatStockQuantity(info.getValue(), info.row.original.unit)}
        </span>
      ) : (
        <span className="text-graphite-500">—</span>
      ),
    meta: { numeric: true },
  }),
  lineColumn.display({
    id: "where",
    header: "Where it is (oldest lot first)",
    cell: ({ row }) => {
      const stock = row.original.stock.filter((balance) => balance.onHand > 0);
      if (stock.length === 0)
        return <span className="text-graphite-500">none in store</span>;
      return (
        <ul className="min-w-40 space-y-1 text-xs">
          {stock.slice(0, 4).map((balance) => (
            <li key={`${balance.lot ?? ""}|${balance.location}`}>
              <span className="text-graphite-700">{place(balance)}</span>
              <span className="block whitespace-nowrap">
                <span className="font-medium">
                  {formatStockQuantity(balance.free, row.original.unit)}
                </span>{" "}
                free
                {balance.reserved > 0 ? (
                  <span className="text-graphite-500">
                    {" "}
                    of {formatStockQuantity(balance.onHand, row.original.unit)}
                  </span>
                ) : null}
              </span>
            </li>
          ))}
          {stock.length > 4 ? (
            <li className="text-graphite-500">
              and {stock.length - 4} more places
            </li>
          ) : null}
        </ul>
      );
    },
  }),
];

function outcomeColumns(currency: string) {
  const column = createColumnHelper<Line>();
  return [
    column.accessor("sku", {
      header: "Item",
      cell: (info) => (
        <span className="font-medium whitespace-nowrap">{info.getValue()}</span>
      ),
    }),
    column.accessor("required", {
      header: "Planned",
      cell: quantityCell("required"),
      meta: { numeric: true },
    }),
    column.accessor("issued", {
      header: "Used (issued)",
      cell: quantityCell("issued"),
      meta: { numeric: true },
    }),
    column.accessor("difference", {
      header: "Difference",
      cell: (info) => {
        const value = info.getValue();
        const sign = value > 0 ? "+" : value < 0 ? "−" : "";
        return (
          <span
            className={`whitespace-nowrap ${value > 0 ? "text-caution" : ""}`}
          >
            {sign}
            {formatStockQuantity(Math.abs(value), info.row.original.unit)}
          </span>
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("plannedCost", {
      header: `Planned cost (${currency})`,
      cell: (info) => {
        const cost = info.getValue();
        return cost === null ? (
          <span className="text-graphite-500">no cost yet</span>
        ) : (
          formatMoney(cost)
        );
      },
      meta: { numeric: true },
    }),
    column.accessor("actualCost", {
      header: `Actual cost (${currency})`,
      cell: (info) => formatMoney(info.getValue()),
      meta: { numeric: true },
    }),
  ];
}

const issueColumn = createColumnHelper<Issue>();
const issueColumns = [
  issueColumn.accessor("at", {
    header: "When",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatDateTime(info.getValue())}
      </span>
    ),
  }),
  issueColumn.accessor("sku", {
    header: "Item",
    cell: (info) => (
      <span className="whitespace-nowrap">{info.getValue()}</span>
    ),
  }),
  issueColumn.display({
    id: "place",
    header: "From",
    cell: ({ row }) => place(row.original),
  }),
  issueColumn.accessor("quantity", {
    header: "Issued",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatStockQuantity(info.getValue(), info.row.original.unit)}
      </span>
    ),
    meta: { numeric: true },
  }),
  issueColumn.accessor("grossKg", {
    header: "Spool weighed at",
    cell: (info) => {
      const gross = info.getValue();
      return gross === null ? "—" : formatQuantity(gross, "kg", 3);
    },
    meta: { numeric: true },
  }),
  issueColumn.accessor("unitCost", {
    header: "Average cost then",
    cell: (info) => (
      <span className="whitespace-nowrap">
        {formatUnitCost(info.getValue(), info.row.original.unit)}
      </span>
    ),
    meta: { numeric: true },
  }),
  issueColumn.accessor("by", { header: "By" }),
];

type PrimaryStep = "reserve" | "issue" | "complete" | null;

function primaryStepOf(
  order: Order,
  can: { build: boolean; issue: boolean },
): PrimaryStep {
  const needsReserve = order.lines.some((line) => line.toReserve > 0);
  const holds = order.lines.some((line) => line.held.length > 0);
  if (can.build && order.status === "draft") return "reserve";
  if (can.issue && canIssue(order.status) && holds) return "issue";
  if (can.build && canComplete(order.status)) return "complete";
  if (can.build && canReserve(order.status) && needsReserve) return "reserve";
  return null;
}

export default function BuildOrder({
  loaderData,
  actionData,
}: Route.ComponentProps) {
  const { order, can } = loaderData;
  const answer = actionData as StepAnswer | null | undefined;
  const primary = primaryStepOf(order, can);
  const resultFor = (intent: BuildOrderIntent) =>
    answer?.intent === intent ? answer.result : undefined;
  const issues: Issue[] = order.lines
    .flatMap((line) =>
      line.issues.map((issue) => ({
        ...issue,
        sku: line.sku,
        unit: line.unit,
      })),
    )
    .sort((a, b) => (a.at < b.at ? 1 : a.at > b.at ? -1 : 0));
  const anyIssued = issues.length > 0;
  const needsReserve = order.lines.some((line) => line.toReserve > 0);
  const shortCount = order.lines.filter((line) => line.short > 0).length;

  return (
    <div className="space-y-6">
      <p className="text-sm">
        <Link
          to="/build-orders"
          className="text-copper-700 underline underline-offset-2"
        >
          ← Build orders
        </Link>
      </p>

      <div className="flex flex-wrap items-start justify-between gap-4">
        <div>
          <p className="flex items-center gap-2 text-sm font-medium text-graphite-500">
            Build order{" "}
            <span className="text-graphite-900">{order.reference}</span>
            <BuildOrderStatusBadge status={order.status} />
          </p>
          <h1 className="mt-1 text-2xl font-semibold">
            {formatQuantity(order.quantity, "×")} {order.design.name}{" "}
            <span className="font-normal text-graphite-500">
              revision {order.revision}
            </span>
          </h1>
          <p className="mt-1 text-sm text-graphite-700">
            Made by {order.createdBy} · {formatDateTime(order.createdAt)}
            {order.note ? ` · ${order.note}` : ""}
          </p>
        </div>
        <Link
          to={`/designs/${order.design.id}/revisions/${order.revision}`}
          className="button-quiet"
        >
          The design
        </Link>
      </div>

      {answer && answer.intent === "" ? (
        <FormMessages errors={answer.result.error?.[""] ?? undefined} />
      ) : null}

      <dl className="panel grid grid-cols-2 gap-4 sm:grid-cols-4">
        <SummaryFigure
          label="Motors"
          value={countText(order.quantity, "motor")}
          emphasis
        />
        <SummaryFigure
          label="Status"
          value={buildOrderStatusLabels[order.status]}
        />
        <SummaryFigure
          label="Planned cost per motor"
          value={
            <>
              {formatMoney(order.costs.plannedPerMotor)} {order.currency}
              <PriceBasisNote
                basis="stock-average"
                after=" when the order was made"
                className="block"
              />
              {order.costs.plannedComplete ? null : (
                <span className="block text-xs text-graphite-500">
                  some items had no cost yet
                </span>
              )}
            </>
          }
        />
        <SummaryFigure
          label={
            order.status === "complete"
              ? "Actual cost per motor"
              : "Issued so far, per motor"
          }
          value={
            anyIssued
              ? `${formatMoney(order.costs.actualPerMotor)} ${order.currency}`
              : "—"
          }
          emphasis={order.status === "complete"}
        />
      </dl>

      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="lines-heading" className="space-y-2">
            <h2 id="lines-heading" className="text-lg font-semibold">
              What the build needs
            </h2>
            <p className="text-sm text-graphite-500">
              Per motor × {order.quantity}; wire is the mass drawn from stock,
              scrap included.{" "}
              {shortCount > 0 && canReserve(order.status)
                ? `${shortCount} ${shortCount === 1 ? "item is" : "items are"} short.`
                : null}
            </p>
            <DataTable
              caption={`What ${order.reference} needs, holds and has been issued, and where the stock is`}
              columns={lineColumns}
              rows={order.lines}
            />
          </section>

          {anyIssued || order.status === "complete" ? (
            <section aria-labelledby="outcome-heading" className="space-y-2">
              <h2 id="outcome-heading" className="text-lg font-semibold">
                Planned and used
              </h2>
              <DataTable
                caption="Planned versus issued quantity and cost per item"
                columns={outcomeColumns(order.currency)}
                rows={order.lines}
              />
              <p className="text-sm text-graphite-700">
                Total planned{" "}
                <strong>
                  {formatMoney(order.costs.plannedTotal)} {order.currency}
                </strong>{" "}
                at the moving average cost of stock when the order was made,
                issued{" "}
                <strong>
                  {formatMoney(order.costs.actualTotal)} {order.currency}
                </strong>{" "}
                at the moving average cost of each issue.
              </p>
            </section>
          ) : null}

          {anyIssued ? (
            <section aria-labelledby="issues-heading" className="space-y-2">
              <h2 id="issues-heading" className="text-lg font-semibold">
                Issued to the build
              </h2>
              <DataTable
                caption={`Stock issued to ${order.reference}`}
                columns={issueColumns}
                rows={issues}
              />
            </section>
          ) : null}
        </div>

        <div className="space-y-6">
          {can.build && canReserve(order.status) && needsReserve ? (
            <ReservePanel
              order={order}
              primary={primary === "reserve"}
              lastResult={resultFor("reserve")}
              shortages={
                answer?.intent === "reserve" ? answer.shortages : undefined
              }
            />
          ) : null}
          {can.issue && canIssue(order.status) ? (
            <IssuePanel
              key={heldSpots(order)
                .map((spot) => `${spot.key}:${spot.quantity}`)
                .join(",")}
              order={order}
              primary={primary === "issue"}
              lastResult={resultFor("issue")}
            />
          ) : null}
          {can.build && canComplete(order.status) ? (
            <CompletePanel
              order={order}
              primary={primary === "complete"}
              lastResult={resultFor("complete")}
            />
          ) : null}
          {can.build && canCancel(order.status) ? (
            <ChangePanel
              order={order}
              quantityResult={resultFor("quantity")}
              cancelResult={resultFor("cancel")}
            />
          ) : null}
          <History order={order} />
        </div>
      </div>
    </div>
  );
}

function ReservePanel({
  order,
  primary,
  lastResult,
  shortages,
}: {
  order: Order;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
  shortages?: Shortage[];
}) {
  const navigation = useNavigation();
  const [form] = useForm({
    id: "reserve",
    lastResult: navigation.state === "idle" ? lastResult : null,
  });
  const toReserve = order.lines.filter((line) => line.toReserve > 0);
  return (
    <section aria-labelledby="reserve-heading" className="panel space-y-3">
      <h2 id="reserve-heading" className="text-lg font-semibold">
        Hold stock for the build
      </h2>
      <p className="text-sm text-graphite-700">
        {toReserve.length} {toReserve.length === 1 ? "item" : "items"} still to
        hold, taken from the oldest lots first. Either every item is held in
        full, or nothing is.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-3">
        <input type="hidden" name="intent" value="reserve" />
        <FormMessages id={form.errorId} errors={form.errors} />
        {shortages && shortages.length > 0 ? (
          <table className="data-table">
            <caption className="mb-1 text-left text-sm font-medium text-danger">
              Short
            </caption>
            <thead>
              <tr>
                <th scope="col">Item</th>
                <th scope="col" className="text-right">
                  To hold
                </th>
                <th scope="col" className="text-right">
                  Free
                </th>
                <th scope="col" className="text-right">
                  Short
                </th>
              </tr>
            </thead>
            <tbody>
              {shortages.map((shortage) => (
                <tr key={shortage.sku}>
                  <td>{shortage.sku}</td>
                  <td className="text-right whitespace-nowrap">
                    {formatStockQuantity(shortage.required, shortage.unit)}
                  </td>
                  <td className="text-right whitespace-nowrap">
                    {formatStockQuantity(shortage.available, shortage.unit)}
                  </td>
                  <td className="text-right font-semibold whitespace-nowrap text-danger">
                    {formatStockQuantity(shortage.short, shortage.unit)}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : null}
        <label className="flex items-start gap-2 text-sm">
          <input
            type="checkbox"
            name="partial"
            className="mt-0.5 h-4 w-4 accent-copper-600"
          />
          <span>
            Reserve what is there
            <span className="block text-xs text-graphite-500">
              Hold what is free now and leave the rest short.
            </span>
          </span>
        </label>
        <button
          type="submit"
          className={primary ? "button-primary w-full" : "button-quiet w-full"}
          disabled={navigation.state !== "idle"}
        >
          Reserve stock
        </button>
      </Form>
    </section>
  );
}

interface HeldSpot {
  key: string;
  sku: string;
  name: string;
  unit: string;
  kind: string;
  lot: string | null;
  location: string;
  quantity: number;
  onHand: number;
  tareKg: number | null;
}

function heldSpots(order: Order): HeldSpot[] {
  return order.lines.flatMap((line) =>
    line.held.map((held) => ({
      key: `${line.sku}|${held.lot ?? ""}|${held.location}`,
      sku: line.sku,
      name: line.name,
      unit: line.unit,
      kind: line.kind,
      lot: held.lot,
      location: held.location,
      quantity: held.quantity,
      onHand: held.onHand,
      tareKg: held.tareKg,
    })),
  );
}

function IssuePanel({
  order,
  primary,
  lastResult,
}: {
  order: Order;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const spots = heldSpots(order);
  const [form] = useForm({
    id: `issue-${order.id}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate({ formData }) {
      return parseWithZod(formData, {
        schema: intentSchemas.issue,
        disableAutoCoercion: true,
      });
    },
  });
  const errors = (form.allErrors ?? {}) as Record<string, string[] | undefined>;
  // The oldest lot of the first item still held is suggested.
  const [spotKey, setSpotKey] = useState(spots[0]?.key ?? "");
  const [gross, setGross] = useState("");
  const chosen = spots.find((spot) => spot.key === spotKey);
  const weighable = chosen?.kind === "wire" && chosen.tareKg !== null;
  const grossKg = Number(gross.replace(",", "."));
  const weighBack =
    weighable && gross.trim() !== "" && Number.isFinite(grossKg)
      ? Math.round((chosen.onHand - (grossKg - chosen.tareKg!)) * 1000) / 1000
      : null;

  return (
    <section aria-labelledby="issue-heading" className="panel space-y-3">
      <h2 id="issue-heading" className="text-lg font-semibold">
        Issue to the bench
      </h2>
      {spots.length === 0 ? (
        <p className="text-sm text-graphite-700">
          Nothing is held for {order.reference} now. A builder reserves stock
          before it is issued.
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <input type="hidden" name="intent" value="issue" />
          <FormMessages id={form.errorId} errors={form.errors} />
          <fieldset>
            <legend className="field-label">
              Held stock (oldest lot first)
            </legend>
            <div className="mt-2 grid gap-2">
              {spots.map((spot) => (
                <label
                  key={spot.key}
                  className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border border-graphite-300 bg-white px-3 py-2 has-checked:border-copper-500 has-checked:bg-copper-50"
                >
                  <input
                    type="radio"
                    name="spot"
                    value={spot.key}
                    checked={spotKey === spot.key}
                    onChange={() => {
                      setSpotKey(spot.key);
                      setGross("");
                    }}
                    className="h-5 w-5 shrink-0 accent-copper-600"
                  />
                  <span className="min-w-0 flex-1 text-sm">
                    <strong>{spot.sku}</strong>{" "}
                    {spot.lot ? <>lot {spot.lot}</> : null} at {spot.location}
                    {spot.tareKg !== null ? (
                      <span className="block text-xs text-graphite-500">
                        spool net {formatQuantity(spot.onHand, "kg", 3)}, tare{" "}
                        {formatQuantity(spot.tareKg, "kg", 3)}
                      </span>
                    ) : null}
                  </span>
                  <span className="text-right text-sm font-medium whitespace-nowrap">
                    {formatStockQuantity(spot.quantity, spot.unit)}
                    <span className="block text-xs font-normal text-graphite-500">
                      held
                    </span>
                  </span>
                </label>
              ))}
            </div>
            {errors.spot ? (
              <p className="field-error">{errors.spot.join(" ")}</p>
            ) : null}
          </fieldset>

          <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-1">
            {weighable ? (
              <IssueField
                name="grossKg"
                label="Spool gross weight now"
                unit="kg"
                value={gross}
                onChange={(event) => setGross(event.target.value)}
                errors={errors.grossKg}
                hint="Weigh the spool back, or leave empty and type the quantity."
              />
            ) : null}
            {weighBack === null ? (
              <IssueField
                key={spotKey}
                name="quantity"
                label="Quantity"
                unit={chosen?.unit}
                defaultValue={chosen ? String(chosen.quantity) : ""}
                errors={errors.quantity}
              />
            ) : null}
            <IssueField
              name="note"
              label="Note (optional)"
              errors={errors.note}
              inputMode="text"
            />
          </div>

          {weighBack !== null && chosen ? (
            <p
              role="status"
              className="rounded-md bg-graphite-50 px-4 py-3 text-sm"
            >
              {weighBack > 0 ? (
                <>
                  Issue <strong>{formatQuantity(weighBack, "kg", 3)}</strong>:
                  the spool held {formatQuantity(chosen.onHand, "kg", 3)} net
                  and now holds{" "}
                  {formatQuantity(grossKg - chosen.tareKg!, "kg", 3)}.
                  {weighBack > chosen.quantity ? (
                    <span className="mt-1 block text-danger">
                      That is more than the{" "}
                      {formatStockQuantity(chosen.quantity, "kg")} held for this
                      order here.
                    </span>
                  ) : null}
                </>
              ) : (
                <span className="text-danger">
                  The spool weighs as much as or more than its recorded net:
                  nothing to issue.
                </span>
              )}
            </p>
          ) : null}

          <button
            type="submit"
            className={
              primary
                ? "button-primary min-h-12 w-full text-lg"
                : "button-quiet min-h-12 w-full"
            }
            disabled={busy}
          >
            {busy
              ? "Issuing…"
              : weighBack !== null && weighBack > 0
                ? `Issue ${formatQuantity(weighBack, "kg", 3)} to ${order.reference}`
                : `Issue to ${order.reference}`}
          </button>
        </Form>
      )}
    </section>
  );
}

function IssueField(
  props: Omit<React.ComponentProps<typeof MeasureField>, "id">,
) {
  return (
    <MeasureField
      id={`issue-${props.name}`}
      inputMode="decimal"
      autoComplete="off"
      {...props}
    />
  );
}

function CompletePanel({
  order,
  primary,
  lastResult,
}: {
  order: Order;
  primary: boolean;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const [form] = useForm({
    id: "complete",
    lastResult: navigation.state === "idle" ? lastResult : null,
  });
  const stillHeld = order.lines.some((line) => line.reserved > 0);
  return (
    <section aria-labelledby="complete-heading" className="panel space-y-3">
      <h2 id="complete-heading" className="text-lg font-semibold">
        Finish the build
      </h2>
      <p className="text-sm text-graphite-700">
        Closes {order.reference} and records what was used against the plan.
        {stillHeld
          ? " What is still held for it goes back to the free stock."
          : null}
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-3">
        <input type="hidden" name="intent" value="complete" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <button
          type="submit"
          className={primary ? "button-primary w-full" : "button-quiet w-full"}
          disabled={navigation.state !== "idle"}
        >
          Complete build
        </button>
      </Form>
    </section>
  );
}

function ChangePanel({
  order,
  quantityResult,
  cancelResult,
}: {
  order: Order;
  quantityResult?: SubmissionResult<string[]>;
  cancelResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const [quantityForm, quantityFields] = useForm<
    { intent: string; quantity: string },
    z.output<typeof quantityFormSchema>
  >({
    id: "quantity",
    lastResult: navigation.state === "idle" ? quantityResult : null,
    defaultValue: { quantity: String(order.quantity) },
    shouldValidate: "onSubmit",
    onValidate({ formData }) {
      return parseWithZod(formData, {
        schema: quantityFormSchema,
        disableAutoCoercion: true,
      });
    },
  });
  const [cancelForm] = useForm({
    id: "cancel",
    lastResult: navigation.state === "idle" ? cancelResult : null,
  });
  const holds = order.lines.some((line) => line.reserved > 0);
  return (
    <section aria-labelledby="change-heading" className="panel space-y-4">
      <h2 id="change-heading" className="text-lg font-semibold">
        Change or cancel
      </h2>
      {canChangeQuantity(order.status) ? (
        <Form
          method="post"
          {...getFormProps(quantityForm)}
          className="space-y-3"
        >
          <input type="hidden" name="intent" value="quantity" />
          <FormMessages
            id={quantityForm.errorId}
            errors={quantityForm.errors}
          />
          <QuantityField
            field={quantityFields.quantity}
            label="Motors to build"
            unit="motors"
            hint={
              holds
                ? "Changing it releases what is held; reserve again afterwards."
                : undefined
            }
          />
          <button type="submit" className="button-quiet w-full" disabled={busy}>
            Change number of motors
          </button>
        </Form>
      ) : null}
      <Form method="post" {...getFormProps(cancelForm)} className="space-y-2">
        <input type="hidden" name="intent" value="cancel" />
        <FormMessages id={cancelForm.errorId} errors={cancelForm.errors} />
        <p className="text-sm text-graphite-700">
          {holds
            ? "Cancelling gives what is held back to the free stock."
            : "Nothing is held for this order."}
          {order.status === "in_progress"
            ? " Stock already issued stays issued: return what is unused."
            : null}
        </p>
        <button
          type="submit"
          className="button-quiet w-full border-danger/50 text-danger hover:border-danger"
          disabled={busy}
        >
          Cancel build order
        </button>
      </Form>
    </section>
  );
}

function History({ order }: { order: Order }) {
  return (
    <section aria-labelledby="history-heading" className="panel">
      <h2 id="history-heading" className="mb-3 text-lg font-semibold">
        History
      </h2>
      <ol className="space-y-3 border-l-2 border-rule pl-4">
        {order.events.map((event, index) => (
          <li key={index} className="text-sm">
            <p className="font-medium">
              {event.fromStatus === null
                ? `Made as ${buildOrderStatusLabels[event.toStatus].toLowerCase()}`
                : event.fromStatus === event.toStatus
                  ? "Changed"
                  : `${buildOrderStatusLabels[event.fromStatus]} → ${buildOrderStatusLabels[event.toStatus]}`}
            </p>
            <p className="text-graphite-500">
              {formatDateTime(event.at)} · {event.by}
            </p>
            {event.note ? (
              <p className="text-graphite-700">{event.note}</p>
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
