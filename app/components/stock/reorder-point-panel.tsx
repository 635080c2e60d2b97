import { formatNumberForField } from "~/lib/format";
/**
 * The item's reorder point and quantity: a form for those who may set them, else the
 * figures in a sentence.
 */
import {
  getFormProps,
  useForm,
  type SubmissionResult,
} from "@conform-to/react";
import { Form, useNavigation } from "react-router";
import {
  useBrowserValidation,
  type FieldConstraints,
} from "~/components/forms/use-browser-validation";
import { QuantityField } from "~/components/quantity-field";
import { FormMessages } from "~/components/text-field";
import { formatStockQuantity } from "~/stock/stock-quantity-text";

export function ReorderPointPanel({
  item,
  canSet,
  constraint,
  lastResult,
}: {
  item: { unit: string; reorderPoint: number; reorderQuantity: number };
  canSet: boolean;
  /** The reorder form's constraints, from the loader (getZodConstraint). */
  constraint: FieldConstraints;
  /** The answer to the last reorder form sent, if that was the form sent. */
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const unit = item.unit;
  if (!canSet) {
    return (
      <section aria-labelledby="reorder-heading" className="panel text-sm">
        <h2 id="reorder-heading" className="mb-2 text-lg font-semibold">
          Reorder point
        </h2>
        <p>
          {item.reorderPoint > 0
            ? `${formatStockQuantity(item.reorderPoint, unit)}; order ${formatStockQuantity(item.reorderQuantity, unit)} at a time.`
            : "Not set."}
        </p>
      </section>
    );
  }
  return (
    <ReorderPointForm
      item={item}
      constraint={constraint}
      lastResult={lastResult}
    />
  );
}

function ReorderPointForm({
  item,
  constraint,
  lastResult,
}: {
  item: { unit: string; reorderPoint: number; reorderQuantity: number };
  constraint: FieldConstraints;
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const busy = useNavigation().state !== "idle";
  const validate = useBrowserValidation(() =>
    import("~/stock/item-change-form").then(
      (module) => module.reorderFormSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "reorder",
    lastResult,
    defaultValue: {
      reorderPoint: formatNumberForField(item.reorderPoint),
      reorderQuantity: formatNumberForField(item.reorderQuantity),
    },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <section aria-labelledby="reorder-heading" className="panel">
      <h2 id="reorder-heading" className="mb-1 text-lg font-semibold">
        Reorder point
      </h2>
      <p className="mb-3 text-sm text-graphite-500">
        When the available stock falls below the reorder point, buyers hear of
        it. 0 turns the alert off.
      </p>
      <Form method="post" {...getFormProps(form)} className="space-y-4">
        <input type="hidden" name="intent" value="reorder" />
        <FormMessages id={form.errorId} errors={form.errors} />
        <QuantityField
          field={fields.reorderPoint}
          label="Reorder point"
          unit={item.unit}
        />
        <QuantityField
          field={fields.reorderQuantity}
          label="Reorder quantity"
          unit={item.unit}
          hint="How much to order at a time"
        />
        <button type="submit" className="button-quiet" disabled={busy}>
          Save reorder point
        </button>
      </Form>
    </section>
  );
}
