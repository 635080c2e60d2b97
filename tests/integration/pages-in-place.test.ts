/**
 * Every part of a page is in the HTML where it belongs: React does not move a large
 * finished part (a long table, a chart) to the end of the stream behind `hidden`, to
 * be revealed by a script. Without JavaScript such a part would never show, and with
 * it the part shows a frame after the rest (app/entry.server.tsx, progressiveChunkSize).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { get, signInAs } from "../support/app-client";
import { createWireItem } from "../support/build-order-fixtures";
import { closeTestDatabase } from "../support/test-database";

let manager = "";
let admin = "";
let buyer = "";
beforeAll(async () => {
  manager = await signInAs("manager");
  admin = await signInAs("admin");
  buyer = await signInAs("buyer");
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

describe("forms whose code loads after the page are in place in its HTML", () => {
  // The item page's reorder and rename forms and the add-a-grade form are lazy
  // components (decision 051): the server still writes them where they belong, so
  // they work before their code has come and without JavaScript.
  it.each([
    ["item page", ["reorder", "rename"]],
    ["magnet grades table", ["add-magnet-grade"]],
  ] as const)("the %s has its forms in place", async (page, formIds) => {
    const html =
      page === "item page"
        ? await pageHtml(
            `/stock/items/${(await createWireItem(buyer)).sku}`,
            buyer,
          )
        : await pageHtml("/reference?table=magnet-grades", admin);
    expect(html).not.toMatch(/<div hidden id="S:\d+">/);
    const dataHandOver = html.indexOf("__reactRouterContext.streamController");
    for (const id of formIds) {
      const form = html.search(new RegExp(`<form[^>]* id="${id}"`));
      expect(form, `the form ${id}`).toBeGreaterThan(0);
      expect(form, `the form ${id}`).toBeLessThan(dataHandOver);
    }
  });
});
