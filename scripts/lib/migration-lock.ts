/**
 * The guard that lets one `npm run db:migrate` at a time change a database:
 * a row in a small table under a primary key (docs/decisions/023). Taking it
 * is an INSERT of that row; a second run's INSERT breaks the key (one node),
 * or loses Galera's certification to the first (a cluster: write sets that
 * touch the same key conflict), and that run waits. GET_LOCK is not used:
 * Galera does not replicate it, so two runs on two nodes would both hold it.
 *
 * The holder renews its row's expiry while it works; a row left by a run that
 * crashed expires and is taken over. Releasing deletes only one's own row.
 * Times are the database server's (UTC_TIMESTAMP), so clients' clocks do not
 * matter.
 */
import { randomBytes } from "node:crypto";
import os from "node:os";
import type mysql from "mysql2/promise";

export const migrationLockTable = "turnledger_migration_lock";
const lockName = "migrate";

/** Created by db:migrate itself: it guards the migrations, so it is not one. */
export async function ensureMigrationLockTable(
  connection: mysql.Connection,
): Promise<void> {
  await connection.query(
    `CREATE TABLE IF NOT EXISTS \`${migrationLockTable}\` (
      name VARCHAR(64) NOT NULL PRIMARY KEY,
      holder VARCHAR(255) NOT NULL,
      taken_at DATETIME(3) NOT NULL,
      expires_at DATETIME(3) NOT NULL
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`,
  );
}

export interface MigrationLockOptions {
  /** Who holds it: host, process id and a random part. */
  holder?: string;
  /** How long the row stays valid without renewal (default 60 s). */
  ttlSeconds?: number;
  /** How long to wait for another holder before giving up (default 600 s). */
  waitSeconds?: number;
  /** Between attempts while waiting (default 1 s, with jitter). */
  pollMs?: number;
  log?: (line: string) => void;
}

export interface MigrationLock {
  holder: string;
  /** Throws when the row was taken over (this run's renewals failed past its expiry). */
  assertHeld(): void;
  /** Stops renewing and deletes this run's row (never another's). */
  release(): Promise<void>;
}

/** Waiting gave up, or the lock was lost: a message the person can act on. */
export class MigrationLockError extends Error {}

interface LockRow {
  holder: string;
  takenAt: Date;
  expiresAt: Date;
}

function errorCode(error: unknown): string | undefined {
  const code = (error as { code?: unknown }).code;
  return typeof code === "string" ? code : undefined;
}

/**
 * Another writer won the row: a duplicate key on one server; on Galera a
 * certification conflict, reported as a deadlock, or a lock wait timeout.
 */
function lostTheRace(error: unknown): boolean {
  return ["ER_DUP_ENTRY", "ER_LOCK_DEADLOCK", "ER_LOCK_WAIT_TIMEOUT"].includes(
    errorCode(error) ?? "",
  );
}

export function newHolderId(): string {
  return `${os.hostname()} pid ${process.pid} ${randomBytes(4).toString("hex")}`;
}

async function currentRow(
  connection: mysql.Connection,
): Promise<LockRow | null> {
  const [rows] = await connection.query(
    `SELECT holder, taken_at AS takenAt, expires_at AS expiresAt FROM \`${migrationLockTable}\` WHERE name = ?`,
    [lockName],
  );
  return (rows as LockRow[])[0] ?? null;
}

type Attempt =
  | { kind: "taken" }
  /** `previous` is the expired row as it was read just before (null if it vanished). */
  | { kind: "taken-over"; previous: LockRow | null }
  | { kind: "held"; by: LockRow | null };

/** One attempt: take a free row, or take over an expired one. */
async function tryTake(
  connection: mysql.Connection,
  holder: string,
  ttlSeconds: number,
): Promise<Attempt> {
  try {
    await connection.query(
      `INSERT INTO \`${migrationLockTable}\` (name, holder, taken_at, expires_at)
       VALUES (?, ?, UTC_TIMESTAMP(3), UTC_TIMESTAMP(3) + INTERVAL ? SECOND)`,
      [lockName, holder, ttlSeconds],
    );
    return { kind: "taken" };
  } catch (error) {
    if (!lostTheRace(error)) throw error;
  }
  const before = await currentRow(connection);
  try {
    const [result] = await connection.query(
      `UPDATE \`${migrationLockTable}\`
       SET holder = ?, taken_at = UTC_TIMESTAMP(3), expires_at = UTC_TIMESTAMP(3) + INTERVAL ? SECOND
       WHERE name = ? AND expires_at < UTC_TIMESTAMP(3)`,
      [holder, ttlSeconds, lockName],
    );
    if ((result as mysql.ResultSetHeader).affectedRows === 1)
      return { kind: "taken-over", previous: before };
  } catch (error) {
    if (!lostTheRace(error)) throw error;
  }
  return { kind: "held", by: before };
}

const iso = (date: Date) => date.toISOString().replace(/\.\d+Z$/, "Z");

/**
 * Takes the migration lock on the connection's database, waiting (with a
 * message) while another run holds it. The connection is the lock's own: it
 * renews the row while the caller migrates on other connections.
 */
export async function takeMigrationLock(
  connection: mysql.Connection,
  options: MigrationLockOptions = {},
): Promise<MigrationLock> {
  const holder = options.holder ?? newHolderId();
  const ttlSeconds = options.ttlSeconds ?? 60;
  const waitSeconds = options.waitSeconds ?? 600;
  const pollMs = options.pollMs ?? 1_000;
  const log = options.log ?? ((line: string) => console.log(line));

  const started = Date.now();
  let lastNote = 0;
  for (;;) {
    const attempt = await tryTake(connection, holder, ttlSeconds);
    if (attempt.kind === "taken-over")
      log(
        attempt.previous
          ? `[turnledger] took over the migration lock left by ${attempt.previous.holder} ` +
              `(taken ${iso(attempt.previous.takenAt)}, expired ${iso(attempt.previous.expiresAt)}: that run stopped without releasing it).`
          : "[turnledger] took over an expired migration lock.",
      );
    if (attempt.kind !== "held")
      return startRenewing(connection, holder, ttlSeconds, log);
    const row = attempt.by;
    const waited = (Date.now() - started) / 1000;
    if (waited >= waitSeconds)
      throw new MigrationLockError(
        `Another db:migrate still holds this database's migration lock after ${Math.round(waited)} s of waiting` +
          (row
            ? ` (${row.holder}, since ${iso(row.takenAt)}; it renews the lock while it works, and the lock expires ${iso(row.expiresAt)} unless renewed).`
            : ".") +
          ` Let it finish, then run \`npm run db:migrate\` again. If no run is alive, the lock expires by itself within ${ttlSeconds} s.`,
      );
    if (lastNote === 0 || Date.now() - lastNote >= 10_000) {
      log(
        lastNote === 0
          ? `[turnledger] another db:migrate is migrating this database${row ? ` (${row.holder}, since ${iso(row.takenAt)})` : ""}: ` +
              `waiting up to ${waitSeconds} s for it to finish…`
          : `[turnledger] still waiting for the other db:migrate (${Math.round(waited)} s)…`,
      );
      lastNote = Date.now();
    }
    await new Promise((resolve) =>
      setTimeout(resolve, pollMs * (0.75 + Math.random() / 2)),
    );
  }
}

function startRenewing(
  connection: mysql.Connection,
  holder: string,
  ttlSeconds: number,
  log: (line: string) => void,
): MigrationLock {
  let lost: string | null = null;
  let renewed = Date.now();
  let renewing: Promise<void> = Promise.resolve();
  const renew = async () => {
    try {
      const [result] = await connection.query(
        `UPDATE \`${migrationLockTable}\` SET expires_at = UTC_TIMESTAMP(3) + INTERVAL ? SECOND
         WHERE name = ? AND holder = ?`,
        [ttlSeconds, lockName, holder],
      );
      if ((result as mysql.ResultSetHeader).affectedRows === 1)
        renewed = Date.now();
      else lost ??= "another run took it over";
    } catch (error) {
      // A renewal that failed is tried again; the row stays valid until its expiry.
      if (Date.now() - renewed > ttlSeconds * 1000)
        lost ??= `its renewals failed for longer than ${ttlSeconds} s`;
      log(
        `[turnledger] could not renew the migration lock: ${(error as Error).message}`,
      );
    }
  };
  const timer = setInterval(
    () => {
      renewing = renewing.then(renew);
    },
    (ttlSeconds * 1000) / 3,
  );
  timer.unref();
  return {
    holder,
    assertHeld() {
      if (lost)
        throw new MigrationLockError(
          `The migration lock was lost while migrating: ${lost}. ` +
            "Run `npm run db:migrate` again: migrations already applied are skipped.",
        );
    },
    async release() {
      clearInterval(timer);
      await renewing;
      await connection.query(
        `DELETE FROM \`${migrationLockTable}\` WHERE name = ? AND holder = ?`,
        [lockName, holder],
      );
    },
  };
}
