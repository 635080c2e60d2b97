/**
 * The migrations this checkout ships (drizzle/, read by drizzle's own
 * readMigrationFiles, as its migrator reads them) and the ones a database has
 * had (drizzle's __drizzle_migrations rows). Compared with compareMigrations
 * (app/db/migration-history.ts) by `db:migrate` and `db:restore`.
 */
import path from "node:path";
import { readMigrationFiles } from "drizzle-orm/migrator";
import type mysql from "mysql2/promise";
import type { MigrationRecord } from "~/db/migration-history";
import { projectRoot } from "./project-paths";

export const migrationsFolder = path.join(projectRoot, "drizzle");

/** The migrations this version ships (drizzle/meta/_journal.json). */
export function knownMigrations(): MigrationRecord[] {
  return readMigrationFiles({ migrationsFolder }).map((migration) => ({
    hash: migration.hash,
    createdAt: migration.folderMillis,
  }));
}

/** The names of a database's tables. */
export async function tableNames(
  connection: mysql.Connection,
  database: string,
): Promise<string[]> {
  const [rows] = await connection.query(
    "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ?",
    [database],
  );
  return (rows as { name: string }[]).map((row) => row.name);
}

/** The migrations a database has had, oldest first (none when never migrated). */
export async function appliedMigrations(
  connection: mysql.Connection,
  database: string,
): Promise<MigrationRecord[]> {
  if (
    !(await tableNames(connection, database)).includes("__drizzle_migrations")
  )
    return [];
  const [rows] = await connection.query(
    `SELECT hash, created_at AS createdAt FROM \`${database}\`.__drizzle_migrations ORDER BY created_at, id`,
  );
  return (rows as { hash: string; createdAt: string | number }[]).map(
    (row) => ({ hash: row.hash, createdAt: Number(row.createdAt) }),
  );
}
