/**
 * The errors of a price list's lines, with a bounded list: a file of millions of bad
 * lines keeps and answers its first {@link maxListedLineErrors} and only counts the
 * rest, so the memory a reading holds and the answer it gives stay small. Every reader
 * of the file (the CSV reader, the row reader, the catalogue match) keeps its own list,
 * each filled in file order; {@link mergeLineErrors} makes them one. Pure.
 */
import { formatNumber } from "~/lib/format";
import type { LineError } from "./parse-price-list";

/** Lines with errors listed at most; more are counted. Enough to fix a file's pattern of mistakes. */
export const maxListedLineErrors = 1_000;

/** The first lines with errors, and how many lines had errors in all. */
export interface ListedLineErrors {
  /** At most {@link maxListedLineErrors}, in file order. */
  readonly errors: readonly LineError[];
  /** Every line with an error, listed or not. */
  readonly errorCount: number;
}

/** Collects line errors added in file order: the first ones kept, all counted. */
export class LineErrorList implements ListedLineErrors {
  readonly errors: LineError[] = [];
  errorCount = 0;

  add(error: LineError): void {
    this.errorCount += 1;
    if (this.errors.length < maxListedLineErrors) this.errors.push(error);
  }
}

/**
 * Several readers' errors of one file as one list in file order. Each reader lists its
 * first lines, so the first {@link maxListedLineErrors} of all of them are among those.
 */
export function mergeLineErrors(...parts: readonly ListedLineErrors[]): {
  errors: LineError[];
  errorCount: number;
} {
  const errors = parts
    .flatMap((part) => part.errors)
    .sort((a, b) => a.line - b.line)
    .slice(0, maxListedLineErrors);
  const errorCount = parts.reduce((sum, part) => sum + part.errorCount, 0);
  return { errors, errorCount };
}

/** "… and 123,456 more lines with errors", or null when every line with an error is listed. */
export function moreLineErrorsText(
  listed: number,
  errorCount: number,
): string | null {
  const more = errorCount - listed;
  if (more <= 0) return null;
  return `… and ${formatNumber(more)} more ${more === 1 ? "line" : "lines"} with errors`;
}
