/**
 * The unit a new catalogue item is kept in, by its kind: zod-free, so the new-item
 * page can show it without loading the form's schema (new-item-form.ts re-exports it).
 */
export function unitOfNewItem(
  kind: string | undefined,
  partUnit: string | undefined,
): string {
  if (kind === "wire") return "kg";
  if (kind === "magnet") return "pcs";
  return partUnit || "pcs";
}
