/**
 * One line of an order being written: our SKU (searched as typed), the quantity in the
 * item's unit, the requested date, and a price of the buyer's own with the reason that
 * must go with it (left empty, the supplier's price list prices the line).
 */
import type { FieldMetadata } from "@conform-to/react";
import { useState } from "react";
import { DesignItemPicker } from "~/components/design/item-picker";
import { QuantityField } from "~/components/quantity-field";
import { TextField } from "~/components/text-field";
import { perUnitWord } from "~/lib/unit-text";
import type { OrderLineDraft } from "./order-lines-editor";
import { useListPrice } from "./use-list-price";

export function OrderLineFields({
  line,
  position,
  currency,
  supplier,
  knownItem,
  removeButton,
}: {
  line: FieldMetadata<OrderLineDraft>;
  /** 1, 2, 3 … as the page lists the lines. */
  position: number;
  currency: string;
  /** The supplier's name, once chosen: its list price for the line shows as a hint. */
  supplier?: string;
  knownItem?: { sku: string; name: string; unit: string };
  removeButton: React.ReactNode;
}) {
  const fields = line.getFieldset();
  const [unit, setUnit] = useState(knownItem?.unit);
  const listPrice = useListPrice(
    supplier,
    unit ? (fields.sku.value ?? "") : "",
    fields.quantity.value ?? "",
  );
  const overriding = Boolean(
    fields.unitPrice.value ||
    fields.overrideReason.value ||
    fields.unitPrice.errors ||
    fields.overrideReason.errors,
  );
  return (
    <fieldset className="rounded-md border border-rule p-3">
      <legend className="px-1 text-sm font-semibold">Line {position}</legend>
      {fields.id.value ? (
        <input type="hidden" name={fields.id.name} value={fields.id.value} />
      ) : null}
      <div className="grid gap-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,1fr)_minmax(0,1fr)]">
        <DesignItemPicker
          field={fields.sku}
          label="Item"
          knownItem={knownItem}
          onPick={(item) => setUnit(item?.unit ?? knownItem?.unit)}
        />
        <QuantityField
          field={fields.quantity}
          label="Quantity"
          unit={unit ?? "item's unit"}
        />
        <TextField
          field={fields.requestedDate}
          label="Wanted by (YYYY-MM-DD)"
          hint="Empty: ordered on + lead time."
        />
      </div>
      {listPrice ? (
        <p className="mt-2 text-xs text-graphite-700" aria-live="polite">
          {listPrice}
        </p>
      ) : null}
      <details open={overriding} className="mt-3">
        <summary className="cursor-pointer text-sm font-medium text-copper-700 touch:py-3">
          Price of your own
        </summary>
        <div className="mt-2 grid gap-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,2fr)]">
          <QuantityField
            field={fields.unitPrice}
            label="Unit price"
            unit={`${currency}${unit ? `/${perUnitWord(unit)}` : ""}`}
            hint="Leave empty to take the supplier's price list."
          />
          <TextField
            field={fields.overrideReason}
            label="Why this price"
            hint="Kept with the line and shown on the order's history."
          />
        </div>
      </details>
      <div className="mt-2 flex justify-end">{removeButton}</div>
    </fieldset>
  );
}
