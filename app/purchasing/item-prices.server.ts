/**
 * One item's prices from the stored price lines: the best current prices for a quantity
 * and the price history for the same quantity (app/pricing does the sums). Both read the
 * same inputs, loaded once by `loadItemPricing`.
 */
import { eq, inArray, sql } from "drizzle-orm";
import { db, type Database, type Transaction } from "~/db/client.server";
import { items, priceLines, suppliers } from "~/db/schema";
import type { ConductorKey } from "~/engineering/reference-data";
import { bestPrices } from "~/pricing/best-price";
import { isDerivedMetalBase } from "~/pricing/derived-metal-base";
import { addDays, type CalendarDate } from "~/lib/calendar-days";
import type { ExchangeRateEntry } from "~/pricing/currency";
import type { MetalBasePrice } from "~/pricing/metal-base";
import { parseMoney, parseRate, type CurrencyCode } from "~/pricing/money";
import { priceHistory } from "~/pricing/price-history";
import type { PriceLine } from "~/pricing/price-line";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { defaultCompanyCurrency } from "./suppliers.server";

const money = (amount: bigint) => Number(amount) / 10_000;

/** Everything an item's prices depend on. */
export interface ItemPricing {
  sku: string;
  itemId: number;
  unit: string;
  lines: PriceLine[];
  bases: MetalBasePrice[];
  rates: ExchangeRateEntry[];
  companyCurrency: CurrencyCode;
}

/** The item's price lines, every metal base and currency rate, and the company currency; null for an unknown SKU. */
export async function loadItemPricing(
  sku: string,
): Promise<ItemPricing | null> {
  // The SKU as typed may differ in letter case from the stored one (the database ignores case).
  const [pricing] = (await loadItemsPricing([sku])).values();
  return pricing ?? null;
}

/** The stored columns of a price line that pricing reads (with the supplier's name and lead time beside). */
export const priceLineColumns = {
  itemId: priceLines.itemId,
  supplierId: priceLines.supplierId,
  /** The line's own lead time; the supplier's applies when it is null. */
  lineLeadTimeDays: priceLines.leadTimeDays,
  packQuantity: priceLines.packQuantity,
  supplierSku: priceLines.supplierSku,
  currency: priceLines.currency,
  unitPrice: priceLines.unitPrice,
  adderPerKg: priceLines.adderPerKg,
  conductor: priceLines.conductor,
  minQuantity: priceLines.minQuantity,
  validFrom: priceLines.validFrom,
  importId: priceLines.importId,
  line: priceLines.line,
};

/** A stored price line as `priceLineColumns` reads it, with its supplier's name and the lead time that applies. */
export interface PriceLineRow {
  itemId: number;
  supplierId: number;
  supplier: string;
  /** The supplier's lead time. */
  leadTimeDays: number | null;
  lineLeadTimeDays: number | null;
  packQuantity: string | null;
  supplierSku: string;
  currency: string;
  unitPrice: string | null;
  adderPerKg: string | null;
  conductor: string | null;
  minQuantity: string;
  validFrom: string;
  importId: number | null;
  line: number | null;
}

/** Stored price lines as the pricing modules' lines, by our item id. */
export function priceLinesByItem(
  rows: readonly PriceLineRow[],
): Map<number, PriceLine[]> {
  const linesByItem = new Map<number, PriceLine[]>();
  for (const row of rows) {
    // The price line's own lead time, else the supplier's.
    const leadTimeDays = row.lineLeadTimeDays ?? row.leadTimeDays;
    const packQuantity =
      row.packQuantity === null ? 0n : parseQuantity(row.packQuantity);
    const common = {
      itemId: String(row.itemId),
      supplierId: row.supplierId,
      supplier: row.supplier,
      supplierSku: row.supplierSku,
      currency: row.currency,
      minQuantity: parseQuantity(row.minQuantity),
      validFrom: row.validFrom,
      ...(leadTimeDays === null ? {} : { leadTimeDays }),
      ...(packQuantity > 0n ? { packQuantity } : {}),
      sourceLine: { importId: String(row.importId ?? ""), line: row.line ?? 0 },
    };
    const line: PriceLine =
      row.adderPerKg !== null
        ? {
            ...common,
            pricing: "metal-base-adder",
            adderPerKg: parseMoney(row.adderPerKg),
            conductor: (row.conductor ?? "copper") as ConductorKey,
          }
        : {
            ...common,
            pricing: "unit-price",
            unitPrice: parseMoney(row.unitPrice ?? "0"),
          };
    const list = linesByItem.get(row.itemId);
    if (list) list.push(line);
    else linesByItem.set(row.itemId, [line]);
  }
  return linesByItem;
}

/** Every metal base and currency rate, and the company currency: what every price depends on besides its lines. */
export async function loadPricingReference(
  reader: Database | Transaction = db,
): Promise<PricingReference> {
  // One round trip for the three: every base and rate row, and the setting, as text (the
  // DECIMALs exactly as stored, the days as YYYY-MM-DD).
  const [rows] = (await reader.execute(sql`
    SELECT 'base' AS kind, conductor AS a, currency AS b, CAST(price_per_kg AS CHAR) AS c, CAST(valid_from AS CHAR) AS d FROM metal_base_prices
    UNION ALL SELECT 'rate', currency, NULL, CAST(rate AS CHAR), CAST(valid_from AS CHAR) FROM currency_rates
    UNION ALL SELECT 'currency', value, NULL, NULL, NULL FROM settings WHERE setting_key = 'company_currency'
  `)) as unknown as [ReferenceRow[]];
  const bases: MetalBasePrice[] = [];
  const rates: ExchangeRateEntry[] = [];
  let currency: CurrencyCode = defaultCompanyCurrency;
  for (const row of rows) {
    if (row.kind === "base")
      bases.push({
        conductor: row.a as ConductorKey,
        currency: row.b!,
        pricePerKg: parseMoney(row.c!),
        validFrom: row.d!,
      });
    else if (row.kind === "rate")
      rates.push({ currency: row.a, date: row.d!, rate: parseRate(row.c!) });
    else currency = row.a;
  }
  return { bases, rates, companyCurrency: currency };
}

/** What every price depends on besides its lines. */
export interface PricingReference {
  bases: MetalBasePrice[];
  rates: ExchangeRateEntry[];
  companyCurrency: CurrencyCode;
}

/** A row of `loadPricingReference`'s statement. */
interface ReferenceRow {
  kind: "base" | "rate" | "currency";
  a: string;
  b: string | null;
  c: string | null;
  d: string | null;
}

/**
 * The pricing of the items a design needs, by our item id: their price lines (with the
 * item's stored SKU and unit) and the pricing reference, in two queries side by side.
 * `pricings` is keyed by the stored SKU and leaves out items without a price line
 * (nothing can price them); `reference` comes whatever the items.
 */
export async function loadPricingOfItems(itemIds: readonly number[]): Promise<{
  pricings: Map<string, ItemPricing>;
  reference: PricingReference;
}> {
  const wanted = [...new Set(itemIds)];
  const [rows, reference] = await Promise.all([
    wanted.length === 0
      ? []
      : db
          .select({
            ...priceLineColumns,
            supplier: suppliers.name,
            leadTimeDays: suppliers.leadTimeDays,
            sku: items.sku,
            unit: items.unit,
          })
          .from(priceLines)
          .innerJoin(items, eq(items.id, priceLines.itemId))
          .innerJoin(suppliers, eq(suppliers.id, priceLines.supplierId))
          .where(inArray(priceLines.itemId, wanted))
          .limit(5_000 * wanted.length),
    loadPricingReference(),
  ]);
  const linesByItem = priceLinesByItem(rows);
  const pricings = new Map<string, ItemPricing>();
  for (const row of rows) {
    if (pricings.has(row.sku)) continue;
    pricings.set(row.sku, {
      sku: row.sku,
      itemId: row.itemId,
      unit: row.unit,
      lines: linesByItem.get(row.itemId) ?? [],
      ...reference,
    });
  }
  return { pricings, reference };
}

/**
 * The pricing of several items at once, keyed by the stored SKU (unknown SKUs left out): one query for all
 * their price lines, one for the metal bases, one for the rates — a design of 60 lines is
 * priced with four queries, not 240.
 */
export async function loadItemsPricing(
  skus: readonly string[],
): Promise<Map<string, ItemPricing>> {
  const wanted = [...new Set(skus)];
  if (wanted.length === 0) return new Map();
  const [found, rows, reference] = await Promise.all([
    db
      .select({ id: items.id, sku: items.sku, unit: items.unit })
      .from(items)
      .where(inArray(items.sku, wanted)),
    db
      .select({
        ...priceLineColumns,
        supplier: suppliers.name,
        leadTimeDays: suppliers.leadTimeDays,
      })
      .from(priceLines)
      .innerJoin(items, eq(items.id, priceLines.itemId))
      .innerJoin(suppliers, eq(suppliers.id, priceLines.supplierId))
      .where(inArray(items.sku, wanted))
      .limit(5_000 * wanted.length),
    loadPricingReference(),
  ]);
  const linesByItem = priceLinesByItem(rows);
  return new Map(
    found.map((item) => [
      item.sku,
      {
        sku: item.sku,
        itemId: item.id,
        unit: item.unit,
        lines: linesByItem.get(item.id) ?? [],
        ...reference,
      },
    ]),
  );
}

/**
 * The suppliers' prices for `quantity` (thousandths of the item's unit) on `date`, cheapest
 * first, and the offers that cannot be priced with each reason apart. The one way an item is
 * priced for buying: the item page, the best-prices list, the API and the low-stock e-mail
 * all read it (with the quantity of `quantityToPrice` unless the buyer chose one).
 */
export function bestPricesOf(
  pricing: ItemPricing,
  quantity: bigint,
  date: CalendarDate,
) {
  const result = bestPrices({
    itemId: String(pricing.itemId),
    quantity,
    lines: pricing.lines,
    bases: pricing.bases,
    rates: pricing.rates,
    companyCurrency: pricing.companyCurrency,
    date,
  });
  return {
    sku: pricing.sku,
    unit: pricing.unit,
    quantity: quantityToNumber(quantity),
    date,
    companyCurrency: pricing.companyCurrency,
    prices: result.candidates.map((candidate) => ({
      supplier: candidate.supplier,
      supplierSku: candidate.supplierSku,
      currency: candidate.currency,
      minQuantity: quantityToNumber(candidate.minQuantity),
      quotedUnitPrice: money(candidate.quotedUnitPrice),
      adderPerKg:
        candidate.adderPerKg === null ? null : money(candidate.adderPerKg),
      metalBasePerKg: candidate.metalBase
        ? money(candidate.metalBase.pricePerKg)
        : null,
      /** Set when no base is kept in the supplier's currency: the company base and rate it came from. */
      metalBaseDerivedFrom: isDerivedMetalBase(candidate.metalBase)
        ? {
            pricePerKg: money(candidate.metalBase.derivedFrom.base.pricePerKg),
            currency: candidate.metalBase.derivedFrom.base.currency,
            validFrom: candidate.metalBase.derivedFrom.base.validFrom,
            rate: Number(candidate.metalBase.derivedFrom.rate.rate) / 1_000_000,
            rateFrom: candidate.metalBase.derivedFrom.rate.date,
          }
        : null,
      rate: candidate.rate ? Number(candidate.rate.rate) / 1_000_000 : null,
      unitPrice: money(candidate.landedUnitPrice),
      total: money(candidate.totalForQuantity),
      leadTimeDays: candidate.leadTimeDays,
      /** The pack or spool size the item is sold in, in its unit; null: any quantity. */
      packQuantity:
        candidate.packQuantity === null
          ? null
          : quantityToNumber(candidate.packQuantity),
      source: candidate.sourceLine,
    })),
    cannotPrice: result.cannotPrice.map((offer) => ({
      supplier: offer.supplier,
      supplierSku: offer.supplierSku,
      reasons: offer.problems.map((problem) => problem.message),
    })),
  };
}

/** How far back the item page and the API chart prices. */
export const priceHistoryDays = 365;

/**
 * The unit price of `quantity` over the `priceHistoryDays` days up to `to`, in the company
 * currency, one series per offer (supplier and supplier SKU). Each point's price stands
 * until the next point; `unitPrice: null` is a day with no price, with the reasons.
 */
export function priceHistoryOf(
  pricing: ItemPricing,
  quantity: bigint,
  to: CalendarDate,
) {
  const from = addDays(to, -priceHistoryDays);
  const series = priceHistory({
    itemId: String(pricing.itemId),
    quantity,
    lines: pricing.lines,
    bases: pricing.bases,
    rates: pricing.rates,
    companyCurrency: pricing.companyCurrency,
    from,
    to,
  });
  return {
    unit: pricing.unit,
    quantity: quantityToNumber(quantity),
    companyCurrency: pricing.companyCurrency,
    from,
    to,
    /** Price lines stored for the item, charted or not (0: nothing imported yet). */
    lineCount: pricing.lines.length,
    series: series.map((offer) => ({
      supplier: offer.supplier,
      supplierSku: offer.supplierSku,
      currency: offer.currency,
      points: offer.points.map((point) => ({
        date: point.date,
        unitPrice: point.unitPrice === null ? null : money(point.unitPrice),
        quotedUnitPrice:
          point.quotedUnitPrice === null ? null : money(point.quotedUnitPrice),
        problems: point.problems.map((problem) => problem.message),
      })),
    })),
  };
}
