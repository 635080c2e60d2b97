/**
 * Stopping gracefully: a built server (server.js, as deployed) gets SIGTERM
 * while a large price list is being committed, in one transaction, and
 *
 * - with time to finish (SHUTDOWN_GRACE_MS): the commit request gets its 201,
 *   the price list is committed whole, the process exits 0, and a request
 *   that arrives after the signal is refused;
 * - with no time (SHUTDOWN_GRACE_MS=0): the request's connection is closed,
 *   the process exits 0 all the same, and the price list is in the database
 *   whole or not at all — never in part.
 *
 * The signal is sent once MariaDB shows the import's transaction open and
 * writing (information_schema.innodb_trx, in this test's database only). The
 * server runs on a database of its own (`<TEST_DATABASE_NAME>_stop`, migrated,
 * with one buyer), so the 50,000-odd parts these imports create never reach
 * the catalogue the other tests read.
 */
import { hash } from "@node-rs/argon2";
import { spawn } from "node:child_process";
import net from "node:net";
import path from "node:path";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { appServerArguments } from "../../scripts/lib/app-server-process";
import { migrateDatabase } from "../../scripts/lib/database-tasks";
import { connectAsRoot } from "../../scripts/lib/local-mariadb";
import { urlForDatabase } from "../../scripts/lib/mariadb-client-login";
import { poolOptionsFromUrl } from "~/db/connection-options";
import {
  AppClient,
  faultCode,
  priceListCsv,
} from "../support/fault-environment";
import { closeTestDatabase, testDatabase } from "../support/test-database";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");
// Ports follow the run's own TEST_PORT (DEVELOPERS.md).
const serverPort = Number(process.env.TEST_PORT ?? 3100) + 5;
const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

const stopDatabase = `${new URL(inject("databaseUrl")).pathname.slice(1)}_stop`;
const stopDatabaseUrl = urlForDatabase(inject("databaseUrl"), stopDatabase);
const buyer = {
  email: "stopping-buyer@turnledger.test",
  password: "a long buyer password 7",
};

let root: mysql.Connection;
let database: mysql.Pool;

beforeAll(async () => {
  root = await connectAsRoot();
  await testDatabase().query(`DROP DATABASE IF EXISTS \`${stopDatabase}\``);
  await testDatabase().query(`CREATE DATABASE \`${stopDatabase}\``);
  await migrateDatabase(stopDatabaseUrl, { log: () => undefined });
  database = mysql.createPool({
    ...poolOptionsFromUrl(stopDatabaseUrl),
    connectionLimit: 2,
  });
  await database.query(
    "INSERT INTO users (id, email, name, password_hash, active, created_at) VALUES ('stopping-buyer', ?, 'Stopping Buyer', ?, 1, NOW(3))",
    [buyer.email, await hash(buyer.password)],
  );
  await database.query(
    "INSERT INTO user_roles (user_id, role) VALUES ('stopping-buyer', 'buyer')",
  );
});
afterAll(async () => {
  await database?.end();
  await testDatabase().query(`DROP DATABASE IF EXISTS \`${stopDatabase}\``);
  await closeTestDatabase();
  await root?.end();
});

/** server.js with the built app on its own port; `exited` resolves with its exit code and output. */
async function startServer(env: NodeJS.ProcessEnv) {
  const baseUrl = `http://localhost:${serverPort}`;
  const child = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    env: {
      ...process.env,
      NODE_ENV: "production",
      HOST: "127.0.0.1",
      PORT: String(serverPort),
      APP_URL: baseUrl,
      DATABASE_URL: stopDatabaseUrl,
      SMTP_URL: inject("smtpUrl"),
      DEMO_DATA: undefined,
      ...env,
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  let output = "";
  child.stdout.on("data", (chunk: Buffer) => (output += chunk));
  child.stderr.on("data", (chunk: Buffer) => (output += chunk));
  const exited = new Promise<{ code: number | null; output: string }>(
    (resolve) => child.once("exit", (code) => resolve({ code, output })),
  );
  const started = Date.now();
  for (;;) {
    if (child.exitCode !== null)
      throw new Error(`the server exited at start:\n${output}`);
    if (Date.now() - started > 30_000)
      throw new Error(`the server did not answer within 30 s:\n${output}`);
    try {
      if ((await fetch(`${baseUrl}/healthz`)).ok) break;
    } catch {
      // not listening yet
    }
    await sleep(100);
  }
  return {
    client: new AppClient(baseUrl),
    exited,
    output: () => output,
    signal(name: NodeJS.Signals) {
      child.kill(name);
    },
    kill() {
      if (child.exitCode === null && child.signalCode === null)
        child.kill("SIGKILL");
    },
  };
}

/**
 * Waits until a session on this run's database has an open transaction that
 * has written at least `rowsModified` rows; fails if `done()` turns true first.
 */
async function waitForImportTransaction(
  rowsModified: number,
  done: () => boolean,
): Promise<number> {
  const started = Date.now();
  while (Date.now() - started < 60_000) {
    if (done())
      throw new Error(
        `the commit finished before its transaction had written ${rowsModified} rows: make the price list longer`,
      );
    const [rows] = await root.query(
      `SELECT t.trx_rows_modified AS rowsModified
         FROM information_schema.innodb_trx t
         JOIN information_schema.processlist p ON p.id = t.trx_mysql_thread_id
        WHERE p.db = ? AND t.trx_rows_modified >= ?`,
      [stopDatabase, rowsModified],
    );
    const found = (rows as { rowsModified: number | string }[])[0];
    if (found) return Number(found.rowsModified);
    // InnoDB refreshes innodb_trx when it was not read for 0.1 s.
    await sleep(150);
  }
  throw new Error(`no transaction wrote ${rowsModified} rows within 60 s`);
}

/** What the database holds of the supplier's price list: its import rows and price lines. */
async function storedImport(supplierId: number) {
  const [imports] = await database.query(
    "SELECT id, row_count AS rowCount FROM price_imports WHERE supplier_id = ?",
    [supplierId],
  );
  const [lines] = await database.query(
    "SELECT COUNT(*) AS n FROM price_lines WHERE supplier_id = ?",
    [supplierId],
  );
  return {
    imports: imports as { id: number; rowCount: number }[],
    priceLines: Number((lines as { n: number | string }[])[0]!.n),
  };
}

/** What a new connection to the stopping server gets: refused, or an HTTP status. */
function newConnectionAnswer(): Promise<"refused" | number> {
  return new Promise((resolve) => {
    const socket = net.connect(serverPort, "127.0.0.1");
    let received = "";
    socket.once("connect", () =>
      socket.write(
        `GET /readyz HTTP/1.1\r\nHost: localhost:${serverPort}\r\nConnection: close\r\n\r\n`,
      ),
    );
    socket.on("data", (chunk) => (received += chunk.toString()));
    socket.once("error", () => resolve("refused"));
    socket.once("close", () =>
      resolve(
        Number(received.match(/^HTTP\/1\.1 (\d{3})/)?.[1] ?? 0) || "refused",
      ),
    );
  });
}

/**
 * Signs in as the buyer, adds a supplier and starts committing a generated
 * price list of `rows` lines for it: the supplier's id, the answer to come
 * (its status and body, or why the request failed) and whether it has come.
 */
async function startCommit(client: AppClient, rows: number) {
  const cookie = await client.signIn(buyer.email, buyer.password);
  const name = faultCode("Stopping Supplier");
  const created = await client.send(
    "POST",
    "/api/v1/suppliers",
    { name, currency: "EUR" },
    cookie,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const [found] = await database.query(
    "SELECT id FROM suppliers WHERE name = ?",
    [name],
  );
  let answered = false;
  const answer: Promise<
    { status: number; body: { rows?: number } } | { failed: string }
  > = client
    .uploadPriceList(cookie, {
      supplier: name,
      fileName: `${name}.csv`,
      csv: priceListCsv(rows, faultCode("GS")),
    })
    .then(
      async (response) => ({
        status: response.status,
        body: (await response.json()) as { rows?: number },
      }),
      (error: unknown) => ({ failed: String(error) }),
    )
    .finally(() => (answered = true));
  return {
    supplierId: (found as { id: number }[])[0]!.id,
    answer,
    answered: () => answered,
  };
}

describe("SIGTERM during a price-list commit", () => {
  it("with time to finish: the commit gets its answer, the list is committed whole, new requests are refused, and the server exits 0", async () => {
    const rows = 60_000;
    const server = await startServer({ SHUTDOWN_GRACE_MS: "60000" });
    try {
      const started = Date.now();
      const { supplierId, answer, answered } = await startCommit(
        server.client,
        rows,
      );

      await waitForImportTransaction(2_000, answered);
      server.signal("SIGTERM");
      const signalledAfterMs = Date.now() - started;

      // Stopping: a new connection is refused (or answered 503), never served.
      await sleep(200);
      expect(answered()).toBe(false);
      const late = await newConnectionAnswer();
      expect(["refused", 503]).toContain(late);

      const committed = await answer;
      expect(committed).toEqual({
        status: 201,
        body: expect.objectContaining({ rows }),
      });
      const { code, output } = await server.exited;
      expect(code, output).toBe(0);
      expect(output).toMatch(/SIGTERM: stopping/);
      console.info(
        `graceful stop: SIGTERM ${signalledAfterMs} ms into the commit, which took ${Date.now() - started} ms in all`,
      );

      const stored = await storedImport(supplierId);
      expect(stored.imports).toEqual([
        { id: expect.any(Number), rowCount: rows },
      ]);
      expect(stored.priceLines).toBe(rows);
    } finally {
      server.kill();
    }
  });

  it("with no time: the connection is closed, the server exits 0, and the list is whole or absent, never partial", async () => {
    const rows = 60_000;
    const server = await startServer({ SHUTDOWN_GRACE_MS: "0" });
    try {
      const { supplierId, answer, answered } = await startCommit(
        server.client,
        rows,
      );
      const writtenAtSignal = await waitForImportTransaction(2_000, answered);
      server.signal("SIGTERM");

      expect(await answer).toHaveProperty("failed");
      const { code, output } = await server.exited;
      expect(code, output).toBe(0);
      expect(output).toMatch(/were cut off/);

      const stored = await storedImport(supplierId);
      const whole =
        stored.imports.length === 1 &&
        stored.imports[0]!.rowCount === rows &&
        stored.priceLines === rows;
      const absent = stored.imports.length === 0 && stored.priceLines === 0;
      console.info(
        `graceful stop with no grace: ${writtenAtSignal} rows written at the signal; the price list is ${whole ? "whole" : absent ? "absent" : "partial"}`,
      );
      expect(
        whole || absent,
        `the price list must be committed whole or not at all; found ${JSON.stringify(stored)} (${writtenAtSignal} rows written when the signal was sent)`,
      ).toBe(true);
      // No transaction of the stopped server is left open.
      await expect
        .poll(async () => {
          const [open] = await root.query(
            "SELECT COUNT(*) AS n FROM information_schema.innodb_trx t JOIN information_schema.processlist p ON p.id = t.trx_mysql_thread_id WHERE p.db = ?",
            [stopDatabase],
          );
          return Number((open as { n: number | string }[])[0]!.n);
        })
        .toBe(0);
    } finally {
      server.kill();
    }
  });

  it("a second signal a moment after the first stops the server at once", async () => {
    const server = await startServer({ SHUTDOWN_GRACE_MS: "60000" });
    try {
      const { supplierId, answer, answered } = await startCommit(
        server.client,
        100_000,
      );
      await waitForImportTransaction(2_000, answered);
      server.signal("SIGTERM");
      // Within half a second of the first stop's start a signal counts as the
      // same stop (Ctrl-C reaches the server from the terminal and from npm
      // start); after it, as a second one.
      await expect.poll(server.output).toMatch(/SIGTERM: stopping/);
      await sleep(800);
      expect(answered()).toBe(false);
      server.signal("SIGTERM");
      const { code, output } = await server.exited;
      expect(code, output).toBe(1);
      expect(output).toMatch(/SIGTERM again: stopping at once/);
      expect(await answer).toHaveProperty("failed");
      const stored = await storedImport(supplierId);
      expect(
        [0, 100_000],
        `whole or nothing, found ${JSON.stringify(stored)}`,
      ).toContain(stored.priceLines);
    } finally {
      server.kill();
    }
  });
});
