/**
 * Request bodies are bounded before React Router reads them
 * (server/request-size-limits.ts, app/lib/request-body-limits.ts): 64 KB for
 * forms and JSON, 256 KB for a design revision's lines, the price-list file's
 * 20 MB for uploads. Too large is 413 — JSON under /api/, a page (or, for a
 * page's data request, plain text) elsewhere — answered while the body is
 * still arriving, never after reading it whole.
 */
import { randomBytes } from "node:crypto";
import http from "node:http";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { createWireItem } from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

const mebibyte = 1024 * 1024;

let buyer = "";
let builder = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
});
afterAll(closeTestDatabase);

interface StreamedAnswer {
  status: number;
  contentType: string;
  body: string;
  /** The server answered while the last chunk was still held back. */
  answeredBeforeLastChunk: boolean;
}

/**
 * POSTs `head`, then `chunks` chunks of `chunkBytes` bytes, then `tail`, as a
 * browser or script streams a body: chunked, without Content-Length (unless
 * `contentLength` is given). The last chunk is held back until the server
 * answers or `waitMs` pass, so a server that reads the whole body before
 * answering cannot answer in time.
 */
function streamBody(options: {
  path: string;
  headers: Record<string, string>;
  head: string;
  chunks: number;
  chunkBytes: number;
  tail: string;
  contentLength?: number;
  waitMs?: number;
}): Promise<StreamedAnswer> {
  const target = new URL(baseUrl());
  const chunk = Buffer.alloc(options.chunkBytes, 0x41);
  return new Promise((resolve, reject) => {
    let answered = false;
    let lastChunkSent = false;
    let onAnswer = () => {};
    const request = http.request({
      host: target.hostname,
      port: target.port,
      method: "POST",
      path: options.path,
      headers: {
        Origin: baseUrl(),
        ...(options.contentLength === undefined
          ? {}
          : { "Content-Length": String(options.contentLength) }),
        ...options.headers,
      },
    });
    request.on("response", (response) => {
      answered = true;
      const answeredBeforeLastChunk = !lastChunkSent;
      onAnswer();
      const parts: Buffer[] = [];
      response.on("data", (part: Buffer) => parts.push(part));
      response.on("end", () => {
        request.destroy();
        resolve({
          status: response.statusCode ?? 0,
          contentType: String(response.headers["content-type"] ?? ""),
          body: Buffer.concat(parts).toString("utf8"),
          answeredBeforeLastChunk,
        });
      });
      response.on("error", reject);
    });
    // Once answered, writes may fail as the server stops reading: that is the point.
    request.on("error", (error) => {
      if (!answered) reject(error);
    });
    const write = (data: string | Buffer) =>
      new Promise<void>((done) => request.write(data, () => done()));
    void (async () => {
      await write(options.head);
      for (let sent = 1; sent < options.chunks && !answered; sent += 1)
        await write(chunk);
      if (!answered) {
        await new Promise<void>((done) => {
          const timer = setTimeout(done, options.waitMs ?? 10_000);
          onAnswer = () => {
            clearTimeout(timer);
            done();
          };
        });
      }
      if (answered) return;
      lastChunkSent = true;
      await write(chunk);
      request.end(options.tail);
    })();
  });
}

async function expectServerStillAnswers() {
  expect((await get("/healthz")).status).toBe(200);
  const page = await get("/sign-in");
  expect(page.status).toBe(200);
}

describe("forms", () => {
  it("refuses an anonymous 1 MB sign-in form with a 413 page at once, and the server still answers", async () => {
    const started = performance.now();
    const response = await postForm("/sign-in", {
      email: "someone@example.test",
      password: "p".repeat(mebibyte),
    });
    const took = performance.now() - started;
    expect(response.status).toBe(413);
    expect(response.headers.get("Content-Type")).toMatch(/^text\/html/);
    expect(response.headers.get("X-Content-Type-Options")).toBe("nosniff");
    const page = await response.text();
    expect(page).toContain("The form is larger than 64 KB");
    expect(took).toBeLessThan(5_000);
    await expectServerStillAnswers();
  });

  it("refuses a 1 MB sign-in form sent in chunks while it arrives", async () => {
    const answer = await streamBody({
      path: "/sign-in",
      headers: { "Content-Type": "application/x-www-form-urlencoded" },
      head: "email=someone%40example.test&password=",
      chunks: 16,
      chunkBytes: 64 * 1024,
      tail: "",
    });
    expect(answer.status).toBe(413);
    expect(answer.answeredBeforeLastChunk).toBe(true);
    expect(answer.contentType).toMatch(/^text\/html/);
    expect(answer.body).toContain("The form is larger than 64 KB");
    await expectServerStillAnswers();
  });

  it("answers a page's data request over the limit with the message as text, for the page's error boundary", async () => {
    const response = await fetch(`${baseUrl()}/sign-in.data`, {
      method: "POST",
      headers: {
        Origin: baseUrl(),
        "Content-Type": "application/x-www-form-urlencoded",
      },
      body: new URLSearchParams({ password: "p".repeat(100_000) }),
    });
    expect(response.status).toBe(413);
    expect(response.headers.get("Content-Type")).toMatch(/^text\/plain/);
    expect(response.headers.get("X-Remix-Response")).toBeNull();
    expect(await response.text()).toMatch(/^The form is larger than 64 KB/);
  });

  it("still reads an ordinary form (and answers its fields)", async () => {
    const response = await postForm("/sign-in", {
      email: "not-an-address",
      password: "p".repeat(60 * 1024),
    });
    expect(response.status).toBe(400);
  });
});

describe("JSON", () => {
  it("refuses a JSON body over 64 KB with 413 in the API's error shape", async () => {
    const response = await sendJson("POST", "/api/v1/sessions", {
      email: "someone@example.test",
      password: "p".repeat(100_000),
    });
    expect(response.status).toBe(413);
    expect(response.headers.get("Content-Type")).toMatch(/^application\/json/);
    expect(await response.json()).toEqual({
      error: {
        message:
          "The request is larger than 64 KB, the most Turnledger takes here.",
      },
    });
    await expectServerStillAnswers();
  });

  it("refuses a chunked JSON body over 64 KB while it arrives", async () => {
    const answer = await streamBody({
      path: "/api/v1/sessions",
      headers: { "Content-Type": "application/json" },
      head: '{"email":"someone@example.test","password":"',
      chunks: 16,
      chunkBytes: 64 * 1024,
      tail: '"}',
    });
    expect(answer.status).toBe(413);
    expect(answer.answeredBeforeLastChunk).toBe(true);
    expect(JSON.parse(answer.body)).toEqual({
      error: {
        message:
          "The request is larger than 64 KB, the most Turnledger takes here.",
      },
    });
  });

  describe("a design revision's lines (up to 256 KB)", () => {
    let path = "";
    let wireSku = "";
    beforeAll(async () => {
      wireSku = (await createWireItem(buyer)).sku;
      const { designId } = await createDesign([], { status: "draft" });
      path = `/api/v1/designs/${designId}/revisions/1`;
    });

    it("takes all 200 lines a revision may have, sent indented (over 64 KB)", async () => {
      const coil = {
        kind: "coil",
        sku: wireSku,
        turns: 41,
        strandsInHand: 1,
        activeLengthMm: 50.123456789,
        endTurnLengthMm: 30.123456789,
        leadLengthMm: 150.123456789,
        coilsPerMotor: 12,
        scrapPercent: 3.123456789,
        operatingTemperatureC: 120.123456789,
      };
      const body = JSON.stringify(
        { notes: "n".repeat(1000), lines: Array(200).fill(coil) },
        null,
        4,
      );
      expect(body.length).toBeGreaterThan(64 * 1024);
      const response = await fetch(`${baseUrl()}${path}`, {
        method: "PUT",
        headers: {
          Cookie: builder,
          Origin: baseUrl(),
          "Content-Type": "application/json",
        },
        body,
      });
      expect(response.status, await response.clone().text()).toBe(200);
      expect(
        ((await response.json()) as { lines: unknown[] }).lines,
      ).toHaveLength(200);
    });

    it("refuses a body over 256 KB with 413 JSON", async () => {
      const response = await sendJson(
        "PUT",
        path,
        { notes: "n".repeat(300 * 1024) },
        builder,
      );
      expect(response.status).toBe(413);
      expect(await response.json()).toEqual({
        error: {
          message:
            "The request is larger than 256 KB, the most Turnledger takes here.",
        },
      });
    });
  });
});

describe("price-list uploads (20 MB)", () => {
  const boundary = `----turnledger${randomBytes(8).toString("hex")}`;
  let supplier = "";
  let supplierId = 0;
  beforeAll(async () => {
    supplier = `Size limit mill ${uniqueCode("S")}`;
    supplierId = await createSupplier(buyer, supplier);
  });

  async function importsOfSupplier(): Promise<number> {
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS imports FROM price_imports WHERE supplier_id = ?",
      [supplierId],
    );
    return Number((rows as { imports: number }[])[0]!.imports);
  }

  const head = () =>
    [
      `--${boundary}`,
      'Content-Disposition: form-data; name="supplier"',
      "",
      supplier,
      `--${boundary}`,
      'Content-Disposition: form-data; name="mapping"',
      "",
      JSON.stringify({ supplierSku: "Art. no", price: "Price" }),
      `--${boundary}`,
      'Content-Disposition: form-data; name="file"; filename="huge.csv"',
      "Content-Type: text/csv",
      "",
      "Art. no,Price\r\n",
    ].join("\r\n");
  const tail = `\r\n--${boundary}--\r\n`;
  const upload = (withContentLength: boolean) =>
    streamBody({
      path: "/api/v1/price-lists",
      headers: {
        Cookie: buyer,
        "Content-Type": `multipart/form-data; boundary=${boundary}`,
      },
      head: head(),
      chunks: 25,
      chunkBytes: mebibyte,
      tail,
      contentLength: withContentLength
        ? Buffer.byteLength(head()) + 25 * mebibyte + Buffer.byteLength(tail)
        : undefined,
    });

  it("refuses 25 MB sent in chunks with 413 JSON before the last chunk is sent", async () => {
    const answer = await upload(false);
    expect(answer.status).toBe(413);
    expect(answer.answeredBeforeLastChunk).toBe(true);
    expect(answer.contentType).toMatch(/^application\/json/);
    expect(
      (JSON.parse(answer.body) as { error: { message: string } }).error.message,
    ).toBe("The file is larger than 20 MB.");
    expect(await importsOfSupplier()).toBe(0);
    await expectServerStillAnswers();
  });

  it("refuses 25 MB with a Content-Length at once, before reading it", async () => {
    const answer = await upload(true);
    expect(answer.status).toBe(413);
    expect(answer.answeredBeforeLastChunk).toBe(true);
    expect(
      (JSON.parse(answer.body) as { error: { message: string } }).error.message,
    ).toBe("The file is larger than 20 MB.");
    expect(await importsOfSupplier()).toBe(0);
    await expectServerStillAnswers();
  });
});
