import { migrateDatabase } from "./lib/database-tasks";
import { resolveDatabaseUrl } from "./lib/database-url";

await migrateDatabase(await resolveDatabaseUrl());
console.log("[turnledger] migrations applied.");
