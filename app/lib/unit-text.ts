/**
 * Counts and units in words people read: "1 motor", "2 motors", "1 piece", "per piece".
 * One place for English plurals (Intl.PluralRules, so "1" is singular and "1.5", "0"
 * and "2" are plural, as the number is written), and for the stock unit "pcs", which is
 * a symbol in tables and fields but reads as "piece"/"pieces" in a sentence. Generic:
 * any noun, any count, signed counts too (the sign does not change the noun). Pure.
 */
import { formatQuantity } from "./format";

const rulesByDecimals = new Map<number, Intl.PluralRules>();

function pluralRules(decimals: number): Intl.PluralRules {
  let rules = rulesByDecimals.get(decimals);
  if (!rules) {
    rules = new Intl.PluralRules("en-GB", {
      minimumFractionDigits: decimals,
      maximumFractionDigits: decimals,
    });
    rulesByDecimals.set(decimals, rules);
  }
  return rules;
}

/** A noun's two English forms; `other` defaults to `one` + "s". */
export interface NounForms {
  one: string;
  other?: string;
}

function formsOf(noun: string | NounForms): Required<NounForms> {
  const forms = typeof noun === "string" ? { one: noun } : noun;
  return { one: forms.one, other: forms.other ?? `${forms.one}s` };
}

/**
 * The form of `noun` that goes with `count` written to `decimals` places: 1 → "motor",
 * 2, 0 and 1.5 → "motors"; −1 → "motor" (only the size counts). `decimals` matters:
 * "1.000 kg" is written with decimals and is plural in English ("1.000 kilograms").
 */
export function nounFor(
  count: number,
  noun: string | NounForms,
  decimals = 0,
): string {
  const forms = formsOf(noun);
  return pluralRules(decimals).select(Math.abs(count)) === "one"
    ? forms.one
    : forms.other;
}

/** "1 motor", "12 motors", "1,200 orders": the count written with formatQuantity and its noun. */
export function countText(
  count: number,
  noun: string | NounForms,
  decimals = 0,
): string {
  return formatQuantity(count, nounFor(count, noun, decimals), decimals);
}

/** Stock units whose symbol does not read as a word: the word's forms. */
const unitWords: Record<string, Required<NounForms>> = {
  pcs: { one: "piece", other: "pieces" },
};

/** A stock unit as a word for `count`: "pcs" → "piece"/"pieces"; "kg", "m" stay as they are. */
export function unitWord(unit: string, count: number, decimals = 0): string {
  const word = unitWords[unit];
  return word ? nounFor(count, word, decimals) : unit;
}

/** A quantity with its unit as it reads: (1, "pcs") → "1 piece", (2.5, "kg", 3) → "2.500 kg". */
export function quantityText(
  value: number,
  unit: string,
  decimals = 0,
): string {
  return formatQuantity(value, unitWord(unit, value, decimals), decimals);
}

/** The unit after "per" or a slash: "pcs" → "piece" ("EUR/piece", "per piece"); others unchanged. */
export function perUnitWord(unit: string): string {
  return unitWords[unit]?.one ?? unit;
}

/**
 * Money in a currency, to the cent (a costing carries 0.0001), per a unit when
 * given: "1,234.50 EUR", "0.85 EUR/piece"; "—" when there is none.
 */
export function moneyText(
  value: number | null,
  currency: string,
  per?: string,
): string {
  if (value === null) return "—";
  return formatQuantity(
    value,
    per ? `${currency}/${perUnitWord(per)}` : currency,
    2,
  );
}
