/**
 * The where-used tables as CSV downloads (the one CSV writer, app/lib/csv-file.ts):
 * a lot's build orders, and a build order's lots. Quantities are plain numbers in the
 * unit named in their own column, times in ISO 8601 UTC. Pure.
 */
import { csvFile } from "~/lib/csv-file";

interface UseRow {
  reference: string;
  design: string;
  revision: number;
  motorQuantity: number;
  issued: number;
  returned: number;
  net: number;
  unit: string;
  firstIssuedAt: string | null;
  lastMovementAt: string;
}

export function lotWhereUsedCsv(
  lot: { number: string; sku: string },
  uses: readonly UseRow[],
): string {
  return csvFile(
    [
      "lot",
      "sku",
      "build_order",
      "design",
      "revision",
      "motors",
      "issued",
      "returned",
      "net",
      "unit",
      "first_issued_at",
      "last_movement_at",
    ],
    uses.map((use) => [
      lot.number,
      lot.sku,
      use.reference,
      use.design,
      use.revision,
      use.motorQuantity,
      use.issued,
      use.returned,
      use.net,
      use.unit,
      use.firstIssuedAt,
      use.lastMovementAt,
    ]),
  );
}

interface LotRow {
  lot: string;
  sku: string;
  itemName: string;
  supplier: { name: string } | null;
  supplierBatch: string | null;
  issued: number;
  returned: number;
  net: number;
  unit: string;
  firstIssuedAt: string | null;
  lastMovementAt: string;
}

export function buildOrderLotsCsv(
  reference: string,
  rows: readonly LotRow[],
): string {
  return csvFile(
    [
      "build_order",
      "sku",
      "item",
      "lot",
      "supplier",
      "supplier_lot",
      "issued",
      "returned",
      "net",
      "unit",
      "first_issued_at",
      "last_movement_at",
    ],
    rows.map((row) => [
      reference,
      row.sku,
      row.itemName,
      row.lot,
      row.supplier?.name ?? null,
      row.supplierBatch,
      row.issued,
      row.returned,
      row.net,
      row.unit,
      row.firstIssuedAt,
      row.lastMovementAt,
    ]),
  );
}

/** A file name of safe characters only: "lot-S24101-where-used.csv". */
export function csvName(...parts: string[]): string {
  return `${parts
    .join("-")
    .replace(/[^A-Za-z0-9._-]+/g, "_")
    .slice(0, 100)}.csv`;
}
