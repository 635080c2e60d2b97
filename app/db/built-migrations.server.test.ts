import path from "node:path";
import { readMigrationFiles } from "drizzle-orm/migrator";
import { describe, expect, it } from "vitest";
import { builtMigrations } from "./built-migrations.server";

describe("builtMigrations", () => {
  it("are drizzle's own list: the journal's order and times, and drizzle's hashes", () => {
    // drizzle-orm 0.45's migrator reads and hashes drizzle/ itself: the
    // server's bundled copy must give the rows it writes to __drizzle_migrations.
    const drizzles = readMigrationFiles({
      migrationsFolder: path.resolve(import.meta.dirname, "../../drizzle"),
    }).map((migration) => ({
      hash: migration.hash,
      createdAt: migration.folderMillis,
    }));
    expect(drizzles.length).toBeGreaterThan(10);
    expect(builtMigrations()).toEqual(drizzles);
  });
});
