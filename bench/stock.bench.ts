/**
 * Stock at scale (20,000 items, 1,000,000 movements): the stock list page, the
 * items API and recording a movement, each beside the raw SQL it wraps, timed
 * in the same run so the ratio shows what the app adds.
 */
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import type { Figure } from "./coil-estimates.bench";
import { summarise } from "./statistics";
import { containsPattern } from "~/lib/list-filters";
import {
  cappedTotal,
  gramPostingsCap,
  gramsToCount,
  rarestGram,
  searchCountLimit,
  shortestGramSearch,
  termGrams,
} from "~/stock/search-grams";

export async function serverTimes(
  urls: string[],
  cookie: string,
  init: (index: number) => RequestInit = () => ({}),
) {
  const samples: number[] = [];
  for (const [index, url] of urls.entries()) {
    const response = await fetch(url, {
      ...init(index),
      headers: { Cookie: cookie, ...(init(index).headers ?? {}) },
    });
    await response.arrayBuffer();
    if (response.status >= 400)
      throw new Error(`${url} answered ${response.status}`);
    const timing = response.headers
      .get("Server-Timing")
      ?.match(/dur=([\d.]+)/)?.[1];
    if (!timing) throw new Error("no Server-Timing header");
    if (index >= 20) samples.push(Number(timing)); // the first 20 warm up
  }
  return samples;
}

function figure(
  name: string,
  unit: string,
  limitMs: number,
  samples: number[],
): Figure {
  const summary = summarise(samples);
  return {
    name,
    unit,
    target: `p95 < ${limitMs} ms`,
    passed: summary.p95 < limitMs,
    median: summary.median,
    p95: summary.p95,
    samples,
  };
}

export const listQueries = (index: number) => {
  const page = 1 + ((index * 37) % 400);
  const variants = [
    `page=${page}`,
    `page=${1 + (page % 40)}&kind=wire&sort=value&order=desc`,
    `search=BENCH-1${index % 10}&page=${1 + (index % 5)}`,
    `belowReorder=1&page=${1 + (index % 20)}`,
  ];
  return variants[index % variants.length]!;
};

/**
 * The raw SQL the stock list and the items API wrap, as the app runs it
 * (app/stock/items.server.ts `listItems`), statement for statement, with bare mysql2:
 * - the total: without a search, the counts kept by triggers on items (item_counts,
 *   decision 050-kept-item-counts); with one, its matches counted up to 1,000 past the
 *   page's first row (decision 057-trigram-search);
 * - a search of three characters or more first counts the postings of each of its grams
 *   (up to 8, each up to 2,001, in one UNION ALL statement) and takes the rarest; its count,
 *   and its page when sorted by SKU, walk that gram's postings (item_search_grams) in SKU
 *   order, joined to items and checked with the same LIKE;
 * - otherwise the page is found on indexes first (ids only) and its rows read by a join.
 * The same filters, index hints, order, limits and 13 columns; the arithmetic of grams and
 * caps is the app's own pure module. Used by the HTTP load bench too.
 */
export async function rawItemList(
  connection: Pick<mysql.Connection, "query">,
  params: URLSearchParams,
) {
  const page = Number(params.get("page") ?? 1);
  const pageSize = Number(params.get("pageSize") ?? 50);
  const offset = (page - 1) * pageSize;
  const where = ["active = 1"];
  const values: unknown[] = [];
  if (params.get("kind")) {
    where.push("kind = ?");
    values.push(params.get("kind"));
  }
  if (params.get("belowReorder")) where.push("below_reorder = 1");
  const term = params.get("search")?.trim().toLowerCase();
  const pattern = term ? containsPattern(term) : undefined;
  if (pattern) {
    where.push("search_text LIKE ?");
    values.push(pattern);
  }
  const sortedBySku = params.get("sort") !== "value";
  const order = sortedBySku ? "sku" : "stock_value DESC, id DESC";
  const columns =
    "sku, name, kind, unit, size_or_grade, on_hand, reserved, held, on_order, reorder_point, reorder_quantity, average_cost, active";
  if (!term) {
    const [[{ total }]] = (await connection.query(
      `SELECT COALESCE(SUM(items), 0) AS total FROM item_counts WHERE ${where.join(" AND ")}`,
      values,
    )) as unknown as [[{ total: number }]];
    return { items: await rawPage(), total: Number(total), totalExact: true };
  }
  let gram: string | undefined;
  if (Array.from(term).length >= shortestGramSearch) {
    const grams = gramsToCount(termGrams(term));
    const [counts] = (await connection.query(
      grams
        .map(
          (_, position) =>
            `SELECT ${position} AS position, COUNT(*) AS postings FROM (SELECT 1 FROM item_search_grams WHERE gram = ? LIMIT ${gramPostingsCap + 1}) AS g${position}`,
        )
        .join(" UNION ALL "),
      grams,
    )) as unknown as [{ position: number; postings: number }[]];
    const postings = new Map(
      counts.map((row) => [Number(row.position), Number(row.postings)]),
    );
    const rarest = rarestGram(
      grams.map((gram, position) => ({
        gram,
        postings: postings.get(position) ?? 0,
      })),
    );
    if (rarest === null) return { items: [], total: 0, totalExact: true };
    gram = rarest;
  }
  // The walk: one gram's postings in primary-key order (gram, sku), the list's filters on the item.
  const walked = `item_search_grams g FORCE INDEX (PRIMARY) JOIN items ON items.id = g.item_id
    WHERE g.gram = ? AND g.active = 1 AND ${where.slice(1).join(" AND ")}`;
  const [[{ counted }]] = (await connection.query(
    gram
      ? `SELECT COUNT(*) AS counted FROM (SELECT 1 FROM ${walked} LIMIT ?) AS matches`
      : `SELECT COUNT(*) AS counted FROM (SELECT 1 FROM items FORCE INDEX (items_search_idx) WHERE ${where.join(" AND ")} LIMIT ?) AS matches`,
    [...(gram ? [gram] : []), ...values, searchCountLimit(offset)],
  )) as unknown as [[{ counted: number }]];
  const items =
    gram && sortedBySku
      ? (
          await connection.query(
            `SELECT ${columns.replace(/(^|, )/g, "$1items.")} FROM ${walked} ORDER BY g.sku LIMIT ? OFFSET ?`,
            [gram, ...values, pageSize, offset],
          )
        )[0]
      : await rawPage("FORCE INDEX (items_search_idx)");
  return { items, ...cappedTotal(Number(counted), offset) };

  async function rawPage(hint = "") {
    const [rows] = await connection.query(
      `SELECT ${columns} FROM items JOIN (SELECT id FROM items ${hint} WHERE ${where.join(" AND ")} ORDER BY ${order} LIMIT ? OFFSET ?) page_ids USING (id) ORDER BY ${order}`,
      [...values, pageSize, offset],
    );
    return rows;
  }
}

/**
 * The bodies of the benches' movement requests, by request number: even requests receive
 * one piece of a bench part, odd ones issue it again, so an issue always finds stock.
 */
export function movementBodies(
  skus: readonly string[],
  locationCode: string,
): (index: number) => string {
  const parts = skus.filter((_, index) => index % 3 !== 0);
  return (index) => {
    const sku = parts[(Math.floor(index / 2) * 131) % parts.length];
    return JSON.stringify(
      index % 2 === 0
        ? {
            type: "receipt",
            sku,
            location: locationCode,
            quantity: 1,
            unitCost: 10,
          }
        : { type: "issue", sku, location: locationCode, quantity: 1 },
    );
  };
}

export async function benchStock(input: {
  baseUrl: string;
  databaseUrl: string;
  storekeeperCookie: string;
  skus: string[];
  locationCode: string;
  requests?: number;
}): Promise<Figure[]> {
  const requests = input.requests ?? 300;
  const indexes = Array.from({ length: requests + 20 }, (_, index) => index);
  const figures: Figure[] = [];

  // The loader alone (React Router's data request for the page) and the whole page with its HTML.
  const listLoader = await serverTimes(
    indexes.map((index) => `${input.baseUrl}/stock.data?${listQueries(index)}`),
    input.storekeeperCookie,
  );
  figures.push(
    figure(
      "GET /stock.data (stock list loader)",
      "ms per request",
      50,
      listLoader,
    ),
  );
  const listPage = await serverTimes(
    indexes.map((index) => `${input.baseUrl}/stock?${listQueries(index)}`),
    input.storekeeperCookie,
  );
  figures.push({
    ...figure(
      "GET /stock (whole page, server render)",
      "ms per request",
      50,
      listPage,
    ),
    target: "reported",
    passed: true,
  });
  const listApi = await serverTimes(
    indexes.map(
      (index) =>
        `${input.baseUrl}/api/v1/items?pageSize=50&${listQueries(index)}`,
    ),
    input.storekeeperCookie,
  );
  figures.push(
    figure("GET /api/v1/items?page=…", "ms per request", 50, listApi),
  );

  // The raw SQL the list wraps: the count and the page, as the app runs them.
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(input.databaseUrl),
  );
  const rawList: number[] = [];
  try {
    for (const index of indexes) {
      const started = performance.now();
      await rawItemList(
        connection,
        new URLSearchParams(`pageSize=50&${listQueries(index)}`),
      );
      if (index >= 20) rawList.push(performance.now() - started);
    }

    // Recording a movement: receipts and issues of a piece on bench items.
    const bodyFor = movementBodies(input.skus, input.locationCode);
    const record = await serverTimes(
      indexes.map(() => `${input.baseUrl}/api/v1/stock-movements`),
      input.storekeeperCookie,
      (index) => ({
        method: "POST",
        headers: { "Content-Type": "application/json" },
        body: bodyFor(index),
      }),
    );
    figures.push(
      figure("POST /api/v1/stock-movements", "ms per request", 20, record),
    );

    // The raw SQL of one movement, statement for statement what the app's transaction runs
    // (app/stock/stock-movements.server.ts) for a receipt of stock kept without lots: lock
    // the item row (read with the columns the checks use), find the location, lock the
    // existing balance row, write the balance, append the movement, write the item's kept
    // on hand and average cost, commit. The app writes no other rows (no audit table).
    // The first bench part movementBodies uses (it skips every third SKU, the first included).
    const part = input.skus[1]!;
    const [rows] = await connection.query(
      "SELECT id FROM items WHERE sku = ?",
      [part],
    );
    const itemId = (rows as { id: number }[])[0]!.id;
    const [locationRows] = await connection.query(
      "SELECT id FROM locations WHERE code = ?",
      [input.locationCode],
    );
    const locationId = (locationRows as { id: number }[])[0]!.id;
    const [userRows] = await connection.query("SELECT id FROM users LIMIT 1");
    const userId = (userRows as { id: string }[])[0]!.id;
    const rawRecord: number[] = [];
    for (const index of indexes) {
      const started = performance.now();
      await connection.beginTransaction();
      await connection.query(
        "SELECT id, sku, kind, unit, active, on_hand, reserved, held, average_cost FROM items WHERE sku = ? LIMIT 1 FOR UPDATE",
        [part],
      );
      await connection.query(
        "SELECT id, code, active FROM locations WHERE code = ? LIMIT 1",
        [input.locationCode],
      );
      await connection.query(
        "SELECT on_hand, reserved FROM stock_balances WHERE item_id = ? AND lot_id = 0 AND location_id = ? FOR UPDATE",
        [itemId, locationId],
      );
      await connection.query(
        "UPDATE stock_balances SET on_hand = on_hand + 1, updated_at = NOW(3) WHERE item_id = ? AND lot_id = 0 AND location_id = ?",
        [itemId, locationId],
      );
      await connection.query(
        "INSERT INTO stock_movements (type, item_id, lot_id, location_id, quantity, unit_cost, average_cost_after, item_on_hand_after, user_id, created_at) VALUES ('receipt', ?, 0, ?, 1, 10, 10, 1, ?, NOW(3))",
        [itemId, locationId, userId],
      );
      await connection.query(
        "UPDATE items SET on_hand = on_hand + 1, average_cost = 10, updated_at = NOW(3) WHERE id = ?",
        [itemId],
      );
      await connection.commit();
      if (index >= 20) rawRecord.push(performance.now() - started);
    }
    const rawListSummary = summarise(rawList);
    const rawRecordSummary = summarise(rawRecord);
    figures.push({
      ...figure(
        "raw SQL of the list (count + page)",
        "ms per query pair",
        50,
        rawList,
      ),
    });
    figures.push({
      ...figure(
        "raw SQL of one movement (transaction)",
        "ms per transaction",
        20,
        rawRecord,
      ),
    });
    const ratio = (
      name: string,
      app: Figure,
      raw: { p95: number; median: number },
    ) => ({
      name,
      unit: "app ÷ raw SQL",
      target: "reported",
      passed: true,
      median: app.median / raw.median,
      p95: app.p95 / raw.p95,
      samples: [],
    });
    figures.push(
      ratio(
        "ratio: GET /api/v1/items ÷ raw SQL",
        figures.find((entry) => entry.name.startsWith("GET /api/v1/items"))!,
        rawListSummary,
      ),
    );
    figures.push(
      ratio(
        "ratio: POST stock-movements ÷ raw SQL",
        figures.find((entry) => entry.name.startsWith("POST /api/v1/stock"))!,
        rawRecordSummary,
      ),
    );
  } finally {
    await connection.end();
  }
  return figures;
}
