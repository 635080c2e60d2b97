/**
 * A shop's own MariaDB (DATABASE_URL), created with the server's defaults:
 * on a stock MariaDB 10.11 that is latin1, which cannot hold the Greek
 * letters and symbols of the reference data. db:migrate gives an empty
 * database a utf8mb4 default before the first table, and refuses one that
 * already holds tables in another character set (docs/decisions/029).
 */
import mysql from "mysql2/promise";
import { afterAll, describe, expect, it } from "vitest";
import { CONDUCTOR_MATERIALS } from "~/engineering/reference-data";
import { knownMigrations } from "../../scripts/lib/migration-state";
import {
  dropDatabase,
  freshDatabase,
  runDbMigrate,
} from "../support/scratch-databases";

const created: string[] = [];
afterAll(async () => {
  for (const name of created) await dropDatabase(name);
});

async function query<T>(
  url: string,
  sql: string,
  values: unknown[] = [],
): Promise<T[]> {
  const connection = await mysql.createConnection({ uri: url });
  try {
    const [rows] = await connection.query(sql, values);
    return rows as T[];
  } finally {
    await connection.end();
  }
}

describe("db:migrate on a latin1 database", () => {
  it("sets an empty one's default to utf8mb4 first; Greek and symbol reference rows read back intact", async () => {
    const { name, url } = await freshDatabase("latin1", "latin1");
    created.push(name);

    const run = await runDbMigrate(url);
    expect(run.code, run.output).toBe(0);
    expect(run.output).toContain(
      `default character set was latin1 (latin1_swedish_ci): set to utf8mb4 (utf8mb4_unicode_ci)`,
    );
    expect(run.output).toContain(
      `applied ${knownMigrations().length} migrations`,
    );

    const [schema] = await query<{ charset: string; collation: string }>(
      url,
      "SELECT DEFAULT_CHARACTER_SET_NAME AS charset, DEFAULT_COLLATION_NAME AS collation FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ?",
      [name],
    );
    expect(schema).toEqual({
      charset: "utf8mb4",
      collation: "utf8mb4_unicode_ci",
    });
    const notUtf8mb4 = await query<{ name: string }>(
      url,
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? AND TABLE_COLLATION NOT LIKE 'utf8mb4%'",
      [name],
    );
    expect(notUtf8mb4).toEqual([]);

    // The sources quote ρ20, α20, Ω·mm²/m and g/cm³.
    const sources = await query<{ key: string; source: string }>(
      url,
      "SELECT material_key AS `key`, source FROM conductor_materials ORDER BY material_key",
    );
    const expected = CONDUCTOR_MATERIALS.map((material) => ({
      key: material.key,
      source: material.source,
    })).sort((a, b) => a.key.localeCompare(b.key));
    expect(expected.some((row) => /[ρΩ³]/.test(row.source))).toBe(true);
    expect(sources).toEqual(expected);
  });

  it("refuses one that already holds latin1 tables, saying how to create a database", async () => {
    const { name, url } = await freshDatabase("latin1_used", "latin1");
    created.push(name);
    await query(
      url,
      "CREATE TABLE ledger_notes (id INT PRIMARY KEY, note VARCHAR(40)) CHARACTER SET latin1",
    );

    const run = await runDbMigrate(url);
    expect(run.code, run.output).toBe(1);
    expect(run.output).toContain(
      `The database ${name} holds 1 table not in utf8mb4: ledger_notes (latin1_swedish_ci)`,
    );
    expect(run.output).toContain(
      "CREATE DATABASE `turnledger` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci",
    );
    const tables = await query<{ name: string }>(
      url,
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = ? ORDER BY TABLE_NAME",
      [name],
    );
    expect(tables.map((table) => table.name)).toEqual([
      "ledger_notes",
      "turnledger_migration_lock",
    ]);
  });
});
