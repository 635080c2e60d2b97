/**
 * Every page of the main navigation, for the admin (who sees them all), plus a
 * design revision, a build order, an item and the account pages anyone reaches:
 * an axe-core scan finds no serious or critical violation (WCAG 2.1 A/AA rules).
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { scanPage } from "../support/accessibility";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("accessibility of every page (axe-core)", () => {
  it("pages anyone reaches before signing in", async () => {
    const page = await browser.newPage();
    const found: string[] = [];
    for (const path of ["/sign-in", "/forgot-password"]) {
      await page.goto(`${inject("baseUrl")}${path}`);
      await page.getByRole("heading", { level: 1 }).waitFor();
      await scanPage(page, found);
    }
    await page.close();
    expect(found).toEqual([]);
  });

  it("every page of the admin's navigation and the pages one level down", async () => {
    const page = await signIn(browser, "admin");
    const navigation = page.getByRole("navigation", { name: "Main" });
    const paths = await navigation
      .getByRole("link")
      .evaluateAll((links) =>
        links.map((link) => new URL((link as HTMLAnchorElement).href).pathname),
      );
    const found: string[] = [];
    const visit = async (path: string) => {
      await page.goto(`${inject("baseUrl")}${path}`);
      await page.getByRole("heading", { level: 1 }).first().waitFor();
      // A table that scrolls sideways becomes keyboard-reachable once React has measured it.
      await waitForHydration(page);
      await page.evaluate(
        () =>
          new Promise((done) =>
            requestAnimationFrame(() => requestAnimationFrame(done)),
          ),
      );
      await scanPage(page, found);
    };
    for (const path of paths) await visit(path);

    // One of each detail page, reached by the first link of its list.
    for (const [list, linkPattern] of [
      ["/designs", /^\/designs\/\d+\/revisions\/\d+$/],
      ["/build-orders", /^\/build-orders\/\d+$/],
      ["/stock", /^\/stock\/items\/[^/]+$/],
      ["/suppliers", /^\/suppliers\/\d+$/],
      ["/admin/people", /^\/admin\/people\/[^/]+$/],
    ] as const) {
      await page.goto(`${inject("baseUrl")}${list}`);
      const hrefs = await page
        .locator("main a[href]")
        .evaluateAll((links) =>
          links.map(
            (link) => new URL((link as HTMLAnchorElement).href).pathname,
          ),
        );
      const detail = hrefs.find((href) => linkPattern.test(href));
      expect(detail, `a detail link on ${list}`).toBeTruthy();
      await visit(detail!);
    }
    for (const path of [
      "/account",
      "/stock/items/new",
      "/suppliers/import",
      "/suppliers/imports",
    ])
      await visit(path);
    await page.close();
    expect(found).toEqual([]);
    // Some twenty pages, each scanned: longer than one test's default minute on a busy machine.
  }, 180_000);
});
