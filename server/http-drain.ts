/**
 * Stopping an HTTP server without cutting requests short (server.js, on
 * SIGTERM or SIGINT). `stop(graceMs)`:
 *
 * 1. stops accepting connections and closes the idle keep-alive ones;
 * 2. lets the requests in flight finish, each answer carrying
 *    `Connection: close` (when its headers have not gone out yet), and closes
 *    each connection once its last answer is out;
 * 3. answers a request that still arrives on an open connection with 503 and
 *    `Connection: close`: a server that is stopping starts no new work;
 * 4. after `graceMs`, closes whatever connections remain (their requests are
 *    cut off; a transaction they had open is rolled back by MariaDB when the
 *    database pool closes after this).
 *
 * Plain Node http, no app code, so it is tested on a server of its own
 * (http-drain.test.ts). See docs/decisions/026-readiness-and-graceful-stop.md.
 */
import type {
  IncomingMessage,
  RequestListener,
  Server,
  ServerResponse,
} from "node:http";

export interface DrainOutcome {
  /** True when every request in flight was answered within the grace period. */
  finishedInTime: boolean;
  /** Requests still unanswered when the grace period ended (their connections were closed). */
  cutOff: number;
}

const stoppingMessage =
  "This server is stopping. Try again in a moment: another server, or this one once restarted, will answer.";

export class HttpDrain {
  private stopping = false;
  /** Answers not yet finished, with the connection each goes out on. */
  private readonly inFlight = new Set<ServerResponse>();
  private readonly settled = new Set<() => void>();

  constructor(private readonly server: Server) {}

  /** The server's request listener: hands each request to `handler` until the server is stopping. */
  handle(handler: RequestListener): RequestListener {
    return (request: IncomingMessage, response: ServerResponse) => {
      if (this.stopping) return refuse(response);
      this.inFlight.add(response);
      // "close" follows "finish", and also comes when the client went away first.
      response.once("close", () => {
        this.inFlight.delete(response);
        if (this.stopping) this.closeWhenIdle(request);
        if (this.inFlight.size === 0) for (const done of this.settled) done();
      });
      handler(request, response);
    };
  }

  /** Requests being answered now. */
  get requestsInFlight(): number {
    return this.inFlight.size;
  }

  /** Stops the server as described above; resolves once every connection is closed. */
  async stop(graceMs: number): Promise<DrainOutcome> {
    this.stopping = true;
    const closed = new Promise<void>((resolve) =>
      this.server.close(() => resolve()),
    );
    this.server.closeIdleConnections();
    for (const response of this.inFlight)
      if (!response.headersSent) response.setHeader("Connection", "close");

    const answered = new Promise<boolean>((resolve) => {
      if (this.inFlight.size === 0) return resolve(true);
      this.settled.add(() => resolve(true));
    });
    const started = Date.now();
    const finishedInTime = await within(answered, graceMs, false);
    const cutOff = this.inFlight.size;
    // Connections whose last answer has gone out close on their own
    // (Connection: close) or in closeWhenIdle; one that never sent a whole
    // request is closed with the rest once the grace period is over.
    this.server.closeIdleConnections();
    // (A second at least for answers that made it in the last moment.)
    const left = finishedInTime
      ? Math.max(1_000, graceMs - (Date.now() - started))
      : 0;
    if (
      !(await within(
        closed.then(() => true),
        left,
        false,
      ))
    )
      this.server.closeAllConnections();
    await closed;
    return { finishedInTime, cutOff };
  }

  /** Ends a connection once nothing is being answered on it (a keep-alive one whose answer went out before the stop). */
  private closeWhenIdle(request: IncomingMessage) {
    const socket = request.socket;
    for (const response of this.inFlight)
      if (response.req.socket === socket) return;
    if (!socket.destroyed) socket.end();
  }
}

/** What `promise` resolves to, or `otherwise` once `ms` have passed. */
async function within<T>(
  promise: Promise<T>,
  ms: number,
  otherwise: T,
): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  try {
    return await Promise.race([
      promise,
      new Promise<T>((resolve) => {
        timer = setTimeout(() => resolve(otherwise), ms);
      }),
    ]);
  } finally {
    clearTimeout(timer);
  }
}

/** 503 with `Connection: close`: what a request that arrives after the stop began gets. */
function refuse(response: ServerResponse) {
  response.writeHead(503, {
    "Content-Type": "application/json; charset=utf-8",
    "Cache-Control": "no-store",
    "Retry-After": "5",
    Connection: "close",
  });
  response.end(JSON.stringify({ error: { message: stoppingMessage } }));
}
