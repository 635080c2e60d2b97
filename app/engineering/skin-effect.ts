/**
 * Skin depth and Dowell's AC resistance factor of a layered winding.
 *
 * - Skin depth δ = √(ρ / (π · f · μ0 · μr)), ρ at the conductor's temperature.
 * - Dowell's factor (P. L. Dowell, "Effects of eddy currents in transformer windings",
 *   Proc. IEE 113(8), 1966) for a winding of m layers of conductors of height h across the
 *   layer, with Δ = (h/δ)·√η:
 *     F_R = R_ac/R_dc = Δ·[ (sinh2Δ + sin2Δ)/(cosh2Δ − cos2Δ)
 *                         + (2(m² − 1)/3)·(sinhΔ − sinΔ)/(coshΔ + cosΔ) ].
 *   The first term is the skin effect of one layer, the second the proximity effect of the
 *   layers below it. The model is one-dimensional: the field is taken parallel to the
 *   layers, as in a winding that fills its window's breadth.
 * - A round conductor of diameter d becomes the square of equal area, h = d·√(π/4), and the
 *   layer's porosity is η = h / p, p the centre-to-centre distance of the conductors along
 *   the layer (Dowell 1966; the equal-area square and this porosity are the usual
 *   conversion, C. R. Sullivan's litz-wire notes, appendix, and W. G. Hurley and W. H.
 *   Wölfle, "Transformers and Inductors for Power Electronics", Wiley 2013, ch. 6, from
 *   memory). Touching turns over their enamel give p = overall diameter.
 * - Loss with harmonics: P = Σ I_h² · R_ac(f_h), I_h the RMS current of each harmonic.
 */

import {
  EngineeringInputError,
  requireNonNegative,
  requirePositive,
} from "./errors";

/** Permeability of free space, H/m (4π × 10⁻⁷; the 2019 SI value differs by 5 × 10⁻¹⁰). */
export const MU_0_H_PER_M = 4 * Math.PI * 1e-7;

/** Highest frequency the estimate takes, Hz: past 10 MHz a winding is a transmission line. */
export const MAX_FREQUENCY_HZ = 10_000_000;

/**
 * Skin depth, mm, of a conductor of resistivity `resistivityOhmMm2PerM` (Ω·mm²/m, at its
 * temperature) at `frequencyHz`; `relativePermeability` 1 for copper and aluminium.
 */
export function skinDepthMm(
  resistivityOhmMm2PerM: number,
  frequencyHz: number,
  relativePermeability = 1,
): number {
  requirePositive(resistivityOhmMm2PerM, "conductor", "The resistivity");
  requirePositive(frequencyHz, "frequencyHz", "The frequency");
  if (frequencyHz > MAX_FREQUENCY_HZ) {
    throw new EngineeringInputError(
      "frequencyHz",
      "The frequency must be at most 10 MHz.",
    );
  }
  requirePositive(
    relativePermeability,
    "relativePermeability",
    "The relative permeability",
  );
  // Ω·mm²/m → Ω·m is × 10⁻⁶; the depth in m → mm is × 10³.
  const resistivityOhmM = resistivityOhmMm2PerM * 1e-6;
  return (
    1000 *
    Math.sqrt(
      resistivityOhmM /
        (Math.PI * frequencyHz * MU_0_H_PER_M * relativePermeability),
    )
  );
}

/** Below this Δ the exact expression loses digits to cancellation; the series is exact there to 10⁻¹². */
const SMALL_DELTA = 1e-3;
/** Above this Δ the hyperbolic ratios equal 1 to within e⁻⁴⁰ (and sinh would overflow past 350). */
const LARGE_DELTA = 20;

/**
 * Dowell's R_ac/R_dc of a winding of `layers` layers at penetration ratio `delta` = Δ
 * (see the module comment). `layers` may be fractional (an effective number of layers).
 */
export function dowellResistanceFactor(delta: number, layers: number): number {
  requireNonNegative(delta, "frequencyHz", "The penetration ratio Δ");
  if (!Number.isFinite(layers) || layers < 1) {
    throw new EngineeringInputError(
      "layersPerCoil",
      "The number of layers must be at least 1.",
    );
  }
  const proximityWeight = (2 * (layers * layers - 1)) / 3;
  if (delta < SMALL_DELTA) {
    // Low-frequency series of the same expression: 1 + (5m² − 1)/45 · Δ⁴ (+ O(Δ⁸)).
    return 1 + ((5 * layers * layers - 1) / 45) * delta ** 4;
  }
  if (delta > LARGE_DELTA) return delta * (1 + proximityWeight);
  const d2 = 2 * delta;
  const skin = (Math.sinh(d2) + Math.sin(d2)) / (Math.cosh(d2) - Math.cos(d2));
  const proximity =
    (Math.sinh(delta) - Math.sin(delta)) / (Math.cosh(delta) + Math.cos(delta));
  return delta * (skin + proximityWeight * proximity);
}

/** Side of the square of the same area as a round conductor of `diameterMm`: d·√(π/4). */
export function equalAreaSquareSideMm(diameterMm: number): number {
  requirePositive(diameterMm, "wire", "The conductor diameter");
  return diameterMm * Math.sqrt(Math.PI / 4);
}

/**
 * Δ = (h/δ)·√η of a layer of conductors of height `heightMm` across the layer, width
 * `widthMm` along it, at centre distance `pitchMm` along the layer (η = width / pitch).
 */
export function layerPenetrationRatio(input: {
  heightMm: number;
  widthMm: number;
  pitchMm: number;
  skinDepthMm: number;
}): number {
  requirePositive(input.heightMm, "wire", "The conductor height");
  requirePositive(input.widthMm, "wire", "The conductor width");
  requirePositive(input.skinDepthMm, "frequencyHz", "The skin depth");
  if (!Number.isFinite(input.pitchMm) || input.pitchMm < input.widthMm) {
    throw new EngineeringInputError(
      "wire",
      "The conductor pitch along the layer cannot be less than the conductor's width.",
    );
  }
  const porosity = input.widthMm / input.pitchMm;
  return (input.heightMm / input.skinDepthMm) * Math.sqrt(porosity);
}

/**
 * Δ of a layer of round conductors of bare `diameterMm` at centre distance `pitchMm`
 * (at least the diameter): the equal-area square h = d·√(π/4), η = h / p.
 */
export function roundConductorPenetrationRatio(
  diameterMm: number,
  pitchMm: number,
  skinDepth: number,
): number {
  if (!Number.isFinite(pitchMm) || pitchMm < diameterMm) {
    throw new EngineeringInputError(
      "wire",
      "The conductor pitch along the layer cannot be less than the bare diameter.",
    );
  }
  const side = equalAreaSquareSideMm(diameterMm);
  return layerPenetrationRatio({
    heightMm: side,
    widthMm: side,
    pitchMm,
    skinDepthMm: skinDepth,
  });
}

/** One harmonic of the coil current: its order (2 or more) and RMS current, A. */
export interface HarmonicCurrent {
  order: number;
  currentA: number;
}

/** The loss at one frequency of the current (order 1 is the fundamental): I² · R_ac(f). */
export interface HarmonicLoss extends HarmonicCurrent {
  frequencyHz: number;
  acResistanceOhm: number;
  lossW: number;
}

/**
 * Loss P = Σ I_h² · R_ac(f_h) over the fundamental (RMS `fundamentalCurrentA` at
 * `fundamentalHz`) and the `harmonics` (distinct whole orders ≥ 2); `acResistanceAt` gives
 * the AC resistance (Ω) at a frequency (Hz). Fields are named as the API's "harmonics.i.…".
 */
export function harmonicLosses(
  fundamentalHz: number,
  fundamentalCurrentA: number,
  harmonics: readonly HarmonicCurrent[],
  acResistanceAt: (frequencyHz: number) => number,
): { losses: HarmonicLoss[]; lossW: number } {
  requirePositive(fundamentalHz, "frequencyHz", "The frequency");
  requireNonNegative(fundamentalCurrentA, "currentA", "The current");
  const seen = new Set<number>();
  harmonics.forEach((harmonic, index) => {
    if (!Number.isInteger(harmonic.order) || harmonic.order < 2) {
      throw new EngineeringInputError(
        `harmonics.${index}.order`,
        "A harmonic's order must be a whole number of at least 2 (the fundamental's current is the coil current).",
      );
    }
    if (seen.has(harmonic.order)) {
      throw new EngineeringInputError(
        `harmonics.${index}.order`,
        `Harmonic ${harmonic.order} is given twice.`,
      );
    }
    seen.add(harmonic.order);
    requireNonNegative(
      harmonic.currentA,
      `harmonics.${index}.currentA`,
      "A harmonic's current",
    );
    if (fundamentalHz * harmonic.order > MAX_FREQUENCY_HZ) {
      throw new EngineeringInputError(
        `harmonics.${index}.order`,
        `Harmonic ${harmonic.order} of ${fundamentalHz} Hz is above 10 MHz.`,
      );
    }
  });
  const losses = [
    { order: 1, currentA: fundamentalCurrentA },
    ...harmonics,
  ].map((harmonic) => {
    const frequencyHz = fundamentalHz * harmonic.order;
    const acResistanceOhm = acResistanceAt(frequencyHz);
    return {
      ...harmonic,
      frequencyHz,
      acResistanceOhm,
      lossW: harmonic.currentA ** 2 * acResistanceOhm,
    };
  });
  return {
    losses,
    lossW: losses.reduce((sum, loss) => sum + loss.lossW, 0),
  };
}
