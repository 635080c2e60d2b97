/**
 * The temperature suffixes an admin may give a sintered NdFeB grade (N45 **SH**).
 * Zod-free, so the add-a-grade form shows them without loading its schema
 * (magnet-grade-form.ts re-exports them).
 */
import type { NdfebSuffix } from "~/engineering/reference-data";

export const gradeSuffixChoices = [
  "M",
  "H",
  "SH",
  "UH",
  "EH",
  "AH",
] as const satisfies readonly NdfebSuffix[];
