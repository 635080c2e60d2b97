/**
 * Importing a supplier's price list: read and check the file (app/price-lists),
 * match each row to a catalogue item (by the supplier's SKU, then by wire size
 * or magnet grade), and either answer a preview (dry run) or write everything
 * in one transaction — all rows or none. The same file imported again for the
 * same supplier changes nothing.
 */
import { createHash } from "node:crypto";
import { and, eq, inArray } from "drizzle-orm";
import { db } from "~/db/client.server";
import { isDuplicateKey } from "~/db/database-errors";
import { retryWriteConflicts } from "~/db/write-transaction.server";
import {
  currencyRates,
  items,
  magnetGrades,
  metalBasePrices,
  magnetItems,
  priceImports,
  supplierItems,
  suppliers,
  wireItems,
} from "~/db/schema";
import type { ConductorKey } from "~/engineering/reference-data";
import {
  columnMappingToFields,
  type ColumnMapping,
  type ColumnMappingByField,
} from "~/price-lists/column-mapping";
import { observePriceListImport } from "~/observability/metrics.server";
import { LineErrorList, mergeLineErrors } from "~/price-lists/line-errors";
import type { LineError } from "~/price-lists/parse-price-list";
import {
  PriceListPreviewCollector,
  type PriceListPreview,
} from "~/price-lists/price-list-preview";
import type { PriceListRow } from "~/price-lists/price-list-rows";
import { openPriceList } from "~/price-lists/open-price-list.server";
import {
  readOpenedPriceListInBatches,
  type OpenedPriceListRows,
  type PriceListReadOptions,
} from "~/price-lists/read-price-list";
import { parseMoney, parseRate } from "~/pricing/money";
import { DomainError } from "~/lib/domain-error";
import {
  PriceImportWarningCollector,
  type PriceImportWarning,
} from "./price-import-warnings";
import type { PreviewMatch, PreviewRow } from "./price-import-preview";
import {
  PriceImportWriter,
  type MatchedRow,
} from "./price-import-writes.server";
import { companyCurrency } from "./suppliers.server";
import { todayUtc } from "~/lib/calendar-days";

export type ImportOutcome =
  | { kind: "refused"; messages: string[] }
  | {
      kind: "invalid";
      valid: number;
      /** The first 1,000 lines with errors, in file order. */
      invalid: LineError[];
      /** Every line with an error. */
      invalidCount: number;
    }
  | {
      kind: "preview";
      preview: PriceListPreview<PreviewRow> & {
        matched: number;
        newItems: number;
        warnings: PriceImportWarning[];
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
      warnings: PriceImportWarning[];
    };

function newItemSku(supplierId: number, supplierSku: string): string {
  return `S${supplierId}-${supplierSku}`
    .replace(/[^A-Za-z0-9._/-]/g, "-")
    .slice(0, 40);
}

/** Matches one row to its catalogue item, or says why it cannot be imported. */
interface RowMatcher {
  /** Looks up the batch's "our SKU" items (one query a batch); call before matching its rows. */
  prepare(rows: readonly PriceListRow[]): Promise<void>;
  match(row: PriceListRow): MatchedRow | LineError;
  /** Conductor of each catalogue wire item, for adder lines. */
  conductorOf: Map<number, string>;
  /** Every magnet grade name and alias, lower case: what the rows are read against. */
  knownGrades: ReadonlySet<string>;
}

/**
 * Loads what matching needs (the supplier's known SKUs, catalogue wires and
 * magnets, grade names) once; each row is then matched without a query.
 */
async function loadRowMatcher(
  supplierId: number,
  columns: ColumnMappingByField,
): Promise<RowMatcher> {
  const columnOf = (header: string | undefined) => `column "${header ?? ""}"`;
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
    )
    .orderBy(items.id);
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
  // Appended in place: a size or grade shared by thousands of catalogue items stays linear.
  const wiresBySize = new Map<string, typeof wires>();
  for (const wire of wires) {
    const key = `${wire.standard} ${wire.size}`;
    const same = wiresBySize.get(key);
    if (same) same.push(wire);
    else wiresBySize.set(key, [wire]);
  }
  const magnetsByGrade = new Map<string, number[]>();
  for (const magnet of await db
    .select({ id: items.id, gradeKey: magnetItems.gradeKey })
    .from(magnetItems)
    .innerJoin(
      items,
      and(eq(items.id, magnetItems.itemId), eq(items.active, true)),
    )) {
    const same = magnetsByGrade.get(magnet.gradeKey);
    if (same) same.push(magnet.id);
    else magnetsByGrade.set(magnet.gradeKey, [magnet.id]);
  }

  // A SKU's breaks usually follow each other: its new item is worked out once.
  let lastNewItem: { supplierSku: string; sku: string; name: string } | null =
    null;
  function newItemFor(row: PriceListRow, name: string) {
    if (lastNewItem?.supplierSku !== row.supplierSku)
      lastNewItem = {
        supplierSku: row.supplierSku,
        sku: newItemSku(supplierId, row.supplierSku),
        name,
      };
    return { sku: lastNewItem.sku, name: lastNewItem.name };
  }

  // Items named in the "Our SKU" column, looked up a batch at a time.
  const ourItems = new Map<
    string,
    { id: number; kind: string; active: boolean } | null
  >();
  async function prepare(rows: readonly PriceListRow[]) {
    const missing = [
      ...new Set(
        rows.flatMap((row) =>
          row.itemSku && !ourItems.has(row.itemSku.toLowerCase())
            ? [row.itemSku.toLowerCase()]
            : [],
        ),
      ),
    ];
    if (missing.length === 0) return;
    const found = await db
      .select({
        id: items.id,
        sku: items.sku,
        kind: items.kind,
        active: items.active,
      })
      .from(items)
      .where(inArray(items.sku, missing));
    for (const sku of missing) ourItems.set(sku, null);
    for (const item of found) ourItems.set(item.sku.toLowerCase(), item);
  }

  function match(row: PriceListRow): MatchedRow | LineError {
    if (row.itemSku) {
      const item = ourItems.get(row.itemSku.toLowerCase());
      if (!item || !item.active)
        return {
          line: row.line,
          message: `Line ${row.line}: our SKU "${row.itemSku}" (${columnOf(columns.itemSku)}) is not an active item in the catalogue.`,
        };
      if (item.kind !== row.kind)
        return {
          line: row.line,
          message: `Line ${row.line}: our SKU "${row.itemSku}" (${columnOf(columns.itemSku)}) is a ${item.kind} item, but the row is ${row.kind}.`,
        };
      return { row, itemId: item.id, newItem: null, by: "our-sku" };
    }
    const mapped = known.get(row.supplierSku.toLowerCase());
    if (mapped !== undefined)
      return { row, itemId: mapped, newItem: null, by: "supplier-sku" };
    if (row.kind === "wire") {
      const wire = wiresBySize
        .get(`${row.standard} ${row.size}`)
        ?.find(
          (candidate) =>
            row.insulation === null || candidate.insulation === row.insulation,
        );
      return wire
        ? { row, itemId: wire.id, newItem: null, by: "wire-size" }
        : {
            row,
            itemId: null,
            newItem: newItemFor(
              row,
              row.description || `${row.standard} ${row.size} wire`,
            ),
            by: "new-item",
          };
    }
    if (row.kind === "magnet") {
      const candidates =
        magnetsByGrade.get(gradeKeys.get(row.gradeMatch) ?? "") ?? [];
      if (candidates.length === 1)
        return {
          row,
          itemId: candidates[0]!,
          newItem: null,
          by: "magnet-grade",
        };
      return {
        line: row.line,
        message: `Line ${row.line}: ${candidates.length === 0 ? "no" : `${candidates.length}`} catalogue magnets of grade "${row.grade}" (${columnOf(columns.grade)}); a magnet's shape is not in the price list, so add the item first (or keep one of that grade) and import again.`,
      };
    }
    return {
      row,
      itemId: null,
      newItem: newItemFor(row, row.description || row.supplierSku),
      by: "new-item",
    };
  }
  return {
    prepare,
    match,
    conductorOf: new Map(wires.map((wire) => [wire.id, wire.conductor])),
    knownGrades: new Set(gradeKeys.keys()),
  };
}

function isLineError(result: MatchedRow | LineError): result is LineError {
  return "message" in result;
}

/** Rows read, matched and (on commit) written per step: small enough to keep memory flat. */
const rowsPerBatch = 2_000;

export interface PriceListImportInput {
  supplierName: string;
  fileName: string;
  bytes: Uint8Array;
  /** A workbook's sheet to read (by name); its first visible sheet when not given. */
  sheet?: string | null;
  mapping: ColumnMapping;
  dryRun: boolean;
  userId: string;
  today?: string;
  /**
   * Told the file's data rows read so far out of all of them: (0, total) once the file is
   * opened, after each batch, and (total, total) when every row is read (and, on commit,
   * written, before the transaction commits). Awaited; what it throws stops the import
   * (a commit rolls back). A commit that starts over after a write conflict reports from 0 again.
   */
  onProgress?: (processed: number, total: number) => Promise<void>;
}

export async function importPriceList(
  input: PriceListImportInput,
): Promise<ImportOutcome> {
  if (input.dryRun) return readOrImportPriceList(input);
  // A commit rolled back by a deadlock or a Galera conflict runs again from the file:
  // the supplier, the catalogue matches and every row are read afresh by each attempt.
  return retryWriteConflicts(() => readOrImportPriceList(input), {
    label: "price-list import",
  });
}

/** One attempt: a preview, or the whole import in one transaction (see PriceImportWriter). */
async function readOrImportPriceList(
  input: PriceListImportInput,
): Promise<ImportOutcome> {
  const [supplier] = await db
    .select()
    .from(suppliers)
    .where(eq(suppliers.name, input.supplierName.trim()))
    .limit(1);
  if (!supplier)
    throw new DomainError(
      400,
      `No supplier named "${input.supplierName}". Create the supplier first.`,
      "supplier",
    );

  const matcher = await loadRowMatcher(
    supplier.id,
    columnMappingToFields(input.mapping),
  );
  const importDay = input.today ?? todayUtc();
  const file = await openPriceList(input.bytes, input.fileName, input.sheet);
  if (!file.ok) return { kind: "refused", messages: [file.message] };
  const opened: OpenedPriceListRows = file.opened;
  const totalRows = input.onProgress ? opened.countDataRows() : 0;
  const progress = async (processed: number) =>
    input.onProgress?.(Math.min(processed, totalRows), totalRows);
  await progress(0);
  const readOptions: PriceListReadOptions = {
    mapping: input.mapping,
    importDay,
    // The grades the matcher read: one query, one list for reading and matching.
    knownGrades: matcher.knownGrades,
    supplierCurrency: supplier.currency as never,
  };
  // Rows that read well but match no catalogue item: listed up to 1,000, all counted.
  const matchErrors = new LineErrorList();
  const warnings = new PriceImportWarningCollector();
  const noteForWarnings = (matched: MatchedRow) =>
    warnings.add(
      matched.row.currency,
      matched.row.adderPerKg === null
        ? null
        : conductorOfMatch(matched, matcher.conductorOf),
    );

  if (input.dryRun) {
    const preview = new PriceListPreviewCollector<MatchedRow & PriceListRow>();
    let matchedRows = 0;
    const newItemSkus = new Set<string>();
    const reading = await readOpenedPriceListInBatches(
      opened,
      readOptions,
      rowsPerBatch,
      async (rows, _lineErrorsSoFar, dataRowsSoFar) => {
        await matcher.prepare(rows);
        for (const row of rows) {
          const result = matcher.match(row);
          if (isLineError(result)) {
            matchErrors.add(result);
            continue;
          }
          preview.add({ ...row, ...result });
          noteForWarnings(result);
          if (result.newItem) newItemSkus.add(result.newItem.sku);
          else matchedRows += 1;
        }
        await progress(dataRowsSoFar);
      },
    );
    if (!reading.ok) return { kind: "refused", messages: reading.messages };
    await progress(totalRows);
    const shown = preview.preview(mergeLineErrors(reading, matchErrors));
    return {
      kind: "preview",
      preview: {
        ...shown,
        rows: await withMatches(shown.rows),
        matched: matchedRows,
        newItems: newItemSkus.size,
        warnings: warnings.warnings(await loadWarningContext(importDay)),
      },
    };
  }

  const commitStarted = performance.now();
  const fileSha256 = createHash("sha256").update(input.bytes).digest("hex");
  const previous = await previousImportOf(supplier.id, fileSha256);
  if (previous) return { kind: "already-imported", importId: previous };

  let writer: PriceImportWriter;
  try {
    writer = await PriceImportWriter.open({
      supplierId: supplier.id,
      fileName: input.fileName,
      fileSha256,
      userId: input.userId,
      mappingFields: JSON.stringify(columnMappingToFields(input.mapping)),
      conductorOf: matcher.conductorOf,
    });
  } catch (error) {
    // Two people importing the same file at once: the second finds the first's import.
    const winner = isDuplicateKey(error)
      ? await previousImportOf(supplier.id, fileSha256)
      : null;
    if (winner) return { kind: "already-imported", importId: winner };
    throw error;
  }

  // Rows are written as they are read; after the first bad line nothing more is
  // written, the rest is only checked, and the transaction is rolled back.
  // One batch's statements run in MariaDB while the next batch is read and
  // matched here. Never more than one write in flight: each batch waits for the
  // previous write first (PriceImportWriter.write must not run twice at once).
  let goodRows = 0;
  let writing: Promise<void> = Promise.resolve();
  try {
    const reading = await readOpenedPriceListInBatches(
      opened,
      readOptions,
      rowsPerBatch,
      async (rows, lineErrorsSoFar, dataRowsSoFar) => {
        await matcher.prepare(rows);
        const matched: MatchedRow[] = [];
        for (const row of rows) {
          const result = matcher.match(row);
          if (isLineError(result)) matchErrors.add(result);
          else {
            matched.push(result);
            noteForWarnings(result);
          }
        }
        goodRows += matched.length;
        await writing;
        if (lineErrorsSoFar === 0 && matchErrors.errorCount === 0) {
          writing = writer.write(matched);
          // Handled: a failure is thrown by the next `await writing`, not reported as unhandled.
          writing.catch(() => undefined);
        }
        await progress(dataRowsSoFar);
      },
    );
    await writing;
    if (reading.ok) await progress(totalRows);
    if (!reading.ok) {
      await writer.abandon();
      return { kind: "refused", messages: reading.messages };
    }
    const invalid = mergeLineErrors(reading, matchErrors);
    if (invalid.errorCount > 0) {
      await writer.abandon();
      return {
        kind: "invalid",
        valid: goodRows,
        invalid: invalid.errors,
        invalidCount: invalid.errorCount,
      };
    }
    const written = await writer.finish({
      headerSignature: input.mapping.map((entry) => entry.header).join("\t"),
      mapping: JSON.stringify(input.mapping),
    });
    observePriceListImport((performance.now() - commitStarted) / 1000);
    return {
      kind: "imported",
      importId: written.importId,
      rows: written.rows,
      newItems: written.newItems,
      supplier: supplier.name,
      fileName: input.fileName,
      warnings: warnings.warnings(await loadWarningContext(importDay)),
    };
  } catch (error) {
    await writing.catch(() => undefined);
    await writer.abandon();
    throw error;
  }
}

async function previousImportOf(
  supplierId: number,
  fileSha256: string,
): Promise<number | null> {
  const [previous] = await db
    .select({ id: priceImports.id })
    .from(priceImports)
    .where(
      and(
        eq(priceImports.supplierId, supplierId),
        eq(priceImports.fileSha256, fileSha256),
      ),
    )
    .limit(1);
  return previous?.id ?? null;
}

/** The metal an adder row is priced on: its catalogue wire's, copper for a new wire item (as written). */
function conductorOfMatch(
  matched: MatchedRow,
  conductorOf: ReadonlyMap<number, string>,
): ConductorKey {
  const conductor =
    matched.itemId === null ? undefined : conductorOf.get(matched.itemId);
  return conductor === "aluminium" ? "aluminium" : "copper";
}

/**
 * The previewed rows with the catalogue item each prices, as the fields they had plus
 * `match`: one query for the (at most 20) items the shown rows matched.
 */
async function withMatches(
  shown: readonly (MatchedRow & PriceListRow)[],
): Promise<PreviewRow[]> {
  const itemIds = [...new Set(shown.flatMap((entry) => entry.itemId ?? []))];
  const found =
    itemIds.length === 0
      ? []
      : await db
          .select({
            id: items.id,
            sku: items.sku,
            name: items.name,
            kind: items.kind,
          })
          .from(items)
          .where(inArray(items.id, itemIds));
  const byId = new Map(found.map((item) => [item.id, item]));
  return shown.map(({ itemId, newItem, by, row, ...fields }) => {
    const item = itemId === null ? undefined : byId.get(itemId);
    const match: PreviewMatch =
      newItem || !item
        ? {
            sku: newItem?.sku ?? "",
            name: newItem?.name ?? "",
            kind: row.kind,
            newItem: true,
            by,
          }
        : {
            sku: item.sku,
            name: item.name,
            kind: item.kind,
            newItem: false,
            by,
          };
    return { ...(fields as PriceListRow), match };
  });
}

/** The rates, metal bases and company currency the import's warnings look at, on the import day. */
async function loadWarningContext(date: string) {
  const [rates, bases, currency] = await Promise.all([
    db
      .select({
        currency: currencyRates.currency,
        rate: currencyRates.rate,
        validFrom: currencyRates.validFrom,
      })
      .from(currencyRates),
    db
      .select({
        conductor: metalBasePrices.conductor,
        currency: metalBasePrices.currency,
        pricePerKg: metalBasePrices.pricePerKg,
        validFrom: metalBasePrices.validFrom,
      })
      .from(metalBasePrices),
    companyCurrency(),
  ]);
  return {
    companyCurrency: currency,
    date,
    rates: rates.map((rate) => ({
      currency: rate.currency,
      date: rate.validFrom,
      rate: parseRate(rate.rate),
    })),
    bases: bases.map((base) => ({
      conductor: base.conductor as ConductorKey,
      currency: base.currency,
      pricePerKg: parseMoney(base.pricePerKg),
      validFrom: base.validFrom,
    })),
  };
}
