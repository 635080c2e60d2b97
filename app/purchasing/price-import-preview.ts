/**
 * What the import's dry run says about each previewed row's catalogue item: the
 * item it matched and how, or the item it will create. Shared by the import
 * (server) and the page that shows the preview. Pure: no I/O.
 */
import type { ItemKind } from "~/db/tables/stock-enums";
import type { PriceListRow } from "~/price-lists/price-list-rows";

/** How a row found its catalogue item (in this order of preference), or that it makes one. */
export type MatchedBy =
  "our-sku" | "supplier-sku" | "wire-size" | "magnet-grade" | "new-item";

/** The catalogue item a previewed row prices: one it matched, or the one it will create. */
export interface PreviewMatch {
  sku: string;
  name: string;
  kind: ItemKind;
  /** True when the import creates the item. */
  newItem: boolean;
  by: MatchedBy;
}

/** A previewed row: the fields it always had, and its catalogue item. */
export type PreviewRow = PriceListRow & { match: PreviewMatch };

const matchedByText: Record<Exclude<MatchedBy, "new-item">, string> = {
  "our-sku": "by our SKU",
  "supplier-sku": "by the supplier's SKU",
  "wire-size": "by wire size",
  "magnet-grade": "by magnet grade",
};

const newItemText: Record<ItemKind, string> = {
  wire: "New wire item",
  magnet: "New magnet item",
  part: "New part",
};

/** "by our SKU" for a matched item, "New wire item" for one the import makes. */
export function describeMatch(match: PreviewMatch): string {
  return match.newItem || match.by === "new-item"
    ? newItemText[match.kind]
    : matchedByText[match.by];
}
