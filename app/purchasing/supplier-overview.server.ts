/** The suppliers page: each supplier with how many price lines it has and its last import. */
import { asc, count, eq, max } from "drizzle-orm";
import { db } from "~/db/client.server";
import { priceImports, priceLines, suppliers } from "~/db/schema";

export async function listSupplierOverview() {
  const lineCounts = db
    .select({
      supplierId: priceLines.supplierId,
      lines: count().as("lines"),
    })
    .from(priceLines)
    .groupBy(priceLines.supplierId)
    .as("line_counts");
  const lastImports = db
    .select({
      supplierId: priceImports.supplierId,
      lastImportAt: max(priceImports.createdAt).as("last_import_at"),
    })
    .from(priceImports)
    .groupBy(priceImports.supplierId)
    .as("last_imports");
  const rows = await db
    .select({
      id: suppliers.id,
      name: suppliers.name,
      email: suppliers.email,
      currency: suppliers.currency,
      leadTimeDays: suppliers.leadTimeDays,
      notes: suppliers.notes,
      priceLines: lineCounts.lines,
      lastImportAt: lastImports.lastImportAt,
    })
    .from(suppliers)
    .leftJoin(lineCounts, eq(lineCounts.supplierId, suppliers.id))
    .leftJoin(lastImports, eq(lastImports.supplierId, suppliers.id))
    .orderBy(asc(suppliers.name))
    .limit(1000);
  return rows.map((row) => ({
    ...row,
    priceLines: Number(row.priceLines ?? 0),
    lastImportAt: utcDate(row.lastImportAt),
  }));
}

/** MariaDB DATETIME values are UTC; through a subquery they may arrive as text. */
function utcDate(value: Date | string | null): Date | null {
  if (value === null) return null;
  if (value instanceof Date) return value;
  return new Date(`${value.replace(" ", "T")}Z`);
}
