/**
 * The movement journal as a CSV file, machine-neutral whatever the person's own formats:
 * times in ISO 8601 UTC, quantities as plain numbers with a dot and no grouping, the unit
 * in its own column. Text cells are guarded against formula injection (`csvLines`).
 * Pure: no I/O.
 */
import type { CsvCell } from "~/lib/csv-file";

/** What one journal row brings to the file (decimals as the database's text). */
export interface JournalCsvMovement {
  id: number;
  createdAt: Date;
  type: string;
  sku: string;
  itemName: string;
  unit: string;
  lot: string | null;
  location: string;
  quantity: string;
  itemOnHandAfter: string;
  unitCost: string | null;
  countedQuantity: string | null;
  grossKg: string | null;
  reference: string | null;
  purchaseOrderId: number | null;
  note: string | null;
  user: string;
}

/** A decimal of the database as a number cell, so a negative one is never escaped as text. */
const decimal = (text: string | null): number | null =>
  text === null ? null : Number(text);

const columns: {
  header: string;
  cell: (movement: JournalCsvMovement) => CsvCell;
}[] = [
  { header: "movement", cell: (movement) => movement.id },
  {
    header: "time (UTC)",
    cell: (movement) => movement.createdAt.toISOString(),
  },
  { header: "type", cell: (movement) => movement.type },
  { header: "sku", cell: (movement) => movement.sku },
  { header: "item", cell: (movement) => movement.itemName },
  { header: "lot", cell: (movement) => movement.lot },
  { header: "location", cell: (movement) => movement.location },
  { header: "change", cell: (movement) => decimal(movement.quantity) },
  { header: "unit", cell: (movement) => movement.unit },
  {
    header: "item on hand after",
    cell: (movement) => decimal(movement.itemOnHandAfter),
  },
  {
    header: "unit cost (company currency)",
    cell: (movement) => decimal(movement.unitCost),
  },
  { header: "counted", cell: (movement) => decimal(movement.countedQuantity) },
  { header: "gross kg", cell: (movement) => decimal(movement.grossKg) },
  { header: "reference", cell: (movement) => movement.reference },
  { header: "purchase order id", cell: (movement) => movement.purchaseOrderId },
  { header: "note", cell: (movement) => movement.note },
  { header: "by", cell: (movement) => movement.user },
];

export const journalCsvHeaders = columns.map((column) => column.header);

export function journalCsvRow(movement: JournalCsvMovement): CsvCell[] {
  return columns.map((column) => column.cell(movement));
}

/** "turnledger-journal-2026-12-03.csv", the day in UTC. */
export function journalCsvFilename(now: Date): string {
  return `turnledger-journal-${now.toISOString().slice(0, 10)}.csv`;
}
