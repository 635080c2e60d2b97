/**
 * Stocktakes: starting one (the book of every lot × location with stock at the chosen
 * locations, or wherever the chosen items are), listing them, reading one, cancelling.
 * Counting is in stocktake-counts.server.ts, review and approval in
 * stocktake-approval.server.ts. Nothing here writes the ledger
 * (docs/decisions/039-storeroom-floor.md).
 *
 * Lock order of every stocktake transaction: the stocktake row, then (starting) the
 * chosen locations by id, then stock rows (items before balances, as the ledger does).
 */
import {
  and,
  asc,
  count,
  desc,
  eq,
  inArray,
  like,
  ne,
  or,
  sql,
} from "drizzle-orm";
import { alias } from "drizzle-orm/mysql-core";
import { db, type Transaction } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  stockBalances,
  stocktakeLines,
  stocktakeLocations,
  stocktakes,
  users,
} from "~/db/schema";
import { writeTransaction } from "~/db/write-transaction.server";
import { DomainError } from "~/lib/domain-error";
import type { StocktakeStatus } from "~/db/tables/storeroom-enums";
import type { StartStocktakeInput } from "./stocktake-forms";
import { containsPattern } from "~/lib/list-filters";
import {
  stocktakeIdFromReference,
  stocktakeReference,
} from "./stocktake-reference";

/** Locks the stocktake row; 404 when there is none, 409 when it is closed and `open` is asked. */
export async function lockStocktake(
  tx: Transaction,
  id: number,
  need: "open" | "any" = "open",
) {
  const [row] = await tx
    .select({ id: stocktakes.id, status: stocktakes.status })
    .from(stocktakes)
    .where(eq(stocktakes.id, id))
    .for("update")
    .limit(1);
  if (!row)
    throw new DomainError(404, `No stocktake ${stocktakeReference(id)}.`);
  if (need === "open" && row.status !== "counting")
    throw new DomainError(
      409,
      `${stocktakeReference(id)} is ${row.status}: it can no longer change.`,
    );
  return row;
}

/** Open stocktakes covering any of these locations: [location code, stocktake id]. */
async function openStocktakesAt(tx: Transaction, locationIds: number[]) {
  if (locationIds.length === 0) return [];
  return tx
    .select({ code: locations.code, stocktakeId: stocktakes.id })
    .from(stocktakeLocations)
    .innerJoin(stocktakes, eq(stocktakes.id, stocktakeLocations.stocktakeId))
    .innerJoin(locations, eq(locations.id, stocktakeLocations.locationId))
    .where(
      and(
        inArray(stocktakeLocations.locationId, locationIds),
        eq(stocktakes.status, "counting"),
      ),
    )
    .orderBy(asc(locations.code));
}

async function chosenLocations(tx: Transaction, codes: string[]) {
  const rows = await tx
    .select({
      id: locations.id,
      code: locations.code,
      active: locations.active,
    })
    .from(locations)
    .where(inArray(locations.code, codes))
    .orderBy(asc(locations.id))
    .for("update");
  const found = new Set(
    rows.filter((row) => row.active).map((row) => row.code),
  );
  const missing = codes.filter((code) => !found.has(code));
  if (missing.length > 0)
    throw new DomainError(
      400,
      `No location with code ${missing.map((code) => `"${code}"`).join(", ")}.`,
      "locations",
    );
  return rows;
}

/** The locations holding any stock of these items, after checking the SKUs exist. */
async function locationsHolding(tx: Transaction, skus: string[]) {
  const found = await tx
    .select({ id: items.id, sku: items.sku })
    .from(items)
    .where(inArray(items.sku, skus));
  const known = new Set(found.map((item) => item.sku));
  const missing = skus.filter((sku) => !known.has(sku));
  if (missing.length > 0)
    throw new DomainError(
      400,
      `No item with SKU ${missing.map((sku) => `"${sku}"`).join(", ")}.`,
      "skus",
    );
  const itemIds = found.map((item) => item.id);
  const held = await tx
    .selectDistinct({ locationId: stockBalances.locationId })
    .from(stockBalances)
    .where(
      and(
        inArray(stockBalances.itemId, itemIds),
        ne(stockBalances.onHand, "0"),
      ),
    );
  if (held.length === 0)
    throw new DomainError(
      409,
      "None of these items is on hand anywhere: there is nothing to count.",
      "skus",
    );
  const rows = await tx
    .select({ id: locations.id, code: locations.code })
    .from(locations)
    .where(
      inArray(
        locations.id,
        held.map((row) => row.locationId),
      ),
    )
    .orderBy(asc(locations.id))
    .for("update");
  return { itemIds, locations: rows };
}

/**
 * Starts a stocktake: the chosen locations (or those holding the chosen items), refused
 * with 409 when one is already in an open stocktake, and a line with the book quantity
 * of every lot × location balance with stock there (only the chosen items' balances when
 * counting by item).
 */
export async function startStocktake(
  input: StartStocktakeInput,
  userId: string,
): Promise<{ id: number }> {
  return writeTransaction(
    async (tx) => {
      const byItems = input.skus.length > 0;
      const scope = byItems
        ? await locationsHolding(tx, input.skus)
        : {
            itemIds: null,
            locations: await chosenLocations(tx, input.locations),
          };
      const locationIds = scope.locations.map((location) => location.id);
      const busy = await openStocktakesAt(tx, locationIds);
      if (busy.length > 0)
        throw new DomainError(
          409,
          `Already being counted: ${busy
            .map(
              (row) => `${row.code} in ${stocktakeReference(row.stocktakeId)}`,
            )
            .join(", ")}. Finish or cancel that stocktake first.`,
          byItems ? "skus" : "locations",
        );
      const now = new Date();
      const [created] = await tx
        .insert(stocktakes)
        .values({
          status: "counting",
          note: input.note,
          startedBy: userId,
          startedAt: now,
        })
        .$returningId();
      const stocktakeId = created!.id;
      await tx
        .insert(stocktakeLocations)
        .values(locationIds.map((locationId) => ({ stocktakeId, locationId })));
      const balances = await tx
        .select({
          itemId: stockBalances.itemId,
          lotId: stockBalances.lotId,
          locationId: stockBalances.locationId,
          onHand: stockBalances.onHand,
        })
        .from(stockBalances)
        .where(
          and(
            inArray(stockBalances.locationId, locationIds),
            ne(stockBalances.onHand, "0"),
            scope.itemIds
              ? inArray(stockBalances.itemId, scope.itemIds)
              : undefined,
          ),
        );
      if (balances.length > 0)
        await tx.insert(stocktakeLines).values(
          balances.map((balance) => ({
            stocktakeId,
            itemId: balance.itemId,
            lotId: balance.lotId,
            locationId: balance.locationId,
            bookAtStart: balance.onHand,
          })),
        );
      return { id: stocktakeId };
    },
    { label: "start stocktake" },
  );
}

/** Cancels an open stocktake: nothing was posted, nothing is. */
export async function cancelStocktake(id: number): Promise<void> {
  await writeTransaction(
    async (tx) => {
      await lockStocktake(tx, id);
      await tx
        .update(stocktakes)
        .set({ status: "cancelled", closedAt: new Date() })
        .where(eq(stocktakes.id, id));
    },
    { label: "cancel stocktake" },
  );
}

export interface StocktakeSummary {
  id: number;
  reference: string;
  status: StocktakeStatus;
  note: string;
  startedBy: string;
  startedAt: string;
  approvedBy: string | null;
  approvedAt: string | null;
  locations: string[];
  lines: number;
  counted: number;
}

const starter = alias(users, "starter");
const approver = alias(users, "approver");

function summaryQuery() {
  return db
    .select({
      id: stocktakes.id,
      status: stocktakes.status,
      note: stocktakes.note,
      startedBy: starter.name,
      startedAt: stocktakes.startedAt,
      approvedBy: approver.name,
      approvedAt: stocktakes.approvedAt,
      lines: sql<number>`(SELECT COUNT(*) FROM stocktake_lines l WHERE l.stocktake_id = ${stocktakes.id})`,
      counted: sql<number>`(SELECT COUNT(*) FROM stocktake_lines l WHERE l.stocktake_id = ${stocktakes.id} AND l.counted IS NOT NULL)`,
      locations: sql<
        string | null
      >`(SELECT GROUP_CONCAT(c.code ORDER BY c.code SEPARATOR ' ') FROM stocktake_locations sl JOIN locations c ON c.id = sl.location_id WHERE sl.stocktake_id = ${stocktakes.id})`,
    })
    .from(stocktakes)
    .innerJoin(starter, eq(starter.id, stocktakes.startedBy))
    .leftJoin(approver, eq(approver.id, stocktakes.approvedBy));
}

function toSummary(
  row: Awaited<ReturnType<typeof summaryQuery>>[number],
): StocktakeSummary {
  return {
    id: row.id,
    reference: stocktakeReference(row.id),
    status: row.status,
    note: row.note,
    startedBy: row.startedBy,
    startedAt: row.startedAt.toISOString(),
    approvedBy: row.approvedBy,
    approvedAt: row.approvedAt?.toISOString() ?? null,
    locations: row.locations ? row.locations.split(" ") : [],
    lines: Number(row.lines),
    counted: Number(row.counted),
  };
}

export async function listStocktakes(query: {
  page: number;
  pageSize: number;
  /** A reference ("ST-12") or part of the note. */
  search?: string;
  status?: StocktakeStatus;
}) {
  const id = query.search ? stocktakeIdFromReference(query.search) : null;
  const where = and(
    query.status ? eq(stocktakes.status, query.status) : undefined,
    query.search
      ? or(
          id !== null ? eq(stocktakes.id, id) : undefined,
          like(stocktakes.note, containsPattern(query.search)),
        )
      : undefined,
  );
  const [counted] = await db
    .select({ total: count() })
    .from(stocktakes)
    .where(where);
  const rows = await summaryQuery()
    .where(where)
    .orderBy(desc(stocktakes.id))
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  return { total: counted?.total ?? 0, stocktakes: rows.map(toSummary) };
}

export async function findStocktakeSummary(
  id: number,
): Promise<StocktakeSummary | null> {
  const [row] = await summaryQuery().where(eq(stocktakes.id, id)).limit(1);
  return row ? toSummary(row) : null;
}

/** Active locations for the start form. */
export async function listLocationChoices() {
  return db
    .select({ code: locations.code, name: locations.name })
    .from(locations)
    .where(eq(locations.active, true))
    .orderBy(asc(locations.code));
}

const counter = alias(users, "counter");

/**
 * The lines as the count sheet shows them: where, what, which lot, its unit and (wire)
 * the lot's tare, and whether it is counted — never a book figure, which this query
 * does not even read.
 */
export async function listBlindLines(stocktakeId: number) {
  const rows = await db
    .select({
      id: stocktakeLines.id,
      location: locations.code,
      locationName: locations.name,
      sku: items.sku,
      name: items.name,
      kind: items.kind,
      unit: items.unit,
      lot: lots.lotNumber,
      lotTareKg: lots.tareKg,
      counted: stocktakeLines.counted,
      grossKg: stocktakeLines.grossKg,
      tareKg: stocktakeLines.tareKg,
      recountRequested: stocktakeLines.recountRequested,
      addedDuringCount: stocktakeLines.addedDuringCount,
    })
    .from(stocktakeLines)
    .innerJoin(items, eq(items.id, stocktakeLines.itemId))
    .innerJoin(locations, eq(locations.id, stocktakeLines.locationId))
    .leftJoin(lots, eq(lots.id, stocktakeLines.lotId))
    .where(eq(stocktakeLines.stocktakeId, stocktakeId))
    .orderBy(
      asc(locations.code),
      asc(items.sku),
      asc(lots.lotNumber),
      asc(stocktakeLines.id),
    );
  return rows.map((row) => ({
    ...row,
    lot: row.lot ?? null,
    lotTareKg: row.lotTareKg ?? null,
  }));
}
export type BlindLine = Awaited<ReturnType<typeof listBlindLines>>[number];

/** The lines with the book figures and costs, for the reviewer. */
export async function listReviewLines(stocktakeId: number) {
  const rows = await db
    .select({
      id: stocktakeLines.id,
      location: locations.code,
      sku: items.sku,
      name: items.name,
      unit: items.unit,
      averageCost: items.averageCost,
      lot: lots.lotNumber,
      bookAtStart: stocktakeLines.bookAtStart,
      counted: stocktakeLines.counted,
      bookAtCount: stocktakeLines.bookAtCount,
      grossKg: stocktakeLines.grossKg,
      tareKg: stocktakeLines.tareKg,
      countedBy: counter.name,
      countedAt: stocktakeLines.countedAt,
      recountRequested: stocktakeLines.recountRequested,
      addedDuringCount: stocktakeLines.addedDuringCount,
      movementId: stocktakeLines.movementId,
    })
    .from(stocktakeLines)
    .innerJoin(items, eq(items.id, stocktakeLines.itemId))
    .innerJoin(locations, eq(locations.id, stocktakeLines.locationId))
    .leftJoin(lots, eq(lots.id, stocktakeLines.lotId))
    .leftJoin(counter, eq(counter.id, stocktakeLines.countedBy))
    .where(eq(stocktakeLines.stocktakeId, stocktakeId))
    .orderBy(
      asc(locations.code),
      asc(items.sku),
      asc(lots.lotNumber),
      asc(stocktakeLines.id),
    );
  return rows.map((row) => ({
    ...row,
    lot: row.lot ?? null,
    countedAt: row.countedAt?.toISOString() ?? null,
  }));
}
export type ReviewLine = Awaited<ReturnType<typeof listReviewLines>>[number];
