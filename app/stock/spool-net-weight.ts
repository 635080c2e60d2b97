/**
 * A spool's net weight from the gross and tare typed on the receipt form, before it is
 * saved: gross − tare, to the gram, on the same exact amounts the ledger stores (a decimal
 * comma allowed). Null until both are numbers with at most 3 decimals. Pure.
 */
import { formNumber } from "~/lib/number-text";
import { quantityFromNumber, quantityToNumber } from "~/lib/decimal-amounts";

function grams(text: string): bigint | null {
  const value = formNumber(text);
  return typeof value === "number" ? quantityFromNumber(value) : null;
}

/** gross − tare in kg (negative or zero when the tare is not lighter). */
export function spoolNetKg(grossText: string, tareText: string): number | null {
  const gross = grams(grossText);
  const tare = grams(tareText);
  if (gross === null || tare === null) return null;
  return quantityToNumber(gross - tare);
}
