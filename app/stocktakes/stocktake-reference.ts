/** How people write a stocktake ("ST-12") and the stocktake an address names. Pure. */
import { idFromText } from "~/lib/search-params";

export function stocktakeReference(id: number): string {
  return `ST-${id}`;
}

/** The stocktake a typed reference names ("ST-12", "st 12", "12"), or null. */
export function stocktakeIdFromReference(text: string): number | null {
  const match = /^\s*(?:ST[\s-]*)?0*(\d{1,10})\s*$/i.exec(text);
  return match ? idFromText(match[1]) : null;
}

/** The stocktake id of a path segment; otherwise throws what `refuse` makes of the not-found text. */
export function stocktakeIdFromPath(
  value: string | undefined,
  refuse: (message: string) => unknown,
): number {
  const id = idFromText(value);
  if (id === null) throw refuse(`No stocktake "${value ?? ""}".`);
  return id;
}

export const stocktakeStatusLabels = {
  counting: "Counting",
  approved: "Approved",
  cancelled: "Cancelled",
} as const;
