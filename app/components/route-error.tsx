/**
 * What a page shows when its loader or action fails (403, 404, 413, 503, anything
 * else): shared by the root's error boundary (errors outside the app shell, or when the
 * shell itself cannot load) and the app shell's (errors of a page inside it, shown under
 * the header and menu).
 */
import { useEffect } from "react";
import { isRouteErrorResponse, useRevalidator } from "react-router";
import { referenceOf } from "~/observability/error-reference";

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

/** The status, heading and words for an error, and what to quote to an admin. */
function describeError(error: unknown) {
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
  return { status, title, detail, stack, reference };
}

/** The error's status, heading, words and way back, without a page around it. */
export function RouteErrorNotice({ error }: { error: unknown }) {
  const { status, title, detail, stack, reference } = describeError(error);
  return (
    <>
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
    </>
  );
}

/** The error as a page of its own, with no header or menu. */
export function RouteErrorPage({ error }: { error: unknown }) {
  return (
    <main className="mx-auto max-w-xl px-6 py-20">
      <RouteErrorNotice error={error} />
    </main>
  );
}
