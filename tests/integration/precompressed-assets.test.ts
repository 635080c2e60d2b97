/**
 * The browser's files go out as the build compressed them
 * (server/precompressed-assets.ts, served by server.js): brotli when the
 * request accepts it, gzip when only that, the file itself otherwise, always
 * with Vary: Accept-Encoding and the year-long immutable caching of /assets.
 * Pages and data answers are still compressed on the fly. See
 * docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import fs from "node:fs";
import path from "node:path";
import zlib from "node:zlib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, signInAs } from "../support/app-client";
import { rawRequest } from "../support/raw-http";
import { closeTestDatabase } from "../support/test-database";

const clientFolder = path.join(
  process.env.BUILD_DIRECTORY ?? "build",
  "client",
);

function request(pathname: string, acceptEncoding?: string, cookie?: string) {
  return rawRequest({
    connectTo: baseUrl(),
    path: pathname,
    headers: {
      ...(acceptEncoding === undefined
        ? {}
        : { "Accept-Encoding": acceptEncoding }),
      ...(cookie ? { Cookie: cookie } : {}),
    },
  });
}

/**
 * The script and style addresses the sign-in page loads, as a browser finds them. A
 * fragment is not part of the address: React Router writes a style sheet that a lazily
 * loaded chunk also uses as "….css#", and the browser asks for "….css".
 */
async function assetsOfSignInPage(): Promise<string[]> {
  const page = await request("/sign-in", "identity");
  expect(page.status).toBe(200);
  const addresses = [
    ...page.body.matchAll(
      /(?:href|src)="(\/assets\/[^"#]+\.(?:js|css))(?:#[^"]*)?"/g,
    ),
  ].map((match) => match[1] ?? "");
  return [...new Set(addresses)];
}

let storekeeper = "";
let script = "";
let style = "";
beforeAll(async () => {
  storekeeper = await signInAs("storekeeper");
  const assets = await assetsOfSignInPage();
  // The largest script on the page (React DOM's entry), and the style sheet.
  script =
    assets
      .filter((address) => address.endsWith(".js"))
      .sort(
        (a, b) =>
          fs.statSync(path.join(clientFolder, b)).size -
          fs.statSync(path.join(clientFolder, a)).size,
      )[0] ?? "";
  style = assets.find((address) => address.endsWith(".css")) ?? "";
});
afterAll(closeTestDatabase);

describe("static assets", () => {
  it("finds a script and a style sheet on the page, each with both copies in the build", () => {
    for (const address of [script, style]) {
      expect(address).toMatch(/^\/assets\//);
      expect(fs.existsSync(path.join(clientFolder, `${address}.br`))).toBe(
        true,
      );
      expect(fs.existsSync(path.join(clientFolder, `${address}.gz`))).toBe(
        true,
      );
    }
  });

  it.each([
    ["script", () => script, "text/javascript; charset=utf-8"],
    ["style sheet", () => style, "text/css; charset=utf-8"],
  ])(
    // The type is the file's own (a charset's name is case-insensitive).
    "sends a %s brotli-compressed to a browser that accepts brotli",
    async (_kind, address, contentType) => {
      const file = fs.readFileSync(path.join(clientFolder, address()));
      const answer = await request(address(), "gzip, deflate, br, zstd");
      expect(answer.status).toBe(200);
      expect(answer.headers["content-encoding"]).toBe("br");
      expect(answer.headers.vary).toMatch(/Accept-Encoding/i);
      expect(answer.headers["content-type"]?.toLowerCase()).toBe(contentType);
      expect(Number(answer.headers["content-length"])).toBe(
        answer.bytes.length,
      );
      expect(answer.bytes.length).toBeLessThan(file.length / 2);
      expect(zlib.brotliDecompressSync(answer.bytes).equals(file)).toBe(true);
    },
  );

  it("sends gzip to a browser that accepts gzip but not brotli", async () => {
    const file = fs.readFileSync(path.join(clientFolder, script));
    for (const accepted of ["gzip", "gzip, deflate", "br;q=0, gzip"]) {
      const answer = await request(script, accepted);
      expect(answer.status).toBe(200);
      expect(answer.headers["content-encoding"]).toBe("gzip");
      expect(answer.headers.vary).toMatch(/Accept-Encoding/i);
      expect(answer.headers["content-type"]?.toLowerCase()).toBe(
        "text/javascript; charset=utf-8",
      );
      expect(Number(answer.headers["content-length"])).toBe(
        answer.bytes.length,
      );
      expect(zlib.gunzipSync(answer.bytes).equals(file)).toBe(true);
    }
  });

  it("sends the file as it is when no compression is accepted", async () => {
    const file = fs.readFileSync(path.join(clientFolder, script));
    for (const accepted of [undefined, "identity", "deflate"]) {
      const answer = await request(script, accepted);
      expect(answer.status).toBe(200);
      expect(answer.headers["content-encoding"]).toBeUndefined();
      expect(answer.headers.vary).toMatch(/Accept-Encoding/i);
      expect(answer.headers["content-type"]).toBe(
        "text/javascript; charset=utf-8",
      );
      expect(Number(answer.headers["content-length"])).toBe(file.length);
      expect(answer.bytes.equals(file)).toBe(true);
    }
  });

  it("keeps the year-long immutable caching of /assets whatever the encoding", async () => {
    for (const accepted of ["br", "gzip", "identity"]) {
      const answer = await request(script, accepted);
      expect(answer.headers["cache-control"]).toBe(
        "public, max-age=31536000, immutable",
      );
      // Each encoding is its own representation, with its own validator.
      expect(answer.headers.etag).toBeTruthy();
    }
    const etags = await Promise.all(
      ["br", "gzip", "identity"].map(
        async (accepted) => (await request(script, accepted)).headers.etag,
      ),
    );
    expect(new Set(etags).size).toBe(3);
  });

  it("compresses the files beside the assets (the icon) the same way, with their shorter caching", async () => {
    const file = fs.readFileSync(path.join(clientFolder, "favicon.svg"));
    const answer = await request("/favicon.svg", "br");
    expect(answer.status).toBe(200);
    expect(answer.headers["content-encoding"]).toBe("br");
    expect(answer.headers["content-type"]).toBe("image/svg+xml");
    expect(answer.headers["cache-control"]).toBe("public, max-age=3600");
    expect(zlib.brotliDecompressSync(answer.bytes).equals(file)).toBe(true);
  });
});

describe("pages and data answers", () => {
  it("still compresses a page and its data on the fly, and never stores them", async () => {
    for (const pathname of ["/stock", "/stock.data"]) {
      const plain = await request(pathname, "identity", storekeeper);
      const answer = await request(pathname, "gzip", storekeeper);
      expect(answer.status).toBe(200);
      expect(answer.headers["content-encoding"]).toBe("gzip");
      expect(answer.headers.vary).toMatch(/Accept-Encoding/i);
      expect(answer.headers["cache-control"]).toBe("no-store");
      const text = zlib.gunzipSync(answer.bytes).toString("utf8");
      expect(text.length).toBeGreaterThan(1000);
      expect(plain.headers["content-encoding"]).toBeUndefined();
      expect(text.slice(0, 200)).toBe(plain.body.slice(0, 200));
    }
  });
});
