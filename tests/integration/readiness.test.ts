/**
 * /readyz, the readiness check a load balancer asks: 200 while the server
 * should get requests; 503 with Retry-After, naming the failed check, while
 * the outbox is stuck, the database's migrations are not this build's, or the
 * database does not answer (a second app server behind a TCP relay that is
 * cut, so the shared test server is untouched). /healthz, the liveness check,
 * stays 200 through the first two. Stopping is tested in graceful-stop.test.ts.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
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
  it("answers 503 naming the migrations while the database has one this build does not know (a newer version migrated it)", async () => {
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
      expect(ahead.status).toBe(503);
      expect(ahead.retryAfter).toBe("5");
      expect(ahead.body.failed).toEqual(["migrations"]);
      expect(ahead.body.checks.migrations).toEqual({
        ok: false,
        state: "ahead",
      });
      expect(ahead.text).not.toContain(hash);
    } finally {
      await testDatabase().query(
        "DELETE FROM __drizzle_migrations WHERE hash = ?",
        [hash],
      );
    }
    expect((await readiness()).status).toBe(200);
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
  it("reads the unsent rows through mail_outbox_unsent_idx", async () => {
    process.env.DATABASE_URL = inject("databaseUrl");
    const { outboxBacklogQuery } = await import("~/mail/outbox-backlog.server");
    const { pool } = await import("~/db/client.server");
    try {
      const { sql, params } = outboxBacklogQuery().toSQL();
      const [plan] = await testDatabase().query(`EXPLAIN ${sql}`, params);
      expect(plan).toEqual([
        expect.objectContaining({
          table: "mail_outbox",
          key: "mail_outbox_unsent_idx",
        }),
      ]);
    } finally {
      await pool.end();
    }
  });
});
