/**
 * The migrations this build was made with: drizzle/meta/_journal.json and
 * every drizzle/*.sql, bundled by Vite (so a built server carries them and
 * needs no drizzle/ folder beside it) and hashed exactly as drizzle-orm
 * 0.45's migrator does (drizzle-orm/migrator.js readMigrationFiles: SHA-256
 * of the file's text; created_at is the journal entry's `when`).
 */
import { createHash } from "node:crypto";
import journal from "../../drizzle/meta/_journal.json";
import type { MigrationRecord } from "./migration-history";

const migrationFiles = import.meta.glob<string>("../../drizzle/*.sql", {
  query: "?raw",
  import: "default",
  eager: true,
});

function migrationsInBuild(): MigrationRecord[] {
  return journal.entries.map((entry) => {
    const text = migrationFiles[`../../drizzle/${entry.tag}.sql`];
    if (text === undefined)
      throw new Error(
        `drizzle/${entry.tag}.sql is in the journal but not in this build.`,
      );
    return {
      hash: createHash("sha256").update(text).digest("hex"),
      createdAt: entry.when,
    };
  });
}

let built: MigrationRecord[] | undefined;

/** This build's migrations, in journal order. */
export function builtMigrations(): MigrationRecord[] {
  built ??= migrationsInBuild();
  return built;
}
