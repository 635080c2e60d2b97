import { eq } from "drizzle-orm";
import { db } from "~/db/client.server";
import { userRoles } from "~/db/schema";
import type { Role } from "~/lib/roles";
import { userFromApiToken } from "./api-tokens.server";
import { lucia } from "./lucia.server";

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  roles: Role[];
}

interface SessionState {
  user: SessionUser | null;
  /** Set-Cookie to send back when lucia extended or ended the session. */
  setCookie: string | null;
}

const stateByRequest = new WeakMap<Request, Promise<SessionState>>();

function bearerToken(request: Request): string | null {
  const header = request.headers.get("Authorization");
  const match = header?.match(/^Bearer\s+(\S+)$/i);
  return match?.[1] ?? null;
}

async function readSession(request: Request): Promise<SessionState> {
  const token = bearerToken(request);
  if (token && new URL(request.url).pathname.startsWith("/api/")) {
    // Scripts and tools: a personal API token stands in for the session cookie.
    return { user: await userFromApiToken(token), setCookie: null };
  }
  const sessionId = lucia.readSessionCookie(
    request.headers.get("Cookie") ?? "",
  );
  if (!sessionId) return { user: null, setCookie: null };
  const { session, user } = await lucia.validateSession(sessionId);
  if (!session || !user) {
    return {
      user: null,
      setCookie: lucia.createBlankSessionCookie().serialize(),
    };
  }
  if (!user.active) {
    // Deactivation ends sessions at once; this is the belt to that brace.
    await lucia.invalidateUserSessions(user.id);
    return {
      user: null,
      setCookie: lucia.createBlankSessionCookie().serialize(),
    };
  }
  const roleRows = await db
    .select({ role: userRoles.role })
    .from(userRoles)
    .where(eq(userRoles.userId, user.id));
  return {
    user: {
      id: user.id,
      email: user.email,
      name: user.name,
      roles: roleRows.map((row) => row.role),
    },
    setCookie: session.fresh
      ? lucia.createSessionCookie(session.id).serialize()
      : null,
  };
}

/** The signed-in user of this request (validated once per request), or null. */
export function getSessionState(request: Request): Promise<SessionState> {
  let state = stateByRequest.get(request);
  if (!state) {
    state = readSession(request);
    stateByRequest.set(request, state);
  }
  return state;
}

/** Starts a session for the user; returns the Set-Cookie header value. */
export async function startSession(userId: string): Promise<string> {
  const session = await lucia.createSession(userId, {});
  return lucia.createSessionCookie(session.id).serialize();
}

/** Ends the request's session; returns the Set-Cookie header value that clears it. */
export async function endSession(request: Request): Promise<string> {
  const sessionId = lucia.readSessionCookie(
    request.headers.get("Cookie") ?? "",
  );
  if (sessionId) await lucia.invalidateSession(sessionId);
  return lucia.createBlankSessionCookie().serialize();
}

/** Ends every session of a user (deactivation, password change). */
export function endAllSessions(userId: string): Promise<void> {
  return lucia.invalidateUserSessions(userId);
}
