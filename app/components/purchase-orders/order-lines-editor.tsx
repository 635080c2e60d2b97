/** The lines of an order being written or edited: one fieldset each, a button to add one and one to remove each. */
import type { FieldMetadata, FormMetadata } from "@conform-to/react";
import { maxOrderLines } from "~/purchase-orders/max-order-lines";
import { OrderLineFields } from "./order-line-fields";

/** A line as its fields hold it (text), before the schema reads it. */
export type OrderLineDraft = {
  id?: string;
  sku?: string;
  quantity?: string;
  requestedDate?: string;
  unitPrice?: string;
  overrideReason?: string;
};

export type OrderFormShape = {
  intent?: string;
  supplierId?: string;
  currency?: string;
  notes?: string;
  lines: OrderLineDraft[];
};

export function OrderLinesEditor({
  form,
  lines,
  currency,
  supplier,
  knownItems,
}: {
  form: FormMetadata<OrderFormShape, string[]>;
  lines: FieldMetadata<OrderLineDraft[], OrderFormShape, string[]>;
  currency: string;
  /** The supplier's name, once chosen. */
  supplier?: string;
  /** Items the lines had when the page was loaded, by SKU: their names and units show at once. */
  knownItems: Record<string, { sku: string; name: string; unit: string }>;
}) {
  const list = lines.getFieldList();
  return (
    <div className="space-y-3">
      <h3 className="text-base font-semibold">Lines</h3>
      {lines.errors ? (
        <p id={lines.errorId} className="field-error">
          {lines.errors.join(" ")}
        </p>
      ) : null}
      {list.map((line, index) => (
        <OrderLineFields
          key={line.key}
          line={line}
          position={index + 1}
          currency={currency}
          supplier={supplier}
          knownItem={knownItems[line.getFieldset().sku.initialValue ?? ""]}
          removeButton={
            list.length > 1 ? (
              <button
                {...form.remove.getButtonProps({ name: lines.name, index })}
                className="button-quiet text-danger"
              >
                Remove line {index + 1}
              </button>
            ) : null
          }
        />
      ))}
      {list.length < maxOrderLines ? (
        <button
          {...form.insert.getButtonProps({
            name: lines.name,
            defaultValue: {},
          })}
          className="button-quiet"
        >
          Add a line
        </button>
      ) : null}
    </div>
  );
}
