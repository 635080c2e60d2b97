/**
 * Every part of a page is in the HTML where it belongs: React does not move a large
 * finished part (a long table, a chart) to the end of the stream behind `hidden`, to
 * be revealed by a script. Without JavaScript such a part would never show, and with
 * it the part shows a frame after the rest (app/entry.server.tsx, progressiveChunkSize).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, signInAs } from "../support/app-client";
import { closeTestDatabase } from "../support/test-database";

let manager = "";
let admin = "";
beforeAll(async () => {
  manager = await signInAs("manager");
  admin = await signInAs("admin");
});
afterAll(closeTestDatabase);

/** The page's main content as it reaches a browser without JavaScript. */
async function pageHtml(path: string, cookie: string): Promise<string> {
  const response = await get(path, cookie);
  expect(response.status, path).toBe(200);
  return response.text();
}

describe("long tables and charts stay in place in the page's HTML", () => {
  it.each([
    ["/suppliers", "manager"],
    ["/stock", "manager"],
    ["/insight", "manager"],
    ["/reference", "manager"],
    ["/admin/people", "admin"],
  ] as const)(
    "%s has no part held back behind `hidden`",
    async (path, role) => {
      const html = await pageHtml(path, role === "admin" ? admin : manager);
      // React's marker of a part moved to the end of the stream: <div hidden id="S:0">.
      expect(html).not.toMatch(/<div hidden id="S:\d+">/);
      // The list's table comes before the scripts that hand the loader's data over.
      const table = html.indexOf("<table");
      expect(table, `${path} has a table`).toBeGreaterThan(0);
      expect(table).toBeLessThan(
        html.indexOf("__reactRouterContext.streamController"),
      );
    },
  );
});
