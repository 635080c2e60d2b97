/**
 * Write transactions that lose to other writers are run again, whole, and a write that
 * loses every time is answered 503 "busy", never 500 (app/db/write-transaction.server.ts,
 * decision 027). A private MariaDB of this file's own (the fault tests' one) lets the
 * test read InnoDB's deadlock report as root and change server settings:
 *
 * - a real deadlock: the test's own transaction and the app's stock movement lock the
 *   item row and its balance row in opposite order; InnoDB rolls the app's (lighter)
 *   transaction back, the app runs it again and commits it once, and the low-stock
 *   alert it causes is opened and e-mailed once;
 * - a rollback: a movement whose last statement fails rolls back whole, and the alert it
 *   would have caused is never opened nor e-mailed (the check runs after the commit);
 * - retries running out: the test holds the balance row locked while the server waits
 *   at most 1 s for a lock (innodb_lock_wait_timeout); the API answers 503 JSON, the
 *   record form the 503 page, and nothing is written;
 * - ids given with auto_increment_increment 3 (as Galera sets it on a three-node
 *   cluster): the rows that refer to ids of rows written in the same transaction
 *   (outbox messages of an alert, a price list's new items) refer to the right ones.
 */
import type mysql from "mysql2/promise";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { demoPassword } from "../../seed/demo-people";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import { waitForMessage } from "../support/mail-fake-client";
import {
  AppClient,
  cleanUp,
  FaultMariadb,
  faultCode,
  faultPorts,
  priceListCsv,
  waitForTransaction,
} from "../support/fault-environment";

const busy = {
  error: {
    message: "The database is busy with other changes. Try again in a moment.",
  },
};

let database: FaultMariadb;
/** The app with the server's default settings. */
let app: AppServer;
let http: AppClient;
let buyer = "";
let storekeeper = "";
let location = "";

beforeAll(async () => {
  database = await FaultMariadb.start({ smtpUrl: inject("smtpUrl") });
  app = await startAppServer({
    port: faultPorts.apps[0],
    databaseUrl: database.databaseUrl,
    smtpUrl: inject("smtpUrl"),
  });
  http = new AppClient(app.baseUrl);
  buyer = await http.signIn("buyer@turnledger.test", demoPassword());
  storekeeper = await http.signIn(
    "storekeeper@turnledger.test",
    demoPassword(),
  );
  location = faultCode("WC");
  await database.insert(
    "INSERT INTO locations (code, name, kind) VALUES (?, 'Conflict test bin', 'bin')",
    [location],
  );
});

afterAll(() =>
  cleanUp(
    () => app?.stop(),
    () => database?.shutdown(),
  ),
);

/** A part counted in pieces with a reorder point; its SKU and id. */
async function newPart(client: AppClient, reorderPoint: number) {
  const sku = faultCode("WCP");
  const created = await client.send(
    "POST",
    "/api/v1/items",
    {
      kind: "part",
      sku,
      name: "Brush spring",
      unit: "pcs",
      reorderPoint,
      reorderQuantity: 20,
    },
    buyer,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const id = await database.count("SELECT id AS n FROM items WHERE sku = ?", [
    sku,
  ]);
  return { sku, id };
}

async function receive(client: AppClient, sku: string, quantity: number) {
  const received = await client.send(
    "POST",
    "/api/v1/stock-movements",
    { type: "receipt", sku, location, quantity, unitCost: 0.4 },
    storekeeper,
  );
  expect(received.status, await received.clone().text()).toBe(201);
}

async function ledgerOf(itemId: number) {
  return {
    movements: await database.count(
      "SELECT COUNT(*) AS n FROM stock_movements WHERE item_id = ?",
      [itemId],
    ),
    onHand: await database.count(
      "SELECT on_hand AS n FROM items WHERE id = ?",
      [itemId],
    ),
    balance: await database.count(
      "SELECT SUM(on_hand) AS n FROM stock_balances WHERE item_id = ?",
      [itemId],
    ),
    alerts: await database.count(
      "SELECT COUNT(*) AS n FROM stock_alerts WHERE item_id = ?",
      [itemId],
    ),
  };
}

/** The balance row of the item at the test's location, locked by `connection`'s open transaction. */
async function lockBalanceRow(connection: mysql.Connection, itemId: number) {
  const [rows] = await connection.query(
    "SELECT b.on_hand FROM stock_balances b JOIN locations l ON l.id = b.location_id WHERE b.item_id = ? AND l.code = ? FOR UPDATE",
    [itemId, location],
  );
  expect(rows).toHaveLength(1);
}

describe("a deadlock between a stock movement and another transaction", () => {
  it("is retried: the movement commits once, the alert opens and is e-mailed once", async () => {
    const { sku, id: itemId } = await newPart(http, 10);
    await receive(http, sku, 15);

    const root = await database.root();
    const other = await database.connect();
    try {
      // The other transaction writes rows first, so InnoDB finds the app's the lighter
      // one to roll back (it rolls back the transaction that changed fewer rows).
      await other.query(
        "CREATE TABLE IF NOT EXISTS deadlock_ballast (id INT AUTO_INCREMENT PRIMARY KEY, note VARCHAR(40) NOT NULL) ENGINE=InnoDB",
      );
      await other.beginTransaction();
      await other.query("INSERT INTO deadlock_ballast (note) VALUES ?", [
        Array.from({ length: 300 }, (_, index) => [`ballast ${index}`]),
      ]);
      await lockBalanceRow(other, itemId);

      // 15 − 6 = 9 < 10: the issue opens a low-stock alert (the demo buyer is e-mailed).
      let answered = false;
      const issue = http
        .send(
          "POST",
          "/api/v1/stock-movements",
          { type: "issue", sku, location, quantity: 6 },
          storekeeper,
        )
        .finally(() => (answered = true));

      // The app's transaction holds the item row (locked first) and waits for the balance row.
      await waitForTransaction(
        root,
        { rowsModified: 0, lockWait: true },
        () => answered,
      );
      // Now the other transaction asks for the item row: a deadlock. It gets the row,
      // which it can only do once InnoDB has rolled the app's transaction back.
      await other.query("SELECT id FROM items WHERE id = ? FOR UPDATE", [
        itemId,
      ]);
      const [status] = await root.query("SHOW ENGINE INNODB STATUS");
      const report = (status as { Status: string }[])[0]!.Status;
      const deadlock = report.slice(
        report.indexOf("LATEST DETECTED DEADLOCK"),
        report.indexOf("TRANSACTIONS\n------------"),
      );
      // InnoDB's report numbers the two transactions and names the one it rolled back:
      // the app's, the one that was locking its balance row.
      const appsNumber =
        /\*\*\* \((\d)\) TRANSACTION:[^*]*from `stock_balances`/.exec(
          deadlock,
        )?.[1];
      expect(appsNumber, deadlock).toBeDefined();
      expect(deadlock).toContain(`WE ROLL BACK TRANSACTION (${appsNumber})`);
      expect(answered).toBe(false);

      await other.rollback();
      const response = await issue;
      expect(response.status, await response.clone().text()).toBe(201);
      expect(await response.json()).toMatchObject({
        movement: { sku, quantity: -6 },
        balance: { onHand: 9 },
      });
    } finally {
      await other.end().catch(() => undefined);
      await root.end().catch(() => undefined);
    }

    // One receipt and one issue; the kept balances agree with the ledger.
    expect(await ledgerOf(itemId)).toEqual({
      movements: 2,
      onHand: 9,
      balance: 9,
      alerts: 1,
    });
    const mail = await waitForMessage(
      "buyer@turnledger.test",
      new RegExp(`Low stock: ${sku} `),
    );
    expect(mail.text).toContain("Available now: 9 pieces");
    expect(
      await database.count(
        "SELECT COUNT(*) AS n FROM mail_outbox WHERE subject LIKE ? AND to_address = 'buyer@turnledger.test'",
        [`Low stock: ${sku} %`],
      ),
    ).toBe(1);
  });
});

describe("a stock movement whose transaction rolls back", () => {
  it("opens no alert and e-mails nobody; the same movement committed does both", async () => {
    const { sku, id: itemId } = await newPart(http, 10);
    await receive(http, sku, 15);
    const before = await ledgerOf(itemId);
    const lowStockMails = () =>
      database.count(
        "SELECT COUNT(*) AS n FROM mail_outbox WHERE subject LIKE ?",
        [`Low stock: ${sku} %`],
      );
    const issue = () =>
      http.send(
        "POST",
        "/api/v1/stock-movements",
        { type: "issue", sku, location, quantity: 6 },
        storekeeper,
      );

    // The movement's last statement (the item's kept on hand) fails once its balance
    // and journal rows are written: the whole transaction rolls back. 15 − 6 = 9 would
    // be below the reorder point of 10.
    const root = await database.root();
    const trigger = `\`${database.databaseName}\`.refuse_item_${itemId}`;
    try {
      await root.query(
        `CREATE TRIGGER ${trigger} BEFORE UPDATE ON \`${database.databaseName}\`.items FOR EACH ROW BEGIN IF NEW.id = ${itemId} THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused by the test'; END IF; END`,
      );
      const refused = await issue();
      expect(refused.status, await refused.clone().text()).toBe(500);
    } finally {
      await root.query(`DROP TRIGGER IF EXISTS ${trigger}`);
      await root.end();
    }
    expect(await ledgerOf(itemId)).toEqual(before);
    expect(before.alerts).toBe(0);
    expect(await lowStockMails()).toBe(0);

    // The same issue committed opens the alert and e-mails it: the checks above could fail.
    const committed = await issue();
    expect(committed.status, await committed.clone().text()).toBe(201);
    expect(await ledgerOf(itemId)).toEqual({
      movements: 2,
      onHand: 9,
      balance: 9,
      alerts: 1,
    });
    await waitForMessage(
      "buyer@turnledger.test",
      new RegExp(`Low stock: ${sku} `),
    );
    expect(await lowStockMails()).toBeGreaterThan(0);
  });
});

describe("with a server that waits 1 s for a lock and gives ids in steps of 3", () => {
  let strict: AppServer;
  let client: AppClient;

  beforeAll(async () => {
    const root = await database.root();
    try {
      // New connections take these as their session values: the second app's pool
      // gets them, the first app's open connections keep the defaults.
      await root.query("SET GLOBAL innodb_lock_wait_timeout = 1");
      await root.query("SET GLOBAL auto_increment_increment = 3");
      await root.query("SET GLOBAL auto_increment_offset = 2");
    } finally {
      await root.end();
    }
    strict = await startAppServer({
      port: faultPorts.apps[1],
      databaseUrl: database.databaseUrl,
      smtpUrl: inject("smtpUrl"),
    });
    client = new AppClient(strict.baseUrl);
    buyer = await client.signIn("buyer@turnledger.test", demoPassword());
    storekeeper = await client.signIn(
      "storekeeper@turnledger.test",
      demoPassword(),
    );
  });

  afterAll(() => cleanUp(() => strict?.stop()));

  it("answers 503 busy (JSON for the API, the error page for the form) when every attempt waits in vain, and writes nothing", async () => {
    const { sku, id: itemId } = await newPart(client, 0);
    await receive(client, sku, 15);
    const before = await ledgerOf(itemId);

    const holder = await database.connect();
    try {
      await holder.beginTransaction();
      await lockBalanceRow(holder, itemId);
      const [api, form] = await Promise.all([
        client.send(
          "POST",
          "/api/v1/stock-movements",
          { type: "issue", sku, location, quantity: 2 },
          storekeeper,
        ),
        client.postForm(
          "/stock/record",
          { type: "issue", sku, location, quantity: "3" },
          storekeeper,
        ),
      ]);
      expect(api.status).toBe(503);
      expect(api.headers.get("retry-after")).toBe("2");
      expect(api.headers.get("content-type")).toContain("application/json");
      expect(await api.json()).toEqual(busy);

      expect(form.status).toBe(503);
      expect(form.headers.get("content-type")).toContain("text/html");
      const page = await form.text();
      expect(page).toContain("Database busy");
      expect(page).toContain(busy.error.message);
    } finally {
      await holder.rollback().catch(() => undefined);
      await holder.end().catch(() => undefined);
    }
    expect(await ledgerOf(itemId)).toEqual(before);

    // Once the row is free, the same issue goes through.
    const again = await client.send(
      "POST",
      "/api/v1/stock-movements",
      { type: "issue", sku, location, quantity: 2 },
      storekeeper,
    );
    expect(again.status, await again.clone().text()).toBe(201);
  });

  it("keeps each alert notice with its own outbox message when ids go up in steps of 3", async () => {
    // Every new connection (the app's pool's included) now counts ids in steps of 3.
    const [row] = await database.query<{ step: number | string }>(
      "SELECT @@auto_increment_increment AS step",
    );
    expect(Number(row!.step)).toBe(3);
    // Three buyers told at once: three outbox rows in one transaction.
    for (const name of ["second", "third"]) {
      const id = `wc-${faultCode(name).toLowerCase()}`;
      await database.query(
        "INSERT INTO users (id, email, name, password_hash, active, created_at) VALUES (?, ?, ?, NULL, 1, NOW(3))",
        [id, `${id}@turnledger.test`, `Buyer ${name}`],
      );
      await database.query(
        "INSERT INTO user_roles (user_id, role) VALUES (?, 'buyer')",
        [id],
      );
    }
    const { sku, id: itemId } = await newPart(client, 10);
    await receive(client, sku, 12);
    const issued = await client.send(
      "POST",
      "/api/v1/stock-movements",
      { type: "issue", sku, location, quantity: 5 },
      storekeeper,
    );
    expect(issued.status, await issued.clone().text()).toBe(201);

    const notices = await database.query<{
      told: string;
      to: string;
      subject: string;
      outboxId: number;
    }>(
      `SELECT u.email AS told, o.to_address AS \`to\`, o.subject, o.id AS outboxId
         FROM stock_alert_notices n
         JOIN stock_alerts a ON a.id = n.alert_id
         JOIN users u ON u.id = n.user_id
         JOIN mail_outbox o ON o.id = n.outbox_id
        WHERE a.item_id = ?`,
      [itemId],
    );
    expect(notices.length).toBeGreaterThanOrEqual(3);
    for (const notice of notices) {
      expect(notice.to).toBe(notice.told);
      expect(notice.subject).toContain(sku);
    }
    // The ids really are 3 apart (else this test would prove nothing).
    const ids = notices.map((notice) => notice.outboxId).sort((a, b) => a - b);
    for (let index = 1; index < ids.length; index += 1)
      expect((ids[index]! - ids[index - 1]!) % 3).toBe(0);
  });

  it("gives a price list's new items their own ids when ids go up in steps of 3", async () => {
    const supplier = faultCode("Step supplier");
    const created = await client.send(
      "POST",
      "/api/v1/suppliers",
      { name: supplier, currency: "EUR" },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const prefix = faultCode("ST");
    // 40 lines, four price breaks per part: ten new parts in one multi-row insert.
    const uploaded = await client.uploadPriceList(buyer, {
      supplier,
      fileName: "steps.csv",
      csv: priceListCsv(40, prefix),
    });
    expect(uploaded.status, await uploaded.clone().text()).toBe(201);
    const lines = await database.query<{
      supplierSku: string;
      itemSku: string;
      itemId: number;
    }>(
      `SELECT p.supplier_sku AS supplierSku, i.sku AS itemSku, i.id AS itemId
         FROM price_lines p JOIN items i ON i.id = p.item_id
        WHERE p.supplier_sku LIKE ?`,
      [`${prefix}-%`],
    );
    expect(lines).toHaveLength(40);
    for (const line of lines) expect(line.itemSku).toContain(line.supplierSku);
    const itemIds = [...new Set(lines.map((line) => line.itemId))].sort(
      (a, b) => a - b,
    );
    expect(itemIds).toHaveLength(10);
    for (let index = 1; index < itemIds.length; index += 1)
      expect((itemIds[index]! - itemIds[index - 1]!) % 3).toBe(0);
  });
});
