/**
 * HTTP load on loopback with autocannon (20 connections, 10 s each, bounded):
 * the stock list API and the design costing API, each beside a bare
 * `node:http` handler that answers the raw mysql2 query of the same data, in a
 * process of its own (bench/raw-load-server.ts) as the app server is.
 * The ratio app ÷ raw of requests per second shows what the app costs.
 */
import { spawn } from "node:child_process";
import path from "node:path";
import autocannon from "autocannon";
import type { Figure } from "./coil-estimates.bench";

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

/**
 * A raw baseline (bench/raw-load-server.ts) in a process of its own, as the app
 * server is, so that it does not share the bench process's one thread with
 * autocannon. Resolves once it listens.
 */
async function rawServer(
  databaseUrl: string,
  answer: "stock" | "costing",
  revision?: { id: number; designId: number; revision: number },
): Promise<{ url: string; close(): Promise<void> }> {
  const child = spawn(
    process.execPath,
    ["--import", "tsx", path.join(import.meta.dirname, "raw-load-server.ts")],
    {
      stdio: ["ignore", "pipe", "inherit"],
      env: {
        ...process.env,
        DATABASE_URL: databaseUrl,
        RAW_LOAD_ANSWER: answer,
        RAW_LOAD_REVISION: JSON.stringify(revision ?? null),
      },
    },
  );
  const exited = new Promise<void>((resolve) =>
    child.once("exit", () => resolve()),
  );
  const port = await new Promise<number>((resolve, reject) => {
    let output = "";
    child.stdout.on("data", (chunk: Buffer) => {
      output += chunk.toString();
      const end = output.indexOf("\n");
      if (end >= 0)
        resolve((JSON.parse(output.slice(0, end)) as { port: number }).port);
    });
    child.once("exit", (code) =>
      reject(new Error(`the raw load server exited with ${code}`)),
    );
  });
  return {
    url: `http://127.0.0.1:${port}/`,
    close: async () => {
      child.kill("SIGTERM");
      await exited;
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
  const stockRaw = await rawServer(input.databaseUrl, "stock");
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
  const costingRaw = await rawServer(input.databaseUrl, "costing", {
    id: input.revisionId,
    ...revisionOfPath(input.costingPath),
  });
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

/** The design id and revision number of a costing path (/api/v1/designs/7/revisions/1/costing…). */
function revisionOfPath(path: string): { designId: number; revision: number } {
  const match = /\/designs\/(\d+)\/revisions\/(\d+)\//.exec(path);
  if (!match) throw new Error(`not a costing path: ${path}`);
  return { designId: Number(match[1]), revision: Number(match[2]) };
}
