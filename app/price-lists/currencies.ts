/**
 * The currencies a supplier price list may quote in: ISO 4217 three-letter
 * codes. The list covers the countries magnet wire and magnets are commonly
 * bought from; codes and names are from memory of ISO 4217. Pure: no I/O.
 */

export const CURRENCIES = [
  { code: "EUR", name: "Euro" },
  { code: "USD", name: "US dollar" },
  { code: "GBP", name: "Pound sterling" },
  { code: "CHF", name: "Swiss franc" },
  { code: "SEK", name: "Swedish krona" },
  { code: "NOK", name: "Norwegian krone" },
  { code: "DKK", name: "Danish krone" },
  { code: "PLN", name: "Polish złoty" },
  { code: "CZK", name: "Czech koruna" },
  { code: "HUF", name: "Hungarian forint" },
  { code: "RON", name: "Romanian leu" },
  { code: "TRY", name: "Turkish lira" },
  { code: "JPY", name: "Japanese yen" },
  { code: "CNY", name: "Chinese yuan renminbi" },
  { code: "KRW", name: "South Korean won" },
  { code: "TWD", name: "New Taiwan dollar" },
  { code: "HKD", name: "Hong Kong dollar" },
  { code: "SGD", name: "Singapore dollar" },
  { code: "INR", name: "Indian rupee" },
  { code: "THB", name: "Thai baht" },
  { code: "MYR", name: "Malaysian ringgit" },
  { code: "VND", name: "Vietnamese dong" },
  { code: "CAD", name: "Canadian dollar" },
  { code: "AUD", name: "Australian dollar" },
  { code: "NZD", name: "New Zealand dollar" },
  { code: "MXN", name: "Mexican peso" },
  { code: "BRL", name: "Brazilian real" },
  { code: "ZAR", name: "South African rand" },
  { code: "ILS", name: "Israeli new shekel" },
  { code: "AED", name: "UAE dirham" },
] as const;

export type CurrencyCode = (typeof CURRENCIES)[number]["code"];

/** The codes alone, for select lists and schemas. */
export const currencyCodes: readonly CurrencyCode[] = CURRENCIES.map(
  (currency) => currency.code,
);

const knownCodes: ReadonlySet<string> = new Set(currencyCodes);

/**
 * Signs that stand for one currency of the list only, read as its code (common
 * practice: € is only the euro; £ in a price list to a buyer of these goods is
 * sterling).
 */
const currencySigns: Readonly<Record<string, CurrencyCode>> = {
  "€": "EUR",
  "£": "GBP",
};

/**
 * The code for a cell like "EUR", "eur", " Eur " or "€", or undefined when it
 * is not in the list (or is a sign several currencies use, see
 * {@link ambiguousCurrencySigns}).
 */
export function findCurrencyCode(text: string): CurrencyCode | undefined {
  const trimmed = text.trim();
  if (Object.hasOwn(currencySigns, trimmed)) return currencySigns[trimmed];
  const code = trimmed.toUpperCase();
  return knownCodes.has(code) ? (code as CurrencyCode) : undefined;
}

/**
 * A currency as a person types it into a form: a sign that stands for one
 * currency read as its code (" € " → EUR, through {@link findCurrencyCode}),
 * anything else trimmed and in capitals for the form's own check ("usd" → USD,
 * "$" stays "$").
 */
export function currencyCodeFromText(text: string): string {
  return findCurrencyCode(text) ?? text.trim().toUpperCase();
}

/** Signs several currencies use: what they may stand for, and the codes to write instead. */
export const ambiguousCurrencySigns: Readonly<
  Record<string, { standsFor: string; write: string }>
> = {
  $: {
    standsFor: "US, Canadian, Australian and other dollars",
    write: "a code such as USD, CAD or AUD",
  },
  "¥": {
    standsFor: "the Japanese yen and the Chinese yuan",
    write: "JPY or CNY",
  },
  kr: {
    standsFor: "the Swedish krona and the Norwegian and Danish krone",
    write: "SEK, NOK or DKK",
  },
};
