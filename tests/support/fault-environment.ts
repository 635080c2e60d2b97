/**
 * What the fault tests start beside the shared test environment: a second
 * private MariaDB they may stop, kill and start again, app servers on ports of
 * their own, and a plain HTTP client for any of those servers. The shared
 * MariaDB (DB_PORT, 3307) and the shared app are never stopped here.
 *
 * Ports follow the run's own (TEST_PORT, TEST_MAIL_SMTP_PORT), so a second run
 * beside another one gets different ones too:
 * - the fault MariaDB: TEST_FAULT_DB_PORT, else 3317 + (TEST_PORT − 3100),
 *   its data in .data/mariadb-faults-<port>/;
 * - app servers: TEST_PORT + 20 … + 23;
 * - an SMTP fake of their own: TEST_MAIL_SMTP_PORT + 20 (SMTP) and + 21 (HTTP).
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import {
  migrateDatabase,
  seedWhenEmpty,
} from "../../scripts/lib/database-tasks";
import {
  connectAsRoot,
  ensureLocalMariadb,
  mariadbInstance,
  mariadbServerPid,
  recreateDatabase,
  stopLocalMariadb,
  type MariadbInstance,
} from "../../scripts/lib/local-mariadb";

const testPort = Number(process.env.TEST_PORT ?? 3100);
const mailPort = Number(process.env.TEST_MAIL_SMTP_PORT ?? 2535);

export const faultPorts = {
  database: Number(process.env.TEST_FAULT_DB_PORT ?? 3317 + (testPort - 3100)),
  apps: [testPort + 20, testPort + 21, testPort + 22, testPort + 23] as const,
  mailSmtp: mailPort + 20,
  mailHttp: mailPort + 21,
};

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * The fault tests' own MariaDB, initialised afresh for each test file (so no
 * earlier crash's recovery carries over), with a migrated and seeded database
 * (the demo people and store, as in the shared test database).
 */
export class FaultMariadb {
  private constructor(
    readonly instance: MariadbInstance,
    readonly databaseName: string,
    readonly databaseUrl: string,
  ) {}

  /** `smtpUrl`: where the seed's low-stock mail goes (it would warn about a refused connection otherwise). */
  static async start(options: { smtpUrl: string }): Promise<FaultMariadb> {
    const instance = mariadbInstance({
      name: `mariadb-faults-${faultPorts.database}`,
      port: faultPorts.database,
    });
    const databaseName = "turnledger_test_faults";
    await stopLocalMariadb(instance); // left running by a run that was cut short
    fs.rmSync(instance.dataDir, { recursive: true, force: true });
    fs.rmSync(instance.credentialsFile, { force: true });
    const { urlFor } = await ensureLocalMariadb({
      instance,
      databases: [databaseName],
    });
    await recreateDatabase(databaseName, instance);
    const databaseUrl = urlFor(databaseName);
    await migrateDatabase(databaseUrl);
    const smtpUrl = process.env.SMTP_URL;
    process.env.SMTP_URL = options.smtpUrl;
    try {
      await seedWhenEmpty(databaseUrl, { quiet: true });
    } finally {
      if (smtpUrl === undefined) delete process.env.SMTP_URL;
      else process.env.SMTP_URL = smtpUrl;
    }
    return new FaultMariadb(instance, databaseName, databaseUrl);
  }

  get port(): number {
    return this.instance.port;
  }

  running(): boolean {
    return mariadbServerPid(this.instance) !== null;
  }

  /** Starts the server again (after `shutdown` or `kill`); InnoDB recovers what it must. */
  async restart(): Promise<void> {
    await ensureLocalMariadb({
      instance: this.instance,
      databases: [this.databaseName],
    });
  }

  /** A clean stop: SHUTDOWN as root; waits until the process has gone. */
  async shutdown(): Promise<void> {
    await stopLocalMariadb(this.instance);
  }

  /** A crash: SIGKILL to mariadbd; waits until the process has gone. */
  async kill(): Promise<void> {
    const pid = mariadbServerPid(this.instance);
    if (!pid) return;
    process.kill(pid, "SIGKILL");
    const started = Date.now();
    while (Date.now() - started < 20_000) {
      try {
        process.kill(pid, 0);
      } catch {
        return;
      }
      await sleep(20);
    }
    throw new Error(`mariadbd ${pid} still runs 20 s after SIGKILL`);
  }

  /** A root connection, e.g. to watch information_schema.innodb_trx. */
  root(): Promise<mysql.Connection> {
    return connectAsRoot(this.instance);
  }

  /** A connection of the application's user to the fault database. */
  connect(): Promise<mysql.Connection> {
    return mysql.createConnection(poolOptionsFromUrl(this.databaseUrl));
  }

  /** Runs one query on a connection of its own (so a restart never leaves a stale one). */
  async query<Row>(sql: string, values: unknown[] = []): Promise<Row[]> {
    const connection = await this.connect();
    try {
      const [rows] = await connection.query(sql, values);
      return rows as Row[];
    } finally {
      await connection.end();
    }
  }

  /** Runs one INSERT; the new row's id. */
  async insert(sql: string, values: unknown[] = []): Promise<number> {
    const result = (await this.query(sql, values)) as unknown as {
      insertId: number;
    };
    return result.insertId;
  }

  async count(sql: string, values: unknown[] = []): Promise<number> {
    const [row] = await this.query<{ n: number | string }>(sql, values);
    return Number(row?.n ?? 0);
  }
}

/**
 * Waits until MariaDB shows another session's open transaction that has
 * changed at least `rowsModified` rows (and, with `lockWait`, now waits for a
 * lock): the moment to stop the server "during" that transaction. Fails when
 * `done()` turns true first (the request finished before that moment) or after
 * `timeoutMs`. InnoDB refreshes information_schema.innodb_trx only when it was
 * not read for 0.1 s, so this looks every 0.15 s and sees only transactions
 * that last longer than that.
 */
export async function waitForTransaction(
  root: mysql.Connection,
  wanted: { rowsModified: number; lockWait?: boolean },
  done: () => boolean,
  timeoutMs = 60_000,
): Promise<{ rowsModified: number; state: string }> {
  const started = Date.now();
  while (Date.now() - started < timeoutMs) {
    if (done())
      throw new Error(
        `the request finished before a transaction had changed ${wanted.rowsModified} rows${wanted.lockWait ? " and waited for a lock" : ""}`,
      );
    const [rows] = await root.query(
      "SELECT trx_rows_modified AS rowsModified, trx_state AS state FROM information_schema.innodb_trx WHERE trx_mysql_thread_id <> CONNECTION_ID()",
    );
    const found = (rows as { rowsModified: number | string; state: string }[])
      .map((row) => ({
        rowsModified: Number(row.rowsModified),
        state: row.state,
      }))
      .find(
        (row) =>
          row.rowsModified >= wanted.rowsModified &&
          (!wanted.lockWait || row.state === "LOCK WAIT"),
      );
    if (found) return found;
    await sleep(150);
  }
  throw new Error(
    `no transaction changed ${wanted.rowsModified} rows within ${timeoutMs} ms`,
  );
}

/** Talking to one app server over HTTP, as a browser or script would. */
export class AppClient {
  constructor(readonly baseUrl: string) {}

  get(path: string, cookie?: string): Promise<Response> {
    return fetch(`${this.baseUrl}${path}`, {
      redirect: "manual",
      headers: cookie ? { Cookie: cookie } : {},
    });
  }

  send(
    method: string,
    path: string,
    payload: unknown,
    cookie?: string,
  ): Promise<Response> {
    return fetch(`${this.baseUrl}${path}`, {
      method,
      redirect: "manual",
      headers: {
        "Content-Type": "application/json",
        Origin: this.baseUrl,
        ...(cookie ? { Cookie: cookie } : {}),
      },
      body: payload === undefined ? undefined : JSON.stringify(payload),
    });
  }

  /** Posts an HTML form the way a browser without JavaScript does. */
  postForm(
    path: string,
    fields: Record<string, string>,
    cookie?: string,
  ): Promise<Response> {
    return fetch(`${this.baseUrl}${path}`, {
      method: "POST",
      redirect: "manual",
      headers: {
        "Content-Type": "application/x-www-form-urlencoded",
        Origin: this.baseUrl,
        ...(cookie ? { Cookie: cookie } : {}),
      },
      body: new URLSearchParams(fields),
    });
  }

  /** Signs in through the API; the session cookie's name=value. */
  async signIn(email: string, password: string): Promise<string> {
    const response = await this.send("POST", "/api/v1/sessions", {
      email,
      password,
    });
    const cookie = response.headers
      .getSetCookie()
      .map((header) => header.split(";")[0]!)
      .find((pair) => pair.startsWith("turnledger_session="));
    if (response.status !== 200 || !cookie)
      throw new Error(
        `sign-in as ${email} at ${this.baseUrl} failed: ${response.status} ${await response.text()}`,
      );
    return cookie;
  }

  /** POST /api/v1/price-lists with a CSV of the bench's columns (see priceListCsv). */
  uploadPriceList(
    cookie: string,
    input: { supplier: string; fileName: string; csv: string },
  ): Promise<Response> {
    const form = new FormData();
    form.set("file", new Blob([input.csv]), input.fileName);
    form.set("supplier", input.supplier);
    form.set(
      "mapping",
      JSON.stringify({
        supplierSku: "Art. no",
        description: "Description",
        kind: "Kind",
        unit: "Unit",
        price: "Price",
        currency: "Currency",
        minQuantity: "Min qty",
        validFrom: "Valid from",
      }),
    );
    return fetch(`${this.baseUrl}/api/v1/price-lists`, {
      method: "POST",
      headers: { Cookie: cookie, Origin: this.baseUrl },
      body: form,
    });
  }
}

/**
 * A generated price list of plain parts (as bench/price-import.bench.ts makes):
 * `rows` lines, four price breaks per part, every part new to the catalogue.
 */
export function priceListCsv(rows: number, prefix: string): string {
  const lines = [
    "Art. no,Description,Kind,Unit,Price,Currency,Min qty,Valid from",
  ];
  for (let index = 0; index < rows; index += 1) {
    const breakQuantity = [1, 10, 100, 1000][index % 4];
    const part = Math.floor(index / 4);
    lines.push(
      `${prefix}-${String(part).padStart(6, "0")},Fault part ${part},part,pcs,${(1 + (index % 997) / 100).toFixed(2)},EUR,${breakQuantity},2026-11-01`,
    );
  }
  return `${lines.join("\n")}\n`;
}

/** A short random suffix for names, SKUs and location codes. */
export function faultCode(prefix: string): string {
  return `${prefix}-${randomBytes(4).toString("hex").toUpperCase()}`;
}

/** Runs every clean-up step, even when one fails; throws the first failure afterwards. */
export async function cleanUp(
  ...steps: (() => Promise<unknown> | undefined)[]
): Promise<void> {
  let first: unknown;
  for (const step of steps) {
    try {
      await step();
    } catch (error) {
      first ??= error;
    }
  }
  if (first) throw first;
}
