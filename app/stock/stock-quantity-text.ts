/** Stock quantities and money as the stock pages show them, on the one formatter. Pure. */
import type { MovementType } from "~/db/tables/stock-enums";
import { formatQuantity } from "~/lib/format";
import { perUnitWord, quantityText } from "~/lib/unit-text";

/**
 * Kilograms and metres to the gram and millimetre (3 decimals), pieces whole and as a
 * word: "4.800 kg", "1 piece", "100 pieces".
 */
export function formatStockQuantity(value: number, unit: string): string {
  return quantityText(value, unit, unit === "pcs" ? 0 : 3);
}

/** A change of stock with its sign, a true minus for less: "+4.800 kg", "−2 pieces". */
export function formatSignedStockQuantity(value: number, unit: string): string {
  const sign = value > 0 ? "+" : value < 0 ? "−" : "";
  return `${sign}${formatStockQuantity(Math.abs(value), unit)}`;
}

/** Cost per unit of stock, to a hundredth of a cent: "14.2000 per kg", "0.8500 per piece". */
export function formatUnitCost(value: number, unit: string): string {
  return `${formatQuantity(value, "", 4)} per ${perUnitWord(unit)}`;
}

const kindLabels: Record<string, string> = {
  wire: "Wire",
  magnet: "Magnet",
  part: "Other part",
};

export function itemKindLabel(kind: string): string {
  return kindLabels[kind] ?? kind;
}

/** The name of each kind of movement, as the journal and the pages show it. */
export const movementTypeLabels: Record<MovementType, string> = {
  receipt: "Receipt",
  issue: "Issue",
  return: "Return",
  transfer: "Transfer",
  adjustment: "Adjustment",
  count: "Count",
  scrap: "Scrap",
};
