/**
 * The blind count sheet's lines: what to count and where, grouped by location, with no
 * book figure (the query behind it does not read one, and this shape has no place for
 * it). Pure.
 */
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";

export interface BlindLineRow {
  id: number;
  location: string;
  locationName: string;
  sku: string;
  name: string;
  kind: string;
  unit: string;
  lot: string | null;
  lotTareKg: string | null;
  counted: string | null;
  grossKg: string | null;
  tareKg: string | null;
  recountRequested: boolean;
  addedDuringCount: boolean;
}

export interface CountSheetLine {
  id: number;
  sku: string;
  name: string;
  unit: string;
  lot: string | null;
  /** Wire kept in kg: may be counted by weighing the spool. */
  weighable: boolean;
  /** The empty spool's weight on record, kg: the weighing's default tare. */
  lotTareKg: number | null;
  /** What this sheet's counter entered (not the book). */
  counted: number | null;
  weighed: { grossKg: number; tareKg: number } | null;
  recountRequested: boolean;
  addedDuringCount: boolean;
}

export interface CountSheetLocation {
  code: string;
  name: string;
  lines: CountSheetLine[];
}

const number = (text: string | null) =>
  text === null ? null : quantityToNumber(parseQuantity(text));

export function countSheet(
  rows: readonly BlindLineRow[],
): CountSheetLocation[] {
  const groups = new Map<string, CountSheetLocation>();
  for (const row of rows) {
    let group = groups.get(row.location);
    if (!group) {
      group = { code: row.location, name: row.locationName, lines: [] };
      groups.set(row.location, group);
    }
    const grossKg = number(row.grossKg);
    const tareKg = number(row.tareKg);
    group.lines.push({
      id: row.id,
      sku: row.sku,
      name: row.name,
      unit: row.unit,
      lot: row.lot,
      weighable: row.kind === "wire" && row.unit === "kg",
      lotTareKg: number(row.lotTareKg),
      counted: number(row.counted),
      weighed: grossKg !== null && tareKg !== null ? { grossKg, tareKg } : null,
      recountRequested: row.recountRequested,
      addedDuringCount: row.addedDuringCount,
    });
  }
  return [...groups.values()];
}

/** The id of the line after `lineId` on the sheet, in reading order; null after the last. */
export function nextLineId(
  locations: readonly CountSheetLocation[],
  lineId: number,
): number | null {
  const ids = locations.flatMap((location) =>
    location.lines.map((line) => line.id),
  );
  const index = ids.indexOf(lineId);
  return index >= 0 && index + 1 < ids.length ? ids[index + 1]! : null;
}
