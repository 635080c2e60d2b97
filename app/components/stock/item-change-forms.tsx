/**
 * The item page's forms that are checked in the browser (Conform): the reorder point
 * and the rename of the catalogue entry. Loaded with import() by their panels
 * (item-change-forms-lazy.ts), not with the page: the server renders them whole,
 * React keeps them in place until this code has come, and until then they are sent
 * and checked by the action as without JavaScript
 * (docs/decisions/051-precompressed-assets-and-page-weight.md).
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
import { FormMessages, TextField } from "~/components/text-field";
import { formatNumberForField } from "~/lib/format";

/** The reorder point and quantity, for those who may set them. */
export function ReorderPointForm({
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

/** The rename form of the catalogue entry panel. */
export function RenameItemForm({
  name,
  constraint,
  lastResult,
}: {
  name: string;
  constraint: FieldConstraints;
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const busy = useNavigation().state !== "idle";
  const validate = useBrowserValidation(() =>
    import("~/stock/item-change-form").then(
      (module) => module.renameFormSchema,
    ),
  );
  const [form, fields] = useForm({
    id: "rename",
    lastResult,
    defaultValue: { name },
    constraint,
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate: validate,
  });
  return (
    <Form method="post" {...getFormProps(form)} className="space-y-3">
      <input type="hidden" name="intent" value="rename" />
      <FormMessages id={form.errorId} errors={form.errors} />
      <TextField field={fields.name} label="Name" autoComplete="off" />
      <button type="submit" className="button-quiet" disabled={busy}>
        Save name
      </button>
    </Form>
  );
}
