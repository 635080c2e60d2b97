/**
 * The stored values of one purchase-order line: its price (from the price list, or the
 * buyer's own with a reason), lead time and expected date, and the words of the
 * "price-overridden" history entry when the buyer's price differs from the list's. Pure.
 */
import type { CalendarDate } from "~/lib/calendar-days";
import { formatUnitCostText } from "~/lib/decimal-amounts";
import type {
  LinePriceSource,
  MetalBaseFixing,
} from "~/db/tables/purchase-order-enums";
import { perUnitWord } from "~/lib/unit-text";
import type { ExchangeRateEntry } from "~/pricing/currency";
import type { MetalBasePrice } from "~/pricing/metal-base";
import type { PriceLine } from "~/pricing/price-line";
import {
  expectedDateOf,
  lineLeadTimeDays,
  priceOrderLine,
} from "./order-line-pricing";

export interface LineValues {
  supplierSku: string;
  unitPrice: bigint;
  priceSource: LinePriceSource;
  overrideReason: string | null;
  metalBasePerKg: bigint | null;
  adderPerKg: bigint | null;
  metalBaseFixedAt: MetalBaseFixing | null;
  requestedDate: CalendarDate | null;
  leadTimeDays: number;
  expectedDate: CalendarDate;
}

export interface LineValuesRequest {
  item: { id: number; sku: string; unit: string };
  quantity: bigint;
  /** The buyer's price, when given: it overrides the list's. */
  unitPrice?: bigint;
  overrideReason?: string;
  requestedDate: CalendarDate | null;
  /** The day prices are looked up for (today while draft, the sending day). */
  pricingDate: CalendarDate;
  /** The day lead times count from (creation day while draft, ordered_on once sent). */
  orderDate: CalendarDate;
  currency: string;
  pricing: {
    lines: readonly PriceLine[];
    supplierSku: string | undefined;
    supplierLeadTimeDays: number | null;
    metalBaseFixedAt: MetalBaseFixing;
    bases: readonly MetalBasePrice[];
    rates: readonly ExchangeRateEntry[];
    companyCurrency: string;
  };
}

export type LineValuesResult =
  | {
      ok: true;
      values: LineValues;
      /** Words for a price-overridden event; null when the list's price stands. */
      overrideDetail: string | null;
    }
  | { ok: false; message: string };

/** The line's values, or why it cannot be priced (no price line and no price given). */
export function lineValuesFor(request: LineValuesRequest): LineValuesResult {
  const { pricing } = request;
  const listed = priceOrderLine({
    lines: pricing.lines,
    itemId: String(request.item.id),
    quantity: request.quantity,
    date: request.pricingDate,
    orderCurrency: request.currency,
    companyCurrency: pricing.companyCurrency,
    rates: pricing.rates,
    bases: pricing.bases,
    metalBaseFixedAt: pricing.metalBaseFixedAt,
  });
  const given = request.unitPrice;
  if (!listed.ok && given === undefined) {
    return {
      ok: false,
      message: `${request.item.sku}: ${listed.message} Give a unit price to order it at your own price.`,
    };
  }
  const fromList =
    listed.ok && (given === undefined || given === listed.unitPrice);
  const leadTimeDays = lineLeadTimeDays(
    listed.ok ? listed.leadTimeDays : null,
    pricing.supplierLeadTimeDays,
  );
  const dates = {
    requestedDate: request.requestedDate,
    leadTimeDays,
    expectedDate: expectedDateOf({
      requestedDate: request.requestedDate,
      orderDate: request.orderDate,
      leadTimeDays,
    }),
  };
  if (fromList && listed.ok) {
    return {
      ok: true,
      values: {
        supplierSku: listed.supplierSku,
        unitPrice: listed.unitPrice,
        priceSource: "price_list",
        overrideReason: null,
        metalBasePerKg: listed.metalBasePerKg,
        adderPerKg: listed.adderPerKg,
        metalBaseFixedAt: listed.metalBaseFixedAt,
        ...dates,
      },
      overrideDetail: null,
    };
  }
  const price = given!;
  const per = `${request.currency}/${perUnitWord(request.item.unit)}`;
  const instead = listed.ok
    ? `instead of the price list's ${formatUnitCostText(listed.unitPrice)} ${per}`
    : "(no price-list price)";
  const reason = request.overrideReason
    ? `: ${request.overrideReason}`
    : " (no reason given)";
  return {
    ok: true,
    values: {
      supplierSku: listed.ok ? listed.supplierSku : (pricing.supplierSku ?? ""),
      unitPrice: price,
      priceSource: "override",
      overrideReason: request.overrideReason ?? null,
      metalBasePerKg: null,
      adderPerKg: null,
      metalBaseFixedAt: null,
      ...dates,
    },
    overrideDetail: `${request.item.sku} priced by hand at ${formatUnitCostText(price)} ${per} ${instead}${reason}.`,
  };
}
