/** The suppliers page: each supplier with how many price lines it has and its last import. */
import { asc, count, inArray, like, max, or } from "drizzle-orm";
import { db } from "~/db/client.server";
import { priceImports, priceLines, suppliers } from "~/db/schema";
import { containsPattern } from "~/lib/list-filters";

/**
 * One page of suppliers by name, those whose name or e-mail holds `search`, each with its
 * price lines and last import counted for that page only (on the supplier-first indexes
 * of price lines and imports).
 */
export async function listSupplierOverview(query: {
  search?: string;
  page: number;
  pageSize: number;
}) {
  const where = query.search
    ? or(
        like(suppliers.name, containsPattern(query.search)),
        like(suppliers.email, containsPattern(query.search)),
      )
    : undefined;
  const [counted] = await db
    .select({ total: count() })
    .from(suppliers)
    .where(where);
  const page = await db
    .select({
      id: suppliers.id,
      name: suppliers.name,
      email: suppliers.email,
      currency: suppliers.currency,
      leadTimeDays: suppliers.leadTimeDays,
      notes: suppliers.notes,
    })
    .from(suppliers)
    .where(where)
    .orderBy(asc(suppliers.name))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const ids = page.map((supplier) => supplier.id);
  const [lineCounts, lastImports] =
    ids.length === 0
      ? [[], []]
      : await Promise.all([
          db
            .select({ supplierId: priceLines.supplierId, lines: count() })
            .from(priceLines)
            .where(inArray(priceLines.supplierId, ids))
            .groupBy(priceLines.supplierId),
          db
            .select({
              supplierId: priceImports.supplierId,
              lastImportAt: max(priceImports.createdAt),
            })
            .from(priceImports)
            .where(inArray(priceImports.supplierId, ids))
            .groupBy(priceImports.supplierId),
        ]);
  return {
    total: counted?.total ?? 0,
    suppliers: page.map((row) => ({
      ...row,
      priceLines: Number(
        lineCounts.find((entry) => entry.supplierId === row.id)?.lines ?? 0,
      ),
      lastImportAt: utcDate(
        lastImports.find((entry) => entry.supplierId === row.id)
          ?.lastImportAt ?? null,
      ),
    })),
  };
}

/** MariaDB DATETIME values are UTC; through a subquery they may arrive as text. */
function utcDate(value: Date | string | null): Date | null {
  if (value === null) return null;
  if (value instanceof Date) return value;
  return new Date(`${value.replace(" ", "T")}Z`);
}
