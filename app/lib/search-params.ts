/**
 * Reading values from a request's address, one way for every route. A number is checked
 * as text before it becomes a number (digits only, a few of them, then its range), so
 * "1e300", "0x10", "-1" or a 40-digit page never reach a query. The API refuses a bad
 * value with a 400 naming it (`readSearchParams` in api.server.ts, with the schemas
 * built from these parameters); pages correct it instead (`readSearchLeniently`,
 * `pageFromSearch`, `readPageOrLast`). Pure: no framework, no I/O.
 */
import { formatNumber } from "./format";
import { z } from "zod";
import { isCalendarDate } from "./calendar-days";

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

/** Whole numbers in the address are at most this many digits (below 2^53, so exact). */
const maxWholeDigits = 15;
const wholeNumberText = new RegExp(`^\\d{1,${maxWholeDigits}}$`);

const grouped = (value: number) => formatNumber(value);

/**
 * A whole number written in digits, from `min` to `max`. The message names the
 * parameter and its range unless one is given: "page must be a whole number from 1 to 1,000,000."
 */
export function wholeNumberParam(
  name: string,
  range: { min: number; max: number; message?: string },
) {
  const message =
    range.message ??
    `${name} must be a whole number from ${grouped(range.min)} to ${grouped(range.max)}.`;
  return z
    .string({ error: message })
    .trim()
    .regex(wholeNumberText, message)
    .transform(Number)
    .pipe(z.number().min(range.min, message).max(range.max, message));
}

/** `page`: 1 to {@link maxPage}, 1 when not given. */
export const pageParam = wholeNumberParam("page", {
  min: 1,
  max: maxPage,
}).default(1);

/** A page size (`pageSize`, `perPage`, `limit`): 1 to `max`, `fallback` when not given. */
export function pageSizeParam(name: string, max: number, fallback: number) {
  return wholeNumberParam(name, { min: 1, max }).default(fallback);
}

/** The largest id of a stored row (the INT columns' maximum). */
export const maxId = 2_147_483_647;

/** An id from the address (a path segment or a query value): digits only, 1 to {@link maxId}; null otherwise. */
export function idFromText(value: string | null | undefined): number | null {
  const text = value ?? "";
  if (!/^\d{1,10}$/.test(text)) return null;
  const id = Number(text);
  return id >= 1 && id <= maxId ? id : null;
}

/** A day written YYYY-MM-DD that is on the calendar ("2025-02-30" is not). */
export function dayParam(name: string, message?: string) {
  const text = message ?? `${name} must be a day written YYYY-MM-DD.`;
  return z
    .string({ error: text })
    .trim()
    .max(10, text)
    .refine(isCalendarDate, text);
}

/**
 * A decimal above 0 with at most `decimals` places and at most `max` ("2.5"); the text
 * is checked before it becomes a number, so it is never more than a few characters.
 */
export function positiveDecimalParam(
  name: string,
  range: { max: number; decimals: number },
) {
  const message = `${name} must be a number above 0 and at most ${grouped(range.max)}, with at most ${range.decimals} decimals.`;
  const text = new RegExp(
    `^\\d{1,${maxWholeDigits}}(?:\\.\\d{1,${range.decimals}})?$`,
  );
  return z
    .string({ error: message })
    .trim()
    .regex(text, message)
    .transform(Number)
    .pipe(z.number().gt(0, message).max(range.max, message));
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

/**
 * A query for a page rather than the API: the values the schema refuses are left out
 * (their defaults stand in) and come back in `errors` by parameter name, so the page can
 * say what it did not understand. A `page` is corrected first ({@link pageFromSearch}).
 */
export function readSearchLeniently<Schema extends z.ZodType>(
  schema: Schema,
  values: Record<string, string>,
): { query: z.output<Schema>; errors: Record<string, string[]> } {
  const kept = { ...values };
  if (kept.page !== undefined) kept.page = String(pageFromSearch(kept.page));
  const errors: Record<string, string[]> = {};
  // Each round leaves out the values refused; nested schemas can refuse in a second round.
  for (let round = 0; round < 3; round += 1) {
    const parsed = schema.safeParse(kept);
    if (parsed.success) return { query: parsed.data, errors };
    for (const issue of parsed.error.issues) {
      const key = issue.path.join(".") || "query";
      (errors[key] ??= []).push(issue.message);
      delete kept[String(issue.path[0] ?? "")];
      delete kept[key];
    }
  }
  return { query: schema.parse({}), errors };
}
