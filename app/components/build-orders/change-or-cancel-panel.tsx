/** "Change or cancel": the builder changes the number of motors (until the first issue) or cancels the order. */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { useBrowserValidation } from "~/components/forms/use-browser-validation";
import { Form, useNavigation } from "react-router";
import type { z } from "zod";
import type { BuildOrderDetails } from "~/build-orders/build-order-details.server";
import type { quantityFormSchema } from "~/build-orders/build-order-forms";
import { canChangeQuantity } from "~/build-orders/build-order-status";
import { ConfirmButton } from "~/components/confirm-button";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages } from "~/components/text-field";

export function ChangeOrCancelPanel({
  order,
  quantityResult,
  cancelResult,
}: {
  order: BuildOrderDetails;
  quantityResult?: SubmissionResult<string[]>;
  cancelResult?: SubmissionResult<string[]>;
}) {
  const navigation = useNavigation();
  const validate = useBrowserValidation(
    () =>
      import("~/build-orders/build-order-forms").then(
        (module) => module.quantityFormSchema,
      ),
    { disableAutoCoercion: true },
  );
  const busy = navigation.state !== "idle";
  const [quantityForm, quantityFields] = useForm<
    { intent: string; quantity: string },
    z.output<typeof quantityFormSchema>
  >({
    id: "quantity",
    lastResult: navigation.state === "idle" ? quantityResult : null,
    defaultValue: { quantity: String(order.quantity) },
    shouldValidate: "onSubmit",
    onValidate: validate,
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
        <ConfirmButton
          className="button-quiet w-full border-danger/50 text-danger hover:border-danger"
          disabled={busy}
          question={{
            title: `Cancel ${order.reference}?`,
            consequence: (
              <p>
                {holds
                  ? "Whatever it holds is released back to the free stock."
                  : "Nothing is held for it."}
                {order.status === "in_progress"
                  ? " Stock already issued stays issued."
                  : null}{" "}
                A cancelled order cannot be reopened.
              </p>
            ),
            confirmLabel: `Cancel ${order.reference}`,
            keepLabel: "Keep the order",
          }}
        >
          Cancel build order
        </ConfirmButton>
      </Form>
    </section>
  );
}
