/**
 * Importing a generated 100,000-row price list (about 8 MB): the dry run and the
 * commit through the API, the server's peak memory growth, and a raw mysql2
 * batched upsert of the same rows for the ratio import ÷ raw.
 */
import fs from "node:fs";
import mysql from "mysql2/promise";
import { poolOptionsFromUrl } from "~/db/connection-options";
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

async function upload(
  baseUrl: string,
  cookie: string,
  csv: string,
  dryRun: boolean,
): Promise<{ ms: number; status: number }> {
  const form = new FormData();
  form.set("file", new Blob([csv]), "bench-100k.csv");
  form.set("supplier", "Bench supplier");
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
  const created = await fetch(`${input.baseUrl}/api/v1/suppliers`, {
    method: "POST",
    headers: { "Content-Type": "application/json", Cookie: input.buyerCookie },
    body: JSON.stringify({ name: "Bench supplier", currency: "EUR" }),
  });
  if (created.status !== 201) throw new Error(`supplier: ${created.status}`);

  const before = memoryOf(input.serverPid);
  const dryRun = await upload(input.baseUrl, input.buyerCookie, csv, true);
  const commit = await upload(input.baseUrl, input.buyerCookie, csv, false);
  const after = memoryOf(input.serverPid);

  // The same rows as one raw batched upsert (2,000 rows per statement), into a scratch table.
  const connection = await mysql.createConnection(
    poolOptionsFromUrl(input.databaseUrl),
  );
  let rawMs = 0;
  try {
    await connection.query("CREATE TABLE bench_raw_prices LIKE price_lines");
    await connection.query(
      "ALTER TABLE bench_raw_prices DROP FOREIGN KEY IF EXISTS price_lines_supplier_id_suppliers_id_fk",
    );
    const rows = csv
      .trim()
      .split("\n")
      .slice(1)
      .map((line) => line.split(","))
      .map((cells) => [
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
    rawMs = performance.now() - started;
    await connection.query("DROP TABLE bench_raw_prices");
  } finally {
    await connection.end();
  }
  const single = (
    name: string,
    unit: string,
    target: string,
    passed: boolean,
    value: number,
  ): Figure => ({
    name,
    unit,
    target,
    passed,
    median: value,
    p95: value,
    samples: [value],
  });
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
      "ratio: import commit ÷ raw upsert",
      "times",
      "≤ 3",
      commit.ms / rawMs <= 3,
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
