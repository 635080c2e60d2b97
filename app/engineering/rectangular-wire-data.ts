/**
 * Dimensions of enamelled rectangular (flat) winding wire by IEC 60317-0-2: the nominal
 * corner radius for each thickness, the range of conductor sizes, and the increase of each
 * dimension due to the enamel of grade 1 and grade 2.
 *
 * All values FROM MEMORY of IEC 60317-0-2 (the printed standard was not at hand and no
 * transcription of these tables was found); the r = a/2 rows agree with a maker's published
 * section formula S = a·b − 0.2146·a² (0.2146 = (4 − π)/4). Confirm against the standard
 * before relying on them more closely than about 0.01 mm.
 */

/** A row of the corner-radius table: thicknesses up to `maxThicknessMm` (inclusive). */
export interface CornerRadiusRow {
  maxThicknessMm: number;
  /** Fixed nominal corner radius, mm; null means half the thickness (fully rounded edges). */
  cornerRadiusMm: number | null;
}

export const RECTANGULAR_WIRE_SOURCE =
  "IEC 60317-0-2 (from memory): nominal corner radius by thickness, conductor range, enamel increase by grade";

/** Nominal corner radius by thickness a (IEC 60317-0-2, from memory). */
export const CORNER_RADIUS_ROWS: readonly CornerRadiusRow[] = [
  { maxThicknessMm: 1.0, cornerRadiusMm: null },
  { maxThicknessMm: 1.6, cornerRadiusMm: 0.5 },
  { maxThicknessMm: 2.24, cornerRadiusMm: 0.65 },
  { maxThicknessMm: 3.55, cornerRadiusMm: 0.8 },
  { maxThicknessMm: 5.6, cornerRadiusMm: 1.0 },
];

/** Conductor sizes the standard covers, mm, and the width-to-thickness ratio (from memory). */
export const RECTANGULAR_RANGE = {
  minThicknessMm: 0.8,
  maxThicknessMm: 5.6,
  minWidthMm: 2.0,
  maxWidthMm: 16.0,
  minAspectRatio: 1.4,
  maxAspectRatio: 8.0,
} as const;

export type RectangularGrade = "grade1" | "grade2";

/** Increase of each dimension due to the enamel, mm, min and max (IEC 60317-0-2, from memory). */
export const ENAMEL_INCREASE_MM: Readonly<
  Record<RectangularGrade, { min: number; max: number }>
> = {
  grade1: { min: 0.06, max: 0.11 },
  grade2: { min: 0.12, max: 0.19 },
};
