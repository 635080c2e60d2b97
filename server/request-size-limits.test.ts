/**
 * The body limits' streaming case on a real HTTP server: an upload that
 * passes its limit while a route is reading it is answered 413, and the
 * route's read fails instead of ending, so the route never takes the part
 * that arrived for the whole body. (The app's own upload route refuses a
 * large file in its parser first; tests/integration/request-size-limits.test.ts
 * covers that and the other cases against the built app.)
 */
import http from "node:http";
import type { AddressInfo } from "node:net";
import { createReadableStreamFromReadable } from "@react-router/node";
import express from "express";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { priceListUploadBodyBytes } from "~/lib/request-body-limits";
import { limitRequestBodies } from "./request-size-limits";

/** What the route saw of the body: its end (with the bytes) or an error. */
let routeRead: Promise<{ ended: number } | { failed: string }>;
let server: http.Server;
let port = 0;

beforeAll(async () => {
  const app = express();
  app.use(limitRequestBodies);
  // Reads the body as React Router's Request does, answering only at its end;
  // with ?answer=early, answers 413 itself after 1 MiB and reads no more (as
  // the price-list route's parser does past 20 MB).
  app.post("/api/v1/price-lists", (request, response) => {
    routeRead = (async () => {
      const reader = createReadableStreamFromReadable(request).getReader();
      let bytes = 0;
      try {
        if (request.query.answer === "early") {
          while (bytes < 1024 * 1024)
            bytes += (await reader.read()).value?.byteLength ?? 0;
          reader.releaseLock();
          response.status(413).json({ answered: "early" });
          return { failed: "answered early" };
        }
        for (
          let read = await reader.read();
          !read.done;
          read = await reader.read()
        )
          bytes += read.value.byteLength;
        return { ended: bytes };
      } catch (error) {
        return { failed: (error as Error).name };
      }
    })();
    void routeRead.then((outcome) => {
      if (!response.headersSent) response.json(outcome);
    });
  });
  server = app.listen(0, "127.0.0.1");
  await new Promise((resolve) => server.once("listening", resolve));
  port = (server.address() as AddressInfo).port;
});
afterAll(() => new Promise((resolve) => server.close(resolve)));

interface Upload {
  status: number;
  body: string;
  /** MiB sent when the answer came. */
  sentMegabytes: number;
  /** The request went on a connection an earlier request had used. */
  reusedConnection: boolean;
}

/**
 * Streams `megabytes` MiB without Content-Length, as much as the connection
 * takes (as fetch and browsers do, reading the answer only once they have sent
 * their body); resolves with the answer, and with `wholeBody` only once the
 * whole body has been sent too.
 */
function streamUpload(
  megabytes: number,
  options: { path?: string; agent?: http.Agent; wholeBody?: boolean } = {},
): Promise<Upload> {
  const chunk = Buffer.alloc(1024 * 1024, 0x41);
  return new Promise((resolve, reject) => {
    let sent = 0;
    const request = http.request({
      host: "127.0.0.1",
      port,
      method: "POST",
      path: options.path ?? "/api/v1/price-lists",
      headers: { "Content-Type": "application/octet-stream" },
      agent: options.agent,
    });
    let sentMegabytes = 0;
    const answered = new Promise<Omit<Upload, "reusedConnection">>((done) =>
      request.on("response", (response) => {
        sentMegabytes = sent;
        let body = "";
        response.on("data", (part: Buffer) => (body += part.toString()));
        response.on("end", () =>
          done({ status: response.statusCode ?? 0, body, sentMegabytes }),
        );
      }),
    );
    const bodySent = options.wholeBody
      ? new Promise((done) => request.on("finish", done))
      : null;
    void Promise.all([answered, bodySent]).then(([answer]) =>
      resolve({ ...answer, reusedConnection: request.reusedSocket }),
    );
    request.on("error", reject);
    const next = () => {
      if (sent === megabytes) return void request.end();
      sent += 1;
      request.write(chunk, (error) => {
        if (!error) setImmediate(next);
      });
    };
    next();
  });
}

describe("an upload streamed to a route", () => {
  it("passes a body within the limit on whole", async () => {
    const answer = await streamUpload(3);
    expect(answer.status).toBe(200);
    expect(JSON.parse(answer.body)).toEqual({ ended: 3 * 1024 * 1024 });
  });

  it("answers 413 past the limit and fails the route's read, which never sees an end", async () => {
    const megabytes = Math.ceil(priceListUploadBodyBytes / 1024 / 1024) + 10;
    const answer = await streamUpload(megabytes);
    expect(answer.status).toBe(413);
    expect(JSON.parse(answer.body)).toEqual({
      error: {
        message: "The file is larger than 20 MB.",
        fields: { file: ["The file is larger than 20 MB."] },
      },
    });
    expect(answer.sentMegabytes).toBeLessThan(megabytes);
    // BodyTooLargeError once the answer is done, or Node's "aborted" when the
    // client closes first: either way the read fails and never ends.
    expect(await routeRead).toEqual({ failed: expect.any(String) });
  });

  it("reads on after a route answers before its body has arrived, so the client finishes and the connection serves again", async () => {
    const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
    const early = await streamUpload(10, {
      path: "/api/v1/price-lists?answer=early",
      agent,
      wholeBody: true,
    });
    expect(early.status).toBe(413);
    expect(JSON.parse(early.body)).toEqual({ answered: "early" });
    expect(early.sentMegabytes).toBeLessThan(10);
    const after = await streamUpload(1, { agent });
    expect(after.status).toBe(200);
    expect(after.reusedConnection).toBe(true);
    agent.destroy();
  });
});
