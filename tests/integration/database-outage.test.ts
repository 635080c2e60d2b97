/**
 * The database goes away and comes back: pages answer 503 "database
 * unavailable", the API answers 503 JSON, /healthz says down, and all recover
 * without restarting the app. A TCP relay between a second app server and the
 * test MariaDB is cut and restored, so the other tests' server is untouched.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { inject } from "vitest";
import { startAppServer } from "../../scripts/lib/test-environment";
import { newPerson } from "../support/app-client";
import { DatabaseRelay } from "../support/database-relay";

// Ports follow the run's own TEST_PORT, so a second run beside this one gets others.
const testPort = Number(process.env.TEST_PORT ?? 3100);
const relayPort = testPort + 99;
let relay: DatabaseRelay;
let app: { baseUrl: string; stop(): Promise<void> };
let cookie = "";

beforeAll(async () => {
  const databaseUrl = new URL(inject("databaseUrl"));
  relay = new DatabaseRelay(
    { host: databaseUrl.hostname, port: Number(databaseUrl.port) },
    relayPort,
  );
  await relay.up();
  const relayedUrl = new URL(databaseUrl);
  relayedUrl.port = String(relayPort);
  app = await startAppServer({
    port: testPort + 2,
    databaseUrl: relayedUrl.toString(),
    smtpUrl: inject("smtpUrl"),
  });
  const manager = await newPerson("manager");
  const response = await fetch(`${app.baseUrl}/api/v1/sessions`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({
      email: manager.email,
      password: manager.password,
    }),
  });
  expect(response.status).toBe(200);
  cookie = response.headers.getSetCookie()[0]!.split(";")[0]!;
});

afterAll(async () => {
  await app?.stop();
  await relay?.down();
});

const get = (path: string) =>
  fetch(`${app.baseUrl}${path}`, {
    headers: { Cookie: cookie },
    redirect: "manual",
  });

describe("database outage", () => {
  it("answers normally while the database is up", async () => {
    expect((await get("/healthz")).status).toBe(200);
    expect((await get("/")).status).toBe(200);
  });

  it("answers 503 everywhere while it is down", async () => {
    await relay.down();
    const health = await get("/healthz");
    expect(health.status).toBe(503);
    // Down, and nothing more: the driver's message (hosts, users, databases)
    // goes to the server's log, never to an anonymous caller.
    expect(await health.json()).toEqual({
      status: "unavailable",
      database: { state: "down" },
    });
    expect(health.headers.get("Cache-Control")).toBe("no-store");

    const page = await get("/");
    expect(page.status).toBe(503);
    expect(await page.text()).toContain("Database unavailable");

    const api = await get("/api/v1/me");
    expect(api.status).toBe(503);
    expect(api.headers.get("Content-Type")).toContain("application/json");
    expect(await api.json()).toEqual({
      error: { message: "The database is unavailable. Try again in a moment." },
    });
  });

  it("recovers by itself when the database is back", async () => {
    await relay.up();
    expect((await get("/healthz")).status).toBe(200);
    const page = await get("/");
    expect(page.status).toBe(200);
    expect(await page.text()).toContain("Good to see you");
  });
});
