/**
 * Whether a database's applied migrations (drizzle's __drizzle_migrations
 * rows) belong to this version: they must be the first migrations of
 * drizzle/meta/_journal.json, in order, with the same contents (hash).
 * Used by the server before it listens (app/db/schema-version.server.ts),
 * by `npm run db:migrate` and by `npm run db:restore`.
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

/** A fit with how many migrations the database has and this version knows. */
export type SchemaStatus = MigrationFit & { applied: number; known: number };

/**
 * Why a server of this version must not serve this database, and what to
 * run; null when the database has exactly this version's migrations.
 */
export function schemaProblem(status: SchemaStatus): string | null {
  switch (status.kind) {
    case "current":
      return null;
    case "older":
      return (
        (status.applied === 0
          ? `The database has none of this version's ${status.known} migrations (a new, empty database?): `
          : `The database has ${status.applied} of this version's ${status.known} migrations: `) +
        "run `npm run db:migrate` (with the same DATABASE_URL) once, then start the server again. " +
        "Servers never migrate by themselves."
      );
    case "newer":
      return (
        `This database was migrated by a newer Turnledger: it has ${status.applied} migrations, ` +
        `this version knows ${status.known}. Start the newer version instead ` +
        "(or, to go back, restore a backup taken before the upgrade with that older version's `npm run db:restore`)."
      );
    case "foreign":
      return (
        `This database's migration ${status.firstDifferent + 1} is not this version's ` +
        `(it has ${status.applied}, this version knows ${status.known}): it was migrated by another line ` +
        "of Turnledger, or a migration file was changed after it was applied. " +
        "Point DATABASE_URL at this installation's own database, or start the version that migrated it."
      );
  }
}
