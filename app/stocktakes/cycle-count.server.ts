/** The cycle-count plan from the database: each active location's stock value and last count. */
import { eq, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  items,
  locations,
  stockBalances,
  stocktakeLocations,
  stocktakes,
} from "~/db/schema";
import { todayUtc } from "~/lib/calendar-days";
import { parseUnitCost } from "~/lib/decimal-amounts";
import { cycleCountPlan, type PlannedLocation } from "./cycle-count-plan";

/** The locations to count this week (see cycle-count-plan.ts). */
export async function weeklyCountPlan(
  now = new Date(),
): Promise<PlannedLocation[]> {
  const [places, values, open] = await Promise.all([
    db
      .select({
        id: locations.id,
        code: locations.code,
        lastCountedOn: locations.lastCountedOn,
      })
      .from(locations)
      .where(eq(locations.active, true)),
    // Σ on hand × the item's average cost per location, to ten-thousandths of money.
    db
      .select({
        locationId: stockBalances.locationId,
        value: sql<string>`ROUND(SUM(${stockBalances.onHand} * ${items.averageCost}), 4)`,
      })
      .from(stockBalances)
      .innerJoin(items, eq(items.id, stockBalances.itemId))
      .groupBy(stockBalances.locationId),
    db
      .selectDistinct({ locationId: stocktakeLocations.locationId })
      .from(stocktakeLocations)
      .innerJoin(stocktakes, eq(stocktakes.id, stocktakeLocations.stocktakeId))
      .where(eq(stocktakes.status, "counting")),
  ]);
  const valueAt = new Map(
    values.map((row) => [row.locationId, parseUnitCost(String(row.value))]),
  );
  const counting = new Set(open.map((row) => row.locationId));
  return cycleCountPlan(
    places.map((place) => ({
      id: place.id,
      code: place.code,
      lastCountedOn: place.lastCountedOn,
      value: valueAt.get(place.id) ?? 0n,
      inOpenStocktake: counting.has(place.id),
    })),
    todayUtc(now),
  );
}
