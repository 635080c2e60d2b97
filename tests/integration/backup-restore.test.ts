/**
 * The restore drill: movements recorded, a backup made, more movements, the
 * backup restored into a new database → every table's checksum is the one
 * taken at backup time and the app serves from the restored database, with
 * the first movements and without the later ones. And restore's refusals: a
 * non-empty database, a backup that does not match its checksum file.
 */
import { spawn } from "node:child_process";
import { createHash } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { appServerArguments } from "../../scripts/lib/app-server-process";
import { urlForDatabase } from "../../scripts/lib/mariadb-client-login";
import {
  newPerson,
  sendJson,
  sessionCookieFrom,
  signIn,
  signInAs,
  type TestPerson,
} from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");
const testDatabaseName = () => new URL(inject("databaseUrl")).pathname.slice(1);
const restoredName = () => `${testDatabaseName()}_restored`;
/** The restored app's port: TEST_PORT + 70, clear of the test app's. */
const restoredPort = () => Number(process.env.TEST_PORT ?? 3100) + 70;
const backupFolder = fs.mkdtempSync(
  path.join(os.tmpdir(), "turnledger-drill-"),
);

let buyer = "";
let storekeeper = "";
/** The storekeeper's sign-in, made before the backup, so the restored database holds them too. */
let storekeeperPerson: TestPerson;
let store = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeperPerson = await newPerson("storekeeper");
  storekeeper = await signIn(
    storekeeperPerson.email,
    storekeeperPerson.password,
  );
  store = await createLocation(uniqueCode("BK"));
});
afterAll(async () => {
  await closeTestDatabase();
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(inject("databaseUrl")),
  );
  await connection.query(`DROP DATABASE IF EXISTS \`${restoredName()}\``);
  await connection.end();
  fs.rmSync(backupFolder, { recursive: true, force: true });
});

/** Runs a project script (tsx) with DATABASE_URL set to the test database; resolves with its exit code and output. */
function runScript(
  script: string,
  args: string[],
): Promise<{ code: number | null; output: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(
      path.join(projectRoot, "node_modules", ".bin", "tsx"),
      [path.join(projectRoot, "scripts", script), ...args],
      {
        cwd: projectRoot,
        env: {
          ...process.env,
          DATABASE_URL: inject("databaseUrl"),
          BACKUP_DIR: backupFolder,
        },
      },
    );
    let output = "";
    child.stdout.on("data", (chunk: Buffer) => (output += chunk));
    child.stderr.on("data", (chunk: Buffer) => (output += chunk));
    child.once("error", reject);
    child.once("exit", (code) => resolve({ code, output }));
  });
}

async function backUp(): Promise<string> {
  const run = await runScript("db-backup.ts", []);
  expect(run.code, run.output).toBe(0);
  const file = /backup written: (\S+)/.exec(run.output)?.[1];
  expect(file, run.output).toBeTruthy();
  return file!;
}

/**
 * CHECKSUM TABLE of every base table of a database, by table name. A table
 * with a nullable STORED generated column (stock_alerts.open_item_id) gets
 * the SHA-256 of its rows instead: on MariaDB 10.11 its CHECKSUM TABLE was
 * seen to differ between two copies holding the same rows (a NULL written by
 * an UPDATE and the same NULL written by an INSERT), so it cannot be compared.
 */
async function tableChecksums(
  databaseUrl: string,
): Promise<Record<string, string>> {
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(databaseUrl),
  );
  try {
    const [tables] = await connection.query(
      "SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME",
    );
    const [generated] = await connection.query(
      "SELECT DISTINCT TABLE_NAME AS name FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND EXTRA = 'STORED GENERATED' AND IS_NULLABLE = 'YES'",
    );
    const byRows = new Set(
      (generated as { name: string }[]).map((t) => t.name),
    );
    const checksums: Record<string, string> = {};
    for (const { name } of tables as { name: string }[]) {
      if (byRows.has(name)) {
        const [rows] = await connection.query(
          `SELECT * FROM \`${name}\` ORDER BY 1`,
        );
        checksums[name] =
          `rows sha256 ${createHash("sha256").update(JSON.stringify(rows)).digest("hex")}`;
        continue;
      }
      const [rows] = await connection.query(`CHECKSUM TABLE \`${name}\``);
      checksums[name] = String(
        (rows as { Checksum: number | string | null }[])[0]!.Checksum,
      );
    }
    return checksums;
  } finally {
    await connection.end();
  }
}

/**
 * Backs up, with the checksums taken right before; taken again right after,
 * and the backup made again when the app wrote in between (work it finishes
 * after answering, such as alerts), so the checksums are the backup's.
 */
async function backUpWithChecksums(): Promise<{
  file: string;
  atBackup: Record<string, string>;
}> {
  for (let attempt = 1; ; attempt++) {
    const atBackup = await tableChecksums(inject("databaseUrl"));
    const file = await backUp();
    const after = await tableChecksums(inject("databaseUrl"));
    if (JSON.stringify(after) === JSON.stringify(atBackup) || attempt === 5)
      return { file, atBackup };
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
}

async function createMagnet(): Promise<string> {
  const sku = uniqueCode("BKM");
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "magnet",
      sku,
      name: "N42SH block for the restore drill",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      coating: "NiCuNi",
      magnetisation: "through 5 mm",
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

async function receive(sku: string, lot: string, quantity: number) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    { type: "receipt", sku, lot, location: store, quantity, unitCost: 2.5 },
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

/** Starts the built server against another database; resolves once /healthz answers. */
async function startServerOn(databaseUrl: string, port: number) {
  const child = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    env: {
      ...process.env,
      NODE_ENV: "production",
      HOST: "127.0.0.1",
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      SMTP_URL: inject("smtpUrl"),
      APP_URL: `http://127.0.0.1:${port}`,
      DEMO_DATA: "1",
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout.on("data", (chunk: Buffer) => (output += chunk));
  child.stderr.on("data", (chunk: Buffer) => (output += chunk));
  const exited = new Promise((resolve) => child.once("exit", resolve));
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null) return;
    child.kill("SIGTERM");
    await exited;
  };
  const started = Date.now();
  while (Date.now() - started < 30_000 && child.exitCode === null) {
    const health = await fetch(`http://127.0.0.1:${port}/healthz`).catch(
      () => null,
    );
    if (health?.ok) return { stop };
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  await stop();
  throw new Error(`the server did not start:\n${output}`);
}

describe("the restore drill", () => {
  it("restores every table as it was at backup time, and the app serves from it", async () => {
    const sku = await createMagnet();
    await receive(sku, "BEFORE-1", 5);
    await receive(sku, "BEFORE-2", 3);

    const { file, atBackup } = await backUpWithChecksums();
    expect(fs.readFileSync(`${file}.sha256`, "utf8")).toMatch(
      new RegExp(`^[0-9a-f]{64}  ${path.basename(file)}\\n$`),
    );

    await receive(sku, "AFTER-1", 7);
    expect(await tableChecksums(inject("databaseUrl"))).not.toEqual(atBackup);

    const restore = await runScript("db-restore.ts", [
      file,
      "--into-name",
      restoredName(),
    ]);
    expect(restore.code, restore.output).toBe(0);
    expect(restore.output).toContain("checksum of");
    expect(restore.output).toContain("migrations are this version's");

    const restoredUrl = urlForDatabase(inject("databaseUrl"), restoredName());
    const restored = await tableChecksums(restoredUrl);
    expect(Object.keys(restored).length).toBeGreaterThan(20);
    expect(restored).toEqual(atBackup);

    const port = restoredPort();
    const server = await startServerOn(restoredUrl, port);
    try {
      const origin = `http://127.0.0.1:${port}`;
      const signedIn = await fetch(`${origin}/api/v1/sessions`, {
        method: "POST",
        headers: { "Content-Type": "application/json", Origin: origin },
        body: JSON.stringify({
          email: storekeeperPerson.email,
          password: storekeeperPerson.password,
        }),
      });
      expect(signedIn.status).toBe(200);
      const journal = await fetch(
        `${origin}/api/v1/stock-movements?sku=${sku}`,
        { headers: { Cookie: sessionCookieFrom(signedIn)! } },
      );
      expect(journal.status).toBe(200);
      const { movements } = (await journal.json()) as {
        movements: { lot: string | null; quantity: number }[];
      };
      const lots = JSON.stringify(movements);
      expect(lots).toContain("BEFORE-1");
      expect(lots).toContain("BEFORE-2");
      expect(lots).not.toContain("AFTER-1");
      expect(movements).toHaveLength(2);
    } finally {
      await server.stop();
    }
  });

  it("refuses to restore into a database that is not empty, unless told", async () => {
    const file = await backUp();
    const refused = await runScript("db-restore.ts", [
      file,
      "--into-name",
      testDatabaseName(),
    ]);
    expect(refused.code).toBe(1);
    expect(refused.output).toContain(
      `The database ${testDatabaseName()} is not empty`,
    );
    expect(refused.output).toContain("--force");
    // The test app still serves from its database, untouched.
    const me = await fetch(`${inject("baseUrl")}/api/v1/me`, {
      headers: { Cookie: storekeeper },
    });
    expect(me.status).toBe(200);
  });

  it("refuses a backup that does not match its checksum file, and restores nothing", async () => {
    const file = await backUp();
    const damaged = path.join(backupFolder, `damaged-${path.basename(file)}`);
    const bytes = fs.readFileSync(file);
    bytes[bytes.length - 20] = bytes[bytes.length - 20]! ^ 0xff;
    fs.writeFileSync(damaged, bytes);
    fs.copyFileSync(`${file}.sha256`, `${damaged}.sha256`);
    const name = `${testDatabaseName()}_damaged`;
    const refused = await runScript("db-restore.ts", [
      damaged,
      "--into-name",
      name,
    ]);
    expect(refused.code).toBe(1);
    expect(refused.output).toContain("does not match its checksum file");
    const connection = await mysql.createConnection(
      poolOptionsFromUrl(inject("databaseUrl")),
    );
    const [rows] = await connection.query(
      "SELECT COUNT(*) AS n FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ?",
      [name],
    );
    await connection.end();
    expect(Number((rows as { n: number }[])[0]!.n)).toBe(0);
  });
});
