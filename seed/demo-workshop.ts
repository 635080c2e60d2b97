/**
 * Everything the demo seeds after the store: purchasing (suppliers, price
 * lists, metal base, currency rates, deliveries), then designs, then build
 * orders on them. Runs on a database that has the demo store.
 */
import { seedDemoBuildOrders } from "./demo-build-orders";
import { seedDemoDesigns } from "./demo-designs";
import { seedDemoPurchasing } from "./demo-purchasing";

export async function seedDemoWorkshop(): Promise<void> {
  const purchasing = await seedDemoPurchasing();
  const designs = await seedDemoDesigns(purchasing);
  await seedDemoBuildOrders(designs);
}
