import { describe, expect, it } from "vitest";
import {
  conflictReasonOf,
  DatabaseBusyError,
  databaseBusyMessage,
  defaultRetryPolicy,
  retryDelayMs,
  runWithRetries,
  type ConflictReason,
} from "./write-conflicts";

/** An error shaped as mysql2 reports one (errno, code, sqlState), wrapped as the query builder does. */
function driverError(errno: number, code: string, sqlState = "HY000") {
  const cause = Object.assign(new Error(`${code} from the server`), {
    errno,
    code,
    sqlState,
  });
  return new Error("Failed query: UPDATE …", { cause });
}

// Error numbers and names from MariaDB's error reference (ER_LOCK_DEADLOCK 1213,
// ER_LOCK_WAIT_TIMEOUT 1205, ER_ERROR_DURING_COMMIT 1180, ER_DUP_ENTRY 1062,
// ER_UNKNOWN_COM_ERROR 1047).
describe("which errors are retried", () => {
  it("retries a deadlock (1213), also what a Galera certification conflict is reported as", () => {
    expect(
      conflictReasonOf(driverError(1213, "ER_LOCK_DEADLOCK", "40001")),
    ).toBe("deadlock");
  });

  it("retries a lock wait timeout (1205)", () => {
    expect(conflictReasonOf(driverError(1205, "ER_LOCK_WAIT_TIMEOUT"))).toBe(
      "lock_wait_timeout",
    );
  });

  it("knows the error by its code when the number is missing, and unwrapped", () => {
    expect(
      conflictReasonOf(
        Object.assign(new Error("x"), { code: "ER_LOCK_DEADLOCK" }),
      ),
    ).toBe("deadlock");
  });

  it("does not retry other errors", () => {
    for (const error of [
      driverError(1062, "ER_DUP_ENTRY", "23000"),
      driverError(1180, "ER_ERROR_DURING_COMMIT"),
      driverError(1047, "ER_UNKNOWN_COM_ERROR", "08S01"),
      Object.assign(new Error("gone"), { code: "ECONNREFUSED" }),
      new Error("a user's mistake"),
      "not an error",
      null,
      undefined,
    ])
      expect(conflictReasonOf(error)).toBeNull();
  });
});

describe("the wait before a retry", () => {
  const policy = {
    maxAttempts: 8,
    baseDelayMs: 15,
    maxDelayMs: 800,
    maxLockWaitTimeouts: 3,
  };

  it("lies between half and all of an exponential ceiling (equal jitter)", () => {
    // Ceilings 15, 30, 60, 120, 240, 480, 800 (capped), 800 ms.
    const ceilings = [15, 30, 60, 120, 240, 480, 800, 800];
    ceilings.forEach((ceiling, index) => {
      const retry = index + 1;
      expect(retryDelayMs(retry, policy, () => 0)).toBe(
        Math.round(ceiling / 2),
      );
      expect(retryDelayMs(retry, policy, () => 0.999999)).toBe(ceiling);
    });
  });

  it("differs between transactions that collided (it is random, within its bounds)", () => {
    const waits = new Set<number>();
    for (let sample = 0; sample < 200; sample += 1) {
      const wait = retryDelayMs(5, policy);
      expect(wait).toBeGreaterThanOrEqual(120);
      expect(wait).toBeLessThanOrEqual(240);
      waits.add(wait);
    }
    expect(waits.size).toBeGreaterThan(20);
  });

  it("never waits longer than the ceiling, however many retries", () => {
    expect(retryDelayMs(60, policy, () => 0.999999)).toBe(800);
  });

  it("keeps the default policy's total wait under two seconds", () => {
    let worst = 0;
    for (let retry = 1; retry < defaultRetryPolicy.maxAttempts; retry += 1)
      worst += retryDelayMs(retry, defaultRetryPolicy, () => 0.999999);
    expect(worst).toBe(15 + 30 + 60 + 120 + 240 + 480 + 800);
    expect(worst).toBeLessThan(2_000);
  });
});

describe("running with retries", () => {
  const noSleep = { sleep: async () => undefined };

  it("runs the whole attempt again after a conflict and answers its result", async () => {
    let attempts = 0;
    const retries: [ConflictReason, number][] = [];
    const result = await runWithRetries(
      async () => {
        attempts += 1;
        if (attempts === 1) throw driverError(1213, "ER_LOCK_DEADLOCK");
        if (attempts === 2) throw driverError(1205, "ER_LOCK_WAIT_TIMEOUT");
        return "committed";
      },
      { ...noSleep, onRetry: (reason, retry) => retries.push([reason, retry]) },
    );
    expect(result).toBe("committed");
    expect(attempts).toBe(3);
    expect(retries).toEqual([
      ["deadlock", 1],
      ["lock_wait_timeout", 2],
    ]);
  });

  it("stops after maxAttempts with DatabaseBusyError carrying the last conflict", async () => {
    let attempts = 0;
    const last = driverError(1213, "ER_LOCK_DEADLOCK");
    const failure = await runWithRetries(
      async () => {
        attempts += 1;
        throw last;
      },
      {
        ...noSleep,
        policy: {
          maxAttempts: 5,
          baseDelayMs: 1,
          maxDelayMs: 2,
          maxLockWaitTimeouts: 3,
        },
      },
    ).catch((error: unknown) => error);
    expect(attempts).toBe(5);
    expect(failure).toBeInstanceOf(DatabaseBusyError);
    expect((failure as DatabaseBusyError).message).toBe(databaseBusyMessage);
    expect((failure as DatabaseBusyError).attempts).toBe(5);
    expect((failure as DatabaseBusyError).reason).toBe("deadlock");
    expect((failure as DatabaseBusyError).cause).toBe(last);
  });

  it("gives up after three lock wait timeouts (each already waited innodb_lock_wait_timeout)", async () => {
    let attempts = 0;
    const failure = await runWithRetries(async () => {
      attempts += 1;
      // A deadlock between the timeouts does not reset their count.
      if (attempts === 2) throw driverError(1213, "ER_LOCK_DEADLOCK");
      throw driverError(1205, "ER_LOCK_WAIT_TIMEOUT");
    }, noSleep).catch((error: unknown) => error);
    expect(attempts).toBe(4);
    expect(failure).toBeInstanceOf(DatabaseBusyError);
    expect((failure as DatabaseBusyError).reason).toBe("lock_wait_timeout");
  });

  it("throws any other error at once, unchanged, without retrying", async () => {
    let attempts = 0;
    const mistake = new Error("No item with SKU");
    await expect(
      runWithRetries(async () => {
        attempts += 1;
        throw mistake;
      }, noSleep),
    ).rejects.toBe(mistake);
    expect(attempts).toBe(1);
  });

  it("sleeps the jittered wait between attempts", async () => {
    const slept: number[] = [];
    let attempts = 0;
    await runWithRetries(
      async () => {
        attempts += 1;
        if (attempts < 4) throw driverError(1213, "ER_LOCK_DEADLOCK");
      },
      {
        sleep: async (ms) => {
          slept.push(ms);
        },
        random: () => 0,
        policy: {
          maxAttempts: 8,
          baseDelayMs: 10,
          maxDelayMs: 1_000,
          maxLockWaitTimeouts: 3,
        },
      },
    );
    expect(slept).toEqual([5, 10, 20]);
  });
});
