import { eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { wireItems } from "~/db/schema";
import type { ConductorKey, InsulationKey } from "~/engineering/reference-data";
import {
  wireProperties,
  type WireProperties,
} from "~/engineering/wire-geometry";

/** The wire item's geometry (bare diameter, linear mass, metres per kg …), or null for other items. */
export async function wireItemProperties(itemId: number): Promise<
  | (WireProperties & {
      conductor: string;
      standard: string;
      sizeLabel: string;
    })
  | null
> {
  const [wire] = await db
    .select()
    .from(wireItems)
    .where(eq(wireItems.itemId, itemId))
    .limit(1);
  if (!wire) return null;
  const spec =
    wire.standard === "AWG"
      ? { standard: "AWG" as const, size: wire.sizeLabel }
      : { standard: "IEC" as const, diameterMm: Number(wire.sizeLabel) };
  return {
    conductor: wire.conductor,
    standard: wire.standard,
    sizeLabel: wire.sizeLabel,
    ...wireProperties({
      conductor: wire.conductor as ConductorKey,
      wire: spec,
      insulation: (wire.insulation ?? null) as InsulationKey | null,
    }),
  };
}

/** Metres of bare conductor per kg of the wire item: an upper bound for enamelled stock. Null for other items. */
export async function wireMetresPerKg(itemId: number): Promise<number | null> {
  return (await wireItemProperties(itemId))?.metresPerKg ?? null;
}
