/**
 * The record-movement page's search for the item by SKU (scanned or typed), keeping the
 * kind of movement chosen; says so when no item has the SKU.
 */
import { Form } from "react-router";
import type { MovementType } from "~/db/tables/stock-enums";
import { movementInputClass } from "./movement-field";

export function ItemSkuSearch({
  type,
  sku,
  location = null,
  found,
  notFound,
}: {
  type: MovementType;
  sku: string;
  /** A scanned location, kept while the item is looked for. */
  location?: string | null;
  /** An item is shown: the search does not take the focus from its form. */
  found: boolean;
  notFound: boolean;
}) {
  return (
    <Form method="get" className="panel flex flex-wrap items-end gap-3">
      <input type="hidden" name="type" value={type} />
      {location ? (
        <input type="hidden" name="location" value={location} />
      ) : null}
      <div className="min-w-60 flex-1">
        <label htmlFor="find-sku" className="field-label">
          Item SKU
        </label>
        <input
          id="find-sku"
          name="sku"
          defaultValue={sku}
          className={movementInputClass}
          autoComplete="off"
          autoFocus={!found}
          placeholder="scan or type the SKU"
        />
      </div>
      <button type="submit" className="button-quiet min-h-12 px-5">
        Find item
      </button>
      {notFound ? (
        <p className="field-error w-full">
          No item with SKU &quot;{sku}&quot;.
        </p>
      ) : null}
    </Form>
  );
}
