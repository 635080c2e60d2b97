import { formatNumberForField } from "~/lib/format";
/** The draft's edit: currency, notes and every line (change, add, remove); saved in one go, only what changed is recorded. */
import { getFormProps, type SubmissionResult } from "@conform-to/react";
import { Form } from "react-router";
import { FormMessages, TextField } from "~/components/text-field";
import { TextAreaField } from "~/components/text-area-field";
import type { PurchaseOrderView } from "~/purchase-orders/purchase-order-details.server";
import { formatQuantityText, formatUnitCostText } from "~/lib/decimal-amounts";
import { plainDecimalText } from "~/lib/number-text";
import { OrderLinesEditor } from "./order-lines-editor";
import { useOrderForm } from "./use-order-form";

export function DraftEditForm({
  order,
  lastResult,
}: {
  order: PurchaseOrderView;
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const { form, fields, busy } = useOrderForm(
    `edit-${order.id}-${order.updatedAt.valueOf()}`,
    () =>
      import("~/purchase-orders/purchase-order-page-forms").then(
        (module) => module.draftFormSchema,
      ),
    {
      currency: order.currency,
      notes: order.notes,
      lines: order.lines.map((line) => ({
        id: String(line.id),
        sku: line.sku,
        quantity: formatNumberForField(
          plainDecimalText(formatQuantityText(line.quantity)),
        ),
        requestedDate: line.requestedDate ?? "",
        unitPrice:
          line.priceSource === "override"
            ? formatNumberForField(
                plainDecimalText(formatUnitCostText(line.unitPrice)),
              )
            : "",
        overrideReason: line.overrideReason ?? "",
      })),
    },
    lastResult,
  );
  const knownItems = Object.fromEntries(
    order.lines.map((line) => [line.sku, line]),
  );
  return (
    <Form
      method="post"
      {...getFormProps(form)}
      aria-label="Edit the draft"
      className="panel space-y-4"
    >
      <h2 className="text-lg font-semibold">Edit the draft</h2>
      <input type="hidden" name="intent" value="save" />
      <FormMessages id={form.errorId} errors={form.errors} />
      <div className="grid gap-4 sm:grid-cols-[10rem_minmax(0,1fr)]">
        <TextField
          field={fields.currency}
          label="Currency"
          hint={`The supplier's is ${order.supplier.currency}.`}
        />
        <TextAreaField
          field={fields.notes}
          label="Notes for the supplier"
          rows={2}
        />
      </div>
      <OrderLinesEditor
        form={form}
        lines={fields.lines}
        currency={fields.currency.value?.trim().toUpperCase() || order.currency}
        supplier={order.supplier.name}
        knownItems={knownItems}
      />
      <button type="submit" className="button-primary" disabled={busy}>
        {busy ? "Saving…" : "Save changes"}
      </button>
    </Form>
  );
}
