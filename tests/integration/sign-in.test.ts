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

  it("counts failures in the database, so they hold for any app server", async () => {
    const email = uniqueEmail("counted");
    await sendJson("POST", "/api/v1/sessions", { email, password: "wrong" });
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS failures FROM failed_sign_ins WHERE email = ?",
      [email],
    );
    expect((rows as { failures: number }[])[0]!.failures).toBe(1);
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
    expect(deactivate.status).toBe(200);

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
