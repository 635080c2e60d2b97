/**
 * Everything the demo seeds after the store: purchasing (suppliers, price
 * lists, metal base, currency rates, deliveries), then designs, then build
 * orders on them, then purchase orders in each state and a batch planned
 * ahead, and a stocktake in progress. Runs on a database that has the demo store.
 */
import { seedDemoBuildOrders } from "./demo-build-orders";
import { seedDemoDesigns } from "./demo-designs";
import { seedDemoPurchaseOrders } from "./demo-purchase-orders";
import { seedDemoPurchasing } from "./demo-purchasing";
import { seedDemoStocktake } from "./demo-stocktake";

export async function seedDemoWorkshop(): Promise<void> {
  const purchasing = await seedDemoPurchasing();
  const designs = await seedDemoDesigns(purchasing);
  await seedDemoBuildOrders(designs);
  await seedDemoPurchaseOrders(designs);
  await seedDemoStocktake();
}
