/**
 * How magnet materials and grades are named and ordered on the pages. Pure:
 * the estimator's grade list and the reference table share it.
 */
import { NDFEB_SUFFIXES } from "~/engineering/ndfeb-suffixes";
import type { MagnetMaterial } from "~/engineering/reference-data";

/** Materials in the order people look for them: strongest family first. */
export const magnetMaterialOrder: readonly MagnetMaterial[] = [
  "sintered-ndfeb",
  "smco5",
  "sm2co17",
  "bonded-ndfeb",
  "hard-ferrite",
];

export const magnetMaterialLabels: Record<MagnetMaterial, string> = {
  "sintered-ndfeb": "Sintered NdFeB",
  smco5: "SmCo5",
  sm2co17: "Sm2Co17",
  "bonded-ndfeb": "Bonded NdFeB",
  "hard-ferrite": "Hard ferrite",
};

export function isMagnetMaterial(value: string): value is MagnetMaterial {
  return (magnetMaterialOrder as readonly string[]).includes(value);
}

const suffixRank = new Map<string, number>(
  NDFEB_SUFFIXES.map((row, index) => [row.suffix, index]),
);

/** "N42SH" → { base: 42, suffixRank: 3 }; null for names outside the N-number pattern. */
function ndfebParts(name: string): { base: number; rank: number } | null {
  const match = /^N(\d+)([A-Z]*)$/.exec(name.trim().toUpperCase());
  if (!match) return null;
  const rank = suffixRank.get(match[2]!);
  return rank === undefined ? null : { base: Number(match[1]), rank };
}

/**
 * Sorts grades by material, then NdFeB by strength and temperature suffix
 * (N35, N35M, N35H … N38), then by name. Grades admins added with other
 * names come after the regular ones of their material.
 */
export function compareMagnetGrades(
  a: { name: string; material: MagnetMaterial },
  b: { name: string; material: MagnetMaterial },
): number {
  const byMaterial =
    magnetMaterialOrder.indexOf(a.material) -
    magnetMaterialOrder.indexOf(b.material);
  if (byMaterial !== 0) return byMaterial;
  const partsA = ndfebParts(a.name);
  const partsB = ndfebParts(b.name);
  if (partsA && partsB)
    return partsA.base - partsB.base || partsA.rank - partsB.rank;
  if (partsA) return -1;
  if (partsB) return 1;
  return a.name.localeCompare(b.name, "en");
}

/** Grades grouped by material in display order, each group sorted. */
export function groupMagnetGrades<
  Grade extends { name: string; material: MagnetMaterial },
>(
  grades: readonly Grade[],
): { material: MagnetMaterial; label: string; grades: Grade[] }[] {
  const sorted = [...grades].sort(compareMagnetGrades);
  return magnetMaterialOrder
    .map((material) => ({
      material,
      label: magnetMaterialLabels[material],
      grades: sorted.filter((grade) => grade.material === material),
    }))
    .filter((group) => group.grades.length > 0);
}
