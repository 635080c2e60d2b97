import { describe, expect, it } from "vitest";
import { withoutQueryValues } from "./logger.server";

describe("withoutQueryValues", () => {
  it("cuts a failed query's values out of Drizzle's message and stack, keeping the query", () => {
    const message =
      "Failed query: select `id` from `users` where `email` = ?\nparams: someone@example.test";
    expect(withoutQueryValues(message)).toBe(
      "Failed query: select `id` from `users` where `email` = ?\nparams: [redacted]",
    );
    const stack = `Error: ${message}, a1b2c3\n    at MySql2PreparedQuery.queryWithCache (session.js:25:15)\ncaused by: Error: boom\n    at x (y.js:1:1)`;
    const cleaned = withoutQueryValues(stack) as string;
    expect(cleaned).not.toContain("someone@example.test");
    expect(cleaned).not.toContain("a1b2c3");
    expect(cleaned).toContain("    at MySql2PreparedQuery.queryWithCache");
    expect(cleaned).toContain("caused by: Error: boom");
  });

  it("leaves other text alone", () => {
    expect(withoutQueryValues("Cannot read properties of undefined")).toBe(
      "Cannot read properties of undefined",
    );
    expect(withoutQueryValues(undefined)).toBeUndefined();
  });
});
