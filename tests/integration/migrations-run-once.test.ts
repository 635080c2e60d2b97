/**
 * `npm run db:migrate` is the one step that migrates, and two at once apply
 * each migration once: the migration lock (scripts/lib/migration-lock.ts) is
 * a row under a primary key, waited for, taken over once expired, and
 * released by its holder only (docs/decisions/023).
 */
import mysql from "mysql2/promise";
import { afterAll, describe, expect, it } from "vitest";
import { CONDUCTOR_MATERIALS } from "~/engineering/reference-data";
import {
  ensureMigrationLockTable,
  migrationLockTable,
  takeMigrationLock,
} from "../../scripts/lib/migration-lock";
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

async function database(suffix: string) {
  const fresh = await freshDatabase(suffix);
  created.push(fresh.name);
  return fresh;
}

async function withConnection<T>(
  url: string,
  work: (connection: mysql.Connection) => Promise<T>,
): Promise<T> {
  const connection = await mysql.createConnection({ uri: url, timezone: "Z" });
  try {
    return await work(connection);
  } finally {
    await connection.end();
  }
}

async function rows<T>(url: string, query: string): Promise<T[]> {
  return withConnection(url, async (connection) => {
    const [result] = await connection.query(query);
    return result as T[];
  });
}

describe("two db:migrate runs at once", () => {
  it("on an empty database apply the schema exactly once; the second waits and finds nothing to do", async () => {
    const { url } = await database("twice");
    const [first, second] = await Promise.all([
      runDbMigrate(url),
      runDbMigrate(url),
    ]);
    expect(first.code, first.output).toBe(0);
    expect(second.code, second.output).toBe(0);

    const known = knownMigrations();
    const outputs = [first.output, second.output];
    expect(
      outputs.filter((output) =>
        output.includes(`applied ${known.length} migrations`),
      ),
      outputs.join("\n---\n"),
    ).toHaveLength(1);
    expect(
      outputs.filter((output) => output.includes("nothing to apply")),
    ).toHaveLength(1);

    // One row per journal entry, in order, with drizzle's own hashes.
    const applied = await rows<{ hash: string; createdAt: string }>(
      url,
      "SELECT hash, created_at AS createdAt FROM __drizzle_migrations ORDER BY id",
    );
    expect(
      applied.map((row) => ({
        hash: row.hash,
        createdAt: Number(row.createdAt),
      })),
    ).toEqual(known);
    expect(await rows(url, `SELECT * FROM \`${migrationLockTable}\``)).toEqual(
      [],
    );
    const materials = await rows<{ n: number }>(
      url,
      "SELECT COUNT(*) AS n FROM conductor_materials",
    );
    expect(Number(materials[0]!.n)).toBe(CONDUCTOR_MATERIALS.length);
  });
});

describe("the migration lock", () => {
  it("left behind by a run that crashed is taken over once it has expired", async () => {
    const { url } = await database("stale");
    await withConnection(url, async (connection) => {
      await ensureMigrationLockTable(connection);
      await connection.query(
        `INSERT INTO \`${migrationLockTable}\` (name, holder, taken_at, expires_at)
         VALUES ('migrate', 'crashed-host pid 4242', UTC_TIMESTAMP(3) - INTERVAL 10 MINUTE, UTC_TIMESTAMP(3) - INTERVAL 9 MINUTE)`,
      );
    });
    const run = await runDbMigrate(url);
    expect(run.code, run.output).toBe(0);
    expect(run.output).toContain(
      "took over the migration lock left by crashed-host pid 4242",
    );
    expect(run.output).toContain(
      `applied ${knownMigrations().length} migrations`,
    );
    expect(await rows(url, `SELECT * FROM \`${migrationLockTable}\``)).toEqual(
      [],
    );
  });

  it("held by a live run is waited for, within a bound, with a message; the waiter leaves it alone", async () => {
    const { url } = await database("held");
    await withConnection(url, async (connection) => {
      await ensureMigrationLockTable(connection);
      await connection.query(
        `INSERT INTO \`${migrationLockTable}\` (name, holder, taken_at, expires_at)
         VALUES ('migrate', 'busy-host pid 7', UTC_TIMESTAMP(3), UTC_TIMESTAMP(3) + INTERVAL 5 MINUTE)`,
      );
    });
    const run = await runDbMigrate(url, { MIGRATE_LOCK_WAIT_SECONDS: "3" });
    expect(run.code, run.output).toBe(1);
    expect(run.output).toContain(
      "another db:migrate is migrating this database (busy-host pid 7",
    );
    expect(run.output).toContain("waiting up to 3 s");
    expect(run.output).toContain(
      "Another db:migrate still holds this database's migration lock",
    );
    expect(run.output).toContain("npm run db:migrate");
    const left = await rows<{ holder: string }>(
      url,
      `SELECT holder FROM \`${migrationLockTable}\``,
    );
    expect(left).toEqual([{ holder: "busy-host pid 7" }]);
    // Nothing was migrated while another run held the lock.
    const tables = await rows<{ name: string }>(
      url,
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE()",
    );
    expect(tables.map((table) => table.name)).toEqual([migrationLockTable]);
  });

  it("is released by deleting its holder's own row only, and knows when it was taken over", async () => {
    const { url } = await database("release");
    await withConnection(url, async (connection) => {
      await ensureMigrationLockTable(connection);
      const lock = await takeMigrationLock(connection, {
        holder: "first",
        // Renewed every second.
        ttlSeconds: 3,
        log: () => undefined,
      });
      expect(() => lock.assertHeld()).not.toThrow();
      // Another run took it over (as after an expiry): releasing must not free it.
      await connection.query(
        `UPDATE \`${migrationLockTable}\` SET holder = 'second' WHERE name = 'migrate'`,
      );
      await new Promise((resolve) => setTimeout(resolve, 1_600));
      expect(() => lock.assertHeld()).toThrow(/another run took it over/);
      await lock.release();
      const [left] = await connection.query(
        `SELECT holder FROM \`${migrationLockTable}\``,
      );
      expect(left).toEqual([{ holder: "second" }]);
    });
  });
});
