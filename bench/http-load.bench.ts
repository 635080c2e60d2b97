/**
 * HTTP load on loopback with autocannon (20 connections, 10 s each, bounded):
 * the stock list API and the design costing API, each beside a bare
 * `node:http` handler that answers the raw mysql2 query of the same data.
 * The ratio app ÷ raw of requests per second shows what the app costs.
 */
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
  answer: (pool: mysql.Pool) => Promise<unknown>,
): Promise<{ url: string; close(): Promise<void> }> {
  const pool = mysql.createPool({
    ...poolOptionsFromUrl(databaseUrl),
    connectionLimit: 10,
  });
  const server = http.createServer((_request, response) => {
    answer(pool)
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
  const stockRaw = await rawServer(input.databaseUrl, (pool) =>
    rawItemList(pool, new URLSearchParams("page=1&pageSize=50")),
  );
  try {
    const app = await load(`${input.baseUrl}/api/v1/items?page=1`, {
      Cookie: input.cookie,
    });
    const raw = await load(stockRaw.url);
    figures.push(...loadFigures("stock list API under load", app, raw));
  } finally {
    await stockRaw.close();
  }

  // The design costing API beside the raw reads of the same revision, lines and prices.
  const costingRaw = await rawServer(input.databaseUrl, async (pool) => {
    const [revision] = await pool.query(
      "SELECT * FROM design_revisions WHERE id = ?",
      [input.revisionId],
    );
    const [lines] = await pool.query(
      "SELECT l.*, i.sku, i.unit FROM design_lines l JOIN items i ON i.id = l.item_id WHERE l.revision_id = ? ORDER BY l.position",
      [input.revisionId],
    );
    const [prices] = await pool.query(
      "SELECT p.* FROM price_lines p JOIN design_lines l ON l.item_id = p.item_id WHERE l.revision_id = ?",
      [input.revisionId],
    );
    const [bases] = await pool.query("SELECT * FROM metal_base_prices");
    return { revision, lines, prices, bases };
  });
  try {
    const app = await load(`${input.baseUrl}${input.costingPath}`, {
      Cookie: input.cookie,
    });
    const raw = await load(costingRaw.url);
    figures.push(...loadFigures("design costing API under load", app, raw));
  } finally {
    await costingRaw.close();
  }
  return figures;
}
