/** "New build order": the builder chooses a released design revision and the number of motors. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { Form, Link, useNavigation } from "react-router";
import type { z } from "zod";
import type { createFormSchema } from "~/build-orders/build-order-forms";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";

export function NewBuildOrderForm({
  revisions,
  lastResult,
}: {
  revisions: { value: string; label: string }[];
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(
    () =>
      import("~/build-orders/build-order-forms").then(
        (module) => module.createFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const [form, fields] = useForm<
    {
      designRevision: string;
      quantity: string;
      note: string;
      plannedStart: string;
    },
    z.output<typeof createFormSchema>
  >({
    id: "new-build-order",
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="new-build-order-heading" className="panel h-fit">
      <h2 id="new-build-order-heading" className="mb-1 text-lg font-semibold">
        New build order
      </h2>
      <p className="mb-3 text-sm text-graphite-500">
        Only a released revision can be built. Wire is worked out in kg drawn
        from stock, scrap included.
      </p>
      {revisions.length === 0 ? (
        <p className="text-sm text-graphite-700">
          No design revision is released yet.{" "}
          <Link
            to="/designs"
            className="text-copper-700 underline underline-offset-2"
          >
            Designs
          </Link>
        </p>
      ) : (
        <Form method="post" {...getFormProps(form)} className="space-y-4">
          <FormMessages id={form.errorId} errors={form.errors} />
          <SelectField
            field={fields.designRevision}
            label="Design revision"
            placeholder="Choose…"
          >
            {revisions.map((revision) => (
              <option key={revision.value} value={revision.value}>
                {revision.label}
              </option>
            ))}
          </SelectField>
          <QuantityField
            field={fields.quantity}
            label="Motors to build"
            unit="motors"
          />
          <TextField
            field={fields.plannedStart}
            label="Planned start (optional)"
            type="date"
            hint="The buying plan needs this order's stock by this day; without one, this week."
          />
          <TextField
            field={fields.note}
            label="Note (optional)"
            autoComplete="off"
          />
          <button
            type="submit"
            className="button-primary w-full"
            disabled={navigation.state !== "idle"}
          >
            Create build order
          </button>
        </Form>
      )}
    </section>
  );
}
