/**
 * GET /metrics (docs/decisions/025-metrics.md): the test app's figures move
 * with the requests it answers, the database's figures match the database,
 * and only loopback or METRICS_TOKEN may read them. The token is tried on a
 * second server (TEST_PORT + 78) listening on every interface, reached
 * through one of this machine's other addresses; without one that part is
 * skipped (app/observability/metrics-access.test.ts covers the decision).
 */
import { spawn, type ChildProcess } from "node:child_process";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, inject, it } from "vitest";
import { appServerArguments } from "../../scripts/lib/app-server-process";
import { baseUrl } from "../support/app-client";
import { rawRequest } from "../support/raw-http";
import { closeTestDatabase, testDatabase } from "../support/test-database";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");
const tokenServerPort = Number(process.env.TEST_PORT ?? 3100) + 78;
const metricsToken = "metrics-test-token-5b1e0c9a7d";

const noDatabaseServerPort = Number(process.env.TEST_PORT ?? 3100) + 79;
const relayPort = Number(process.env.TEST_PORT ?? 3100) + 74;

/** A TCP relay to the test MariaDB that can be cut: the server behind it loses its database. */
function databaseRelay(target: { host: string; port: number }) {
  const sockets = new Set<net.Socket>();
  const server = net.createServer((client) => {
    const upstream = net.connect(target);
    for (const socket of [client, upstream]) {
      sockets.add(socket);
      socket.on("close", () => sockets.delete(socket));
      socket.on("error", () => undefined);
    }
    client.pipe(upstream).pipe(client);
  });
  return {
    up: () =>
      new Promise<void>((resolve) =>
        server.listen(relayPort, "127.0.0.1", resolve),
      ),
    down: () =>
      new Promise<void>((resolve) => {
        for (const socket of sockets) socket.destroy();
        server.close(() => resolve());
      }),
  };
}
let relay: ReturnType<typeof databaseRelay> | undefined;

let tokenServer: ChildProcess | undefined;
let noDatabaseServer: ChildProcess | undefined;

async function stop(child: ChildProcess | undefined): Promise<void> {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((resolve) => child.once("exit", resolve));
  child.kill("SIGTERM");
  await exited;
}

afterAll(async () => {
  await stop(tokenServer);
  await stop(noDatabaseServer);
  await relay?.down().catch(() => undefined);
  await closeTestDatabase();
});

/** Starts the built server with `env`; resolves once it answers /healthz at all (up or down). */
async function startServer(
  port: number,
  env: NodeJS.ProcessEnv,
): Promise<ChildProcess> {
  const child = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "production",
      PORT: String(port),
      HOST: "127.0.0.1",
      DATABASE_URL: inject("databaseUrl"),
      SMTP_URL: inject("smtpUrl"),
      APP_URL: `http://localhost:${port}`,
      DEMO_DATA: "1",
      METRICS_TOKEN: undefined,
      TRUST_PROXY: undefined,
      ...env,
    },
  });
  const started = Date.now();
  for (;;) {
    if (child.exitCode !== null) throw new Error("the server exited");
    try {
      await fetch(`http://127.0.0.1:${port}/healthz`);
      return child;
    } catch {
      // not listening yet
    }
    if (Date.now() - started > 30_000)
      throw new Error("the server did not answer /healthz");
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}

async function readMetrics(
  base = baseUrl(),
  headers: Record<string, string> = {},
): Promise<string> {
  const response = await fetch(`${base}/metrics`, { headers });
  expect(response.status).toBe(200);
  expect(response.headers.get("Content-Type")).toMatch(
    /^text\/plain; version=0\.0\.4/,
  );
  return response.text();
}

/**
 * The value of one sample, or null when absent: `series` is written as
 * `name{a="1",b="2"}`; the labels may come in any order in the text.
 */
function sample(text: string, series: string): number | null {
  const key = (name: string, labels: string) =>
    `${name}{${(labels.match(/[a-z_]+="[^"]*"/g) ?? []).sort().join(",")}}`;
  const [, wantedName, wantedLabels = ""] = series.match(
    /^([a-z_:]+)(?:\{(.*)\})?$/,
  )!;
  const wanted = key(wantedName!, wantedLabels);
  for (const line of text.split("\n")) {
    const parsed = line.match(/^([a-z_:]+)(?:\{(.*)\})? (\S+)$/);
    if (parsed && key(parsed[1]!, parsed[2] ?? "") === wanted)
      return Number(parsed[3]);
  }
  return null;
}

const meSeries = (metric: string) =>
  `${metric}{route="routes/api.v1.me",method="GET",status="401"}`;

describe("GET /metrics", () => {
  it("counts requests by route id and status, and shows the pool, outbox and alert figures", async () => {
    const before = await readMetrics();
    const countBefore =
      sample(before, meSeries("turnledger_http_requests_total")) ?? 0;

    for (let i = 0; i < 3; i++) {
      const response = await fetch(`${baseUrl()}/api/v1/me`);
      expect(response.status).toBe(401);
      await response.text();
    }

    const after = await readMetrics();
    expect(sample(after, meSeries("turnledger_http_requests_total"))).toBe(
      countBefore + 3,
    );
    const bucketSeries = `turnledger_http_request_duration_seconds_bucket{le="+Inf",route="routes/api.v1.me",method="GET",status="401"}`;
    expect(sample(after, bucketSeries)).toBeGreaterThanOrEqual(3);
    expect(
      sample(after, meSeries("turnledger_http_request_duration_seconds_count")),
    ).toBe(countBefore + 3);

    // The pool: something in use or idle after answering requests.
    const inUse = sample(
      after,
      'turnledger_db_pool_connections{state="in_use"}',
    );
    const idle = sample(after, 'turnledger_db_pool_connections{state="idle"}');
    const waiting = sample(
      after,
      'turnledger_db_pool_connections{state="waiting"}',
    );
    expect(inUse).not.toBeNull();
    expect(waiting).not.toBeNull();
    expect(inUse! + idle!).toBeGreaterThan(0);

    // The database's figures, read at this scrape, against the database itself.
    expect(sample(after, "turnledger_database_figures_up")).toBe(1);
    const [[outbox]] = (await testDatabase().query(
      // deliveryAttemptsBeforeGivingUp (app/mail/outbox-backlog.server.ts) is 50.
      "SELECT COUNT(*) AS unsent FROM mail_outbox WHERE sent_at IS NULL AND attempts < 50",
    )) as unknown as [{ unsent: number }[]];
    const unsentNow = sample(after, "turnledger_mail_outbox_unsent");
    // Other tests' mail may come and go between the two reads.
    expect(Math.abs(unsentNow! - Number(outbox!.unsent))).toBeLessThanOrEqual(
      5,
    );
    expect(
      sample(after, "turnledger_mail_outbox_oldest_unsent_age_seconds"),
    ).toBeGreaterThanOrEqual(0);
    const [[alerts]] = (await testDatabase().query(
      "SELECT COUNT(*) AS open FROM stock_alerts WHERE open_item_id IS NOT NULL",
    )) as unknown as [{ open: number }[]];
    expect(
      Math.abs(
        sample(after, "turnledger_stock_alerts_open")! - Number(alerts!.open),
      ),
    ).toBeLessThanOrEqual(5);

    // Declared even before anything happened, and the process's own figures.
    expect(after).toContain(
      "# TYPE turnledger_transaction_retries_total counter",
    );
    expect(after).toContain(
      "# TYPE turnledger_price_list_import_duration_seconds histogram",
    );
    expect(sample(after, "process_cpu_user_seconds_total")).toBeGreaterThan(0);
    expect(after).toContain("nodejs_eventloop_lag_seconds");
  });

  it("is a path that does not exist for a request a proxy forwarded, and answers any Host on loopback", async () => {
    const port = new URL(baseUrl()).port;
    const forwarded = await rawRequest({
      connectTo: `http://127.0.0.1:${port}`,
      path: "/metrics",
      headers: { "X-Forwarded-For": "203.0.113.9" },
    });
    expect(forwarded.status).toBe(404);
    expect(forwarded.body).not.toContain("turnledger_");

    const byAddress = await rawRequest({
      connectTo: `http://127.0.0.1:${port}`,
      path: "/metrics",
      headers: { Host: "10.1.2.3:9000" },
    });
    expect(byAddress.status).toBe(200);
    expect(byAddress.body).toContain("turnledger_http_requests_total");
  });

  it("from another address: 404 without the token or with a wrong one, the figures with METRICS_TOKEN", async (context) => {
    const outward = Object.values(os.networkInterfaces())
      .flat()
      .filter((entry) => entry !== undefined)
      .find((entry) => !entry.internal && entry.family === "IPv4");
    if (!outward) {
      context.skip("this machine has no address besides loopback to try");
      return;
    }
    tokenServer = await startServer(tokenServerPort, {
      HOST: "0.0.0.0",
      METRICS_TOKEN: metricsToken,
    });
    const remote = `http://${outward.address}:${tokenServerPort}`;
    const without = await fetch(`${remote}/metrics`);
    expect(without.status).toBe(404);
    expect(await without.text()).not.toContain("turnledger_");
    const wrong = await fetch(`${remote}/metrics`, {
      headers: { Authorization: `Bearer ${metricsToken}-not` },
    });
    expect(wrong.status).toBe(404);
    await wrong.text();
    const text = await readMetrics(remote, {
      Authorization: `Bearer ${metricsToken}`,
    });
    expect(text).toContain("turnledger_http_requests_total");
  }, 40_000);

  it("still answers while the database is unreachable: its figures NaN and turnledger_database_figures_up 0", async () => {
    const databaseUrl = new URL(inject("databaseUrl"));
    relay = databaseRelay({
      host: databaseUrl.hostname,
      port: Number(databaseUrl.port),
    });
    await relay.up();
    const relayed = new URL(databaseUrl);
    relayed.port = String(relayPort);
    noDatabaseServer = await startServer(noDatabaseServerPort, {
      DATABASE_URL: relayed.toString(),
    });
    const up = await readMetrics(`http://127.0.0.1:${noDatabaseServerPort}`);
    expect(sample(up, "turnledger_database_figures_up")).toBe(1);
    // Cut: connections in the pool die, new ones are refused.
    await relay.down();
    const text = await readMetrics(`http://127.0.0.1:${noDatabaseServerPort}`);
    expect(sample(text, "turnledger_database_figures_up")).toBe(0);
    expect(sample(text, "turnledger_mail_outbox_unsent")).toBeNaN();
    expect(sample(text, "turnledger_stock_alerts_open")).toBeNaN();
    expect(text).toContain("turnledger_db_pool_connections");
  }, 40_000);
});
