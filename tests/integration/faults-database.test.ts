/**
 * MariaDB stops in the middle of a write. A second private MariaDB of this
 * file's own (not the shared one every other test uses) serves a second app
 * server; the test stops that MariaDB while a price-list commit (killed:
 * SIGKILL, a crash) and a build-order reservation (SHUTDOWN, a clean stop) are
 * writing, and checks: the request answers 503 "database unavailable" within
 * seconds, nothing of the transaction remains once MariaDB is back, and the
 * same app process answers again without a restart. Decision 013.
 */
import { createHash } from "node:crypto";
import net from "node:net";
import mysql from "mysql2/promise";
import type { ServerBuild } from "react-router";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { demoPassword } from "../../seed/demo-people";
import { answerDatabaseOutages } from "../../server/database-unavailable";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import {
  AppClient,
  cleanUp,
  FaultMariadb,
  faultCode,
  faultPorts,
  priceListCsv,
  waitForTransaction,
} from "../support/fault-environment";

const unavailable = {
  error: { message: "The database is unavailable. Try again in a moment." },
};

let database: FaultMariadb;
let app: AppServer;
let http: AppClient;
let buyer = "";
let builder = "";
let storekeeper = "";

beforeAll(async () => {
  database = await FaultMariadb.start({ smtpUrl: inject("smtpUrl") });
  app = await startAppServer({
    port: faultPorts.apps[0],
    databaseUrl: database.databaseUrl,
    smtpUrl: inject("smtpUrl"),
  });
  http = new AppClient(app.baseUrl);
  buyer = await http.signIn("buyer@turnledger.test", demoPassword());
  builder = await http.signIn("builder@turnledger.test", demoPassword());
  storekeeper = await http.signIn(
    "storekeeper@turnledger.test",
    demoPassword(),
  );
});

afterAll(() =>
  cleanUp(
    () => app?.stop(),
    () => database?.shutdown(),
  ),
);

/** A request and how long it took to answer, in ms. */
async function timed(request: Promise<Response>) {
  const started = performance.now();
  const response = await request;
  const body = await response.text();
  return { response, body, ms: performance.now() - started };
}

/** The same app process, never restarted, answers /healthz with 200 again (after a moment's reconnect at most). */
async function expectRecoveredWithoutRestart() {
  expect(app.running()).toBe(true);
  const started = Date.now();
  let status = 0;
  while (Date.now() - started < 10_000) {
    status = (await http.get("/healthz")).status;
    if (status === 200) break;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  expect(status).toBe(200);
  expect(app.running()).toBe(true);
}

describe("MariaDB crashes during a price-list commit", () => {
  it("answers 503 at once, keeps no row of the import, and imports the same file once MariaDB is back", async () => {
    const supplier = faultCode("Crash supplier");
    const created = await http.send(
      "POST",
      "/api/v1/suppliers",
      { name: supplier, currency: "EUR" },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const supplierId = await database.count(
      "SELECT id AS n FROM suppliers WHERE name = ?",
      [supplier],
    );

    // 60,000 rows (15,000 new parts): a commit of several seconds.
    const rows = 60_000;
    const csv = priceListCsv(rows, faultCode("FP"));
    const fileSha256 = createHash("sha256").update(csv).digest("hex");
    const tables = async () => ({
      priceLines: await database.count("SELECT COUNT(*) AS n FROM price_lines"),
      priceImports: await database.count(
        "SELECT COUNT(*) AS n FROM price_imports",
      ),
      items: await database.count("SELECT COUNT(*) AS n FROM items"),
      supplierItems: await database.count(
        "SELECT COUNT(*) AS n FROM supplier_items",
      ),
    });
    const before = await tables();

    let answered = false;
    const commit = timed(
      http.uploadPriceList(buyer, {
        supplier,
        fileName: "crash.csv",
        csv,
      }),
    ).finally(() => (answered = true));

    // Once the import's transaction holds thousands of written rows, kill mariadbd.
    const root = await database.root();
    let modified = 0;
    try {
      ({ rowsModified: modified } = await waitForTransaction(
        root,
        { rowsModified: 4_000 },
        () => answered,
      ));
    } finally {
      await root.end().catch(() => undefined);
    }
    const killedAt = performance.now();
    await database.kill();
    expect(modified).toBeGreaterThanOrEqual(4_000);

    const { response, body } = await commit;
    const answeredAfterMs = performance.now() - killedAt;
    expect(response.status, body).toBe(503);
    expect(response.headers.get("Content-Type")).toContain("application/json");
    expect(response.headers.get("Retry-After")).toBe("5");
    expect(JSON.parse(body)).toEqual(unavailable);
    expect(answeredAfterMs).toBeLessThan(5_000);

    await database.restart();
    await expectRecoveredWithoutRestart();

    // InnoDB rolled the transaction back: no import, no price line, no new item.
    expect(await tables()).toEqual(before);
    expect(
      await database.count(
        "SELECT COUNT(*) AS n FROM price_imports WHERE supplier_id = ? OR file_sha256 = ?",
        [supplierId, fileSha256],
      ),
    ).toBe(0);
    expect(
      await database.count(
        "SELECT COUNT(*) AS n FROM price_lines WHERE supplier_id = ?",
        [supplierId],
      ),
    ).toBe(0);

    // The same file again, on the same app process: all of it.
    const again = await timed(
      http.uploadPriceList(buyer, { supplier, fileName: "crash.csv", csv }),
    );
    expect(again.response.status, again.body.slice(0, 300)).toBe(201);
    expect(JSON.parse(again.body)).toMatchObject({
      rows,
      newItems: rows / 4,
    });
    const after = await tables();
    expect(after.priceLines - before.priceLines).toBe(rows);
    expect(after.priceImports - before.priceImports).toBe(1);
    expect(after.items - before.items).toBe(rows / 4);
  });
});

describe("MariaDB stops during a reservation", () => {
  /** Bins the reservation takes from: two rows written for each. */
  const places = 40;
  let sku = "";
  let itemId = 0;
  let orderId = 0;

  /** What the item's books say is held, from every table that keeps it. */
  async function heldFigures() {
    return {
      reservationRows: await database.count(
        "SELECT COUNT(*) AS n FROM build_order_reservations WHERE item_id = ?",
        [itemId],
      ),
      balancesReserved: await database.count(
        "SELECT COALESCE(SUM(reserved), 0) AS n FROM stock_balances WHERE item_id = ?",
        [itemId],
      ),
      itemReserved: await database.count(
        "SELECT reserved AS n FROM items WHERE id = ?",
        [itemId],
      ),
      linesReserved: await database.count(
        "SELECT COALESCE(SUM(reserved), 0) AS n FROM build_order_lines WHERE order_id = ?",
        [orderId],
      ),
      status: (
        await database.query<{ status: string }>(
          "SELECT status FROM build_orders WHERE id = ?",
          [orderId],
        )
      )[0]?.status,
      events: await database.count(
        "SELECT COUNT(*) AS n FROM build_order_events WHERE order_id = ?",
        [orderId],
      ),
    };
  }

  beforeAll(async () => {
    // One part, one piece in each of 40 bins; a design needing 40 per motor.
    sku = faultCode("FLT");
    const item = await http.send(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name: "Fault test spacer", unit: "pcs" },
      buyer,
    );
    expect(item.status, await item.clone().text()).toBe(201);
    itemId = await database.count("SELECT id AS n FROM items WHERE sku = ?", [
      sku,
    ]);
    const codes = Array.from({ length: places }, () => faultCode("FB"));
    await database.query("INSERT INTO locations (code, name, kind) VALUES ?", [
      codes.map((code) => [code, `Fault bin ${code}`, "bin"]),
    ]);
    for (let start = 0; start < codes.length; start += 10) {
      const answers = await Promise.all(
        codes
          .slice(start, start + 10)
          .map((location) =>
            http.send(
              "POST",
              "/api/v1/stock-movements",
              { type: "receipt", sku, location, quantity: 1, unitCost: 0.4 },
              storekeeper,
            ),
          ),
      );
      for (const answer of answers)
        expect(answer.status, await answer.text()).toBe(201);
    }

    const designId = await database.insert(
      "INSERT INTO designs (name, motor_type, user_id, created_at) VALUES (?, 'outrunner BLDC', 'demo-03-builder', NOW(3))",
      [faultCode("Fault motor")],
    );
    const revisionId = await database.insert(
      `INSERT INTO design_revisions
         (design_id, revision, status, poles, slots, rated_current_a, insulation_class_c, released_at, released_by, created_at)
       VALUES (?, 1, 'released', 14, 12, 10, 155, NOW(3), 'demo-03-builder', NOW(3))`,
      [designId],
    );
    await database.query(
      "INSERT INTO design_lines (revision_id, position, kind, item_id, quantity_per_motor) VALUES (?, 1, 'part', ?, ?)",
      [revisionId, itemId, String(places)],
    );
    const order = await http.send(
      "POST",
      "/api/v1/build-orders",
      { designId, revision: 1, quantity: 1 },
      builder,
    );
    expect(order.status, await order.clone().text()).toBe(201);
    orderId = ((await order.json()) as { id: number }).id;
  });

  /**
   * Sends a reservation, waits until it has written every balance and
   * reservation row and waits on its last insert, then stops MariaDB cleanly
   * (SHUTDOWN as root) under it; the answer must come within 5 s. Another
   * session holds the builder's user row: the order's event names the builder
   * (a foreign key, so a shared lock on that row) and waits for it.
   */
  async function stopMariadbDuring(reserve: () => Promise<Response>) {
    const blocker = await database.connect();
    const root = await database.root();
    try {
      await blocker.beginTransaction();
      await blocker.query(
        "SELECT id FROM users WHERE id = 'demo-03-builder' FOR UPDATE",
      );
      let answered = false;
      const answer = timed(reserve()).finally(() => (answered = true));
      const waiting = await waitForTransaction(
        root,
        { rowsModified: 2 * places, lockWait: true },
        () => answered,
      );
      expect(waiting.rowsModified).toBeGreaterThanOrEqual(2 * places);
      const stoppedAt = performance.now();
      await root.query("SHUTDOWN");
      const result = await answer;
      expect(performance.now() - stoppedAt).toBeLessThan(5_000);
      return result;
    } finally {
      blocker.destroy();
      root.destroy();
    }
  }

  it("the order page's 'Hold stock' form answers a 503 page when stopped mid-write; nothing is held once MariaDB is back", async () => {
    const before = await heldFigures();
    const { response, body } = await stopMariadbDuring(() =>
      http.postForm(`/build-orders/${orderId}`, { intent: "reserve" }, builder),
    );
    expect(response.status, body).toBe(503);
    expect(body).toContain("Database unavailable");
    await database.shutdown();
    await database.restart();
    await expectRecoveredWithoutRestart();
    expect(await heldFigures()).toEqual(before);
  });

  it("answers 503 when stopped after its writes, and 503 within seconds while down; nothing is held once MariaDB is back", async () => {
    const before = await heldFigures();
    expect(before).toMatchObject({
      reservationRows: 0,
      balancesReserved: 0,
      itemReserved: 0,
      linesReserved: 0,
      status: "draft",
    });

    const { response, body } = await stopMariadbDuring(() =>
      http.send("POST", `/api/v1/build-orders/${orderId}/reserve`, {}, builder),
    );
    expect(response.status, body).toBe(503);
    expect(JSON.parse(body)).toEqual(unavailable);
    await database.shutdown(); // waits until mariadbd has exited
    expect(database.running()).toBe(false);

    // While it is down: the next reserve, a page and the API answer 503 at once.
    const again = await timed(
      http.send("POST", `/api/v1/build-orders/${orderId}/reserve`, {}, builder),
    );
    expect(again.response.status, again.body).toBe(503);
    expect(JSON.parse(again.body)).toEqual(unavailable);
    expect(again.ms).toBeLessThan(5_000);
    const page = await timed(http.get(`/build-orders/${orderId}`, builder));
    expect(page.response.status).toBe(503);
    expect(page.body).toContain("Database unavailable");
    expect(page.ms).toBeLessThan(5_000);
    const health = await timed(http.get("/healthz"));
    expect(health.response.status).toBe(503);
    expect(health.ms).toBeLessThan(5_000);

    await database.restart();
    await expectRecoveredWithoutRestart();
    expect(await heldFigures()).toEqual(before);

    // The same order reserves in full on the same app process.
    const reserved = await http.send(
      "POST",
      `/api/v1/build-orders/${orderId}/reserve`,
      {},
      builder,
    );
    expect(reserved.status, await reserved.clone().text()).toBe(200);
    expect(await heldFigures()).toMatchObject({
      reservationRows: places,
      balancesReserved: places,
      itemReserved: places,
      linesReserved: places,
      status: "reserved",
    });
  });
});

describe("the server build's answer to a database lost mid-request (server/database-unavailable.ts)", () => {
  /** A port nothing listens on: connecting to it is refused at once, as to a stopped MariaDB. */
  async function closedPort(): Promise<number> {
    const server = net.createServer();
    await new Promise<void>((resolve) =>
      server.listen(0, "127.0.0.1", resolve),
    );
    const { port } = server.address() as net.AddressInfo;
    await new Promise((resolve) => server.close(resolve));
    return port;
  }

  it("turns a lost database into 503 (JSON for the API and resource routes, a route error for pages) and leaves every other error alone", async () => {
    const url = new URL(database.databaseUrl);
    url.port = String(await closedPort());
    const pool = mysql.createPool(poolOptionsFromUrl(url.toString()));
    const query = async () => {
      await pool.query("SELECT 1");
      return null;
    };
    const refusal = await query().catch((error: unknown) => error);
    expect((refusal as { code?: string }).code).toBe("ECONNREFUSED");
    const notAnOutage = Object.assign(new Error("Duplicate entry"), {
      code: "ER_DUP_ENTRY",
    });
    const build = answerDatabaseOutages({
      routes: {
        page: {
          id: "page",
          path: "stock",
          module: { default: () => null, loader: query, action: query },
        },
        api: { id: "api", path: "api/v1/items", module: { loader: query } },
        other: {
          id: "other",
          path: "other",
          module: {
            default: () => null,
            loader: () => Promise.reject(notAnOutage),
          },
        },
      },
    } as unknown as ServerBuild);
    const call = (id: string, kind: "loader" | "action", path: string) =>
      (build.routes[id]!.module[kind] as (args: unknown) => Promise<unknown>)({
        request: new Request(`http://localhost${path}`, {
          method: kind === "action" ? "POST" : "GET",
        }),
        params: {},
        context: {},
      }).catch((error: unknown) => error);

    try {
      const api = (await call("api", "loader", "/api/v1/items")) as Response;
      expect(api).toBeInstanceOf(Response);
      expect(api.status).toBe(503);
      expect(api.headers.get("Retry-After")).toBe("5");
      expect(await api.json()).toEqual(unavailable);

      for (const kind of ["loader", "action"] as const) {
        const page = (await call("page", kind, "/stock")) as {
          data: unknown;
          init: ResponseInit;
        };
        expect(page).not.toBeInstanceOf(Response);
        expect(page.init.status).toBe(503);
        expect(page.data).toEqual({ message: unavailable.error.message });
      }
      expect(await call("other", "loader", "/other")).toBe(notAnOutage);
    } finally {
      await pool.end();
    }
  });
});
