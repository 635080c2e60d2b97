/**
 * Changing one's own password on the account page: the current password is
 * asked for (under the sign-in throttle), the new one follows the
 * set-password rules, every other session ends, this one is issued afresh,
 * and API tokens are revoked as after a reset (docs/decisions/017).
 */
import { afterAll, describe, expect, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import {
  baseUrl,
  get,
  postForm,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import { closeTestDatabase, createPerson } from "../support/test-database";

afterAll(closeTestDatabase);

function changePassword(
  cookie: string,
  fields: {
    currentPassword: string;
    password: string;
    confirmPassword?: string;
  },
) {
  return postForm(
    "/account",
    {
      intent: "change-password",
      currentPassword: fields.currentPassword,
      password: fields.password,
      confirmPassword: fields.confirmPassword ?? fields.password,
    },
    cookie,
  );
}

async function signedInPerson(label: string, password: string) {
  const email = uniqueEmail(label);
  await createPerson({ email, password, roles: ["storekeeper"] });
  return { email, cookie: await signIn(email, password) };
}

async function meStatus(headers: Record<string, string>): Promise<number> {
  return (await fetch(`${baseUrl()}/api/v1/me`, { headers })).status;
}

async function newApiToken(cookie: string, password: string): Promise<string> {
  const response = await postForm(
    "/account",
    {
      intent: "create",
      name: "bench scale",
      lifetimeDays: "90",
      scope: "all",
      currentPassword: password,
    },
    cookie,
  );
  expect(response.status).toBe(200);
  return (await response.text()).match(/tl_[A-Za-z0-9_-]{43}/)![0];
}

describe("changing your own password", () => {
  it("needs the current password, ends every other session and token, and keeps this browser signed in", async () => {
    const { email, cookie } = await signedInPerson(
      "change-own",
      "first-password-1",
    );
    const otherSession = await signIn(email, "first-password-1");
    const token = await newApiToken(cookie, "first-password-1");
    expect(await meStatus({ Authorization: `Bearer ${token}` })).toBe(200);

    const wrong = await changePassword(cookie, {
      currentPassword: "not-my-password",
      password: "second-password-2",
    });
    expect(wrong.status).toBe(400);
    expect(await wrong.text()).toContain("Your current password is wrong.");
    await signIn(email, "first-password-1");

    const changed = await changePassword(cookie, {
      currentPassword: "first-password-1",
      password: "second-password-2",
    });
    expect(changed.status).toBe(302);
    expect(changed.headers.get("location")).toBe("/account");
    const renewed = sessionCookieFrom(changed);
    expect(renewed).toBeTruthy();
    expect(renewed).not.toBe(cookie);

    // This browser goes on with the new cookie; every other session has ended.
    expect((await get("/account", renewed!)).status).toBe(200);
    expect(await meStatus({ Cookie: otherSession })).toBe(401);
    expect(await meStatus({ Cookie: cookie })).toBe(401);
    // Tokens made with the old password are revoked, as after a reset.
    expect(await meStatus({ Authorization: `Bearer ${token}` })).toBe(401);

    await expect(signIn(email, "first-password-1")).rejects.toThrow();
    await signIn(email, "second-password-2");
  });

  it("refuses a new password the set-password form refuses, field by field, and changes nothing", async () => {
    const { email, cookie } = await signedInPerson(
      "change-rules",
      "first-password-1",
    );
    const short = await changePassword(cookie, {
      currentPassword: "first-password-1",
      password: "short",
    });
    expect(short.status).toBe(400);
    expect(await short.text()).toContain("Use at least 10 characters.");

    const differ = await changePassword(cookie, {
      currentPassword: "first-password-1",
      password: "second-password-2",
      confirmPassword: "second-password-3",
    });
    expect(differ.status).toBe(400);
    expect(await differ.text()).toContain("The two passwords differ.");

    const demo = await changePassword(cookie, {
      currentPassword: "first-password-1",
      password: demoPassword(),
    });
    expect(demo.status).toBe(400);
    expect(await demo.text()).toContain("published with the Turnledger demo");

    const missing = await changePassword(cookie, {
      currentPassword: "",
      password: "second-password-2",
    });
    expect(missing.status).toBe(400);
    expect(await missing.text()).toContain("Enter your current password.");

    // Nothing changed: the old password and the session still work.
    expect((await get("/account", cookie)).status).toBe(200);
    await signIn(email, "first-password-1");
  });

  it("counts wrong current passwords against the sign-in throttle", async () => {
    const { cookie } = await signedInPerson("change-guess", "first-password-1");
    for (let guess = 1; guess <= 5; guess += 1) {
      const wrong = await changePassword(cookie, {
        currentPassword: `guess-number-${guess}`,
        password: "second-password-2",
      });
      expect(wrong.status).toBe(400);
    }
    // Five wrong passwords pause the account (docs/decisions/017): even the
    // right one is not checked now.
    const paused = await changePassword(cookie, {
      currentPassword: "first-password-1",
      password: "second-password-2",
    });
    expect(paused.status).toBe(429);
    expect(Number(paused.headers.get("Retry-After"))).toBeGreaterThan(0);
    expect(await paused.text()).toContain("Too many wrong passwords");
    expect(sessionCookieFrom(paused)).toBeNull();
  });
});
