/**
 * The insulation classes a design may be rated in, and their names on the page.
 * Zod-free, so the design pages show them without loading the design schemas
 * (design-schemas.ts re-exports the list).
 */
import { thermalClassName } from "./design-checks";

/** IEC 60085 thermal classes a motor's insulation system is rated in, °C. */
export const insulationClasses = [105, 120, 130, 155, 180, 200, 220] as const;

/** "155 °C (F)": an IEC 60085 class with its letter when it has one. */
export function insulationClassLabel(classC: number): string {
  return thermalClassName(classC).replace(/^(\d+)/, "$1\u00a0°C");
}
