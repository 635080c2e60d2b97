/** Talking to the running test app over HTTP, as a browser or script would. */
import { createHash, randomBytes } from "node:crypto";
import { inject } from "vitest";
import type { Role } from "~/lib/roles";
import { alertPreferences, apiTokens } from "~/db/schema";
import { createPerson, testDb } from "./test-database";

export const baseUrl = () => inject("baseUrl");

/** A fresh address for each test, so tests never share people or throttle counts. */
export function uniqueEmail(label: string): string {
  return `${label}-${randomBytes(5).toString("hex")}@example.test`;
}

/** The name=value part of a Set-Cookie header for the session cookie. */
export function sessionCookieFrom(response: Response): string | null {
  for (const header of response.headers.getSetCookie()) {
    const [pair] = header.split(";");
    if (pair?.startsWith("turnledger_session=")) return pair;
  }
  return null;
}

export function get(path: string, cookie?: string): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, {
    redirect: "manual",
    headers: cookie ? { Cookie: cookie } : {},
  });
}

/** Posts an HTML form the way a browser without JavaScript does. */
export function postForm(
  path: string,
  fields: Record<string, string | string[]>,
  cookie?: string,
): Promise<Response> {
  const body = new URLSearchParams();
  for (const [name, value] of Object.entries(fields)) {
    for (const item of Array.isArray(value) ? value : [value])
      body.append(name, item);
  }
  return fetch(`${baseUrl()}${path}`, {
    method: "POST",
    redirect: "manual",
    headers: {
      "Content-Type": "application/x-www-form-urlencoded",
      Origin: baseUrl(),
      ...(cookie ? { Cookie: cookie } : {}),
    },
    body,
  });
}

export function sendJson(
  method: string,
  path: string,
  payload: unknown,
  cookie?: string,
): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, {
    method,
    redirect: "manual",
    headers: {
      "Content-Type": "application/json",
      Origin: baseUrl(),
      ...(cookie ? { Cookie: cookie } : {}),
    },
    body: payload === undefined ? undefined : JSON.stringify(payload),
  });
}

/** Signs in through the API and returns the session cookie; fails the test otherwise. */
export async function signIn(email: string, password: string): Promise<string> {
  const response = await sendJson("POST", "/api/v1/sessions", {
    email,
    password,
  });
  const cookie = sessionCookieFrom(response);
  if (response.status !== 200 || !cookie) {
    throw new Error(
      `sign-in as ${email} failed: ${response.status} ${await response.text()}`,
    );
  }
  return cookie;
}

/** A person a test made for itself: how they sign in, and their id. */
export type TestPerson = {
  id: string;
  email: string;
  password: string;
  name: string;
};

/**
 * Makes a fresh active person holding `role` (and no other), so no two tests
 * share one. A buyer made here hears of no low-stock alert (alert mode
 * "none"): otherwise every alert of every later test would e-mail every buyer
 * made before it. Tests about alert e-mail choose their recipients themselves.
 */
export async function newPerson(
  role: Role,
  name = `Test ${role}`,
): Promise<TestPerson> {
  const email = uniqueEmail(role);
  const password = `pw-${randomBytes(9).toString("base64url")}`;
  const id = await createPerson({ email, password, roles: [role], name });
  if (role === "buyer")
    await testDb()
      .insert(alertPreferences)
      .values({ userId: id, mode: "none" });
  return { id, email, password, name };
}

/** Makes a fresh person holding `role` (newPerson) and signs them in through the API: the session cookie. */
export async function signInAs(role: Role): Promise<string> {
  const person = await newPerson(role);
  return signIn(person.email, person.password);
}

/** The name=value part of a Set-Cookie header for the one-time message cookie. */
export function flashCookieFrom(response: Response): string | null {
  for (const header of response.headers.getSetCookie()) {
    const [pair] = header.split(";");
    if (pair?.startsWith("turnledger_flash=")) return pair;
  }
  return null;
}

/** Follows a redirect as a browser does: to its Location, with the cookies it set (the one-time message). */
export function followRedirect(
  response: Response,
  cookie?: string,
): Promise<Response> {
  const location = response.headers.get("location");
  if (!location) throw new Error(`no redirect: ${response.status}`);
  const flash = flashCookieFrom(response);
  const cookies = [cookie, flash].filter(Boolean).join("; ");
  return get(location, cookies || undefined);
}

/**
 * A fresh person holding `role` and a personal API token of theirs that follows their
 * roles, stored as the account page stores one (hashed): the Authorization header's value.
 */
export async function bearerTokenAs(role: Role): Promise<string> {
  const person = await newPerson(role);
  const token = `tl_${randomBytes(32).toString("base64url")}`;
  await testDb()
    .insert(apiTokens)
    .values({
      userId: person.id,
      name: `Test token of a ${role}`,
      // As app/auth/email-tokens.server.ts hashes it (that module opens the app's pool).
      tokenHash: createHash("sha256").update(token).digest("hex"),
      tokenPrefix: token.slice(0, 10),
      roles: "*",
      expiresAt: null,
    });
  return `Bearer ${token}`;
}

/** Sends a JSON request with a bearer token (no cookie, no Origin: as a script would). */
export function sendWithToken(
  method: string,
  path: string,
  authorization: string,
  payload?: unknown,
): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, {
    method,
    redirect: "manual",
    headers: {
      Authorization: authorization,
      ...(payload === undefined ? {} : { "Content-Type": "application/json" }),
    },
    body: payload === undefined ? undefined : JSON.stringify(payload),
  });
}
