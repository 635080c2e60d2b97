/**
 * The server entry: React Router's default Node entry, with two additions.
 * The request's Content-Security-Policy nonce (made in server/app.ts and sent
 * in the header there) goes to <ServerRouter nonce>, which hands it on to
 * <Scripts>, <ScrollRestoration> and <Links>, and to React's own inline
 * scripts through renderToPipeableStream (docs/decisions/012). And errors go
 * to the server's log once, with their stack (`handleError`, docs/decisions/024).
 */
import { PassThrough } from "node:stream";
import { createReadableStreamFromReadable } from "@react-router/node";
import { isbot } from "isbot";
import type { RenderToPipeableStreamOptions } from "react-dom/server";
import { renderToPipeableStream } from "react-dom/server";
import type {
  AppLoadContext,
  EntryContext,
  HandleErrorFunction,
} from "react-router";
import { isRouteErrorResponse, ServerRouter } from "react-router";
import { unexpectedErrorText } from "~/observability/error-reference";
import { logServerError } from "~/observability/logger.server";
import { currentRequest } from "~/observability/request-context.server";

export const streamTimeout = 5_000;

/**
 * Every error React Router catches (a resource route's, a render's), logged
 * once with its stack. Not: a request the client gave up on, and a route
 * error under 500 (a path no route matches), which are no fault of ours.
 */
export const handleError: HandleErrorFunction = (error, { request }) => {
  if (request.signal.aborted) return;
  if (isRouteErrorResponse(error) && error.status < 500) return;
  logServerError(error, "React Router caught an error");
};

export default function handleRequest(
  request: Request,
  responseStatusCode: number,
  responseHeaders: Headers,
  routerContext: EntryContext,
  loadContext: AppLoadContext,
) {
  // https://httpwg.org/specs/rfc9110.html#HEAD
  if (request.method.toUpperCase() === "HEAD") {
    return new Response(null, {
      status: responseStatusCode,
      headers: responseHeaders,
    });
  }
  const nonce = loadContext.cspNonce;

  return new Promise<Response>((resolve) => {
    const userAgent = request.headers.get("user-agent");

    // Crawlers and SPA mode wait for all content; browsers get the shell first.
    const readyOption: keyof RenderToPipeableStreamOptions =
      (userAgent && isbot(userAgent)) || routerContext.isSpaMode
        ? "onAllReady"
        : "onShellReady";

    // Abort after streamTimeout so rejected boundaries still get flushed.
    let timeoutId: ReturnType<typeof setTimeout> | undefined = setTimeout(
      () => abort(),
      streamTimeout + 1000,
    );

    const { pipe, abort } = renderToPipeableStream(
      <ServerRouter context={routerContext} url={request.url} nonce={nonce} />,
      {
        nonce,
        // Every finished part of the page stays in place in the HTML. By default React
        // moves a Suspense boundary bigger than 12,800 bytes (a long table, a chart) to
        // the end of the stream, hidden until an inline script reveals it: without
        // JavaScript it would never show, and with it, it shows a frame later.
        progressiveChunkSize: Number.POSITIVE_INFINITY,
        [readyOption]() {
          const body = new PassThrough({
            final(callback) {
              clearTimeout(timeoutId);
              timeoutId = undefined;
              callback();
            },
          });
          const stream = createReadableStreamFromReadable(body);
          responseHeaders.set("Content-Type", "text/html; charset=utf-8");
          pipe(body);
          resolve(
            new Response(stream, {
              headers: responseHeaders,
              status: responseStatusCode,
            }),
          );
        },
        onShellError(error: unknown) {
          // No page could be drawn: a plain 500 with the reference to quote.
          logServerError(error, "rendering the page failed");
          clearTimeout(timeoutId);
          responseHeaders.set("Content-Type", "text/plain; charset=utf-8");
          resolve(
            new Response(unexpectedErrorText(currentRequest()?.requestId), {
              status: 500,
              headers: responseHeaders,
            }),
          );
        },
        onError(error: unknown) {
          responseStatusCode = 500;
          // Logged once whoever sees it first (logServerError skips a repeat).
          logServerError(error, "rendering the page failed");
        },
      },
    );
  });
}
