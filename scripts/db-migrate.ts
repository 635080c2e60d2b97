/**
 * npm run db:migrate: the one step that changes a database's schema (the
 * private MariaDB, or DATABASE_URL's). Safe to run twice at once: the second
 * run waits for the first, then finds nothing left to do (docs/decisions/023).
 * App servers never migrate; they refuse to start until this has run.
 */
import { MigrationRefused, migrateDatabase } from "./lib/database-tasks";
import { resolveDatabaseUrl } from "./lib/database-url";
import { MigrationLockError } from "./lib/migration-lock";

try {
  const outcome = await migrateDatabase(await resolveDatabaseUrl());
  console.log(
    outcome.applied === 0
      ? `[turnledger] the database already has all ${outcome.known} migrations: nothing to apply.`
      : `[turnledger] applied ${outcome.applied} migration${outcome.applied === 1 ? "" : "s"}; the database has all ${outcome.known}.`,
  );
} catch (error) {
  if (!(
    error instanceof MigrationRefused || error instanceof MigrationLockError
  ))
    throw error;
  console.error(`[turnledger] not migrated: ${error.message}`);
  process.exit(1);
}
