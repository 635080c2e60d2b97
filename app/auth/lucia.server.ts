import { Lucia, TimeSpan } from "lucia";
import { db } from "~/db/client.server";
import type { Role } from "~/lib/roles";
import { SessionAdapter } from "./session-adapter.server";

const adapter = new SessionAdapter(db);

/** Session cookies are Secure in production and behind an https:// APP_URL, unless COOKIE_SECURE=0 (plain-HTTP test rigs). */
export function cookieIsSecure(): boolean {
  if (process.env.COOKIE_SECURE !== undefined)
    return process.env.COOKIE_SECURE !== "0";
  return (
    process.env.NODE_ENV === "production" ||
    process.env.APP_URL?.trim().startsWith("https://") === true
  );
}

/**
 * A session ends after 14 days unused (extended when used), and 30 days after
 * sign-in however much it is used (app/auth/session.server.ts).
 */
export const sessionAbsoluteLifetimeMs = 30 * 24 * 60 * 60 * 1000;

export const lucia = new Lucia(adapter, {
  sessionExpiresIn: new TimeSpan(14, "d"),
  sessionCookie: {
    name: "turnledger_session",
    attributes: { secure: cookieIsSecure(), sameSite: "lax", path: "/" },
  },
  getSessionAttributes(attributes) {
    return { startedAt: attributes.startedAt };
  },
  getUserAttributes(attributes) {
    return {
      email: attributes.email,
      name: attributes.name,
      active: attributes.active,
      locale: attributes.locale,
      timeZone: attributes.timeZone,
      roles: attributes.roles,
    };
  },
});

declare module "lucia" {
  interface Register {
    Lucia: typeof lucia;
    DatabaseUserAttributes: {
      email: string;
      name: string;
      active: boolean;
      locale: string | null;
      timeZone: string | null;
      /** Read with the session in the same query (./session-adapter.server.ts). */
      roles: Role[];
    };
    DatabaseSessionAttributes: { startedAt: Date };
  }
}
