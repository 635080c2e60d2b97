/**
 * One place that turns "the database went away" into 503 for every route.
 *
 * The guard already answers 503 when the database is down before a request
 * starts (its first query is the session check). This covers the rest: the
 * database lost in the middle of a loader or action, after the guard. Every
 * route module's `loader` and `action` in the server build is wrapped; an
 * error that `isDatabaseUnavailable` recognises (the transaction it ended has
 * been rolled back by MariaDB) is thrown again as
 *
 * - `/api/…` and other resource routes: a JSON 503
 *   `{ error: { message: "The database is unavailable. Try again in a moment." } }`;
 * - pages: a 503 route error, which `app/root.tsx`'s error boundary shows as
 *   "Database unavailable" (and which looks again every few seconds).
 *
 * A write transaction that lost to other writers on every attempt
 * (`DatabaseBusyError` from app/db/write-transaction.server.ts, decision 027) is
 * answered the same way with "The database is busy with other changes. Try again
 * in a moment." and the error page's title "Database busy".
 *
 * Every other error passes through untouched. React Router's own hooks cannot
 * do this: `handleError` only logs, and without middleware nothing else sees a
 * loader's error before it becomes a 500. See
 * docs/decisions/013-database-and-mail-faults.md.
 *
 * Hook (server/app.ts):
 *   build: () => import("virtual:react-router/server-build").then(answerDatabaseOutages),
 */
import { data } from "react-router";
import { wrapRouteHandlers, type RouteHandler } from "./route-handler-wrapping";
import {
  databaseUnavailableMessage,
  isDatabaseUnavailable,
  unavailableReason,
} from "~/db/database-errors";
import { areaLogger } from "~/observability/logger.server";
import {
  databaseBusyMessage,
  databaseBusyRetryAfterSeconds,
  isDatabaseBusy,
} from "~/db/write-conflicts";

const dbLog = areaLogger("db");

type Handler = RouteHandler;

const headers = { "Retry-After": "5", "Cache-Control": "no-store" };

/** What a request gets when the database was lost while answering it. */
export function databaseUnavailableError(
  request: Request,
  resourceRoute: boolean,
): unknown {
  const { pathname } = new URL(request.url);
  if (resourceRoute || pathname.startsWith("/api/")) {
    return Response.json(
      { error: { message: databaseUnavailableMessage } },
      { status: 503, headers },
    );
  }
  return data(
    { message: databaseUnavailableMessage },
    { status: 503, headers },
  );
}

/** What a request gets when its write transaction lost to other writers on every attempt. */
export function databaseBusyError(
  request: Request,
  resourceRoute: boolean,
): unknown {
  const { pathname } = new URL(request.url);
  const busyHeaders = {
    "Retry-After": String(databaseBusyRetryAfterSeconds),
    "Cache-Control": "no-store",
  };
  if (resourceRoute || pathname.startsWith("/api/")) {
    return Response.json(
      { error: { message: databaseBusyMessage } },
      { status: 503, headers: busyHeaders },
    );
  }
  return data(
    { message: databaseBusyMessage, title: "Database busy" },
    { status: 503, headers: busyHeaders },
  );
}

function answering503(handler: Handler, resourceRoute: boolean): Handler {
  return async (args) => {
    try {
      return await handler(args);
    } catch (error) {
      if (isDatabaseBusy(error)) {
        dbLog.warn(
          {
            method: args.request.method,
            attempts: error.attempts,
            reason: error.reason,
          },
          "database busy: a write lost to other writers on every attempt",
        );
        throw databaseBusyError(args.request, resourceRoute);
      }
      // Responses and route errors (redirects, 4xx, the guard's own 503) carry no code.
      if (!isDatabaseUnavailable(error)) throw error;
      // The request's log line (same requestId) names the route; never the URL.
      dbLog.warn(
        { method: args.request.method, reason: unavailableReason(error) },
        "database unavailable during a request",
      );
      throw databaseUnavailableError(args.request, resourceRoute);
    }
  };
}

/** The server build with every loader and action answering 503 when the database is lost. */
export const answerDatabaseOutages = wrapRouteHandlers(
  (handler, { resourceRoute }) => answering503(handler, resourceRoute),
);
