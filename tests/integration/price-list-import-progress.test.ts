/**
 * POST /api/v1/price-lists with `Accept: application/x-ndjson`: the rows'
 * progress streamed while the dry run or the commit runs, then the answer the
 * same request gets without the stream. Refusals before the work keep their
 * own status and start no stream.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  progressStreamType,
  readProgressStream,
  type TimedProgressEvent,
} from "~/lib/progress-stream";
import { baseUrl, signInAs } from "../support/app-client";
import {
  createSupplier,
  partPriceList as priceList,
  partPriceListMapping as mapping,
} from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";

async function newSupplier(label: string): Promise<string> {
  const name = `Progress mill ${label} ${uniqueCode("S")}`;
  await createSupplier(buyer, name);
  return name;
}

beforeAll(async () => {
  buyer = await signInAs("buyer");
});
afterAll(closeTestDatabase);

function upload(
  csv: string,
  options: {
    supplier: string;
    dryRun?: boolean;
    stream?: boolean;
    cookie?: string;
    signal?: AbortSignal;
    fields?: Record<string, string>;
  },
): Promise<Response> {
  const form = new FormData();
  form.set("file", new Blob([csv]), "sleeves.csv");
  form.set("supplier", options.supplier);
  form.set("mapping", JSON.stringify(mapping));
  for (const [key, value] of Object.entries(options.fields ?? {}))
    form.set(key, value);
  return fetch(
    `${baseUrl()}/api/v1/price-lists${options.dryRun ? "?dryRun=1" : ""}`,
    {
      method: "POST",
      headers: {
        Cookie: options.cookie ?? buyer,
        Origin: baseUrl(),
        ...(options.stream ? { Accept: progressStreamType } : {}),
      },
      body: form,
      signal: options.signal,
    },
  );
}

/** The streamed answer's events: progress first, one result last; checks the stream's own shape. */
async function streamed(response: Response) {
  expect(response.status).toBe(200);
  expect(response.headers.get("Content-Type")).toMatch(
    /^application\/x-ndjson/,
  );
  expect(response.headers.get("Cache-Control")).toContain("no-store");
  const events = await readProgressStream(response);
  const result = events.at(-1);
  if (result?.type !== "result")
    throw new Error(
      `the stream did not end with a result: ${JSON.stringify(events.at(-1))}`,
    );
  const progress = events.slice(0, -1);
  expect(progress.every((event) => event.type === "progress")).toBe(true);
  return {
    progress: progress as Extract<TimedProgressEvent, { type: "progress" }>[],
    result,
  };
}

function expectRisingCounts(
  progress: { processed: number; total: number }[],
  total: number,
) {
  expect(progress.length).toBeGreaterThan(2);
  expect(progress.every((event) => event.total === total)).toBe(true);
  expect(progress[0]!.processed).toBe(0);
  expect(progress.at(-1)!.processed).toBe(total);
  for (let index = 1; index < progress.length; index += 1)
    expect(progress[index]!.processed).toBeGreaterThan(
      progress[index - 1]!.processed,
    );
  // Counts between none and all: the file's rows were reported as they went.
  expect(
    progress.some((event) => event.processed > 0 && event.processed < total),
  ).toBe(true);
}

async function importCounts(supplier: string) {
  const [rows] = await testDatabase().query(
    `SELECT (SELECT COUNT(*) FROM price_lines JOIN suppliers ON suppliers.id = price_lines.supplier_id WHERE suppliers.name = ?) AS line_count,
            (SELECT COUNT(*) FROM price_imports JOIN suppliers ON suppliers.id = price_imports.supplier_id WHERE suppliers.name = ?) AS import_count`,
    [supplier, supplier],
  );
  const [counts] = rows as { line_count: number; import_count: number }[];
  return {
    lines: Number(counts!.line_count),
    imports: Number(counts!.import_count),
  };
}

describe("price-list import progress, streamed", () => {
  it("streams a dry run's rising counts, and ends with the answer the same request gets without the stream", async () => {
    const supplier = await newSupplier("dry");
    const csv = priceList(24_000);
    const { progress, result } = await streamed(
      await upload(csv, { supplier, dryRun: true, stream: true }),
    );
    expectRisingCounts(progress, 24_000);
    expect(progress.every((event) => event.step === "check")).toBe(true);

    const plain = await upload(csv, { supplier, dryRun: true });
    expect(plain.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect(result.status).toBe(plain.status);
    expect(result.body).toEqual(await plain.json());
    expect(result.body).toMatchObject({ valid: 24_000, invalidCount: 0 });
    expect(await importCounts(supplier)).toEqual({ lines: 0, imports: 0 });
  });

  it("streams a commit's counts, writes every row once, and answers a second commit as the plain request does", async () => {
    const supplier = await newSupplier("commit");
    const csv = priceList(24_000);
    const { progress, result } = await streamed(
      await upload(csv, { supplier, stream: true }),
    );
    expectRisingCounts(progress, 24_000);
    expect(progress.every((event) => event.step === "import")).toBe(true);
    expect(result.status).toBe(201);
    expect(result.body).toEqual({
      importId: expect.any(Number),
      supplier,
      fileName: "sleeves.csv",
      rows: 24_000,
      newItems: 6_000,
      warnings: [],
    });
    expect(await importCounts(supplier)).toEqual({
      lines: 24_000,
      imports: 1,
    });

    // The same file again: the plain answer and the streamed one agree.
    const plainAgain = await upload(csv, { supplier });
    const plainBody = await plainAgain.json();
    const again = await streamed(await upload(csv, { supplier, stream: true }));
    expect(again.result).toMatchObject({
      status: plainAgain.status,
      body: plainBody,
    });
    expect(plainBody).toMatchObject({
      alreadyImported: true,
      importId: (result.body as { importId: number }).importId,
    });
    expect(await importCounts(supplier)).toEqual({
      lines: 24_000,
      imports: 1,
    });
  });

  it("a file with bad rows: the check lists them, the commit is refused with them and writes nothing", async () => {
    const supplier = await newSupplier("bad");
    const csv = priceList(12_000, [3, 11_999]);
    const check = await streamed(
      await upload(csv, { supplier, dryRun: true, stream: true }),
    );
    expectRisingCounts(check.progress, 12_000);
    expect(check.result.status).toBe(200);
    expect(check.result.body).toMatchObject({
      valid: 11_998,
      invalidCount: 2,
      invalid: [
        { line: 4, message: expect.stringMatching(/^Line 4: .*negative/) },
        { line: 12_000, message: expect.stringMatching(/negative/) },
      ],
    });

    const commit = await streamed(
      await upload(csv, { supplier, stream: true }),
    );
    const plain = await upload(csv, { supplier });
    expect(commit.result.status).toBe(422);
    expect(commit.result.body).toEqual(await plain.json());
    expect(commit.result.body).toMatchObject({
      error: { message: "2 rows are invalid; nothing was imported." },
      invalidCount: 2,
    });
    expect(await importCounts(supplier)).toEqual({ lines: 0, imports: 0 });
  });

  it("a file that cannot be read: its field error comes as the result, as without the stream", async () => {
    const supplier = await newSupplier("unreadable");
    const headerOnly =
      "Art. no,Description,Kind,Unit,Price,Currency,Min qty,Valid from\n";
    const { progress, result } = await streamed(
      await upload(headerOnly, { supplier, dryRun: true, stream: true }),
    );
    expect(progress).toEqual([]);
    const plain = await upload(headerOnly, { supplier, dryRun: true });
    expect(plain.status).toBe(400);
    expect(result).toMatchObject({ status: 400, body: await plain.json() });
    expect(result.body).toEqual({
      error: {
        message: expect.stringMatching(/no price rows/),
        fields: { file: [expect.stringMatching(/no price rows/)] },
      },
    });
  });

  it("refuses a role without the capability, a missing session and missing fields before any work, with no stream", async () => {
    const supplier = await newSupplier("refused");
    const csv = priceList(4_000);
    const storekeeper = await signInAs("storekeeper");
    const refused = await upload(csv, {
      supplier,
      stream: true,
      cookie: storekeeper,
    });
    expect(refused.status).toBe(403);
    expect(refused.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect((await refused.json()).error.message).toBeTruthy();

    const signedOut = await upload(csv, { supplier, stream: true, cookie: "" });
    expect(signedOut.status).toBe(401);
    expect(signedOut.headers.get("Content-Type")).toMatch(/^application\/json/);

    const noSupplier = await upload(csv, { supplier: "", stream: true });
    expect(noSupplier.status).toBe(400);
    expect(await noSupplier.json()).toMatchObject({
      error: { fields: { supplier: ["Give the supplier's name."] } },
    });
    expect(await importCounts(supplier)).toEqual({ lines: 0, imports: 0 });
  });

  it("a client that stops reading mid-commit leaves nothing written", async () => {
    const supplier = await newSupplier("gone");
    const csv = priceList(40_000);
    const stop = new AbortController();
    const response = await upload(csv, {
      supplier,
      stream: true,
      signal: stop.signal,
    });
    let seen = 0;
    await readProgressStream(response, (event) => {
      if (event.type === "progress" && event.processed > 0) {
        seen = event.processed;
        stop.abort();
      }
    }).catch((error: unknown) => {
      if ((error as Error).name !== "AbortError") throw error;
    });
    expect(seen).toBeGreaterThan(0);
    expect(seen).toBeLessThan(40_000);
    // Had the abandoned import gone on to commit, this would find it ("already imported");
    // it waits for the abandoned one's rollback (the same file's key is locked until then).
    const again = await upload(csv, { supplier });
    expect(again.status, await again.clone().text()).toBe(201);
    expect(await again.json()).toMatchObject({ rows: 40_000 });
    expect(await importCounts(supplier)).toEqual({
      lines: 40_000,
      imports: 1,
    });
  });
});
