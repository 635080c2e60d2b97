/**
 * Lists' filters in the address, one way for every list page: a GET form puts them in the
 * query string (so a filtered list can be bookmarked and shared), the loader reads them
 * with the list's Zod schema through {@link readListFilters}, the query filters and pages
 * on the server, and links (pages, sort headers, "Download CSV") are written with
 * {@link listHref} (list-address.ts, without Zod, so a page's links do not load it).
 * Pure: no framework, no I/O.
 */
import { z } from "zod";
import {
  pageParam,
  readSearchLeniently,
  searchParamsObject,
} from "./search-params";

import { searchMaxLength } from "./list-address";

export {
  containsPattern,
  isFiltered,
  listHref,
  searchMaxLength,
  type ListAddressValue,
} from "./list-address";

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
