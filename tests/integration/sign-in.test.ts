import { afterAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
  sendJson,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import { linkIn, waitForMessage } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

afterAll(closeTestDatabase);

const password = "a-long-test-password";

describe("sign-in page", () => {
  it("signs a person in and sends them to the page they asked for", async () => {
    const email = uniqueEmail("form");
    await createPerson({ email, password, roles: ["admin"] });
    const response = await postForm("/sign-in", {
      email,
      password,
      redirectTo: "/admin/people",
    });
    expect(response.status).toBe(302);
    expect(response.headers.get("Location")).toBe("/admin/people");
    const cookie = sessionCookieFrom(response);
    expect(cookie).toBeTruthy();
    const setCookie = response.headers.getSetCookie().join(";").toLowerCase();
    expect(setCookie).toContain("httponly");
    expect(setCookie).toContain("samesite=lax");
    expect((await get("/admin/people", cookie!)).status).toBe(200);
  });

  it("never redirects off-site after sign-in", async () => {
    const email = uniqueEmail("offsite");
    await createPerson({ email, password, roles: ["buyer"] });
    const response = await postForm("/sign-in", {
      email,
      password,
      redirectTo: "//evil.test/x",
    });
    expect(response.headers.get("Location")).toBe("/");
  });

  it.each(["/\t/evil.example", "/\\evil.example", "/.//evil.example"])(
    "sends %j home: a browser would read it as another host",
    async (redirectTo) => {
      const email = uniqueEmail("offsite-tab");
      await createPerson({ email, password, roles: ["buyer"] });
      const response = await postForm("/sign-in", {
        email,
        password,
        redirectTo,
      });
      expect(response.status).toBe(302);
      expect(response.headers.get("Location")).toBe("/");
      // Signed in already, the sign-in page sends them on by the same rule.
      const again = await get(
        `/sign-in?redirectTo=${encodeURIComponent(redirectTo)}`,
        sessionCookieFrom(response)!,
      );
      expect(again.status).toBe(302);
      expect(again.headers.get("Location")).toBe("/");
    },
  );

  it("answers a wrong password and an unknown e-mail with the same message", async () => {
    const email = uniqueEmail("wrong");
    await createPerson({ email, password, roles: ["buyer"] });
    const wrongPassword = await postForm("/sign-in", {
      email,
      password: "not-the-password",
    });
    const unknownEmail = await postForm("/sign-in", {
      email: uniqueEmail("nobody"),
      password: "whatever-it-is",
    });
    expect(wrongPassword.status).toBe(401);
    expect(unknownEmail.status).toBe(401);
    expect(await wrongPassword.text()).toContain(
      "E-mail or password is wrong.",
    );
    expect(await unknownEmail.text()).toContain("E-mail or password is wrong.");
    expect(sessionCookieFrom(wrongPassword)).toBeNull();
  });

  it("gives field messages for a malformed e-mail and keeps nothing", async () => {
    const response = await postForm("/sign-in", {
      email: "not-an-address",
      password: "",
    });
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain("Enter a valid e-mail address.");
    expect(html).toContain("Enter your password.");
  });
});

describe("API sign-in", () => {
  it("answers 200 with the person and sets the session cookie", async () => {
    const email = uniqueEmail("api");
    await createPerson({
      email,
      password,
      roles: ["builder", "storekeeper"],
      name: "Api Person",
    });
    const response = await sendJson("POST", "/api/v1/sessions", {
      email,
      password,
    });
    expect(response.status).toBe(200);
    expect(await response.json()).toEqual({
      user: { email, name: "Api Person", roles: ["builder", "storekeeper"] },
    });
    const cookie = sessionCookieFrom(response)!;
    const me = await get("/api/v1/me", cookie);
    expect(me.status).toBe(200);
  });

  it("answers 401 with a message for wrong credentials and 400 for a bad body", async () => {
    const wrong = await sendJson("POST", "/api/v1/sessions", {
      email: uniqueEmail("nobody"),
      password: "x",
    });
    expect(wrong.status).toBe(401);
    expect(await wrong.json()).toEqual({
      error: { message: "E-mail or password is wrong." },
    });

    const bad = await sendJson("POST", "/api/v1/sessions", { email: "nope" });
    expect(bad.status).toBe(400);
    const body = (await bad.json()) as {
      error: { fields: Record<string, string[]> };
    };
    expect(Object.keys(body.error.fields).sort()).toEqual([
      "email",
      "password",
    ]);

    const notJson = await fetch(`${baseUrl()}/api/v1/sessions`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: "{not json",
    });
    expect(notJson.status).toBe(400);
  });

  it("signs out with DELETE: the old cookie no longer works", async () => {
    const email = uniqueEmail("signout");
    await createPerson({ email, password, roles: ["manager"] });
    const cookie = await signIn(email, password);
    const response = await sendJson(
      "DELETE",
      "/api/v1/sessions",
      undefined,
      cookie,
    );
    expect(response.status).toBe(204);
    expect((await get("/api/v1/me", cookie)).status).toBe(401);
  });
});

/** Removes every count of one throttle rule, so a test that fills it leaves the next a clean start. */
async function clearCounts(rule: string): Promise<void> {
  await testDatabase().query("DELETE FROM attempt_counters WHERE rule = ?", [
    rule,
  ]);
}

/** The count of one throttle rule for one subject (e-mail or address), 0 when there is none. */
async function countOf(rule: string, subject: string): Promise<number> {
  const [rows] = await testDatabase().query(
    "SELECT attempts FROM attempt_counters WHERE rule = ? AND subject = ? AND window_ends_at > UTC_TIMESTAMP(3)",
    [rule, subject],
  );
  return Number((rows as { attempts: number }[])[0]?.attempts ?? 0);
}

interface ApiError {
  error: { message: string };
}

describe("throttle", () => {
  it("refuses the 6th attempt within 15 minutes with 429 and Retry-After, even with the right password", async () => {
    const email = uniqueEmail("throttle");
    await createPerson({ email, password, roles: ["buyer"] });
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const response = await sendJson("POST", "/api/v1/sessions", {
        email,
        password: `wrong-${attempt}`,
      });
      expect(response.status).toBe(401);
    }
    const sixth = await sendJson("POST", "/api/v1/sessions", {
      email,
      password,
    });
    expect(sixth.status).toBe(429);
    const retryAfter = Number(sixth.headers.get("Retry-After"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);

    const page = await postForm("/sign-in", { email, password });
    expect(page.status).toBe(429);
    expect(page.headers.get("Retry-After")).toBeTruthy();
  });

  it("lets 50 parallel wrong passwords for one account have 5 checked, no more, and then refuses the right one with a message that says why", async () => {
    const email = uniqueEmail("parallel");
    await createPerson({ email, password, roles: ["buyer"] });
    const answers = await Promise.all(
      Array.from({ length: 50 }, (_, attempt) =>
        sendJson("POST", "/api/v1/sessions", {
          email,
          password: `wrong-${attempt}`,
        }),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    // 401: the password was checked and was wrong; 429: refused unchecked.
    expect(statuses.filter((status) => status === 401)).toHaveLength(5);
    expect(statuses.filter((status) => status === 429)).toHaveLength(45);

    const right = await sendJson("POST", "/api/v1/sessions", {
      email,
      password,
    });
    expect(right.status).toBe(429);
    expect(sessionCookieFrom(right)).toBeNull();
    const message = ((await right.json()) as ApiError).error.message;
    expect(message).toMatch(
      /^Too many wrong passwords for this account: sign-in to it is paused for \d+ minutes?\./,
    );
    expect(message).toContain("Forgotten your password?");

    const page = await postForm("/sign-in", { email, password });
    expect(page.status).toBe(429);
    expect(await page.text()).toContain(
      "Too many wrong passwords for this account",
    );
  });

  it("counts failures in the database, per account and per address; a right password counts none and clears the account's", async () => {
    await clearCounts("sign-in-address");
    const email = uniqueEmail("counted");
    await createPerson({ email, password, roles: ["buyer"] });
    await sendJson("POST", "/api/v1/sessions", { email, password: "wrong" });
    expect(await countOf("sign-in-account", email)).toBe(1);
    expect(await countOf("sign-in-address", "127.0.0.1")).toBe(1);

    const other = uniqueEmail("counted-other");
    await createPerson({ email: other, password, roles: ["buyer"] });
    for (let time = 0; time < 3; time += 1) await signIn(other, password);
    await signIn(email, password);
    expect(await countOf("sign-in-account", email)).toBe(0);
    expect(await countOf("sign-in-address", "127.0.0.1")).toBe(1);
  });

  it("lifts an account's pause when the person sets a new password from an e-mailed link", async () => {
    const email = uniqueEmail("paused");
    await createPerson({ email, password, roles: ["buyer"] });
    for (let attempt = 1; attempt <= 5; attempt += 1) {
      await sendJson("POST", "/api/v1/sessions", {
        email,
        password: `wrong-${attempt}`,
      });
    }
    expect(
      (await sendJson("POST", "/api/v1/sessions", { email, password })).status,
    ).toBe(429);
    expect((await postForm("/forgot-password", { email })).status).toBe(200);
    const token = new URL(
      linkIn(await waitForMessage(email, /new Turnledger password/)),
    ).searchParams.get("token")!;
    const set = await postForm("/set-password", {
      token,
      password: "a-fresh-password",
      confirmPassword: "a-fresh-password",
    });
    expect(set.status).toBe(302);
    await signIn(email, "a-fresh-password");
  });

  it("pauses sign-in from one address after 100 failures on any accounts, and says so", async () => {
    await clearCounts("sign-in-address");
    try {
      for (let batch = 0; batch < 10; batch += 1) {
        const answers = await Promise.all(
          Array.from({ length: 10 }, () =>
            sendJson("POST", "/api/v1/sessions", {
              email: uniqueEmail("spray"),
              password: "a-common-password",
            }),
          ),
        );
        expect(answers.map((answer) => answer.status)).toEqual(
          Array(10).fill(401),
        );
      }
      const email = uniqueEmail("behind-proxy");
      await createPerson({ email, password, roles: ["buyer"] });
      const refused = await sendJson("POST", "/api/v1/sessions", {
        email,
        password,
      });
      expect(refused.status).toBe(429);
      expect(Number(refused.headers.get("Retry-After"))).toBeGreaterThan(0);
      expect(((await refused.json()) as ApiError).error.message).toMatch(
        /^Too many failed sign-ins from your network address: sign-in from it is paused for \d+ minutes?\./,
      );
      // The person's own account was never counted against.
      expect(await countOf("sign-in-account", email)).toBe(0);
    } finally {
      await clearCounts("sign-in-address");
    }
  });
});

describe("deactivated person", () => {
  it("cannot sign in, and their open session ends at once", async () => {
    const adminEmail = uniqueEmail("admin");
    await createPerson({ email: adminEmail, password, roles: ["admin"] });
    const adminCookie = await signIn(adminEmail, password);

    const email = uniqueEmail("leaver");
    const userId = await createPerson({
      email,
      password,
      roles: ["storekeeper"],
    });
    const cookie = await signIn(email, password);
    expect((await get("/api/v1/me", cookie)).status).toBe(200);

    const deactivate = await postForm(
      `/admin/people/${userId}`,
      { intent: "deactivate" },
      adminCookie,
    );
    expect(deactivate.status).toBe(302);

    expect((await get("/api/v1/me", cookie)).status).toBe(401);
    expect((await get("/", cookie)).status).toBe(302);
    const again = await sendJson("POST", "/api/v1/sessions", {
      email,
      password,
    });
    expect(again.status).toBe(401);
    expect(await again.json()).toEqual({
      error: { message: "E-mail or password is wrong." },
    });
  });
});
