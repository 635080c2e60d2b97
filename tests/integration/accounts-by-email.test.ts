import { afterAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  postForm,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import { demoPassword } from "../../seed/demo-people";
import { linkIn, waitForMessage } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

afterAll(closeTestDatabase);

/** The path and query of a link in an e-mail, to follow on the test server. */
function pathOf(link: string): string {
  const url = new URL(link);
  return `${url.pathname}${url.search}`;
}

describe("password reset", () => {
  it("mails a link through SMTP that sets a new password once", async () => {
    const email = uniqueEmail("reset");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });

    const request = await postForm("/forgot-password", { email });
    expect(request.status).toBe(200);
    const message = await waitForMessage(email, /new Turnledger password/);
    const link = pathOf(linkIn(message));
    expect(link).toMatch(/^\/set-password\?token=/);
    const token = new URL(link, "http://x").searchParams.get("token")!;

    // Only the hash is stored, never the token itself.
    const [rows] = await testDatabase().query(
      "SELECT token_hash FROM email_tokens WHERE token_hash = ?",
      [token],
    );
    expect(rows).toHaveLength(0);

    expect(await (await get(link)).text()).toContain("Choose a new password");
    const set = await postForm("/set-password", {
      token,
      password: "the-new-password",
      confirmPassword: "the-new-password",
    });
    expect(set.status).toBe(302);
    expect(sessionCookieFrom(set)).toBeTruthy();
    await signIn(email, "the-new-password");

    const second = await postForm("/set-password", {
      token,
      password: "a-third-password",
      confirmPassword: "a-third-password",
    });
    expect(second.status).toBe(410);
    expect(await (await get(link)).text()).toContain(
      "has been used or has expired",
    );
    await signIn(email, "the-new-password");
  });

  it("refuses an expired link", async () => {
    const email = uniqueEmail("expired");
    const userId = await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    await postForm("/forgot-password", { email });
    const token = new URL(
      linkIn(await waitForMessage(email, /new Turnledger password/)),
    ).searchParams.get("token")!;
    await testDatabase().query(
      "UPDATE email_tokens SET expires_at = NOW() - INTERVAL 1 MINUTE WHERE user_id = ?",
      [userId],
    );
    const set = await postForm("/set-password", {
      token,
      password: "the-new-password",
      confirmPassword: "the-new-password",
    });
    expect(set.status).toBe(410);
    await signIn(email, "the-old-password");
  });

  it("expires reset links after 30 minutes", async () => {
    const email = uniqueEmail("lifetime");
    const userId = await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    await postForm("/forgot-password", { email });
    await waitForMessage(email, /new Turnledger password/);
    const [rows] = await testDatabase().query(
      "SELECT TIMESTAMPDIFF(SECOND, created_at, expires_at) AS lifetime FROM email_tokens WHERE user_id = ?",
      [userId],
    );
    const lifetime = (rows as { lifetime: number }[])[0]!.lifetime;
    expect(lifetime).toBeGreaterThanOrEqual(30 * 60 - 1);
    expect(lifetime).toBeLessThanOrEqual(30 * 60);
  });

  it("answers the same for an unknown address and sends nothing", async () => {
    const email = uniqueEmail("unknown");
    const response = await postForm("/forgot-password", { email });
    expect(response.status).toBe(200);
    expect(await response.text()).toContain("If that address has an account");
    await expect(waitForMessage(email, /./, 1_000)).rejects.toThrow();
  });

  it("refuses the published demo password as a new password, with a field message, and keeps the link", async () => {
    const email = uniqueEmail("demo-password");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    await postForm("/forgot-password", { email });
    const token = new URL(
      linkIn(await waitForMessage(email, /new Turnledger password/)),
    ).searchParams.get("token")!;
    for (const published of new Set(["turnledger-demo", demoPassword()])) {
      const refused = await postForm("/set-password", {
        token,
        password: published,
        confirmPassword: published,
      });
      expect(refused.status).toBe(400);
      expect(await refused.text()).toContain(
        "This password is published with the Turnledger demo; choose another.",
      );
    }
    await expect(signIn(email, "turnledger-demo")).rejects.toThrow();
    const set = await postForm("/set-password", {
      token,
      password: "a-private-password",
      confirmPassword: "a-private-password",
    });
    expect(set.status).toBe(302);
  });

  it("rejects mismatched passwords with a field message", async () => {
    const response = await postForm("/set-password", {
      token: "anything",
      password: "one-password-here",
      confirmPassword: "another-password",
    });
    expect(response.status).toBe(400);
    expect(await response.text()).toContain("The two passwords differ.");
  });
});

describe("invitation", () => {
  it("lets an admin invite a person who sets a password from the e-mail and signs in", async () => {
    const adminEmail = uniqueEmail("inviter");
    await createPerson({
      email: adminEmail,
      password: "admin-password-1",
      roles: ["admin"],
    });
    const adminCookie = await signIn(adminEmail, "admin-password-1");

    const email = uniqueEmail("newcomer");
    const invite = await postForm(
      "/admin/people",
      { name: "New Comer", email, roles: ["builder", "manager"] },
      adminCookie,
    );
    expect(invite.status).toBe(302);
    const invited = await followRedirect(invite, adminCookie);
    expect(await invited.text()).toContain(`Invitation sent to ${email}`);

    const message = await waitForMessage(email, /invited to Turnledger/);
    const token = new URL(linkIn(message)).searchParams.get("token")!;
    // Before the password is set, the account cannot sign in.
    await expect(signIn(email, "")).rejects.toThrow();

    const set = await postForm("/set-password", {
      token,
      password: "newcomer-password",
      confirmPassword: "newcomer-password",
    });
    expect(set.status).toBe(302);
    const cookie = await signIn(email, "newcomer-password");
    const me = (await (await get("/api/v1/me", cookie)).json()) as {
      user: { roles: string[] };
    };
    expect(me.user.roles).toEqual(["builder", "manager"]);

    // The outbox shows the invitation as sent.
    const outbox = (await (
      await get("/api/v1/outbox", adminCookie)
    ).json()) as {
      to: string;
      subject: string;
      sentAt: string | null;
    }[];
    const sent = outbox.find((entry) => entry.to === email);
    expect(sent?.subject).toBe("You are invited to Turnledger");
    expect(sent?.sentAt).toBeTruthy();
  });

  it("refuses a second account with the same e-mail and needs a role", async () => {
    const adminEmail = uniqueEmail("inviter");
    await createPerson({
      email: adminEmail,
      password: "admin-password-1",
      roles: ["admin"],
    });
    const adminCookie = await signIn(adminEmail, "admin-password-1");
    const response = await postForm(
      "/admin/people",
      { name: "Double", email: adminEmail, roles: [] },
      adminCookie,
    );
    expect(response.status).toBe(400);
    const html = await response.text();
    expect(html).toContain("Someone already has an account with this e-mail.");
    expect(html).toContain("Choose at least one role.");
  });

  it("does not let an admin deactivate themselves", async () => {
    const email = uniqueEmail("selfadmin");
    const ownId = await createPerson({
      email,
      password: "admin-password-1",
      roles: ["admin"],
    });
    const cookie = await signIn(email, "admin-password-1");
    const self = await postForm(
      `/admin/people/${ownId}`,
      { intent: "deactivate" },
      cookie,
    );
    expect(self.status).toBe(409);
    expect(await self.text()).toContain("You cannot deactivate yourself.");
    expect((await get("/api/v1/me", cookie)).status).toBe(200);
  });
});
