import { eq } from "drizzle-orm";
import { generateIdFromEntropySize } from "lucia";
import { db } from "~/db/client.server";
import { retryWriteConflicts } from "~/db/write-transaction.server";
import { sessions } from "~/db/schema";
import type { Role } from "~/lib/roles";
import { userFromApiToken } from "./api-tokens.server";
import { hashToken } from "./email-tokens.server";
import { lucia, sessionAbsoluteLifetimeMs } from "./lucia.server";

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  roles: Role[];
  /** The chosen locale and time zone (app/lib/display-settings.ts); null until chosen. */
  locale: string | null;
  timeZone: string | null;
}

interface SessionState {
  user: SessionUser | null;
  /** Set-Cookie to send back when lucia extended or ended the session. */
  setCookie: string | null;
}

const stateByRequest = new WeakMap<Request, Promise<SessionState>>();

/**
 * The cookie carries a random token; lucia's sessions table keys the session by
 * the token's SHA-256 only. Whoever reads the table (a backup, a copy, a leaked
 * query) learns no cookie that signs anyone in, and a stored id sent back as a
 * cookie is hashed again and found nowhere.
 */
function sessionIdOf(token: string): string {
  return hashToken(token);
}

/** 200 random bits, base32: what lucia itself makes a session id from. */
function newSessionToken(): string {
  return generateIdFromEntropySize(25);
}

function sessionTokenFrom(request: Request): string | null {
  return lucia.readSessionCookie(request.headers.get("Cookie") ?? "");
}

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
  const sessionToken = sessionTokenFrom(request);
  if (!sessionToken) return { user: null, setCookie: null };
  const { session, user } = await lucia.validateSession(
    sessionIdOf(sessionToken),
  );
  if (!session || !user) {
    return {
      user: null,
      setCookie: lucia.createBlankSessionCookie().serialize(),
    };
  }
  const absoluteEnd = session.startedAt.getTime() + sessionAbsoluteLifetimeMs;
  if (absoluteEnd <= Date.now()) {
    // 30 days after sign-in the session ends, however often it was extended.
    await lucia.invalidateSession(session.id);
    return {
      user: null,
      setCookie: lucia.createBlankSessionCookie().serialize(),
    };
  }
  if (session.fresh && session.expiresAt.getTime() > absoluteEnd) {
    // Extended by lucia just now: no further than the absolute end.
    await retryWriteConflicts(
      () =>
        db
          .update(sessions)
          .set({ expiresAt: new Date(absoluteEnd) })
          .where(eq(sessions.id, session.id)),
      { label: "session end" },
    );
  }
  if (!user.active) {
    // Deactivation ends sessions at once; this is the belt to that brace.
    await lucia.invalidateUserSessions(user.id);
    return {
      user: null,
      setCookie: lucia.createBlankSessionCookie().serialize(),
    };
  }
  return {
    user: {
      id: user.id,
      email: user.email,
      name: user.name,
      roles: user.roles,
      locale: user.locale,
      timeZone: user.timeZone,
    },
    // Extended: the same token again, with the new expiry (session.id is its hash).
    setCookie: session.fresh
      ? lucia.createSessionCookie(sessionToken).serialize()
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
  const sessionToken = newSessionToken();
  await lucia.createSession(
    userId,
    { startedAt: new Date() },
    { sessionId: sessionIdOf(sessionToken) },
  );
  return lucia.createSessionCookie(sessionToken).serialize();
}

/** Ends the request's session; returns the Set-Cookie header value that clears it. */
export async function endSession(request: Request): Promise<string> {
  const sessionToken = sessionTokenFrom(request);
  if (sessionToken) await lucia.invalidateSession(sessionIdOf(sessionToken));
  return lucia.createBlankSessionCookie().serialize();
}

/** Ends every session of a user (deactivation, role change, password change). */
export function endAllSessions(userId: string): Promise<void> {
  return lucia.invalidateUserSessions(userId);
}
