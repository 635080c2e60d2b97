/**
 * The writing half of a price-list import: one transaction on one pooled
 * connection, fed batch by batch while the file is read, rows sent as
 * multi-row `INSERT … VALUES ?` statements that mysql2 escapes in one pass
 * (decision 008: a 100,000-row file was too slow and too memory-hungry through
 * the query builder's per-value parameters). Everything or nothing: the caller
 * abandons the import (rollback) on any invalid row or error.
 */
import type {
  PoolConnection,
  ResultSetHeader,
  RowDataPacket,
} from "mysql2/promise";
import { pool } from "~/db/client.server";
import { ENAMELS } from "~/engineering/reference-data";
import type { PriceListRow } from "~/price-lists/price-list-rows";
import type { MatchedBy } from "./price-import-preview";

/** A price row with the catalogue item it belongs to, or the item it creates. */
export interface MatchedRow {
  row: PriceListRow;
  itemId: number | null;
  newItem: { sku: string; name: string } | null;
  by: MatchedBy;
}

export interface PriceImportStart {
  supplierId: number;
  fileName: string;
  fileSha256: string;
  userId: string;
  /** Our field → the file's header, as stored with the import. */
  mappingFields: string;
  /** Conductor of each catalogue wire item, for adder lines. */
  conductorOf: ReadonlyMap<number, string>;
}

// About 150 bytes a row: far below max_allowed_packet, few round trips.
const rowsPerStatement = 2_000;

function typicalEnamel(thermalClass: number): string {
  return (
    ENAMELS.find(
      (enamel) =>
        enamel.thermalClassMin <= thermalClass &&
        thermalClass <= enamel.thermalClassMax,
    )?.key ?? "polyesterimide"
  );
}

function sizeOrGradeOf(row: PriceListRow): string {
  if (row.kind !== "wire") return "";
  return `${row.standard === "AWG" ? "AWG " : ""}${row.size}${row.standard === "IEC" ? " mm" : ""}`;
}

/**
 * An import being written: `open` starts the transaction and records the
 * import, `write` adds a batch of matched rows, `finish` commits, `abandon`
 * rolls everything back. Items created for new supplier SKUs are remembered
 * across batches, so a SKU whose breaks are spread over the file gets one item.
 */
export class PriceImportWriter {
  private rowCount = 0;
  private closed = false;
  private readonly createdItemIds = new Map<string, number>();
  private readonly mappedSkus = new Set<string>();

  private constructor(
    private readonly connection: PoolConnection,
    private readonly start: PriceImportStart,
    readonly importId: number,
    private readonly now: Date,
  ) {}

  static async open(start: PriceImportStart): Promise<PriceImportWriter> {
    const connection = await pool.getConnection();
    const now = new Date();
    try {
      // Run through retryWriteConflicts by importPriceList: a conflict reruns the import.
      // eslint-disable-next-line no-restricted-syntax -- see above
      await connection.beginTransaction();
      const [created] = await connection.query<ResultSetHeader>(
        "INSERT INTO price_imports (supplier_id, file_name, file_sha256, row_count, created_items, mapping, user_id, created_at) VALUES (?, ?, ?, 0, 0, ?, ?, ?)",
        [
          start.supplierId,
          start.fileName.slice(0, 200),
          start.fileSha256,
          start.mappingFields,
          start.userId,
          now,
        ],
      );
      return new PriceImportWriter(connection, start, created.insertId, now);
    } catch (error) {
      await connection.rollback().catch(() => undefined);
      connection.release();
      throw error;
    }
  }

  async write(matched: MatchedRow[]): Promise<void> {
    await this.createNewItems(matched);
    const unmapped: MatchedRow[] = [];
    for (const entry of matched) {
      const key = entry.row.supplierSku.toLowerCase();
      if (this.mappedSkus.has(key)) continue;
      this.mappedSkus.add(key);
      unmapped.push(entry);
    }
    await this.insertInBatches(
      "INSERT INTO supplier_items (supplier_id, supplier_sku, item_id) VALUES ? ON DUPLICATE KEY UPDATE item_id = VALUES(item_id)",
      unmapped,
      (entry) => [this.start.supplierId, entry.row.supplierSku, entry.itemId],
    );
    await this.insertInBatches(
      `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, lead_time_days, pack_quantity, import_id, line) VALUES ?
       ON DUPLICATE KEY UPDATE item_id = VALUES(item_id), currency = VALUES(currency), unit_price = VALUES(unit_price),
         adder_per_kg = VALUES(adder_per_kg), conductor = VALUES(conductor), lead_time_days = VALUES(lead_time_days),
         pack_quantity = VALUES(pack_quantity), import_id = VALUES(import_id), line = VALUES(line)`,
      matched,
      ({ row, itemId }) => [
        this.start.supplierId,
        itemId,
        row.supplierSku,
        row.currency,
        row.price,
        row.adderPerKg,
        // An adder prices on the base of the wire's own metal (new wire items are copper).
        row.adderPerKg !== null
          ? (this.start.conductorOf.get(itemId!) ?? "copper")
          : null,
        row.minQuantity,
        row.validFrom,
        row.leadTimeDays,
        row.packQuantity,
        this.importId,
        row.line,
      ],
    );
    this.rowCount += matched.length;
  }

  /** Commits, saving the mapping to offer with the supplier's next file. */
  async finish(saved: {
    headerSignature: string;
    mapping: string;
  }): Promise<{ importId: number; rows: number; newItems: number }> {
    try {
      await this.connection.query(
        "UPDATE price_imports SET row_count = ?, created_items = ? WHERE id = ?",
        [this.rowCount, this.createdItemIds.size, this.importId],
      );
      await this.connection.query(
        "INSERT INTO supplier_mappings (supplier_id, header_signature, mapping) VALUES (?, ?, ?) ON DUPLICATE KEY UPDATE header_signature = VALUES(header_signature), mapping = VALUES(mapping)",
        [this.start.supplierId, saved.headerSignature, saved.mapping],
      );
      await this.connection.commit();
    } catch (error) {
      await this.abandon();
      throw error;
    }
    this.closed = true;
    this.connection.release();
    return {
      importId: this.importId,
      rows: this.rowCount,
      newItems: this.createdItemIds.size,
    };
  }

  /** Rolls the whole import back (again: nothing happens). */
  async abandon(): Promise<void> {
    if (this.closed) return;
    this.closed = true;
    await this.connection.rollback().catch(() => undefined);
    this.connection.release();
  }

  private async insertInBatches<T>(
    statement: string,
    entries: readonly T[],
    toValues: (entry: T) => unknown[],
  ): Promise<void> {
    for (let start = 0; start < entries.length; start += rowsPerStatement) {
      const values: unknown[][] = [];
      const end = Math.min(entries.length, start + rowsPerStatement);
      for (let index = start; index < end; index += 1)
        values.push(toValues(entries[index]!));
      await this.connection.query(statement, [values]);
    }
  }

  /** Gives every row waiting for a new item its item, creating one item per new supplier SKU. */
  private async createNewItems(matched: MatchedRow[]): Promise<void> {
    const waiting = new Map<string, MatchedRow[]>();
    for (const entry of matched) {
      if (!entry.newItem) continue;
      const known = this.createdItemIds.get(entry.newItem.sku);
      if (known !== undefined) {
        entry.itemId = known;
        continue;
      }
      const same = waiting.get(entry.newItem.sku);
      if (same) same.push(entry);
      else waiting.set(entry.newItem.sku, [entry]);
    }
    if (waiting.size === 0) return;
    const firsts = [...waiting.values()].map((same) => same[0]!);
    await this.connection.query(
      "INSERT INTO items (sku, name, kind, unit, size_or_grade, created_at, updated_at) VALUES ? ON DUPLICATE KEY UPDATE sku = sku",
      [
        firsts.map(({ row, newItem }) => [
          newItem!.sku,
          newItem!.name.slice(0, 160),
          row.kind,
          row.unit,
          sizeOrGradeOf(row),
          this.now,
          this.now,
        ]),
      ],
    );
    const [ids] = await this.connection.query<RowDataPacket[]>(
      "SELECT id, sku FROM items WHERE sku IN (?)",
      [firsts.map(({ newItem }) => newItem!.sku)],
    );
    const idBySku = new Map<string, number>();
    for (const found of ids)
      idBySku.set((found.sku as string).toLowerCase(), found.id as number);
    for (const [sku, same] of waiting) {
      const itemId = idBySku.get(sku.toLowerCase())!;
      this.createdItemIds.set(sku, itemId);
      for (const entry of same) entry.itemId = itemId;
    }
    const wires = firsts.filter((entry) => entry.row.kind === "wire");
    if (wires.length > 0)
      await this.connection.query(
        "INSERT INTO wire_items (item_id, conductor, standard, size_label, insulation, thermal_class, enamel) VALUES ? ON DUPLICATE KEY UPDATE item_id = item_id",
        [
          wires.map((entry) => {
            const row = entry.row as Extract<PriceListRow, { kind: "wire" }>;
            const thermalClass = row.thermalClass ?? 155;
            return [
              entry.itemId,
              "copper",
              row.standard,
              row.size,
              row.insulation,
              thermalClass,
              typicalEnamel(thermalClass),
            ];
          }),
        ],
      );
  }
}
