/**
 * Two production app servers, each on its own node of a three-node MariaDB
 * Galera cluster (tests/support/galera-environment.ts), as behind a load
 * balancer: concurrent issues and reservations split between them never
 * oversell and never answer 5xx (a transaction that loses Galera's
 * certification is run again), sessions and the sign-in throttle work across
 * both, a 20,000-row price list commits while the other server records
 * movements, and a node killed in the middle of a stream of movements costs
 * only its own server's answers (503, never 500) until it rejoins, after which
 * all three nodes hold the same rows.
 *
 * Each concurrent test prints its answers' status counts ([galera] …).
 */
import {
  afterAll,
  afterEach,
  beforeAll,
  beforeEach,
  describe,
  expect,
  inject,
  it,
} from "vitest";
import { demoPassword } from "../../seed/demo-people";
import {
  startAppServer,
  type AppServer,
} from "../../scripts/lib/test-environment";
import { uniqueEmail } from "../support/app-client";
import { createDesign } from "../support/design-fixtures";
import {
  AppClient,
  cleanUp,
  faultCode,
  priceListCsv,
} from "../support/fault-environment";
import {
  GaleraTestCluster,
  galeraTestPorts,
  statusCounts,
} from "../support/galera-environment";
import { createLocation, createPerson } from "../support/test-database";

let cluster: GaleraTestCluster;
/** The server on node 1 and the server on node 2. */
let first: AppServer;
let second: AppServer;
let one: AppClient;
let two: AppClient;
let buyer = "";
let storekeeper = "";
let builder = "";
let store = "";
const started = Date.now();

beforeAll(async () => {
  cluster = await GaleraTestCluster.start({ smtpUrl: inject("smtpUrl") });
  const smtpUrl = inject("smtpUrl");
  [first, second] = await Promise.all([
    startAppServer({
      port: galeraTestPorts.apps[0],
      databaseUrl: cluster.urlFor(0),
      smtpUrl,
    }),
    startAppServer({
      port: galeraTestPorts.apps[1],
      databaseUrl: cluster.urlFor(1),
      smtpUrl,
    }),
  ]);
  one = new AppClient(first.baseUrl);
  two = new AppClient(second.baseUrl);
  buyer = await one.signIn("buyer@turnledger.test", demoPassword());
  storekeeper = await two.signIn("storekeeper@turnledger.test", demoPassword());
  builder = await one.signIn("builder@turnledger.test", demoPassword());
  store = await createLocation(faultCode("GS"), undefined, cluster.pool(0));
  console.log(
    `[galera] cluster of 3, migrations, seed and 2 app servers ready in ${((Date.now() - started) / 1000).toFixed(1)} s`,
  );
}, 300_000);

afterAll(async () => {
  await cleanUp(
    () => first?.stop(),
    () => second?.stop(),
    () => cluster?.stop(),
  );
  console.log(
    `[galera] the Galera tests took ${((Date.now() - started) / 1000).toFixed(1)} s in all`,
  );
}, 120_000);

/** The server of the `index`th of a batch of requests: even ones to node 1's, odd ones to node 2's. */
const alternate = (index: number) => (index % 2 ? two : one);

async function createItem(body: Record<string, unknown>): Promise<string> {
  const sku = faultCode(body.kind === "wire" ? "GW" : "GP");
  const response = await one.send(
    "POST",
    "/api/v1/items",
    { sku, ...body },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
  return sku;
}

const createWire = () =>
  createItem({
    kind: "wire",
    name: "Enamelled copper 0.50 mm grade 2",
    conductor: "copper",
    standard: "IEC",
    size: "0.5",
    insulation: "grade2",
    thermalClass: 180,
    enamel: "polyesterimide",
  });
const createPart = (name = "Bearing 6001-2RS") =>
  createItem({ kind: "part", name, unit: "pcs" });

async function itemId(sku: string): Promise<number> {
  const [row] = await cluster.query<{ id: number }>(
    0,
    "SELECT id FROM items WHERE sku = ?",
    [sku],
  );
  return row!.id;
}

function move(
  server: AppClient,
  body: Record<string, unknown>,
): Promise<Response> {
  return server.send("POST", "/api/v1/stock-movements", body, storekeeper);
}

async function receive(body: Record<string, unknown>): Promise<void> {
  const response = await move(one, { type: "receipt", ...body });
  expect(response.status, await response.clone().text()).toBe(201);
}

/**
 * On every node: each balance equals the sum of its movements and is never
 * negative, and each item's on-hand equals the sum of its balances.
 */
async function expectLedgerBalancedOnEveryNode(): Promise<void> {
  for (const node of [0, 1, 2]) {
    const mismatches = await cluster.query(
      node,
      `SELECT b.item_id, b.lot_id, b.location_id, b.on_hand, COALESCE(SUM(m.quantity), 0) AS moved
         FROM stock_balances b
         LEFT JOIN stock_movements m ON m.item_id = b.item_id AND m.lot_id = b.lot_id AND m.location_id = b.location_id
        GROUP BY b.item_id, b.lot_id, b.location_id, b.on_hand
       HAVING b.on_hand <> moved OR b.on_hand < 0`,
    );
    expect(mismatches, `node ${node + 1}`).toEqual([]);
    const itemMismatches = await cluster.query(
      node,
      `SELECT i.sku FROM items i LEFT JOIN stock_balances b ON b.item_id = i.id
        GROUP BY i.id, i.sku, i.on_hand HAVING i.on_hand <> COALESCE(SUM(b.on_hand), 0)`,
    );
    expect(itemMismatches, `node ${node + 1}`).toEqual([]);
  }
}

/** Transactions both servers ran again after a conflict so far (their /metrics, read from loopback). */
async function retriesSoFar(): Promise<number> {
  let total = 0;
  for (const server of [first, second]) {
    const text = await (await fetch(`${server.baseUrl}/metrics`)).text();
    for (const match of text.matchAll(
      /^turnledger_transaction_retries_total\{[^}]*\} (\d+)/gm,
    ))
      total += Number(match[1]);
  }
  return total;
}

let retriesBefore = 0;
beforeEach(async () => {
  retriesBefore = await retriesSoFar();
});

function expectNoServerErrors(
  statuses: number[],
  allowed: number[],
  what: string,
): void {
  const counts = statusCounts(statuses);
  console.log(`[galera] ${what}: ${JSON.stringify(counts)}`);
  expect(
    Object.keys(counts)
      .map(Number)
      .filter((status) => !allowed.includes(status)),
    `${what}: ${JSON.stringify(counts)}`,
  ).toEqual([]);
}

afterEach(async (context) => {
  if (!first?.running() || !second?.running()) return;
  const retries = (await retriesSoFar()) - retriesBefore;
  console.log(
    `[galera] transactions retried after a conflict during "${context.task.name.slice(0, 60)}…": ${retries}`,
  );
});

describe("two app servers on two nodes of a Galera cluster", () => {
  it("the cluster has three nodes Synced, and the servers use different nodes", async () => {
    const addresses = new Set<string>();
    for (const node of [0, 1, 2]) {
      const rows = await cluster.query<{
        Variable_name: string;
        Value: string;
      }>(
        node,
        "SHOW GLOBAL STATUS WHERE Variable_name IN ('wsrep_local_state_comment', 'wsrep_cluster_size')",
      );
      const status = Object.fromEntries(
        rows.map((row) => [row.Variable_name, row.Value]),
      );
      expect(status).toEqual({
        wsrep_local_state_comment: "Synced",
        wsrep_cluster_size: "3",
      });
      addresses.add(new URL(cluster.urlFor(node)).port);
    }
    expect(addresses.size).toBe(3);
    expect(first.pid).not.toBe(second.pid);
  });

  it("100 concurrent 1 kg issues against a 20 kg lot, split between the servers: exactly 20 × 201 and 80 × 409, no 5xx", async () => {
    const sku = await createWire();
    await receive({
      sku,
      lot: "G20",
      location: store,
      quantity: 20,
      unitCost: 10,
    });
    const answers = await Promise.all(
      Array.from({ length: 100 }, (_, index) =>
        move(alternate(index), {
          type: "issue",
          sku,
          lot: "G20",
          location: store,
          quantity: 1,
        }),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    expectNoServerErrors(statuses, [201, 409], "100 issues of 1 kg from 20 kg");
    expect(statuses.filter((status) => status === 201)).toHaveLength(20);
    expect(statuses.filter((status) => status === 409)).toHaveLength(80);
    const refused = await answers
      .find((answer) => answer.status === 409)!
      .json();
    expect(refused.error.message).toMatch(/cannot take 1 kg/);

    const id = await itemId(sku);
    for (const node of [0, 1, 2]) {
      const [lot] = await cluster.query<{ onHand: string; moved: string }>(
        node,
        `SELECT b.on_hand AS onHand,
                (SELECT SUM(m.quantity) FROM stock_movements m
                  WHERE m.item_id = b.item_id AND m.lot_id = b.lot_id AND m.location_id = b.location_id) AS moved
           FROM stock_balances b JOIN lots l ON l.id = b.lot_id
          WHERE b.item_id = ? AND l.lot_number = 'G20'`,
        [id],
      );
      expect(Number(lot!.onHand), `node ${node + 1}`).toBe(0);
      expect(Number(lot!.moved), `node ${node + 1}`).toBe(0);
      const [movements] = await cluster.query<{ issues: number }>(
        node,
        "SELECT COUNT(*) AS issues FROM stock_movements WHERE item_id = ? AND type = 'issue'",
        [id],
      );
      expect(Number(movements!.issues), `node ${node + 1}`).toBe(20);
    }
    await expectLedgerBalancedOnEveryNode();
  });

  it("40 concurrent build-order reservations split between the servers never reserve more than is on hand, no 5xx", async () => {
    // 100 shafts and 60 bearings; a motor takes 7 shafts and 5 bearings:
    // bearings run out after 12 motors, while shafts alone would last 14.
    const shaft = await createPart("Shaft 8 mm");
    const bearing = await createPart();
    await receive({ sku: shaft, location: store, quantity: 100, unitCost: 3 });
    await receive({
      sku: bearing,
      location: store,
      quantity: 60,
      unitCost: 1.5,
    });
    const design = await createDesign(
      [
        { kind: "part", itemId: await itemId(shaft), quantityPerMotor: "7" },
        { kind: "part", itemId: await itemId(bearing), quantityPerMotor: "5" },
      ],
      { database: cluster.pool(0) },
    );
    const orders: number[] = [];
    for (let index = 0; index < 40; index += 1) {
      const created = await alternate(index).send(
        "POST",
        "/api/v1/build-orders",
        { designId: design.designId, revision: design.revision, quantity: 1 },
        builder,
      );
      expect(created.status, await created.clone().text()).toBe(201);
      orders.push(((await created.json()) as { id: number }).id);
    }

    const answers = await Promise.all(
      orders.map((id, index) =>
        alternate(index).send(
          "POST",
          `/api/v1/build-orders/${id}/reserve`,
          {},
          builder,
        ),
      ),
    );
    const statuses = answers.map((answer) => answer.status);
    expectNoServerErrors(statuses, [200, 409], "40 build-order reservations");
    // The bearings cover exactly 12 motors, whichever server took them.
    expect(statuses.filter((status) => status === 200)).toHaveLength(12);

    for (const node of [0, 1, 2]) {
      for (const [sku, perMotor, onHand] of [
        [shaft, 7, 100],
        [bearing, 5, 60],
      ] as const) {
        const [item] = await cluster.query<{
          onHand: string;
          reserved: string;
        }>(
          node,
          "SELECT on_hand AS onHand, reserved FROM items WHERE sku = ?",
          [sku],
        );
        expect(Number(item!.onHand), `node ${node + 1}`).toBe(onHand);
        expect(Number(item!.reserved), `node ${node + 1}`).toBe(12 * perMotor);
        const over = await cluster.query(
          node,
          "SELECT lot_id FROM stock_balances WHERE item_id = (SELECT id FROM items WHERE sku = ?) AND reserved > on_hand",
          [sku],
        );
        expect(over, `node ${node + 1}`).toEqual([]);
      }
    }
  });

  it("a session started on one server works on the other, and the sign-in throttle counts failures on both", async () => {
    const password = "correct horse battery staple";
    const email = uniqueEmail("galera-session");
    await createPerson(
      { email, password, roles: ["storekeeper"] },
      cluster.pool(0),
    );
    const cookie = await one.signIn(email, password);
    const me = await two.get("/api/v1/me", cookie);
    expect(me.status).toBe(200);
    expect(await me.json()).toMatchObject({ user: { email } });
    expect((await two.get("/stock", cookie)).status).toBe(200);

    // Five wrong passwords, alternating between the servers (the limit is 5
    // per account in 15 minutes): the sixth attempt is refused on either.
    const throttled = uniqueEmail("galera-throttle");
    await createPerson(
      { email: throttled, password, roles: ["buyer"] },
      cluster.pool(1),
    );
    for (const [attempt, server] of [one, two, one, two, one].entries()) {
      const response = await server.send("POST", "/api/v1/sessions", {
        email: throttled,
        password: `wrong-${attempt}`,
      });
      expect(response.status, `attempt ${attempt + 1}`).toBe(401);
    }
    for (const server of [two, one]) {
      const sixth = await server.send("POST", "/api/v1/sessions", {
        email: throttled,
        password,
      });
      expect(sixth.status).toBe(429);
      expect(Number(sixth.headers.get("Retry-After"))).toBeGreaterThan(0);
    }
  });

  it("a 20,000-row price list commits through one server while the other records movements, no 5xx", async () => {
    const supplier = `Galera Supplies ${faultCode("S")}`;
    const created = await one.send(
      "POST",
      "/api/v1/suppliers",
      { name: supplier, currency: "EUR" },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const sku = await createPart("Spacer 3 mm");
    await receive({ sku, location: store, quantity: 50, unitCost: 0.2 });

    const rows = 20_000;
    let uploading = true;
    const upload = one
      .uploadPriceList(buyer, {
        supplier,
        fileName: "galera-20000.csv",
        csv: priceListCsv(rows, faultCode("GL")),
      })
      .finally(() => (uploading = false));
    // One movement after another on the other server until the upload is answered.
    const statuses: number[] = [];
    while (uploading || statuses.length < 10) {
      const answer = await move(two, {
        type: statuses.length % 2 ? "issue" : "receipt",
        sku,
        location: store,
        quantity: 1,
        unitCost: 0.2,
      });
      statuses.push(answer.status);
      await answer.arrayBuffer();
    }
    const uploaded = await upload;
    const body = await uploaded.text();
    expect(uploaded.status, body.slice(0, 300)).toBe(201);
    expect(JSON.parse(body)).toMatchObject({ rows, newItems: rows / 4 });
    expectNoServerErrors(
      statuses,
      [201, 409],
      `movements on node 2's server during a ${rows}-row price-list commit on node 1's`,
    );
    for (const node of [0, 1, 2]) {
      const [lines] = await cluster.query<{ n: number }>(
        node,
        "SELECT COUNT(*) AS n FROM price_lines l JOIN suppliers s ON s.id = l.supplier_id WHERE s.name = ?",
        [supplier],
      );
      expect(Number(lines!.n), `node ${node + 1}`).toBe(rows);
    }
    await expectLedgerBalancedOnEveryNode();
  });

  it("a node killed in a stream of movements: the other server keeps answering, its own answers 503 until the node rejoins, then all nodes agree", async () => {
    const sku = await createPart("Circlip 8 mm");
    await receive({ sku, location: store, quantity: 1000, unitCost: 0.05 });
    const movement = (index: number) => ({
      type: index % 3 === 2 ? "issue" : "receipt",
      sku,
      location: store,
      quantity: 1,
      unitCost: 0.05,
    });
    const survivor: number[] = [];
    const orphan: number[] = [];
    /** Rounds of one movement to each server at once. */
    const stream = async (rounds: number, phase: string) => {
      const before = { survivor: survivor.length, orphan: orphan.length };
      for (let round = 0; round < rounds; round += 1) {
        const answers = await Promise.all([
          move(one, movement(round)),
          move(two, movement(round)),
        ]);
        survivor.push(answers[0].status);
        orphan.push(answers[1].status);
        await Promise.all(answers.map((answer) => answer.arrayBuffer()));
      }
      console.log(
        `[galera] ${phase}: node 1's server ${JSON.stringify(statusCounts(survivor.slice(before.survivor)))}, ` +
          `node 2's server ${JSON.stringify(statusCounts(orphan.slice(before.orphan)))}`,
      );
    };

    await stream(10, "before the kill");
    const streaming = stream(30, "node 2 killed after the 5th round");
    await new Promise((resolve) => setTimeout(resolve, 300));
    await cluster.kill(1);
    await streaming;

    // Node 2 is down: its server answers 503 in the API's shape, the other one goes on.
    const down = await move(two, movement(0));
    expect(down.status).toBe(503);
    expect(await down.json()).toMatchObject({
      error: { message: expect.any(String) },
    });
    expect(
      (await fetch(`${first.baseUrl}/healthz`)).status,
      "node 1's server is healthy",
    ).toBe(200);
    expect((await fetch(`${second.baseUrl}/healthz`)).status).toBe(503);

    // Node 2 restarts and rejoins (IST) while its server keeps being asked.
    const rejoinStarted = Date.now();
    let rejoining = true;
    const rejoined = cluster.restart(1).finally(() => (rejoining = false));
    const duringRejoin: number[] = [];
    while (rejoining) {
      const answer = await move(two, movement(duringRejoin.length));
      duringRejoin.push(answer.status);
      await answer.arrayBuffer();
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    await rejoined;
    console.log(
      `[galera] node 2 rejoined and all nodes Synced in ${((Date.now() - rejoinStarted) / 1000).toFixed(1)} s`,
    );
    expectNoServerErrors(
      duringRejoin,
      [201, 409, 503],
      "node 2's server while node 2 restarts and rejoins",
    );
    // Its server recovers without a restart once its pool reconnects.
    await expect
      .poll(async () => (await move(two, movement(0))).status, {
        timeout: 30_000,
        interval: 250,
      })
      .toBe(201);
    await stream(10, "after the rejoin");

    expectNoServerErrors(survivor, [201, 409], "node 1's server, all rounds");
    expectNoServerErrors(
      orphan,
      [201, 409, 503],
      "node 2's server, all rounds",
    );
    expect(
      orphan.slice(-10).every((status) => status === 201 || status === 409),
      "node 2's server after the rejoin",
    ).toBe(true);

    // After the rejoin every node holds the same rows, table by table (read
    // again while a server's own background write may still be arriving).
    await expect
      .poll(async () => {
        const [node1, node2, node3] = await Promise.all(
          [0, 1, 2].map((node) => cluster.tableDigests(node)),
        );
        return { node2: node2, node3: node3, equalTo: node1 };
      })
      .toSatisfy(
        ({ node2, node3, equalTo }) =>
          JSON.stringify(node2) === JSON.stringify(equalTo) &&
          JSON.stringify(node3) === JSON.stringify(equalTo),
      );
    const digests = await cluster.tableDigests(2);
    expect(digests.stock_movements).toMatch(/^[1-9]\d*:/);
    await expectLedgerBalancedOnEveryNode();
  });
});
