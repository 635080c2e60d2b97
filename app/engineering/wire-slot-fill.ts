/**
 * The slot fill of a catalogue wire size: its bare diameter and its maximum overall
 * diameter over the enamel (published, else a labelled estimate, from the wire-geometry
 * module) put into the slot-fill module.
 *
 * Insulation: when none is given, IEC wire is taken as grade 2 and AWG wire as heavy build,
 * the builds most magnet wire is stocked in (common practice); the answer says which was
 * used (decision 037).
 */

import type { InsulationKey } from "./reference-data";
import {
  assessSlotFill,
  HEXAGONAL_PACKING_FILL_LIMIT,
  slotFillMessage,
  type SlotFill,
} from "./slot-fill";
import {
  bareDiameterMm,
  overallDiameter,
  type OverallDiameter,
  type WireSpec,
} from "./wire-geometry";

/** The insulation assumed when none is given: IEC grade 2, AWG heavy build (common practice). */
export function defaultInsulation(wire: WireSpec): InsulationKey {
  return wire.standard === "IEC" ? "grade2" : "heavy";
}

export interface WireSlotFillInput {
  wire: WireSpec;
  insulation?: InsulationKey | null;
  strands?: number;
  turns: number;
  coilSidesPerSlot?: number;
  slotAreaMm2: number;
  linerAreaMm2?: number | null;
}

export interface WireSlotFill extends SlotFill, OverallDiameter {
  insulation: InsulationKey;
  /** True when the insulation was not given and the default was assumed. */
  insulationAssumed: boolean;
  bareDiameterMm: number;
  /** The limit `fits` is judged against: π/√12, the densest packing of round wire. */
  limit: number;
  /** The most serious limit passed (0.45 on copper fill, π/4 or π/√12), or null. */
  limitPassed: number | null;
  message: string;
}

/** Copper and gross fill of `turns` × `coilSidesPerSlot` × `strands` of a wire size in a slot. */
export function assessWireSlotFill(input: WireSlotFillInput): WireSlotFill {
  const insulation = input.insulation ?? defaultInsulation(input.wire);
  const bare = bareDiameterMm(input.wire);
  const overall = overallDiameter(input.wire, insulation);
  const fill = assessSlotFill({
    turns: input.turns,
    coilSidesPerSlot: input.coilSidesPerSlot ?? 1,
    strands: input.strands ?? 1,
    bareDiameterMm: bare,
    overallDiameterMm: overall.overallDiameterMm,
    slotAreaMm2: input.slotAreaMm2,
    linerAreaMm2: input.linerAreaMm2 ?? null,
  });
  return {
    ...fill,
    ...overall,
    insulation,
    insulationAssumed: !input.insulation,
    bareDiameterMm: bare,
    limit: HEXAGONAL_PACKING_FILL_LIMIT,
    limitPassed: fill.warning?.limit ?? null,
    message: slotFillMessage(fill),
  };
}
