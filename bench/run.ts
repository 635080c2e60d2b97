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
import { benchPriceImport } from "./price-import.bench";
import { seedBenchStock } from "./seed-bench-stock";
import { benchStock } from "./stock.bench";

// The benchmarks get their own database beside the tests'.
process.env.TEST_DATABASE_NAME ??= "turnledger_test_bench";

// BENCH_ONLY=price-import (or coil, stock) runs one group while working on it.
const only = process.env.BENCH_ONLY;
const runs = (group: string) => !only || only === group;

const figures: Figure[] = [];
if (runs("coil")) figures.push(benchPureCoilEstimates());

const environment = await startTestEnvironment();
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
  if (runs("design")) {
    console.log("[bench] costing a 60-line design for 500 motors…");
    figures.push(
      ...(await benchDesignCosting({
        baseUrl: environment.baseUrl,
        databaseUrl: environment.databaseUrl,
        buyerCookie,
        builderCookie: cookie,
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
  figures,
};
fs.writeFileSync(
  path.join(import.meta.dirname, only ? `report-${only}.json` : "report.json"),
  JSON.stringify(report, null, 2),
);
console.log(
  `\n${"benchmark".padEnd(46)}${"median".padStart(9)}${"p95".padStart(9)}   target`,
);
for (const figure of figures) {
  console.log(
    `${figure.name.padEnd(46)}${figure.median.toFixed(3).padStart(9)}${figure.p95.toFixed(3).padStart(9)}   ${figure.target.padEnd(16)} ${figure.target === "reported" ? "" : figure.passed ? "met" : "MISSED"}  (${figure.unit})`,
  );
}
console.log("\nraw samples in bench/report.json");
process.exit(figures.every((figure) => figure.passed) ? 0 : 1);
