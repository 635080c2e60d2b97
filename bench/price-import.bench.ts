/**
 * Importing a generated 100,000-row price list (about 8 MB): the dry run and the
 * commit through the API, the server's peak memory growth, and the commit's own
 * database work as bare mysql2 statements (the import record, 25,000 new items,
 * their SKU mappings, 100,000 price lines) for the ratio import ÷ raw. Beside it
 * (BENCH_ONLY=price-import-progress), the same file with its progress streamed:
 * the longest wait between two events, and the time beside the plain request's.
 */
import fs from "node:fs";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
import {
  progressStreamType,
  readProgressStream,
  type TimedProgressEvent,
} from "~/lib/progress-stream";
import type { Figure } from "./coil-estimates.bench";

const rowCount = 100_000;

function generatedPriceList(): string {
  const lines = [
    "Art. no,Description,Kind,Unit,Price,Currency,Min qty,Valid from",
  ];
  for (let index = 0; index < rowCount; index += 1) {
    const breakQuantity = [1, 10, 100, 1000][index % 4];
    const part = Math.floor(index / 4);
    lines.push(
      `BX-${String(part).padStart(6, "0")},Bench part number ${part} with a longer description,part,pcs,${(1 + (index % 997) / 100).toFixed(2)},EUR,${breakQuantity},2026-11-01`,
    );
  }
  return `${lines.join("\n")}\n`;
}

/** Resident memory of a process, MB: now and the peak since it started (Linux /proc). */
function memoryOf(pid: number): { rss: number; peak: number } {
  const status = fs.readFileSync(`/proc/${pid}/status`, "utf8");
  const read = (key: string) =>
    Number(status.match(new RegExp(`${key}:\\s+(\\d+) kB`))?.[1] ?? 0) / 1024;
  return { rss: read("VmRSS"), peak: read("VmHWM") };
}

function priceListForm(csv: string, supplier: string): FormData {
  const form = new FormData();
  form.set("file", new Blob([csv]), "bench-100k.csv");
  form.set("supplier", supplier);
  form.set(
    "mapping",
    JSON.stringify({
      supplierSku: "Art. no",
      description: "Description",
      kind: "Kind",
      unit: "Unit",
      price: "Price",
      currency: "Currency",
      minQuantity: "Min qty",
      validFrom: "Valid from",
    }),
  );
  return form;
}

async function createSupplier(
  baseUrl: string,
  cookie: string,
  name: string,
): Promise<void> {
  const created = await fetch(`${baseUrl}/api/v1/suppliers`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Cookie: cookie },
    body: JSON.stringify({ name, currency: "EUR" }),
  });
  if (created.status !== 201) throw new Error(`supplier: ${created.status}`);
}

async function upload(
  baseUrl: string,
  cookie: string,
  csv: string,
  dryRun: boolean,
  supplier = "Bench supplier",
): Promise<{ ms: number; status: number }> {
  const form = priceListForm(csv, supplier);
  const started = performance.now();
  const response = await fetch(
    `${baseUrl}/api/v1/price-lists${dryRun ? "?dryRun=1" : ""}`,
    { method: "POST", headers: { Cookie: cookie }, body: form },
  );
  const body = await response.text();
  if (response.status >= 300)
    throw new Error(
      `import answered ${response.status}: ${body.slice(0, 300)}`,
    );
  return { ms: performance.now() - started, status: response.status };
}

export async function benchPriceImport(input: {
  baseUrl: string;
  databaseUrl: string;
  buyerCookie: string;
  serverPid: number;
}): Promise<Figure[]> {
  const csv = generatedPriceList();
  await createSupplier(input.baseUrl, input.buyerCookie, "Bench supplier");

  const before = memoryOf(input.serverPid);
  const dryRun = await upload(input.baseUrl, input.buyerCookie, csv, true);
  const commit = await upload(input.baseUrl, input.buyerCookie, csv, false);
  const after = memoryOf(input.serverPid);

  // The same database work as bare mysql2 statements (rawImportOfTheSameRows), and
  // the price lines alone into a scratch table, as this figure was first measured.
  await createSupplier(input.baseUrl, input.buyerCookie, rawSupplierName);
  const raw = await rawImportOfTheSameRows(input.databaseUrl, csv);
  const linesOnlyMs = await rawPriceLinesOnly(input.databaseUrl, csv);
  const rawMs = raw.ms;
  const growth = after.peak - before.rss;
  return [
    single(
      "price list 100,000 rows: dry run",
      "ms",
      "reported",
      true,
      dryRun.ms,
    ),
    single(
      "price list 100,000 rows: commit",
      "ms",
      "reported",
      true,
      commit.ms,
    ),
    single(
      "raw batched upsert of the same rows",
      "ms",
      "reported",
      true,
      rawMs,
    ),
    single(
      "raw upsert of the price lines alone (scratch table, no items, mappings or keys to check)",
      "ms",
      "reported",
      true,
      linesOnlyMs,
    ),
    single(
      "ratio: import commit ÷ raw upsert",
      "times",
      "≤ 2",
      commit.ms / rawMs <= 2,
      commit.ms / rawMs,
    ),
    single(
      "server peak memory growth during import",
      "MB",
      "< 200 MB",
      growth < 200,
      growth,
    ),
  ];
}

const rawSupplierName = "Bench raw supplier";

/** The file's data rows split into cells, as the raw baselines send them. */
function cellsOf(csv: string): string[][] {
  return csv
    .trim()
    .split("\n")
    .slice(1)
    .map((line) => line.split(","));
}

/**
 * Everything the import's commit writes, as bare mysql2 statements on one connection in
 * one transaction, with the app's statements and batch size (2,000 file rows a step):
 * the import record; per step the step's new items (one per new supplier SKU, into the
 * real items table with its indexes and generated columns), their ids read back by SKU,
 * the supplier's SKU mappings and the price lines (foreign keys checked, all columns the
 * app's upsert sets); then the import's counts and the saved column mapping, and the
 * commit. Timed from BEGIN to COMMIT; the rows are deleted afterwards (not timed) so the
 * groups after this one see the database as the app left it.
 */
async function rawImportOfTheSameRows(
  databaseUrl: string,
  csv: string,
): Promise<{ ms: number }> {
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(databaseUrl),
  );
  try {
    const [[supplier]] = await connection.query<mysql.RowDataPacket[]>(
      "SELECT id FROM suppliers WHERE name = ?",
      [rawSupplierName],
    );
    const [[user]] = await connection.query<mysql.RowDataPacket[]>(
      "SELECT id FROM users WHERE email = 'buyer@turnledger.test'",
    );
    const supplierId = supplier!.id as number;
    const cells = cellsOf(csv);
    const now = new Date();
    const started = performance.now();
    await connection.beginTransaction();
    const [created] = await connection.query<mysql.ResultSetHeader>(
      "INSERT INTO price_imports (supplier_id, file_name, file_sha256, row_count, created_items, mapping, user_id, created_at) VALUES (?, ?, ?, 0, 0, ?, ?, ?)",
      [supplierId, "bench-raw.csv", "0".repeat(64), "{}", user!.id, now],
    );
    const importId = created.insertId;
    const itemIds = new Map<string, number>();
    for (let start = 0; start < cells.length; start += 2000) {
      const step = cells.slice(start, start + 2000);
      const newSkus = [
        ...new Map(
          step
            .filter((row) => !itemIds.has(row[0]!))
            .map((row) => [row[0]!, row]),
        ).values(),
      ];
      if (newSkus.length > 0) {
        await connection.query(
          "INSERT INTO items (sku, name, kind, unit, size_or_grade, created_at, updated_at) VALUES ? ON DUPLICATE KEY UPDATE sku = sku",
          [
            newSkus.map((row) => [
              `S${supplierId}-${row[0]}`,
              row[1],
              "part",
              "pcs",
              "",
              now,
              now,
            ]),
          ],
        );
        const [ids] = await connection.query<mysql.RowDataPacket[]>(
          "SELECT id, sku FROM items WHERE sku IN (?)",
          [newSkus.map((row) => `S${supplierId}-${row[0]}`)],
        );
        for (const found of ids)
          itemIds.set(
            (found.sku as string).slice(`S${supplierId}-`.length),
            found.id as number,
          );
        await connection.query(
          "INSERT INTO supplier_items (supplier_id, supplier_sku, item_id) VALUES ? ON DUPLICATE KEY UPDATE item_id = VALUES(item_id)",
          [newSkus.map((row) => [supplierId, row[0], itemIds.get(row[0]!)])],
        );
      }
      await connection.query(
        `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, lead_time_days, pack_quantity, import_id, line) VALUES ?
         ON DUPLICATE KEY UPDATE item_id = VALUES(item_id), currency = VALUES(currency), unit_price = VALUES(unit_price),
           adder_per_kg = VALUES(adder_per_kg), conductor = VALUES(conductor), lead_time_days = VALUES(lead_time_days),
           pack_quantity = VALUES(pack_quantity), import_id = VALUES(import_id), line = VALUES(line)`,
        [
          step.map((row, index) => [
            supplierId,
            itemIds.get(row[0]!),
            row[0],
            row[5],
            row[4],
            null,
            null,
            row[6],
            row[7],
            null,
            null,
            importId,
            start + index + 2,
          ]),
        ],
      );
    }
    await connection.query(
      "UPDATE price_imports SET row_count = ?, created_items = ? WHERE id = ?",
      [cells.length, itemIds.size, importId],
    );
    await connection.query(
      "INSERT INTO supplier_mappings (supplier_id, header_signature, mapping) VALUES (?, ?, ?) ON DUPLICATE KEY UPDATE header_signature = VALUES(header_signature), mapping = VALUES(mapping)",
      [supplierId, "bench", "[]"],
    );
    await connection.commit();
    const ms = performance.now() - started;
    // As many items as the file has supplier SKUs, as the app's commit creates.
    const skus = new Set(cells.map((row) => row[0]));
    if (itemIds.size !== skus.size)
      throw new Error(
        `raw import made ${itemIds.size} items for ${skus.size} SKUs`,
      );

    await connection.query("DELETE FROM price_lines WHERE import_id = ?", [
      importId,
    ]);
    await connection.query("DELETE FROM supplier_items WHERE supplier_id = ?", [
      supplierId,
    ]);
    await connection.query("DELETE FROM items WHERE id IN (?)", [
      [...itemIds.values()],
    ]);
    await connection.query(
      "DELETE FROM supplier_mappings WHERE supplier_id = ?",
      [supplierId],
    );
    await connection.query("DELETE FROM price_imports WHERE id = ?", [
      importId,
    ]);
    return { ms };
  } finally {
    await connection.end();
  }
}

/** The price lines alone as one batched upsert (2,000 rows per statement) into a scratch table. */
async function rawPriceLinesOnly(
  databaseUrl: string,
  csv: string,
): Promise<number> {
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(databaseUrl),
  );
  try {
    await connection.query("CREATE TABLE bench_raw_prices LIKE price_lines");
    const rows = cellsOf(csv).map((cells) => [
      1,
      1,
      cells[0],
      cells[5],
      cells[4],
      null,
      null,
      cells[6],
      cells[7],
      null,
      null,
    ]);
    const started = performance.now();
    await connection.beginTransaction();
    for (let start = 0; start < rows.length; start += 2000) {
      await connection.query(
        "INSERT INTO bench_raw_prices (supplier_id, item_id, supplier_sku, currency, unit_price, adder_per_kg, conductor, min_quantity, valid_from, import_id, line) VALUES ? ON DUPLICATE KEY UPDATE unit_price = VALUES(unit_price)",
        [rows.slice(start, start + 2000)],
      );
    }
    await connection.commit();
    const ms = performance.now() - started;
    await connection.query("DROP TABLE bench_raw_prices");
    return ms;
  } finally {
    await connection.end();
  }
}

function single(
  name: string,
  unit: string,
  target: string,
  passed: boolean,
  value: number,
): Figure {
  return {
    name,
    unit,
    target,
    passed,
    median: value,
    p95: value,
    samples: [value],
  };
}

/** The file sent with `Accept: application/x-ndjson`: every event with when it came. */
async function streamedUpload(
  baseUrl: string,
  cookie: string,
  csv: string,
  dryRun: boolean,
  supplier: string,
): Promise<{ ms: number; events: TimedProgressEvent[]; started: number }> {
  const form = priceListForm(csv, supplier);
  const started = performance.now();
  const response = await fetch(
    `${baseUrl}/api/v1/price-lists${dryRun ? "?dryRun=1" : ""}`,
    {
      method: "POST",
      headers: { Cookie: cookie, Accept: progressStreamType },
      body: form,
    },
  );
  const events = await readProgressStream(response);
  const ms = performance.now() - started;
  const result = events.at(-1);
  if (result?.type !== "result" || result.status >= 300)
    throw new Error(
      `streamed import ended with ${JSON.stringify(result).slice(0, 300)}`,
    );
  return { ms, events, started };
}

/** The longest wait between two events, the result included (timed from the answer's first line), and what came before it. */
function longestGap(events: readonly TimedProgressEvent[]): {
  ms: number;
  after: string;
} {
  let longest = { ms: 0, after: "" };
  for (let index = 1; index < events.length; index += 1) {
    const ms = events[index]!.at - events[index - 1]!.at;
    const before = events[index - 1]!;
    if (ms > longest.ms)
      longest = {
        ms,
        after:
          before.type === "progress"
            ? `${before.processed} of ${before.total} rows`
            : "the result",
      };
  }
  return longest;
}

/**
 * The 100,000-row file with its progress streamed, as the import page reads it: the
 * check and the commit, each beside the same request without the stream (to their
 * own suppliers, so neither commit finds the other's file).
 */
export async function benchPriceImportProgress(input: {
  baseUrl: string;
  buyerCookie: string;
}): Promise<Figure[]> {
  const csv = generatedPriceList();
  const streamedSupplier = "Bench progress supplier";
  const plainSupplier = "Bench progress plain supplier";
  await createSupplier(input.baseUrl, input.buyerCookie, streamedSupplier);
  await createSupplier(input.baseUrl, input.buyerCookie, plainSupplier);

  const plainCheck = await upload(
    input.baseUrl,
    input.buyerCookie,
    csv,
    true,
    plainSupplier,
  );
  const check = await streamedUpload(
    input.baseUrl,
    input.buyerCookie,
    csv,
    true,
    streamedSupplier,
  );
  const plainCommit = await upload(
    input.baseUrl,
    input.buyerCookie,
    csv,
    false,
    plainSupplier,
  );
  const commit = await streamedUpload(
    input.baseUrl,
    input.buyerCookie,
    csv,
    false,
    streamedSupplier,
  );

  const figures: Figure[] = [];
  for (const [step, streamed, plain] of [
    ["check", check, plainCheck],
    ["commit", commit, plainCommit],
  ] as const) {
    const progress = streamed.events.filter(
      (event) => event.type === "progress",
    );
    const { ms: gap, after } = longestGap(streamed.events);
    console.log(
      `[bench] streamed ${step}: ${progress.length} progress events, first after ${(streamed.events[0]!.at - streamed.started).toFixed(0)} ms, longest gap ${gap.toFixed(0)} ms (after ${after}), ${streamed.ms.toFixed(0)} ms in all (plain ${plain.ms.toFixed(0)} ms)`,
    );
    figures.push(
      single(
        `price list 100,000 rows streamed: ${step}, longest gap`,
        "ms",
        "≤ 1000 ms",
        gap <= 1_000,
        gap,
      ),
      single(
        `price list 100,000 rows streamed: ${step}, total`,
        "ms",
        "reported",
        true,
        streamed.ms,
      ),
      single(
        `price list 100,000 rows streamed: ${step}, progress events`,
        "events",
        "reported",
        true,
        progress.length,
      ),
      single(
        `ratio: streamed ÷ plain ${step}`,
        "times",
        "≤ 1.25",
        streamed.ms / plain.ms <= 1.25,
        streamed.ms / plain.ms,
      ),
    );
  }
  return figures;
}
