/**
 * The JSON API answers in its own shape even where it has nothing: an unknown
 * path under /api/v1 is a 404 and a known path asked with a method it does not
 * take is a 405, both as `{ error: { message } }`, never the HTML error page.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { baseUrl, signInAs } from "../support/app-client";

const methods = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"] as const;

let cookie = "";
beforeAll(async () => {
  cookie = await signInAs("manager");
});

function ask(
  method: string,
  path: string,
  headers: Record<string, string> = {},
): Promise<Response> {
  const sendsBody = method !== "GET" && method !== "HEAD";
  return fetch(`${baseUrl()}${path}`, {
    method,
    redirect: "manual",
    headers: {
      ...(sendsBody
        ? { "Content-Type": "application/json", Origin: baseUrl() }
        : {}),
      ...headers,
    },
    body: sendsBody ? "{}" : undefined,
  });
}

/** Checks a JSON error answer; HEAD answers carry the headers only. */
async function expectJsonError(
  response: Response,
  method: string,
  status: number,
) {
  expect(response.status, `${method} status`).toBe(status);
  expect(response.headers.get("Content-Type"), `${method} type`).toMatch(
    /^application\/json/,
  );
  const text = await response.text();
  if (method === "HEAD") {
    expect(text).toBe("");
    return;
  }
  const body = JSON.parse(text) as { error?: { message?: unknown } };
  expect(Object.keys(body)).toEqual(["error"]);
  expect(typeof body.error?.message, `${method} message`).toBe("string");
  expect(text).not.toMatch(/<html|<!DOCTYPE/i);
}

describe("unknown API paths", () => {
  for (const method of methods) {
    it(`${method} /api/v1/no-such-thing answers 404 in JSON, signed in or not`, async () => {
      await expectJsonError(
        await ask(method, "/api/v1/no-such-thing"),
        method,
        404,
      );
      await expectJsonError(
        await ask(method, "/api/v1/no-such-thing/deeper/still", {
          Cookie: cookie,
        }),
        method,
        404,
      );
    });
  }

  it("outside v1 too: another path under /api and another version answer 404 in JSON", async () => {
    for (const path of ["/api/v2", "/api/v2/items", "/api/no-such-thing"]) {
      for (const method of ["GET", "POST"]) {
        await expectJsonError(
          await ask(method, path),
          `${method} ${path}`,
          404,
        );
      }
    }
  });

  it("names the path it did not find", async () => {
    const response = await ask("GET", "/api/v1/no-such-thing");
    expect(await response.json()).toEqual({
      error: { message: "No such API route: /api/v1/no-such-thing." },
    });
  });
});

describe("known API paths asked with another method", () => {
  // Read-only paths (a loader only) and paths whose action takes one method.
  const cases: { path: string; method: string; allow: string }[] = [
    { path: "/api/v1/me", method: "POST", allow: "GET" },
    { path: "/api/v1/me", method: "DELETE", allow: "GET" },
    { path: "/api/v1/locations", method: "PUT", allow: "GET" },
    { path: "/api/v1/wire-sizes", method: "PATCH", allow: "GET" },
    { path: "/api/v1/magnet-grades", method: "POST", allow: "GET" },
    { path: "/api/v1/alerts", method: "DELETE", allow: "GET" },
    { path: "/api/v1/insight/stock-value", method: "POST", allow: "GET" },
    {
      path: "/api/v1/items/NO-SUCH-SKU",
      method: "DELETE",
      allow: "GET, PATCH",
    },
    { path: "/api/v1/sessions", method: "PUT", allow: "POST, DELETE" },
  ];
  for (const { path, method, allow } of cases) {
    it(`${method} ${path} answers 405 in JSON with Allow: ${allow}`, async () => {
      const response = await ask(method, path, { Cookie: cookie });
      expect(response.headers.get("Allow")).toBe(allow);
      await expectJsonError(response, method, 405);
    });
  }

  it("asks anonymous callers to sign in first (401), before saying what is allowed", async () => {
    const response = await ask("POST", "/api/v1/me");
    await expectJsonError(response, "POST", 401);
  });
});
