/**
 * The two label sizes: one label per page for a label printer (62 mm continuous tape cut at
 * 100 mm, common practice for spool and bin labels), and an A4 sheet of several 62 × 100 mm
 * labels to cut apart. Pure.
 */
export const labelSizes = ["62x100", "a4"] as const;
export type LabelSize = (typeof labelSizes)[number];

export const labelSizeNames: Record<LabelSize, string> = {
  "62x100": "Label printer, 62 × 100 mm",
  a4: "A4 sheet, 6 labels",
};

/**
 * The size asked for in the address ("?size=62x100" or "a4"), the fallback when none is
 * asked for, or null for any other text.
 */
export function chosenLabelSize(
  value: string | null,
  fallback: LabelSize,
): LabelSize | null {
  if (value === null || value.trim() === "") return fallback;
  const size = value.trim().toLowerCase();
  return (labelSizes as readonly string[]).includes(size)
    ? (size as LabelSize)
    : null;
}

/** At most this many labels on one page (ten A4 sheets). */
export const labelsPerPageMax = 60;

/**
 * The lot ids of "?ids=1,2,3": whole numbers from 1, each once, in the order given;
 * null when the list is empty, too long or has anything else in it.
 */
export function lotIdsFromText(text: string | null): number[] | null {
  const parts = (text ?? "")
    .split(",")
    .map((part) => part.trim())
    .filter((part) => part !== "");
  if (parts.length === 0 || parts.length > labelsPerPageMax) return null;
  const ids: number[] = [];
  for (const part of parts) {
    if (!/^\d{1,10}$/.test(part)) return null;
    const id = Number(part);
    if (id < 1 || id > 2_147_483_647) return null;
    if (!ids.includes(id)) ids.push(id);
  }
  return ids;
}

/** The location codes of "?codes=MAIN,WIRE-A1": each once, in the order given; null when empty or too long. */
export function locationCodesFromText(text: string | null): string[] | null {
  const codes = [
    ...new Set(
      (text ?? "")
        .split(",")
        .map((part) => part.trim())
        .filter((part) => part !== ""),
    ),
  ];
  if (codes.length === 0 || codes.length > labelsPerPageMax) return null;
  return codes.every((code) => code.length <= 20) ? codes : null;
}
