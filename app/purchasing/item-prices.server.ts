/** The best current prices of one item for a quantity, from the stored price lines (app/pricing does the sums). */
import { eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  currencyRates,
  items,
  metalBasePrices,
  priceLines,
  suppliers,
} from "~/db/schema";
import type { ConductorKey } from "~/engineering/reference-data";
import { bestPrices } from "~/pricing/best-price";
import { parseMoney, parseRate } from "~/pricing/money";
import type { PriceLine } from "~/pricing/price-line";
import { parseQuantity, quantityToNumber } from "~/stock/decimal-amounts";
import { companyCurrency } from "./suppliers.server";

const money = (amount: bigint) => Number(amount) / 10_000;

export async function itemPrices(sku: string, quantity: bigint, date: string) {
  const [item] = await db
    .select({ id: items.id, unit: items.unit })
    .from(items)
    .where(eq(items.sku, sku))
    .limit(1);
  if (!item) return null;
  const rows = await db
    .select({
      supplier: suppliers.name,
      leadTimeDays: suppliers.leadTimeDays,
      supplierSku: priceLines.supplierSku,
      currency: priceLines.currency,
      unitPrice: priceLines.unitPrice,
      adderPerKg: priceLines.adderPerKg,
      conductor: priceLines.conductor,
      minQuantity: priceLines.minQuantity,
      validFrom: priceLines.validFrom,
      importId: priceLines.importId,
      line: priceLines.line,
    })
    .from(priceLines)
    .innerJoin(suppliers, eq(suppliers.id, priceLines.supplierId))
    .where(eq(priceLines.itemId, item.id))
    .limit(5_000);
  const lines: PriceLine[] = rows.map((row) => {
    const common = {
      itemId: String(item.id),
      supplier: row.supplier,
      supplierSku: row.supplierSku,
      currency: row.currency,
      minQuantity: parseQuantity(row.minQuantity),
      validFrom: row.validFrom,
      ...(row.leadTimeDays === null ? {} : { leadTimeDays: row.leadTimeDays }),
      sourceLine: { importId: String(row.importId ?? ""), line: row.line ?? 0 },
    };
    return row.adderPerKg !== null
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
  });
  const bases = (await db.select().from(metalBasePrices)).map((base) => ({
    conductor: base.conductor as ConductorKey,
    currency: base.currency,
    pricePerKg: parseMoney(base.pricePerKg),
    validFrom: base.validFrom,
  }));
  const rates = (await db.select().from(currencyRates)).map((rate) => ({
    currency: rate.currency,
    date: rate.validFrom,
    rate: parseRate(rate.rate),
  }));
  const currency = await companyCurrency();
  const result = bestPrices({
    itemId: String(item.id),
    quantity,
    lines,
    bases,
    rates,
    companyCurrency: currency,
    date,
  });
  return {
    sku,
    unit: item.unit,
    quantity: quantityToNumber(quantity),
    date,
    companyCurrency: currency,
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
      rate: candidate.rate ? Number(candidate.rate.rate) / 1_000_000 : null,
      unitPrice: money(candidate.landedUnitPrice),
      total: money(candidate.totalForQuantity),
      leadTimeDays: candidate.leadTimeDays,
      source: candidate.sourceLine,
    })),
    cannotPrice: result.cannotPrice.map((offer) => ({
      supplier: offer.supplier,
      supplierSku: offer.supplierSku,
      reasons: offer.problems.map((problem) => problem.message),
    })),
  };
}
