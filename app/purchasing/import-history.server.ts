/** Past price-list imports and the price lines each one wrote, a page at a time. */
import { asc, count, desc, eq, inArray, like, or, type SQL } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, priceImports, priceLines, suppliers, users } from "~/db/schema";
import { containsPattern } from "~/lib/list-filters";

export const importPageSize = 25;
export const importLinePageSize = 50;

/** One page of committed imports, newest first; with a search, those whose file or supplier name holds it. */
export async function listPriceImports(page: number, search?: string) {
  let where: SQL | undefined;
  if (search) {
    // Suppliers are few: their ids first, then the imports by time.
    const named = await db
      .select({ id: suppliers.id })
      .from(suppliers)
      .where(like(suppliers.name, containsPattern(search)));
    where = or(
      like(priceImports.fileName, containsPattern(search)),
      named.length > 0
        ? inArray(
            priceImports.supplierId,
            named.map((supplier) => supplier.id),
          )
        : undefined,
    );
  }
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: priceImports.id,
        supplier: suppliers.name,
        fileName: priceImports.fileName,
        rowCount: priceImports.rowCount,
        createdItems: priceImports.createdItems,
        user: users.name,
        createdAt: priceImports.createdAt,
      })
      .from(priceImports)
      .innerJoin(suppliers, eq(suppliers.id, priceImports.supplierId))
      .innerJoin(users, eq(users.id, priceImports.userId))
      .where(where)
      .orderBy(desc(priceImports.createdAt), desc(priceImports.id))
      .limit(importPageSize)
      .offset((page - 1) * importPageSize),
    db.select({ total: count() }).from(priceImports).where(where),
  ]);
  return { imports: rows, total: total?.total ?? 0 };
}

/** Reads a stored mapping (our field → the file's header) as pairs; bad JSON shows as nothing. */
export function mappingPairs(mapping: string): [string, string][] {
  try {
    const parsed: unknown = JSON.parse(mapping);
    if (!parsed || typeof parsed !== "object") return [];
    return Object.entries(parsed as Record<string, unknown>)
      .filter(([, header]) => typeof header === "string" && header !== "")
      .map(([field, header]) => [field, header as string]);
  } catch {
    return [];
  }
}

export async function findPriceImport(id: number) {
  const [row] = await db
    .select({
      id: priceImports.id,
      supplier: suppliers.name,
      fileName: priceImports.fileName,
      fileSha256: priceImports.fileSha256,
      rowCount: priceImports.rowCount,
      createdItems: priceImports.createdItems,
      mapping: priceImports.mapping,
      user: users.name,
      createdAt: priceImports.createdAt,
    })
    .from(priceImports)
    .innerJoin(suppliers, eq(suppliers.id, priceImports.supplierId))
    .innerJoin(users, eq(users.id, priceImports.userId))
    .where(eq(priceImports.id, id))
    .limit(1);
  if (!row) return null;
  const { mapping, ...rest } = row;
  return { ...rest, mapping: mappingPairs(mapping) };
}

export async function listImportLines(importId: number, page: number) {
  const [rows, [total]] = await Promise.all([
    db
      .select({
        id: priceLines.id,
        supplierSku: priceLines.supplierSku,
        itemSku: items.sku,
        unit: items.unit,
        minQuantity: priceLines.minQuantity,
        unitPrice: priceLines.unitPrice,
        adderPerKg: priceLines.adderPerKg,
        conductor: priceLines.conductor,
        currency: priceLines.currency,
        validFrom: priceLines.validFrom,
        line: priceLines.line,
      })
      .from(priceLines)
      .innerJoin(items, eq(items.id, priceLines.itemId))
      .where(eq(priceLines.importId, importId))
      .orderBy(asc(priceLines.line), asc(priceLines.id))
      .limit(importLinePageSize)
      .offset((page - 1) * importLinePageSize),
    db
      .select({ total: count() })
      .from(priceLines)
      .where(eq(priceLines.importId, importId)),
  ]);
  return {
    lines: rows.map((row) => ({
      ...row,
      minQuantity: Number(row.minQuantity),
      unitPrice: row.unitPrice === null ? null : Number(row.unitPrice),
      adderPerKg: row.adderPerKg === null ? null : Number(row.adderPerKg),
    })),
    total: total?.total ?? 0,
  };
}

/** The most lines one price-lines file holds: a price list of 100,000 rows fits. */
export const priceLinesCsvRowLimit = 200_000;

/** Every price line an import wrote, in the file's order, as stored (exact decimal text). */
export async function listAllImportLines(importId: number) {
  return db
    .select({
      line: priceLines.line,
      supplierSku: priceLines.supplierSku,
      itemSku: items.sku,
      unit: items.unit,
      minQuantity: priceLines.minQuantity,
      packQuantity: priceLines.packQuantity,
      currency: priceLines.currency,
      unitPrice: priceLines.unitPrice,
      adderPerKg: priceLines.adderPerKg,
      conductor: priceLines.conductor,
      validFrom: priceLines.validFrom,
      leadTimeDays: priceLines.leadTimeDays,
    })
    .from(priceLines)
    .innerJoin(items, eq(items.id, priceLines.itemId))
    .where(eq(priceLines.importId, importId))
    .orderBy(asc(priceLines.line), asc(priceLines.id))
    .limit(priceLinesCsvRowLimit);
}
