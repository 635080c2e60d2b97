import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages, TextField } from "~/components/text-field";

/** Sets how much one unit of a currency is worth in the company currency (intent "currency-rate"). */
export function CurrencyRateForm({
  lastResult,
  companyCurrency,
  today,
  constraint,
}: {
  lastResult?: SubmissionResult<string[]>;
  companyCurrency: string;
  today: string;
  /** The fields' constraints (required, lengths), from the loader: getZodConstraint(schema). */
  constraint: FieldConstraints;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(() =>
    import("~/purchasing/supplier-schemas").then(
      (module) => module.currencyRateSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "currency-rate",
    lastResult,
    defaultValue: { validFrom: today },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section
      aria-labelledby="currency-rate-form-heading"
      className="panel h-fit"
    >
      <h3
        id="currency-rate-form-heading"
        className="mb-1 text-base font-semibold"
      >
        Set a rate
      </h3>
      <p className="mb-3 text-sm text-graphite-500">
        How many {companyCurrency} one unit of the currency is worth. Prices
        quoted in that currency are converted with the rate in force on their
        date.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <input type="hidden" name="intent" value="currency-rate" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <TextField
          field={fields.currency}
          label="Currency"
          autoComplete="off"
          hint={`3-letter ISO 4217 code, not ${companyCurrency}.`}
        />
        <QuantityField
          field={fields.rate}
          label="Rate"
          unit={`${companyCurrency} per unit, up to 6 decimals`}
        />
        <TextField
          field={fields.validFrom}
          label="Valid from (YYYY-MM-DD)"
          autoComplete="off"
        />
        <button
          type="submit"
          className="button-primary w-full"
          disabled={navigation.state !== "idle"}
        >
          Save rate
        </button>
      </Form>
    </section>
  );
}
