/**
 * Which of this version's migrations the database has. The server build
 * carries its own migration list (built-migrations.server.ts), so it knows
 * what it was built with wherever it runs.
 *
 * The server refuses to start unless the database is current
 * (server/deployment-checks.ts); /readyz reports the same status.
 * Migrating is `npm run db:migrate`'s job alone (docs/decisions/023).
 */
import { builtMigrations } from "./built-migrations.server";
import { pool } from "./client.server";
import {
  compareMigrations,
  type MigrationRecord,
  type SchemaStatus,
} from "./migration-history";

export type { SchemaStatus } from "./migration-history";

/** The migrations the database has had (none when it was never migrated). */
async function appliedMigrations(): Promise<MigrationRecord[]> {
  try {
    const [rows] = await pool.query(
      "SELECT hash, created_at AS createdAt FROM __drizzle_migrations ORDER BY created_at, id",
    );
    return (rows as { hash: string; createdAt: string | number }[]).map(
      (row) => ({ hash: row.hash, createdAt: Number(row.createdAt) }),
    );
  } catch (error) {
    if ((error as { code?: unknown }).code === "ER_NO_SUCH_TABLE") return [];
    throw error;
  }
}

/**
 * The database's migrations against this build's: current, older (with how
 * many remain), newer or foreign, with both counts. Throws when the database
 * cannot be reached.
 */
export async function schemaStatus(): Promise<SchemaStatus> {
  const known = builtMigrations();
  const applied = await appliedMigrations();
  return {
    ...compareMigrations(applied, known),
    applied: applied.length,
    known: known.length,
  };
}
