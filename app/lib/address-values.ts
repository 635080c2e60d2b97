/**
 * The address's values that need no schema: the query string as an object, ids from
 * the address, pages and their count. Apart from search-params.ts (whose parameters
 * are Zod schemas) so that pages using these in the browser do not load Zod with
 * their first-load JavaScript; search-params.ts re-exports them. Pure.
 */

/** The query string's values, empty ones dropped (a GET form sends every field, filled or not). */
export function searchParamsObject(
  params: URLSearchParams,
): Record<string, string> {
  return Object.fromEntries(
    [...params.entries()].filter(([, value]) => value !== ""),
  );
}

/** The highest page any list is asked for: a million pages of the largest page size is far past every table. */
export const maxPage = 1_000_000;

/** The largest id of a stored row (the INT columns' maximum). */
export const maxId = 2_147_483_647;

/** An id from the address (a path segment or a query value): digits only, 1 to {@link maxId}; null otherwise. */
export function idFromText(value: string | null | undefined): number | null {
  const text = value ?? "";
  if (!/^\d{1,10}$/.test(text)) return null;
  const id = Number(text);
  return id >= 1 && id <= maxId ? id : null;
}

/**
 * A page number for a page (not the API): anything that is not a page is page 1, and a
 * page beyond {@link maxPage} ("1e300", a 40-digit number) is the last possible page,
 * which {@link readPageOrLast} turns into the list's last page.
 */
export function pageFromSearch(value: string | null | undefined): number {
  const text = value?.trim() ?? "";
  if (text === "" || text.length > 40) return 1;
  const page = Number(text);
  if (Number.isNaN(page) || page < 1) return 1;
  if (page > maxPage) return maxPage;
  return Number.isInteger(page) ? page : 1;
}

/** How many pages `total` rows make, at least 1. */
export function pageCountOf(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

/**
 * Reads one page of a list for a page; a page past the end (a typed address, or the
 * list shrank since the link was made) is read again as the last page. `read` answers
 * the page's rows with the list's total.
 */
export async function readPageOrLast<Read extends { total: number }>(
  requested: number,
  pageSize: number,
  read: (page: number) => Promise<Read>,
): Promise<Read & { page: number; pageCount: number }> {
  const first = await read(requested);
  const pageCount = pageCountOf(first.total, pageSize);
  if (requested <= pageCount) return { ...first, page: requested, pageCount };
  const last = await read(pageCount);
  return { ...last, page: pageCount, pageCount };
}
