/**
 * argon2 for anonymous callers: an unknown set-password link is refused
 * before any hashing, and a flood of sign-ins is answered 503 with
 * Retry-After once the hashing queue is full, instead of piling up.
 * See docs/decisions/017.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { get, sendJson, uniqueEmail } from "../support/app-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

type People = typeof import("~/people/people.server");
type Passwords = typeof import("~/auth/password.server");
type EmailTokens = typeof import("~/auth/email-tokens.server");

let people: People;
let passwords: Passwords;
let emailTokens: EmailTokens;

// The account code itself, run in this process against the test database, so
// the number of hashes it starts can be read directly.
beforeAll(async () => {
  process.env.DATABASE_URL = inject("databaseUrl");
  people = await import("~/people/people.server");
  passwords = await import("~/auth/password.server");
  emailTokens = await import("~/auth/email-tokens.server");
});

afterAll(async () => {
  const { pool } = await import("~/db/client.server");
  await pool.end();
  await closeTestDatabase();
});

describe("setting a password with a link", () => {
  it("refuses an unknown link without hashing the password", async () => {
    const before = passwords.passwordHashesStarted();
    const result = await people.setPasswordWithToken(
      "no-such-link-token",
      "a-long-new-password",
    );
    expect(passwords.passwordHashesStarted()).toBe(before);
    expect(result).toEqual({ kind: "unusable" });
  });

  it("hashes once for a usable link (so the count above is a real one)", async () => {
    const email = uniqueEmail("hash-count");
    const userId = await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const token = await emailTokens.createEmailToken(userId, "password-reset");
    const before = passwords.passwordHashesStarted();
    const result = await people.setPasswordWithToken(
      token,
      "a-long-new-password",
    );
    expect(passwords.passwordHashesStarted()).toBe(before + 1);
    expect(result).toEqual({ kind: "set", userId });
  });
});

describe("a flood of sign-ins", () => {
  it("is answered 503 with Retry-After beyond the hashing queue, never 500, while other pages still answer", async () => {
    const clear = () =>
      testDatabase().query("DELETE FROM attempt_counters WHERE rule = ?", [
        "sign-in-address",
      ]);
    await clear();
    try {
      const email = uniqueEmail("flooded");
      await createPerson({ email, password: "the-password", roles: ["buyer"] });
      const flood = Promise.all(
        Array.from({ length: 120 }, () =>
          sendJson("POST", "/api/v1/sessions", {
            email: uniqueEmail("flood"),
            password: "a-guessed-password",
          }),
        ),
      );
      const page = await get("/sign-in");
      expect(page.status).toBe(200);
      const answers = await flood;
      const statuses = answers.map((answer) => answer.status);
      expect(statuses.every((status) => [401, 429, 503].includes(status))).toBe(
        true,
      );
      const busy = answers.filter((answer) => answer.status === 503);
      expect(busy.length).toBeGreaterThan(0);
      expect(Number(busy[0]!.headers.get("Retry-After"))).toBeGreaterThan(0);
      expect(await busy[0]!.json()).toEqual({
        error: {
          message:
            "The server is busy checking passwords. Try again in a few seconds.",
        },
      });
    } finally {
      await clear();
    }
  });
});
