/** Cancel, or close short: either ends the order, and asks why (the reason is kept in its history). */
import {
  getFormProps,
  getTextareaProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { parseForm } from "~/lib/parse-form";
import { Form, useNavigation } from "react-router";
import {
  cancelFormSchema,
  closeFormSchema,
} from "~/purchase-orders/purchase-order-page-forms";
import { FormMessages } from "~/components/text-field";

const looks = {
  cancel: {
    schema: cancelFormSchema,
    label: "Why cancel it",
    button: "Cancel order",
    note: "Nothing has arrived against it; a sent order's quantities leave the stock on order.",
  },
  close: {
    schema: closeFormSchema,
    label: "Why close it short",
    button: "Close short",
    note: "Nothing more will come: what is still open leaves the stock on order, what arrived stays booked.",
  },
} as const;

export function EndOrderForm({
  step,
  lastResult,
}: {
  step: "cancel" | "close";
  lastResult?: SubmissionResult<string[]>;
}) {
  const look = looks[step];
  const navigation = useNavigation();
  const [form, fields] = useForm<{ intent: string; reason: string }>({
    id: `order-${step}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate({ formData }) {
      return parseForm(formData, {
        schema: look.schema,
        disableAutoCoercion: true,
      });
    },
  });
  const { key, ...reasonProps } = getTextareaProps(fields.reason);
  return (
    <Form
      method="post"
      {...getFormProps(form)}
      aria-label={look.button}
      className="space-y-2"
    >
      <input type="hidden" name="intent" value={step} />
      <FormMessages id={form.errorId} errors={form.errors} />
      <label htmlFor={fields.reason.id} className="field-label">
        {look.label}
      </label>
      <textarea
        key={key}
        {...reasonProps}
        rows={2}
        aria-invalid={fields.reason.errors ? true : undefined}
        className="field-input"
      />
      {fields.reason.errors ? (
        <p id={fields.reason.errorId} className="field-error">
          {fields.reason.errors.join(" ")}
        </p>
      ) : null}
      <p className="text-xs text-graphite-500">{look.note}</p>
      <button
        type="submit"
        className="button-quiet w-full border-danger/50 text-danger hover:border-danger"
        disabled={navigation.state !== "idle"}
      >
        {look.button}
      </button>
    </Form>
  );
}
