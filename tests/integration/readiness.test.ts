/**
 * /readyz, the readiness check a load balancer asks: 200 while the server
 * should get requests; 503 with Retry-After, naming the failed check, while
 * the outbox is stuck, the database's migrations are not this build's, or the
 * database does not answer (a second app server behind a TCP relay that is
 * cut, so the shared test server is untouched). /healthz, the liveness check,
 * stays 200 through the first two. Stopping is tested in graceful-stop.test.ts.
 */
import { randomBytes } from "node:crypto";
import mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { startAppServer } from "../../scripts/lib/test-environment";
import { baseUrl, get } from "../support/app-client";
import { DatabaseRelay } from "../support/database-relay";
import { closeTestDatabase, testDatabase } from "../support/test-database";

afterAll(closeTestDatabase);

const minutesAgo = (minutes: number) => new Date(Date.now() - minutes * 60_000);

/** Puts a message in the outbox queued `minutes` ago; removes it when `work` is done. */
async function withOutboxMessage(
  message: { minutes: number; attempts?: number; sent?: boolean },
  work: (address: string) => Promise<void>,
): Promise<void> {
  const address = `readiness-${randomBytes(4).toString("hex")}@turnledger.test`;
  const [inserted] = await testDatabase().query(
    "INSERT INTO mail_outbox (to_address, subject, text_body, created_at, sent_at, attempts, last_error) VALUES (?, 'Low stock', 'Three items are low.', ?, ?, ?, 'connect ECONNREFUSED 10.20.30.40:25')",
    [
      address,
      minutesAgo(message.minutes),
      message.sent ? minutesAgo(message.minutes - 1) : null,
      message.attempts ?? 3,
    ],
  );
  try {
    await work(address);
  } finally {
    await testDatabase().query("DELETE FROM mail_outbox WHERE id = ?", [
      (inserted as { insertId: number }).insertId,
    ]);
  }
}

async function readiness(path = "/readyz", at = baseUrl()) {
  const response = await fetch(`${at}${path}`);
  const text = await response.text();
  return {
    status: response.status,
    retryAfter: response.headers.get("Retry-After"),
    cacheControl: response.headers.get("Cache-Control"),
    text,
    body: JSON.parse(text) as {
      status: string;
      failed?: string[];
      checks: Record<string, Record<string, unknown>>;
    },
  };
}

describe("/readyz on a healthy server", () => {
  it("answers 200 ready, with every check and nothing secret", async () => {
    const answer = await readiness();
    expect(answer.status).toBe(200);
    expect(answer.cacheControl).toBe("no-store");
    expect(answer.retryAfter).toBeNull();
    expect(answer.body).toMatchObject({
      status: "ready",
      checks: {
        server: { ok: true, state: "running" },
        database: { ok: true, state: "up" },
        migrations: { ok: true, state: "current" },
        outbox: { ok: true, state: "flowing", maxAgeMinutes: 30 },
      },
    });
    expect(answer.body.failed).toBeUndefined();
  });
});

describe("/readyz and the outbox", () => {
  it("answers 503 naming the outbox once the oldest unsent e-mail has waited past 30 minutes, and 200 when it has gone", async () => {
    await withOutboxMessage({ minutes: 45 }, async (address) => {
      const stuck = await readiness();
      expect(stuck.status).toBe(503);
      expect(stuck.retryAfter).toBe("5");
      expect(stuck.cacheControl).toBe("no-store");
      expect(stuck.body).toEqual({
        status: "not ready",
        failed: ["outbox"],
        checks: {
          server: { ok: true, state: "running" },
          database: { ok: true, state: "up" },
          migrations: { ok: true, state: "current" },
          outbox: {
            ok: false,
            state: "stuck",
            oldestUnsentMinutes: 45,
            maxAgeMinutes: 30,
          },
        },
      });
      // Minutes, not messages: no address, subject or SMTP error.
      for (const secret of [address, "Low stock", "10.20.30.40"])
        expect(stuck.text).not.toContain(secret);
      // Liveness is another question: the process is fine.
      expect((await get("/healthz")).status).toBe(200);
    });
    expect((await readiness()).status).toBe(200);
  });

  it("stays ready for an e-mail waiting less than the limit", async () => {
    await withOutboxMessage({ minutes: 20 }, async () => {
      const answer = await readiness();
      expect(answer.status).toBe(200);
      expect(answer.body.checks.outbox).toMatchObject({
        state: "flowing",
        oldestUnsentMinutes: 20,
      });
    });
  });

  it("counts neither sent e-mail nor e-mail the retry has given up on (50 attempts)", async () => {
    await withOutboxMessage({ minutes: 600, sent: true }, async () => {
      await withOutboxMessage({ minutes: 600, attempts: 50 }, async () => {
        expect((await readiness()).status).toBe(200);
      });
    });
  });
});

describe("/readyz and the migrations", () => {
  it("answers 503 naming the migrations while the database lacks one of this build's, and 200 once it has it again", async () => {
    const [rows] = await testDatabase().query(
      "SELECT id, hash, created_at AS createdAt FROM __drizzle_migrations ORDER BY created_at DESC, id DESC LIMIT 1",
    );
    const newest = (
      rows as { id: number; hash: string; createdAt: number | string }[]
    )[0]!;
    await testDatabase().query(
      "DELETE FROM __drizzle_migrations WHERE id = ?",
      [newest.id],
    );
    try {
      const behind = await readiness();
      expect(behind.status).toBe(503);
      expect(behind.retryAfter).toBe("5");
      expect(behind.body.failed).toEqual(["migrations"]);
      expect(behind.body.checks.migrations).toEqual({
        ok: false,
        state: "behind",
      });
      expect(behind.text).not.toContain(newest.hash);
    } finally {
      await testDatabase().query(
        "INSERT INTO __drizzle_migrations (id, hash, created_at) VALUES (?, ?, ?)",
        [newest.id, newest.hash, newest.createdAt],
      );
    }
    expect((await readiness()).status).toBe(200);
  });

  it("stays ready, saying so, while a newer version's migration is in the database (an upgrade under way)", async () => {
    const [rows] = await testDatabase().query(
      "SELECT MAX(created_at) AS latest FROM __drizzle_migrations",
    );
    const latest = Number((rows as { latest: number | string }[])[0]!.latest);
    const hash = `readiness-test-${randomBytes(6).toString("hex")}`;
    await testDatabase().query(
      "INSERT INTO __drizzle_migrations (hash, created_at) VALUES (?, ?)",
      [hash, latest + 1],
    );
    try {
      const ahead = await readiness();
      expect(ahead.status, ahead.text).toBe(200);
      expect(ahead.body.checks.migrations).toEqual({
        ok: true,
        state: "ahead",
      });
      expect(ahead.text).not.toContain(hash);
    } finally {
      await testDatabase().query(
        "DELETE FROM __drizzle_migrations WHERE hash = ?",
        [hash],
      );
    }
    expect((await readiness()).body.checks.migrations).toEqual({
      ok: true,
      state: "current",
    });
  });
});

describe("/readyz when the database does not answer", () => {
  // Ports follow the run's own TEST_PORT (DEVELOPERS.md).
  const testPort = Number(process.env.TEST_PORT ?? 3100);
  const { relay, relayedUrl } = DatabaseRelay.to(
    inject("databaseUrl"),
    testPort + 97,
  );
  let app: { baseUrl: string; stop(): Promise<void> } | undefined;

  beforeAll(async () => {
    await relay.up();
    app = await startAppServer({
      port: testPort + 6,
      databaseUrl: relayedUrl,
      smtpUrl: inject("smtpUrl"),
    });
  });
  afterAll(async () => {
    await app?.stop();
    await relay.down();
  });

  it("answers 503 naming the database alone, with no host or driver message, and 200 once it is back", async () => {
    expect((await readiness("/readyz", app!.baseUrl)).status).toBe(200);
    await relay.down();
    const down = await readiness("/readyz", app!.baseUrl);
    expect(down.status).toBe(503);
    expect(down.retryAfter).toBe("5");
    expect(down.body).toEqual({
      status: "not ready",
      failed: ["database"],
      checks: {
        server: { ok: true, state: "running" },
        database: { ok: false, state: "down" },
        migrations: { ok: false, state: "not checked" },
        outbox: { ok: false, state: "not checked", maxAgeMinutes: 30 },
      },
    });
    const databaseUrl = new URL(relayedUrl);
    for (const secret of [
      databaseUrl.hostname,
      String(relay.port),
      databaseUrl.pathname.slice(1),
      "ECONNREFUSED",
    ])
      expect(down.text).not.toContain(secret);

    await relay.up();
    await expect
      .poll(async () => (await readiness("/readyz", app!.baseUrl)).status)
      .toBe(200);
  });
});

describe("the outbox backlog query", () => {
  it("reads only the unsent rows, through mail_outbox_unsent_idx, among years of sent mail", async () => {
    // A scratch copy of the table with 20,000 sent messages and 3 unsent
    // ones, so the plan is the one a shop's outbox gets (on a table of a few
    // rows MariaDB rightly reads them all).
    const testDatabaseName = new URL(inject("databaseUrl")).pathname.slice(1);
    const scratch = `${testDatabaseName}_outbox_plan`;
    const url = new URL(inject("databaseUrl"));
    url.pathname = `/${scratch}`;
    await testDatabase().query(`DROP DATABASE IF EXISTS \`${scratch}\``);
    await testDatabase().query(`CREATE DATABASE \`${scratch}\``);
    const connection = await mysql.createConnection(
      poolOptionsFromUrl(url.toString()),
    );
    process.env.DATABASE_URL = inject("databaseUrl");
    const { outboxBacklogQuery } = await import("~/mail/outbox-backlog.server");
    const { pool } = await import("~/db/client.server");
    try {
      await connection.query(
        `CREATE TABLE mail_outbox LIKE \`${testDatabaseName}\`.mail_outbox`,
      );
      await connection.query(
        `INSERT INTO mail_outbox (to_address, subject, text_body, created_at, sent_at, attempts)
         SELECT CONCAT('person', seq, '@turnledger.test'), 'Low stock', 'Text',
                NOW(3) - INTERVAL seq MINUTE, IF(seq <= 3, NULL, NOW(3) - INTERVAL seq MINUTE + INTERVAL 1 SECOND), 1
           FROM seq_1_to_20003`,
      );
      await connection.query("ANALYZE TABLE mail_outbox");
      const { sql, params } = outboxBacklogQuery().toSQL();
      const [plan] = await connection.query(`EXPLAIN ${sql}`, params);
      expect(plan).toEqual([
        expect.objectContaining({
          table: "mail_outbox",
          key: "mail_outbox_unsent_idx",
        }),
      ]);
      expect(
        Number((plan as { rows: number | string }[])[0]!.rows),
      ).toBeLessThan(100);
      const [[backlog]] = (await connection.query(sql, params)) as unknown as [
        Record<string, unknown>[],
      ];
      expect(Object.values(backlog!)[0]).toBe(3);
    } finally {
      await connection.end();
      await pool.end();
      await testDatabase().query(`DROP DATABASE IF EXISTS \`${scratch}\``);
    }
  });
});
