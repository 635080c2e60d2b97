/**
 * The one guard module. Every loader, action and API route calls
 * requireUser or requireCapability first; hiding a control in the UI is not a check.
 * Who has which capability is the one table in app/lib/capabilities.ts.
 * Pages get a redirect to sign-in or a 403 page; API routes (/api/…) get JSON.
 */
import { data, redirect } from "react-router";
import { isDatabaseUnavailable } from "~/db/database-errors";
import { needsRoleMessage, userCan, type Capability } from "~/lib/capabilities";
import { displaySettingsOf } from "~/lib/display-settings";
import "~/lib/display-settings.server";
import {
  noteDisplaySettings,
  noteSignedInPerson,
} from "~/observability/request-context.server";
import { getSessionState, type SessionUser } from "./session.server";

function isApiRequest(request: Request): boolean {
  return new URL(request.url).pathname.startsWith("/api/");
}

export function databaseUnavailable(request: Request): never {
  const message = "The database is unavailable. Try again in a moment.";
  if (isApiRequest(request)) {
    throw Response.json(
      { error: { message } },
      { status: 503, headers: { "Retry-After": "5" } },
    );
  }
  throw data({ message }, { status: 503, headers: { "Retry-After": "5" } });
}

/** The signed-in user, or null; turns a database outage into a 503. */
export async function getOptionalUser(
  request: Request,
): Promise<SessionUser | null> {
  try {
    const { user } = await getSessionState(request);
    // The request's log line names who it was for (docs/decisions/024).
    if (user) noteSignedInPerson(user.id);
    // Pages follow the person's locale and time zone; the API stays machine-neutral.
    if (user && !isApiRequest(request))
      noteDisplaySettings(displaySettingsOf(user));
    return user;
  } catch (error) {
    if (isDatabaseUnavailable(error)) databaseUnavailable(request);
    throw error;
  }
}

/** The signed-in user; otherwise a redirect to sign-in (pages) or 401 (API). */
export async function requireUser(request: Request): Promise<SessionUser> {
  const user = await getOptionalUser(request);
  if (user) return user;
  // A session that ended (expired, 30 days old, deactivated) clears its cookie.
  const { setCookie } = await getSessionState(request);
  const headers = setCookie ? { "Set-Cookie": setCookie } : undefined;
  if (isApiRequest(request)) {
    throw Response.json(
      {
        error: {
          message: "Sign in first: send the session cookie or a bearer token.",
        },
      },
      { status: 401, headers },
    );
  }
  const url = new URL(request.url);
  const back = `${url.pathname}${url.search}`;
  const target =
    back === "/"
      ? "/sign-in"
      : `/sign-in?redirectTo=${encodeURIComponent(back)}`;
  throw redirect(target, { headers });
}

/** The signed-in user when they have the capability (admins have all); else 403. */
export async function requireCapability(
  request: Request,
  capability: Capability,
): Promise<SessionUser> {
  const user = await requireUser(request);
  refuseUnless(request, user, capability);
  return user;
}

/**
 * For a step inside a loader or action that already has its signed-in user:
 * nothing when the user has the capability, else the 403 requireCapability
 * answers (a 403 page, or JSON under /api/), saying `message`.
 */
export function refuseUnless(
  request: Request,
  user: SessionUser,
  capability: Capability,
  message = needsRoleMessage(capability),
): void {
  if (userCan(user, capability)) return;
  if (isApiRequest(request)) {
    throw Response.json({ error: { message } }, { status: 403 });
  }
  throw data({ message }, { status: 403 });
}
