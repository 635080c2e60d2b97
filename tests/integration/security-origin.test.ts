/**
 * Cross-site requests: a write (anything but GET and HEAD) whose Origin is not
 * the app's own is refused with 403 before any route code runs; a write riding
 * on the session cookie without Origin needs a same-origin Referer; scripts
 * with a bearer token or no credentials go on as before. See
 * docs/decisions/012-security-headers-and-origin.md.
 */
import { spawn } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import {
  baseUrl,
  get,
  newPerson,
  postForm,
  sessionCookieFrom,
  signIn,
  uniqueEmail,
  signInAs,
} from "../support/app-client";
import { rawRequest } from "../support/raw-http";
import {
  closeTestDatabase,
  createPerson,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

const foreign = "https://shop-supplies.example";

let buyer = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
});
afterAll(closeTestDatabase);

/** A request with exactly the headers given: no Origin unless asked for. */
function send(
  method: string,
  pathAndQuery: string,
  options: {
    headers?: Record<string, string>;
    json?: unknown;
    form?: Record<string, string>;
    base?: string;
  } = {},
): Promise<Response> {
  const headers: Record<string, string> = { ...options.headers };
  let body: string | undefined;
  if (options.json !== undefined) {
    headers["Content-Type"] = "application/json";
    body = JSON.stringify(options.json);
  } else if (options.form) {
    headers["Content-Type"] = "application/x-www-form-urlencoded";
    body = new URLSearchParams(options.form).toString();
  }
  return fetch(`${options.base ?? baseUrl()}${pathAndQuery}`, {
    method,
    redirect: "manual",
    headers,
    body,
  });
}

function part(sku: string) {
  return { kind: "part", sku, name: "Bearing 608-2RS", unit: "pcs" };
}

async function itemCount(sku: string): Promise<number> {
  const [rows] = await testDatabase().query(
    "SELECT COUNT(*) AS n FROM items WHERE sku = ?",
    [sku],
  );
  return Number((rows as { n: number }[])[0]!.n);
}

async function expectRefusedAsJson(response: Response) {
  expect(response.status).toBe(403);
  expect(response.headers.get("Content-Type")).toMatch(/^application\/json/);
  const body = (await response.json()) as { error: { message: string } };
  expect(body.error.message).toMatch(/another site|Origin or Referer/);
}

describe("a write with a foreign Origin", () => {
  it("is refused with 403 JSON on the API and writes nothing", async () => {
    for (const origin of [
      foreign,
      "null",
      "http://localhost.shop-supplies.example",
      // The same host on another port, or over https instead of http, is another origin.
      `${baseUrl()}0`,
      baseUrl().replace(/^http:/, "https:"),
      "",
    ]) {
      const sku = uniqueCode("XS");
      const response = await send("POST", "/api/v1/items", {
        headers: { Cookie: buyer, Origin: origin },
        json: part(sku),
      });
      await expectRefusedAsJson(response);
      expect(await itemCount(sku)).toBe(0);
    }
  });

  it("is refused for PUT, PATCH and DELETE too; sign-out by DELETE leaves the session alone", async () => {
    const put = await send("PUT", "/api/v1/metal-base", {
      headers: { Cookie: buyer, Origin: foreign },
      json: {
        conductor: "copper",
        currency: "EUR",
        pricePerKg: 1,
        validFrom: "2030-01-01",
      },
    });
    await expectRefusedAsJson(put);
    const patch = await send("PATCH", "/api/v1/items/NO-SUCH-SKU", {
      headers: { Cookie: buyer, Origin: foreign },
      json: { name: "x" },
    });
    await expectRefusedAsJson(patch);

    const email = uniqueEmail("delete-session");
    await createPerson({
      email,
      password: "origin-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "origin-password");
    const signOut = await send("DELETE", "/api/v1/sessions", {
      headers: { Cookie: cookie, Origin: foreign },
    });
    await expectRefusedAsJson(signOut);
    expect((await get("/api/v1/me", cookie)).status).toBe(200);
  });

  it("is refused on a page action with a plain-text 403, before the action runs", async () => {
    const email = uniqueEmail("cross-site-sign-in");
    await createPerson({
      email,
      password: "origin-password",
      roles: ["buyer"],
    });
    // A wrong password: had the action run, it would be counted by the throttle.
    const response = await send("POST", "/sign-in", {
      headers: { Origin: foreign },
      form: { email, password: "a-wrong-password" },
    });
    expect(response.status).toBe(403);
    expect(response.headers.get("Content-Type")).toMatch(/^text\/plain/);
    expect(await response.text()).toMatch(/another site/);
    expect(sessionCookieFrom(response)).toBeNull();
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS n FROM attempt_counters WHERE rule = 'sign-in-account' AND subject = ?",
      [email],
    );
    expect(Number((rows as { n: number }[])[0]!.n)).toBe(0);

    // The right password from a foreign page does not sign in either.
    const right = await send("POST", "/sign-in", {
      headers: { Origin: foreign },
      form: { email, password: "origin-password" },
    });
    expect(right.status).toBe(403);
    expect(sessionCookieFrom(right)).toBeNull();
  });

  it("is refused on React Router's data requests (fetchers, client-side forms)", async () => {
    const response = await send("POST", "/account.data", {
      headers: { Cookie: buyer, Origin: foreign },
      form: {
        intent: "create",
        name: "stolen",
        scope: "all",
        lifetimeDays: "30",
      },
    });
    expect(response.status).toBe(403);
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS n FROM api_tokens WHERE name = 'stolen'",
    );
    expect(Number((rows as { n: number }[])[0]!.n)).toBe(0);
  });

  it("does not stop reads: GET with a foreign Origin is answered", async () => {
    const response = await send("GET", "/api/v1/me", {
      headers: { Cookie: buyer, Origin: foreign },
    });
    expect(response.status).toBe(200);
  });
});

describe("a write with the app's own Origin", () => {
  it("goes on, on the API and on pages", async () => {
    const sku = uniqueCode("OK");
    const created = await send("POST", "/api/v1/items", {
      headers: { Cookie: buyer, Origin: baseUrl() },
      json: part(sku),
    });
    expect(created.status, await created.clone().text()).toBe(201);
    expect(await itemCount(sku)).toBe(1);
    const email = uniqueEmail("own-origin");
    await createPerson({
      email,
      password: "origin-password",
      roles: ["buyer"],
    });
    const page = await postForm(
      "/account",
      { intent: "alert-mode", mode: "none" },
      await signIn(email, "origin-password"),
    );
    // Accepted: the choice is saved and the page is shown again with its message.
    expect(page.status).toBe(302);
  });
});

describe("a write without Origin", () => {
  it("riding on the session cookie is refused unless the Referer is one of our pages", async () => {
    const bare = uniqueCode("NR");
    await expectRefusedAsJson(
      await send("POST", "/api/v1/items", {
        headers: { Cookie: buyer },
        json: part(bare),
      }),
    );
    const foreignReferer = uniqueCode("FR");
    await expectRefusedAsJson(
      await send("POST", "/api/v1/items", {
        headers: { Cookie: buyer, Referer: `${foreign}/stock` },
        json: part(foreignReferer),
      }),
    );
    expect(await itemCount(bare)).toBe(0);
    expect(await itemCount(foreignReferer)).toBe(0);

    const ownReferer = uniqueCode("OR");
    const created = await send("POST", "/api/v1/items", {
      headers: { Cookie: buyer, Referer: `${baseUrl()}/stock/items/new` },
      json: part(ownReferer),
    });
    expect(created.status, await created.clone().text()).toBe(201);

    const email = uniqueEmail("no-origin");
    await createPerson({
      email,
      password: "origin-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "origin-password");
    const pageWithoutOrigin = await send("POST", "/account", {
      headers: { Cookie: cookie },
      form: { intent: "alert-mode", mode: "none" },
    });
    expect(pageWithoutOrigin.status).toBe(403);
    expect(await pageWithoutOrigin.text()).toMatch(/Origin or Referer/);
  });

  it("with a bearer token goes on, as scripts send it", async () => {
    const email = uniqueEmail("script");
    await createPerson({
      email,
      password: "origin-password",
      roles: ["buyer"],
    });
    const cookie = await signIn(email, "origin-password");
    const page = await postForm(
      "/account",
      {
        intent: "create",
        name: "import script",
        scope: "all",
        lifetimeDays: "30",
        currentPassword: "origin-password",
      },
      cookie,
    );
    expect(page.status).toBe(200);
    const token = (await page.text()).match(/tl_[A-Za-z0-9_-]{43}/)?.[0];
    expect(token).toBeTruthy();

    const sku = uniqueCode("BT");
    const created = await send("POST", "/api/v1/items", {
      headers: { Authorization: `Bearer ${token}` },
      json: part(sku),
    });
    expect(created.status, await created.clone().text()).toBe(201);
    // A script that also carries a cookie is judged by its token.
    const both = await send("POST", "/api/v1/items", {
      headers: { Authorization: `Bearer ${token}`, Cookie: cookie },
      json: part(uniqueCode("BC")),
    });
    expect(both.status).toBe(201);
    // A token does not excuse a foreign Origin.
    await expectRefusedAsJson(
      await send("POST", "/api/v1/items", {
        headers: { Authorization: `Bearer ${token}`, Origin: foreign },
        json: part(uniqueCode("BF")),
      }),
    );
  });

  it("and without credentials goes on: a script signs in through the API", async () => {
    const manager = await newPerson("manager");
    const response = await send("POST", "/api/v1/sessions", {
      json: {
        email: manager.email,
        password: manager.password,
      },
    });
    expect(response.status).toBe(200);
    expect(sessionCookieFrom(response)).toBeTruthy();
  });
});

describe("the app's own origin", () => {
  it("on this machine is the name the page was opened with: another name is another origin", async () => {
    const sameServer = baseUrl().replace("localhost", "127.0.0.1");
    const otherName = await send("POST", "/api/v1/sessions", {
      headers: { Origin: baseUrl() },
      json: {},
      base: sameServer,
    });
    await expectRefusedAsJson(otherName);
    const own = await send("POST", "/api/v1/sessions", {
      headers: { Origin: sameServer },
      json: {},
      base: sameServer,
    });
    expect(own.status).toBe(400);
  });

  describe("deployed behind one proxy (APP_URL https://turnledger.shop.example, TRUST_PROXY=1)", () => {
    let server: ReturnType<typeof spawn> | undefined;
    let base = "";
    const forwarded = {
      "X-Forwarded-Proto": "https",
      "X-Forwarded-Host": "turnledger.shop.example",
    };

    beforeAll(async () => {
      const port = Number(new URL(baseUrl()).port) + 41;
      base = `http://127.0.0.1:${port}`;
      const env: NodeJS.ProcessEnv = {
        ...process.env,
        NODE_ENV: "production",
        PORT: String(port),
        HOST: "127.0.0.1",
        DATABASE_URL: inject("databaseUrl"),
        SMTP_URL: inject("smtpUrl"),
        APP_URL: "https://turnledger.shop.example",
        TRUST_PROXY: "1",
        DEMO_DATA: "1",
      };
      server = spawn(
        process.execPath,
        [path.resolve(import.meta.dirname, "..", "..", "server.js")],
        { env, stdio: ["ignore", "ignore", "inherit"] },
      );
      const started = Date.now();
      while (Date.now() - started < 30_000) {
        if (server.exitCode !== null)
          throw new Error(`the second server exited with ${server.exitCode}`);
        try {
          if ((await fetch(`${base}/healthz`)).ok) return;
        } catch {
          // not listening yet
        }
        await new Promise((resolve) => setTimeout(resolve, 200));
      }
      throw new Error(`the second server did not answer at ${base}`);
    });
    afterAll(async () => {
      if (!server || server.exitCode !== null) return;
      const exited = new Promise((resolve) => server!.once("exit", resolve));
      server.kill("SIGTERM");
      await exited;
    });

    const signInBody = { json: {} };

    it("is APP_URL's, reached through the proxy's public address", async () => {
      const own = await send("POST", "/api/v1/sessions", {
        ...signInBody,
        headers: { ...forwarded, Origin: "https://turnledger.shop.example" },
        base,
      });
      expect(own.status).toBe(400);
      const plainHttp = await send("POST", "/api/v1/sessions", {
        ...signInBody,
        headers: { ...forwarded, Origin: "http://turnledger.shop.example" },
        base,
      });
      await expectRefusedAsJson(plainHttp);
      const elsewhere = await send("POST", "/api/v1/sessions", {
        ...signInBody,
        headers: { ...forwarded, Origin: foreign },
        base,
      });
      await expectRefusedAsJson(elsewhere);
    });

    it("serves no other host, forwarded or direct", async () => {
      const direct = await send("POST", "/api/v1/sessions", {
        ...signInBody,
        headers: { Origin: base },
        base,
      });
      expect(direct.status).toBe(421);
      const otherHost = await send("POST", "/api/v1/sessions", {
        ...signInBody,
        headers: {
          "X-Forwarded-Proto": "https",
          "X-Forwarded-Host": "evil.example",
          Origin: "https://evil.example",
        },
        base,
      });
      expect(otherHost.status).toBe(421);
    });
  });
});

describe("a path with dot segments", () => {
  it("is judged as the page it routes to: a bearer header does not excuse a cookie's write to /stock/record", async () => {
    const cookie = await signInAs("storekeeper");
    for (const trick of [
      "/api/../stock/record",
      "/api/%2e%2e/stock/record",
      "/api/v1/../../stock/record",
    ]) {
      const answer = await rawRequest({
        connectTo: baseUrl(),
        method: "POST",
        path: `${trick}?type=receipt`,
        headers: {
          Cookie: cookie,
          Authorization: "Bearer tl_not-a-real-token",
          "Content-Type": "application/x-www-form-urlencoded",
        },
        body: "intent=record",
      });
      expect(answer.status, trick).toBe(403);
      expect(answer.body, trick).toMatch(/Origin or Referer/);
    }
  });
});
