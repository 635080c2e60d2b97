/**
 * Backup files: their timestamped names, and the SHA-256 checksum written
 * beside each one in `sha256sum` format, so `sha256sum -c` checks it too.
 */
import { createHash } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { pipeline } from "node:stream/promises";

/** turnledger-<database>-2026-12-02T17-50-03Z.sql.gz: sorts by time, no ':' (unsafe in some file systems). */
export function backupFileName(database: string, at: Date): string {
  const stamp = at
    .toISOString()
    .replace(/\.\d{3}Z$/, "Z")
    .replace(/:/g, "-");
  return `turnledger-${database}-${stamp}.sql.gz`;
}

/** The checksum file beside a backup. */
export const checksumFileOf = (backupFile: string) => `${backupFile}.sha256`;

/** The SHA-256 of a file, read as a stream. */
export async function fileSha256(file: string): Promise<string> {
  const hash = createHash("sha256");
  await pipeline(fs.createReadStream(file), hash);
  return hash.digest("hex");
}

/** One `sha256sum` line: "<hex>  <file name>". */
export function checksumLine(sha256: string, backupFile: string): string {
  return `${sha256}  ${path.basename(backupFile)}\n`;
}

/** The checksum a `sha256sum` line records, or null when the text is not one. */
export function checksumFromLine(text: string): string | null {
  return (
    /^([0-9a-f]{64})\s/i.exec(text.trim() + "\n")?.[1]?.toLowerCase() ?? null
  );
}

/**
 * Checks a backup against the checksum file beside it. Returns "checked", or
 * "no checksum file"; throws when the file does not match.
 */
export async function verifyBackupChecksum(
  backupFile: string,
): Promise<"checked" | "no checksum file"> {
  const checksumFile = checksumFileOf(backupFile);
  if (!fs.existsSync(checksumFile)) return "no checksum file";
  const expected = checksumFromLine(fs.readFileSync(checksumFile, "utf8"));
  if (!expected)
    throw new Error(`${checksumFile} does not hold a SHA-256 checksum.`);
  const actual = await fileSha256(backupFile);
  if (actual !== expected)
    throw new Error(
      `${backupFile} does not match its checksum file (${checksumFile}): the file is damaged or was changed. Nothing was restored.`,
    );
  return "checked";
}
