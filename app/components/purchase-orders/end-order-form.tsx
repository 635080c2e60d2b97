/** Cancel, or close short: either ends the order, and asks why (the reason is kept in its history). */
import {
  getFormProps,
  getTextareaProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { ConfirmButton } from "~/components/confirm-button";
import { FormMessages } from "~/components/text-field";

const looks = {
  cancel: {
    label: "Why cancel it",
    button: "Cancel order",
    note: "Nothing has arrived against it; a sent order's quantities leave the stock on order.",
    title: (number: string) => `Cancel ${number}?`,
    consequence:
      "Its quantities leave the stock on order and it can no longer be sent, changed or received against. If it was sent, tell the supplier: Turnledger sends them nothing.",
    confirm: (number: string) => `Cancel ${number}`,
    keep: "Keep the order",
  },
  close: {
    label: "Why close it short",
    button: "Close short",
    note: "Nothing more will come: what is still open leaves the stock on order, what arrived stays booked.",
    title: (number: string) => `Close ${number} short?`,
    consequence:
      "What is still open leaves the stock on order and nothing more can be received against it; what arrived stays booked. It cannot be reopened.",
    confirm: (number: string) => `Close ${number} short`,
    keep: "Keep it open",
  },
} as const;

export function EndOrderForm({
  step,
  orderNumber,
  lastResult,
}: {
  step: "cancel" | "close";
  /** The order's number, as the question names it ("PO-00012"). */
  orderNumber: string;
  lastResult?: SubmissionResult<string[]>;
}) {
  const look = looks[step];
  const navigation = useNavigation();
  const validate = useBrowserValidation(
    () =>
      import("~/purchase-orders/purchase-order-page-forms").then((module) =>
        step === "cancel" ? module.cancelFormSchema : module.closeFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const [form, fields] = useForm<{ intent: string; reason: string }>({
    id: `order-${step}`,
    lastResult: navigation.state === "idle" ? lastResult : null,
    shouldValidate: "onSubmit",
    onValidate: validate,
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
      <ConfirmButton
        className="button-quiet w-full border-danger/50 text-danger hover:border-danger"
        disabled={navigation.state !== "idle"}
        question={{
          title: look.title(orderNumber),
          consequence: <p>{look.consequence}</p>,
          confirmLabel: look.confirm(orderNumber),
          keepLabel: look.keep,
        }}
      >
        {look.button}
      </ConfirmButton>
    </Form>
  );
}
