/**
 * HttpDrain on a real HTTP server and real sockets: a request in flight gets
 * its whole answer, a new connection is refused, a request that arrives on an
 * open connection after the stop began is answered 503, and a request that
 * outlasts the grace period has its connection closed. (The built app's stop
 * on SIGTERM is tested in tests/integration/graceful-stop.test.ts.)
 */
import http from "node:http";
import net, { type AddressInfo } from "node:net";
import { afterEach, describe, expect, it } from "vitest";
import { HttpDrain } from "./http-drain";

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

let server: http.Server | undefined;

afterEach(() => {
  server?.closeAllConnections();
  server?.close();
  server = undefined;
});

/**
 * A server whose /slow answers after `slowMs`, /stream sends its headers at
 * once and its body after `slowMs`, /never never answers, anything else at once.
 */
async function startServer(slowMs: number) {
  server = http.createServer();
  const drain = new HttpDrain(server);
  server.on(
    "request",
    drain.handle((request, response) => {
      if (request.url === "/slow")
        setTimeout(() => response.end("slow answer"), slowMs);
      else if (request.url === "/stream") {
        response.writeHead(200, { "Content-Type": "text/plain" });
        response.write("first part;");
        setTimeout(() => response.end("last part"), slowMs);
      } else if (request.url === "/never") {
        // no answer
      } else response.end("quick answer");
    }),
  );
  await new Promise<void>((resolve) => server!.listen(0, "127.0.0.1", resolve));
  const port = (server.address() as AddressInfo).port;
  return { drain, port };
}

/** A raw keep-alive connection: send requests, read everything that comes back until it closes. */
function openConnection(port: number) {
  const socket = net.connect(port, "127.0.0.1");
  let received = "";
  socket.on("data", (chunk) => (received += chunk.toString()));
  const ended = new Promise<string>((resolve) => {
    socket.on("close", () => resolve(received));
    socket.on("error", () => undefined);
  });
  return {
    send(path: string) {
      socket.write(
        `GET ${path} HTTP/1.1\r\nHost: 127.0.0.1\r\nConnection: keep-alive\r\n\r\n`,
      );
    },
    received: () => received,
    ended,
  };
}

/** Whether a new TCP connection to the port is refused. */
function connectionRefused(port: number): Promise<boolean> {
  return new Promise((resolve) => {
    const socket = net.connect(port, "127.0.0.1");
    socket.once("connect", () => {
      socket.destroy();
      resolve(false);
    });
    socket.once("error", (error: NodeJS.ErrnoException) =>
      resolve(error.code === "ECONNREFUSED"),
    );
  });
}

describe("HttpDrain.stop", () => {
  it("lets a request in flight finish with its whole answer and closes its connection; new connections are refused", async () => {
    const { drain, port } = await startServer(400);
    const connection = openConnection(port);
    connection.send("/slow");
    await expect.poll(() => drain.requestsInFlight).toBe(1);

    const stopping = drain.stop(5_000);
    await sleep(50);
    expect(await connectionRefused(port)).toBe(true);
    const outcome = await stopping;

    expect(outcome).toEqual({ finishedInTime: true, cutOff: 0 });
    const received = await connection.ended;
    expect(received).toMatch(/^HTTP\/1\.1 200 OK/);
    expect(received).toMatch(/\r\nConnection: close\r\n/i);
    expect(received).toContain("slow answer");
  });

  it("closes idle keep-alive connections at once", async () => {
    const { drain, port } = await startServer(0);
    const connection = openConnection(port);
    connection.send("/quick");
    await expect.poll(connection.received).toContain("quick answer");
    expect(connection.received()).toMatch(/Connection: keep-alive/i);

    const started = Date.now();
    expect(await drain.stop(5_000)).toEqual({
      finishedInTime: true,
      cutOff: 0,
    });
    await connection.ended;
    // Long before the keep-alive timeout (5 s) or the grace period.
    expect(Date.now() - started).toBeLessThan(2_000);
  });

  it("answers 503 to a request that arrives on an open connection after the stop began", async () => {
    const { drain, port } = await startServer(600);
    const connection = openConnection(port);
    connection.send("/stream");
    await expect.poll(connection.received).toContain("first part;");

    const stopping = drain.stop(5_000);
    connection.send("/quick");
    expect(await stopping).toEqual({ finishedInTime: true, cutOff: 0 });
    const received = await connection.ended;
    expect(received).toContain("last part");
    expect(received).toMatch(/HTTP\/1\.1 503 Service Unavailable/);
    expect(received).toContain("This server is stopping");
    expect(received).not.toContain("quick answer");
  });

  it("closes the connection of a request still unanswered when the grace period ends", async () => {
    const { drain, port } = await startServer(0);
    const connection = openConnection(port);
    connection.send("/never");
    await expect.poll(() => drain.requestsInFlight).toBe(1);

    const started = Date.now();
    expect(await drain.stop(300)).toEqual({
      finishedInTime: false,
      cutOff: 1,
    });
    expect(Date.now() - started).toBeGreaterThanOrEqual(290);
    expect(await connection.ended).toBe("");
  });
});
