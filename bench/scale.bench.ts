/**
 * Cost as the work grows: the same requests at two sizes of the store (1 M and
 * 10 M movements, bench/seed-bench-stock.ts), each figure's p95 at the large
 * size beside the normal one. The goal is at most 1.5× for every figure.
 *
 * The large store lives in its own database (`<bench database>_large`), made
 * once (several minutes) and reused by later runs while it is complete.
 */
import { execFileSync } from "node:child_process";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import { formatKeysetCursor } from "~/lib/keyset-cursor";
import { migrateDatabase } from "../scripts/lib/database-tasks";
import {
  ensureLocalMariadb,
  recreateDatabase,
  testDatabaseName,
} from "../scripts/lib/local-mariadb";
import type { Figure } from "./coil-estimates.bench";
import {
  benchStockOf,
  checkBenchLedger,
  seedBenchStock,
  type BenchStock,
  type BenchStockSize,
} from "./seed-bench-stock";
import { summarise } from "./statistics";
import { listQueries, movementBodies, serverTimes } from "./stock.bench";
import { sizeRatioPrefix } from "./summary";

/** The most a figure's p95 may grow from the normal size to the large one. */
export const sizeRatioGoal = 1.5;

const journalPageSize = 50;

/** The large store's database: made when missing or incomplete, else reused. */
export async function largeBenchDatabase(input: {
  size: BenchStockSize;
  userId: string;
  log: (line: string) => void;
}): Promise<{ databaseUrl: string; stock: BenchStock; reused: boolean }> {
  const name = `${testDatabaseName()}_large`;
  const databaseUrl = process.env.TEST_DATABASE_URL
    ? Object.assign(new URL(process.env.TEST_DATABASE_URL), {
        pathname: `/${name}`,
      }).toString()
    : (await ensureLocalMariadb({ databases: [name] })).urlFor(name);
  const stock = benchStockOf(input.size);
  if (await isComplete(databaseUrl, stock, input.size)) {
    await migrateDatabase(databaseUrl, { log: () => {} });
    await checkBenchLedger(databaseUrl, stock);
    return { databaseUrl, stock, reused: true };
  }
  if (!process.env.TEST_DATABASE_URL) await recreateDatabase(name);
  await migrateDatabase(databaseUrl, { log: () => {} });
  // In its own process: this one's app database client (imported by the demo seed) already
  // served the normal store and was closed after it, and a module is imported once.
  execFileSync("npx", ["tsx", "scripts/db-seed.ts", "--demo"], {
    env: { ...process.env, DATABASE_URL: databaseUrl },
    stdio: ["ignore", "ignore", "inherit"],
  });
  await seedBenchStock(databaseUrl, input.userId, input.size, input.log);
  await checkBenchLedger(databaseUrl, stock);
  return { databaseUrl, stock, reused: false };
}

/** Whether an earlier run left the whole large store there (its last item's and the busy item's movements). */
async function isComplete(
  databaseUrl: string,
  stock: BenchStock,
  size: BenchStockSize,
): Promise<boolean> {
  let connection: mysql.Connection;
  try {
    connection = await mysql.createConnection(poolOptionsFromUrl(databaseUrl));
  } catch {
    return false;
  }
  try {
    const [rows] = await connection.query(
      `SELECT (SELECT COUNT(*) FROM items WHERE sku LIKE 'BENCH-%') AS items,
              (SELECT COUNT(*) FROM stock_movements m JOIN items i ON i.id = m.item_id WHERE i.sku = ?) AS busy,
              (SELECT COUNT(*) FROM stock_movements m JOIN items i ON i.id = m.item_id WHERE i.sku = ?) AS last`,
      [stock.busySku, stock.skus.at(-1)],
    );
    const row = (rows as Record<string, number>[])[0]!;
    const regularPerItem = Math.floor(
      (size.movements - stock.busyMovements) / (size.items - 1),
    );
    return (
      Number(row.items) === size.items &&
      Number(row.busy) >= stock.busyMovements &&
      Number(row.last) >= regularPerItem
    );
  } catch {
    return false; // no tables yet
  } finally {
    await connection.end();
  }
}

/** Cursors of deep pages of the busy item's journal (50 % to 95 % down), with their page numbers. */
async function deepJournalPages(databaseUrl: string, stock: BenchStock) {
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(databaseUrl),
  );
  try {
    const pages: { page: number; after: string }[] = [];
    for (const fraction of [0.5, 0.6, 0.7, 0.8, 0.9, 0.95]) {
      const page = Math.floor(
        (fraction * stock.busyMovements) / journalPageSize,
      );
      // The last row of the page before: where the journal's own "Older" link would start.
      const [rows] = await connection.query(
        `SELECT m.created_at AS at, m.id FROM stock_movements m
         WHERE m.item_id = (SELECT id FROM items WHERE sku = ?)
         ORDER BY m.created_at DESC, m.id DESC LIMIT 1 OFFSET ?`,
        [stock.busySku, (page - 1) * journalPageSize - 1],
      );
      const row = (rows as { at: Date; id: number }[])[0]!;
      pages.push({ page, after: formatKeysetCursor(row) });
    }
    return pages;
  } finally {
    await connection.end();
  }
}

/**
 * The figures of one size: the stock list (loader and API), the item page
 * (loader and document) and item API on ordinary items, recording a movement,
 * and the journal of the busy item (first page, deep pages by cursor, and
 * deep pages by page number for comparison).
 */
export async function benchOneSize(input: {
  size: BenchStockSize;
  baseUrl: string;
  databaseUrl: string;
  storekeeperCookie: string;
  stock: BenchStock;
  requests?: number;
}): Promise<Figure[]> {
  const requests = input.requests ?? 200;
  const indexes = Array.from({ length: requests + 20 }, (_, index) => index);
  const { baseUrl, stock } = input;
  const suffix = ` @ ${input.size.name}`;
  const figures: Figure[] = [];
  const add = (label: string, unit: string, samples: number[]) => {
    const summary = summarise(samples);
    figures.push({
      name: `${label}${suffix}`,
      unit,
      target: "reported",
      passed: true,
      median: summary.median,
      p95: summary.p95,
      samples,
    });
  };
  // A read's addresses are asked once untimed first, then timed: both sizes are measured
  // with what they read in the buffer pool, as a running shop's database holds what it
  // works on. Without it the 10 M figures depended on what the run before had left there
  // (the item page loader 1.43× after a migration had read the store, 2.87× on a pool
  // just raised and empty, while the item page document, on the same items just after,
  // stayed at 1.07×). Writes (init given) are timed once.
  const timed = async (
    urls: string[],
    init?: (index: number) => RequestInit,
  ) => {
    if (!init) await serverTimes(urls, input.storekeeperCookie);
    return serverTimes(urls, input.storekeeperCookie, init);
  };
  const perRequest = "ms per request";

  add(
    "stock list loader, GET /stock.data",
    perRequest,
    await timed(
      indexes.map((index) => `${baseUrl}/stock.data?${listQueries(index)}`),
    ),
  );
  add(
    "stock list API, GET /api/v1/items",
    perRequest,
    await timed(
      indexes.map(
        (index) => `${baseUrl}/api/v1/items?pageSize=50&${listQueries(index)}`,
      ),
    ),
  );
  // Ordinary items across the catalogue (the busy one aside), as people open them.
  const ordinary = (index: number) =>
    encodeURIComponent(
      stock.skus[1 + ((index * 7919) % (stock.skus.length - 1))]!,
    );
  add(
    "item page loader, GET /stock/items/:sku.data",
    perRequest,
    await timed(
      indexes.map((index) => `${baseUrl}/stock/items/${ordinary(index)}.data`),
    ),
  );
  add(
    "item page document, GET /stock/items/:sku",
    perRequest,
    await timed(
      indexes.map((index) => `${baseUrl}/stock/items/${ordinary(index)}`),
    ),
  );
  add(
    "item API, GET /api/v1/items/:sku",
    perRequest,
    await timed(
      indexes.map((index) => `${baseUrl}/api/v1/items/${ordinary(index)}`),
    ),
  );

  // Receipts and issues of a piece, as in the stock group: an issue always finds its receipt.
  const bodyFor = movementBodies(stock.skus, stock.locationCode);
  add(
    "record a movement, POST /api/v1/stock-movements",
    perRequest,
    await timed(
      indexes.map(() => `${baseUrl}/api/v1/stock-movements`),
      (index) => ({
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: bodyFor(index),
      }),
    ),
  );

  const busy = encodeURIComponent(stock.busySku);
  add(
    "journal of the busy item, first page",
    perRequest,
    await timed(indexes.map(() => `${baseUrl}/stock/journal.data?sku=${busy}`)),
  );
  const deep = await deepJournalPages(input.databaseUrl, stock);
  add(
    "journal of the busy item, deep page (its Older link)",
    perRequest,
    await timed(
      indexes.map((index) => {
        const { page, after } = deep[index % deep.length]!;
        return `${baseUrl}/stock/journal.data?sku=${busy}&page=${page}&after=${after}`;
      }),
    ),
  );
  // The same pages asked by number alone (offset), kept for comparison: not a goal.
  add(
    "journal of the busy item, deep page by number (offset)",
    perRequest,
    await timed(
      indexes
        .slice(0, 60)
        .map(
          (index) =>
            `${baseUrl}/stock/journal.data?sku=${busy}&page=${deep[index % deep.length]!.page}`,
        ),
    ),
  );
  return figures;
}

/** Figures not held to the size goal (shown side by side all the same). */
const sizeGoalExempt = ["deep page by number (offset)"];

/** For each figure measured at both sizes: large p95 ÷ normal p95, against the goal. */
export function sizeRatios(
  normal: Figure[],
  large: Figure[],
  sizes: { normal: BenchStockSize; large: BenchStockSize },
): Figure[] {
  const labelOf = (figure: Figure, size: BenchStockSize) =>
    figure.name.slice(0, -` @ ${size.name}`.length);
  return normal.flatMap((small) => {
    const label = labelOf(small, sizes.normal);
    const big = large.find((figure) => labelOf(figure, sizes.large) === label);
    if (!big) return [];
    const ratio = big.p95 / small.p95;
    const exempt = sizeGoalExempt.some((text) => label.includes(text));
    return [
      {
        name: `${sizeRatioPrefix} ${sizes.large.name} ÷ ${sizes.normal.name}: ${label}`,
        unit: "times (p95)",
        target: exempt ? "reported" : `≤ ${sizeRatioGoal}×`,
        passed: exempt || ratio <= sizeRatioGoal,
        median: big.median / small.median,
        p95: ratio,
        samples: [],
      },
    ];
  });
}
