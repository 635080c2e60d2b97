/** Suppliers, the metal base and currency rates: reading and writing. */
import { asc, desc, eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { isDuplicateKey } from "~/db/database-errors";
import {
  currencyRates,
  metalBasePrices,
  settings,
  suppliers,
} from "~/db/schema";
import { DomainError } from "~/lib/domain-error";
import type {
  CurrencyRateInput,
  MetalBaseInput,
  SupplierInput,
} from "./supplier-schemas";

export const defaultCompanyCurrency = "EUR";

/** The currency every price is converted to (setting company_currency, EUR by default). */
export async function companyCurrency(): Promise<string> {
  const [row] = await db
    .select({ value: settings.value })
    .from(settings)
    .where(eq(settings.key, "company_currency"))
    .limit(1);
  return row?.value ?? defaultCompanyCurrency;
}

export async function listSuppliers() {
  const rows = await db
    .select({
      id: suppliers.id,
      name: suppliers.name,
      email: suppliers.email,
      currency: suppliers.currency,
      leadTimeDays: suppliers.leadTimeDays,
      notes: suppliers.notes,
      ...supplierOrderingColumns,
    })
    .from(suppliers)
    .orderBy(asc(suppliers.name))
    .limit(1000);
  return rows.map(withOrderingNumbers);
}

/** The ordering settings of a supplier as stored (tolerances as DECIMAL text). */
export const supplierOrderingColumns = {
  orderEmail: suppliers.orderEmail,
  metalBaseFixedAt: suppliers.metalBaseFixedAt,
  wireTolerancePercent: suppliers.wireTolerancePercent,
  pieceTolerancePercent: suppliers.pieceTolerancePercent,
};

/** A supplier row with its tolerances as numbers of percent (2 decimals at most, exact in a double). */
export function withOrderingNumbers<
  Row extends { wireTolerancePercent: string; pieceTolerancePercent: string },
>(row: Row) {
  return {
    ...row,
    wireTolerancePercent: Number(row.wireTolerancePercent),
    pieceTolerancePercent: Number(row.pieceTolerancePercent),
  };
}

/** A tolerance as the DECIMAL(5,2) column takes it. */
export const percentText = (percent: number) => percent.toFixed(2);

export async function findSupplierByName(name: string) {
  const [row] = await db
    .select()
    .from(suppliers)
    .where(eq(suppliers.name, name.trim()))
    .limit(1);
  return row ?? null;
}

/** Creates a supplier; 409 when the name is taken. */
export async function createSupplier(input: SupplierInput): Promise<number> {
  try {
    const [created] = await db
      .insert(suppliers)
      .values({
        name: input.name,
        email: input.email ?? null,
        currency: input.currency,
        leadTimeDays: input.leadTimeDays ?? null,
        notes: input.notes ?? null,
        orderEmail: input.orderEmail ?? null,
        metalBaseFixedAt: input.metalBaseFixedAt,
        wireTolerancePercent: percentText(input.wireTolerancePercent),
        pieceTolerancePercent: percentText(input.pieceTolerancePercent),
      })
      .$returningId();
    return created!.id;
  } catch (error) {
    if (isDuplicateKey(error))
      throw new DomainError(
        409,
        `There is already a supplier named "${input.name}".`,
        "name",
      );
    throw error;
  }
}

export async function listMetalBase(limit = 100) {
  const rows = await db
    .select({
      conductor: metalBasePrices.conductor,
      currency: metalBasePrices.currency,
      pricePerKg: metalBasePrices.pricePerKg,
      validFrom: metalBasePrices.validFrom,
    })
    .from(metalBasePrices)
    .orderBy(desc(metalBasePrices.validFrom), asc(metalBasePrices.conductor))
    .limit(limit);
  return rows.map((row) => ({ ...row, pricePerKg: Number(row.pricePerKg) }));
}

/** Sets the base for a conductor, currency and day (a second entry for the same day replaces it). */
export async function setMetalBase(
  input: MetalBaseInput,
  userId: string,
): Promise<void> {
  await db
    .insert(metalBasePrices)
    .values({ ...input, pricePerKg: input.pricePerKg.toFixed(4), userId })
    .onDuplicateKeyUpdate({
      set: { pricePerKg: input.pricePerKg.toFixed(4), userId },
    });
}

export async function listCurrencyRates(limit = 200) {
  const rows = await db
    .select({
      currency: currencyRates.currency,
      rate: currencyRates.rate,
      validFrom: currencyRates.validFrom,
    })
    .from(currencyRates)
    .orderBy(desc(currencyRates.validFrom), asc(currencyRates.currency))
    .limit(limit);
  return rows.map((row) => ({ ...row, rate: Number(row.rate) }));
}

export async function setCurrencyRate(
  input: CurrencyRateInput,
  userId: string,
): Promise<void> {
  await db
    .insert(currencyRates)
    .values({ ...input, rate: input.rate.toFixed(6), userId })
    .onDuplicateKeyUpdate({ set: { rate: input.rate.toFixed(6), userId } });
}
