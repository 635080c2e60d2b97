/**
 * The conductor a coil is wound with, whatever its form: round magnet wire (AWG or IEC),
 * litz wire, or rectangular (flat) wire. One place gives what the coil estimate needs of
 * each: its copper, its size, the extra strand length of litz, and its AC resistance factor
 * in a layered winding (Dowell; see ./skin-effect).
 *
 * - Round wire: Dowell with the equal-area square; the pitch along a layer is the overall
 *   diameter (touching turns), or the bare diameter when no insulation is given (which
 *   slightly overstates the loss).
 * - Litz wire: strand-level Dowell (./litz-wire).
 * - Flat wire wound flat: the thickness lies across the layer (h = a) and the conductors sit
 *   side by side at their overall width (η = b / b'); wound on edge, the two swap. The
 *   rounded corners are ignored in Δ.
 */

import { EngineeringInputError } from "./errors";
import {
  litzAcResistanceFactor,
  litzWire,
  type LitzWire,
  type LitzWireSpec,
} from "./litz-wire";
import {
  rectangularWire,
  type RectangularWire,
  type RectangularWireSpec,
} from "./rectangular-wire";
import type { InsulationKey } from "./reference-data";
import {
  dowellResistanceFactor,
  layerPenetrationRatio,
  roundConductorPenetrationRatio,
} from "./skin-effect";
import {
  bareDiameterMm,
  circleAreaMm2,
  overallDiameter,
  type WireSpec,
} from "./wire-geometry";

/** Any conductor the coil estimate takes. */
export type CoilWireSpec = WireSpec | LitzWireSpec | RectangularWireSpec;

export type ConductorKind = "round" | "litz" | "rectangular";

export interface CoilConductor {
  kind: ConductorKind;
  /** Copper of one conductor wound in hand (litz: all its strands), mm². */
  areaMm2: number;
  /** Round: the bare diameter. Litz and flat wire: the diameter of a round wire of the same copper. */
  bareDiameterMm: number;
  /** Round: overall diameter over the enamel. Litz: the estimated bundle diameter. Flat: null. */
  overallDiameterMm: number | null;
  overallDiameterIsEstimate: boolean;
  /** Length of copper per metre of conductor: the litz take-up factor, else 1. */
  lengthFactor: number;
  litz: LitzWire | null;
  rectangular: (RectangularWire & { edgewise: boolean }) | null;
}

/** The coil's conductor from the request's wire and insulation. */
export function coilConductor(
  wire: CoilWireSpec,
  insulation?: InsulationKey | null,
): CoilConductor {
  if (wire.standard === "litz") {
    const litz = litzWire(wire, insulation);
    return {
      kind: "litz",
      areaMm2: litz.copperAreaMm2,
      bareDiameterMm: litz.equalAreaDiameterMm,
      overallDiameterMm: litz.bundleDiameterMm,
      overallDiameterIsEstimate: true,
      lengthFactor: litz.takeUpFactor,
      litz,
      rectangular: null,
    };
  }
  if (wire.standard === "rectangular") {
    const flat = rectangularWire(wire, insulation);
    return {
      kind: "rectangular",
      areaMm2: flat.areaMm2,
      bareDiameterMm: Math.sqrt((4 * flat.areaMm2) / Math.PI),
      overallDiameterMm: null,
      overallDiameterIsEstimate: false,
      lengthFactor: 1,
      litz: null,
      rectangular: { ...flat, edgewise: wire.edgewise ?? false },
    };
  }
  if (wire.standard !== "AWG" && wire.standard !== "IEC") {
    throw new EngineeringInputError(
      "wire.standard",
      'The wire standard must be "AWG", "IEC", "litz" or "rectangular".',
    );
  }
  const bare = bareDiameterMm(wire);
  const overall = overallDiameter(wire, insulation);
  return {
    kind: "round",
    areaMm2: circleAreaMm2(bare),
    bareDiameterMm: bare,
    overallDiameterMm: overall.overallDiameterMm,
    overallDiameterIsEstimate: overall.overallDiameterIsEstimate,
    lengthFactor: 1,
    litz: null,
    rectangular: null,
  };
}

/** R_ac/R_dc of a winding of `layers` layers of this conductor at skin depth `skinDepthMm`. */
export function conductorAcResistanceFactor(
  conductor: CoilConductor,
  skinDepthMm: number,
  layers: number,
): number {
  if (conductor.litz) {
    return litzAcResistanceFactor({
      strandBareDiameterMm: conductor.litz.strandBareDiameterMm,
      strands: conductor.litz.strands,
      bundleDiameterMm: conductor.litz.bundleDiameterMm,
      layers,
      skinDepthMm,
    });
  }
  if (conductor.rectangular) {
    const flat = conductor.rectangular;
    const across = flat.edgewise ? flat.widthMm : flat.thicknessMm;
    const along = flat.edgewise ? flat.thicknessMm : flat.widthMm;
    const alongOverall = flat.edgewise
      ? (flat.overallThicknessMm ?? flat.thicknessMm)
      : (flat.overallWidthMm ?? flat.widthMm);
    return dowellResistanceFactor(
      layerPenetrationRatio({
        heightMm: across,
        widthMm: along,
        pitchMm: alongOverall,
        skinDepthMm,
      }),
      layers,
    );
  }
  const pitch = conductor.overallDiameterMm ?? conductor.bareDiameterMm;
  return dowellResistanceFactor(
    roundConductorPenetrationRatio(
      conductor.bareDiameterMm,
      pitch,
      skinDepthMm,
    ),
    layers,
  );
}
