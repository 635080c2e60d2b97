/**
 * Asking for a password-reset link, as an attacker would: earlier links stay
 * valid when another is asked for (until one is used), requests are limited
 * per account and per client address, and the answer never waits for SMTP,
 * for an account as for no account. See docs/decisions/017.
 */
import net from "node:net";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { connectAsRoot } from "../../scripts/lib/local-mariadb";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import {
  postForm,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import { AppClient, cleanUp, faultPorts } from "../support/fault-environment";
import { linkIn, receivedMessages } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

afterAll(closeTestDatabase);

const resetSubject = /new Turnledger password/;

/** The tokens of every reset message that reached the address so far. */
async function resetTokens(email: string): Promise<string[]> {
  return (await receivedMessages())
    .filter(
      (message) =>
        message.to.includes(email) && resetSubject.test(message.subject),
    )
    .map((message) => new URL(linkIn(message)).searchParams.get("token")!);
}

/** Waits until the address has received `count` reset messages; their tokens. */
async function waitForResetTokens(
  email: string,
  count: number,
): Promise<string[]> {
  const started = Date.now();
  while (Date.now() - started < 10_000) {
    const tokens = await resetTokens(email);
    if (tokens.length >= count) return tokens;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error(`fewer than ${count} reset messages reached ${email}`);
}

function setPassword(token: string, password: string) {
  return postForm("/set-password", {
    token,
    password,
    confirmPassword: password,
  });
}

describe("earlier reset links", () => {
  it("stay valid when another is asked for; using one ends the others", async () => {
    const email = uniqueEmail("links-kept");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    // The fake lists the newest message first.
    expect((await postForm("/forgot-password", { email })).status).toBe(200);
    const [first] = await waitForResetTokens(email, 1);
    expect((await postForm("/forgot-password", { email })).status).toBe(200);
    const [second] = await waitForResetTokens(email, 2);
    expect(first).not.toBe(second);

    // Someone else asking for a link does not void the one the person holds.
    const used = await setPassword(first!, "first-link-password");
    expect(used.status).toBe(302);
    expect(sessionCookieFrom(used)).toBeTruthy();
    expect((await setPassword(second!, "second-link-password")).status).toBe(
      410,
    );
    await signIn(email, "first-link-password");
  });
});

describe("requests for links", () => {
  it("are limited to 3 an hour per address asked for: the 4th is refused with a message and sends nothing", async () => {
    const email = uniqueEmail("reset-flood");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    for (let request = 1; request <= 3; request += 1) {
      const answer = await postForm("/forgot-password", { email });
      expect(answer.status, `request ${request}`).toBe(200);
    }
    const fourth = await postForm("/forgot-password", { email });
    expect(fourth.status).toBe(429);
    expect(Number(fourth.headers.get("Retry-After"))).toBeGreaterThan(0);
    expect(await fourth.text()).toMatch(
      /Several links have been sent to this address in the last hour/,
    );
    await waitForResetTokens(email, 3);
    await new Promise((resolve) => setTimeout(resolve, 1_000));
    expect(await resetTokens(email)).toHaveLength(3);
  });

  it("are limited the same for an address without an account (the answer tells nothing)", async () => {
    const email = uniqueEmail("reset-nobody");
    for (let request = 1; request <= 3; request += 1)
      expect((await postForm("/forgot-password", { email })).status).toBe(200);
    expect((await postForm("/forgot-password", { email })).status).toBe(429);
  });

  it("are limited to 50 an hour per client address, whatever addresses are asked for", async () => {
    const clear = () =>
      testDatabase().query("DELETE FROM attempt_counters WHERE rule = ?", [
        "reset-address",
      ]);
    await clear();
    try {
      for (let request = 1; request <= 50; request += 1) {
        const answer = await postForm("/forgot-password", {
          email: uniqueEmail("spray"),
        });
        expect(answer.status, `request ${request}`).toBe(200);
      }
      const refused = await postForm("/forgot-password", {
        email: uniqueEmail("spray"),
      });
      expect(refused.status).toBe(429);
      expect(await refused.text()).toMatch(
        /Too many requests for links from your network address/,
      );
    } finally {
      await clear();
    }
  });
});

describe("the answer's work", () => {
  it("is the same for an account as for no account: the account is looked up, and its link made, after the answer", async () => {
    const email = uniqueEmail("reset-same-work");
    await createPerson({ email, password: "the-old-password", roles: [] });
    // While nothing may write a link, an answer that made one would wait.
    const root = await connectAsRoot();
    try {
      const database = new URL(inject("databaseUrl")).pathname.slice(1);
      await root.query(`LOCK TABLES \`${database}\`.email_tokens WRITE`);
      const answered = await Promise.race([
        postForm("/forgot-password", { email }).then(
          (response) => response.status,
        ),
        new Promise((resolve) => setTimeout(() => resolve("no answer"), 5_000)),
      ]);
      expect(answered).toBe(200);
      expect(await resetTokens(email)).toEqual([]);
    } finally {
      await root.query("UNLOCK TABLES");
      await root.end();
    }
    // Once links may be written again, the mail goes out.
    expect(await waitForResetTokens(email, 1)).toHaveLength(1);
  });
});

describe("the answer", () => {
  let app: AppServer;
  let http: AppClient;
  let silent: net.Server;
  const held: net.Socket[] = [];

  beforeAll(async () => {
    // An SMTP server that takes connections and never speaks: the mailer's
    // greeting timeout (5 s) would hold any request that waited for it.
    silent = net.createServer((socket) => held.push(socket));
    await new Promise<void>((resolve) =>
      silent.listen(faultPorts.mailSmtp, "127.0.0.1", resolve),
    );
    app = await startAppServer({
      port: faultPorts.apps[0],
      databaseUrl: inject("databaseUrl"),
      smtpUrl: `smtp://127.0.0.1:${faultPorts.mailSmtp}`,
    });
    http = new AppClient(app.baseUrl);
  });

  afterAll(() =>
    cleanUp(
      () => app?.stop(),
      async () => {
        for (const socket of held) socket.destroy();
        await new Promise((resolve) => silent?.close(resolve));
      },
    ),
  );

  async function timedRequest(email: string) {
    const started = performance.now();
    const response = await http.postForm("/forgot-password", { email });
    const text = await response.text();
    return { status: response.status, text, ms: performance.now() - started };
  }

  async function outboxRows(email: string) {
    const [rows] = await testDatabase().query(
      "SELECT sent_at AS sentAt FROM mail_outbox WHERE to_address = ?",
      [email],
    );
    return rows as { sentAt: Date | null }[];
  }

  it("comes at once while SMTP hangs, the same for an account as for no account; the mail waits in the outbox", async () => {
    const email = uniqueEmail("reset-hanging-smtp");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    const nobody = uniqueEmail("reset-hanging-nobody");
    const known = await timedRequest(email);
    const unknown = await timedRequest(nobody);
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(known.text).toContain("If that address has an account");
    expect(unknown.text).toContain("If that address has an account");
    // Before, the request for an account waited for SMTP: 5 s or more here.
    expect(known.ms).toBeLessThan(2_500);
    expect(unknown.ms).toBeLessThan(2_500);
    // The link and its outbox row are made just after the answer.
    await expect.poll(() => outboxRows(email)).toEqual([{ sentAt: null }]);
    expect(await outboxRows(nobody)).toEqual([]);
  });
});
