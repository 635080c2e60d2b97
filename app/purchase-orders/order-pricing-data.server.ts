/**
 * What pricing a purchase order's lines reads from the database: the supplier and its
 * settings, the items named by SKU, the supplier's price lines for them (with the price
 * lines' own lead times), the supplier's own SKUs, every metal base and rate, and the
 * company currency. Read through the caller's transaction, so a write decides on what it
 * read itself.
 */
import { and, eq, inArray } from "drizzle-orm";
import type { Database, Transaction } from "~/db/client.server";
import { items, priceLines, supplierItems, suppliers } from "~/db/schema";
import type { MetalBaseFixing } from "~/db/tables/purchase-order-enums";
import type { ExchangeRateEntry } from "~/pricing/currency";
import type { MetalBasePrice } from "~/pricing/metal-base";
import type { PriceLine } from "~/pricing/price-line";
import {
  loadPricingReference,
  priceLineColumns,
  priceLinesByItem,
} from "~/purchasing/item-prices.server";

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

/** The columns of an item an order line needs. */
export const orderItemColumns = {
  id: items.id,
  sku: items.sku,
  name: items.name,
  unit: items.unit,
  active: items.active,
};

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
    .select(orderItemColumns)
    .from(items)
    .where(inArray(items.sku, wanted));
  return new Map(rows.map((row) => [row.sku.toUpperCase(), row]));
}

/**
 * Everything the supplier's prices for these items depend on. The price lines carry their
 * own lead time (`price_lines.lead_time_days`); the supplier's is applied per order line.
 */
export async function loadOrderPricingData(
  reader: Reader,
  supplier: OrderSupplier,
  itemIds: readonly number[],
): Promise<OrderPricingData> {
  const ids = [...new Set(itemIds)];
  const [rows, skuRows, reference] = await Promise.all([
    ids.length === 0
      ? []
      : reader
          .select({
            ...priceLineColumns,
            leadTimeDays: priceLines.leadTimeDays,
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
    loadPricingReference(reader),
  ]);
  return {
    supplier,
    linesByItem: priceLinesByItem(
      rows.map((row) => ({ ...row, supplier: supplier.name })),
    ),
    supplierSkus: new Map(skuRows.map((row) => [row.itemId, row.supplierSku])),
    ...reference,
  };
}
