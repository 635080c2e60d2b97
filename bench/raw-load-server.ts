/**
 * The raw baselines of the HTTP load benchmark (bench/http-load.bench.ts), run
 * as a process of their own as the app server is: a bare `node:http` handler
 * answering the raw mysql2 reads of the same work as JSON, on a free loopback
 * port. Started with RAW_LOAD_ANSWER=stock (the stock list API's reads) or
 * costing (the design costing API's, with RAW_LOAD_REVISION the revision's
 * {"id","designId","revision"}) and DATABASE_URL; prints {"port":…} on one
 * line once it listens, stops on SIGTERM.
 *
 * Why a process of its own: autocannon runs in the bench process. A raw
 * server in that process too would share its one thread with the load it is
 * measured by, while the app server has a thread (a core, on a 2-core
 * machine) of its own — the raw figure would come out low and the ratio app
 * ÷ raw look better than it is.
 */
import { createHash } from "node:crypto";
import http from "node:http";
import type { AddressInfo } from "node:net";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { rawItemList } from "./stock.bench";

type Answer = (
  pool: mysql.Pool,
  request: http.IncomingMessage,
) => Promise<unknown>;

/** The answer of each baseline. */
function answerOf(kind: string | undefined): Answer {
  if (kind === "stock")
    // The first page by SKU, beside the same count, after the session check.
    return async (pool, request) => ({
      session: await rawSessionRead(pool, request),
      ...(await rawItemList(pool, new URLSearchParams("page=1&pageSize=50"))),
    });
  if (kind === "costing") {
    const revision = JSON.parse(process.env.RAW_LOAD_REVISION ?? "null") as {
      id: number;
      designId: number;
      revision: number;
    } | null;
    if (!revision) throw new Error("RAW_LOAD_REVISION is not set");
    return (pool, request) => rawCostingReads(pool, request, revision);
  }
  throw new Error(`RAW_LOAD_ANSWER must be stock or costing (got ${kind})`);
}

/** Serves `answer` on a free loopback port with a pool of the app's size (10). */
async function serveRaw(databaseUrl: string, answer: Answer): Promise<void> {
  const pool = mysql.createPool({
    ...poolOptionsFromUrl(databaseUrl),
    connectionLimit: 10,
  });
  const server = http.createServer((request, response) => {
    answer(pool, request)
      .then((body) => {
        response.writeHead(200, { "Content-Type": "application/json" });
        response.end(JSON.stringify(body));
      })
      .catch((error: Error) => {
        response.writeHead(500);
        response.end(error.message);
      });
  });
  await new Promise<void>((resolve) =>
    server.listen(0, "127.0.0.1", () => resolve()),
  );
  process.once("SIGTERM", () => {
    server.close(() => void pool.end().then(() => process.exit(0)));
    server.closeAllConnections();
  });
  const { port } = server.address() as AddressInfo;
  process.stdout.write(`${JSON.stringify({ port })}\n`);
}

/**
 * The session check every signed-in request makes, bare: the statement the app's session
 * adapter sends (app/auth/session-adapter.server.ts), the session with its person and the
 * person's roles, found by the SHA-256 of the cookie's token.
 */
async function rawSessionRead(
  pool: mysql.Pool,
  request: http.IncomingMessage,
): Promise<unknown[][]> {
  const token = /turnledger_session=([^;]+)/.exec(
    request.headers.cookie ?? "",
  )?.[1];
  const sessionId = createHash("sha256")
    .update(token ?? "")
    .digest("hex");
  const [rows] = (await rowsAsArray(
    pool,
    "SELECT s.expires_at, s.started_at, u.id, u.email, u.name, u.active, u.locale, u.time_zone, r.role FROM sessions s INNER JOIN users u ON u.id = s.user_id LEFT JOIN user_roles r ON r.user_id = u.id WHERE s.id = ?",
    [sessionId],
  )) as unknown as [unknown[][]];
  if (rows.length === 0) throw new Error("raw: no session for the cookie");
  return rows;
}

const rowsAsArray = (pool: mysql.Pool, sql: string, values: unknown[]) =>
  pool.query({ sql, rowsAsArray: true }, values);

/**
 * The database work of GET /api/v1/designs/:id/revisions/:n/costing, bare: every table the
 * app reads for one costing (best price), the same rows, the same statements in the same
 * order (each waits for what it needs; the price lines and the reference go side by side),
 * with mysql2 and no framework. See `rawCostingNote`.
 */
async function rawCostingReads(
  pool: mysql.Pool,
  request: http.IncomingMessage,
  revision: { id: number; designId: number; revision: number },
): Promise<unknown> {
  const session = await rawSessionRead(pool, request);
  const [[revisionRow]] = (await rowsAsArray(
    pool,
    "SELECT d.id, d.name, d.description, d.motor_type, r.* FROM design_revisions r INNER JOIN designs d ON d.id = r.design_id WHERE r.design_id = ? AND r.revision = ? LIMIT 1",
    [revision.designId, revision.revision],
  )) as unknown as [unknown[][]];
  const [lines] = (await rowsAsArray(
    pool,
    "SELECT l.*, i.sku, i.name, i.unit, w.*, m.*, g.* FROM design_lines l INNER JOIN items i ON i.id = l.item_id LEFT JOIN wire_items w ON w.item_id = l.item_id LEFT JOIN magnet_items m ON m.item_id = l.item_id LEFT JOIN magnet_grades g ON g.grade_key = m.grade_key WHERE l.revision_id = ? ORDER BY l.position",
    [revision.id],
  )) as unknown as [unknown[][]];
  const itemIds = [...new Set(lines.map((line) => line[4]))];
  const [[prices], [reference]] = await Promise.all([
    rowsAsArray(
      pool,
      "SELECT p.item_id, p.supplier_id, p.lead_time_days, p.pack_quantity, p.supplier_sku, p.currency, p.unit_price, p.adder_per_kg, p.conductor, p.min_quantity, p.valid_from, p.import_id, p.line, s.name, s.lead_time_days, i.sku, i.unit FROM price_lines p INNER JOIN items i ON i.id = p.item_id INNER JOIN suppliers s ON s.id = p.supplier_id WHERE p.item_id IN (?) LIMIT ?",
      [itemIds, 5_000 * itemIds.length],
    ),
    pool.query(
      `SELECT 'base' AS kind, conductor AS a, currency AS b, CAST(price_per_kg AS CHAR) AS c, CAST(valid_from AS CHAR) AS d FROM metal_base_prices
       UNION ALL SELECT 'rate', currency, NULL, CAST(rate AS CHAR), CAST(valid_from AS CHAR) FROM currency_rates
       UNION ALL SELECT 'currency', value, NULL, NULL, NULL FROM settings WHERE setting_key = 'company_currency'`,
    ),
  ]);
  return { session, revision: revisionRow, lines, prices, reference };
}

await serveRaw(
  process.env.DATABASE_URL ?? "",
  answerOf(process.env.RAW_LOAD_ANSWER),
);
