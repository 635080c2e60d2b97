/**
 * Price-list uploads: too large (also when streamed without Content-Length)
 * and binary files are refused with nothing written; every answer is JSON with
 * nosniff, never the file echoed as HTML; the file is never written where it
 * could be served, and no address serves it back. See docs/decisions/012.
 */
import { randomBytes } from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let supplier = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  supplier = `Upload test mill ${uniqueCode("S")}`;
  const created = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name: supplier, currency: "EUR" },
    buyer,
  );
  expect(created.status).toBe(201);
});
afterAll(closeTestDatabase);

const mapping = {
  supplierSku: "Art. no",
  description: "Description",
  price: "Price",
  currency: "Currency",
  minQuantity: "Min qty",
  validFrom: "Valid from",
};
const header = "Art. no,Description,Price,Currency,Min qty,Valid from";

function upload(
  bytes: string | Uint8Array,
  fileName = "prices.csv",
  type = "text/csv",
): Promise<Response> {
  const form = new FormData();
  form.set("file", new Blob([bytes as BlobPart], { type }), fileName);
  form.set("supplier", supplier);
  form.set("mapping", JSON.stringify(mapping));
  return fetch(`${baseUrl()}/api/v1/price-lists`, {
    method: "POST",
    headers: { Cookie: buyer, Origin: baseUrl() },
    body: form,
  });
}

async function tableCounts() {
  const [rows] = await testDatabase().query(
    "SELECT (SELECT COUNT(*) FROM price_lines) AS line_count, (SELECT COUNT(*) FROM price_imports) AS import_count, (SELECT COUNT(*) FROM items) AS item_count, (SELECT COUNT(*) FROM supplier_items) AS sku_count",
  );
  return (rows as Record<string, number>[])[0];
}

/** An upload's answer is JSON that browsers may not sniff into HTML. */
function expectJsonAnswer(response: Response) {
  expect(response.headers.get("Content-Type")).toMatch(/^application\/json/);
  expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
  expect(response.headers.get("Content-Disposition")).toBeNull();
}

describe("price-list upload limits", () => {
  it("refuses 25 MB streamed without Content-Length with 413, writing nothing", async () => {
    const before = await tableCounts();
    const boundary = `----turnledger${randomBytes(8).toString("hex")}`;
    const encoder = new TextEncoder();
    const chunk = new Uint8Array(1024 * 1024).fill(0x41);
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      start(controller) {
        controller.enqueue(
          encoder.encode(
            [
              `--${boundary}`,
              'Content-Disposition: form-data; name="supplier"',
              "",
              supplier,
              `--${boundary}`,
              'Content-Disposition: form-data; name="mapping"',
              "",
              JSON.stringify(mapping),
              `--${boundary}`,
              'Content-Disposition: form-data; name="file"; filename="huge.csv"',
              "Content-Type: text/csv",
              "",
              `${header}\r\n`,
            ].join("\r\n"),
          ),
        );
      },
      pull(controller) {
        if (sent < 25) {
          controller.enqueue(chunk);
          sent += 1;
        } else {
          controller.enqueue(encoder.encode(`\r\n--${boundary}--\r\n`));
          controller.close();
        }
      },
    });
    const response = await fetch(`${baseUrl()}/api/v1/price-lists`, {
      method: "POST",
      headers: {
        Cookie: buyer,
        Origin: baseUrl(),
        "Content-Type": `multipart/form-data; boundary=${boundary}`,
      },
      body,
      duplex: "half",
    } as RequestInit);
    expect(response.status).toBe(413);
    expectJsonAnswer(response);
    expect(
      ((await response.json()) as { error: { message: string } }).error.message,
    ).toBe("The file is larger than 20 MB.");
    expect(sent).toBe(25);
    expect(await tableCounts()).toEqual(before);
  });

  it("refuses 25 MB with a Content-Length with 413 JSON, writing nothing", async () => {
    const before = await tableCounts();
    const response = await upload(new Uint8Array(25 * 1024 * 1024).fill(0x41));
    expect(response.status).toBe(413);
    expectJsonAnswer(response);
    expect(await tableCounts()).toEqual(before);
  });

  it.each([
    [
      "a PNG image",
      [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a],
      "image/png",
    ],
    ["a gzip archive", [0x1f, 0x8b, 0x08, 0x00], "application/gzip"],
    ["a Linux program", [0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01], "text/csv"],
    ["a PDF", [0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x37], "text/csv"],
  ])(
    "refuses %s named .csv with 400 JSON, writing nothing",
    async (_label, magic, type) => {
      const before = await tableCounts();
      const bytes = new Uint8Array(4096);
      bytes.set(randomBytes(4096));
      bytes.set(magic);
      const response = await upload(bytes, "prices.csv", type);
      expect(response.status).toBe(400);
      expectJsonAnswer(response);
      const body = (await response.json()) as {
        error: { message: string; fields: { file: string[] } };
      };
      expect(body.error.fields.file.length).toBeGreaterThan(0);
      expect(await tableCounts()).toEqual(before);
    },
  );

  it("answers an HTML file with JSON that quotes it as text, writing nothing", async () => {
    const before = await tableCounts();
    const page = `<html><body><script>alert(1)</script><img src=x onerror=alert(1)></body></html>`;
    for (const dryRun of [true, false]) {
      const form = new FormData();
      form.set(
        "file",
        new Blob([`${header}\n${page},x,1.00,EUR,1,2026-01-01\n`], {
          type: "text/html",
        }),
        "prices.html",
      );
      form.set("supplier", supplier);
      form.set("mapping", JSON.stringify(mapping));
      const response = await fetch(
        `${baseUrl()}/api/v1/price-lists${dryRun ? "?dryRun=1" : ""}`,
        {
          method: "POST",
          headers: { Cookie: buyer, Origin: baseUrl() },
          body: form,
        },
      );
      // The supplier SKU (the whole page) is too long: listed as invalid, then refused.
      expect(response.status).toBe(dryRun ? 200 : 422);
      expectJsonAnswer(response);
      const body = (await response.json()) as { invalid: unknown[] };
      expect(body.invalid).toHaveLength(1);
    }
    expect(await tableCounts()).toEqual(before);
  });
});

describe("an uploaded file", () => {
  const marker = `served-back-${randomBytes(6).toString("hex")}`;
  const fileName = `${marker}.csv`;
  const hostileName = `"><img src=x onerror=alert(1)>${marker}.html`;
  let importId = 0;

  beforeAll(async () => {
    for (const name of [fileName, hostileName]) {
      const sku = uniqueCode("UP");
      const response = await upload(
        `${header}\n${sku},${marker} sleeve,1.25,EUR,1,2026-01-01\n`,
        name,
      );
      expect(response.status, await response.clone().text()).toBe(201);
      expectJsonAnswer(response);
      importId = ((await response.json()) as { importId: number }).importId;
    }
  });

  it("is kept only as its rows and name, and no address serves it back", async () => {
    for (const address of [
      `/${fileName}`,
      `/uploads/${fileName}`,
      `/assets/${fileName}`,
      `/build/${fileName}`,
      `/public/${fileName}`,
      `/suppliers/imports/${fileName}`,
      `/${encodeURIComponent(hostileName)}`,
    ]) {
      const response = await get(address, buyer);
      expect(response.status, address).toBe(404);
      expect(await response.text(), address).not.toContain(`${marker} sleeve`);
    }
    // Nothing of the file landed in the folders the server serves files from.
    const root = path.resolve(import.meta.dirname, "..", "..");
    const buildDirectory = process.env.BUILD_DIRECTORY ?? "build";
    for (const folder of ["public", path.join(buildDirectory, "client")]) {
      const names = fs.readdirSync(path.join(root, folder), {
        recursive: true,
      }) as string[];
      expect(names.filter((name) => name.includes(marker))).toEqual([]);
    }
  });

  it("is named escaped on the past-imports page", async () => {
    for (const address of [
      "/suppliers/imports",
      `/suppliers/imports?import=${importId}`,
    ]) {
      const response = await get(address, buyer);
      expect(response.status).toBe(200);
      const html = (await response.text()).replace(/<!-- -->/g, "");
      expect(html, address).toContain(
        "&quot;&gt;&lt;img src=x onerror=alert(1)&gt;",
      );
      expect(html, address).not.toMatch(/<img[^>]*\bsrc="?x/);
    }
  });

  it("cannot be posted to the import page itself: 405, with the headers", async () => {
    const form = new FormData();
    form.set("file", new Blob(["<script>alert(1)</script>"]), "x.html");
    const response = await fetch(`${baseUrl()}/suppliers/import`, {
      method: "POST",
      redirect: "manual",
      headers: { Cookie: buyer, Origin: baseUrl() },
      body: form,
    });
    expect(response.status).toBe(405);
    expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
    expect(await response.text()).not.toContain("<script>alert(1)");
  });
});
