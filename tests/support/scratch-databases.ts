/**
 * Databases of a test's own beside the test database, named after it
 * (`<TEST_DATABASE_NAME>_<suffix>`, which the application user may create),
 * and `npm run db:migrate` run against them as an operator runs it.
 */
import { spawn } from "node:child_process";
import path from "node:path";
import { inject } from "vitest";
import {
  connectAsRoot,
  testDatabaseName,
} from "../../scripts/lib/local-mariadb";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");

/** Drops and creates `<TEST_DATABASE_NAME>_<suffix>`; returns its name and URL. */
export async function freshDatabase(
  suffix: string,
  characterSet = "utf8mb4 COLLATE utf8mb4_unicode_ci",
): Promise<{ name: string; url: string }> {
  const name = `${testDatabaseName()}_${suffix}`;
  const root = await connectAsRoot();
  try {
    await root.query(`DROP DATABASE IF EXISTS \`${name}\``);
    await root.query(
      `CREATE DATABASE \`${name}\` CHARACTER SET ${characterSet}`,
    );
  } finally {
    await root.end();
  }
  return { name, url: inject("databaseUrl").replace(/\/[^/]+$/, `/${name}`) };
}

export async function dropDatabase(name: string): Promise<void> {
  const root = await connectAsRoot();
  try {
    await root.query(`DROP DATABASE IF EXISTS \`${name}\``);
  } finally {
    await root.end();
  }
}

export interface ScriptRun {
  code: number | null;
  output: string;
}

/** Starts `tsx scripts/db-migrate.ts` against a database; resolves when it exits. */
export function runDbMigrate(
  databaseUrl: string,
  env: NodeJS.ProcessEnv = {},
): Promise<ScriptRun> {
  return new Promise((resolve, reject) => {
    const child = spawn(
      path.join(projectRoot, "node_modules", ".bin", "tsx"),
      [path.join(projectRoot, "scripts", "db-migrate.ts")],
      {
        cwd: projectRoot,
        env: { ...process.env, ...env, DATABASE_URL: databaseUrl },
      },
    );
    let output = "";
    child.stdout.on("data", (chunk: Buffer) => (output += chunk));
    child.stderr.on("data", (chunk: Buffer) => (output += chunk));
    child.once("error", reject);
    child.once("exit", (code) => resolve({ code, output }));
  });
}
