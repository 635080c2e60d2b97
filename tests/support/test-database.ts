/** Direct access to the test database, for setting up people and reading what was stored. */
import { hash } from "@node-rs/argon2";
import { randomBytes } from "node:crypto";
import { drizzle, type MySql2Database } from "drizzle-orm/mysql2";
import mysql from "mysql2/promise";
import { inject } from "vitest";
import { poolOptionsFromUrl } from "~/db/connection-options";
import * as schema from "~/db/schema";
import { locations, userRoles, users } from "~/db/schema";
import type { Role } from "~/lib/roles";

let pool: mysql.Pool | undefined;
export function testDatabase(): mysql.Pool {
  pool ??= mysql.createPool({
    ...poolOptionsFromUrl(inject("databaseUrl")),
    connectionLimit: 3,
  });
  return pool;
}

export type TestDb = MySql2Database<typeof schema>;

const drizzleByPool = new WeakMap<mysql.Pool, TestDb>();

/**
 * Drizzle on `database` (by default the test database), with the app's schema:
 * fixtures write through it, so a renamed table or column breaks the typecheck
 * instead of a test run.
 */
export function testDb(database: mysql.Pool = testDatabase()): TestDb {
  let db = drizzleByPool.get(database);
  if (!db) {
    // "planetscale" mode as in app/db/client.server.ts (MariaDB has no LATERAL joins).
    db = drizzle(database, { schema, mode: "planetscale" });
    drizzleByPool.set(database, db);
  }
  return db;
}

export async function closeTestDatabase(): Promise<void> {
  await pool?.end();
  pool = undefined;
}

/** Creates an active person with a password and roles (in `database`, by default the test database); returns the id. */
export async function createPerson(
  input: {
    email: string;
    password: string;
    roles: Role[];
    name?: string;
  },
  database: mysql.Pool = testDatabase(),
): Promise<string> {
  const id = `test-${randomBytes(8).toString("hex")}`;
  const passwordHash = await hash(input.password);
  const db = testDb(database);
  await db.insert(users).values({
    id,
    email: input.email,
    name: input.name ?? "Test Person",
    passwordHash,
    active: true,
  });
  if (input.roles.length > 0)
    await db
      .insert(userRoles)
      .values(input.roles.map((role) => ({ userId: id, role })));
  return id;
}

/** Creates a stock location (there is no page for locations yet); returns its code. */
export async function createLocation(
  code: string,
  name = `Test ${code}`,
  database: mysql.Pool = testDatabase(),
): Promise<string> {
  await testDb(database).insert(locations).values({ code, name, kind: "bin" });
  return code;
}

/** A short random suffix for SKUs, lot numbers and location codes. */
export function uniqueCode(prefix: string): string {
  return `${prefix}-${randomBytes(4).toString("hex").toUpperCase()}`;
}
