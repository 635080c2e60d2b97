/**
 * Signing in and out, who is signed in, the outbox and the contract itself answer as the
 * contract says (docs/decisions/046): each status one the operation documents, each body
 * matching its schema, and the session cookie in the documented Set-Cookie header.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  bearerTokenAs,
  newPerson,
  postForm,
  sendJson,
  sendWithToken,
  sessionCookieFrom,
} from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import { closeTestDatabase } from "../support/test-database";

const sessions = "/api/v1/sessions";
let admin = "";
let manager = "";

beforeAll(async () => {
  admin = await bearerTokenAs("admin");
  manager = await bearerTokenAs("manager");
});
afterAll(closeTestDatabase);

describe("signing in and out against the contract", () => {
  it("signs in with the session cookie in Set-Cookie, then signs out with 204", async () => {
    const person = await newPerson("builder");
    const signedIn = await sendJson("POST", sessions, {
      email: person.email,
      password: person.password,
    });
    expect(signedIn.status).toBe(200);
    const cookie = sessionCookieFrom(signedIn);
    expect(cookie).toMatch(/^turnledger_session=.+/);
    expect(await expectConforming(signedIn, "POST", sessions)).toEqual({
      user: { email: person.email, name: person.name, roles: ["builder"] },
    });

    const me = await fetch(`${baseUrl()}/api/v1/me`, {
      headers: { Cookie: cookie! },
    });
    expect(me.status).toBe(200);
    await expectConforming(me, "GET", "/api/v1/me");

    const signedOut = await sendJson("DELETE", sessions, undefined, cookie!);
    expect(signedOut.status).toBe(204);
    expect(signedOut.headers.get("Set-Cookie")).toMatch(
      /^turnledger_session=;/,
    );
    await expectConforming(signedOut, "DELETE", sessions);

    const afterwards = await fetch(`${baseUrl()}/api/v1/me`, {
      headers: { Cookie: cookie! },
    });
    expect(afterwards.status).toBe(401);
    await expectConforming(afterwards, "GET", "/api/v1/me");
  });

  it("refuses a bad body (400), wrong credentials (401), another site (403) and, after five wrong passwords, pauses (429)", async () => {
    const person = await newPerson("manager");
    const bad = await sendJson("POST", sessions, { email: "not an address" });
    expect(bad.status).toBe(400);
    await expectConforming(bad, "POST", sessions);

    const crossSite = await fetch(`${baseUrl()}${sessions}`, {
      method: "POST",
      headers: {
        "Content-Type": "application/json",
        Origin: "https://elsewhere.example",
      },
      body: JSON.stringify({ email: person.email, password: person.password }),
    });
    expect(crossSite.status).toBe(403);
    await expectConforming(crossSite, "POST", sessions);

    for (let attempt = 1; attempt <= 5; attempt += 1) {
      const wrong = await sendJson("POST", sessions, {
        email: person.email,
        password: `${person.password}-not`,
      });
      expect(wrong.status, `attempt ${attempt}`).toBe(401);
      await expectConforming(wrong, "POST", sessions);
    }
    const paused = await sendJson("POST", sessions, {
      email: person.email,
      password: person.password,
    });
    expect(paused.status).toBe(429);
    expect(paused.headers.get("Retry-After")).toMatch(/^\d+$/);
    await expectConforming(paused, "POST", sessions);
  });
});

describe("who is signed in, the outbox and the document against the contract", () => {
  it("answers the signed-in person to a bearer token, and 401 to no one", async () => {
    const me = await sendWithToken("GET", "/api/v1/me", manager);
    expect(me.status).toBe(200);
    expect(await expectConforming(me, "GET", "/api/v1/me")).toMatchObject({
      user: { roles: ["manager"] },
    });
  });

  it("lists the outbox for an admin, refuses other roles (403) and a bad limit (400)", async () => {
    // A password reset puts a message (its one-time link hidden) in the outbox.
    const person = await newPerson("builder");
    expect(
      (await postForm("/forgot-password", { email: person.email })).status,
    ).toBe(200);
    let messages: { to: string }[] = [];
    for (let look = 0; look < 20; look += 1) {
      const outbox = await sendWithToken(
        "GET",
        "/api/v1/outbox?limit=50",
        admin,
      );
      expect(outbox.status).toBe(200);
      messages = (await expectConforming(outbox, "GET", "/api/v1/outbox")) as {
        to: string;
      }[];
      if (messages.some((message) => message.to === person.email)) break;
      await new Promise((resolve) => setTimeout(resolve, 250));
    }
    expect(messages.map((message) => message.to)).toContain(person.email);

    const role = await sendWithToken("GET", "/api/v1/outbox", manager);
    expect(role.status).toBe(403);
    await expectConforming(role, "GET", "/api/v1/outbox");

    const badLimit = await sendWithToken(
      "GET",
      "/api/v1/outbox?limit=0",
      admin,
    );
    expect(badLimit.status).toBe(400);
    await expectConforming(badLimit, "GET", "/api/v1/outbox");
  });

  it("serves the document itself", async () => {
    const document = await sendWithToken(
      "GET",
      "/api/v1/openapi.json",
      manager,
    );
    expect(document.status).toBe(200);
    expect(
      await expectConforming(document, "GET", "/api/v1/openapi.json"),
    ).toMatchObject({ openapi: "3.1.0" });
  });
});
