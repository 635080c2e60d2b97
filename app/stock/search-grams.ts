/**
 * The arithmetic of the stock list's trigram search (decision 057-trigram-search): the
 * three-character pieces ("grams") of a search term, which of them to count, which one to
 * walk, and what a capped count of matches says. Pure: no framework, no I/O.
 *
 * Characters are Unicode code points, as MariaDB's SUBSTRING counts the characters of a
 * utf8mb4 column, so a term's grams are exactly the pieces the triggers stored for every
 * search_text containing it.
 */

/** The grams the postings are made of and a search can walk: three characters. */
export const gramLength = 3;

/** A term shorter than this has no gram; its search reads the search index as before. */
export const shortestGramSearch = gramLength;

/** At most this many of a term's grams are counted to find its rarest (spread over the term, the last one always). */
export const mostGramsCounted = 8;

/** Each gram's postings are counted up to this many (and one more, to tell "exactly" from "more"). */
export const gramPostingsCap = 2_000;

/** A search counts its matches up to this many past the page's first row. */
export const searchCountReach = 1_000;

/** The distinct grams of an already lower-cased term, in the order they first occur. */
export function termGrams(term: string): string[] {
  const characters = Array.from(term);
  const grams = new Set<string>();
  for (let start = 0; start + gramLength <= characters.length; start += 1)
    grams.add(characters.slice(start, start + gramLength).join(""));
  return [...grams];
}

/**
 * The grams worth counting: all of them when few, else {@link mostGramsCounted} spread
 * evenly from the first to the last (any gram of the term finds every match; counting
 * costs a few index reads each).
 */
export function gramsToCount(grams: readonly string[]): string[] {
  if (grams.length <= mostGramsCounted) return [...grams];
  const chosen: string[] = [];
  const step = (grams.length - 1) / (mostGramsCounted - 1);
  for (let index = 0; index < mostGramsCounted; index += 1)
    chosen.push(grams[Math.round(index * step)]!);
  return chosen;
}

/**
 * The gram to walk: the one with the fewest postings. Counts stop at the cap, so several
 * may tie there; then the later one in the term wins (a term's end — a SKU's number, a
 * size — is where people type what sets it apart). Null when a gram has no posting at all:
 * nothing can match.
 */
export function rarestGram(
  counted: readonly { gram: string; postings: number }[],
): string | null {
  let best: { gram: string; postings: number } | undefined;
  for (const entry of counted) {
    if (entry.postings === 0) return null;
    if (!best || entry.postings <= best.postings) best = entry;
  }
  return best?.gram ?? null;
}

/** How many matches a search counts for a page that starts after `offset` rows. */
export function searchCountLimit(offset: number): number {
  return offset + searchCountReach + 1;
}

/**
 * The total a search answers from its capped count: the exact number when the count
 * stopped short of its limit, else `offset` + {@link searchCountReach} with `totalExact`
 * false — more than that many items match.
 */
export function cappedTotal(
  counted: number,
  offset: number,
): { total: number; totalExact: boolean } {
  const limit = searchCountLimit(offset);
  return counted < limit
    ? { total: counted, totalExact: true }
    : { total: limit - 1, totalExact: false };
}
