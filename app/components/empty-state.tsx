/**
 * What a list says when it has nothing in it: what is missing and the next step. The
 * step is a link only for people whose roles allow it (the capability table, `userCan`
 * with the signed-in person of the app shell); everyone else reads who can take it.
 * A search or filter that finds nothing is a different state: `clear` offers the way
 * back to the whole list instead of a next step.
 */
import { Link, useRouteLoaderData } from "react-router";
import { type Capability, userCan, whoCanText } from "~/lib/capabilities";
import type { Role } from "~/lib/roles";

export interface EmptyNextStep {
  /** What the step needs. */
  capability: Capability;
  /** Where it is taken: another page, or "#id" for a form on this page. */
  to: string;
  /** The link's words: "Add a supplier". */
  label: string;
  /** For those who cannot: "A buyer or an admin can …" ("add suppliers"). */
  does: string;
}

const linkClass =
  "font-medium text-copper-700 underline underline-offset-2 hover:text-copper-800";

function StepLink({ to, children }: { to: string; children: string }) {
  // A place on this page is a real fragment link: the browser moves the keyboard's
  // starting point to the form, so the next Tab lands in it.
  return to.startsWith("#") ? (
    <a href={to} className={linkClass}>
      {children}
    </a>
  ) : (
    <Link to={to} className={linkClass}>
      {children}
    </Link>
  );
}

export function EmptyState({
  message,
  next,
  clear,
  tone = "plain",
}: {
  /** What is missing: "No suppliers yet." */
  message: string;
  next?: EmptyNextStep;
  /** A search or filter found nothing: the list without them. */
  clear?: { to: string; label?: string };
  /** "good": nothing here is good news (no alerts). */
  tone?: "plain" | "good";
}) {
  // The signed-in person the app shell loaded (its loader's type sits in routes/, which
  // components may not import: only the roles are read).
  const shell = useRouteLoaderData("routes/app-shell") as
    | { user?: { roles: readonly Role[] } }
    | undefined;
  const user = shell?.user;
  return (
    <div
      className="empty-state space-y-1 py-2 text-center text-sm"
      data-empty-state
    >
      <p
        className={
          tone === "good"
            ? "font-medium text-ok"
            : "font-medium text-graphite-700"
        }
      >
        {message}
      </p>
      {next ? (
        userCan(user, next.capability) ? (
          <p>
            <StepLink to={next.to}>{next.label}</StepLink>
          </p>
        ) : (
          <p className="text-graphite-500">
            {whoCanText(next.capability)} can {next.does}.
          </p>
        )
      ) : null}
      {clear ? (
        <p>
          <Link to={clear.to} className={linkClass}>
            {clear.label ?? "Clear the search and filters"}
          </Link>
        </p>
      ) : null}
    </div>
  );
}
