/**
 * Lists' filters in the address, one way for every list page: a GET form puts them in the
 * query string (so a filtered list can be bookmarked and shared), the loader reads them
 * with the list's Zod schema through {@link readListFilters}, the query filters and pages
 * on the server, and links (pages, sort headers, "Download CSV") are written with
 * {@link listHref}. Pure: no framework, no I/O.
 */
import { z } from "zod";
import {
  pageParam,
  readSearchLeniently,
  searchParamsObject,
} from "./search-params";

/** The longest search text a list takes. */
export const searchMaxLength = 80;

/** The `search` of a list: trimmed, at most {@link searchMaxLength} characters, left out when empty. */
export const searchTextParam = z
  .string()
  .trim()
  .max(searchMaxLength, `Search for at most ${searchMaxLength} characters.`)
  .optional();

/** The address of a list with a search and pages and no other filter; a list with more extends it. */
export const searchPageSchema = z.object({
  search: searchTextParam,
  page: pageParam,
});

/**
 * A list's filters from the address, read with its schema. Values the schema refuses are
 * left out (their defaults stand in) and named in `ignored`, so the page can say so.
 */
export function readListFilters<Schema extends z.ZodType>(
  schema: Schema,
  searchParams: URLSearchParams,
): { query: z.output<Schema>; ignored: string[] } {
  const { query, errors } = readSearchLeniently(
    schema,
    searchParamsObject(searchParams),
  );
  return { query, ignored: Object.keys(errors) };
}

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
