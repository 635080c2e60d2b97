import { useEffect } from "react";
import {
  isRouteErrorResponse,
  Links,
  Meta,
  Outlet,
  Scripts,
  ScrollRestoration,
  useRevalidator,
} from "react-router";
import { z } from "zod";
import { referenceOf } from "./observability/error-reference";
import type { Route } from "./+types/root";
import "./app.css";

// Under the Content-Security-Policy (no 'unsafe-eval', docs/decisions/012) Zod's
// probe for `new Function` is reported by browsers as a violation although Zod
// catches it. Routes are imported after this module, so their schemas never probe.
if (typeof document !== "undefined") z.config({ jitless: true });

export function Layout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <link rel="icon" href="/favicon.svg" type="image/svg+xml" />
        <Meta />
        {/* Stylesheets need no nonce (style-src 'self'), and browsers hide a nonce
            from the page, so one here would not match the client's render. */}
        <Links nonce="" />
      </head>
      <body className="min-h-screen">
        {children}
        <ScrollRestoration />
        <Scripts />
      </body>
    </html>
  );
}

export default function App() {
  return <Outlet />;
}

/** While the database is down, look again every few seconds and recover by ourselves. */
function RetryWhileUnavailable() {
  const revalidator = useRevalidator();
  useEffect(() => {
    const timer = setInterval(() => {
      if (revalidator.state === "idle") revalidator.revalidate();
    }, 5_000);
    return () => clearInterval(timer);
  }, [revalidator]);
  return null;
}

function messageOf(data: unknown): string | null {
  if (data && typeof data === "object" && "message" in data) {
    const message = (data as { message: unknown }).message;
    return typeof message === "string" ? message : null;
  }
  return typeof data === "string" && data ? data : null;
}

function titleOf(data: unknown): string | null {
  if (data && typeof data === "object" && "title" in data) {
    const title = (data as { title: unknown }).title;
    return typeof title === "string" ? title : null;
  }
  return null;
}

export function ErrorBoundary({ error }: Route.ErrorBoundaryProps) {
  let status = 500;
  let title = "Something went wrong";
  let detail =
    "The error has been logged. Try again, and tell an admin if it keeps happening.";
  let stack: string | undefined;
  // The failed request's id (server/unexpected-errors.ts), for the person to quote.
  let reference: string | null = null;

  if (isRouteErrorResponse(error)) {
    status = error.status;
    reference = referenceOf(error.data);
    const message = messageOf(error.data);
    if (status === 404) {
      title = "Page not found";
      detail = message ?? "There is nothing at this address.";
    } else if (status === 403) {
      title = "Not allowed";
      detail =
        message ?? "Your roles do not allow this. Ask an admin if you need it.";
    } else if (status === 413) {
      // Answered before React Router by server/request-size-limits.ts.
      title = "Too much sent";
      detail = message ?? "The form is larger than Turnledger takes.";
    } else if (status === 503) {
      // "Database busy" from a write that lost to other writers (server/database-unavailable.ts).
      title = titleOf(error.data) ?? "Database unavailable";
      detail =
        message ??
        "Turnledger cannot reach its database. This page will load again by itself.";
    } else if (message) {
      detail = message;
    }
  } else if (import.meta.env.DEV && error instanceof Error) {
    detail = error.message;
    stack = error.stack;
  }

  return (
    <main className="mx-auto max-w-xl px-6 py-20">
      <p className="text-sm font-semibold tracking-wide text-copper-600">
        Error {status}
      </p>
      <h1 className="mt-2 text-3xl font-semibold text-graphite-900">{title}</h1>
      <p className="mt-4 text-graphite-700">{detail}</p>
      {reference ? (
        <p className="mt-4 text-sm text-graphite-700">
          Reference: <code className="font-mono">{reference}</code>
        </p>
      ) : null}
      {status === 503 ? <RetryWhileUnavailable /> : null}
      <p className="mt-8">
        <a className="button-quiet" href="/">
          Back to the start page
        </a>
      </p>
      {stack ? (
        <pre className="mt-8 overflow-x-auto rounded bg-graphite-100 p-4 text-xs">
          {stack}
        </pre>
      ) : null}
    </main>
  );
}
