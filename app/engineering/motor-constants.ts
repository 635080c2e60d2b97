/**
 * Torque and back-EMF constants and terminal resistance of an m-phase permanent-magnet
 * machine fed with SINUSOIDAL currents, first-order (fundamental of the air-gap field only;
 * no saturation, slotting, leakage or armature reaction).
 *
 * Current basis: I is the RMS current of one phase winding (what flows in each phase's
 * terminals for star, in each winding branch for delta). Each phase has a parallel paths;
 * a coil carries I/a.
 *
 * From the fundamental of the flux density under the magnets B̂₁ (peak), the air-gap radius
 * r, the active length L of each coil side and the series turns per phase
 * N_ph = (coils per phase × turns per coil) ÷ a, for each phase (Pyrhönen, Jokinen and
 * Hrabovcová, Design of Rotating Electrical Machines, ch. 2, E = ω·N·k_w·Φ̂/√2 with the
 * fundamental flux per pole Φ̂ = (2/π)·B̂₁·τ_p·L and τ_p = π·r/p):
 *
 *   E_ph,rms = √2 · k_w1 · N_ph · B̂₁ · r · L · ω_m        (V; ω_m mechanical, rad/s)
 *   Ke_ph   = √2 · k_w1 · N_ph · B̂₁ · r · L                (V·s/rad, RMS, phase)
 *   T       = m · E_ph · I / ω_m  ⇒  Kt = m · Ke_ph         (N·m per A RMS phase current)
 *
 * Line to line (adjacent terminals): star Ke_LL = 2·sin(π/m)·Ke_ph (√3 for m = 3); delta
 * (polygon) Ke_LL = Ke_ph. Per RMS LINE current, Kt_line = Kt for star and Kt ÷ (2·sin(π/m))
 * for delta, so for three phases Kt_line = √3 · Ke_LL,rms in both connections — the
 * relation servo data sheets print as Kt [N·m/A] = 0.0165 × Ke [V rms/krpm] (from memory;
 * √3 × 60/(2π·1000) = 0.016540, GNU units).
 *
 * Resistance: a phase has a paths in parallel, each of (coils per phase ÷ a) coils in
 * series: R_ph = (coils per phase × R_coil) ÷ a². Between two terminals: one phase R_ph; star 2·R_ph;
 * delta (polygon of m phases) R_ph ∥ (m−1)·R_ph = R_ph·(m−1)/m, that is (2/3)·R_ph for m = 3.
 */

import { EngineeringInputError, requirePositive } from "./errors";

export const phaseConnections = ["star", "delta"] as const;
export type PhaseConnection = (typeof phaseConnections)[number];

/** Sentence shown wherever Kt or Ke is shown. */
export const CURRENT_BASIS_TEXT =
  "Currents are RMS phase currents of a sinusoidal drive; Kt and Ke from the fundamental of the air-gap field (first-order estimate).";

/** Coils of one kind in the winding (a design's coil line). */
export interface WindingCoils {
  /** Coils of this kind in the motor, whole, ≥ 1. */
  coils: number;
  /** Turns per coil, whole, ≥ 1. */
  turnsPerCoil: number;
  /** Length of each coil side in the field, mm, > 0. */
  activeLengthMm: number;
}

export interface WindingConnection {
  /** Phases m, whole, ≥ 1. */
  phases: number;
  connection: PhaseConnection;
  /** Parallel paths per phase a, whole, ≥ 1. */
  parallelPaths: number;
}

export interface MotorConstantsInput extends WindingConnection {
  coils: readonly WindingCoils[];
  /** Fundamental winding factor k_w1, 0 < k ≤ 1. */
  windingFactor: number;
  /** Peak of the fundamental of the air-gap flux density B̂₁, T, ≥ 0. */
  fundamentalFluxDensityT: number;
  /** Air-gap radius, mm, > 0. */
  airGapRadiusMm: number;
}

export interface MotorConstants {
  /** Coils per phase (all paths). */
  coilsPerPhase: number;
  /** Series turns per phase N_ph (turns of one path). */
  seriesTurnsPerPhase: number;
  /** N·m per A of RMS phase current. */
  ktNmPerA: number;
  /** N·m per A of RMS line current (equal to ktNmPerA for star). */
  ktLineNmPerA: number;
  /** Back-EMF constant of one phase, RMS, V·s/rad (mechanical). */
  kePhaseRmsVsPerRad: number;
  /** Back-EMF constant between two terminals, RMS, V·s/rad. */
  keLineToLineRmsVsPerRad: number;
  /** The same, peak (√2 × RMS, sinusoidal), V·s/rad. */
  keLineToLinePeakVsPerRad: number;
}

function requireWhole(value: number, field: string, label: string): void {
  if (!Number.isInteger(value) || value < 1)
    throw new EngineeringInputError(
      field,
      `${label} must be a whole number of 1 or more.`,
    );
}

function checkConnection(input: WindingConnection): void {
  requireWhole(input.phases, "phases", "The phase count");
  requireWhole(input.parallelPaths, "parallelPaths", "Parallel paths");
  if (!(phaseConnections as readonly string[]).includes(input.connection))
    throw new EngineeringInputError(
      "phaseConnection",
      "The phases are joined in star or in delta.",
    );
  if (input.connection === "delta" && input.phases < 3)
    throw new EngineeringInputError(
      "phaseConnection",
      "A delta (polygon) joins 3 or more phases.",
    );
}

/** Coils per phase, refusing a count that does not split into m phases of a equal paths. */
export function coilsPerPhase(
  totalCoils: number,
  connection: WindingConnection,
): number {
  checkConnection(connection);
  requireWhole(totalCoils, "coils", "The coil count");
  const { phases, parallelPaths } = connection;
  if (totalCoils % phases !== 0)
    throw new EngineeringInputError(
      "coils",
      `${totalCoils} coils do not split evenly into ${phases} phases.`,
    );
  if ((totalCoils / phases) % parallelPaths !== 0)
    throw new EngineeringInputError(
      "parallelPaths",
      `${totalCoils / phases} coils per phase do not split into ${parallelPaths} equal parallel paths.`,
    );
  return totalCoils / phases;
}

/** Line-to-line ÷ phase ratio of the back-EMF: 2·sin(π/m) for star, 1 for delta. */
function lineToLineRatio(connection: WindingConnection): number {
  return connection.connection === "star"
    ? 2 * Math.sin(Math.PI / connection.phases)
    : 1;
}

/**
 * Peak of the fundamental of a flat-topped air-gap field B_g under magnets covering
 * α_p of each pole pitch (zero between them): B̂₁ = (4/π) · B_g · sin(α_p · π/2), the first
 * term of the rectangular wave's Fourier series (for α_p = 1, the square wave's 4/π).
 */
export function fundamentalFluxDensityT(
  flatTopT: number,
  poleArcRatio: number,
): number {
  if (!Number.isFinite(flatTopT) || flatTopT < 0)
    throw new EngineeringInputError(
      "fluxDensity",
      "Air-gap flux density must be a number of zero or more.",
    );
  if (!(poleArcRatio > 0 && poleArcRatio <= 1))
    throw new EngineeringInputError(
      "poleCoverage",
      "The magnet arc ÷ pole pitch must be more than 0 and at most 1.",
    );
  return (4 / Math.PI) * flatTopT * Math.sin((poleArcRatio * Math.PI) / 2);
}

/** Kt and Ke of the winding (see the module comment). */
export function motorConstants(input: MotorConstantsInput): MotorConstants {
  if (!(input.windingFactor > 0 && input.windingFactor <= 1))
    throw new EngineeringInputError(
      "windingFactor",
      "The winding factor must be more than 0 and at most 1.",
    );
  if (
    !Number.isFinite(input.fundamentalFluxDensityT) ||
    input.fundamentalFluxDensityT < 0
  )
    throw new EngineeringInputError(
      "fluxDensity",
      "Air-gap flux density must be a number of zero or more.",
    );
  requirePositive(input.airGapRadiusMm, "airGapRadiusMm", "Air-gap radius");
  if (input.coils.length === 0)
    throw new EngineeringInputError("coils", "The winding has no coils.");
  let totalCoils = 0;
  let turnMetres = 0; // Σ coils × turns × L, m
  input.coils.forEach((group, index) => {
    requireWhole(group.coils, `coils[${index}].coils`, "The coil count");
    requireWhole(
      group.turnsPerCoil,
      `coils[${index}].turnsPerCoil`,
      "Turns per coil",
    );
    requirePositive(
      group.activeLengthMm,
      `coils[${index}].activeLengthMm`,
      "Active length",
    );
    totalCoils += group.coils;
    turnMetres +=
      (group.coils * group.turnsPerCoil * group.activeLengthMm) / 1000;
  });
  const perPhase = coilsPerPhase(totalCoils, input);
  const { phases, parallelPaths } = input;
  // N_ph · L of one path of one phase, m.
  const seriesTurnMetres = turnMetres / (phases * parallelPaths);
  const kePhase =
    Math.SQRT2 *
    input.windingFactor *
    input.fundamentalFluxDensityT *
    (input.airGapRadiusMm / 1000) *
    seriesTurnMetres;
  const kt = phases * kePhase;
  const ratio = lineToLineRatio(input);
  const keLineToLine = ratio * kePhase;
  return {
    coilsPerPhase: perPhase,
    seriesTurnsPerPhase:
      input.coils.reduce((sum, g) => sum + g.coils * g.turnsPerCoil, 0) /
      (phases * parallelPaths),
    ktNmPerA: kt,
    // A delta's line current is 2·sin(π/m) times its phase current (√3 for m = 3).
    ktLineNmPerA:
      input.connection === "star" ? kt : kt / (2 * Math.sin(Math.PI / phases)),
    kePhaseRmsVsPerRad: kePhase,
    keLineToLineRmsVsPerRad: keLineToLine,
    keLineToLinePeakVsPerRad: Math.SQRT2 * keLineToLine,
  };
}

/** Resistance of a phase and between two terminals, Ω (see the module comment). */
export function windingResistance(
  input: WindingConnection & {
    /** Each coil kind: how many coils, and one coil's resistance, Ω. */
    coils: readonly { coils: number; resistancePerCoilOhm: number }[];
  },
): { phaseOhm: number; lineToLineOhm: number } {
  if (input.coils.length === 0)
    throw new EngineeringInputError("coils", "The winding has no coils.");
  let totalCoils = 0;
  let seriesOhm = 0; // all coils in series, Ω
  input.coils.forEach((group, index) => {
    requireWhole(group.coils, `coils[${index}].coils`, "The coil count");
    requirePositive(
      group.resistancePerCoilOhm,
      `coils[${index}].resistancePerCoilOhm`,
      "Coil resistance",
    );
    totalCoils += group.coils;
    seriesOhm += group.coils * group.resistancePerCoilOhm;
  });
  coilsPerPhase(totalCoils, input);
  const { phases, parallelPaths } = input;
  const phaseOhm = seriesOhm / phases / parallelPaths ** 2;
  // One phase has two terminals; otherwise between two of the m terminals.
  const lineToLineOhm =
    phases === 1
      ? phaseOhm
      : input.connection === "star"
        ? 2 * phaseOhm
        : (phaseOhm * (phases - 1)) / phases;
  return { phaseOhm, lineToLineOhm };
}

/** Electrical frequency at a mechanical speed: f = p · n / 60 (p pole pairs, n in rpm), Hz. */
export function electricalFrequencyHz(poles: number, speedRpm: number): number {
  if (!Number.isInteger(poles) || poles < 2 || poles % 2 !== 0)
    throw new EngineeringInputError(
      "poles",
      "A motor has an even number of poles, 2 or more.",
    );
  if (!Number.isFinite(speedRpm) || speedRpm < 0)
    throw new EngineeringInputError(
      "ratedSpeedRpm",
      "The speed must be a number of zero or more.",
    );
  return ((poles / 2) * speedRpm) / 60;
}
