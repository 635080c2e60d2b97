/**
 * The stock half of the cost insight: what the store is worth, by kind and by location,
 * how much of it is reserved, how many items are below their reorder point, and how the
 * value moved week by week. Read-only.
 *
 * Value is on hand × moving average cost, each item (or balance) rounded half away from
 * zero to 0.0001 first, the ledger's `valueOf` rule (items.stock_value is that product,
 * kept by the database); sums of those are exact.
 *
 * The weekly trend is taken from the movement journal: every movement stores the item's
 * on hand and average cost after it, so an item's value at a moment is that of its last
 * movement before the moment, and the store's value is the sum over items. Each week's
 * value is one grouped read of the (item_id, created_at) index ("Using index for
 * group-by": one jump per item, not one row per movement), then one primary-key read per
 * item. The journal is append-only and movements are stamped with the time they are
 * recorded, so the value at the end of a week that is over does not change: those are
 * kept in memory once read (per process, a few dozen numbers), and only the running week
 * is read again, from the items' kept balances.
 */
import { and, count, eq, gt, isNotNull, ne, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { items, locations, stockAlerts, stockBalances } from "~/db/schema";
import type { ItemKind } from "~/db/tables/stock-enums";
import { companyCurrency } from "~/purchasing/suppliers.server";
import { parseUnitCost } from "~/lib/decimal-amounts";
import { moneyToJson } from "./design-insight";
import { trendWeeks, type TrendWeek } from "./insight-periods";

/** Weeks in the stock-value trend, the running week included. */
export const stockTrendWeeks = 26;

/** Locations listed by value; the rest are summed into one line. */
const locationsShown = 50;

/** A week's end is kept in memory only once it is this far in the past (a movement being recorded across midnight has landed by then). */
const settledAfterMs = 15 * 60_000;

/** Values at the end of past weeks (ISO time → ten-thousandths), kept as the read's promise so two pages asking at once share one read. */
const settledValues = new Map<string, Promise<bigint>>();
const settledLimit = 4 * stockTrendWeeks;

/** A DECIMAL sum as ten-thousandths; SQL's NULL (nothing summed) is 0. */
function money(value: string | null | undefined): bigint {
  return value === null || value === undefined ? 0n : parseUnitCost(value);
}

/** The store's value at a moment: Σ over items of their last movement's on hand × average cost before it. */
async function valueBefore(moment: Date): Promise<bigint> {
  // The last movement per item before the moment: the latest time by the index's group-by
  // jump, then the highest id at that time (the two rows of a transfer share their time).
  const [rows] = (await db.execute(sql`
    SELECT SUM(ROUND(m.item_on_hand_after * m.average_cost_after, 4)) AS value
    FROM (
      SELECT latest.item_id, MAX(s.id) AS id
      FROM (
        SELECT item_id, MAX(created_at) AS at
        FROM stock_movements
        WHERE created_at < ${moment}
        GROUP BY item_id
      ) latest
      JOIN stock_movements s
        ON s.item_id = latest.item_id AND s.created_at = latest.at
      GROUP BY latest.item_id
    ) last_movement
    JOIN stock_movements m ON m.id = last_movement.id
  `)) as unknown as [{ value: string | null }[]];
  return money(rows[0]?.value);
}

/** Σ on hand × average cost of every item now, per kind (the kept, indexed stock_value). */
async function valueByKind() {
  // Grouped on (active, kind) so the read stays inside items_kind_value_idx
  // (active, kind, stock_value): an index-only scan, no row reads.
  const rows = await db
    .select({
      kind: items.kind,
      value: sql<string | null>`SUM(${items.stockValue})`,
      items: sql<number>`SUM(${items.stockValue} <> 0)`,
    })
    .from(items)
    .groupBy(items.active, items.kind);
  const byKind = new Map<ItemKind, { value: bigint; items: number }>();
  for (const row of rows) {
    const kind = row.kind as ItemKind;
    const entry = byKind.get(kind) ?? { value: 0n, items: 0 };
    entry.value += money(row.value);
    entry.items += Number(row.items);
    byKind.set(kind, entry);
  }
  return [...byKind].map(([kind, entry]) => ({ kind, ...entry }));
}

async function valueByLocation() {
  const value = sql<
    string | null
  >`SUM(ROUND(${stockBalances.onHand} * ${items.averageCost}, 4))`;
  const rows = await db
    .select({
      locationId: stockBalances.locationId,
      code: locations.code,
      name: locations.name,
      value,
      items: sql<number>`COUNT(DISTINCT ${stockBalances.itemId})`,
    })
    .from(stockBalances)
    .innerJoin(items, eq(items.id, stockBalances.itemId))
    .innerJoin(locations, eq(locations.id, stockBalances.locationId))
    .where(ne(stockBalances.onHand, "0"))
    .groupBy(stockBalances.locationId, locations.code, locations.name)
    .orderBy(sql`${value} DESC`, locations.code);
  return rows.map((row) => ({
    locationId: row.locationId,
    code: row.code,
    name: row.name,
    value: money(row.value),
    items: Number(row.items),
  }));
}

async function reservedValue(): Promise<bigint> {
  const [row] = await db
    .select({
      value: sql<
        string | null
      >`SUM(ROUND(${items.reserved} * ${items.averageCost}, 4))`,
    })
    .from(items)
    .where(gt(items.reserved, "0"));
  return money(row?.value);
}

async function shortItems() {
  const [[below], [alerts]] = await Promise.all([
    db
      .select({ count: count() })
      .from(items)
      .where(and(eq(items.active, true), eq(items.belowReorder, true))),
    db
      .select({ count: count() })
      .from(stockAlerts)
      .where(isNotNull(stockAlerts.openItemId)),
  ]);
  return {
    belowReorderPoint: Number(below?.count ?? 0),
    openAlerts: Number(alerts?.count ?? 0),
  };
}

/** Runs `task` over `inputs` two at a time (the database has two cores to give). */
async function twoAtATime<Input, Output>(
  inputs: readonly Input[],
  task: (input: Input) => Promise<Output>,
): Promise<Output[]> {
  const outputs: Output[] = new Array(inputs.length);
  let next = 0;
  const worker = async () => {
    while (next < inputs.length) {
      const index = next++;
      outputs[index] = await task(inputs[index]!);
    }
  };
  await Promise.all([worker(), worker()]);
  return outputs;
}

/** The value at the end of each trend week; the running week is the value now. */
async function weeklyValues(
  weeks: readonly TrendWeek[],
  now: Date,
  valueNow: bigint,
): Promise<{ week: string; value: bigint; complete: boolean }[]> {
  const values = await twoAtATime(weeks, async (week) => {
    if (!week.complete) return valueNow;
    if (now.getTime() - week.valueAt.getTime() < settledAfterMs)
      return valueBefore(week.valueAt);
    const key = week.valueAt.toISOString();
    let settled = settledValues.get(key);
    if (!settled) {
      settled = valueBefore(week.valueAt);
      settledValues.set(key, settled);
      // A failed read (the database away) is not kept: the next page reads again.
      settled.catch(() => settledValues.delete(key));
      if (settledValues.size > settledLimit)
        settledValues.delete(settledValues.keys().next().value!);
    }
    return settled;
  });
  return weeks.map((week, index) => ({
    week: week.week,
    value: values[index]!,
    complete: week.complete,
  }));
}

/**
 * Reads the weeks that are over into memory in the background, so the insight page's
 * trend is ready when the manager opens it from the start page. Errors are left for the
 * page's own read to show.
 */
export function prepareStockValueTrend(now: Date = new Date()): void {
  void weeklyValues(trendWeeks(now, stockTrendWeeks), now, 0n).catch(
    () => undefined,
  );
}

/** The value at the end of each of the last 26 weeks, the running week's being the value now. */
export async function stockValueTrend(now: Date = new Date()) {
  const byKind = await valueByKind();
  const valueNow = byKind.reduce((sum, kind) => sum + kind.value, 0n);
  const weeks = await weeklyValues(
    trendWeeks(now, stockTrendWeeks),
    now,
    valueNow,
  );
  return weeks.map((point) => ({
    week: point.week,
    value: moneyToJson(point.value),
    complete: point.complete,
  }));
}

/** Everything the stock half of the insight shows; `trend: false` leaves the weekly trend out (trend null). */
export async function stockValueInsight(options: {
  trend: boolean;
  now?: Date;
}) {
  const now = options.now ?? new Date();
  const [currency, byKind, byLocation, reserved, short] = await Promise.all([
    companyCurrency(),
    valueByKind(),
    valueByLocation(),
    reservedValue(),
    shortItems(),
  ]);
  const total = byKind.reduce((sum, kind) => sum + kind.value, 0n);
  const trend = options.trend
    ? await weeklyValues(trendWeeks(now, stockTrendWeeks), now, total)
    : null;
  const shownLocations = byLocation.slice(0, locationsShown);
  const otherLocations = byLocation.slice(locationsShown);
  return {
    currency,
    total: moneyToJson(total),
    byKind: byKind.map((kind) => ({ ...kind, value: moneyToJson(kind.value) })),
    byLocation: shownLocations.map((location) => ({
      ...location,
      value: moneyToJson(location.value),
    })),
    /** Locations beyond the first 50 by value, summed; null when there are none. */
    otherLocations:
      otherLocations.length === 0
        ? null
        : {
            locations: otherLocations.length,
            value: moneyToJson(
              otherLocations.reduce(
                (sum, location) => sum + location.value,
                0n,
              ),
            ),
          },
    reservedValue: moneyToJson(reserved),
    belowReorderPoint: short.belowReorderPoint,
    openAlerts: short.openAlerts,
    trend:
      trend?.map((point) => ({
        week: point.week,
        value: moneyToJson(point.value),
        complete: point.complete,
      })) ?? null,
  };
}

export type StockValueInsight = Awaited<ReturnType<typeof stockValueInsight>>;
