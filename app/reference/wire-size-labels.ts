/** How wire sizes are labelled in tables and lists. Pure. */

/** An IEC nominal diameter as its label: 0.8 → "0.800" (mm, three decimals as the standard prints). */
export function iecSizeLabel(diameterMm: number): string {
  return diameterMm.toFixed(3);
}
