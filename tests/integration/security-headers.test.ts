/**
 * Security headers on every kind of answer (page, API, CSV download, static
 * file, error page, the cross-site refusal itself), the per-request nonce on
 * every inline script, and the session cookie's attributes. See
 * docs/decisions/012-security-headers-and-origin.md.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
  sendJson,
  uniqueEmail,
  signInAs,
} from "../support/app-client";
import { closeTestDatabase, createPerson } from "../support/test-database";

let manager = "";
beforeAll(async () => {
  manager = await signInAs("manager");
});
afterAll(closeTestDatabase);

/** The directives of a Content-Security-Policy header, by name. */
function directives(policy: string | null): Map<string, string[]> {
  const parsed = new Map<string, string[]>();
  for (const part of (policy ?? "").split(";")) {
    const [name, ...values] = part.trim().split(/\s+/);
    if (name) parsed.set(name.toLowerCase(), values);
  }
  return parsed;
}

/** Checks the headers every answer must carry; returns the CSP nonce. */
function expectSecurityHeaders(response: Response): string {
  const headers = response.headers;
  expect(headers.get("X-Content-Type-Options")).toBe("nosniff");
  expect(headers.get("Referrer-Policy")).toBe("same-origin");
  expect(headers.get("X-Frame-Options")).toBe("DENY");
  const policy = directives(headers.get("Content-Security-Policy"));
  const scripts = policy.get("script-src") ?? [];
  expect(scripts).toContain("'self'");
  expect(scripts).not.toContain("'unsafe-inline'");
  expect(scripts).not.toContain("'unsafe-eval'");
  expect(scripts.filter((source) => source.startsWith("'nonce-"))).toHaveLength(
    1,
  );
  expect(policy.get("default-src")).toEqual(["'self'"]);
  expect(policy.get("frame-ancestors")).toEqual(["'none'"]);
  expect(policy.get("object-src")).toEqual(["'none'"]);
  expect(policy.get("base-uri")).toEqual(["'self'"]);
  expect(policy.get("form-action")).toEqual(["'self'"]);
  // No wildcard or other host anywhere in the policy.
  for (const [name, values] of policy) {
    for (const value of values)
      expect(`${name} ${value}`).toMatch(
        / ('self'|'none'|'unsafe-inline'|'nonce-[A-Za-z0-9+/=]+'|data:)$/,
      );
  }
  const nonce = scripts.find((source) => source.startsWith("'nonce-"))!;
  return nonce.slice("'nonce-".length, -1);
}

describe("security headers", () => {
  it("are on pages, API answers, CSV downloads, static files and error pages", async () => {
    const html = await get("/", manager);
    expect(html.status).toBe(200);
    const pageText = await html.text();
    expectSecurityHeaders(html);

    const api = await get("/api/v1/me");
    expect(api.status).toBe(401);
    expectSecurityHeaders(api);

    const csv = await get("/stock/export.csv", manager);
    expect(csv.status).toBe(200);
    expect(csv.headers.get("Content-Type")).toMatch(/^text\/csv/);
    expectSecurityHeaders(csv);

    const asset = pageText.match(/\/assets\/[A-Za-z0-9._-]+\.js/)?.[0];
    expect(asset).toBeTruthy();
    const script = await get(asset!);
    expect(script.status).toBe(200);
    expectSecurityHeaders(script);
    const icon = await get("/favicon.svg");
    expect(icon.status).toBe(200);
    expectSecurityHeaders(icon);

    for (const path of ["/no-such-page", "/api/v1/no-such-route"]) {
      const missing = await get(path, manager);
      expect(missing.status).toBe(404);
      expectSecurityHeaders(missing);
    }

    const refused = await fetch(`${baseUrl()}/sign-in`, {
      method: "POST",
      redirect: "manual",
      headers: { Origin: "https://elsewhere.example" },
    });
    expect(refused.status).toBe(403);
    expectSecurityHeaders(refused);
  });

  it("keep a header a route sets itself, once", async () => {
    // The purchase-request CSV sets X-Content-Type-Options itself; 404 here, but the
    // route's own answer must not end up with the header twice.
    const buyer = await signInAs("buyer");
    const answer = await get(
      "/alerts/purchase-request.csv?supplier=Nobody%20at%20all",
      buyer,
    );
    expect(answer.status).toBe(404);
    expect(answer.headers.get("X-Content-Type-Options")).toBe("nosniff");
  });

  it("give each page a fresh nonce, carried by every script in it", async () => {
    const nonces = new Set<string>();
    for (const path of ["/", "/stock", "/designs", "/reference"]) {
      const response = await get(path, manager);
      expect(response.status).toBe(200);
      const nonce = expectSecurityHeaders(response);
      // 16 random bytes, base64.
      expect(Buffer.from(nonce, "base64")).toHaveLength(16);
      nonces.add(nonce);
      const html = await response.text();
      const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map(
        (match) => match[0],
      );
      // React Router's context, the route modules' import and the streamed data.
      expect(scripts.length).toBeGreaterThanOrEqual(2);
      for (const tag of scripts) expect(tag).toContain(` nonce="${nonce}"`);
      // No javascript: links, which the policy would block.
      expect(html).not.toMatch(/(href|action)="javascript:/i);
    }
    expect(nonces.size).toBe(4);
  });

  it("are on the sign-in page for anonymous visitors, with its nonce on its scripts", async () => {
    const response = await get("/sign-in");
    expect(response.status).toBe(200);
    const nonce = expectSecurityHeaders(response);
    const html = await response.text();
    expect(html).toContain(`nonce="${nonce}"`);
    expect(html).not.toMatch(/<script(?![^>]*nonce=)[^>]*>/);
  });
});

describe("the session cookie", () => {
  function attributesOf(setCookie: string): {
    name: string;
    attributes: Map<string, string>;
  } {
    const [pair, ...parts] = setCookie.split(";");
    const attributes = new Map<string, string>();
    for (const part of parts) {
      const [key, ...value] = part.trim().split("=");
      attributes.set(key!.toLowerCase(), value.join("="));
    }
    return { name: pair!.split("=")[0]!, attributes };
  }

  function sessionSetCookie(response: Response): string {
    const header = response.headers
      .getSetCookie()
      .find((value) => value.startsWith("turnledger_session="));
    if (!header) throw new Error("no session cookie was set");
    return header;
  }

  function expectLockedDown(setCookie: string) {
    const { attributes } = attributesOf(setCookie);
    expect(attributes.has("httponly")).toBe(true);
    expect(attributes.get("samesite")?.toLowerCase()).toBe("lax");
    // The test server runs the production build (NODE_ENV=production): Secure.
    expect(attributes.has("secure")).toBe(true);
    expect(attributes.get("path")).toBe("/");
  }

  it("is httpOnly, SameSite=Lax, Secure and for the whole site after an API sign-in", async () => {
    const email = uniqueEmail("cookie-api");
    await createPerson({
      email,
      password: "cookie-password",
      roles: ["buyer"],
    });
    const response = await sendJson("POST", "/api/v1/sessions", {
      email,
      password: "cookie-password",
    });
    expect(response.status).toBe(200);
    const setCookie = sessionSetCookie(response);
    expectLockedDown(setCookie);
    const maxAge = Number(attributesOf(setCookie).attributes.get("max-age"));
    expect(maxAge).toBeGreaterThan(13 * 24 * 3600);
    expect(maxAge).toBeLessThanOrEqual(14 * 24 * 3600);
  });

  it("is httpOnly, SameSite=Lax and Secure after signing in on the page, and when cleared", async () => {
    const email = uniqueEmail("cookie-page");
    await createPerson({
      email,
      password: "cookie-password",
      roles: ["manager"],
    });
    const signedIn = await postForm("/sign-in", {
      email,
      password: "cookie-password",
    });
    expect(signedIn.status).toBe(302);
    const setCookie = sessionSetCookie(signedIn);
    expectLockedDown(setCookie);

    const cookie = setCookie.split(";")[0]!;
    // Signing out is a POST; a GET only goes home and leaves the session alone.
    expect((await get("/sign-out", cookie)).status).toBe(302);
    expect((await get("/api/v1/me", cookie)).status).toBe(200);
    const signedOut = await postForm("/sign-out", {}, cookie);
    expect(signedOut.status).toBe(302);
    const cleared = sessionSetCookie(signedOut);
    expectLockedDown(cleared);
    expect(cleared.split(";")[0]).toBe("turnledger_session=");
    expect((await get("/api/v1/me", cookie)).status).toBe(401);
  });
});
