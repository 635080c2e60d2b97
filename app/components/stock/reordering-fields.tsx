import { QuantityField } from "~/components/quantity-field";
import type { NewItemFields } from "./use-new-item-form";

/** A new item's reorder point and reorder quantity, in the unit it is kept in. */
export function ReorderingFields({
  fields,
  unit,
}: {
  fields: Pick<NewItemFields, "reorderPoint" | "reorderQuantity">;
  unit: string;
}) {
  return (
    <fieldset className="grid gap-4 sm:grid-cols-2">
      <legend className="mb-2 text-sm font-semibold uppercase tracking-wide text-graphite-500">
        Reordering
      </legend>
      <QuantityField
        field={fields.reorderPoint}
        label="Reorder point"
        unit={unit}
        hint="Buyers hear of it when the available stock falls below; 0 for no alert"
      />
      <QuantityField
        field={fields.reorderQuantity}
        label="Reorder quantity"
        unit={unit}
        hint="How much to order at a time"
      />
    </fieldset>
  );
}
