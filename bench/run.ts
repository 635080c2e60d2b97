/**
 * npm run bench: every benchmark against a production build, on the test
 * database. Writes bench/report.json (raw samples included) and prints a summary.
 */
import fs from "node:fs";
import path from "node:path";
import {
  startAppServer,
  startTestEnvironment,
} from "../scripts/lib/test-environment";
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
import { scaleBufferPoolBytes, withBufferPool } from "./buffer-pool";
import { benchOneSize, largeBenchDatabase, sizeRatios } from "./scale.bench";
import {
  largeBenchSize,
  normalBenchSize,
  seedBenchStock,
} from "./seed-bench-stock";
import { benchStock } from "./stock.bench";
import { comparisonOf, formatSummary } from "./summary";

// The benchmarks get their own database beside the tests'.
process.env.TEST_DATABASE_NAME ??= "turnledger_test_bench";

// BENCH_ONLY=price-import (or coil, stock, scale, design, load, price-import-progress, pages,
// lighthouse) runs one group while working on it.
const only = process.env.BENCH_ONLY;
const runs = (group: string) => !only || only === group;

const figures: Figure[] = [];
/** Lines the summary ends with (how the large store was had). */
const notes: string[] = [];
if (runs("coil")) figures.push(benchPureCoilEstimates());

const environment = await startTestEnvironment();
// Each page's first-load JavaScript, from the build the environment serves.
if (runs("pages"))
  figures.push(...benchPageWeight(process.env.BUILD_DIRECTORY ?? "build"));
// The app refuses cookie-signed writes without its own Origin (decision 012), as a browser
// sends it; the benchmarks' requests say where they come from the same way.
// The large store's server (scale group) joins this list while it runs.
const appOrigins = [environment.baseUrl];
const plainFetch = globalThis.fetch;
globalThis.fetch = (input, init = {}) => {
  const url = String(input instanceof Request ? input.url : input);
  const method = (init.method ?? "GET").toUpperCase();
  const origin = appOrigins.find((base) => url.startsWith(base));
  if (method === "GET" || !origin) return plainFetch(input, init);
  const headers = new Headers(init.headers);
  headers.set("Origin", origin);
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

  const signInAs = async (email: string, baseUrl = environment.baseUrl) => {
    const answer = await fetch(`${baseUrl}/api/v1/sessions`, {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ email, password: demoPassword() }),
    });
    return answer.headers.getSetCookie()[0]?.split(";")[0] ?? "";
  };
  if (runs("stock") || runs("scale")) {
    console.log(
      "[bench] generating 20,000 items and 1,000,000 movements (SQL)…",
    );
    const loadStarted = performance.now();
    const stock = await seedBenchStock(
      environment.databaseUrl,
      demoStorekeeperId,
      normalBenchSize,
    );
    console.log(
      `[bench] loaded in ${((performance.now() - loadStarted) / 1000).toFixed(1)} s`,
    );
    const storekeeperCookie = await signInAs("storekeeper@turnledger.test");
    if (runs("stock"))
      figures.push(
        ...(await benchStock({
          baseUrl: environment.baseUrl,
          databaseUrl: environment.databaseUrl,
          storekeeperCookie,
          skus: stock.skus,
          locationCode: stock.locationCode,
        })),
      );
    if (runs("scale")) {
      console.log("[bench] the same requests at 1 M and at 10 M movements…");
      const started = performance.now();
      const large = await largeBenchDatabase({
        size: largeBenchSize,
        userId: demoStorekeeperId,
        log: (line) => console.log(`[bench] large store: ${line}`),
      });
      const seconds = ((performance.now() - started) / 1000).toFixed(0);
      const how = large.reused
        ? `reused from an earlier run (checked in ${seconds} s)`
        : `generated in ${seconds} s`;
      console.log(`[bench] large store ${how}`);
      notes.push(
        `The 10 M store (${largeBenchSize.items.toLocaleString("en")} items) was ${how}; it is kept for the next run`,
        "(drop the database <bench database>_large to make it again).",
      );
      // Both sizes with the same buffer pool, one that holds the large store (bench/buffer-pool.ts).
      const { poolBytes } = await withBufferPool(
        scaleBufferPoolBytes(),
        async () => {
          const normal = await benchOneSize({
            size: normalBenchSize,
            baseUrl: environment.baseUrl,
            databaseUrl: environment.databaseUrl,
            storekeeperCookie,
            stock,
          });
          const largeServer = await startAppServer({
            port: Number(process.env.TEST_PORT ?? 3100) + 8,
            databaseUrl: large.databaseUrl,
            smtpUrl: environment.smtpUrl,
          });
          appOrigins.push(largeServer.baseUrl);
          try {
            const largeFigures = await benchOneSize({
              size: largeBenchSize,
              baseUrl: largeServer.baseUrl,
              databaseUrl: large.databaseUrl,
              storekeeperCookie: await signInAs(
                "storekeeper@turnledger.test",
                largeServer.baseUrl,
              ),
              stock: large.stock,
            });
            figures.push(
              ...normal,
              ...largeFigures,
              ...sizeRatios(normal, largeFigures, {
                normal: normalBenchSize,
                large: largeBenchSize,
              }),
            );
          } finally {
            await largeServer.stop();
          }
        },
      );
      notes.push(
        poolBytes === null
          ? "Both sizes ran on TEST_DATABASE_URL's server with its own buffer pool."
          : `Both sizes ran with a ${Math.round(poolBytes / 1024 / 1024)} MB InnoDB buffer pool, raised for the scale group and put back after it (bench/buffer-pool.ts).`,
      );
    }
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

const report = {
  at: new Date().toISOString(),
  machine: {
    node: process.version,
    platform: process.platform,
    cpus: (await import("node:os")).cpus().length,
  },
  figures: figures.map((figure) => ({
    ...figure,
    baseline: comparisonOf(figure, figures),
  })),
};
fs.writeFileSync(
  path.join(import.meta.dirname, only ? `report-${only}.json` : "report.json"),
  JSON.stringify(report, null, 2),
);
const summary = formatSummary({ ...report, figures, notes });
fs.writeFileSync(
  path.join(import.meta.dirname, only ? `summary-${only}.txt` : "summary.txt"),
  `${summary.join("\n")}\n`,
);
console.log(`\n${summary.join("\n")}`);
process.exit(figures.every((figure) => figure.passed) ? 0 : 1);
