/**
 * Draft purchase requests from the open low-stock alerts: per supplier, the
 * alerted items that supplier quotes, the quantity to order and the
 * supplier's own SKU and price for it.
 */
import { eq, isNotNull } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, stockAlerts } from "~/db/schema";
import { bestPrices } from "~/pricing/best-price";
import { loadItemPricing } from "~/purchasing/item-prices.server";
import { parseQuantity } from "~/lib/decimal-amounts";
import type { PurchaseRequestLine } from "./low-stock";
import { suggestedOrderQuantity } from "~/stock/reorder-quantities";
import { todayUtc } from "~/lib/calendar-days";

/** Every open alert's item priced by every supplier that quotes it, grouped by supplier. */
export async function purchaseRequestsBySupplier(): Promise<
  Map<string, PurchaseRequestLine[]>
> {
  const open = await db
    .select({
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      onHand: items.onHand,
      reserved: items.reserved,
      held: items.held,
      reorderPoint: items.reorderPoint,
      reorderQuantity: items.reorderQuantity,
    })
    .from(stockAlerts)
    .innerJoin(items, eq(items.id, stockAlerts.itemId))
    .where(isNotNull(stockAlerts.openItemId))
    .orderBy(items.sku)
    .limit(2_000);
  const bySupplier = new Map<string, PurchaseRequestLine[]>();
  const today = todayUtc();
  for (const item of open) {
    const quantity = suggestedOrderQuantity({
      available:
        parseQuantity(item.onHand) -
        parseQuantity(item.reserved) -
        parseQuantity(item.held),
      reorderPoint: parseQuantity(item.reorderPoint),
      reorderQuantity: parseQuantity(item.reorderQuantity),
    });
    const pricing = await loadItemPricing(item.sku);
    if (!pricing || quantity <= 0n) continue;
    const candidates = bestPrices({
      itemId: String(pricing.itemId),
      quantity,
      lines: pricing.lines,
      bases: pricing.bases,
      rates: pricing.rates,
      companyCurrency: pricing.companyCurrency,
      date: today,
    }).candidates;
    // The cheapest offer of each supplier for this item.
    const seen = new Set<string>();
    for (const candidate of candidates) {
      if (seen.has(candidate.supplier)) continue;
      seen.add(candidate.supplier);
      const lines = bySupplier.get(candidate.supplier) ?? [];
      lines.push({
        sku: item.sku,
        name: item.name,
        supplierSku: candidate.supplierSku,
        quantity,
        unit: item.unit,
        unitPrice: candidate.quotedUnitPrice,
        currency: candidate.currency,
      });
      bySupplier.set(candidate.supplier, lines);
    }
  }
  return bySupplier;
}
