/**
 * E-mailed links, personal API tokens and sessions, beyond what the account
 * tests check: links are single-use (invitations too), a newer reset link
 * leaves the older one valid until one is used, an expired or deactivated one
 * is refused, a new password ends every session, a token is shown once, no
 * token is kept in clear text in any table that holds it, a session id read
 * from the table signs no one in, and no session outlives 30 days. See
 * docs/decisions/003, 012, 015 and 017.
 */
import { createHash } from "node:crypto";
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
  linkIn,
  receivedMessages,
  waitForMessage,
} from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

afterAll(closeTestDatabase);

const resetSubject = /new Turnledger password/;

/** Asks for a reset link and returns the token of the message it sends (not an earlier one). */
async function requestReset(email: string): Promise<string> {
  const resetTokens = async () =>
    (await receivedMessages())
      .filter(
        (message) =>
          message.to.includes(email) && resetSubject.test(message.subject),
      )
      .map((message) => new URL(linkIn(message)).searchParams.get("token")!);
  const earlier = new Set(await resetTokens());
  const response = await postForm("/forgot-password", { email });
  expect(response.status).toBe(200);
  const started = Date.now();
  while (Date.now() - started < 10_000) {
    const fresh = (await resetTokens()).find((token) => !earlier.has(token));
    if (fresh) return fresh;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`no new reset message for ${email}`);
}

function setPassword(token: string, password: string) {
  return postForm("/set-password", {
    token,
    password,
    confirmPassword: password,
  });
}

const sessionCookieName = "turnledger_session";

function sha256Hex(text: string): string {
  return createHash("sha256").update(text).digest("hex");
}

/** The ids of the person's rows in lucia's sessions table. */
async function storedSessionIds(userId: string): Promise<string[]> {
  const [rows] = await testDatabase().query(
    "SELECT id FROM sessions WHERE user_id = ?",
    [userId],
  );
  return (rows as { id: string }[]).map((row) => row.id);
}

/** Every text column of every table in the test database. */
async function textColumns(): Promise<{ table: string; column: string }[]> {
  const [rows] = await testDatabase().query(
    `SELECT table_name AS \`table\`, column_name AS \`column\`
       FROM information_schema.columns
      WHERE table_schema = DATABASE()
        AND data_type IN ('char', 'varchar', 'tinytext', 'text', 'mediumtext', 'longtext', 'json')`,
  );
  return rows as { table: string; column: string }[];
}

/** The table.column places that hold the text anywhere in them. */
async function placesHolding(text: string): Promise<string[]> {
  const found: string[] = [];
  for (const { table, column } of await textColumns()) {
    const [rows] = await testDatabase().query(
      `SELECT COUNT(*) AS n FROM \`${table}\` WHERE LOCATE(?, \`${column}\`) > 0`,
      [text],
    );
    if (Number((rows as { n: number }[])[0]!.n) > 0)
      found.push(`${table}.${column}`);
  }
  return found;
}

describe("password-reset links", () => {
  it("leave the earlier link valid when a new one is asked for; using either ends the other", async () => {
    const email = uniqueEmail("two-links");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const first = await requestReset(email);
    const second = await requestReset(email);
    expect(second).not.toBe(first);
    expect((await setPassword(first, "first-link-password")).status).toBe(302);
    expect((await setPassword(second, "second-link-password")).status).toBe(
      410,
    );
    await signIn(email, "first-link-password");
  });

  it("end every session of the person when used, and work once", async () => {
    const email = uniqueEmail("reset-sessions");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["manager"],
    });
    const laptop = await signIn(email, "the-old-password");
    const phone = await signIn(email, "the-old-password");
    expect(phone).not.toBe(laptop);
    const token = await requestReset(email);
    const used = await setPassword(token, "the-new-password");
    expect(used.status).toBe(302);
    const fresh = sessionCookieFrom(used)!;
    expect((await get("/api/v1/me", laptop)).status).toBe(401);
    expect((await get("/api/v1/me", phone)).status).toBe(401);
    expect((await get("/api/v1/me", fresh)).status).toBe(200);
    expect((await setPassword(token, "yet-another-password")).status).toBe(410);
    await expect(signIn(email, "yet-another-password")).rejects.toThrow();
  });

  it("are refused for a person deactivated after the link was sent", async () => {
    const email = uniqueEmail("reset-deactivated");
    const userId = await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const token = await requestReset(email);
    await testDatabase().query("UPDATE users SET active = 0 WHERE id = ?", [
      userId,
    ]);
    const response = await setPassword(token, "the-new-password");
    expect(response.status).toBe(410);
    expect(sessionCookieFrom(response)).toBeNull();
  });

  it("are never told to another site: the page's Referrer-Policy keeps the address home", async () => {
    const email = uniqueEmail("reset-referrer");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const token = await requestReset(email);
    const page = await get(`/set-password?token=${token}`);
    expect(page.status).toBe(200);
    expect(page.headers.get("Referrer-Policy")).toBe("same-origin");
    const html = await page.text();
    // The page loads nothing from elsewhere.
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//i);
  });
});

describe("invitation links", () => {
  async function invite(): Promise<{ email: string; token: string }> {
    const adminEmail = uniqueEmail("inviter");
    await createPerson({
      email: adminEmail,
      password: "admin-password-1",
      roles: ["admin"],
    });
    const admin = await signIn(adminEmail, "admin-password-1");
    const email = uniqueEmail("invitee");
    const response = await postForm(
      "/admin/people",
      { name: "Invited Person", email, roles: ["builder"] },
      admin,
    );
    // Sent: back to the people page, with the flash message.
    expect(response.status).toBe(302);
    const message = await waitForMessage(email, /invited to Turnledger/);
    const token = new URL(linkIn(message)).searchParams.get("token")!;
    return { email, token };
  }

  it("work once", async () => {
    const { email, token } = await invite();
    expect((await setPassword(token, "invitee-password")).status).toBe(302);
    const again = await setPassword(token, "taken-over-password");
    expect(again.status).toBe(410);
    expect(sessionCookieFrom(again)).toBeNull();
    await signIn(email, "invitee-password");
    await expect(signIn(email, "taken-over-password")).rejects.toThrow();
  });

  it("are refused once expired, and stored with a seven-day life", async () => {
    const { email, token } = await invite();
    const [rows] = await testDatabase().query(
      `SELECT t.id, TIMESTAMPDIFF(SECOND, t.created_at, t.expires_at) AS lifetime
         FROM email_tokens t JOIN users u ON u.id = t.user_id
        WHERE u.email = ? AND t.purpose = 'invitation'`,
      [email],
    );
    const row = (rows as { id: number; lifetime: number }[])[0]!;
    expect(row.lifetime).toBeGreaterThanOrEqual(7 * 24 * 3600 - 1);
    expect(row.lifetime).toBeLessThanOrEqual(7 * 24 * 3600);
    await testDatabase().query(
      "UPDATE email_tokens SET expires_at = NOW() - INTERVAL 1 SECOND WHERE id = ?",
      [row.id],
    );
    expect((await setPassword(token, "too-late-password")).status).toBe(410);
    expect(await (await get(`/set-password?token=${token}`)).text()).toContain(
      "has been used or has expired",
    );
  });
});

describe("personal API tokens", () => {
  it("are shown once, never again on the account page, and a near miss is refused", async () => {
    const email = uniqueEmail("token-once");
    await createPerson({ email, password: "token-password", roles: ["buyer"] });
    const cookie = await signIn(email, "token-password");
    const created = await postForm(
      "/account",
      {
        intent: "create",
        name: "shown once",
        scope: "all",
        lifetimeDays: "30",
        currentPassword: "token-password",
      },
      cookie,
    );
    expect(created.status).toBe(200);
    const token = (await created.text()).match(/tl_[A-Za-z0-9_-]{43}/)?.[0];
    expect(token).toBeTruthy();
    const later = await (await get("/account", cookie)).text();
    expect(later).toContain("shown once");
    expect(later).toContain(token!.slice(0, 10));
    expect(later).not.toContain(token!);

    const bearer = (value: string) =>
      fetch(`${baseUrl()}/api/v1/me`, {
        headers: { Authorization: `Bearer ${value}` },
      });
    expect((await bearer(token!)).status).toBe(200);
    const last = token!.at(-1) === "A" ? "B" : "A";
    expect((await bearer(`${token!.slice(0, -1)}${last}`)).status).toBe(401);
    expect((await bearer(token!.slice(0, -1))).status).toBe(401);
    expect((await bearer(`${token!}A`)).status).toBe(401);
  });
});

describe("no token in clear text", () => {
  it("in any table, for an API token", async () => {
    const email = uniqueEmail("token-scan");
    await createPerson({ email, password: "token-password", roles: ["buyer"] });
    const cookie = await signIn(email, "token-password");
    const created = await postForm(
      "/account",
      {
        intent: "create",
        name: "scanned",
        scope: "all",
        lifetimeDays: "30",
        currentPassword: "token-password",
      },
      cookie,
    );
    const token = (await created.text()).match(/tl_[A-Za-z0-9_-]{43}/)![0];
    // Used once, so last_used_at is written too.
    const me = await fetch(`${baseUrl()}/api/v1/me`, {
      headers: { Authorization: `Bearer ${token}` },
    });
    expect(me.status).toBe(200);
    expect(await placesHolding(token)).toEqual([]);
    // The scan does find what is there: the prefix kept to tell tokens apart.
    expect(await placesHolding(token.slice(0, 10))).toEqual([
      "api_tokens.token_prefix",
    ]);
  });

  it("in any table, sessions included, for a session cookie: the table holds its SHA-256", async () => {
    const email = uniqueEmail("session-scan");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "token-password");
    const value = cookie.slice(`${sessionCookieName}=`.length);
    expect(value.length).toBeGreaterThanOrEqual(20);
    // The session row is keyed by the SHA-256 of the cookie's token (docs/decisions/015).
    expect(await placesHolding(value)).toEqual([]);
    expect(await storedSessionIds(userId)).toEqual([sha256Hex(value)]);
    // The scan does find what is there.
    expect(await placesHolding(sha256Hex(value))).toEqual(["sessions.id"]);
  });

  it("in the token table or anywhere else, the mail outbox included once sent, for a reset link", async () => {
    const email = uniqueEmail("reset-scan");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const token = await requestReset(email);
    // The outbox keeps a message's one-time link only until SMTP has taken it
    // (app/mail/one-time-link.ts); it is marked sent just after the fake got it.
    await expect.poll(() => placesHolding(token)).toEqual([]);
    const [rows] = await testDatabase().query(
      "SELECT token_hash FROM email_tokens t JOIN users u ON u.id = t.user_id WHERE u.email = ?",
      [email],
    );
    const stored = (rows as { token_hash: string }[])[0]!.token_hash;
    expect(stored).toMatch(/^[0-9a-f]{64}$/);
    expect(stored).not.toContain(token);
  });
});

describe("session cookies", () => {
  it("are refused when their value is a stored session id (someone who read the table)", async () => {
    const email = uniqueEmail("session-forged");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["manager"],
    });
    const cookie = await signIn(email, "token-password");
    const [storedId] = await storedSessionIds(userId);
    expect(storedId).toMatch(/^[0-9a-f]{64}$/);
    const forged = `${sessionCookieName}=${storedId}`;

    expect((await get("/api/v1/me", forged)).status).toBe(401);
    const page = await get("/account", forged);
    expect(page.status).toBe(302);
    expect(page.headers.get("Location")).toBe("/sign-in?redirectTo=%2Faccount");
    // The real cookie still works, and its session was not touched.
    expect((await get("/api/v1/me", cookie)).status).toBe(200);
    expect(await storedSessionIds(userId)).toEqual([storedId]);
  });

  it("are extended with the same token once half their life has passed", async () => {
    const email = uniqueEmail("session-extend");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "token-password");
    // 14-day sessions are extended when fewer than 7 days are left (lucia 3).
    await testDatabase().query(
      "UPDATE sessions SET expires_at = UTC_TIMESTAMP() + INTERVAL 1 DAY WHERE user_id = ?",
      [userId],
    );
    const page = await get("/account", cookie);
    expect(page.status).toBe(200);
    expect(sessionCookieFrom(page)).toBe(cookie);
    const [rows] = await testDatabase().query(
      "SELECT TIMESTAMPDIFF(HOUR, UTC_TIMESTAMP(), expires_at) AS hours FROM sessions WHERE user_id = ?",
      [userId],
    );
    const hoursLeft = (rows as { hours: number }[]).map((row) =>
      Number(row.hours),
    );
    expect(hoursLeft).toHaveLength(1);
    expect(hoursLeft[0]).toBeGreaterThanOrEqual(14 * 24 - 1);
    expect(hoursLeft[0]).toBeLessThanOrEqual(14 * 24);
    expect((await get("/api/v1/me", cookie)).status).toBe(200);
    expect(await storedSessionIds(userId)).toEqual([
      sha256Hex(cookie.slice(`${sessionCookieName}=`.length)),
    ]);
  });

  it("end 30 days after sign-in even when extended since: the cookie is cleared and the row removed", async () => {
    const email = uniqueEmail("session-absolute");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "token-password");
    // Used every day since: extended 13 days ago, 13 days of idle life left.
    await testDatabase().query(
      `UPDATE sessions
          SET started_at = UTC_TIMESTAMP() - INTERVAL 30 DAY - INTERVAL 1 MINUTE,
              expires_at = UTC_TIMESTAMP() + INTERVAL 13 DAY
        WHERE user_id = ?`,
      [userId],
    );
    const page = await get("/account", cookie);
    expect(page.status).toBe(302);
    expect(page.headers.get("Location")).toBe("/sign-in?redirectTo=%2Faccount");
    const cleared = page.headers
      .getSetCookie()
      .find((header) => header.startsWith(`${sessionCookieName}=`));
    expect(cleared).toMatch(/^turnledger_session=;.*Max-Age=0/i);
    expect(await storedSessionIds(userId)).toEqual([]);
    expect((await get("/api/v1/me", cookie)).status).toBe(401);
  });

  it("are not extended past their 30th day", async () => {
    const email = uniqueEmail("session-near-end");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "token-password");
    // Started 28 days ago, 1 day of idle life left: an extension by 14 days
    // would end on day 42; it ends on day 30 instead.
    await testDatabase().query(
      `UPDATE sessions
          SET started_at = UTC_TIMESTAMP() - INTERVAL 28 DAY,
              expires_at = UTC_TIMESTAMP() + INTERVAL 1 DAY
        WHERE user_id = ?`,
      [userId],
    );
    expect((await get("/account", cookie)).status).toBe(200);
    const [rows] = await testDatabase().query(
      "SELECT TIMESTAMPDIFF(MINUTE, started_at, expires_at) AS minutes FROM sessions WHERE user_id = ?",
      [userId],
    );
    const minutes = (rows as { minutes: number }[]).map((row) =>
      Number(row.minutes),
    );
    expect(minutes).toHaveLength(1);
    expect(minutes[0]).toBeLessThanOrEqual(30 * 24 * 60);
    expect(minutes[0]).toBeGreaterThanOrEqual(30 * 24 * 60 - 1);
  });

  it("end by their hash on sign-out, leaving the person's other sessions", async () => {
    const email = uniqueEmail("session-sign-out");
    const userId = await createPerson({
      email,
      password: "token-password",
      roles: ["buyer"],
    });
    const laptop = await signIn(email, "token-password");
    const phone = await signIn(email, "token-password");
    const valueOf = (cookie: string) =>
      cookie.slice(`${sessionCookieName}=`.length);
    expect((await storedSessionIds(userId)).sort()).toEqual(
      [sha256Hex(valueOf(laptop)), sha256Hex(valueOf(phone))].sort(),
    );
    const signOut = await sendJson(
      "DELETE",
      "/api/v1/sessions",
      undefined,
      laptop,
    );
    expect(signOut.status).toBe(204);
    expect((await get("/api/v1/me", laptop)).status).toBe(401);
    expect((await get("/api/v1/me", phone)).status).toBe(200);
    expect(await storedSessionIds(userId)).toEqual([sha256Hex(valueOf(phone))]);
  });
});
