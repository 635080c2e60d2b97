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
import { maxPage, pageFromSearch } from "./address-values";

export {
  idFromText,
  maxId,
  maxPage,
  pageCountOf,
  pageFromSearch,
  readPageOrLast,
  searchParamsObject,
} from "./address-values";

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
