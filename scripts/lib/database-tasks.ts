import path from "node:path";
import { and, count, eq, isNotNull } from "drizzle-orm";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import { migrate } from "drizzle-orm/mysql2/migrator";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import * as schema from "~/db/schema";
import {
  demoPassword,
  demoPeople,
  demoStorekeeperId,
} from "../../seed/demo-people";
import { databaseIsEmpty, seedDemoData } from "../../seed/seed-demo-data";
import { projectRoot } from "./project-paths";
import { syncReferenceData } from "~/reference/reference-sync.server";

async function withDatabase<T>(
  databaseUrl: string,
  work: (db: MySql2Database<typeof schema>) => Promise<T>,
): Promise<T> {
  const pool = mysql.createPool({
    ...poolOptionsFromUrl(databaseUrl),
    connectionLimit: 2,
  });
  try {
    return await work(drizzle(pool, { schema, mode: "planetscale" }));
  } finally {
    await pool.end();
  }
}

/**
 * Applies the committed migrations in drizzle/ that the database has not had
 * yet, then writes the built-in engineering reference data.
 */
export function migrateDatabase(databaseUrl: string): Promise<void> {
  return withDatabase(databaseUrl, async (db) => {
    await migrate(db, { migrationsFolder: path.join(projectRoot, "drizzle") });
    await syncReferenceData(db);
  });
}

/** True when no active account has a password: nobody can sign in yet. */
export function nobodyCanSignIn(databaseUrl: string): Promise<boolean> {
  return withDatabase(databaseUrl, async (db) => {
    const [row] = await db
      .select({ people: count() })
      .from(schema.users)
      .where(
        and(
          eq(schema.users.active, true),
          isNotNull(schema.users.passwordHash),
        ),
      );
    return (row?.people ?? 0) === 0;
  });
}

/** Seeds the demo data when the database has no people. Returns true when it seeded. */
export function seedWhenEmpty(
  databaseUrl: string,
  options = { quiet: false },
): Promise<boolean> {
  return withDatabase(databaseUrl, async (db) => {
    if (!(await databaseIsEmpty(db))) return false;
    await seedDemoData(db);
    await seedStockThroughTheLedger(databaseUrl);
    if (!options.quiet) {
      console.log("[turnledger] demo data seeded. Sign in with any of these:");
      for (const person of demoPeople) {
        console.log(
          `    ${person.email.padEnd(30)} ${person.roles.join(", ")}`,
        );
      }
      console.log(`  password: ${demoPassword()}`);
    }
    return true;
  });
}

/**
 * The demo store is written through the app's own catalogue and ledger code,
 * which uses the app's database client (configured by DATABASE_URL).
 */
async function seedStockThroughTheLedger(databaseUrl: string): Promise<void> {
  const previous = process.env.DATABASE_URL;
  process.env.DATABASE_URL = databaseUrl;
  const client = await import("~/db/client.server");
  try {
    const { seedDemoStock } = await import("../../seed/demo-stock");
    await seedDemoStock(demoStorekeeperId);
    const { seedDemoWorkshop } = await import("../../seed/demo-workshop");
    await seedDemoWorkshop();
  } finally {
    // The demo's low-stock e-mails are sent after the work that opened them.
    const { deliveriesFinished } = await import("~/mail/mailer.server");
    await deliveriesFinished();
    await client.pool.end();
    delete (globalThis as { turnledgerDb?: unknown }).turnledgerDb;
    process.env.DATABASE_URL = previous;
  }
}
