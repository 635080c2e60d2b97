/**
 * What a receipt against an order books as the unit cost: the order line's price, never a
 * figure the storekeeper types. The line's unit price is in the order's currency; a wire
 * line whose metal base is fixed at delivery is priced at the delivery day's base per kg
 * (kept in the order's currency, else derived from the company currency's base, see
 * `derived-metal-base.ts`) plus the line's adder. That price is converted to the company
 * currency at the rate valid on the receipt day (`currency.ts`). Pure.
 */
import type { ConductorKey } from "~/engineering/reference-data";
import type { CalendarDate } from "~/lib/calendar-days";
import { toCompanyCurrency, type ExchangeRateEntry } from "~/pricing/currency";
import { metalBaseFor } from "~/pricing/derived-metal-base";
import { fullWirePricePerKg, type MetalBasePrice } from "~/pricing/metal-base";
import type { CurrencyCode, ExchangeRate, MoneyAmount } from "~/pricing/money";

export interface PricedOrderLine {
  /** Per unit of the item, in the order's currency, ten-thousandths. */
  unitPrice: MoneyAmount;
  /** Wire lines priced on the metal base: the adder per kg and when the base is fixed. */
  adderPerKg: MoneyAmount | null;
  metalBaseFixedAt: "order" | "delivery" | null;
  /** The wire's conductor (copper, aluminium); null for other items. */
  conductor: ConductorKey | null;
}

export interface ReceiptPricing {
  orderCurrency: CurrencyCode;
  companyCurrency: CurrencyCode;
  bases: readonly MetalBasePrice[];
  rates: readonly ExchangeRateEntry[];
  /** The receipt day: its base (for a base fixed at delivery) and its rate apply. */
  receivedOn: CalendarDate;
}

export type ReceiptUnitCost =
  | {
      ok: true;
      /** In the order's currency. */
      unitPrice: MoneyAmount;
      /** In the company currency, as booked on the movement. */
      unitCost: MoneyAmount;
      /** Company currency per order currency, millionths; null when they are the same. */
      rate: ExchangeRate | null;
    }
  | { ok: false; message: string };

export function receiptUnitCost(
  line: PricedOrderLine,
  pricing: ReceiptPricing,
): ReceiptUnitCost {
  let unitPrice = line.unitPrice;
  if (
    line.metalBaseFixedAt === "delivery" &&
    line.adderPerKg !== null &&
    line.conductor !== null
  ) {
    const base = metalBaseFor({
      conductor: line.conductor,
      currency: pricing.orderCurrency,
      companyCurrency: pricing.companyCurrency,
      bases: pricing.bases,
      rates: pricing.rates,
      date: pricing.receivedOn,
    });
    if (base.source === "missing")
      return {
        ok: false,
        message: `The metal base is fixed at delivery, but there is ${base.problem.message}: a buyer enters it before this line is received.`,
      };
    unitPrice = fullWirePricePerKg(line.adderPerKg, base.base.pricePerKg);
  }
  const converted = toCompanyCurrency(unitPrice, pricing.orderCurrency, {
    companyCurrency: pricing.companyCurrency,
    rates: pricing.rates,
    date: pricing.receivedOn,
  });
  if (!converted.ok)
    return {
      ok: false,
      message: `The order is in ${pricing.orderCurrency}, but there is ${converted.problem.message}: a buyer enters the rate before this delivery is received.`,
    };
  return {
    ok: true,
    unitPrice,
    unitCost: converted.amount,
    rate: converted.rate?.rate ?? null,
  };
}
