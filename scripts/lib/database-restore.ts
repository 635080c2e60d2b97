/**
 * `npm run db:restore -- FILE`: checks the backup against its checksum file,
 * loads it into an empty database (gunzip streamed into the mariadb client),
 * then checks that the migrations it had are the first ones of this version:
 * a backup from a newer version is refused (and the database emptied again),
 * an older one gets the remaining migrations.
 */
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import { createGunzip } from "node:zlib";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { verifyBackupChecksum } from "./backup-files";
import { migrateDatabase } from "./database-tasks";
import { mariadbProgram } from "./database-backup";
import {
  loginFromUrl,
  urlForDatabase,
  withClientLogin,
} from "./mariadb-client-login";
import { compareMigrations } from "~/db/migration-history";
import {
  appliedMigrations,
  knownMigrations,
  tableNames,
} from "./migration-state";

/** A refusal the person running the restore can act on (no stack trace needed). */
export class RestoreRefused extends Error {}

export interface RestoreOptions {
  /** Restore into this database on the same server instead of the URL's own. */
  intoName?: string;
  /** Empty a non-empty database first instead of refusing. */
  force?: boolean;
  log?: (line: string) => void;
}

async function emptyDatabase(
  connection: mysql.Connection,
  database: string,
): Promise<void> {
  const [views] = await connection.query(
    "SELECT TABLE_NAME AS name FROM information_schema.VIEWS WHERE TABLE_SCHEMA = ?",
    [database],
  );
  for (const { name } of views as { name: string }[])
    await connection.query(`DROP VIEW \`${database}\`.\`${name}\``);
  await connection.query("SET FOREIGN_KEY_CHECKS = 0");
  for (const name of await tableNames(connection, database))
    await connection.query(`DROP TABLE \`${database}\`.\`${name}\``);
  await connection.query("SET FOREIGN_KEY_CHECKS = 1");
}

/** Streams the gzip backup through gunzip into `mariadb <database>`. */
async function loadDump(file: string, databaseUrl: string): Promise<void> {
  const login = loginFromUrl(databaseUrl);
  const client = mariadbProgram("mariadb");
  await withClientLogin(login, async (loginArgument) => {
    const child = spawn(
      client,
      [
        loginArgument,
        "--default-character-set=utf8mb4",
        "--batch",
        login.database,
      ],
      { stdio: ["pipe", "ignore", "pipe"] },
    );
    let errors = "";
    child.stderr.on("data", (chunk: Buffer) => (errors += chunk));
    const exited = new Promise<number | null>((resolve, reject) => {
      child.once("error", reject);
      child.once("close", (code) => resolve(code));
    });
    const fed = pipeline(
      fs.createReadStream(file),
      createGunzip(),
      child.stdin,
    ).then(
      () => null,
      (error: Error) => {
        child.kill();
        return error;
      },
    );
    const [code, feedError] = await Promise.all([exited, fed]);
    // The client's own message first: when it stops on an error, the feed only sees a closed pipe.
    if (code !== 0)
      throw new Error(`mariadb failed while loading ${file}: ${errors.trim()}`);
    if (feedError)
      throw new Error(`${file} could not be read: ${feedError.message}`);
  });
}

/** Restores a backup; returns the URL of the database it restored into. */
export async function restoreDatabase(
  file: string,
  databaseUrl: string,
  options: RestoreOptions = {},
): Promise<string> {
  const log = options.log ?? ((line: string) => console.log(line));
  if (!fs.existsSync(file))
    throw new RestoreRefused(`There is no backup file ${file}.`);
  const checksum = await verifyBackupChecksum(file).catch((error: Error) => {
    throw new RestoreRefused(error.message);
  });
  if (checksum === "checked")
    log(`[turnledger] checksum of ${path.basename(file)} matches.`);
  else log(`[turnledger] no checksum file beside ${file}; not checked.`);

  const targetUrl = options.intoName
    ? urlForDatabase(databaseUrl, options.intoName)
    : databaseUrl;
  const { database } = loginFromUrl(targetUrl);
  if (!/^[\w$]+$/.test(database))
    throw new RestoreRefused(
      `A database name here is letters, digits, _ and $ (got "${database}").`,
    );
  const connection = await mysql.createConnection({
    ...poolOptionsFromUrl(urlForDatabase(databaseUrl, "information_schema")),
  });
  try {
    await connection.query(
      `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
    const existing = await tableNames(connection, database);
    if (existing.length > 0) {
      if (!options.force)
        throw new RestoreRefused(
          `The database ${database} is not empty (${existing.length} tables). ` +
            `Restore into a new one with --into-name NAME, or add --force to replace everything in ${database}.`,
        );
      log(
        `[turnledger] --force: dropping the ${existing.length} tables in ${database}.`,
      );
      await emptyDatabase(connection, database);
    }

    log(`[turnledger] restoring ${path.basename(file)} into ${database}…`);
    try {
      await loadDump(file, targetUrl);
    } catch (error) {
      // No half-restored database left behind to be mistaken for a whole one.
      await emptyDatabase(connection, database);
      throw new Error(
        `${(error as Error).message}\n${database} was emptied again.`,
      );
    }

    const known = knownMigrations();
    const fit = compareMigrations(
      await appliedMigrations(connection, database),
      known,
    );
    if (fit.kind === "newer" || fit.kind === "foreign") {
      await emptyDatabase(connection, database);
      throw new RestoreRefused(
        fit.kind === "newer"
          ? `This backup is from a newer Turnledger: its database had ${fit.applied} migrations, this version knows ${fit.known}. ` +
              `Restore it with that version or a later one. ${database} was emptied again.`
          : `This backup's migration ${fit.firstDifferent + 1} is not this version's: it does not come from this line of Turnledger. ${database} was emptied again.`,
      );
    }
    if (fit.kind === "older") {
      log(
        `[turnledger] the backup is from an older version: applying the ${fit.remaining} migrations it did not have yet.`,
      );
      await migrateDatabase(targetUrl);
    } else {
      log("[turnledger] the backup's migrations are this version's.");
    }
  } finally {
    await connection.end();
  }
  return targetUrl;
}
