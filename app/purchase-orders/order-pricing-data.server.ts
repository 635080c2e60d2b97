/**
 * What pricing a purchase order's lines reads from the database: the supplier and its
 * settings, the items named by SKU, the supplier's price lines for them (with the price
 * lines' own lead times), the supplier's own SKUs, every metal base and rate, and the
 * company currency. Read through the caller's transaction, so a write decides on what it
 * read itself.
 */
import { and, eq, inArray } from "drizzle-orm";
import type { Database, Transaction } from "~/db/client.server";
import {
  currencyRates,
  items,
  metalBasePrices,
  priceLines,
  supplierItems,
  suppliers,
} from "~/db/schema";
import type { MetalBaseFixing } from "~/db/tables/purchase-order-enums";
import type { ConductorKey } from "~/engineering/reference-data";
import { parseQuantity } from "~/lib/decimal-amounts";
import type { ExchangeRateEntry } from "~/pricing/currency";
import type { MetalBasePrice } from "~/pricing/metal-base";
import { parseMoney, parseRate } from "~/pricing/money";
import type { PriceLine } from "~/pricing/price-line";
import { companyCurrency } from "~/purchasing/suppliers.server";

type Reader = Database | Transaction;

export interface OrderSupplier {
  id: number;
  name: string;
  currency: string;
  leadTimeDays: number | null;
  metalBaseFixedAt: MetalBaseFixing;
  orderEmail: string | null;
  email: string | null;
}

export interface OrderItem {
  id: number;
  sku: string;
  name: string;
  unit: string;
  active: boolean;
}

export interface OrderPricingData {
  supplier: OrderSupplier;
  /** The supplier's price lines by our item id. */
  linesByItem: Map<number, PriceLine[]>;
  /** The supplier's own SKU by our item id (from its imports), for lines priced by hand. */
  supplierSkus: Map<number, string>;
  bases: MetalBasePrice[];
  rates: ExchangeRateEntry[];
  companyCurrency: string;
}

/** The supplier (null when there is none with the id). */
export async function findOrderSupplier(
  reader: Reader,
  supplierId: number,
): Promise<OrderSupplier | null> {
  const [supplier] = await reader
    .select({
      id: suppliers.id,
      name: suppliers.name,
      currency: suppliers.currency,
      leadTimeDays: suppliers.leadTimeDays,
      metalBaseFixedAt: suppliers.metalBaseFixedAt,
      orderEmail: suppliers.orderEmail,
      email: suppliers.email,
    })
    .from(suppliers)
    .where(eq(suppliers.id, supplierId))
    .limit(1);
  return supplier ?? null;
}

/** Items by SKU as typed (the database ignores letter case), keyed by the upper-case SKU. */
export async function findItemsBySku(
  reader: Reader,
  skus: readonly string[],
): Promise<Map<string, OrderItem>> {
  const wanted = [...new Set(skus)];
  if (wanted.length === 0) return new Map();
  const rows = await reader
    .select({
      id: items.id,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      active: items.active,
    })
    .from(items)
    .where(inArray(items.sku, wanted));
  return new Map(rows.map((row) => [row.sku.toUpperCase(), row]));
}

/** Everything the supplier's prices for these items depend on. */
export async function loadOrderPricingData(
  reader: Reader,
  supplier: OrderSupplier,
  itemIds: readonly number[],
): Promise<OrderPricingData> {
  const ids = [...new Set(itemIds)];
  const [rows, skuRows, baseRows, rateRows, currency] = await Promise.all([
    ids.length === 0
      ? []
      : reader
          .select({
            itemId: priceLines.itemId,
            supplierSku: priceLines.supplierSku,
            currency: priceLines.currency,
            unitPrice: priceLines.unitPrice,
            adderPerKg: priceLines.adderPerKg,
            conductor: priceLines.conductor,
            minQuantity: priceLines.minQuantity,
            validFrom: priceLines.validFrom,
            leadTimeDays: priceLines.leadTimeDays,
            importId: priceLines.importId,
            line: priceLines.line,
          })
          .from(priceLines)
          .where(
            and(
              eq(priceLines.supplierId, supplier.id),
              inArray(priceLines.itemId, ids),
            ),
          )
          .limit(5_000 * ids.length),
    ids.length === 0
      ? []
      : reader
          .select({
            itemId: supplierItems.itemId,
            supplierSku: supplierItems.supplierSku,
          })
          .from(supplierItems)
          .where(
            and(
              eq(supplierItems.supplierId, supplier.id),
              inArray(supplierItems.itemId, ids),
            ),
          ),
    reader
      .select({
        conductor: metalBasePrices.conductor,
        currency: metalBasePrices.currency,
        pricePerKg: metalBasePrices.pricePerKg,
        validFrom: metalBasePrices.validFrom,
      })
      .from(metalBasePrices),
    reader
      .select({
        currency: currencyRates.currency,
        rate: currencyRates.rate,
        validFrom: currencyRates.validFrom,
      })
      .from(currencyRates),
    companyCurrency(),
  ]);
  const linesByItem = new Map<number, PriceLine[]>();
  for (const row of rows) {
    const common = {
      itemId: String(row.itemId),
      supplier: supplier.name,
      supplierSku: row.supplierSku,
      currency: row.currency,
      minQuantity: parseQuantity(row.minQuantity),
      validFrom: row.validFrom,
      ...(row.leadTimeDays === null ? {} : { leadTimeDays: row.leadTimeDays }),
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
  return {
    supplier,
    linesByItem,
    supplierSkus: new Map(skuRows.map((row) => [row.itemId, row.supplierSku])),
    bases: baseRows.map((base) => ({
      conductor: base.conductor as ConductorKey,
      currency: base.currency,
      pricePerKg: parseMoney(base.pricePerKg),
      validFrom: base.validFrom,
    })),
    rates: rateRows.map((rate) => ({
      currency: rate.currency,
      date: rate.validFrom,
      rate: parseRate(rate.rate),
    })),
    companyCurrency: currency,
  };
}
