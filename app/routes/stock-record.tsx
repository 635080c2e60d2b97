import { getFormProps, useForm } from "@conform-to/react";
import { parseWithZod } from "@conform-to/zod/v4";
import { useState } from "react";
import { data, Form, Link, useNavigation } from "react-router";
import type { Route } from "./+types/stock-record";
import { requireRole } from "~/auth/guard.server";
import { useFlash } from "~/components/flash-message";
import { MeasureField } from "~/components/measure-field";
import { FormMessages } from "~/components/text-field";
import { movementTypes, type MovementType } from "~/db/tables/stock-enums";
import { redirectWithFlash } from "~/lib/flash.server";
import { formatQuantity } from "~/lib/format";
import {
  formatSignedStockQuantity,
  formatStockQuantity,
} from "~/stock/stock-quantity-text";
import { findItemBySku, listLocations } from "~/stock/items.server";
import { formFieldOf, movementFormSchema } from "~/stock/movement-form";
import { isStockError } from "~/stock/stock-errors";
import { recordMovement } from "~/stock/stock-movements.server";
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
  const metresPerKg =
    item?.kind === "wire" ? await wireMetresPerKg(item.id) : null;
  return {
    type,
    sku,
    item: item ? { ...item, id: undefined } : null,
    metresPerKg,
    notFound: Boolean(sku) && !item,
    locations: await listLocations(),
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
  try {
    const { movement } = await recordMovement(submission.value, user.id);
    const params = new URLSearchParams({
      type: movement.type,
      sku: movement.sku,
    });
    throw await redirectWithFlash(`/stock/record?${params}`, {
      code: "movement-recorded",
      id: movement.id,
    });
  } catch (error) {
    if (!isStockError(error)) throw error;
    const field = formFieldOf(error.field, submission.value.type);
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
  const { type, item, sku, locations, metresPerKg } = loaderData;
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
  const [balanceKey, setBalanceKey] = useState(() =>
    item?.balances[0]
      ? `${item.balances[0].lot ?? ""}|${item.balances[0].location}`
      : "",
  );
  const [gross, setGross] = useState("");
  const [counted, setCounted] = useState("");
  const unit = item?.unit ?? "";
  const step = unit === "pcs" ? "1" : "0.001";
  const chosen = item?.balances.find(
    (balance) => `${balance.lot ?? ""}|${balance.location}` === balanceKey,
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
            <div className="grid gap-4 sm:grid-cols-2">
              <div>
                <label htmlFor="movement-location" className="field-label">
                  Into location
                </label>
                <select
                  id="movement-location"
                  name="location"
                  className={bigInput}
                  defaultValue={locations[0]?.code}
                >
                  {locations.map((location) => (
                    <option key={location.code} value={location.code}>
                      {location.code} · {location.name}
                    </option>
                  ))}
                </select>
                {errors.location ? (
                  <p className="field-error">{errors.location.join(" ")}</p>
                ) : null}
              </div>
              <Field
                name="lot"
                label={isWire ? "Spool lot number" : "Lot (optional)"}
                errors={errors.lot}
                autoComplete="off"
                required={isWire}
              />
              {isWire ? (
                <>
                  <Field
                    name="grossKg"
                    label="Gross weight"
                    unit="kg"
                    type="number"
                    step="0.001"
                    inputMode="decimal"
                    // A spool's quantity is its weight: the form has no quantity field, so a missing one is asked for here.
                    errors={
                      errors.grossKg ??
                      (errors.quantity
                        ? ["Give the spool's gross weight."]
                        : undefined)
                    }
                    hint="Spool with wire, on the scale"
                  />
                  <Field
                    name="tareKg"
                    label="Tare weight"
                    unit="kg"
                    type="number"
                    step="0.001"
                    inputMode="decimal"
                    errors={errors.tareKg}
                    hint="The empty spool"
                  />
                  <Field
                    name="spoolType"
                    label="Spool type"
                    errors={errors.spoolType}
                    placeholder="e.g. DIN 250"
                  />
                </>
              ) : (
                <Field
                  name="quantity"
                  label="Quantity"
                  unit={unit}
                  type="number"
                  step={step}
                  inputMode="decimal"
                  errors={errors.quantity}
                />
              )}
              <Field
                name="unitCost"
                label={`Unit cost per ${unit}`}
                type="number"
                step="0.0001"
                inputMode="decimal"
                errors={errors.unitCost}
              />
              <Field
                name="supplierBatch"
                label="Supplier batch"
                errors={errors.supplierBatch}
                autoComplete="off"
              />
              <Field
                name="reference"
                label="Delivery note"
                errors={errors.reference}
                autoComplete="off"
              />
            </div>
          ) : (
            <div className="space-y-4">
              <fieldset>
                <legend className="field-label">
                  {type === "transfer" ? "From" : "Lot and location"}
                </legend>
                {item.balances.length === 0 ? (
                  <p className="mt-2 text-sm text-graphite-500">
                    Nothing of this item is in stock.
                  </p>
                ) : (
                  <div className="mt-2 grid gap-2">
                    {item.balances.map((balance) => {
                      const key = `${balance.lot ?? ""}|${balance.location}`;
                      return (
                        <label
                          key={key}
                          className="flex min-h-12 cursor-pointer items-center gap-3 rounded-md border border-graphite-300 bg-white px-3 has-checked:border-copper-500 has-checked:bg-copper-50"
                        >
                          <input
                            type="radio"
                            name="balance"
                            value={key}
                            checked={balanceKey === key}
                            onChange={() => setBalanceKey(key)}
                            className="h-5 w-5 accent-copper-600"
                          />
                          <span className="flex-1">
                            {balance.lot ? (
                              <strong>lot {balance.lot}</strong>
                            ) : (
                              <strong>no lot</strong>
                            )}{" "}
                            at {balance.location}
                            {balance.tareKg !== null ? (
                              <span className="text-sm text-graphite-500">
                                {" "}
                                · tare {formatQuantity(balance.tareKg, "kg", 3)}
                              </span>
                            ) : null}
                          </span>
                          <span className="font-medium">
                            {formatStockQuantity(balance.onHand, unit)}
                          </span>
                        </label>
                      );
                    })}
                  </div>
                )}
                {errors.balance ? (
                  <p className="field-error">{errors.balance.join(" ")}</p>
                ) : null}
              </fieldset>

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
                {type === "issue" || type === "return" || type === "scrap" ? (
                  <Field
                    name="reference"
                    label={
                      type === "scrap" ? "Reason or reference" : "Build order"
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
                ? `Issue ${formatQuantity(weighBack, "kg", 3)}`
                : typeLabels[type].verb}
          </button>
        </Form>
      ) : null}
    </div>
  );
}
