/**
 * Lists' addresses without their schemas: the longest search, the links of a list
 * (pages, sort headers, "Download CSV") and whether it is filtered. Apart from
 * list-filters.ts (which reads the address with Zod on the server) so that pages
 * writing links do not load Zod with their first-load JavaScript. Pure.
 */

/** The longest search text a list takes. */
export const searchMaxLength = 80;

export type ListAddressValue = string | number | boolean | null | undefined;

/**
 * "/designs?search=stator&page=2": the path with the values that are set. Empty text,
 * `false`, null, undefined and page 1 are left out, so the plain list has the plain path.
 */
export function listHref(
  path: string,
  values: Record<string, ListAddressValue>,
): string {
  const params = new URLSearchParams();
  for (const [name, value] of Object.entries(values)) {
    if (value === undefined || value === null || value === false) continue;
    if (name === "page" && Number(value) <= 1) continue;
    const text = value === true ? "1" : String(value).trim();
    if (text !== "") params.set(name, text);
  }
  const query = params.toString();
  return query ? `${path}?${query}` : path;
}

/** Parameters that arrange a list rather than narrow it. */
const arranging = new Set(["page", "pageSize", "sort", "order"]);

/** True when any value narrows the list (a search or a filter; page and sort do not). */
export function isFiltered(values: Record<string, ListAddressValue>): boolean {
  return Object.entries(values).some(
    ([name, value]) =>
      !arranging.has(name) &&
      value !== undefined &&
      value !== null &&
      value !== false &&
      String(value).trim() !== "",
  );
}

/** A LIKE pattern for rows containing `text`: its %, _ and \ match themselves. */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (character) => `\\${character}`)}%`;
}
