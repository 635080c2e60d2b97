/**
 * HTTP load on loopback with autocannon (20 connections, 10 s each, bounded):
 * the stock list API and the design costing API, each beside a bare
 * `node:http` handler that answers the raw mysql2 query of the same data.
 * The ratio app ÷ raw of requests per second shows what the app costs.
 */
import { createHash } from "node:crypto";
import http from "node:http";
import type { AddressInfo } from "node:net";
import autocannon from "autocannon";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import type { Figure } from "./coil-estimates.bench";
import { rawItemList } from "./stock.bench";

const connections = 20;
const durationSeconds = 10;

interface LoadResult {
  requestsPerSecond: number;
  latencyMedianMs: number;
  latencyP97_5Ms: number;
  errors: number;
  non2xx: number;
}

function load(
  url: string,
  headers: Record<string, string> = {},
): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    autocannon(
      {
        url,
        connections,
        duration: durationSeconds,
        headers,
        // Bounded by time (autocannon's `amount` would override the duration).
      },
      (error, result) => {
        if (error) return reject(error);
        resolve({
          requestsPerSecond: result.requests.average,
          latencyMedianMs: result.latency.p50,
          latencyP97_5Ms: result.latency.p97_5,
          errors: result.errors,
          non2xx: result.non2xx,
        });
      },
    );
  });
}

/** A bare node:http server answering one raw query as JSON, on a free loopback port. */
async function rawServer(
  databaseUrl: string,
  answer: (pool: mysql.Pool, request: http.IncomingMessage) => Promise<unknown>,
): Promise<{ url: string; close(): Promise<void> }> {
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
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}/`,
    close: async () => {
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await pool.end();
    },
  };
}

function loadFigures(name: string, app: LoadResult, raw: LoadResult): Figure[] {
  const failed = app.errors + app.non2xx + raw.errors + raw.non2xx;
  return [
    {
      name: `${name}: requests per second (app)`,
      unit: "req/s",
      target: "reported",
      passed: failed === 0,
      median: app.requestsPerSecond,
      p95: app.requestsPerSecond,
      samples: [app.requestsPerSecond],
    },
    {
      name: `${name}: requests per second (raw mysql2)`,
      unit: "req/s",
      target: "reported",
      passed: true,
      median: raw.requestsPerSecond,
      p95: raw.requestsPerSecond,
      samples: [raw.requestsPerSecond],
    },
    {
      name: `${name}: ratio raw ÷ app (req/s)`,
      unit: "times",
      target: "reported",
      passed: true,
      median: raw.requestsPerSecond / app.requestsPerSecond,
      p95: raw.requestsPerSecond / app.requestsPerSecond,
      samples: [raw.requestsPerSecond / app.requestsPerSecond],
    },
    {
      name: `${name}: latency under load (app, p50 / p97.5)`,
      unit: "ms",
      target: "reported",
      passed: true,
      median: app.latencyMedianMs,
      p95: app.latencyP97_5Ms,
      samples: [app.latencyMedianMs, app.latencyP97_5Ms],
    },
  ];
}

export async function benchHttpLoad(input: {
  baseUrl: string;
  databaseUrl: string;
  cookie: string;
  costingPath: string;
  revisionId: number;
}): Promise<Figure[]> {
  const figures: Figure[] = [];

  // The stock list API, first page by SKU, beside the same count and page read raw.
  const stockRaw = await rawServer(
    input.databaseUrl,
    async (pool, request) => ({
      session: await rawSessionRead(pool, request),
      ...(await rawItemList(pool, new URLSearchParams("page=1&pageSize=50"))),
    }),
  );
  try {
    const app = await load(`${input.baseUrl}/api/v1/items?page=1`, {
      Cookie: input.cookie,
    });
    // The same session cookie: the raw handler reads the session as the app must.
    const raw = await load(stockRaw.url, { Cookie: input.cookie });
    figures.push(...loadFigures("stock list API under load", app, raw));
  } finally {
    await stockRaw.close();
  }

  // The design costing API beside the raw reads of the same revision, lines and prices.
  const costingRaw = await rawServer(input.databaseUrl, (pool, request) =>
    rawCostingReads(pool, request, {
      id: input.revisionId,
      ...revisionOfPath(input.costingPath),
    }),
  );
  try {
    const app = await load(`${input.baseUrl}${input.costingPath}`, {
      Cookie: input.cookie,
    });
    // The same session cookie: the raw handler reads the session as the app must.
    const raw = await load(costingRaw.url, { Cookie: input.cookie });
    figures.push(
      ...loadFigures("design costing API under load", app, raw).map(
        (figure) => ({ ...figure, note: rawCostingNote }),
      ),
    );
  } finally {
    await costingRaw.close();
  }
  return figures;
}

/** What the raw costing handler reads, for the figures' note. */
const rawCostingNote =
  "raw: the statements a costing request sends, bare: the session with its person and roles (one statement, sessions ⋈ users ⟕ user_roles by the cookie's SHA-256), the revision ⋈ design, its lines ⋈ items ⋈ wire_items ⋈ magnet_items ⋈ magnet_grades, then side by side the lines' price lines ⋈ items ⋈ suppliers and the metal bases, currency rates and company currency (one statement); answered as JSON, no costing arithmetic";

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

/** The design id and revision number of a costing path (/api/v1/designs/7/revisions/1/costing…). */
function revisionOfPath(path: string): { designId: number; revision: number } {
  const match = /\/designs\/(\d+)\/revisions\/(\d+)\//.exec(path);
  if (!match) throw new Error(`not a costing path: ${path}`);
  return { designId: Number(match[1]), revision: Number(match[2]) };
}
