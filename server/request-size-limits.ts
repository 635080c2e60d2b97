/**
 * Bounds every request body before React Router reads it (docs/decisions/020).
 * The limit for each route is in app/lib/request-body-limits.ts.
 *
 * Every piece of a body passes through here as Node's HTTP parser hands it
 * over, before any reader sees it:
 *
 * - A Content-Length over the limit is refused at once, before any of the
 *   body is read. (Under the limit it is passed on: Node's parser never
 *   delivers more body than Content-Length says.)
 * - A chunked body (no Content-Length) is counted as it arrives. Under a
 *   small limit (forms, JSON) it is held until complete and only then passed
 *   on, so no route starts on a body that turns out too large. Uploads (a
 *   limit over {@link holdUpToBytes}) stream on to their route as they
 *   arrive; passing the limit there makes the route's read fail, so it never
 *   takes the part that came for the whole body.
 *
 * A refusal is answered at once: 413 with JSON `{ error: { message } }` under
 * /api/, plain text for a page's data request (React Router shows it in the
 * error boundary), a small HTML page for a form posted without JavaScript.
 * The rest of the body is then read and thrown away until it ends, for at
 * most {@link discardRestForMs}, and the connection closed. Closing at once
 * would stop reading sooner, but clients still writing their body (Node's
 * fetch, browsers) then see a reset connection instead of the answer. A
 * route's own answer given before its body has all arrived (the price-list
 * parser's 413 for a file over 20 MB) is followed the same way.
 */
import type {
  NextFunction,
  Request as ExpressRequest,
  Response as ExpressResponse,
} from "express";
import { requestBodyLimit, type BodyLimit } from "~/lib/request-body-limits";
import { routedPath } from "./routed-path";

/** Chunked bodies with a limit up to this are read whole before a route runs. */
const holdUpToBytes = 1024 * 1024;

/**
 * How long the rest of a body answered early is read and thrown away before
 * the connection closes: nginx's default lingering time. A client sending 25 MB
 * over loopback on a busy machine took over 5 s.
 */
const discardRestForMs = 30_000;

/** What a route reading a refused upload gets instead of the body's end. */
class BodyTooLargeError extends Error {
  constructor(limit: BodyLimit) {
    super(`The request body is larger than ${limit.bytes} bytes.`);
    this.name = "BodyTooLargeError";
  }
}

function escapeHtml(text: string): string {
  return text.replace(
    /[&<>"]/g,
    (character) =>
      ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" })[character]!,
  );
}

function refusalPage(message: string): string {
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>Too much sent · Turnledger</title>
</head>
<body style="font-family: system-ui, sans-serif; max-width: 36rem; margin: 5rem auto; padding: 0 1.5rem; color: #222">
<p>Error 413</p>
<h1>Too much sent</h1>
<p>${escapeHtml(message)}</p>
<p>Go back to the form with your browser's Back button.</p>
<p><a href="/">Back to the start page</a></p>
</body>
</html>
`;
}

/** The 413 answer in the form its caller reads: JSON for the API, text for a data request, else a page. */
function tooLargeAnswer(
  path: string,
  limit: BodyLimit,
): { type: string; text: string } {
  if (path.startsWith("/api/")) {
    const message = limit.apiMessage;
    const error = limit.field
      ? { message, fields: { [limit.field]: [message] } }
      : { message };
    return {
      type: "application/json; charset=utf-8",
      text: JSON.stringify({ error }),
    };
  }
  if (path.endsWith(".data"))
    return { type: "text/plain; charset=utf-8", text: limit.pageMessage };
  return {
    type: "text/html; charset=utf-8",
    text: refusalPage(limit.pageMessage),
  };
}

/**
 * Sends the whole 413 answer now but ends it later (`end`): the client reads
 * it while its body is still arriving, and the connection (Connection: close)
 * is closed only once the body has ended or the time is up.
 */
function startTooLargeAnswer(
  request: ExpressRequest,
  response: ExpressResponse,
  limit: BodyLimit,
): () => void {
  const { type, text } = tooLargeAnswer(routedPath(request), limit);
  const body = Buffer.from(text);
  response.writeHead(413, {
    "Content-Type": type,
    "Content-Length": body.byteLength,
    Connection: "close",
  });
  response.write(body);
  // Compression (server/app.ts) would otherwise hold a compressed answer back.
  (response as { flush?: () => void }).flush?.();
  const timer = setTimeout(() => end(), discardRestForMs).unref();
  const end = () => {
    clearTimeout(timer);
    if (!response.writableEnded) response.end();
  };
  return end;
}

type Push = ExpressRequest["push"];

/** Express middleware: the request body limits (see the top of this file). */
export function limitRequestBodies(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  const declared = request.headers["content-length"];
  const chunked = request.headers["transfer-encoding"] !== undefined;
  if (declared === undefined && !chunked) return next();

  const limit = requestBodyLimit(request.method, routedPath(request));
  /** "holding": not passed on yet; "passing": a route reads it; "discarding": read and thrown away. */
  let state: "holding" | "passing" | "discarding" = "holding";
  let held: Buffer[] = [];
  // Bytes the parser handed over before this ran: none when this runs as the
  // request arrives (production), some behind an asynchronous middleware (Vite's).
  let received = request.readableLength;
  let endAnswer = () => {};

  /** Reads the rest of the body and throws it away; no reader sees more of it, nor its end. */
  const discardRest = () => {
    state = "discarding";
    held = [];
    // The parser stops reading the connection while a reader is full; read on.
    request.socket.resume();
  };

  const refuse = () => {
    const routeIsReading = state === "passing";
    discardRest();
    if (response.headersSent) return; // the route has answered already
    endAnswer = startTooLargeAnswer(request, response, limit);
    if (routeIsReading) {
      request.on("error", () => {}); // the error below is for the route's read alone
      response.once("finish", () =>
        request.destroy(new BodyTooLargeError(limit)),
      );
    }
  };

  // A route's answer before its body has all arrived (the price-list parser's
  // 413): the rest is thrown away, and the connection closed if it takes too long.
  response.once("finish", () => {
    if (request.complete) return;
    discardRest();
    setTimeout(() => {
      if (!request.complete) request.socket.destroy();
    }, discardRestForMs).unref();
  });

  // Node's HTTP parser hands the body over through push(); each piece passes here first.
  const push: Push = request.push.bind(request);
  request.push = ((chunk: Buffer | null) => {
    if (state === "discarding") {
      if (chunk === null) endAnswer();
      return true;
    }
    if (chunk === null) {
      if (state === "holding") {
        for (const piece of held) push(piece);
        held = [];
        state = "passing";
        push(null);
        next();
        return false;
      }
      return push(null);
    }
    received += chunk.byteLength;
    if (received > limit.bytes) {
      refuse();
      return true;
    }
    if (state === "holding") {
      held.push(chunk);
      return true;
    }
    return push(chunk);
  }) as Push;

  if (Number(declared) > limit.bytes || received > limit.bytes) return refuse();
  if (!chunked || request.complete || limit.bytes > holdUpToBytes) {
    state = "passing";
    return next();
  }
  // Held: take what the parser handed over already, so it reads on.
  for (let piece: Buffer | null; (piece = request.read()) !== null;)
    held.push(piece);
}
