/**
 * `npm run db:backup`: one consistent dump of the app's database
 * (mariadb-dump --single-transaction: one InnoDB snapshot, no table locks, the
 * app keeps serving), gzip-compressed as it streams, to a timestamped file,
 * with its SHA-256 beside it. See docs/decisions/022-backups.md.
 */
import { spawn } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { pipeline } from "node:stream/promises";
import { createGzip } from "node:zlib";
import {
  backupFileName,
  checksumFileOf,
  checksumLine,
  fileSha256,
} from "./backup-files";
import { loginFromUrl, withClientLogin } from "./mariadb-client-login";
import { projectRoot } from "./project-paths";
import { findProgram } from "./run-command";

/** BACKUP_DIR, or <project>/backups. */
export function backupFolder(): string {
  const setting = process.env.BACKUP_DIR?.trim();
  return setting ? path.resolve(setting) : path.join(projectRoot, "backups");
}

/** A Debian MariaDB client program, or a message saying how to get it. */
export function mariadbProgram(name: "mariadb-dump" | "mariadb"): string {
  const program = findProgram(name);
  if (!program)
    throw new Error(
      `${name} is not installed. It comes with Debian's MariaDB client: apt-get install -y mariadb-client`,
    );
  return program;
}

export interface BackupMade {
  file: string;
  bytes: number;
  sha256: string;
}

/** Streams `program args` stdout through `transform` into `file`; rejects with its stderr when it fails. */
export async function streamProgramOutput(
  program: string,
  args: string[],
  transform: NodeJS.ReadWriteStream,
  file: string,
): Promise<void> {
  const child = spawn(program, args, { stdio: ["ignore", "pipe", "pipe"] });
  let errors = "";
  child.stderr.on("data", (chunk: Buffer) => (errors += chunk));
  const exited = new Promise<number | null>((resolve, reject) => {
    child.once("error", reject);
    child.once("close", (code) => resolve(code));
  });
  await pipeline(
    child.stdout,
    transform,
    fs.createWriteStream(file, { mode: 0o600 }),
  );
  const code = await exited;
  if (code !== 0)
    throw new Error(
      `${path.basename(program)} failed (exit ${code}): ${errors.trim()}`,
    );
}

export async function backUpDatabase(
  databaseUrl: string,
  folder = backupFolder(),
  at = new Date(),
): Promise<BackupMade> {
  const login = loginFromUrl(databaseUrl);
  const dump = mariadbProgram("mariadb-dump");
  fs.mkdirSync(folder, { recursive: true, mode: 0o700 });
  const file = path.join(folder, backupFileName(login.database, at));
  // Written under another name first: a failed dump never leaves a file that looks like a backup.
  const partial = `${file}.partial`;
  try {
    await withClientLogin(login, (loginArgument) =>
      streamProgramOutput(
        dump,
        [
          loginArgument,
          "--single-transaction",
          // No LOCK TABLES in the file: the snapshot is already consistent,
          // and the app's user (who may restore it) has no LOCK TABLES right.
          "--skip-add-locks",
          "--routines",
          "--triggers",
          "--no-tablespaces",
          "--hex-blob",
          "--default-character-set=utf8mb4",
          login.database,
        ],
        createGzip(),
        partial,
      ),
    );
    fs.renameSync(partial, file);
  } finally {
    fs.rmSync(partial, { force: true });
  }
  const sha256 = await fileSha256(file);
  fs.writeFileSync(checksumFileOf(file), checksumLine(sha256, file), {
    mode: 0o600,
  });
  return { file, bytes: fs.statSync(file).size, sha256 };
}
