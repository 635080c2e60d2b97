import { afterAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
  signIn,
  uniqueEmail,
} from "../support/app-client";
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
    { intent: "create", lifetimeDays: "90", scope: "chosen", ...fields },
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
    expect(revoke.status).toBe(200);
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
