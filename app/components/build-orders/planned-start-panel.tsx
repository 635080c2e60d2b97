/** "Planned start": the day building starts (the buying plan needs the order's stock by then); changeable while the order is open. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import type { z } from "zod";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import type { plannedStartFormSchema } from "~/build-orders/build-order-forms";
import { FormMessages, TextField } from "~/components/text-field";
import { formatDay } from "~/lib/format";

export function PlannedStartPanel({
  order,
  canChange,
  lastResult,
}: {
  order: Pick<BuildOrderDetails, "plannedStart">;
  canChange: boolean;
  lastResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(
    () =>
      import("~/build-orders/build-order-forms").then(
        (module) => module.plannedStartFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const [form, fields] = useForm<
    { intent: string; plannedStart: string },
    z.output<typeof plannedStartFormSchema>
  >({
    id: "planned-start",
    lastResult: navigation.state === "idle" ? lastResult : null,
    defaultValue: { plannedStart: order.plannedStart ?? "" },
    shouldValidate: "onSubmit",
    onValidate: validate,
  });
  const shown = order.plannedStart
    ? formatDay(order.plannedStart)
    : "Not planned: the buying plan counts it as needed this week.";
  return (
    <section
      aria-labelledby="planned-start-heading"
      className="panel space-y-3"
    >
      <h2 id="planned-start-heading" className="text-lg font-semibold">
        Planned start
      </h2>
      {canChange ? (
        <Form method="post" {...getFormProps(form)} className="space-y-3">
          <input type="hidden" name="intent" value="plannedStart" />
          <FormMessages id={form.errorId} errors={form.errors} />
          <TextField
            field={fields.plannedStart}
            label="Building starts on"
            type="date"
            hint="The buying plan needs this order's stock by this day. Leave it empty when not planned."
          />
          <button
            type="submit"
            className="button-quiet w-full"
            disabled={navigation.state !== "idle"}
          >
            Save planned start
          </button>
        </Form>
      ) : (
        <p className="text-sm text-graphite-700">{shown}</p>
      )}
    </section>
  );
}
