import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "./connection-options";
import * as schema from "./schema";

export type Database = MySql2Database<typeof schema>;

/** A transaction's handle, for helpers that take part in their caller's transaction. */
export type Transaction = Parameters<Parameters<Database["transaction"]>[0]>[0];

function createDatabase(): { db: Database; pool: mysql.Pool } {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) {
    throw new Error(
      "DATABASE_URL is not set. Start the app with `npm start` (or `npm run dev`), which sets it.",
    );
  }
  const pool = mysql.createPool(poolOptionsFromUrl(databaseUrl));
  // "planetscale" mode: relational queries without LATERAL joins, which MariaDB lacks.
  const db = drizzle(pool, { schema, mode: "planetscale" });
  return { db, pool };
}

// One pool per process, kept across dev-server module reloads.
const globalForDb = globalThis as unknown as {
  turnledgerDb?: { db: Database; pool: mysql.Pool };
};
const created = (globalForDb.turnledgerDb ??= createDatabase());

export const db = created.db;
export const pool = created.pool;
