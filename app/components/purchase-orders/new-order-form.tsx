/** The new order: supplier, currency (the supplier's unless another is typed), notes and lines; saved as a draft. */
import { getFormProps, type SubmissionResult } from "@conform-to/react";
import { Form } from "react-router";
import { SelectField } from "~/components/select-field";
import { FormMessages, TextField } from "~/components/text-field";
import { TextAreaField } from "~/components/text-area-field";
import { OrderLinesEditor } from "./order-lines-editor";
import { useOrderForm } from "./use-order-form";

export interface SupplierChoice {
  id: number;
  name: string;
  currency: string;
  orderEmail: string | null;
}

export function NewOrderForm({
  suppliers,
  supplierId,
  lastResult,
}: {
  suppliers: SupplierChoice[];
  supplierId: number | null;
  lastResult: SubmissionResult<string[]> | undefined;
}) {
  const { form, fields, busy } = useOrderForm(
    "new-purchase-order",
    () =>
      import("~/purchase-orders/purchase-order-page-forms").then(
        (module) => module.newOrderFormSchema,
      ),
    { supplierId: supplierId ? String(supplierId) : "", lines: [{}] },
    lastResult,
  );
  const supplier = suppliers.find(
    (candidate) => String(candidate.id) === fields.supplierId.value,
  );
  const typedCurrency = fields.currency.value?.trim().toUpperCase();
  const currency = typedCurrency || supplier?.currency || "";
  return (
    <Form
      method="post"
      {...getFormProps(form)}
      aria-label="New purchase order"
      className="panel space-y-5"
    >
      <input type="hidden" name="intent" value="create" />
      <FormMessages id={form.errorId} errors={form.errors} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          field={fields.supplierId}
          label="Supplier"
          placeholder="Choose a supplier…"
          hint={
            supplier
              ? supplier.orderEmail
                ? `Orders go to ${supplier.orderEmail}.`
                : "This supplier has no order address yet: add one on its page before sending."
              : undefined
          }
        >
          {suppliers.map((choice) => (
            <option key={choice.id} value={choice.id}>
              {choice.name}
            </option>
          ))}
        </SelectField>
        <TextField
          field={fields.currency}
          label="Currency"
          hint={
            supplier
              ? `Empty: the supplier's currency, ${supplier.currency}.`
              : "Empty: the supplier's currency."
          }
        />
      </div>
      <TextAreaField field={fields.notes} label="Notes for the supplier" />
      <OrderLinesEditor
        form={form}
        lines={fields.lines}
        currency={currency || "price"}
        supplier={supplier?.name}
        knownItems={{}}
      />
      <button type="submit" className="button-primary" disabled={busy}>
        {busy ? "Saving…" : "Save draft order"}
      </button>
    </Form>
  );
}
