/**
 * Which gram a stock list search walks (decision 057-trigram-search): the postings of each
 * of the term's grams counted up to a cap, in one statement, and the rarest picked. The
 * postings (item_search_grams) are kept by triggers on items (migration 0022).
 */
import { sql } from "drizzle-orm";
import { db } from "~/db/client.server";
import {
  gramPostingsCap,
  gramsToCount,
  rarestGram,
  termGrams,
} from "./search-grams";

/**
 * The gram of `term` (lower case, at least three characters) with the fewest postings, or
 * null when one of its grams has none (no item can contain the term).
 */
export async function gramToWalk(term: string): Promise<string | null> {
  const grams = gramsToCount(termGrams(term));
  // One capped count per gram, side by side: each reads at most cap + 1 entries of the
  // primary key (gram, sku) and none of the items.
  const counts = sql.join(
    grams.map(
      (gram, position) =>
        sql`SELECT ${sql.raw(String(position))} AS position, COUNT(*) AS postings FROM (SELECT 1 FROM item_search_grams WHERE gram = ${gram} LIMIT ${sql.raw(String(gramPostingsCap + 1))}) AS ${sql.raw(`g${position}`)}`,
    ),
    sql` UNION ALL `,
  );
  const [rows] = (await db.execute(counts)) as unknown as [
    { position: number; postings: number | string }[],
  ];
  const postings = new Map(
    rows.map((row) => [Number(row.position), Number(row.postings)]),
  );
  return rarestGram(
    grams.map((gram, position) => ({
      gram,
      postings: postings.get(position) ?? 0,
    })),
  );
}
