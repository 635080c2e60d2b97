import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, it } from "vitest";
import {
  backupFileName,
  checksumFromLine,
  checksumLine,
  fileSha256,
  verifyBackupChecksum,
} from "./backup-files";

describe("backupFileName", () => {
  it("is timestamped in UTC to the second, with no colons", () => {
    expect(
      backupFileName("turnledger", new Date("2026-12-02T17:05:09.123Z")),
    ).toBe("turnledger-turnledger-2026-12-02T17-05-09Z.sql.gz");
  });
});

describe("checksums", () => {
  it("are SHA-256 in sha256sum's format", async () => {
    const folder = fs.mkdtempSync(path.join(os.tmpdir(), "backup-files-"));
    const file = path.join(folder, "b.sql.gz");
    fs.writeFileSync(file, "abc");
    // SHA-256("abc") from FIPS 180-2, appendix B.1.
    const abc =
      "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad";
    expect(await fileSha256(file)).toBe(abc);
    expect(checksumLine(abc, file)).toBe(`${abc}  b.sql.gz\n`);
    expect(checksumFromLine(`${abc}  b.sql.gz\n`)).toBe(abc);
    expect(checksumFromLine("not a checksum")).toBeNull();

    expect(await verifyBackupChecksum(file)).toBe("no checksum file");
    fs.writeFileSync(`${file}.sha256`, checksumLine(abc, file));
    expect(await verifyBackupChecksum(file)).toBe("checked");
    fs.writeFileSync(file, "abd");
    await expect(verifyBackupChecksum(file)).rejects.toThrow(
      "does not match its checksum file",
    );
    fs.rmSync(folder, { recursive: true });
  });
});
