/** What a currency rate may not be, shared by the prices page and the JSON API. */

/** A message when the rate is for the company currency itself (always 1), else null. */
export function companyCurrencyRateRefusal(
  currency: string,
  companyCurrency: string,
): string | null {
  return currency === companyCurrency
    ? `${companyCurrency} is the company currency: its rate is always 1. Give the rate of another currency.`
    : null;
}
