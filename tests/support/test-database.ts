/** Direct access to the test database, for setting up people and reading what was stored. */
import { hash } from "@node-rs/argon2";
import { randomBytes } from "node:crypto";
import mysql from "mysql2/promise";
import { inject } from "vitest";
import { poolOptionsFromUrl } from "~/db/connection-options";
import type { Role } from "~/lib/roles";

let pool: mysql.Pool | undefined;
export function testDatabase(): mysql.Pool {
  pool ??= mysql.createPool({
    ...poolOptionsFromUrl(inject("databaseUrl")),
    connectionLimit: 3,
  });
  return pool;
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
  const db = database;
  await db.query(
    "INSERT INTO users (id, email, name, password_hash, active, created_at) VALUES (?, ?, ?, ?, 1, NOW(3))",
    [id, input.email, input.name ?? "Test Person", passwordHash],
  );
  for (const role of input.roles) {
    await db.query("INSERT INTO user_roles (user_id, role) VALUES (?, ?)", [
      id,
      role,
    ]);
  }
  return id;
}

/** Creates a stock location (there is no page for locations yet); returns its code. */
export async function createLocation(
  code: string,
  name = `Test ${code}`,
  database: mysql.Pool = testDatabase(),
): Promise<string> {
  await database.query(
    "INSERT INTO locations (code, name, kind) VALUES (?, ?, 'bin')",
    [code, name],
  );
  return code;
}

/** A short random suffix for SKUs, lot numbers and location codes. */
export function uniqueCode(prefix: string): string {
  return `${prefix}-${randomBytes(4).toString("hex").toUpperCase()}`;
}
