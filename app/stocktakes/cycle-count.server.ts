/** The cycle-count plan from the database: each active location's stock value and last count. */
import { and, eq, sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import { locations } from "~/db/schema";
import { todayUtc } from "~/lib/calendar-days";
import { parseUnitCost } from "~/lib/decimal-amounts";
import { cycleCountPlan, type PlannedLocation } from "./cycle-count-plan";

/** The locations to count this week (see cycle-count-plan.ts). */
export async function weeklyCountPlan(
  now = new Date(),
): Promise<PlannedLocation[]> {
  const rows = await db
    .select({
      id: locations.id,
      code: locations.code,
      lastCountedOn: locations.lastCountedOn,
      // Σ on hand × the item's average cost, to ten-thousandths of money.
      value: sql<string>`COALESCE((SELECT ROUND(SUM(b.on_hand * i.average_cost), 4) FROM stock_balances b JOIN items i ON i.id = b.item_id WHERE b.location_id = ${locations.id}), 0)`,
      inOpenStocktake: sql<number>`EXISTS (SELECT 1 FROM stocktake_locations sl JOIN stocktakes s ON s.id = sl.stocktake_id WHERE sl.location_id = ${locations.id} AND s.status = 'counting')`,
    })
    .from(locations)
    .where(and(eq(locations.active, true)));
  return cycleCountPlan(
    rows.map((row) => ({
      id: row.id,
      code: row.code,
      lastCountedOn: row.lastCountedOn,
      value: parseUnitCost(String(row.value)),
      inOpenStocktake: Number(row.inOpenStocktake) === 1,
    })),
    todayUtc(now),
  );
}
