/**
 * The what-if form of the design insight: a GET form (the what-if lives in the address,
 * the loader works the figures out again, nothing is saved) with the motors to cost, the
 * copper and aluminium bases beside the stored ones, and the price basis. The end-turn
 * factors are inputs in the designs table that belong to this form by its id.
 */
import { Form, Link, useNavigation } from "react-router";
import { costingMoneyText } from "~/insight/design-insight";
import { costBasisLabels } from "~/designs/design-page";
import { formatDay } from "~/lib/format";
import { type InsightDesignsData, whatIfFormId } from "./design-insight-text";
import { FieldError } from "./field-error";

function StoredBase({
  base,
  currency,
  metal,
}: {
  base: { pricePerKg: number; validFrom: string } | null;
  currency: string;
  metal: string;
}) {
  return (
    <p className="mt-1 text-xs text-graphite-500">
      {base
        ? `Stored: ${costingMoneyText(base.pricePerKg, currency, "kg")} from ${formatDay(base.validFrom)}`
        : `No ${metal} base stored in ${currency} for this day.`}
    </p>
  );
}

function QuantityField({ data }: { data: InsightDesignsData }) {
  return (
    <div className="w-36">
      <label htmlFor="insight-quantity" className="field-label">
        Motors to cost
      </label>
      <input
        id="insight-quantity"
        name="quantity"
        type="number"
        min={1}
        max={1_000_000}
        step={1}
        inputMode="numeric"
        defaultValue={data.fields.quantity}
        placeholder="1"
        aria-invalid={data.errors.quantity ? true : undefined}
        aria-describedby={data.errors.quantity ? "quantity-error" : undefined}
        className="field-input"
      />
      <FieldError id="quantity-error" messages={data.errors.quantity} />
    </div>
  );
}

/** A metal base typed in place of the stored one, with the stored one under it. */
function MetalBaseField({
  data,
  metal,
  title,
}: {
  data: InsightDesignsData;
  metal: "copper" | "aluminium";
  title: string;
}) {
  const currency = data.bases.currency;
  const name = metal === "copper" ? "copperBase" : "aluminiumBase";
  const stored = data.bases[metal];
  const errors = data.errors[name];
  return (
    <div className="w-56">
      <label htmlFor={`insight-${metal}`} className="field-label">
        {title} base ({currency}/kg)
      </label>
      <input
        id={`insight-${metal}`}
        name={name}
        type="number"
        min={0}
        step={0.0001}
        inputMode="decimal"
        defaultValue={data.fields[name]}
        placeholder={stored ? String(stored.pricePerKg) : ""}
        aria-invalid={errors ? true : undefined}
        aria-describedby={
          errors ? `${metal}-stored ${name}-error` : `${metal}-stored`
        }
        className="field-input"
      />
      <div id={`${metal}-stored`}>
        <StoredBase base={stored} currency={currency} metal={metal} />
      </div>
      <FieldError id={`${name}-error`} messages={errors} />
    </div>
  );
}

function BasisField({ data }: { data: InsightDesignsData }) {
  return (
    <div className="w-64">
      <label htmlFor="insight-basis" className="field-label">
        Price basis
      </label>
      <select
        id="insight-basis"
        name="basis"
        defaultValue={data.basis}
        aria-invalid={data.errors.basis ? true : undefined}
        aria-describedby={data.errors.basis ? "basis-error" : undefined}
        className="field-input"
      >
        {Object.entries(costBasisLabels).map(([basis, label]) => (
          <option key={basis} value={basis}>
            {label}
          </option>
        ))}
      </select>
      <FieldError id="basis-error" messages={data.errors.basis} />
    </div>
  );
}

export function DesignWhatIfForm({
  data,
  action,
  whatIfShown,
}: {
  data: InsightDesignsData;
  /** Where the form goes: the page it is on. */
  action: string;
  /** Whether the figures are a what-if (then a way back to the stored ones). */
  whatIfShown: boolean;
}) {
  const navigation = useNavigation();
  const working =
    navigation.state === "loading" && navigation.location.pathname === action;
  return (
    <Form
      key={JSON.stringify(data.fields)}
      id={whatIfFormId}
      method="get"
      action={action}
      preventScrollReset
      aria-label="What-if"
      className="panel flex flex-wrap items-start gap-4 py-4 print:hidden"
    >
      <QuantityField data={data} />
      <MetalBaseField data={data} metal="copper" title="Copper" />
      <MetalBaseField data={data} metal="aluminium" title="Aluminium" />
      <BasisField data={data} />
      {data.fields.date ? (
        <input type="hidden" name="date" value={data.fields.date} />
      ) : null}
      {data.designs.page > 1 ? (
        <input type="hidden" name="page" value={data.designs.page} />
      ) : null}
      <div className="flex flex-col gap-2 pt-6">
        <div className="flex gap-2">
          <button type="submit" className="button-primary" disabled={working}>
            {working ? "Working it out…" : "Work out the what-if"}
          </button>
          {whatIfShown ? (
            <Link to={action} preventScrollReset className="button-quiet">
              Back to stored figures
            </Link>
          ) : null}
        </div>
        <p className="max-w-md text-xs text-graphite-500">
          Nothing is saved. A metal base stands in for the stored one in{" "}
          {data.bases.currency}; supplier lines quoted in another currency keep
          their own base. The end-turn factor of each design is in its row below
          (1 = as designed).
        </p>
      </div>
    </Form>
  );
}
