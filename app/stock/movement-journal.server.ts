/** Reading the movement journal, newest first, a page at a time. */
import {
  and,
  asc,
  desc,
  eq,
  gt,
  gte,
  inArray,
  like,
  lt,
  or,
  type SQL,
} from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  locations,
  lots,
  purchaseReceiptLines,
  purchaseReceipts,
  stockMovements,
  users,
} from "~/db/schema";
import { parseQuantity, quantityToNumber } from "~/lib/decimal-amounts";
import { dayRangeBounds } from "~/lib/calendar-days";
import { containsPattern } from "~/lib/list-filters";
import { formatKeysetCursor, type KeysetCursor } from "~/lib/keyset-cursor";
import type {
  MovementJournalFilter,
  MovementJournalQuery,
} from "./movement-journal-query";

/** No row has this id: a filter naming something that does not exist matches nothing. */
const noRow = -1;

/**
 * The journal's filters as conditions. A SKU, lot number or person is first turned into
 * ids through their own indexes, so the journal is read by its (item, time), (lot),
 * (reference), (user, time) and (time) indexes.
 */
async function journalConditions(
  filter: MovementJournalFilter & { itemId?: number },
): Promise<SQL[]> {
  const conditions: SQL[] = [];
  if (filter.type) conditions.push(eq(stockMovements.type, filter.type));
  let itemId = filter.itemId;
  if (filter.sku) {
    const [item] = await db
      .select({ id: items.id })
      .from(items)
      .where(eq(items.sku, filter.sku))
      .limit(1);
    itemId = item?.id ?? noRow;
  }
  if (itemId !== undefined) conditions.push(eq(stockMovements.itemId, itemId));
  if (filter.lot) {
    const found = await db
      .select({ id: lots.id })
      .from(lots)
      .where(
        and(
          eq(lots.lotNumber, filter.lot),
          itemId !== undefined ? eq(lots.itemId, itemId) : undefined,
        ),
      )
      .limit(matchedIdLimit);
    conditions.push(
      inArray(stockMovements.lotId, idsOrNone(found.map((lot) => lot.id))),
    );
  }
  if (filter.reference)
    conditions.push(eq(stockMovements.reference, filter.reference));
  if (filter.user) {
    const text = filter.user;
    const people = await db
      .select({ id: users.id })
      .from(users)
      .where(
        or(
          eq(users.email, text.toLowerCase()),
          like(users.name, containsPattern(text)),
        ),
      )
      .limit(matchedIdLimit);
    conditions.push(
      inArray(
        stockMovements.userId,
        people.length > 0 ? people.map((person) => person.id) : [""],
      ),
    );
  }
  const { start, end } = dayRangeBounds(filter);
  if (start) conditions.push(gte(stockMovements.createdAt, start));
  if (end) conditions.push(lt(stockMovements.createdAt, end));
  return conditions;
}

/** At most this many lots or people one filter text stands for. */
const matchedIdLimit = 200;

function idsOrNone(ids: number[]): number[] {
  return ids.length > 0 ? ids : [noRow];
}

/** The columns of a journal row, on the page and in the CSV file. */
function selectJournalRows() {
  return db
    .select({
      id: stockMovements.id,
      type: stockMovements.type,
      sku: items.sku,
      itemName: items.name,
      unit: items.unit,
      lotId: stockMovements.lotId,
      lot: lots.lotNumber,
      location: locations.code,
      quantity: stockMovements.quantity,
      unitCost: stockMovements.unitCost,
      countedQuantity: stockMovements.countedQuantity,
      grossKg: stockMovements.grossKg,
      itemOnHandAfter: stockMovements.itemOnHandAfter,
      transferId: stockMovements.transferId,
      reference: stockMovements.reference,
      note: stockMovements.note,
      user: users.name,
      createdAt: stockMovements.createdAt,
      /** The purchase order a receipt was booked against; null for one without (and every other movement). */
      purchaseOrderId: purchaseReceipts.orderId,
    })
    .from(stockMovements)
    .innerJoin(items, eq(items.id, stockMovements.itemId))
    .innerJoin(locations, eq(locations.id, stockMovements.locationId))
    .innerJoin(users, eq(users.id, stockMovements.userId))
    .leftJoin(lots, eq(lots.id, stockMovements.lotId))
    .leftJoin(
      purchaseReceiptLines,
      eq(purchaseReceiptLines.movementId, stockMovements.id),
    )
    .leftJoin(
      purchaseReceipts,
      eq(purchaseReceipts.id, purchaseReceiptLines.receiptId),
    );
}

/** Rows older than the cursor in the journal's order (time, then id, newest first). */
function olderThan(cursor: KeysetCursor): SQL {
  return or(
    lt(stockMovements.createdAt, cursor.at),
    and(
      eq(stockMovements.createdAt, cursor.at),
      lt(stockMovements.id, cursor.id),
    ),
  )!;
}

/** Rows newer than the cursor in the journal's order. */
function newerThan(cursor: KeysetCursor): SQL {
  return or(
    gt(stockMovements.createdAt, cursor.at),
    and(
      eq(stockMovements.createdAt, cursor.at),
      gt(stockMovements.id, cursor.id),
    ),
  )!;
}

const newestFirst = [desc(stockMovements.createdAt), desc(stockMovements.id)];
const oldestFirst = [asc(stockMovements.createdAt), asc(stockMovements.id)];

const cursorOf = (row: { createdAt: Date; id: number }) =>
  formatKeysetCursor({ at: row.createdAt, id: row.id });

/**
 * One page of movements matching the filters. Returns `hasMore` rather than a
 * total: counting a million-row journal for every page would cost more than the page.
 *
 * After a cursor (`after`, older) or before one (`before`, newer) the page is read from
 * the (item, time), (time) … indexes at the cursor's place (keyset); `page` alone still
 * skips `page − 1` pages (offset), which grows with depth, so the journal's own links and
 * the API's `nextCursor`/`previousCursor` carry cursors.
 */
export async function listMovements(
  query: MovementJournalQuery & { itemId?: number },
) {
  const conditions = await journalConditions(query);
  const where = (...more: SQL[]) => and(...conditions, ...more);
  let rows: Awaited<ReturnType<typeof readPage>>;
  let hasMore: boolean;
  let hasNewer: boolean;
  function readPage(condition: SQL | undefined, order: SQL[], offset = 0) {
    return selectJournalRows()
      .where(condition)
      .orderBy(...order)
      .limit(query.pageSize + 1)
      .offset(offset);
  }
  if (query.before) {
    // The newer page, read upwards from the cursor and turned round.
    const newer = await readPage(where(newerThan(query.before)), oldestFirst);
    hasNewer = newer.length > query.pageSize;
    rows = newer.slice(0, query.pageSize).reverse();
    const older = await selectJournalRows()
      .where(where(olderThan(rows.at(-1) ? keyOf(rows.at(-1)!) : query.before)))
      .orderBy(...newestFirst)
      .limit(1);
    hasMore = older.length > 0;
  } else {
    const found = query.after
      ? await readPage(where(olderThan(query.after)), newestFirst)
      : await readPage(
          conditions.length > 0 ? and(...conditions) : undefined,
          newestFirst,
          (query.page - 1) * query.pageSize,
        );
    hasMore = found.length > query.pageSize;
    rows = found.slice(0, query.pageSize);
    hasNewer = query.after !== undefined || query.page > 1;
  }

  const quantity = (text: string | null) =>
    text === null ? null : quantityToNumber(parseQuantity(text));
  return {
    hasMore,
    /** Where the next (older) page starts; null on the last page. */
    nextCursor: hasMore && rows.length > 0 ? cursorOf(rows.at(-1)!) : null,
    /** Where the previous (newer) page ends; null on the first page. */
    previousCursor: hasNewer && rows.length > 0 ? cursorOf(rows[0]!) : null,
    movements: rows.map((row) => ({
      ...row,
      quantity: quantity(row.quantity)!,
      unitCost: row.unitCost === null ? null : Number(row.unitCost),
      countedQuantity: quantity(row.countedQuantity),
      grossKg: quantity(row.grossKg),
      itemOnHandAfter: quantity(row.itemOnHandAfter)!,
      createdAt: row.createdAt.toISOString(),
    })),
  };
}

const keyOf = (row: { createdAt: Date; id: number }): KeysetCursor => ({
  at: row.createdAt,
  id: row.id,
});

/**
 * Every movement matching the filters, newest first, a batch at a time: each batch is
 * read after the last row of the one before (by time and id, the journal's order and
 * index), so a long journal is never held whole in memory nor skipped through by offset.
 */
export async function* journalInBatches(
  filter: MovementJournalFilter,
  batchSize = 1000,
) {
  const conditions = await journalConditions(filter);
  let after: KeysetCursor | undefined;
  for (;;) {
    const rows = await selectJournalRows()
      .where(and(...conditions, after ? olderThan(after) : undefined))
      .orderBy(...newestFirst)
      .limit(batchSize);
    if (rows.length > 0) yield rows;
    if (rows.length < batchSize) return;
    after = keyOf(rows[rows.length - 1]!);
  }
}
