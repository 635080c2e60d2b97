/**
 * A supplier's price line as imported from a price list: one quantity break of one
 * supplier article, valid for a span of days. Wire is priced either at a fixed price per
 * kg or as a fabrication adder per kg on top of the month's metal base; magnets and other
 * parts at a fixed price per piece.
 */

import type { ConductorKey } from "~/engineering/reference-data";
import type { CalendarDate } from "~/lib/calendar-days";
import type { CurrencyCode, MoneyAmount } from "./money";

/** Where a line came from: the price-list import and the row in its file (1-based). */
export interface PriceLineSource {
  importId: string;
  line: number;
}

interface PriceLineCommon {
  /** The catalogue item this line prices. */
  itemId: string;
  supplier: string;
  /** The supplier's own article number. With `supplier` it names one offer. */
  supplierSku: string;
  /** The currency the supplier quotes in. */
  currency: CurrencyCode;
  /**
   * The break: this price applies from this quantity up, in thousandths of the item's
   * stock unit (grams for wire in kg, 1000 per piece for magnets). 0 for "any quantity".
   */
  minQuantity: bigint;
  /** First day the price applies. */
  validFrom: CalendarDate;
  /** Last day the price applies (inclusive); absent while the price stands. */
  validTo?: CalendarDate;
  /** Days from order to delivery, when the supplier says. Breaks ties in best price. */
  leadTimeDays?: number;
  /** Sold in whole packs or spools of this size, thousandths of the item's unit; absent: any quantity. */
  packQuantity?: bigint;
  sourceLine: PriceLineSource;
}

/** A fixed price per unit of the item (per kg of wire, per piece of a magnet). */
export interface UnitPriceLine extends PriceLineCommon {
  pricing: "unit-price";
  /** Price per unit of the item in `currency`, ten-thousandths. */
  unitPrice: MoneyAmount;
}

/** Wire priced as a fabrication adder per kg plus the metal base of its conductor. */
export interface AdderPriceLine extends PriceLineCommon {
  pricing: "metal-base-adder";
  /** Fabrication adder per kg of enamelled wire in `currency`, ten-thousandths. */
  adderPerKg: MoneyAmount;
  conductor: ConductorKey;
}

export type PriceLine = UnitPriceLine | AdderPriceLine;

/** One supplier article: lines with the same supplier and supplier SKU form one offer. */
export function offerKey(
  line: Pick<PriceLine, "supplier" | "supplierSku">,
): string {
  return JSON.stringify([line.supplier, line.supplierSku]);
}

const collator = new Intl.Collator("en", {
  sensitivity: "base",
  numeric: true,
});

/**
 * Offers in reading order: supplier name, then supplier SKU ("SKU-9" before "SKU-10"),
 * the same in every server's and browser's locale.
 */
export function compareOffers(
  a: Pick<PriceLine, "supplier" | "supplierSku">,
  b: Pick<PriceLine, "supplier" | "supplierSku">,
): number {
  return (
    compareText(a.supplier, b.supplier) ||
    compareText(a.supplierSku, b.supplierSku)
  );
}

function compareText(a: string, b: string): number {
  return collator.compare(a, b) || (a < b ? -1 : a > b ? 1 : 0);
}
