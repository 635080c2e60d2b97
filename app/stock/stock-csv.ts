/**
 * The stock list as a CSV file: one row per item, quantities as plain numbers
 * with the unit in its own column, money in the company currency. Text cells
 * are guarded against formula injection (`csvFile`). Pure: no I/O.
 */
import { csvFile } from "~/lib/csv-file";
import { roundedAmountText } from "~/lib/decimal-amounts";

export { stockCsvRowLimit } from "./stock-csv-row-limit";

/** What the export needs of each item (the stock list's rows). */
export interface StockCsvItem {
  sku: string;
  name: string;
  kind: string;
  sizeOrGrade: string;
  unit: string;
  onHand: number;
  reserved: number;
  /** The free stock of lots on hold (decision 039). */
  held: number;
  available: number;
  onOrder: number;
  reorderPoint: number;
  reorderQuantity: number;
  belowReorder: boolean;
  averageCost: number;
  value: number;
  active: boolean;
}

type Cell = string | number;

const columns: { header: string; cell: (item: StockCsvItem) => Cell }[] = [
  { header: "sku", cell: (item) => item.sku },
  { header: "name", cell: (item) => item.name },
  { header: "kind", cell: (item) => item.kind },
  { header: "size or grade", cell: (item) => item.sizeOrGrade },
  // The stock unit as stored (kg, pcs, m), not as words: a spreadsheet or a script
  // reads this column back, so it stays the code the API and the import take.
  { header: "unit", cell: (item) => item.unit },
  { header: "on hand", cell: (item) => item.onHand },
  { header: "reserved", cell: (item) => item.reserved },
  { header: "on hold", cell: (item) => item.held },
  { header: "available", cell: (item) => item.available },
  { header: "on order", cell: (item) => item.onOrder },
  { header: "reorder point", cell: (item) => item.reorderPoint },
  { header: "reorder quantity", cell: (item) => item.reorderQuantity },
  {
    header: "below reorder point",
    cell: (item) => (item.belowReorder ? "yes" : "no"),
  },
  {
    header: "average cost per unit (company currency)",
    cell: (item) => item.averageCost,
  },
  {
    header: "value (company currency)",
    // To the cent, half away from zero on the exact amount (decision 006).
    cell: (item) => Number(roundedAmountText(item.value, 2)),
  },
  { header: "archived", cell: (item) => (item.active ? "no" : "yes") },
];

export const stockCsvHeaders = columns.map((column) => column.header);

/**
 * The CSV text, with a byte-order mark so spreadsheet programs read it as
 * UTF-8 (sizes carry × and Ø) and CRLF line ends as RFC 4180 has them.
 */
export function stockCsv(items: readonly StockCsvItem[]): string {
  const rows = items.map((item) => columns.map((column) => column.cell(item)));
  return csvFile(stockCsvHeaders, rows);
}

/** "turnledger-stock-2026-12-02.csv": the day in UTC, as every time in Turnledger. */
export function stockCsvFilename(now: Date): string {
  return `turnledger-stock-${now.toISOString().slice(0, 10)}.csv`;
}
