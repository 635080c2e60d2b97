import type { FieldMetadata } from "@conform-to/react";
import { QuantityField } from "~/components/quantity-field";
import { SelectField } from "~/components/select-field";
import { TextField } from "~/components/text-field";

/** How orders reach the supplier and what its deliveries may be: on the new-supplier and the edit form. */
export function SupplierOrderingFields({
  fields,
}: {
  fields: {
    orderEmail: FieldMetadata<string | undefined>;
    metalBaseFixedAt: FieldMetadata<string>;
    wireTolerancePercent: FieldMetadata<number>;
    pieceTolerancePercent: FieldMetadata<number>;
  };
}) {
  return (
    <fieldset className="space-y-4">
      <legend className="mb-2 text-sm font-semibold text-graphite-800">
        Orders and deliveries
      </legend>
      <TextField
        field={fields.orderEmail}
        label="E-mail for orders"
        type="email"
        autoComplete="off"
        hint="Where purchase orders are sent; the e-mail above when left empty."
      />
      <SelectField
        field={fields.metalBaseFixedAt}
        label="Wire's metal base is fixed"
        hint="The copper or aluminium base in a wire price: the day the order is sent, or the day it is delivered."
      >
        <option value="order">at order</option>
        <option value="delivery">at delivery</option>
      </SelectField>
      <QuantityField
        field={fields.wireTolerancePercent}
        label="Over-delivery allowed, wire by weight"
        unit="%"
        hint="0 to 100. A receipt past the ordered weight by more is refused."
      />
      <QuantityField
        field={fields.pieceTolerancePercent}
        label="Over-delivery allowed, pieces"
        unit="%"
        hint="0 to 100; 0 takes exactly what was ordered."
      />
    </fieldset>
  );
}
