import { describe, expect, it } from "vitest";
import { isDatabaseUnavailable, isDuplicateKey } from "./database-errors";

describe("isDatabaseUnavailable", () => {
  it("recognises a refused connection, also when wrapped by Drizzle", () => {
    const refused = Object.assign(
      new Error("connect ECONNREFUSED 127.0.0.1:3307"),
      { code: "ECONNREFUSED" },
    );
    expect(isDatabaseUnavailable(refused)).toBe(true);
    expect(
      isDatabaseUnavailable(new Error("Failed query", { cause: refused })),
    ).toBe(true);
  });
  it("recognises a Galera node that is not ready (1047, WSREP), wrapped by Drizzle; not another 1047", () => {
    // The error mysql2 gives for MariaDB's answer from a joining node (seen in
    // tests/integration/galera-cluster.test.ts while a killed node rejoins).
    const notReady = Object.assign(
      new Error("WSREP has not yet prepared node for application use"),
      {
        code: "ER_UNKNOWN_COM_ERROR",
        errno: 1047,
        sqlMessage: "WSREP has not yet prepared node for application use",
      },
    );
    expect(isDatabaseUnavailable(notReady)).toBe(true);
    expect(
      isDatabaseUnavailable(new Error("Failed query", { cause: notReady })),
    ).toBe(true);
    const unknownCommand = Object.assign(new Error("Unknown command"), {
      code: "ER_UNKNOWN_COM_ERROR",
      errno: 1047,
    });
    expect(isDatabaseUnavailable(unknownCommand)).toBe(false);
  });
  it("does not mistake a user's bad data for an outage", () => {
    const duplicate = Object.assign(new Error("Duplicate entry"), {
      code: "ER_DUP_ENTRY",
    });
    expect(isDatabaseUnavailable(duplicate)).toBe(false);
    expect(
      isDuplicateKey(new Error("Failed query", { cause: duplicate })),
    ).toBe(true);
  });
});
