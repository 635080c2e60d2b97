/**
 * Pages on a slow network: Lighthouse's mobile preset (a mid-range phone,
 * simulated slow 4G and a 4× slower CPU) on the stock list, the record page, a
 * released design's page and insight, signed in as the demo storekeeper (who
 * may open all four). Each page is run three times and the median taken;
 * the target is performance ≥ 90, the other scores and the paint and shift
 * figures are reported. How and why: docs/decisions/052-lighthouse-in-the-bench.md.
 *
 * Debian's Chromium is launched through playwright-core with a remote debugging
 * port and a fresh profile; Lighthouse attaches to that port, so it starts no
 * browser and downloads nothing of its own.
 */
import fs from "node:fs";
import net from "node:net";
import os from "node:os";
import path from "node:path";
import lighthouse from "lighthouse";
import { chromium } from "playwright-core";
import type { Figure } from "./coil-estimates.bench";
import { summarise } from "./statistics";

/** Debian's Chromium, with the flags the closed network here needs (docs/stack). */
const chromiumFlags = [
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--no-first-run",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
];

/** Three, Lighthouse's advice; BENCH_LIGHTHOUSE_RUNS=1 for a quick look while working on a page. */
const runsPerPage = Number(process.env.BENCH_LIGHTHOUSE_RUNS ?? 3);

/** The figures read from each Lighthouse run. */
const scores = ["performance", "accessibility", "best-practices"] as const;
const metrics = [
  { audit: "first-contentful-paint", label: "first contentful paint" },
  { audit: "largest-contentful-paint", label: "largest contentful paint" },
  { audit: "total-blocking-time", label: "total blocking time" },
  { audit: "cumulative-layout-shift", label: "cumulative layout shift" },
] as const;

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() =>
        typeof address === "object" && address
          ? resolve(address.port)
          : reject(new Error("no free port")),
      );
    });
  });
}

async function signIn(baseUrl: string, email: string, password: string) {
  const response = await fetch(`${baseUrl}/api/v1/sessions`, {
    method: "POST",
    headers: { "Content-Type": "application/json" },
    body: JSON.stringify({ email, password }),
  });
  const pair = response.headers.getSetCookie()[0]?.split(";")[0] ?? "";
  const separator = pair.indexOf("=");
  if (response.status >= 400 || separator < 1)
    throw new Error(`signing in as ${email} answered ${response.status}`);
  return { name: pair.slice(0, separator), value: pair.slice(separator + 1) };
}

/** The page of a released revision of the demo's Kestrel outrunner (seed/demo-designs.ts). */
async function releasedDesignPath(baseUrl: string, cookie: string) {
  const response = await fetch(`${baseUrl}/api/v1/designs?search=Kestrel`, {
    headers: { Cookie: cookie },
  });
  const designs = (await response.json()) as {
    id: number;
    name: string;
    revisions: { revision: number; status: string }[];
  }[];
  for (const design of designs) {
    const released = design.revisions.find(
      (revision) => revision.status === "released",
    );
    if (released) return `/designs/${design.id}/revisions/${released.revision}`;
  }
  throw new Error("the demo data has no released Kestrel design");
}

export async function benchLighthouse(options: {
  baseUrl: string;
  storekeeperEmail: string;
  password: string;
}): Promise<Figure[]> {
  const cookie = await signIn(
    options.baseUrl,
    options.storekeeperEmail,
    options.password,
  );
  const cookieHeader = `${cookie.name}=${cookie.value}`;
  const pages = [
    { label: "stock list", path: "/stock" },
    { label: "record page", path: "/stock/record" },
    {
      label: "design page",
      path: await releasedDesignPath(options.baseUrl, cookieHeader),
    },
    { label: "insight", path: "/insight" },
  ];

  const port = await freePort();
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), "lighthouse-profile-"));
  const reports = fs.mkdtempSync(path.join(os.tmpdir(), "lighthouse-reports-"));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: "/usr/bin/chromium",
    headless: true,
    args: [...chromiumFlags, `--remote-debugging-port=${port}`],
  });
  const figures: Figure[] = [];
  // Lighthouse's own measure of the machine's speed at each run (higher is faster): the
  // simulation multiplies the main thread's observed work by 4, so a busy machine shows
  // in total blocking time first. Reported so a reader can tell a slow run from a slow page.
  const benchmarkIndexes: number[] = [];
  try {
    await context.addCookies([{ ...cookie, url: options.baseUrl }]);
    for (const page of pages) {
      const runs: { scores: number[]; metrics: number[] }[] = [];
      for (let run = 0; run < runsPerPage; run += 1) {
        const result = await lighthouse(`${options.baseUrl}${page.path}`, {
          port,
          logLevel: "error",
          output: "json",
          onlyCategories: [...scores],
        });
        if (!result)
          throw new Error(`Lighthouse gave nothing for ${page.path}`);
        const { lhr } = result;
        if (lhr.runtimeError)
          throw new Error(`${page.path}: ${lhr.runtimeError.message}`);
        if (new URL(lhr.finalDisplayedUrl).pathname !== page.path)
          throw new Error(
            `${page.path} ended at ${lhr.finalDisplayedUrl}: not signed in?`,
          );
        fs.writeFileSync(
          path.join(
            reports,
            `${page.label.replace(/ /g, "-")}-${run + 1}.json`,
          ),
          JSON.stringify(lhr),
        );
        benchmarkIndexes.push(lhr.environment.benchmarkIndex);
        runs.push({
          scores: scores.map((key) => 100 * (lhr.categories[key]?.score ?? 0)),
          metrics: metrics.map(
            ({ audit }) => lhr.audits[audit]?.numericValue ?? Number.NaN,
          ),
        });
      }
      const name = (what: string) => `Lighthouse ${page.label}: ${what}`;
      for (const [index, key] of scores.entries()) {
        const samples = runs.map((run) => run.scores[index]!);
        const summary = summarise(samples);
        const performance = key === "performance";
        figures.push({
          // "Lighthouse mobile performance, <page>" is what the summary's goal reads.
          name: performance
            ? `Lighthouse mobile performance, ${page.label}`
            : name(`${key} score`),
          unit: `score of 100, median of ${runsPerPage}; ${page.path}`,
          target: performance ? "performance ≥ 90" : "reported",
          passed: performance ? summary.median >= 90 : true,
          median: summary.median,
          // For a score lower is worse: the "p95" column shows the worst run.
          p95: summary.min,
          samples,
        });
      }
      for (const [index, metric] of metrics.entries()) {
        const samples = runs.map((run) => run.metrics[index]!);
        const summary = summarise(samples);
        figures.push({
          name: name(metric.label),
          unit: metric.audit === "cumulative-layout-shift" ? "shift" : "ms",
          target: "reported",
          passed: true,
          median: summary.median,
          p95: summary.max,
          samples,
        });
      }
    }
    const machine = summarise(benchmarkIndexes);
    figures.push({
      name: "Lighthouse benchmark index of this machine (all runs)",
      unit: "Lighthouse's machine speed, higher is faster; p95 column = slowest run",
      target: "reported",
      passed: true,
      median: machine.median,
      p95: machine.min,
      samples: benchmarkIndexes,
    });
  } finally {
    await context.close();
    fs.rmSync(profile, { recursive: true, force: true });
  }
  console.log(`[bench] Lighthouse reports (JSON) in ${reports}`);
  return figures;
}
