/**
 * Price lines as a CSV file (what one price-list import wrote), machine-neutral: prices
 * and quantities exactly as stored with a decimal point and no grouping, days as
 * YYYY-MM-DD. A wire line priced on the metal base has no unit price and an adder per
 * kg with its conductor. Pure.
 */
import { csvFile } from "~/lib/csv-file";

export interface PriceLineCsvRow {
  line: number | null;
  supplierSku: string;
  itemSku: string;
  unit: string;
  minQuantity: string;
  packQuantity: string | null;
  currency: string;
  unitPrice: string | null;
  adderPerKg: string | null;
  conductor: string | null;
  validFrom: string;
  leadTimeDays: number | null;
}

export const priceLinesCsvFields = [
  "file_row",
  "supplier_sku",
  "item_sku",
  "unit",
  "min_quantity",
  "pack_quantity",
  "currency",
  "unit_price",
  "adder_per_kg",
  "metal_base_conductor",
  "valid_from",
  "lead_time_days",
] as const;

export function priceLinesCsv(rows: readonly PriceLineCsvRow[]): string {
  return csvFile(
    priceLinesCsvFields,
    rows.map((row) => [
      row.line,
      row.supplierSku,
      row.itemSku,
      row.unit,
      row.minQuantity,
      row.packQuantity,
      row.currency,
      row.unitPrice,
      row.adderPerKg,
      row.conductor,
      row.validFrom,
      row.leadTimeDays,
    ]),
  );
}

/** "price-lines-import-12.csv". */
export function priceLinesCsvFilename(importId: number): string {
  return `price-lines-import-${importId}.csv`;
}
