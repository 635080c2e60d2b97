/**
 * Low-stock alerts through real movements, the real outbox and the SMTP fake:
 * one e-mail per newly opened alert, none while it stays open, closed by a
 * receipt, opened again by a new drop; SMTP refusing mail never fails the
 * movement, and `npm run mail:retry` delivers later.
 */
import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import {
  get,
  sendJson,
  signIn,
  signInAs,
  uniqueEmail,
} from "../support/app-client";
import {
  receivedMessages,
  refuseRecipients,
  waitForMessage,
} from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let location = "";
/** A buyer who chose nothing, so hears of each alert (the default for buyers). */
const listener = uniqueEmail("alert-buyer");

beforeAll(async () => {
  await createPerson({
    email: listener,
    roles: ["buyer"],
    password: demoPassword(),
  });
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  location = await createLocation(uniqueCode("AL"));
});
afterAll(async () => {
  await refuseRecipients([]);
  await closeTestDatabase();
});

async function newPart(reorderPoint: number, reorderQuantity: number) {
  const sku = uniqueCode("LOW");
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "part",
      sku,
      name: "Shaft circlip",
      unit: "pcs",
      reorderPoint,
      reorderQuantity,
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

async function move(body: Record<string, unknown>) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    { location, ...body },
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

/** Alert e-mails queued for an item (the outbox is written before SMTP is tried). */
async function queuedAlertMails(sku: string, to?: string) {
  const [rows] = await testDatabase().query(
    `SELECT to_address AS \`to\`, sent_at AS sentAt, attempts FROM mail_outbox WHERE subject LIKE ? ${to ? "AND to_address = ?" : ""} ORDER BY id`,
    to ? [`Low stock: ${sku} %`, to] : [`Low stock: ${sku} %`],
  );
  return rows as { to: string; sentAt: Date | null; attempts: number }[];
}

async function alertsOf(sku: string) {
  const response = await get("/api/v1/alerts?status=all&perPage=200", buyer);
  expect(response.status).toBe(200);
  return (
    (await response.json()) as {
      sku: string;
      status: string;
      told: { email: string; kind: string }[];
    }[]
  ).filter((alert) => alert.sku === sku);
}

describe("low-stock alerts", () => {
  it("e-mails once per drop below the reorder point and closes when stock is back", async () => {
    const sku = await newPart(10, 20);
    await move({ type: "receipt", sku, quantity: 15, unitCost: 0.5 });
    expect(await queuedAlertMails(sku)).toEqual([]);

    // 15 − 6 = 9 < 10: the alert opens and the listening buyer gets one e-mail through SMTP.
    await move({ type: "issue", sku, quantity: 6 });
    expect(await queuedAlertMails(sku, listener)).toHaveLength(1);
    const mail = await waitForMessage(
      listener,
      new RegExp(`Low stock: ${sku} `),
    );
    expect(mail.text).toContain("Available now: 9 pieces");
    expect(mail.text).toContain("Reorder point: 10 pieces");
    expect(mail.text).toContain("Suggested order: 20 pieces");
    expect(await alertsOf(sku)).toMatchObject([{ status: "open" }]);

    // A second drop while open: no second e-mail.
    await move({ type: "issue", sku, quantity: 1 });
    expect(await queuedAlertMails(sku, listener)).toHaveLength(1);

    // A receipt back to 8 + 2 = 10 (at the reorder point) closes it.
    await move({ type: "receipt", sku, quantity: 2, unitCost: 0.5 });
    expect(await alertsOf(sku)).toMatchObject([{ status: "closed" }]);

    // A new drop opens a new alert and e-mails again.
    await move({ type: "issue", sku, quantity: 1 });
    expect(await queuedAlertMails(sku, listener)).toHaveLength(2);
    const alerts = await alertsOf(sku);
    expect(alerts.map((alert) => alert.status)).toEqual(["open", "closed"]);
    expect(alerts[0]!.told.map((notice) => notice.email)).toContain(listener);
  });

  it("tells nobody who chose none, and a digest person only through the digest", async () => {
    const quiet = {
      email: `quiet-buyer-${uniqueCode("Q").toLowerCase()}@turnledger.test`,
    };
    await createPerson({
      email: quiet.email,
      roles: ["buyer"],
      password: demoPassword(),
    });
    const quietCookie = await signIn(quiet.email, demoPassword());
    const chose = await fetch(`${inject("baseUrl")}/account`, {
      method: "POST",
      headers: {
        Cookie: quietCookie,
        "Content-Type": "application/x-www-form-urlencoded",
        Origin: inject("baseUrl"),
      },
      body: new URLSearchParams({ intent: "alert-mode", mode: "none" }),
      redirect: "manual",
    });
    expect(chose.status).toBe(302);
    const sku = await newPart(5, 5);
    await move({ type: "receipt", sku, quantity: 4, unitCost: 1 });
    expect(await queuedAlertMails(sku, listener)).toHaveLength(1);
    expect(await queuedAlertMails(sku, quiet.email)).toHaveLength(0);

    // A storekeeper cannot choose to hear alerts.
    const refused = await fetch(`${inject("baseUrl")}/account`, {
      method: "POST",
      headers: {
        Cookie: storekeeper,
        "Content-Type": "application/x-www-form-urlencoded",
        Origin: inject("baseUrl"),
      },
      body: new URLSearchParams({ intent: "alert-mode", mode: "each" }),
      redirect: "manual",
    });
    expect(refused.status).toBe(403);
  });

  it("records the movement and opens the alert while SMTP refuses the mail; the retry delivers it", async () => {
    const unlucky = {
      email: `smtp-down-${uniqueCode("B").toLowerCase()}@turnledger.test`,
    };
    await createPerson({
      email: unlucky.email,
      roles: ["buyer"],
      password: demoPassword(),
    });
    await refuseRecipients([unlucky.email]);
    const sku = await newPart(3, 10);
    await move({ type: "receipt", sku, quantity: 2, unitCost: 1 });
    const [[item]] = (await testDatabase().query(
      "SELECT on_hand AS onHand FROM items WHERE sku = ?",
      [sku],
    )) as unknown as [[{ onHand: string }]];
    expect(item.onHand).toBe("2.000");
    expect(await alertsOf(sku)).toMatchObject([{ status: "open" }]);
    // SMTP is tried after the movement has been answered: wait for that try.
    await expect
      .poll(
        async () =>
          (await queuedAlertMails(sku, unlucky.email))[0]?.attempts ?? 0,
        { timeout: 10_000 },
      )
      .toBe(1);
    const waiting = await queuedAlertMails(sku, unlucky.email);
    expect(waiting).toHaveLength(1);
    expect(waiting[0]!.sentAt).toBeNull();
    expect(
      (await receivedMessages()).some((message) =>
        message.to.includes(unlucky.email),
      ),
    ).toBe(false);

    await refuseRecipients([]);
    await promisify(execFile)("npx", ["tsx", "scripts/mail-retry.ts"], {
      env: {
        ...process.env,
        DATABASE_URL: inject("databaseUrl"),
        SMTP_URL: inject("smtpUrl"),
      },
    });
    expect(
      (await queuedAlertMails(sku, unlucky.email))[0]!.sentAt,
    ).not.toBeNull();
    await waitForMessage(unlucky.email, new RegExp(`Low stock: ${sku} `));
  });

  it("sends the digest to people who chose it", async () => {
    const digestBuyer = {
      email: `digest-buyer-${uniqueCode("G").toLowerCase()}@turnledger.test`,
      id: "",
    };
    digestBuyer.id = await createPerson({
      email: digestBuyer.email,
      roles: ["buyer"],
      password: demoPassword(),
    });
    await testDatabase().query(
      "INSERT INTO alert_preferences (user_id, mode) VALUES (?, 'digest')",
      [digestBuyer.id],
    );
    const sku = await newPart(2, 4);
    await move({ type: "receipt", sku, quantity: 1, unitCost: 1 });
    expect(await queuedAlertMails(sku, digestBuyer.email)).toHaveLength(0);
    const { stdout } = await promisify(execFile)(
      "npx",
      ["tsx", "scripts/alerts-digest.ts"],
      {
        env: {
          ...process.env,
          DATABASE_URL: inject("databaseUrl"),
          SMTP_URL: inject("smtpUrl"),
          // With DATABASE_URL the digest's links need the public address.
          APP_URL: inject("baseUrl"),
        },
      },
    );
    expect(stdout).toMatch(/alert digest: \d+ open alerts?, sent to \d+/);
    const digest = await waitForMessage(
      digestBuyer.email,
      /^Low stock digest: /,
    );
    expect(digest.text).toContain(
      `- ${sku} Shaft circlip: 1 piece available, reorder point 2 pieces`,
    );
  });
});
