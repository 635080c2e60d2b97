import "react-router";
import { randomBytes } from "node:crypto";
import { createRequestHandler } from "@react-router/express";
import compression from "compression";
import express, {
  type NextFunction,
  type RequestHandler,
  type Request as ExpressRequest,
  type Response as ExpressResponse,
} from "express";
import type { ServerBuild } from "react-router";
import { lucia } from "~/auth/lucia.server";
import { expectedOrigin, servesHost } from "~/lib/app-address";
import { appAddress } from "~/lib/app-url.server";
import { unexpectedErrorText } from "~/observability/error-reference";
import { areaLogger, logServerError } from "~/observability/logger.server";
import { mayReadMetrics } from "~/observability/metrics-access";
import {
  metricsContentType,
  metricsText,
  observeRequest,
} from "~/observability/metrics.server";
import {
  runWithRequestContext,
  type RequestContext,
} from "~/observability/request-context.server";
import { acceptedRequestId, newRequestId } from "~/observability/request-id";
import { routeIdMatcher, routeTree } from "~/observability/route-id";
import { answerDatabaseOutages } from "./database-unavailable";
import { routedPath } from "./routed-path";
import { sizeJsonAnswers } from "./sized-json-answers";
import { limitRequestBodies } from "./request-size-limits";
import { referenceUnexpectedErrors } from "./unexpected-errors";

export { deploymentProblems } from "./deployment-checks";
export { logger } from "~/observability/logger.server";
export * from "./shutdown";

declare module "react-router" {
  interface AppLoadContext {
    /** The client's IP address (from X-Forwarded-For only when TRUST_PROXY is set). */
    clientAddress: string;
    /** This answer's Content-Security-Policy nonce, for React Router's inline scripts. */
    cspNonce: string;
  }
}

/**
 * Vite's dev server (`npm run dev`, the same condition as in server.js). Read
 * at run time: a build made with NODE_ENV unset or "test" must still get the
 * strict policy when served by `npm start`.
 */
const servedByViteDevServer = process.env.NODE_ENV === "development";

/**
 * The Content-Security-Policy of an answer (docs/decisions/012). Scripts only
 * from our own origin or inline with this request's nonce; style attributes
 * are allowed because charts and bars set widths and colours through them.
 * Under Vite's dev server hot reload injects scripts and opens a web socket,
 * so that policy allows inline scripts and eval; a production server never does.
 */
export function contentSecurityPolicy(nonce: string): string {
  const scripts = servedByViteDevServer
    ? "'self' 'unsafe-inline' 'unsafe-eval'"
    : `'self' 'nonce-${nonce}'`;
  return [
    "default-src 'self'",
    `script-src ${scripts}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data:",
    "font-src 'self' data:",
    `connect-src 'self'${servedByViteDevServer ? " ws: wss:" : ""}`,
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** Runs `addHeaders` just before the answer's headers go out, after the route has set its own. */
function beforeHeadersGoOut(
  response: ExpressResponse,
  addHeaders: (response: ExpressResponse) => void,
) {
  const writeHead = response.writeHead;
  response.writeHead = function (
    this: typeof response,
    ...args: Parameters<typeof writeHead>
  ) {
    addHeaders(this);
    return writeHead.apply(this, args);
  } as typeof writeHead;
}

/** Sets each header the answer does not carry by then: a header a route sets itself is kept. */
function setHeadersByDefault(
  response: ExpressResponse,
  defaults: Record<string, string>,
) {
  beforeHeadersGoOut(response, (answer) => {
    for (const [name, value] of Object.entries(defaults)) {
      if (!answer.hasHeader(name)) answer.setHeader(name, value);
    }
  });
}

/**
 * Security headers on every answer (pages, API, CSV downloads and, through
 * server.js, the static files), and a fresh nonce for each request in
 * `res.locals.cspNonce`. A header a route sets itself is kept. Safe to run
 * twice on one request: the second run does nothing.
 */
export function securityHeaders(
  _request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  if (response.locals.cspNonce) return next();
  const nonce = randomBytes(16).toString("base64");
  response.locals.cspNonce = nonce;
  const defaults: Record<string, string> = {
    "Content-Security-Policy": contentSecurityPolicy(nonce),
    "X-Content-Type-Options": "nosniff",
    "Referrer-Policy": "same-origin",
    "X-Frame-Options": "DENY",
    "Cross-Origin-Opener-Policy": "same-origin",
    "Cross-Origin-Resource-Policy": "same-origin",
  };
  // HSTS only where the public address is HTTPS (a deployment behind TLS);
  // browsers ignore it over plain HTTP, and a laptop's localhost has none.
  if (appAddress().protocol === "https:")
    defaults["Strict-Transport-Security"] =
      "max-age=31536000; includeSubDomains";
  setHeadersByDefault(response, defaults);
  next();
}

function isApiPath(request: ExpressRequest): boolean {
  return routedPath(request).startsWith("/api/");
}

/**
 * The origin a page of ours sends with its forms: APP_URL's (on loopback, the
 * same machine by the name the request used); null for a host we do not serve.
 */
function appOrigin(request: ExpressRequest): string | null {
  return expectedOrigin(appAddress(), request.host);
}

function originOf(value: string | undefined): string | null {
  if (!value) return null;
  try {
    const origin = new URL(value).origin;
    return origin === "null" ? null : origin;
  } catch {
    return null;
  }
}

function carriesSessionCookie(request: ExpressRequest): boolean {
  const cookies = request.get("Cookie");
  return (
    !!cookies &&
    cookies
      .split(";")
      .some((pair) =>
        pair.trimStart().startsWith(`${lucia.sessionCookieName}=`),
      )
  );
}

function usesBearerToken(request: ExpressRequest): boolean {
  return (
    isApiPath(request) &&
    /^Bearer\s+\S+$/i.test(request.get("Authorization") ?? "")
  );
}

/** Why a request that changes something is refused as cross-site, or null when it may go on. */
export function crossSiteRefusal(request: ExpressRequest): string | null {
  if (request.method === "GET" || request.method === "HEAD") return null;
  const expected = appOrigin(request);
  const origin = request.get("Origin");
  if (origin !== undefined) {
    return origin !== "" && originOf(origin) === expected
      ? null
      : "This request came from another site and was refused. Open Turnledger at its own address and try again.";
  }
  // Browsers send Origin with every POST, PUT, PATCH and DELETE. Without it, a
  // request riding on the session cookie must at least come from one of our pages.
  if (!carriesSessionCookie(request) || usesBearerToken(request)) return null;
  if (originOf(request.get("Referer")) === expected) return null;
  return "A request signed in with the session cookie needs an Origin or Referer header from Turnledger's own address. Scripts: use a personal API token (Authorization: Bearer).";
}

/** Refuses cross-site writes with 403 before any route code runs (docs/decisions/012). */
export function refuseCrossSiteRequests(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  const refusal = crossSiteRefusal(request);
  if (!refusal) return next();
  response.status(403);
  if (isApiPath(request)) {
    response.json({ error: { message: refusal } });
  } else {
    response.type("text/plain; charset=utf-8").send(`${refusal}\n`);
  }
}

/** The methods the app's routes answer; any other is refused before them. */
const answeredMethods = [
  "GET",
  "HEAD",
  "POST",
  "PUT",
  "PATCH",
  "DELETE",
  "OPTIONS",
];

/**
 * Refuses what no route can answer, before any route sees it: a method
 * outside {@link answeredMethods} (TRACE, PROPFIND, …) gets 405 with Allow,
 * and a request target that is not a path (`GET http://other.example/` in
 * absolute form, `*`) gets 400 — the answers of the API's JSON error shape
 * under /api/, plain text elsewhere, instead of a framework's 500.
 */
export function refuseOddRequests(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  const pathTarget = request.originalUrl.startsWith("/");
  if (pathTarget && answeredMethods.includes(request.method)) return next();
  const message = pathTarget
    ? `The method ${request.method} is not answered here.`
    : "The request target must be a path on this server.";
  response.status(pathTarget ? 405 : 400);
  if (pathTarget) response.set("Allow", answeredMethods.join(", "));
  if (pathTarget && isApiPath(request)) response.json({ error: { message } });
  else response.type("text/plain; charset=utf-8").send(`${message}\n`);
}

/**
 * The paths machines probe by address rather than by APP_URL's name: load
 * balancers (/healthz liveness, /readyz readiness) and Prometheus (/metrics).
 * They answer any Host; they make no page, link or e-mail.
 */
export const probePaths: ReadonlySet<string> = new Set([
  "/healthz",
  "/readyz",
  "/metrics",
]);

/**
 * Serves only requests for APP_URL's host (on loopback: localhost, 127.0.0.1
 * and [::1] on its port). A request naming another host is answered 421
 * before any route: no page, link or e-mail is ever made for a host an
 * attacker chose. The {@link probePaths} answer any host.
 */
export function refuseUnknownHosts(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  if (
    servesHost(appAddress(), request.host) ||
    probePaths.has(routedPath(request))
  )
    return next();
  const message = `This server answers for ${appAddress().origin} only.`;
  response.status(421);
  if (isApiPath(request)) response.json({ error: { message } });
  else response.type("text/plain; charset=utf-8").send(`${message}\n`);
}

/**
 * Answers from the app (pages, their .data, JSON, CSV) are never stored by a
 * browser or proxy unless a route says otherwise: most are one person's view
 * of the stock. The static assets (server.js) keep their own long caching.
 */
export function noStoreByDefault(
  _request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  setHeadersByDefault(response, { "Cache-Control": "no-store" });
  next();
}

const serverBuild = () =>
  import("virtual:react-router/server-build") as Promise<ServerBuild>;

const routeMatchers = new WeakMap<object, (pathname: string) => string>();

/** The route id of a request React Router answered (app/observability/route-id.ts). */
async function routeIdOf(pathname: string): Promise<string> {
  const build = await serverBuild();
  let matcher = routeMatchers.get(build.routes);
  if (!matcher) {
    matcher = routeIdMatcher(routeTree(build.routes));
    routeMatchers.set(build.routes, matcher);
  }
  return matcher(pathname);
}

const httpLog = areaLogger("http");

/** Whether a request carries an id our proxy gave it (X-Request-Id is kept only then). */
const behindTrustedProxy = () => !!process.env.TRUST_PROXY;

/**
 * The label of a request that never reached React Router: a static file
 * (server.js) or one of the refusals in front of the routes.
 */
function labelOutsideRoutes(status: number): string {
  return status < 400 ? "(static)" : "(refused)";
}

/**
 * Gives each request its id (the X-Request-Id header and
 * `res.locals.requestId`), runs it in a request context (person, id for log
 * lines), and when its answer ends writes one log line and counts it in the
 * metrics: time, request id, method, route id, status, duration, person id.
 * Never the URL, query, headers or body. Safe to run twice on one request
 * (server.js puts it before the static files): the second run does nothing.
 * See docs/decisions/024-structured-logs.md.
 */
export function observeRequests(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  if (response.locals.requestId) return next();
  const requestId =
    acceptedRequestId(request.get("X-Request-Id"), behindTrustedProxy()) ??
    newRequestId();
  response.locals.requestId = requestId;
  response.setHeader("X-Request-Id", requestId);
  const started = process.hrtime.bigint();
  const context: RequestContext = { requestId, personId: null, display: null };
  const pathname = routedPath(request);
  response.once("close", () => {
    const seconds = Number(process.hrtime.bigint() - started) / 1e9;
    const status = response.statusCode;
    const routed = response.locals.routeLabel === routedByReactRouter;
    void (async () => {
      const route = routed
        ? await routeIdOf(pathname)
        : typeof response.locals.routeLabel === "string"
          ? response.locals.routeLabel
          : labelOutsideRoutes(status);
      observeRequest({ route, method: request.method, status, seconds });
      const line = {
        requestId,
        method: request.method,
        route,
        status,
        durationMs: Math.round(seconds * 1e4) / 10,
        personId: context.personId,
        ...(response.writableFinished ? {} : { aborted: true }),
      };
      // Probes come every few seconds: shown at LOG_LEVEL=debug only, unless they fail.
      if (status >= 500) httpLog.error(line, "request");
      else if (probePaths.has(pathname) && status < 400)
        httpLog.debug(line, "request");
      else httpLog.info(line, "request");
    })().catch((error: unknown) =>
      logServerError(error, "the request's log line failed"),
    );
  });
  runWithRequestContext(context, next);
}

/** `res.locals.routeLabel` of a request React Router answers: its route id is looked up. */
const routedByReactRouter = Symbol("routed by React Router");

/**
 * GET /metrics in Prometheus' text format, for a scraper on this machine or
 * one holding METRICS_TOKEN (app/observability/metrics-access.ts); anyone
 * else gets 404, as for a path that does not exist. See docs/decisions/025.
 */
export async function answerMetrics(
  request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  if (
    routedPath(request) !== "/metrics" ||
    (request.method !== "GET" && request.method !== "HEAD")
  )
    return next();
  response.locals.routeLabel = "(metrics)";
  const allowed = mayReadMetrics(
    {
      remoteAddress: request.socket.remoteAddress,
      forwarded:
        request.get("X-Forwarded-For") !== undefined ||
        request.get("Forwarded") !== undefined,
      authorization: request.get("Authorization"),
      behindProxy: behindTrustedProxy(),
    },
    process.env.METRICS_TOKEN || undefined,
  );
  if (!allowed) {
    response.status(404).type("text/plain; charset=utf-8").send("Not found.\n");
    return;
  }
  try {
    const text = await metricsText();
    response.status(200).type(metricsContentType).send(text);
  } catch (error) {
    next(error);
  }
}

/**
 * The last resort: an error no route handled (React Router's handler itself
 * failed). Logged once with its stack; the answer is a plain 500 page with the
 * request's reference for the person to quote.
 */
export function answerUnexpectedErrors(
  error: unknown,
  _request: ExpressRequest,
  response: ExpressResponse,
  next: NextFunction,
) {
  logServerError(error, "the request failed");
  if (response.headersSent) return next(error);
  response
    .status(500)
    .type("text/plain; charset=utf-8")
    .send(unexpectedErrorText(response.locals.requestId as string | undefined));
}

/**
 * The app's server build as it is served: loaders and actions answer outages and
 * unexpected errors, and the API's JSON answers carry their length.
 */
function appBuild(): Promise<ServerBuild> {
  return serverBuild()
    .then(answerDatabaseOutages)
    .then(referenceUnexpectedErrors)
    .then(sizeJsonAnswers);
}

function loadContext(request: ExpressRequest, response: ExpressResponse) {
  return {
    clientAddress: request.ip ?? request.socket.remoteAddress ?? "unknown",
    cspNonce: String(response.locals.cspNonce),
  };
}

/**
 * React Router's request handler. Given the build as a function, React Router derives
 * its route tables from it again on every request (flattening and ranking every route),
 * which Vite's dev server needs as files change; a built app never changes, so it gets
 * the build itself and React Router derives them once.
 */
function reactRouterHandler(): RequestHandler {
  if (servedByViteDevServer)
    return createRequestHandler({
      build: appBuild,
      getLoadContext: loadContext,
    });
  let handler: Promise<RequestHandler> | undefined;
  return (request, response, next) => {
    handler ??= appBuild().then((build) =>
      createRequestHandler({ build, getLoadContext: loadContext }),
    );
    handler.then((handle) => handle(request, response, next), next);
  };
}

export const app = express();

app.disable("x-powered-by");
if (process.env.TRUST_PROXY) {
  // e.g. TRUST_PROXY=1 behind one load balancer; see README "Scaling out".
  const hops = Number(process.env.TRUST_PROXY);
  app.set("trust proxy", Number.isNaN(hops) ? process.env.TRUST_PROXY : hops);
}
app.use(observeRequests);
app.use(securityHeaders);
app.use(noStoreByDefault);
app.use(refuseOddRequests);
app.use(refuseUnknownHosts);
app.use(compression());
app.use(answerMetrics);

// Server-Timing: how long the app took for each answer (read by `npm run bench` and browsers' dev tools).
app.use((_request, response, next) => {
  const started = process.hrtime.bigint();
  beforeHeadersGoOut(response, (answer) => {
    const milliseconds = Number(process.hrtime.bigint() - started) / 1e6;
    answer.setHeader("Server-Timing", `app;dur=${milliseconds.toFixed(3)}`);
  });
  next();
});

app.use(refuseCrossSiteRequests);
app.use(limitRequestBodies);

app.use((_request, response, next) => {
  response.locals.routeLabel = routedByReactRouter;
  next();
});
app.use(reactRouterHandler());
app.use(answerUnexpectedErrors);
