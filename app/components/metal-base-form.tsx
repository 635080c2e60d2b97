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
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";

/** Sets the copper or aluminium base per kg from a day (intent "metal-base"). */
export function MetalBaseForm({
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
      (module) => module.metalBaseSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "metal-base",
    lastResult,
    defaultValue: {
      conductor: "copper",
      currency: companyCurrency,
      validFrom: today,
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="metal-base-form-heading" className="panel h-fit">
      <h3 id="metal-base-form-heading" className="mb-1 text-base font-semibold">
        Set a new base
      </h3>
      <p className="mb-3 text-sm text-graphite-500">
        Every wire price quoted as an adder per kg moves with this base: the
        price is base + adder, converted to the company currency.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <input type="hidden" name="intent" value="metal-base" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <SelectField field={fields.conductor} label="Conductor">
          <option value="copper">Copper</option>
          <option value="aluminium">Aluminium</option>
        </SelectField>
        <TextField
          field={fields.currency}
          label="Currency"
          autoComplete="off"
          hint="3-letter ISO 4217 code."
        />
        <QuantityField
          field={fields.pricePerKg}
          label="Base price"
          unit="per kg, up to 4 decimals"
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
          Save metal base
        </button>
      </Form>
    </section>
  );
}
