/**
 * npm run db:seed: the demo company into an empty database. Only into the
 * private MariaDB, or into DATABASE_URL's when asked (`-- --demo` or
 * DEMO_DATA=1): the demo's people have a published password.
 */
import { migrateDatabase, seedWhenEmpty } from "./lib/database-tasks";
import { resolveDatabaseUrl } from "./lib/database-url";
import {
  demoDataWanted,
  firstAdminHint,
  usesPrivateDatabase,
} from "./lib/demo-data";

if (
  !demoDataWanted({
    privateDatabase: usesPrivateDatabase(process.env),
    argv: process.argv.slice(2),
    env: process.env,
  })
) {
  console.error(
    "[turnledger] DATABASE_URL is set: the demo data (people with a published password) " +
      "goes there only when asked: `npm run db:seed -- --demo`.\n" +
      `[turnledger] ${firstAdminHint}`,
  );
  process.exit(1);
}
const databaseUrl = await resolveDatabaseUrl();
await migrateDatabase(databaseUrl);
if (!(await seedWhenEmpty(databaseUrl))) {
  console.log("[turnledger] the database already has data: nothing seeded.");
}
