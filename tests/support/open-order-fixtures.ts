/**
 * Purchase orders written straight into the test database, as sending would leave them
 * (status sent or partly received, items.on_order raised by what is still open), for
 * tests of what reads orders: on order, covered alerts, late lines, delivery records.
 */
import { eq } from "drizzle-orm";
import { items, suppliers } from "~/db/schema";
import type { PurchaseOrderStatus } from "~/db/tables/purchase-order-enums";
import { addDays, todayUtc } from "~/lib/calendar-days";
import { createOrder, type OrderLineFixture } from "./purchase-order-fixtures";
import { testDb } from "./test-database";

export const today = () => todayUtc();
/** The day `days` from today (UTC), "YYYY-MM-DD". */
export const dayFromToday = (days: number) => addDays(today(), days);

export async function supplierWithLeadTime(
  name: string,
  leadTimeDays: number | null,
): Promise<number> {
  const [created] = await testDb()
    .insert(suppliers)
    .values({ name, currency: "EUR", leadTimeDays })
    .$returningId();
  return created!.id;
}

export async function itemIdOf(sku: string): Promise<number> {
  const [row] = await testDb()
    .select({ id: items.id })
    .from(items)
    .where(eq(items.sku, sku));
  return row!.id;
}

export interface FixtureLine {
  sku: string;
  quantity: string;
  received?: string;
  expectedDate: string;
  completedAt?: Date | null;
}

/** An order with its lines by SKU, ordered 30 days ago, in EUR at 1.0000 a unit. */
export async function insertOrder(input: {
  supplierId: number;
  userId: string;
  status: PurchaseOrderStatus;
  lines: FixtureLine[];
  updatedAt?: Date;
}): Promise<{ id: number; lineIds: number[] }> {
  const lines: OrderLineFixture[] = [];
  for (const line of input.lines)
    lines.push({ ...line, itemId: await itemIdOf(line.sku) });
  return createOrder({ ...input, orderedOn: dayFromToday(-30), lines });
}
