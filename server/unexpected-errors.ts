/**
 * A page's loader or action that fails unexpectedly (a bug, not a refusal or
 * an outage) answers a 500 route error that carries the request id, so the
 * error page (app/root.tsx) can show "Reference: …" for the request that
 * failed — also for a data request after a click, whose id the page could
 * not know otherwise. The error is logged once, with its stack, here.
 *
 * Left alone: Responses and route errors (redirects, 4xx, the 503s of
 * server/database-unavailable.ts), resource routes (their callers read the
 * X-Request-Id header; React Router's handleError logs them), aborted
 * requests, and everything under Vite's dev server, whose error page shows
 * the error's own message and stack instead.
 *
 * Hook (server/app.ts), outside answerDatabaseOutages:
 *   build: () => import(…).then(answerDatabaseOutages).then(referenceUnexpectedErrors),
 */
import { data, isRouteErrorResponse, type ServerBuild } from "react-router";
import { unexpectedErrorMessage } from "~/observability/error-reference";
import { logServerError } from "~/observability/logger.server";
import { currentRequest } from "~/observability/request-context.server";
import { wrapRouteHandlers, type RouteHandler } from "./route-handler-wrapping";

type Handler = RouteHandler;

function isExpectedAnswer(error: unknown): boolean {
  return (
    error instanceof Response ||
    isRouteErrorResponse(error) ||
    (typeof error === "object" &&
      error !== null &&
      (error as { type?: unknown }).type === "DataWithResponseInit")
  );
}

function referencing(handler: Handler, what: string): Handler {
  return async (args) => {
    try {
      return await handler(args);
    } catch (error) {
      if (isExpectedAnswer(error) || args.request.signal.aborted) throw error;
      logServerError(error, `${what} failed`);
      throw data(
        {
          message: unexpectedErrorMessage,
          reference: currentRequest()?.requestId ?? null,
        },
        { status: 500 },
      );
    }
  };
}

const referencingPages = wrapRouteHandlers(
  (handler, { routeId, kind, resourceRoute }) =>
    resourceRoute ? handler : referencing(handler, `${routeId} ${kind}`),
);

/** The server build with every page's loader and action answering a referenced 500 for an unexpected error. */
export function referenceUnexpectedErrors(build: ServerBuild): ServerBuild {
  if (process.env.NODE_ENV === "development") return build;
  return referencingPages(build);
}
