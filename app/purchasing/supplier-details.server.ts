/** One supplier: its details, its price-list imports, changes to it, and what its currency lacks. */
import { count, desc, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { writeTransaction } from "~/db/write-transaction.server";
import { isDuplicateKey } from "~/db/database-errors";
import { priceImports, priceLines, suppliers, users } from "~/db/schema";
import type { ConductorKey } from "~/engineering/reference-data";
import { DomainError } from "~/lib/domain-error";
import { todayUtc } from "~/lib/calendar-days";
import { entriesInForce } from "./current-entries";
import type { SupplierPatch } from "./supplier-schemas";
import type { CurrencyCoverage } from "./supplier-currency-warnings";
import {
  companyCurrency,
  listCurrencyRates,
  listMetalBase,
  percentText,
  supplierOrderingColumns,
  withOrderingNumbers,
} from "./suppliers.server";

/** The imports listed on a supplier's page, newest first. */
export const supplierImportLimit = 50;

export async function findSupplier(id: number) {
  const [row] = await db
    .select({
      id: suppliers.id,
      name: suppliers.name,
      email: suppliers.email,
      currency: suppliers.currency,
      leadTimeDays: suppliers.leadTimeDays,
      notes: suppliers.notes,
      createdAt: suppliers.createdAt,
      ...supplierOrderingColumns,
    })
    .from(suppliers)
    .where(eq(suppliers.id, id))
    .limit(1);
  return row ? withOrderingNumbers(row) : null;
}

/** The supplier's price-list imports, newest first, and how many price lines it has in all. */
export async function listSupplierImports(id: number) {
  const [imports, [lines], [imported]] = await Promise.all([
    db
      .select({
        id: priceImports.id,
        fileName: priceImports.fileName,
        rowCount: priceImports.rowCount,
        createdItems: priceImports.createdItems,
        user: users.name,
        createdAt: priceImports.createdAt,
      })
      .from(priceImports)
      .innerJoin(users, eq(users.id, priceImports.userId))
      .where(eq(priceImports.supplierId, id))
      .orderBy(desc(priceImports.createdAt), desc(priceImports.id))
      .limit(supplierImportLimit),
    db
      .select({ total: count() })
      .from(priceLines)
      .where(eq(priceLines.supplierId, id)),
    db
      .select({ total: count() })
      .from(priceImports)
      .where(eq(priceImports.supplierId, id)),
  ]);
  return {
    imports,
    importCount: imported?.total ?? 0,
    priceLineCount: lines?.total ?? 0,
  };
}

/**
 * Changes a supplier; fields not in the patch stay as they are. 404 for no such supplier,
 * 409 (on the name) when another supplier has the name. Price lines keep their own
 * currency: a new quoting currency applies to the next import.
 */
export async function updateSupplier(
  id: number,
  patch: SupplierPatch,
): Promise<void> {
  const set = {
    ...(patch.name !== undefined ? { name: patch.name } : {}),
    ...(patch.email !== undefined ? { email: patch.email } : {}),
    ...(patch.currency !== undefined ? { currency: patch.currency } : {}),
    ...(patch.leadTimeDays !== undefined
      ? { leadTimeDays: patch.leadTimeDays }
      : {}),
    ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
    ...(patch.orderEmail !== undefined ? { orderEmail: patch.orderEmail } : {}),
    ...(patch.metalBaseFixedAt !== undefined
      ? { metalBaseFixedAt: patch.metalBaseFixedAt }
      : {}),
    ...(patch.wireTolerancePercent !== undefined
      ? { wireTolerancePercent: percentText(patch.wireTolerancePercent) }
      : {}),
    ...(patch.pieceTolerancePercent !== undefined
      ? { pieceTolerancePercent: percentText(patch.pieceTolerancePercent) }
      : {}),
  };
  try {
    await writeTransaction(async (tx) => {
      const [found] = await tx
        .select({ id: suppliers.id })
        .from(suppliers)
        .where(eq(suppliers.id, id))
        .for("update");
      if (!found) throw new DomainError(404, `No supplier with id ${id}.`);
      await tx.update(suppliers).set(set).where(eq(suppliers.id, id));
    });
  } catch (error) {
    if (isDuplicateKey(error))
      throw new DomainError(
        409,
        `There is already a supplier named "${patch.name}".`,
        "name",
      );
    throw error;
  }
}

/** The rates and metal bases in force today, for the currency warnings. */
export async function currencyCoverage(): Promise<CurrencyCoverage> {
  const [company, bases, rates] = await Promise.all([
    companyCurrency(),
    listMetalBase(1_000),
    listCurrencyRates(1_000),
  ]);
  const today = todayUtc();
  return {
    companyCurrency: company,
    rateCurrencies: entriesInForce(rates, (rate) => rate.currency, today).map(
      (rate) => rate.currency,
    ),
    bases: entriesInForce(
      bases,
      (base) => `${base.conductor} ${base.currency}`,
      today,
    ).map((base) => ({
      conductor: base.conductor as ConductorKey,
      currency: base.currency,
    })),
  };
}
