/**
 * The build-order list as a CSV file, machine-neutral: the made time in ISO 8601 UTC, the
 * planned start as YYYY-MM-DD, the status as its code. Pure: no I/O.
 */
import type { CsvCell } from "~/lib/csv-file";
import { buildOrderReference } from "./build-order-status";

export interface BuildOrderCsvRow {
  id: number;
  status: string;
  design: { id: number; name: string };
  revision: number;
  quantity: number;
  plannedStart: string | null;
  createdBy: string;
  createdAt: string;
  note: string | null;
}

const columns: { header: string; cell: (row: BuildOrderCsvRow) => CsvCell }[] =
  [
    { header: "order", cell: (row) => buildOrderReference(row.id) },
    { header: "design", cell: (row) => row.design.name },
    { header: "revision", cell: (row) => row.revision },
    { header: "motors", cell: (row) => row.quantity },
    { header: "status", cell: (row) => row.status },
    { header: "planned start", cell: (row) => row.plannedStart },
    { header: "made by", cell: (row) => row.createdBy },
    { header: "made (UTC)", cell: (row) => row.createdAt },
    { header: "note", cell: (row) => row.note },
  ];

export const buildOrderCsvHeaders = columns.map((column) => column.header);

export function buildOrderCsvRow(row: BuildOrderCsvRow): CsvCell[] {
  return columns.map((column) => column.cell(row));
}

/** "turnledger-build-orders-2026-12-03.csv", the day in UTC. */
export function buildOrderCsvFilename(now: Date): string {
  return `turnledger-build-orders-${now.toISOString().slice(0, 10)}.csv`;
}
