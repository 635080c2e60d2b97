/**
 * The SMTP server goes away or hangs: stock work goes on without waiting for
 * it (alert mail is sent after the answer), the mail waits in the outbox, and
 * `scripts/mail-retry.ts` delivers it once SMTP is back. A second app
 * server (on the shared test database) sends through an SMTP fake of this
 * file's own, which the test stops and starts; the shared fake is untouched.
 */
import { execFile } from "node:child_process";
import net from "node:net";
import { promisify } from "node:util";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import { startMailFake, type MailFake } from "../../scripts/lib/mail-fake";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import {
  AppClient,
  cleanUp,
  faultCode,
  faultPorts,
} from "../support/fault-environment";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  testDatabase,
} from "../support/test-database";

const smtpUrl = `smtp://127.0.0.1:${faultPorts.mailSmtp}`;
const startFake = () =>
  startMailFake({
    smtpPort: faultPorts.mailSmtp,
    httpPort: faultPorts.mailHttp,
    quiet: true,
  });

let fake: MailFake | null = null;
let app: AppServer;
let http: AppClient;
let buyer = "";
let storekeeper = "";
let location = "";
/** A buyer of this file's own, told of every alert: the recipient to look for. */
const recipient = `smtp-fault-${faultCode("B").toLowerCase()}@turnledger.test`;

beforeAll(async () => {
  fake = await startFake();
  app = await startAppServer({
    port: faultPorts.apps[1],
    databaseUrl: inject("databaseUrl"),
    smtpUrl,
  });
  http = new AppClient(app.baseUrl);
  await createPerson({
    email: recipient,
    password: demoPassword(),
    roles: ["buyer"],
  });
  buyer = await http.signIn("buyer@turnledger.test", demoPassword());
  storekeeper = await http.signIn(
    "storekeeper@turnledger.test",
    demoPassword(),
  );
  location = await createLocation(faultCode("SM"));
});

afterAll(() =>
  cleanUp(
    () => app?.stop(),
    () => fake?.close(),
    () => closeTestDatabase(),
  ),
);

async function newPart(reorderPoint: number): Promise<string> {
  const sku = faultCode("SMTP");
  const response = await http.send(
    "POST",
    "/api/v1/items",
    {
      kind: "part",
      sku,
      name: "Commutator brush",
      unit: "pcs",
      reorderPoint,
      reorderQuantity: 50,
    },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

/** Records a movement; its status and how long it took, in ms. */
async function move(body: Record<string, unknown>) {
  const started = performance.now();
  const response = await http.send(
    "POST",
    "/api/v1/stock-movements",
    { location, ...body },
    storekeeper,
  );
  const text = await response.text();
  return { status: response.status, text, ms: performance.now() - started };
}

async function outboxRowsFor(sku: string) {
  const [rows] = await testDatabase().query(
    "SELECT sent_at AS sentAt, attempts, last_error AS lastError FROM mail_outbox WHERE to_address = ? AND subject LIKE ?",
    [recipient, `Low stock: ${sku} %`],
  );
  return rows as {
    sentAt: Date | null;
    attempts: number;
    lastError: string | null;
  }[];
}

const arrived = (sku: string) =>
  (fake?.messages ?? []).filter(
    (message) =>
      message.to.includes(recipient) &&
      message.subject.startsWith(`Low stock: ${sku} `),
  );

async function waitUntil(check: () => boolean, timeoutMs = 10_000) {
  const started = Date.now();
  while (!check() && Date.now() - started < timeoutMs)
    await new Promise((resolve) => setTimeout(resolve, 100));
  return check();
}

describe("the SMTP server is stopped", () => {
  it("sends an alert through this app's SMTP fake while it runs", async () => {
    const sku = await newPart(5);
    expect(
      (await move({ type: "receipt", sku, quantity: 6, unitCost: 2 })).status,
    ).toBe(201);
    expect((await move({ type: "issue", sku, quantity: 2 })).status).toBe(201);
    expect(await waitUntil(() => arrived(sku).length === 1)).toBe(true);
    // Marked sent once SMTP has taken it, a moment after the fake received it.
    await expect
      .poll(async () => (await outboxRowsFor(sku))[0]?.sentAt ?? null, {
        timeout: 10_000,
      })
      .not.toBeNull();
  });

  it("records the movement and opens the alert at once while SMTP is down; the retry delivers the mail once it is back", async () => {
    const sku = await newPart(10);
    expect(
      (await move({ type: "receipt", sku, quantity: 12, unitCost: 2 })).status,
    ).toBe(201);

    await fake!.close();
    fake = null;
    // 12 − 5 = 7 < 10: the alert opens and its mail cannot be handed over.
    const issue = await move({ type: "issue", sku, quantity: 5 });
    expect(issue.status, issue.text).toBe(201);
    expect(issue.ms).toBeLessThan(5_000);
    const [[item]] = (await testDatabase().query(
      "SELECT on_hand AS onHand, id FROM items WHERE sku = ?",
      [sku],
    )) as unknown as [[{ onHand: string; id: number }]];
    expect(item.onHand).toBe("7.000");
    const [alerts] = await testDatabase().query(
      "SELECT closed_at AS closedAt FROM stock_alerts WHERE item_id = ?",
      [item.id],
    );
    expect(alerts).toEqual([{ closedAt: null }]);
    // The mail is tried after the movement has been answered: wait for that try.
    await expect
      .poll(async () => (await outboxRowsFor(sku))[0]?.attempts ?? 0, {
        timeout: 10_000,
      })
      .toBe(1);
    const waiting = await outboxRowsFor(sku);
    expect(waiting).toHaveLength(1);
    expect(waiting[0]).toMatchObject({ sentAt: null, attempts: 1 });
    expect(waiting[0]!.lastError).toMatch(/ECONNREFUSED/);

    // Stock work goes on meanwhile.
    const more = await move({ type: "issue", sku, quantity: 1 });
    expect(more.status, more.text).toBe(201);

    fake = await startFake();
    expect(arrived(sku)).toHaveLength(0);
    const { stdout } = await promisify(execFile)(
      "npx",
      ["tsx", "scripts/mail-retry.ts"],
      {
        env: {
          ...process.env,
          DATABASE_URL: inject("databaseUrl"),
          SMTP_URL: smtpUrl,
        },
      },
    );
    expect(stdout).toMatch(/mail retry: [1-9]\d* sent/);
    expect(await waitUntil(() => arrived(sku).length === 1)).toBe(true);
    expect(arrived(sku)[0]!.text).toContain("Available now: 7 pieces");
    const sent = await outboxRowsFor(sku);
    expect(sent).toHaveLength(1);
    expect(sent[0]!.sentAt).not.toBeNull();
    expect(sent[0]!.attempts).toBe(2);
  });

  it("answers movements at once while the SMTP server takes connections but never speaks; the mail waits for the retry", async () => {
    const sku = await newPart(10);
    expect(
      (await move({ type: "receipt", sku, quantity: 12, unitCost: 2 })).status,
    ).toBe(201);

    // A server on the SMTP port that accepts and then says nothing: the
    // mailer's greeting timeout (5 s) runs out only after the answer.
    await fake?.close();
    fake = null;
    const held: net.Socket[] = [];
    const silent = net.createServer((socket) => held.push(socket));
    await new Promise<void>((resolve) =>
      silent.listen(faultPorts.mailSmtp, "127.0.0.1", resolve),
    );
    try {
      const issue = await move({ type: "issue", sku, quantity: 5 });
      expect(issue.status, issue.text).toBe(201);
      // Before, the request waited for SMTP: 5 s or more here.
      expect(issue.ms).toBeLessThan(2_500);
      expect(await outboxRowsFor(sku)).toMatchObject([
        { sentAt: null, attempts: 0 },
      ]);
      await expect
        .poll(async () => (await outboxRowsFor(sku))[0]?.attempts ?? 0, {
          timeout: 15_000,
        })
        .toBe(1);
      expect((await outboxRowsFor(sku))[0]).toMatchObject({ sentAt: null });
    } finally {
      for (const socket of held) socket.destroy();
      await new Promise((resolve) => silent.close(resolve));
    }
    fake = await startFake();
  });
});
