/**
 * The IEC 60085 thermal classes magnet wire is made in, with their letters: the
 * reference data's THERMAL_CLASSES are built from them. Their own module, so a page
 * that only names a class ("155 (F)") does not load the whole reference data.
 */
export const THERMAL_CLASS_LETTERS = [
  [130, "B"],
  [155, "F"],
  [180, "H"],
  [200, "N"],
  [220, "R"],
] as const;
