import { afterAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
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

const password = "token-owner-password";

async function createToken(
  cookie: string,
  fields: Record<string, string | string[]>,
): Promise<string> {
  const response = await postForm(
    "/account",
    {
      intent: "create",
      lifetimeDays: "90",
      scope: "chosen",
      currentPassword: password,
      ...fields,
    },
    cookie,
  );
  expect(response.status).toBe(200);
  const token = (await response.text()).match(/tl_[A-Za-z0-9_-]{43}/)?.[0];
  if (!token) throw new Error("no token on the page");
  return token;
}

const withToken = (path: string, token: string) =>
  fetch(`${baseUrl()}${path}`, {
    headers: { Authorization: `Bearer ${token}` },
    redirect: "manual",
  });

describe("personal API tokens", () => {
  it("act for their owner with the roles chosen, and are stored hashed", async () => {
    const email = uniqueEmail("tokens");
    await createPerson({
      email,
      password,
      roles: ["buyer", "storekeeper"],
      name: "Token Owner",
    });
    const cookie = await signIn(email, password);
    const token = await createToken(cookie, {
      name: "bench scale",
      roles: ["storekeeper"],
    });

    const me = await withToken("/api/v1/me", token);
    expect(me.status).toBe(200);
    expect(await me.json()).toEqual({
      user: { email, name: "Token Owner", roles: ["storekeeper"] },
    });

    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS found FROM api_tokens WHERE token_hash = ?",
      [token],
    );
    expect((rows as { found: number }[])[0]!.found).toBe(0);
  });

  it("cannot be given a role the owner does not hold", async () => {
    const email = uniqueEmail("greedy");
    await createPerson({ email, password, roles: ["buyer"] });
    const cookie = await signIn(email, password);
    const response = await postForm(
      "/account",
      {
        intent: "create",
        name: "x",
        scope: "chosen",
        roles: ["admin"],
        lifetimeDays: "30",
        currentPassword: password,
      },
      cookie,
    );
    expect(response.status).toBe(400);
    expect(await response.text()).toContain(
      "A token can only have roles you hold yourself.",
    );
  });

  it("lose a role when the owner loses it, and stop working when revoked", async () => {
    const email = uniqueEmail("shrink");
    const userId = await createPerson({
      email,
      password,
      roles: ["admin", "buyer"],
    });
    const cookie = await signIn(email, password);
    const token = await createToken(cookie, {
      name: "script",
      roles: ["admin", "buyer"],
    });
    expect((await withToken("/api/v1/outbox", token)).status).toBe(200);

    await testDatabase().query(
      "DELETE FROM user_roles WHERE user_id = ? AND role = 'admin'",
      [userId],
    );
    expect((await withToken("/api/v1/outbox", token)).status).toBe(403);

    const [rows] = await testDatabase().query(
      "SELECT id FROM api_tokens WHERE user_id = ?",
      [userId],
    );
    const tokenId = (rows as { id: number }[])[0]!.id;
    const revoke = await postForm(
      "/account",
      { intent: "revoke", tokenId: String(tokenId) },
      cookie,
    );
    // Done: back to the account page, with the one-time message.
    expect(revoke.status).toBe(302);
    expect(revoke.headers.get("location")).toBe("/account");
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
  });

  it("by default act with the owner's roles at the time of use", async () => {
    const email = uniqueEmail("follows");
    const userId = await createPerson({ email, password, roles: ["buyer"] });
    const cookie = await signIn(email, password);
    const token = await createToken(cookie, {
      name: "follows me",
      scope: "all",
    });
    expect(
      (
        (await (await withToken("/api/v1/me", token)).json()) as {
          user: { roles: string[] };
        }
      ).user.roles,
    ).toEqual(["buyer"]);
    await testDatabase().query(
      "INSERT INTO user_roles (user_id, role) VALUES (?, 'storekeeper')",
      [userId],
    );
    const roles = (
      (await (await withToken("/api/v1/me", token)).json()) as {
        user: { roles: string[] };
      }
    ).user.roles;
    expect(roles.sort()).toEqual(["buyer", "storekeeper"]);
    await testDatabase().query("UPDATE users SET active = 0 WHERE id = ?", [
      userId,
    ]);
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
  });

  it("refuse expired and unknown tokens, and never open pages", async () => {
    const email = uniqueEmail("expiry");
    const userId = await createPerson({ email, password, roles: ["manager"] });
    const cookie = await signIn(email, password);
    const token = await createToken(cookie, {
      name: "old",
      roles: ["manager"],
    });
    expect((await withToken("/", token)).status).toBe(302);
    await testDatabase().query(
      "UPDATE api_tokens SET expires_at = NOW() - INTERVAL 1 MINUTE WHERE user_id = ?",
      [userId],
    );
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
    expect((await withToken("/api/v1/me", "tl_not-a-real-token")).status).toBe(
      401,
    );
    expect((await get("/api/v1/me")).status).toBe(401);
  });
});

/** The person's tokens as stored: whether each is revoked, and its lifetime in days (null: never expires). */
async function storedTokens(userId: string) {
  const [rows] = await testDatabase().query(
    `SELECT revoked_at IS NOT NULL AS revoked,
            ROUND(TIMESTAMPDIFF(SECOND, created_at, expires_at) / 86400) AS lifetimeDays
       FROM api_tokens WHERE user_id = ? ORDER BY id`,
    [userId],
  );
  return (rows as { revoked: number; lifetimeDays: number | null }[]).map(
    (row) => ({
      revoked: Boolean(Number(row.revoked)),
      lifetimeDays: row.lifetimeDays === null ? null : Number(row.lifetimeDays),
    }),
  );
}

describe("creating a token", () => {
  it("asks for the current password again: a wrong one is a field message and makes no token", async () => {
    const email = uniqueEmail("token-password");
    const userId = await createPerson({ email, password, roles: ["buyer"] });
    const cookie = await signIn(email, password);
    const wrong = await postForm(
      "/account",
      {
        intent: "create",
        name: "stolen laptop",
        scope: "all",
        lifetimeDays: "30",
        currentPassword: "not-my-password",
      },
      cookie,
    );
    expect(wrong.status).toBe(400);
    const html = await wrong.text();
    expect(html).toContain("Your password is wrong.");
    expect(html).not.toMatch(/tl_[A-Za-z0-9_-]{43}/);
    const missing = await postForm(
      "/account",
      { intent: "create", name: "x", scope: "all", lifetimeDays: "30" },
      cookie,
    );
    expect(missing.status).toBe(400);
    expect(await missing.text()).toContain("Enter your current password.");
    expect(await storedTokens(userId)).toEqual([]);
    // Still signed in, and the right password makes the token.
    await createToken(cookie, { name: "bench scale", scope: "all" });
    expect(await storedTokens(userId)).toHaveLength(1);
  });

  it("lives a year at most, unless an admin makes one for themselves", async () => {
    const email = uniqueEmail("token-lifetime");
    const userId = await createPerson({ email, password, roles: ["buyer"] });
    const cookie = await signIn(email, password);
    const forever = await postForm(
      "/account",
      {
        intent: "create",
        name: "forever",
        scope: "all",
        lifetimeDays: "never",
        currentPassword: password,
      },
      cookie,
    );
    expect(forever.status).toBe(400);
    expect(await forever.text()).toContain(
      "A token lives a year at most; only admins may make one that never expires.",
    );
    await createToken(cookie, {
      name: "yearly",
      scope: "all",
      lifetimeDays: "365",
    });
    expect(await storedTokens(userId)).toEqual([
      { revoked: false, lifetimeDays: 365 },
    ]);

    const adminEmail = uniqueEmail("token-admin");
    const adminId = await createPerson({
      email: adminEmail,
      password,
      roles: ["admin"],
    });
    const admin = await signIn(adminEmail, password);
    await createToken(admin, {
      name: "monitoring",
      scope: "all",
      lifetimeDays: "never",
    });
    expect(await storedTokens(adminId)).toEqual([
      { revoked: false, lifetimeDays: null },
    ]);
  });
});

describe("a person's tokens", () => {
  async function adminCookie(): Promise<string> {
    const email = uniqueEmail("token-admin");
    await createPerson({ email, password, roles: ["admin"] });
    return signIn(email, password);
  }

  async function personWithToken(roles: ("buyer" | "storekeeper")[]) {
    const email = uniqueEmail("token-holder");
    const userId = await createPerson({ email, password, roles });
    const cookie = await signIn(email, password);
    const token = await createToken(cookie, { name: "script", scope: "all" });
    expect((await withToken("/api/v1/me", token)).status).toBe(200);
    return { email, userId, cookie, token };
  }

  it("are revoked, and the sessions ended, by a password reset", async () => {
    const { email, userId, cookie, token } = await personWithToken(["buyer"]);
    expect((await postForm("/forgot-password", { email })).status).toBe(200);
    const resetToken = new URL(
      linkIn(await waitForMessage(email, /new Turnledger password/)),
    ).searchParams.get("token")!;
    const set = await postForm("/set-password", {
      token: resetToken,
      password: "a-brand-new-password",
      confirmPassword: "a-brand-new-password",
    });
    expect(set.status).toBe(302);
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
    expect((await get("/api/v1/me", cookie)).status).toBe(401);
    expect((await get("/api/v1/me", sessionCookieFrom(set)!)).status).toBe(200);
    expect(await storedTokens(userId)).toEqual([
      { revoked: true, lifetimeDays: 90 },
    ]);
  });

  it("are revoked by an admin's deactivation, and stay revoked when the person is reactivated", async () => {
    const admin = await adminCookie();
    const { userId, token } = await personWithToken(["buyer"]);
    expect(
      (
        await postForm(
          `/admin/people/${userId}`,
          { intent: "deactivate" },
          admin,
        )
      ).status,
    ).toBe(302);
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
    expect(
      (
        await postForm(
          `/admin/people/${userId}`,
          { intent: "reactivate" },
          admin,
        )
      ).status,
    ).toBe(302);
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
    expect(await storedTokens(userId)).toEqual([
      { revoked: true, lifetimeDays: 90 },
    ]);
  });

  it("are revoked, and the sessions ended, when an admin changes the person's roles", async () => {
    const admin = await adminCookie();
    const { userId, cookie, token } = await personWithToken(["buyer"]);
    const saved = await postForm(
      `/admin/people/${userId}`,
      { intent: "save-roles", roles: ["buyer", "storekeeper"] },
      admin,
    );
    expect(saved.status).toBe(302);
    expect((await withToken("/api/v1/me", token)).status).toBe(401);
    expect((await get("/api/v1/me", cookie)).status).toBe(401);
    expect(await storedTokens(userId)).toEqual([
      { revoked: true, lifetimeDays: 90 },
    ]);
    // The admin's own session goes on.
    expect((await get("/api/v1/me", admin)).status).toBe(200);
  });
});
