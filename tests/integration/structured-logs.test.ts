/**
 * The server's log as an operator ships it (docs/decisions/024): the built
 * server is started on its own port with stdout going to a file, a person
 * signs in with a password, makes an API token and uses it, asks for a
 * password reset and follows the e-mailed link to set a new password. The
 * log then has one JSON line per request (time, request id, method, route id,
 * status, duration, person id), and none of the secrets that went by.
 *
 * Port: TEST_PORT + 77. Uses the test run's build, database and mail fake.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, openSync, readFileSync, closeSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { appServerArguments } from "../../scripts/lib/app-server-process";
import { uniqueEmail } from "../support/app-client";
import { linkIn, waitForMessage } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

const projectRoot = path.resolve(import.meta.dirname, "..", "..");
const port = Number(process.env.TEST_PORT ?? 3100) + 77;
const base = `http://localhost:${port}`;
const logFile = path.join(
  mkdtempSync(path.join(os.tmpdir(), "turnledger-log-")),
  "server.log",
);

let server: ChildProcess | undefined;

async function stopServer(): Promise<void> {
  const child = server;
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((resolve) => child.once("exit", resolve));
  child.kill("SIGTERM");
  await exited;
}

beforeAll(async () => {
  const fd = openSync(logFile, "w");
  server = spawn(process.execPath, appServerArguments(), {
    cwd: projectRoot,
    stdio: ["ignore", fd, "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "production",
      PORT: String(port),
      HOST: "127.0.0.1",
      DATABASE_URL: inject("databaseUrl"),
      SMTP_URL: inject("smtpUrl"),
      APP_URL: base,
      DEMO_DATA: "1",
      LOG_LEVEL: "info",
      TRUST_PROXY: undefined,
      METRICS_TOKEN: undefined,
    },
  });
  closeSync(fd);
  const started = Date.now();
  for (;;) {
    if (server.exitCode !== null)
      throw new Error(`the server exited:\n${readFileSync(logFile, "utf8")}`);
    try {
      if ((await fetch(`${base}/healthz`)).ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() - started > 30_000)
      throw new Error("the server did not answer /healthz");
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
}, 40_000);

afterAll(async () => {
  await stopServer();
  await closeTestDatabase();
});

/** Every request this test made: its X-Request-Id and what the log line must say. */
const made: {
  requestId: string;
  method: string;
  route: string;
  status: number;
  personId: string | null;
}[] = [];

async function request(
  pathAndQuery: string,
  init: RequestInit & { expectRoute: string; personId?: string | null },
): Promise<Response> {
  const response = await fetch(`${base}${pathAndQuery}`, {
    redirect: "manual",
    ...init,
    headers: { Origin: base, ...(init.headers as Record<string, string>) },
  });
  const requestId = response.headers.get("X-Request-Id");
  expect(requestId, pathAndQuery).toMatch(/^[0-9a-f]{16}$/);
  made.push({
    requestId: requestId!,
    method: init.method ?? "GET",
    route: init.expectRoute,
    status: response.status,
    personId: init.personId ?? null,
  });
  return response;
}

function form(fields: Record<string, string | string[]>): URLSearchParams {
  const body = new URLSearchParams();
  for (const [name, value] of Object.entries(fields))
    for (const item of Array.isArray(value) ? value : [value])
      body.append(name, item);
  return body;
}

function sessionCookieOf(response: Response): string {
  for (const header of response.headers.getSetCookie()) {
    const [pair] = header.split(";");
    if (pair?.startsWith("turnledger_session=")) return pair;
  }
  throw new Error(`no session cookie (${response.status})`);
}

describe("the request log", () => {
  it("has one JSON line per request with id, route id, status, duration and person, and no password, token, cookie or e-mailed link", async () => {
    const email = uniqueEmail("log-redaction");
    const password = "a log-test password 7f3k";
    const newPassword = "another log-test password 9q2w";
    await createPerson({ email, password, roles: ["storekeeper"] });
    const [[user]] = (await testDatabase().query(
      "SELECT id FROM users WHERE email = ?",
      [email],
    )) as unknown as [{ id: string }[]];
    const personId = user!.id;

    // Sign in with the password (the form, as a browser without JavaScript).
    const signedIn = await request("/sign-in", {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: form({ email, password }),
      expectRoute: "routes/sign-in",
    });
    expect(signedIn.status).toBe(302);
    const cookie = sessionCookieOf(signedIn);
    const cookieValue = cookie.split("=")[1]!;

    // A page and its data request, signed in; a path with an id and a query.
    const page = await request("/stock", {
      headers: { Cookie: cookie },
      expectRoute: "routes/stock",
      personId,
    });
    expect(page.status).toBe(200);
    await page.text();
    const data = await request("/stock.data?search=secret-search-text", {
      headers: { Cookie: cookie },
      expectRoute: "routes/stock",
      personId,
    });
    await data.text();

    // A personal API token (the password asked again), then a bearer request.
    const created = await request("/account", {
      method: "POST",
      headers: {
        Cookie: cookie,
        "Content-Type": "application/x-www-form-urlencoded",
      },
      body: form({
        intent: "create",
        name: "log test",
        lifetimeDays: "90",
        scope: "chosen",
        roles: ["storekeeper"],
        currentPassword: password,
      }),
      expectRoute: "routes/account",
      personId,
    });
    expect(created.status).toBe(200);
    const token = (await created.text()).match(/tl_[A-Za-z0-9_-]{43}/)?.[0];
    expect(token).toBeDefined();
    const items = await request("/api/v1/items", {
      headers: { Authorization: `Bearer ${token}` },
      expectRoute: "routes/api.v1.items",
      personId,
    });
    expect(items.status).toBe(200);
    await items.text();

    // A password reset: asked for, its e-mailed link followed, a new password set.
    const asked = await request("/forgot-password", {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: form({ email }),
      expectRoute: "routes/forgot-password",
    });
    expect(asked.status).toBeLessThan(400);
    const message = await waitForMessage(email, /new Turnledger password/);
    const link = new URL(linkIn(message));
    const resetToken = link.searchParams.get("token")!;
    expect(resetToken).toBeTruthy();
    const followed = await request(`${link.pathname}${link.search}`, {
      expectRoute: "routes/set-password",
    });
    expect(followed.status).toBe(200);
    await followed.text();
    const set = await request("/set-password", {
      method: "POST",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      body: form({
        token: resetToken,
        password: newPassword,
        confirmPassword: newPassword,
      }),
      expectRoute: "routes/set-password",
    });
    expect(set.status).toBeLessThan(400);

    // A path no route has, carrying what looks like a secret.
    await request("/no-such-page/tl_not-a-real-token", {
      expectRoute: "routes/not-found",
    });

    await stopServer();
    const log = readFileSync(logFile, "utf8");
    const lines = log.trimEnd().split("\n");
    const entries = lines.map((line) => {
      try {
        return JSON.parse(line) as Record<string, unknown>;
      } catch {
        throw new Error(`not a JSON line: ${line}`);
      }
    });
    const requestLines = entries.filter((entry) => entry.msg === "request");

    for (const expected of made) {
      const mine = requestLines.filter(
        (entry) => entry.requestId === expected.requestId,
      );
      expect(mine, JSON.stringify(expected)).toHaveLength(1);
      const line = mine[0]!;
      expect(line).toMatchObject({
        method: expected.method,
        route: expected.route,
        status: expected.status,
        personId: expected.personId,
      });
      expect(Date.parse(String(line.time))).not.toBeNaN();
      expect(typeof line.durationMs).toBe("number");
      expect(line.durationMs as number).toBeGreaterThanOrEqual(0);
    }
    // Never the URL: no line has a path or query in it.
    expect(log).not.toContain("secret-search-text");
    expect(log).not.toContain("tl_not-a-real-token");
    expect(log).not.toMatch(/"\/(stock|account|set-password|no-such-page)/);

    for (const secret of [
      password,
      newPassword,
      token!,
      cookieValue,
      resetToken,
      link.toString(),
      encodeURIComponent(resetToken),
    ])
      expect(log, "a secret reached the log").not.toContain(secret);
  }, 60_000);
});
