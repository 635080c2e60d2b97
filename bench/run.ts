/**
 * npm run bench: every benchmark against a production build, on the test
 * database. Writes bench/report.json (raw samples included) and prints a summary.
 */
import fs from "node:fs";
import path from "node:path";
import { startTestEnvironment } from "../scripts/lib/test-environment";
import { demoPassword, demoStorekeeperId } from "../seed/demo-people";
import {
  benchCoilEstimateApi,
  benchPureCoilEstimates,
  type Figure,
} from "./coil-estimates.bench";
import { benchDesignCosting } from "./design-costing.bench";
import { benchHttpLoad } from "./http-load.bench";
import { benchLighthouse } from "./lighthouse.bench";
import {
  benchPriceImport,
  benchPriceImportProgress,
} from "./price-import.bench";
import { benchPageWeight } from "./page-weight.bench";
import { seedBenchStock } from "./seed-bench-stock";
import { benchStock } from "./stock.bench";

// The benchmarks get their own database beside the tests'.
process.env.TEST_DATABASE_NAME ??= "turnledger_test_bench";

// BENCH_ONLY=price-import (or coil, stock, design, load, price-import-progress, pages, lighthouse) runs one group
// while working on it.
const only = process.env.BENCH_ONLY;
const runs = (group: string) => !only || only === group;

const figures: Figure[] = [];
if (runs("coil")) figures.push(benchPureCoilEstimates());

const environment = await startTestEnvironment();
// Each page's first-load JavaScript, from the build the environment serves.
if (runs("pages"))
  figures.push(...benchPageWeight(process.env.BUILD_DIRECTORY ?? "build"));
// The app refuses cookie-signed writes without its own Origin (decision 012), as a browser
// sends it; the benchmarks' requests say where they come from the same way.
const plainFetch = globalThis.fetch;
globalThis.fetch = (input, init = {}) => {
  const url = String(input instanceof Request ? input.url : input);
  const method = (init.method ?? "GET").toUpperCase();
  if (method === "GET" || !url.startsWith(environment.baseUrl))
    return plainFetch(input, init);
  const headers = new Headers(init.headers);
  headers.set("Origin", environment.baseUrl);
  return plainFetch(input, { ...init, headers });
};
try {
  const signIn = await fetch(`${environment.baseUrl}/api/v1/sessions`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({
      email: "builder@turnledger.test",
      password: demoPassword(),
    }),
  });
  const cookie = signIn.headers.getSetCookie()[0]?.split(";")[0] ?? "";
  if (runs("coil"))
    figures.push(await benchCoilEstimateApi(environment.baseUrl, cookie));

  if (runs("stock")) {
    console.log("[bench] loading 20,000 items and 1,000,000 movements…");
    const loadStarted = performance.now();
    const { skus, locationCode } = await seedBenchStock(
      environment.databaseUrl,
      demoStorekeeperId,
    );
    console.log(
      `[bench] loaded in ${((performance.now() - loadStarted) / 1000).toFixed(1)} s`,
    );
    const storekeeper = await fetch(`${environment.baseUrl}/api/v1/sessions`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({
        email: "storekeeper@turnledger.test",
        password: demoPassword(),
      }),
    });
    const storekeeperCookie =
      storekeeper.headers.getSetCookie()[0]?.split(";")[0] ?? "";
    figures.push(
      ...(await benchStock({
        baseUrl: environment.baseUrl,
        databaseUrl: environment.databaseUrl,
        storekeeperCookie,
        skus,
        locationCode,
      })),
    );
  }
  const buyer = await fetch(`${environment.baseUrl}/api/v1/sessions`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({
      email: "buyer@turnledger.test",
      password: demoPassword(),
    }),
  });
  const buyerCookie = buyer.headers.getSetCookie()[0]?.split(";")[0] ?? "";
  let costing: { costingPath: string; revisionId: number } | null = null;
  if (runs("design") || runs("load")) {
    console.log("[bench] costing a 60-line design for 500 motors…");
    const design = await benchDesignCosting({
      baseUrl: environment.baseUrl,
      databaseUrl: environment.databaseUrl,
      buyerCookie,
      builderCookie: cookie,
    });
    figures.push(...design.figures);
    costing = design;
  }
  if (runs("load") && costing) {
    console.log(
      "[bench] HTTP load: 20 connections × 10 s on the stock list and design costing APIs…",
    );
    figures.push(
      ...(await benchHttpLoad({
        baseUrl: environment.baseUrl,
        databaseUrl: environment.databaseUrl,
        cookie,
        costingPath: costing.costingPath,
        revisionId: costing.revisionId,
      })),
    );
  }
  if (runs("price-import")) {
    console.log("[bench] importing a 100,000-row price list…");
    figures.push(
      ...(await benchPriceImport({
        baseUrl: environment.baseUrl,
        databaseUrl: environment.databaseUrl,
        buyerCookie,
        serverPid: environment.serverPid,
      })),
    );
  }
  if (runs("price-import-progress")) {
    console.log(
      "[bench] a 100,000-row price list with its progress streamed (check and commit, beside the plain requests)…",
    );
    figures.push(
      ...(await benchPriceImportProgress({
        baseUrl: environment.baseUrl,
        buyerCookie,
      })),
    );
  }
  if (runs("lighthouse")) {
    console.log(
      "[bench] Lighthouse, mobile preset, 3 runs each: stock list, record page, design page, insight…",
    );
    figures.push(
      ...(await benchLighthouse({
        baseUrl: environment.baseUrl,
        storekeeperEmail: "storekeeper@turnledger.test",
        password: demoPassword(),
      })),
    );
  }
  const status = fs.readFileSync(
    `/proc/${environment.serverPid}/status`,
    "utf8",
  );
  const peakMb = Number(status.match(/VmHWM:\s+(\d+) kB/)?.[1] ?? 0) / 1024;
  figures.push({
    name: "app server peak resident memory (whole run)",
    unit: "MB",
    target: "reported",
    passed: true,
    median: peakMb,
    p95: peakMb,
    samples: [peakMb],
  });
} finally {
  await environment.stop();
}

/**
 * Which raw baseline each app figure wraps (the bare SQL or mysql2 handler of
 * the same work, timed in the same run), by the start of the figures' names.
 * Throughput is compared the other way round (raw ÷ app), so that for every
 * ratio higher means the app costs more.
 */
const baselines: { figure: string; raw: string; throughput?: boolean }[] = [
  { figure: "GET /stock.data", raw: "raw SQL of the list" },
  { figure: "GET /api/v1/items", raw: "raw SQL of the list" },
  { figure: "POST /api/v1/stock-movements", raw: "raw SQL of one movement" },
  {
    figure: "price list 100,000 rows: commit",
    raw: "raw batched upsert of the same rows",
  },
  {
    figure: "stock list API under load: requests per second (app)",
    raw: "stock list API under load: requests per second (raw mysql2)",
    throughput: true,
  },
  {
    figure: "design costing API under load: requests per second (app)",
    raw: "design costing API under load: requests per second (raw mysql2)",
    throughput: true,
  },
];

interface Comparison {
  raw: string;
  rawMedian: number;
  rawP95: number;
  ratioMedian: number;
  ratioP95: number;
}

function comparisonOf(figure: Figure): Comparison | null {
  const pairing = baselines.find((entry) =>
    figure.name.startsWith(entry.figure),
  );
  const raw =
    pairing && figures.find((entry) => entry.name.startsWith(pairing.raw));
  if (!pairing || !raw) return null;
  const ratio = (app: number, bare: number) =>
    pairing.throughput ? bare / app : app / bare;
  return {
    raw: raw.name,
    rawMedian: raw.median,
    rawP95: raw.p95,
    ratioMedian: ratio(figure.median, raw.median),
    ratioP95: ratio(figure.p95, raw.p95),
  };
}

const report = {
  at: new Date().toISOString(),
  machine: {
    node: process.version,
    platform: process.platform,
    cpus: (await import("node:os")).cpus().length,
  },
  figures: figures.map((figure) => ({
    ...figure,
    baseline: comparisonOf(figure),
  })),
};
fs.writeFileSync(
  path.join(import.meta.dirname, only ? `report-${only}.json` : "report.json"),
  JSON.stringify(report, null, 2),
);
const verdict = (figure: Figure) =>
  figure.target === "reported" ? "" : figure.passed ? "met" : "MISSED";
const summary = [
  `Turnledger benchmarks, ${report.at}: Node ${report.machine.node}, ${report.machine.cpus} cores.`,
  "",
  `${"benchmark".padEnd(58)}${"median".padStart(11)}${"p95".padStart(11)}${"raw p95".padStart(11)}${"ratio p95".padStart(11)}   target`,
  ...figures.map((figure) => {
    const comparison = comparisonOf(figure);
    const raw = comparison ? comparison.rawP95.toFixed(3) : "";
    const ratio = comparison ? `${comparison.ratioP95.toFixed(2)}×` : "";
    return `${figure.name.padEnd(58)}${figure.median.toFixed(3).padStart(11)}${figure.p95.toFixed(3).padStart(11)}${raw.padStart(11)}${ratio.padStart(11)}   ${figure.target.padEnd(16)} ${verdict(figure).padEnd(6)} (${figure.unit})`;
  }),
  "",
  'Raw samples in bench/report.json. "raw p95" is the bare SQL or mysql2 handler of the same',
  "work timed in the same run (report.json names it for each figure); the ratio is app ÷ raw,",
  "or raw ÷ app for requests per second, so higher always means the app adds more.",
];
fs.writeFileSync(
  path.join(import.meta.dirname, only ? `summary-${only}.txt` : "summary.txt"),
  `${summary.join("\n")}\n`,
);
console.log(`\n${summary.join("\n")}`);
process.exit(figures.every((figure) => figure.passed) ? 0 : 1);
