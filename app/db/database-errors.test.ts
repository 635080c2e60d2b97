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
