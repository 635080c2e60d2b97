import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useState } from "react";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stock-record";
import { requireRole } from "~/auth/guard.server";
import { listOrdersToIssueItem } from "~/build-orders/build-order-issue-choices.server";
import { isBuildOrderError } from "~/build-orders/build-order-errors";
import { issueMovementToBuildOrder } from "~/build-orders/build-order-issues.server";
import { useFlash } from "~/components/flash-message";
import { MeasureField } from "~/components/measure-field";
import { BalanceChoice, balanceKeyOf } from "~/components/stock/balance-choice";
import {
  BuildOrderPicker,
  heldOnBalance,
} from "~/components/stock/build-order-picker";
import { ReceiptFields } from "~/components/stock/receipt-fields";
import { FormMessages } from "~/components/text-field";
import { movementTypes, type MovementType } from "~/db/tables/stock-enums";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatQuantity } from "~/lib/format";
import { companyCurrency } from "~/purchasing/suppliers.server";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
} from "~/stock/stock-quantity-text";
import { findItemBySku, listLocations } from "~/stock/items.server";
import { formFieldOf, movementFormSchema } from "~/stock/movement-form";
import { isDomainError } from "~/lib/domain-error";
import { recordMovement } from "~/stock/stock-movements.server";
import { usualLocationOf } from "~/stock/usual-location.server";
import { wireMetresPerKg } from "~/stock/wire-length.server";

const typeLabels: Record<
  MovementType,
  { label: string; verb: string; help: string }
> = {
  receipt: {
    label: "Receipt",
    verb: "Receive",
    help: "Stock arriving from a supplier. A wire spool: its lot number, gross and tare weight.",
  },
  issue: {
    label: "Issue",
    verb: "Issue",
    help: "Stock going to a build. Weigh a spool back: type its gross weight now.",
  },
  return: {
    label: "Return",
    verb: "Return",
    help: "Unused stock coming back from a build.",
  },
  transfer: {
    label: "Transfer",
    verb: "Transfer",
    help: "Stock moving between locations.",
  },
  count: {
    label: "Count",
    verb: "Record count",
    help: "What you found in a bin; the difference is recorded.",
  },
  scrap: {
    label: "Scrap",
    verb: "Scrap",
    help: "Stock that is damaged or used up.",
  },
  adjustment: {
    label: "Adjustment",
    verb: "Adjust",
    help: "A correction with a reason; + adds, − takes away.",
  },
};

const referenceLabels: Partial<Record<MovementType, string>> = {
  issue: "Reference",
  return: "Build order",
  scrap: "Reason or reference",
};

function chosenType(value: string | null): MovementType {
  return (movementTypes as readonly string[]).includes(value ?? "")
    ? (value as MovementType)
    : "receipt";
}

export async function loader({ request }: Route.LoaderArgs) {
  await requireRole(request, ["storekeeper"]);
  const url = new URL(request.url);
  const type = chosenType(url.searchParams.get("type"));
  const sku = url.searchParams.get("sku")?.trim() ?? "";
  const item = sku ? await findItemBySku(sku) : null;
  const [metresPerKg, locations, usualLocation, currency, orders] =
    await Promise.all([
      item?.kind === "wire" ? wireMetresPerKg(item.id) : null,
      listLocations(),
      item && type === "receipt" ? usualLocationOf(item.id) : null,
      companyCurrency(),
      item && type === "issue" ? listOrdersToIssueItem(item.id) : [],
    ]);
  return {
    type,
    sku,
    item: item ? { ...item, id: undefined } : null,
    metresPerKg,
    notFound: Boolean(sku) && !item,
    locations,
    usualLocation,
    currency,
    orders,
  };
}

export async function action({ request }: Route.ActionArgs) {
  const user = await requireRole(request, ["storekeeper"]);
  const formData = await request.formData();
  const submission = parseWithZod(formData, {
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
    return data(
      submission.reply(
        field
          ? { fieldErrors: { [field]: [error.message] } }
          : { formErrors: [error.message] },
      ),
      { status: error.status === 404 ? 400 : error.status },
    );
  }
}

export const meta: Route.MetaFunction = () => [
  { title: "Record movement · Turnledger" },
];

const bigInput = "field-input text-lg min-h-12";

function Field(props: Omit<React.ComponentProps<typeof MeasureField>, "id">) {
  return <MeasureField id={`movement-${props.name}`} {...props} />;
}

export default function StockRecord(props: Route.ComponentProps) {
  const { type, sku } = props.loaderData;
  // Another type, item or a movement just recorded (its message) starts the form
  // afresh: the first balance chosen again, no weight or count left from before.
  const recorded = useFlash()?.key ?? "";
  return <MovementForm key={`${type}|${sku}|${recorded}`} {...props} />;
}

function MovementForm({ loaderData, actionData }: Route.ComponentProps) {
  const { type, item, sku, locations, metresPerKg, orders } = loaderData;
  const navigation = useNavigation();
  const busy = navigation.state !== "idle";
  const [form] = useForm({
    id: `movement-${type}-${sku}`,
    lastResult: navigation.state === "idle" ? actionData : null,
    shouldValidate: "onSubmit",
    onValidate({ formData }) {
      return parseWithZod(formData, {
        schema: movementFormSchema,
        disableAutoCoercion: true,
      });
    },
  });
  const errors = (form.allErrors ?? {}) as Record<string, string[] | undefined>;
  // The oldest lot first (the server lists them so): where a reservation sits.
  const [balanceKey, setBalanceKey] = useState(() =>
    item?.balances[0] ? balanceKeyOf(item.balances[0]) : "",
  );
  const [orderId, setOrderId] = useState("");
  const order = orders.find((candidate) => String(candidate.id) === orderId);
  const chooseOrder = (value: string) => {
    setOrderId(value);
    // The chosen order's oldest held lot, if this item holds stock there.
    const first = orders
      .find((candidate) => String(candidate.id) === value)
      ?.held.map(balanceKeyOf)
      .find((key) => item?.balances.some((b) => balanceKeyOf(b) === key));
    if (first) setBalanceKey(first);
  };
  const [gross, setGross] = useState("");
  const [counted, setCounted] = useState("");
  const unit = item?.unit ?? "";
  const step = unit === "pcs" ? "1" : "0.001";
  const chosen = item?.balances.find(
    (balance) => balanceKeyOf(balance) === balanceKey,
  );
  const isWire = item?.kind === "wire";

  // Weigh-back preview: previous net − (gross now − tare); the server computes the same again.
  const grossKg = Number(gross.replace(",", "."));
  const weighBack =
    type === "issue" &&
    isWire &&
    chosen &&
    chosen.tareKg !== null &&
    gross.trim() !== "" &&
    Number.isFinite(grossKg)
      ? Math.round((chosen.onHand - (grossKg - chosen.tareKg)) * 1000) / 1000
      : null;
  const countedNumber = Number(counted.replace(",", "."));
  const countDifference =
    type === "count" &&
    chosen &&
    counted.trim() !== "" &&
    Number.isFinite(countedNumber)
      ? countedNumber - chosen.onHand
      : null;

  return (
    <div className="mx-auto max-w-3xl space-y-6">
      <h1 className="text-2xl font-semibold">Record movement</h1>
      <nav aria-label="Movement type">
        <ul className="flex flex-wrap gap-2">
          {movementTypes.map((candidate) => (
            <li key={candidate}>
              <Link
                to={`?type=${candidate}${sku ? `&sku=${encodeURIComponent(sku)}` : ""}`}
                aria-current={candidate === type ? "page" : undefined}
                className={`inline-flex min-h-11 items-center rounded-md border px-4 text-sm font-medium ${
                  candidate === type
                    ? "border-copper-600 bg-copper-600 text-white"
                    : "border-graphite-300 bg-sheet text-graphite-800 hover:border-graphite-500"
                }`}
              >
                {typeLabels[candidate].label}
              </Link>
            </li>
          ))}
        </ul>
      </nav>
      <p className="text-graphite-700">{typeLabels[type].help}</p>

      <Form method="get" className="panel flex flex-wrap items-end gap-3">
        <input type="hidden" name="type" value={type} />
        <div className="min-w-60 flex-1">
          <label htmlFor="find-sku" className="field-label">
            Item SKU
          </label>
          <input
            id="find-sku"
            name="sku"
            defaultValue={sku}
            className={bigInput}
            autoComplete="off"
            autoFocus={!item}
            placeholder="scan or type the SKU"
          />
        </div>
        <button type="submit" className="button-quiet min-h-12 px-5">
          Find item
        </button>
        {loaderData.notFound ? (
          <p className="field-error w-full">
            No item with SKU &quot;{sku}&quot;.
          </p>
        ) : null}
      </Form>

      {item ? (
        <Form method="post" {...getFormProps(form)} className="panel space-y-5">
          <FormMessages id={form.errorId} errors={form.errors} />
          <input type="hidden" name="type" value={type} />
          <input type="hidden" name="sku" value={item.sku} />
          <div>
            <p className="text-lg font-semibold">
              <Link
                to={`/stock/items/${encodeURIComponent(item.sku)}`}
                className="text-copper-700 underline underline-offset-2"
              >
                {item.sku}
              </Link>{" "}
              · {item.name}
            </p>
            <p className="text-sm text-graphite-500">
              {item.sizeOrGrade ? `${item.sizeOrGrade} · ` : ""}on hand{" "}
              {formatStockQuantity(item.onHand, unit)}, available{" "}
              {formatStockQuantity(item.available, unit)}
            </p>
          </div>

          {type === "receipt" ? (
            <ReceiptFields
              unit={unit}
              isWire={isWire}
              locations={locations}
              usualLocation={loaderData.usualLocation}
              currency={loaderData.currency}
              errors={errors}
              inputClassName={bigInput}
            />
          ) : (
            <div className="space-y-4">
              {type === "issue" ? (
                <BuildOrderPicker
                  orders={orders}
                  unit={unit}
                  value={orderId}
                  onChange={chooseOrder}
                  errors={errors.buildOrderId}
                />
              ) : null}
              <BalanceChoice
                legend={type === "transfer" ? "From" : "Lot and location"}
                balances={item.balances}
                unit={unit}
                value={balanceKey}
                onChange={setBalanceKey}
                heldFor={
                  order
                    ? {
                        reference: order.reference,
                        heldOn: (key) => heldOnBalance(order, key),
                      }
                    : undefined
                }
                errors={errors.balance}
              />

              <div className="grid gap-4 sm:grid-cols-2">
                {type === "issue" && isWire ? (
                  <Field
                    name="grossKg"
                    label="Spool gross weight now"
                    unit="kg"
                    type="number"
                    step="0.001"
                    inputMode="decimal"
                    value={gross}
                    onChange={(event) => setGross(event.target.value)}
                    errors={errors.grossKg}
                    hint="Or leave empty and type the quantity"
                  />
                ) : null}
                {type === "count" ? (
                  <Field
                    name="quantity"
                    label="Counted"
                    unit={unit}
                    type="number"
                    step={step}
                    inputMode="decimal"
                    value={counted}
                    onChange={(event) => setCounted(event.target.value)}
                    errors={errors.quantity}
                  />
                ) : weighBack === null || !gross ? (
                  <Field
                    name="quantity"
                    label={
                      type === "adjustment" ? "Change (+ or −)" : "Quantity"
                    }
                    unit={unit}
                    type="number"
                    step={step}
                    inputMode="decimal"
                    errors={errors.quantity}
                  />
                ) : null}
                {type === "transfer" ? (
                  <div>
                    <label
                      htmlFor="movement-toLocation"
                      className="field-label"
                    >
                      To location
                    </label>
                    <select
                      id="movement-toLocation"
                      name="toLocation"
                      className={bigInput}
                      defaultValue=""
                    >
                      <option value="" disabled>
                        choose…
                      </option>
                      {locations
                        .filter(
                          (location) => location.code !== chosen?.location,
                        )
                        .map((location) => (
                          <option key={location.code} value={location.code}>
                            {location.code} · {location.name}
                          </option>
                        ))}
                    </select>
                    {errors.toLocation ? (
                      <p className="field-error">
                        {errors.toLocation.join(" ")}
                      </p>
                    ) : null}
                  </div>
                ) : null}
                {(type === "issue" && !order) ||
                type === "return" ||
                type === "scrap" ? (
                  <Field
                    name="reference"
                    label={referenceLabels[type] ?? "Reference"}
                    hint={
                      type === "issue"
                        ? "A job or note. For a build order, choose it under “Build order”."
                        : undefined
                    }
                    errors={errors.reference}
                    autoComplete="off"
                  />
                ) : null}
              </div>

              {weighBack !== null ? (
                <p
                  role="status"
                  className="rounded-md bg-graphite-50 px-4 py-3"
                >
                  {weighBack > 0 ? (
                    <>
                      Issue{" "}
                      <strong>{formatQuantity(weighBack, "kg", 3)}</strong>
                      {metresPerKg ? (
                        <>
                          {" "}
                          ≈ up to{" "}
                          {formatQuantity(weighBack * metresPerKg, "m", 0)} of
                          wire
                        </>
                      ) : null}
                      : the spool held {formatQuantity(chosen!.onHand, "kg", 3)}{" "}
                      net and now holds{" "}
                      {formatQuantity(grossKg - chosen!.tareKg!, "kg", 3)}.
                    </>
                  ) : (
                    <span className="text-danger">
                      The spool weighs as much as or more than its recorded net:
                      nothing to issue.
                    </span>
                  )}
                </p>
              ) : null}
              {countDifference !== null ? (
                <p
                  role="status"
                  className="rounded-md bg-graphite-50 px-4 py-3"
                >
                  Difference to the books:{" "}
                  <strong>
                    {formatSignedStockQuantity(countDifference, unit)}
                  </strong>
                </p>
              ) : null}
            </div>
          )}

          <Field
            name="note"
            label={type === "adjustment" ? "Reason" : "Note (optional)"}
            errors={errors.note}
            autoComplete="off"
            required={type === "adjustment"}
          />
          <button
            type="submit"
            className="button-primary min-h-12 w-full text-lg"
            disabled={busy}
          >
            {busy
              ? "Recording…"
              : weighBack !== null && weighBack > 0
                ? `Issue ${formatQuantity(weighBack, "kg", 3)}${order ? ` to ${order.reference}` : ""}`
                : order
                  ? `Issue to ${order.reference}`
                  : typeLabels[type].verb}
          </button>
        </Form>
      ) : null}
    </div>
  );
}
