/**
 * Importing a supplier's price list: read and check the file (app/price-lists),
 * match each row to a catalogue item (by the supplier's SKU, then by wire size
 * or magnet grade), and either answer a preview (dry run) or write everything
 * in one transaction — all rows or none. The same file imported again for the
 * same supplier changes nothing.
 */
import { createHash } from "node:crypto";
import { and, eq, inArray, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { isDuplicateKey } from "~/db/database-errors";
import {
  items,
  magnetGrades,
  magnetItems,
  priceImports,
  priceLines,
  supplierItems,
  supplierMappings,
  suppliers,
  wireItems,
} from "~/db/schema";
import { ENAMELS } from "~/engineering/reference-data";
import {
  columnMappingToFields,
  type ColumnMapping,
} from "~/price-lists/column-mapping";
import type { LineError } from "~/price-lists/parse-price-list";
import { summarisePreview } from "~/price-lists/price-list-preview";
import type { PriceListRow } from "~/price-lists/price-list-rows";
import { readPriceListFile } from "~/price-lists/read-price-list";
import { StockError } from "~/stock/stock-errors";

export type ImportOutcome =
  | { kind: "refused"; messages: string[] }
  | { kind: "invalid"; valid: number; invalid: LineError[] }
  | {
      kind: "preview";
      preview: ReturnType<typeof summarisePreview> & {
        matched: number;
        newItems: number;
      };
    }
  | { kind: "already-imported"; importId: number }
  | {
      kind: "imported";
      importId: number;
      rows: number;
      newItems: number;
      supplier: string;
      fileName: string;
    };

interface MatchedRow {
  row: PriceListRow;
  itemId: number | null;
  newItem: { sku: string; name: string } | null;
}

const batchSize = 1_000;

function newItemSku(supplierId: number, supplierSku: string): string {
  return `S${supplierId}-${supplierSku}`
    .replace(/[^A-Za-z0-9._/-]/g, "-")
    .slice(0, 40);
}

function typicalEnamel(thermalClass: number): string {
  return (
    ENAMELS.find(
      (enamel) =>
        enamel.thermalClassMin <= thermalClass &&
        thermalClass <= enamel.thermalClassMax,
    )?.key ?? "polyesterimide"
  );
}

/** Finds the catalogue item of every row; rows that cannot be matched or created become line errors. */
async function matchRows(
  supplierId: number,
  rows: PriceListRow[],
): Promise<{
  matched: MatchedRow[];
  errors: LineError[];
  conductorOf: Map<number, string>;
}> {
  const known = new Map<string, number>();
  for (const mapping of await db
    .select({
      supplierSku: supplierItems.supplierSku,
      itemId: supplierItems.itemId,
    })
    .from(supplierItems)
    .where(eq(supplierItems.supplierId, supplierId))) {
    known.set(mapping.supplierSku.toLowerCase(), mapping.itemId);
  }
  const wires = await db
    .select({
      id: items.id,
      standard: wireItems.standard,
      size: wireItems.sizeLabel,
      insulation: wireItems.insulation,
      conductor: wireItems.conductor,
    })
    .from(wireItems)
    .innerJoin(
      items,
      and(eq(items.id, wireItems.itemId), eq(items.active, true)),
    );
  const gradeKeys = new Map<string, string>();
  for (const grade of await db
    .select({
      key: magnetGrades.key,
      name: magnetGrades.name,
      aliases: magnetGrades.aliases,
    })
    .from(magnetGrades)) {
    for (const name of [grade.key, grade.name, ...grade.aliases.split(",")])
      if (name) gradeKeys.set(name.toLowerCase(), grade.key);
  }
  const magnetsByGrade = new Map<string, number[]>();
  for (const magnet of await db
    .select({ id: items.id, gradeKey: magnetItems.gradeKey })
    .from(magnetItems)
    .innerJoin(
      items,
      and(eq(items.id, magnetItems.itemId), eq(items.active, true)),
    )) {
    magnetsByGrade.set(magnet.gradeKey, [
      ...(magnetsByGrade.get(magnet.gradeKey) ?? []),
      magnet.id,
    ]);
  }

  const matched: MatchedRow[] = [];
  const errors: LineError[] = [];
  for (const row of rows) {
    const mapped = known.get(row.supplierSku.toLowerCase());
    if (mapped !== undefined) {
      matched.push({ row, itemId: mapped, newItem: null });
      continue;
    }
    if (row.kind === "wire") {
      const wire = wires.find(
        (candidate) =>
          candidate.standard === row.standard &&
          candidate.size === row.size &&
          (row.insulation === null || candidate.insulation === row.insulation),
      );
      matched.push(
        wire
          ? { row, itemId: wire.id, newItem: null }
          : {
              row,
              itemId: null,
              newItem: {
                sku: newItemSku(supplierId, row.supplierSku),
                name: row.description || `${row.standard} ${row.size} wire`,
              },
            },
      );
    } else if (row.kind === "magnet") {
      const candidates =
        magnetsByGrade.get(gradeKeys.get(row.gradeMatch) ?? "") ?? [];
      if (candidates.length === 1)
        matched.push({ row, itemId: candidates[0]!, newItem: null });
      else
        errors.push({
          line: row.line,
          message: `Line ${row.line}: ${candidates.length === 0 ? "no" : `${candidates.length}`} catalogue magnets of grade ${row.grade}; a magnet's shape is not in the price list, so add the item first (or keep one of that grade) and import again.`,
        });
    } else {
      matched.push({
        row,
        itemId: null,
        newItem: {
          sku: newItemSku(supplierId, row.supplierSku),
          name: row.description || row.supplierSku,
        },
      });
    }
  }
  return {
    matched,
    errors,
    conductorOf: new Map(wires.map((wire) => [wire.id, wire.conductor])),
  };
}

export async function importPriceList(input: {
  supplierName: string;
  fileName: string;
  bytes: Uint8Array;
  mapping: ColumnMapping;
  dryRun: boolean;
  userId: string;
  today?: string;
}): Promise<ImportOutcome> {
  const [supplier] = await db
    .select()
    .from(suppliers)
    .where(eq(suppliers.name, input.supplierName.trim()))
    .limit(1);
  if (!supplier)
    throw new StockError(
      400,
      `No supplier named "${input.supplierName}". Create the supplier first.`,
      "supplier",
    );

  const grades = await db
    .select({
      key: magnetGrades.key,
      name: magnetGrades.name,
      aliases: magnetGrades.aliases,
    })
    .from(magnetGrades);
  const knownGrades = new Set(
    grades.flatMap((grade) =>
      [grade.key, grade.name, ...grade.aliases.split(",")]
        .filter(Boolean)
        .map((name) => name.toLowerCase()),
    ),
  );
  const reading = readPriceListFile(input.bytes, {
    mapping: input.mapping,
    importDay: input.today ?? new Date().toISOString().slice(0, 10),
    knownGrades,
    supplierCurrency: supplier.currency as never,
  });
  if (!reading.ok) return { kind: "refused", messages: reading.messages };

  const {
    matched,
    errors: matchErrors,
    conductorOf,
  } = await matchRows(supplier.id, reading.rows);
  const invalid = [...reading.errors, ...matchErrors].sort(
    (a, b) => a.line - b.line,
  );
  if (input.dryRun) {
    const preview = summarisePreview(reading.rows, invalid);
    return {
      kind: "preview",
      preview: {
        ...preview,
        matched: matched.filter((entry) => entry.itemId !== null).length,
        newItems: new Set(
          matched.flatMap((entry) =>
            entry.newItem ? [entry.newItem.sku] : [],
          ),
        ).size,
      },
    };
  }
  if (invalid.length > 0)
    return { kind: "invalid", valid: matched.length, invalid };

  const fileSha256 = createHash("sha256").update(input.bytes).digest("hex");
  const [previous] = await db
    .select({ id: priceImports.id })
    .from(priceImports)
    .where(
      and(
        eq(priceImports.supplierId, supplier.id),
        eq(priceImports.fileSha256, fileSha256),
      ),
    )
    .limit(1);
  if (previous) return { kind: "already-imported", importId: previous.id };

  const newItemRows = new Map<string, MatchedRow[]>();
  for (const entry of matched) {
    if (!entry.newItem) continue;
    const same = newItemRows.get(entry.newItem.sku);
    if (same) same.push(entry);
    else newItemRows.set(entry.newItem.sku, [entry]);
  }
  const newItemSkus = [...newItemRows.keys()];
  try {
    const importId = await db.transaction(async (tx) => {
      const [created] = await tx
        .insert(priceImports)
        .values({
          supplierId: supplier.id,
          fileName: input.fileName.slice(0, 200),
          fileSha256,
          rowCount: matched.length,
          createdItems: newItemSkus.length,
          mapping: JSON.stringify(columnMappingToFields(input.mapping)),
          userId: input.userId,
        })
        .$returningId();
      const importId = created!.id;

      // One new item per supplier SKU (a SKU's breaks are several rows), written in batches.
      for (let first = 0; first < newItemSkus.length; first += batchSize) {
        const batch = newItemSkus
          .slice(first, first + batchSize)
          .map((sku) => newItemRows.get(sku)![0]!);
        await tx
          .insert(items)
          .values(
            batch.map(({ row, newItem }) => ({
              sku: newItem!.sku,
              name: newItem!.name.slice(0, 160),
              kind: row.kind,
              unit: row.unit,
              sizeOrGrade:
                row.kind === "wire"
                  ? `${row.standard === "AWG" ? "AWG " : ""}${row.size}${row.standard === "IEC" ? " mm" : ""}`
                  : "",
            })),
          )
          .onDuplicateKeyUpdate({ set: { sku: sql`sku` } });
        const ids = await tx
          .select({ id: items.id, sku: items.sku })
          .from(items)
          .where(
            inArray(
              items.sku,
              batch.map(({ newItem }) => newItem!.sku),
            ),
          );
        const idBySku = new Map(
          ids.map((row) => [row.sku.toLowerCase(), row.id]),
        );
        for (const entry of batch) {
          const itemId = idBySku.get(entry.newItem!.sku.toLowerCase())!;
          for (const same of newItemRows.get(entry.newItem!.sku)!)
            same.itemId = itemId;
        }
        const wires = batch.filter((entry) => entry.row.kind === "wire");
        if (wires.length > 0) {
          await tx
            .insert(wireItems)
            .values(
              wires.map((entry) => {
                const row = entry.row as Extract<
                  PriceListRow,
                  { kind: "wire" }
                >;
                const thermalClass = row.thermalClass ?? 155;
                return {
                  itemId: entry.itemId!,
                  conductor: "copper",
                  standard: row.standard,
                  sizeLabel: row.size,
                  insulation: row.insulation,
                  thermalClass,
                  enamel: typicalEnamel(thermalClass),
                };
              }),
            )
            .onDuplicateKeyUpdate({ set: { itemId: sql`item_id` } });
        }
      }

      const skuRows = new Map(
        matched.map((entry) => [entry.row.supplierSku.toLowerCase(), entry]),
      );
      const mappings = [...skuRows.values()].map((entry) => ({
        supplierId: supplier.id,
        supplierSku: entry.row.supplierSku,
        itemId: entry.itemId!,
      }));
      for (let start = 0; start < mappings.length; start += batchSize) {
        await tx
          .insert(supplierItems)
          .values(mappings.slice(start, start + batchSize))
          .onDuplicateKeyUpdate({ set: { itemId: sql`VALUES(item_id)` } });
      }

      const lines = matched.map((entry) => ({
        supplierId: supplier.id,
        itemId: entry.itemId!,
        supplierSku: entry.row.supplierSku,
        currency: entry.row.currency,
        unitPrice: entry.row.price,
        adderPerKg: entry.row.adderPerKg,
        // An adder prices on the base of the wire's own metal (new wire items are copper).
        conductor:
          entry.row.adderPerKg !== null
            ? (conductorOf.get(entry.itemId!) ?? "copper")
            : null,
        minQuantity: entry.row.minQuantity,
        validFrom: entry.row.validFrom,
        importId,
        line: entry.row.line,
      }));
      for (let start = 0; start < lines.length; start += batchSize) {
        await tx
          .insert(priceLines)
          .values(lines.slice(start, start + batchSize))
          .onDuplicateKeyUpdate({
            set: {
              itemId: sql`VALUES(item_id)`,
              currency: sql`VALUES(currency)`,
              unitPrice: sql`VALUES(unit_price)`,
              adderPerKg: sql`VALUES(adder_per_kg)`,
              conductor: sql`VALUES(conductor)`,
              importId: sql`VALUES(import_id)`,
              line: sql`VALUES(line)`,
            },
          });
      }

      const headerSignature = input.mapping
        .map((entry) => entry.header)
        .join("\t");
      await tx
        .insert(supplierMappings)
        .values({
          supplierId: supplier.id,
          headerSignature,
          mapping: JSON.stringify(input.mapping),
        })
        .onDuplicateKeyUpdate({
          set: { headerSignature, mapping: JSON.stringify(input.mapping) },
        });
      return importId;
    });
    return {
      kind: "imported",
      importId,
      rows: matched.length,
      newItems: newItemSkus.length,
      supplier: supplier.name,
      fileName: input.fileName,
    };
  } catch (error) {
    // Two people importing the same file at once: the second finds the first's import.
    if (isDuplicateKey(error)) {
      const [winner] = await db
        .select({ id: priceImports.id })
        .from(priceImports)
        .where(
          and(
            eq(priceImports.supplierId, supplier.id),
            eq(priceImports.fileSha256, fileSha256),
          ),
        )
        .limit(1);
      if (winner) return { kind: "already-imported", importId: winner.id };
    }
    throw error;
  }
}
