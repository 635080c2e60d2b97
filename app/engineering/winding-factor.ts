/**
 * Winding factors of a balanced m-phase winding from its slots, poles and layers, by the
 * star of slots: every coil side's back-EMF is a phasor at its slot's electrical angle,
 * the coils are given to the phases by the sector their phasor falls in (as a balanced
 * winding is laid out), and a phase's winding factor for the ν-th harmonic is
 *
 *   k_w,ν = | Σ sign · e^{j·ν·θ_slot} | ÷ (number of coil sides of the phase)
 *
 * over the phase's coil sides (θ_slot = slot index × p × 360°/Q, electrical). This is the
 * distribution factor and the pitch factor in one: for an integer-slot winding it equals
 * k_d · k_p = [sin(q·ν·α/2) ÷ (q·sin(ν·α/2))] · sin(ν·y·α/2) (Pyrhönen, Jokinen and
 * Hrabovcová, Design of Rotating Electrical Machines, ch. 2; the tests check it against
 * that closed form and against published tables).
 *
 * Layout (stated, because the factor depends on it):
 * - Coil pitch y, in slots: given, or the whole number nearest to Q/2p and at least 1, a tie
 *   going to the shorter pitch (less copper). With fewer than about 1.5 slots per pole this
 *   is 1: a tooth-coil (concentrated) winding; with more, a distributed winding, full pitch
 *   when Q/2p is whole.
 * - Double layer: a coil starts in every slot (top layer) and returns y slots on (bottom
 *   layer); Q coils, Q/m per phase.
 * - Single layer: one coil side per slot. With an odd pitch (tooth coils), a coil starts in
 *   every other slot and returns y slots on; with an even pitch (distributed, Q/2p even),
 *   every slot's side goes to the phase and sign of its own phasor and the sides of a phase
 *   are joined into coils (the joining does not change the EMF). Q/2 coils, Q/(2m) per phase.
 * - Phase belts: 2m sectors of 180°/m, phase i positive centred at i·360°/m, negative at
 *   i·360°/m + 180°; m must be odd (3, 5, 7 …) for these belts to be distinct.
 *
 * Harmonic orders are of the back-EMF, in multiples of the electrical fundamental (a
 * magnet rotor of p pole pairs induces only these); factors are magnitudes (0 to 1).
 *
 * Feasibility (refused with the field named): t = GCD(Q, p); a balanced m-phase winding
 * needs Q/(m·t) whole (Bianchi, Dai Pré et al., star-of-slots theory of fractional-slot
 * windings; Pyrhönen et al. ch. 2; condition from memory, not checked against the printed
 * page). A single layer also needs Q even. After laying out, the phases' EMF phasors are
 * checked to be equal and 360°/m apart; a single-layer layout that is not is refused.
 */

import { EngineeringInputError } from "./errors";

export interface WindingInput {
  /** Stator slots Q, ≥ 3. */
  slots: number;
  /** Rotor poles 2p, even, ≥ 2. */
  poles: number;
  /** Winding layers: 1 (single) or 2 (double). */
  layers: number;
  /** Phases m, odd, ≥ 3; default 3. */
  phases?: number;
  /** Coil pitch in slots, 1 ≤ y < Q; default as in the module comment. */
  coilPitch?: number | null;
}

export interface HarmonicWindingFactor {
  /** Harmonic order of the back-EMF (1 = fundamental). */
  order: number;
  /** Winding factor magnitude, 0–1. */
  factor: number;
}

export interface WindingFactors {
  /** Fundamental winding factor k_w1. */
  fundamental: number;
  /** Odd harmonics that are not multiples of 3 (for m = 3) up to the 19th, the fundamental first. */
  harmonics: HarmonicWindingFactor[];
  /** Coil pitch used, slots. */
  coilPitch: number;
  /** Slots per pole per phase q = Q/(2p·m). */
  slotsPerPolePerPhase: number;
  /** Coils per phase: Q/m double layer, Q/(2m) single layer. */
  coilsPerPhase: number;
  /** "concentrated" (tooth coils, y = 1) or "distributed". */
  kind: "concentrated" | "distributed";
}

/** Harmonic orders reported: odd, up to 19, triplens left out for a phase count divisible by 3. */
export const MAX_HARMONIC_ORDER = 19;

const MAX_SLOTS = 1000;
const MAX_POLES = 500;

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

function requireWhole(
  value: unknown,
  field: string,
  label: string,
  min: number,
  max: number,
): number {
  if (
    typeof value !== "number" ||
    !Number.isInteger(value) ||
    value < min ||
    value > max
  ) {
    throw new EngineeringInputError(
      field,
      `${label} must be a whole number from ${min} to ${max}.`,
    );
  }
  return value;
}

/** The default coil pitch: the whole number nearest Q/2p, at least 1, a tie to the shorter. */
export function defaultCoilPitch(slots: number, poles: number): number {
  const polePitchSlots = slots / poles;
  return Math.max(1, Math.ceil(polePitchSlots - 0.5));
}

interface CoilSide {
  slot: number;
  phase: number;
  sign: 1 | -1;
}

/**
 * Phase and sign of the coil side in `slot`: the belt its phasor (slot · p · 360°/Q) falls in.
 * Sector = floor((θ + 90°/m) ÷ (180°/m)) = floor((4·m·slot·p + Q) ÷ 2Q), in whole numbers so
 * a phasor on a belt's edge always goes the same way.
 */
function beltOf(
  slot: number,
  slots: number,
  polePairs: number,
  phases: number,
): { phase: number; sign: 1 | -1 } {
  const turned = (4 * phases * slot * polePairs + slots) % (4 * phases * slots);
  const sector = Math.floor(turned / (2 * slots));
  // Positive belt of phase i: sector 2i; negative belt: sector (2i + m) mod 2m.
  if (sector % 2 === 0) return { phase: sector / 2, sign: 1 };
  return {
    phase: ((sector - phases + 2 * phases) % (2 * phases)) / 2,
    sign: -1,
  };
}

function layOut(
  slots: number,
  polePairs: number,
  phases: number,
  layers: number,
  pitch: number,
): CoilSide[] {
  const belt = (slot: number) => beltOf(slot, slots, polePairs, phases);
  const sides: CoilSide[] = [];
  const coil = (start: number) => {
    const { phase, sign } = belt(start);
    sides.push({ slot: start, phase, sign });
    sides.push({
      slot: (start + pitch) % slots,
      phase,
      sign: sign === 1 ? -1 : 1,
    });
  };
  if (layers === 2) {
    for (let start = 0; start < slots; start++) coil(start);
  } else if (pitch % 2 === 1) {
    for (let start = 0; start < slots; start += 2) coil(start);
  } else {
    for (let slot = 0; slot < slots; slot++)
      sides.push({ slot, ...belt(slot) });
  }
  return sides;
}

/** Σ sign · e^{jνθ} over one phase's sides: [re, im, side count]. */
function phaseEmf(
  sides: readonly CoilSide[],
  phase: number,
  order: number,
  slots: number,
  polePairs: number,
): { re: number; im: number; count: number } {
  let re = 0;
  let im = 0;
  let count = 0;
  for (const side of sides) {
    if (side.phase !== phase) continue;
    const angle = (2 * Math.PI * order * side.slot * polePairs) / slots;
    re += side.sign * Math.cos(angle);
    im += side.sign * Math.sin(angle);
    count++;
  }
  return { re, im, count };
}

/** True when every phase has the same sides and an equal fundamental EMF, 360°/m after the one before. */
function isBalanced(
  sides: readonly CoilSide[],
  slots: number,
  polePairs: number,
  phases: number,
): boolean {
  const emfs = Array.from({ length: phases }, (_, phase) =>
    phaseEmf(sides, phase, 1, slots, polePairs),
  );
  const first = emfs[0]!;
  const magnitude = Math.hypot(first.re, first.im);
  if (magnitude < 1e-9) return false;
  const firstAngle = Math.atan2(first.im, first.re);
  return emfs.every((emf, phase) => {
    if (emf.count !== first.count) return false;
    if (Math.abs(Math.hypot(emf.re, emf.im) - magnitude) > 1e-9 * magnitude)
      return false;
    const expected = firstAngle + (2 * Math.PI * phase) / phases;
    const difference = Math.atan2(emf.im, emf.re) - expected;
    return Math.abs(Math.sin(difference / 2)) < 1e-9;
  });
}

/** Harmonic orders reported for `phases` phases. */
export function reportedHarmonicOrders(phases: number): number[] {
  const orders: number[] = [];
  for (let order = 1; order <= MAX_HARMONIC_ORDER; order += 2) {
    if (order > 1 && phases % 3 === 0 && order % 3 === 0) continue;
    orders.push(order);
  }
  return orders;
}

/**
 * The refusal for a combination that cannot make a balanced winding, or null. Used by the
 * design form to name the field before anything is saved.
 */
export function windingInfeasibility(
  input: WindingInput,
): EngineeringInputError | null {
  try {
    windingFactors(input);
    return null;
  } catch (error) {
    if (error instanceof EngineeringInputError) return error;
    throw error;
  }
}

/** The winding factors of a balanced winding (see the module comment). */
export function windingFactors(input: WindingInput): WindingFactors {
  const slots = requireWhole(
    input.slots,
    "slots",
    "The slot count",
    3,
    MAX_SLOTS,
  );
  const poles = requireWhole(
    input.poles,
    "poles",
    "The pole count",
    2,
    MAX_POLES,
  );
  if (poles % 2 !== 0)
    throw new EngineeringInputError(
      "poles",
      "A motor has an even number of poles (north and south in pairs).",
    );
  const phases = requireWhole(
    input.phases ?? 3,
    "phases",
    "The phase count",
    3,
    15,
  );
  if (phases % 2 === 0)
    throw new EngineeringInputError(
      "phases",
      "The winding factor is worked out for an odd number of phases (3, 5, 7 …).",
    );
  const layers = input.layers;
  if (layers !== 1 && layers !== 2)
    throw new EngineeringInputError(
      "layers",
      "The winding has 1 layer (single) or 2 layers (double).",
    );
  const polePairs = poles / 2;
  const t = gcd(slots, polePairs);
  if ((slots / (phases * t)) % 1 !== 0)
    throw new EngineeringInputError(
      "slots",
      `${slots} slots and ${poles} poles cannot make a balanced ${phases}-phase winding: slots ÷ (phases × GCD(slots, pole pairs)) = ${slots} ÷ (${phases} × ${t}) is not a whole number.`,
    );
  if (layers === 1 && slots % 2 !== 0)
    throw new EngineeringInputError(
      "layers",
      `A single-layer winding puts one coil side in each slot, so it needs an even number of slots; ${slots} slots take a double-layer winding.`,
    );
  const pitch =
    input.coilPitch === undefined || input.coilPitch === null
      ? defaultCoilPitch(slots, poles)
      : requireWhole(
          input.coilPitch,
          "coilPitch",
          "The coil pitch",
          1,
          slots - 1,
        );

  const sides = layOut(slots, polePairs, phases, layers, pitch);
  if (!isBalanced(sides, slots, polePairs, phases))
    throw new EngineeringInputError(
      layers === 1 ? "layers" : "coilPitch",
      layers === 1
        ? `${slots} slots and ${poles} poles cannot be laid out as a balanced single-layer ${phases}-phase winding with a coil pitch of ${pitch} slots; a double-layer winding can.`
        : `A coil pitch of ${pitch} slots gives no EMF at the fundamental with ${slots} slots and ${poles} poles.`,
    );

  const sidesPerPhase = sides.length / phases;
  const harmonics = reportedHarmonicOrders(phases).map((order) => {
    const emf = phaseEmf(sides, 0, order, slots, polePairs);
    const factor = Math.hypot(emf.re, emf.im) / sidesPerPhase;
    // Below 1e-12 the factor is a rounding remainder of an exact zero.
    return { order, factor: factor < 1e-12 ? 0 : factor };
  });
  return {
    fundamental: harmonics[0]!.factor,
    harmonics,
    coilPitch: pitch,
    slotsPerPolePerPhase: slots / (poles * phases),
    coilsPerPhase: sidesPerPhase / 2,
    kind: pitch === 1 ? "concentrated" : "distributed",
  };
}
