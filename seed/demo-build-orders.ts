/**
 * The demo company's build orders, through the app's build-order code: a
 * finished pilot batch, a batch being built (some stock issued) and a batch
 * with its stock held and half its wire issued. Reservations check the low-stock alerts as they would
 * for a builder. Quantities stay within the demo store.
 */
import { reserveBuildOrderStock } from "~/build-orders/build-order-reservations.server";
import { completeBuildOrder } from "~/build-orders/build-order-closing.server";
import {
  buildOrderCreateSchema,
  issueRequestSchema,
} from "~/build-orders/build-order-forms";
import { issueToBuildOrder } from "~/build-orders/build-order-issues.server";
import { createBuildOrder } from "~/build-orders/build-orders.server";
import type { DemoDesigns } from "./demo-designs";
import { demoPersonId } from "./demo-person-ids";

/** Issues what a reservation holds, by lot and location; `share` of it for the SKUs in `partly`. */
async function issueHeld(
  orderId: number,
  held: {
    sku: string;
    lot: string | null;
    location: string;
    quantity: number;
  }[],
  storekeeperId: string,
  options: { skus?: readonly string[]; partly?: Record<string, number> } = {},
) {
  for (const place of held) {
    if (options.skus && !options.skus.includes(place.sku)) continue;
    const share = options.partly?.[place.sku] ?? 1;
    const quantity = Math.floor(place.quantity * share * 1000) / 1000;
    if (quantity <= 0) continue;
    await issueToBuildOrder(
      orderId,
      issueRequestSchema.parse({
        sku: place.sku,
        lot: place.lot ?? undefined,
        location: place.location,
        quantity,
      }),
      storekeeperId,
    );
  }
}

export async function seedDemoBuildOrders(designs: DemoDesigns): Promise<void> {
  const builderId = demoPersonId("builder");
  const storekeeperId = demoPersonId("storekeeper");

  // A pilot batch of outrunners, built and closed. The winders used less wire than the scrap allowance.
  const pilot = await createBuildOrder(
    buildOrderCreateSchema.parse({
      designId: designs.outrunner.id,
      revision: designs.outrunner.released,
      quantity: 6,
      note: "Pilot batch for the cart-drive field trial.",
    }),
    builderId,
  );
  const pilotHeld = await reserveBuildOrderStock(pilot.id, builderId, {
    partial: true,
  });
  await issueHeld(pilot.id, pilotHeld.reserved, storekeeperId, {
    partly: { "CU-IEC-0500": 0.97, "PT-VARNISH": 0.9 },
  });
  await completeBuildOrder(
    pilot.id,
    builderId,
    "All six passed the hi-pot and back-EMF checks.",
  );

  // A batch of servos on the bench: wire, magnets and stator parts issued, the rest still held.
  const servos = await createBuildOrder(
    buildOrderCreateSchema.parse({
      designId: designs.servo.id,
      revision: designs.servo.released,
      quantity: 4,
      note: "First servo batch for the axis test rig.",
    }),
    builderId,
  );
  const servoHeld = await reserveBuildOrderStock(servos.id, builderId, {
    partial: true,
  });
  const stator = servoHeld.reserved
    .map((place) => place.sku)
    .filter((sku) => /LAM|WDG|SLN/.test(sku));
  await issueHeld(servos.id, servoHeld.reserved, storekeeperId, {
    skus: ["CU-IEC-0800", "MG-N38UH-A28", ...stator],
  });

  // The next outrunner order: stock held, and the first half of its wire issued, from the
  // spools the pilot batch was wound from (the oldest first): a lot that fed two builds.
  const next = await createBuildOrder(
    buildOrderCreateSchema.parse({
      designId: designs.outrunner.id,
      revision: designs.outrunner.released,
      quantity: 10,
      note: "Ten motors for the conveyor customer.",
    }),
    builderId,
  );
  const nextHeld = await reserveBuildOrderStock(next.id, builderId, {
    partial: true,
  });
  await issueHeld(next.id, nextHeld.reserved, storekeeperId, {
    skus: ["CU-IEC-0500"],
    partly: { "CU-IEC-0500": 0.5 },
  });
}
