import { describe, expect, it } from "vitest";
import { judgeReadiness, type ReadinessFacts } from "./readiness";

const now = new Date("2026-12-03T12:00:00.000Z");
const minutesAgo = (minutes: number) =>
  new Date(now.getTime() - minutes * 60_000);

const healthy: ReadinessFacts = {
  stopping: false,
  databaseUp: true,
  schema: "current",
  oldestUnsentAt: null,
  outboxMaxAgeMinutes: 30,
  now,
};

describe("judgeReadiness", () => {
  it("is ready when running, the database answers, migrations are current and no mail waits", () => {
    const readiness = judgeReadiness(healthy);
    expect(readiness.ready).toBe(true);
    expect(readiness.failed).toEqual([]);
    expect(readiness.checks).toEqual({
      server: { ok: true, state: "running" },
      database: { ok: true, state: "up" },
      migrations: { ok: true, state: "current" },
      outbox: {
        ok: true,
        state: "flowing",
        oldestUnsentMinutes: null,
        maxAgeMinutes: 30,
      },
    });
  });

  it("is not ready while stopping, whatever else holds", () => {
    const readiness = judgeReadiness({
      ...healthy,
      stopping: true,
      databaseUp: null,
      schema: null,
      oldestUnsentAt: undefined,
    });
    expect(readiness.ready).toBe(false);
    expect(readiness.failed).toEqual(["server"]);
    expect(readiness.checks.server.state).toBe("stopping");
    expect(readiness.checks.database.state).toBe("not checked");
  });

  it("names the database alone when it is down (the checks that need it could not run)", () => {
    const readiness = judgeReadiness({
      ...healthy,
      databaseUp: false,
      schema: null,
      oldestUnsentAt: undefined,
    });
    expect(readiness.ready).toBe(false);
    expect(readiness.failed).toEqual(["database"]);
    expect(readiness.checks.migrations.state).toBe("not checked");
    expect(readiness.checks.outbox.state).toBe("not checked");
  });

  it.each([
    ["older", "behind"],
    ["foreign", "foreign"],
  ] as const)(
    "is not ready when the database's migrations are %s (%s)",
    (schema, state) => {
      const readiness = judgeReadiness({ ...healthy, schema });
      expect(readiness.ready).toBe(false);
      expect(readiness.failed).toEqual(["migrations"]);
      expect(readiness.checks.migrations).toEqual({ ok: false, state });
    },
  );

  it("stays ready, saying so, when a newer version has migrated the database (an upgrade under way)", () => {
    const readiness = judgeReadiness({ ...healthy, schema: "newer" });
    expect(readiness.ready).toBe(true);
    expect(readiness.checks.migrations).toEqual({ ok: true, state: "ahead" });
  });

  it("stays ready while the oldest unsent e-mail has waited up to the limit, and not a moment past it", () => {
    const atLimit = judgeReadiness({
      ...healthy,
      oldestUnsentAt: minutesAgo(30),
    });
    expect(atLimit.ready).toBe(true);
    expect(atLimit.checks.outbox).toMatchObject({
      state: "flowing",
      oldestUnsentMinutes: 30,
    });
    const past = judgeReadiness({
      ...healthy,
      oldestUnsentAt: new Date(minutesAgo(30).getTime() - 1),
    });
    expect(past.ready).toBe(false);
    expect(past.failed).toEqual(["outbox"]);
    expect(past.checks.outbox).toEqual({
      ok: false,
      state: "stuck",
      oldestUnsentMinutes: 30,
      maxAgeMinutes: 30,
    });
  });

  it("leaves the outbox out when its check is off", () => {
    const readiness = judgeReadiness({
      ...healthy,
      oldestUnsentAt: minutesAgo(10_000),
      outboxMaxAgeMinutes: null,
    });
    expect(readiness.ready).toBe(true);
    expect(readiness.checks.outbox).toEqual({ ok: true, state: "off" });
  });

  it("lists every failed check when several fail", () => {
    const readiness = judgeReadiness({
      ...healthy,
      schema: "older",
      oldestUnsentAt: minutesAgo(90),
    });
    expect(readiness.failed).toEqual(["migrations", "outbox"]);
  });

  it("reads a message queued a moment in the future (clocks apart) as just queued", () => {
    const readiness = judgeReadiness({
      ...healthy,
      oldestUnsentAt: new Date(now.getTime() + 5_000),
    });
    expect(readiness.checks.outbox).toMatchObject({
      ok: true,
      oldestUnsentMinutes: 0,
    });
  });
});
