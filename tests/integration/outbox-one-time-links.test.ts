/**
 * The outbox never shows a live set-password link: admins see a note where
 * the link was, unsent mail is still delivered with the real link (at once or
 * by `npm run mail:retry`), and once SMTP has taken a message the stored copy
 * keeps only the note.
 */
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { afterAll, describe, expect, inject, it } from "vitest";
import {
  get,
  postForm,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
} from "../support/app-client";
import {
  linkIn,
  receivedMessages,
  refuseRecipients,
  waitForMessage,
} from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
} from "../support/test-database";

afterAll(async () => {
  await refuseRecipients([]);
  await closeTestDatabase();
});

const removedNote = "[one-time link removed after sending]";
const waitingNote = "[one-time link, sent only to the recipient]";

async function signedInAdmin(): Promise<string> {
  const email = uniqueEmail("outbox-admin");
  await createPerson({ email, password: "admin-password-1", roles: ["admin"] });
  return signIn(email, "admin-password-1");
}

interface OutboxEntry {
  to: string;
  subject: string;
  text: string;
  sentAt: string | null;
}

/** What an admin is shown: the outbox page's HTML and the API's entries. */
async function whatAdminsSee(adminCookie: string) {
  const page = await get("/admin/outbox", adminCookie);
  expect(page.status).toBe(200);
  const api = await get("/api/v1/outbox?limit=500", adminCookie);
  expect(api.status).toBe(200);
  return {
    html: await page.text(),
    entries: (await api.json()) as OutboxEntry[],
  };
}

/**
 * Every string in a text that could be an e-mailed token (32 random bytes in
 * base64url are 43 characters, app/auth/email-tokens.server.ts), whether or
 * not it follows `token=`.
 */
function tokenCandidates(text: string): string[] {
  return [...new Set(text.match(/[A-Za-z0-9_-]{43}/g) ?? [])];
}

/** Tries a token on the set-password form; true when it set a password. */
async function tokenWorks(token: string): Promise<boolean> {
  const response = await postForm("/set-password", {
    token,
    password: "taken-over-password",
    confirmPassword: "taken-over-password",
  });
  return response.status === 302 && sessionCookieFrom(response) !== null;
}

async function storedRows(to: string) {
  const [rows] = await testDatabase().query(
    "SELECT * FROM mail_outbox WHERE to_address = ? ORDER BY id",
    [to],
  );
  return rows as Record<string, unknown>[];
}

describe("one-time links in the outbox", () => {
  it("are masked while a message waits; the retry sends the real link and keeps only the note", async () => {
    const adminCookie = await signedInAdmin();
    const email = uniqueEmail("outbox-waiting");
    await refuseRecipients([email]);
    const invite = await postForm(
      "/admin/people",
      { name: "Waiting Newcomer", email, roles: ["storekeeper"] },
      adminCookie,
    );
    // Saved though not sent: back to the people page, with the flash message.
    expect(invite.status).toBe(302);
    const [waiting] = await storedRows(email);
    expect(waiting?.sent_at).toBeNull();

    const { html, entries } = await whatAdminsSee(adminCookie);
    // No token an admin is shown, on the page or from the API, sets a password.
    const shown = tokenCandidates(`${html}\n${JSON.stringify(entries)}`);
    for (const token of shown) expect(await tokenWorks(token)).toBe(false);
    const entry = entries.find((candidate) => candidate.to === email);
    expect(entry?.sentAt).toBeNull();
    expect(entry?.text).toContain(waitingNote);
    expect(entry?.text).not.toContain("set-password");
    expect(html).toContain(email);

    // The retry (npm run mail:retry) delivers the real link.
    await refuseRecipients([]);
    const { stdout } = await promisify(execFile)(
      "npx",
      ["tsx", "scripts/mail-retry.ts"],
      {
        env: {
          ...process.env,
          DATABASE_URL: inject("databaseUrl"),
          SMTP_URL: inject("smtpUrl"),
        },
      },
    );
    expect(stdout).toMatch(/mail retry: [1-9]\d* sent/);
    const received = await waitForMessage(email, /invited to Turnledger/);
    const token = new URL(linkIn(received)).searchParams.get("token")!;
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    // The stored copy keeps the note, not the link, in any column.
    const [sent] = await storedRows(email);
    expect(sent?.sent_at).not.toBeNull();
    expect(JSON.stringify(sent)).not.toContain(token);
    expect(String(sent?.text_body)).toContain(removedNote);
    const after = await whatAdminsSee(adminCookie);
    expect(after.html).not.toContain(token);
    expect(
      after.entries.find((candidate) => candidate.to === email)?.text,
    ).toContain(removedNote);

    // The recipient's link is the one that works.
    expect(await tokenWorks(token)).toBe(true);
  });

  it("are removed from the stored copy of mail sent at once, while the recipient gets the real link", async () => {
    const adminCookie = await signedInAdmin();
    const email = uniqueEmail("outbox-reset");
    await createPerson({
      email,
      password: "the-old-password",
      roles: ["buyer"],
    });
    expect((await postForm("/forgot-password", { email })).status).toBe(200);
    const received = await waitForMessage(email, /new Turnledger password/);
    const token = new URL(linkIn(received)).searchParams.get("token")!;
    expect(received.text).toContain(`/set-password?token=${token}`);
    expect(received.text).not.toContain(removedNote);

    // Marked sent just after SMTP accepted it.
    await expect
      .poll(async () => (await storedRows(email))[0]?.sent_at ?? null)
      .not.toBeNull();
    const [stored] = await storedRows(email);
    expect(JSON.stringify(stored)).not.toContain(token);
    expect(String(stored?.text_body)).toContain(removedNote);
    // The rest of the message is kept as sent.
    expect(String(stored?.text_body)).toContain("for 30 minutes");

    const { html, entries } = await whatAdminsSee(adminCookie);
    expect(html).not.toContain(token);
    expect(JSON.stringify(entries)).not.toContain(token);
    expect(entries.find((candidate) => candidate.to === email)?.text).toContain(
      removedNote,
    );
    for (const shown of tokenCandidates(html))
      expect(await tokenWorks(shown)).toBe(false);

    // Every message the fake received for this person carried a working link.
    expect(
      (await receivedMessages()).filter((message) =>
        message.to.includes(email),
      ),
    ).toHaveLength(1);
    expect(await tokenWorks(token)).toBe(true);
  });
});
