/**
 * Whether a database's applied migrations (drizzle's __drizzle_migrations
 * rows) belong to this version: they must be the first migrations of
 * drizzle/meta/_journal.json, in order, with the same contents (hash).
 */

export interface MigrationRecord {
  hash: string;
  /** The journal's `when` (milliseconds), which drizzle stores as created_at. */
  createdAt: number;
}

export type MigrationFit =
  | { kind: "current" }
  | { kind: "older"; remaining: number }
  | { kind: "newer"; applied: number; known: number }
  | { kind: "foreign"; firstDifferent: number };

export function compareMigrations(
  applied: MigrationRecord[],
  known: MigrationRecord[],
): MigrationFit {
  const shared = Math.min(applied.length, known.length);
  for (let index = 0; index < shared; index++) {
    const a = applied[index]!;
    const k = known[index]!;
    if (a.hash !== k.hash || a.createdAt !== k.createdAt)
      return { kind: "foreign", firstDifferent: index };
  }
  if (applied.length > known.length)
    return { kind: "newer", applied: applied.length, known: known.length };
  if (applied.length < known.length)
    return { kind: "older", remaining: known.length - applied.length };
  return { kind: "current" };
}
