import { migrateDatabase, seedWhenEmpty } from "./lib/database-tasks";
import { resolveDatabaseUrl } from "./lib/database-url";

const databaseUrl = await resolveDatabaseUrl();
await migrateDatabase(databaseUrl);
if (!(await seedWhenEmpty(databaseUrl))) {
  console.log("[turnledger] the database already has data: nothing seeded.");
}
