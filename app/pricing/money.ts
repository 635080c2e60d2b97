/**
 * Exact money arithmetic for supplier prices. Pure: no framework, no I/O; runs in the
 * browser and on the server.
 *
 * - Money (unit prices, adders, metal bases, amounts) is a BigInt count of
 *   ten-thousandths of a currency unit: 12.5 EUR/kg is 125000n. This is the same scale as
 *   unit costs in the stock ledger (`~/lib/decimal-amounts`), so the two mix freely.
 * - Exchange rates are a BigInt count of millionths: 1.085 is 1085000n.
 * - Quantities that are finer than the stock ledger's thousandths (a coil's wound mass to
 *   a tenth of a milligram) are {@link ExactDecimal}s.
 *
 * One rounding rule everywhere: half away from zero, to the nearest ten-thousandth
 * (0.37425 → 0.3743, −0.37425 → −0.3743). It is the rule of a spreadsheet's ROUND and of
 * a priced invoice line, so a buyer who checks a figure by hand gets the same digits; it
 * is also the rule of `valueOf` in the stock ledger. Floating point is never used.
 */

import { isTooLongForNumber } from "~/lib/number-text";
import {
  decimalNumberPattern,
  divideHalfAwayFromZero,
  formatUnitCostText,
  parseUnitCost,
  unitCostScale,
} from "~/lib/decimal-amounts";

/** Money in ten-thousandths of a currency unit (4 decimals). */
export type MoneyAmount = bigint;

/** Company currency per 1 unit of a foreign currency, in millionths (6 decimals). */
export type ExchangeRate = bigint;

/** An ISO 4217 currency code as the buyer keeps it, e.g. "EUR", "USD". */
export type CurrencyCode = string;

/** Ten-thousandths per currency unit. */
export const moneyScale: bigint = unitCostScale;
export const moneyDecimals = 4;

/** Millionths per unit of an exchange rate. */
export const rateScale = 1_000_000n;
export const rateDecimals = 6;

/** A decimal number held exactly: `digits / 10^decimals` (0.0299396 is 299396n, 7). */
export interface ExactDecimal {
  readonly digits: bigint;
  readonly decimals: number;
}

/** "12.50" → 125000n. Throws RangeError on a fifth non-zero decimal or a non-number. */
export function parseMoney(text: string): MoneyAmount {
  return parseUnitCost(text);
}

/** 125000n → "12.5000": plain text for DECIMAL(14,4) columns and CSV, no grouping, no currency. */
export function formatMoneyText(amount: MoneyAmount): string {
  return formatUnitCostText(amount);
}

/**
 * "1.085000" → 1085000n. A rate says how much company currency one unit of the foreign
 * currency buys, so it must be above zero. Throws RangeError otherwise or beyond 6 decimals.
 */
export function parseRate(text: string): ExchangeRate {
  const { digits, decimals } = parseExactDecimal(text);
  if (
    decimals > rateDecimals &&
    digits % 10n ** BigInt(decimals - rateDecimals) !== 0n
  ) {
    throw new RangeError(`"${text}" has more than ${rateDecimals} decimals`);
  }
  const rate = rescale({ digits, decimals }, rateDecimals);
  if (rate <= 0n)
    throw new RangeError(`a rate must be above zero, not "${text}"`);
  return rate;
}

/** 1085000n → "1.085000". */
export function formatRateText(rate: ExchangeRate): string {
  return formatExactDecimal({ digits: rate, decimals: rateDecimals });
}

/** "0.0299396" → { digits: 299396n, decimals: 7 }. Throws RangeError on a non-number. */
export function parseExactDecimal(text: string): ExactDecimal {
  const trimmed = text.trim();
  if (isTooLongForNumber(trimmed) || !decimalNumberPattern.test(trimmed)) {
    throw new RangeError(`"${text.slice(0, 40)}" is not a decimal number`);
  }
  const negative = trimmed.startsWith("-");
  const [whole = "0", fraction = ""] = trimmed.replace("-", "").split(".");
  const magnitude = BigInt(whole + fraction);
  return {
    digits: negative ? -magnitude : magnitude,
    decimals: fraction.length,
  };
}

/** { digits: 299396n, decimals: 7 } → "0.0299396". */
export function formatExactDecimal(value: ExactDecimal): string {
  const negative = value.digits < 0n;
  const text = (negative ? -value.digits : value.digits)
    .toString()
    .padStart(value.decimals + 1, "0");
  const whole = text.slice(0, text.length - value.decimals);
  const fraction = text.slice(text.length - value.decimals);
  return `${negative ? "-" : ""}${whole}${fraction ? `.${fraction}` : ""}`;
}

/** A stock-ledger quantity (BigInt thousandths of its unit) as an exact decimal. */
export function fromThousandths(thousandths: bigint): ExactDecimal {
  return { digits: thousandths, decimals: 3 };
}

/** A mass in grams as the same mass in kilograms: 29.94 g → 0.02994 kg, exactly. */
export function gramsToKilograms(grams: ExactDecimal): ExactDecimal {
  return { digits: grams.digits, decimals: grams.decimals + 3 };
}

/** An exact decimal as a whole count of 10^-decimals, rounded half away from zero. */
export function rescale(value: ExactDecimal, decimals: number): bigint {
  if (value.decimals <= decimals) {
    return value.digits * 10n ** BigInt(decimals - value.decimals);
  }
  return divideHalfAwayFromZero(
    value.digits,
    10n ** BigInt(value.decimals - decimals),
  );
}

/**
 * Money for a quantity at a price per unit: quantity × unitPrice, in the price's currency,
 * rounded half away from zero to a ten-thousandth. 0.02994 kg at 12.5000/kg → 0.3743.
 */
export function amountForQuantity(
  quantity: ExactDecimal,
  unitPrice: MoneyAmount,
): MoneyAmount {
  return divideHalfAwayFromZero(
    quantity.digits * unitPrice,
    10n ** BigInt(quantity.decimals),
  );
}

/**
 * An amount in a foreign currency as company currency: amount × rate, rounded half away
 * from zero to a ten-thousandth. 10.0000 USD at 0.920000 EUR per USD → 9.2000 EUR.
 */
export function convertAmount(
  amount: MoneyAmount,
  rate: ExchangeRate,
): MoneyAmount {
  return divideHalfAwayFromZero(amount * rate, rateScale);
}

export interface MoneyFormat {
  /** Decimals shown: 4 for unit prices (the default), 2 for totals. Rounded half away from zero. */
  decimals?: 0 | 1 | 2 | 3 | 4;
  /** The unit the price is per, shown after the currency: "kg" → "12.5000 EUR/kg". */
  per?: string;
}

/** "1234567" → "1,234,567": commas between groups of three digits, from the right. */
function groupThousands(digits: string): string {
  const first = digits.length % 3 || 3;
  let grouped = digits.slice(0, first);
  for (let index = first; index < digits.length; index += 3)
    grouped += `,${digits.slice(index, index + 3)}`;
  return grouped;
}

/**
 * Money for people: thousands grouped with commas, the currency beside the number after a
 * no-break space, "12.5000 EUR/kg", "1,234.50 EUR". Exact: never passes through a float.
 */
export function formatMoney(
  amount: MoneyAmount,
  currency: CurrencyCode,
  format: MoneyFormat = {},
): string {
  const decimals = format.decimals ?? moneyDecimals;
  const shown = divideHalfAwayFromZero(
    amount,
    10n ** BigInt(moneyDecimals - decimals),
  );
  const text = formatExactDecimal({ digits: shown, decimals });
  const [signedWhole = "", fraction] = text.split(".");
  const negative = signedWhole.startsWith("-");
  const whole = negative ? signedWhole.slice(1) : signedWhole;
  const grouped = groupThousands(whole);
  const number = `${negative ? "-" : ""}${grouped}${fraction === undefined ? "" : `.${fraction}`}`;
  const unit = format.per ? `${currency}/${format.per}` : currency;
  return `${number}\u00a0${unit}`;
}
