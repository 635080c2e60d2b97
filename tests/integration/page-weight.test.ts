/**
 * The page-weight budget: a page of the production build should not make a browser
 * download more than 150 KB (gzip) of JavaScript before it can run
 * (scripts/lib/page-weight.ts). A size read from the build, not a timing.
 * See docs/decisions/051-precompressed-assets-and-page-weight.md.
 */
import path from "node:path";
import { describe, expect, it } from "vitest";
import {
  firstLoadBudgetKb,
  kilobytes,
  pageWeights,
} from "../../scripts/lib/page-weight";

const pages = pageWeights(
  path.join(process.env.BUILD_DIRECTORY ?? "build", "client"),
);

describe("first-load JavaScript of every page", () => {
  it("measures every page of the app, each with the manifest, the entry and its own module", () => {
    expect(pages.length).toBeGreaterThan(40);
    const signIn = pages.find((page) => page.routeId === "routes/sign-in");
    expect(signIn?.path).toBe("/sign-in");
    expect(
      signIn?.scripts.some((s) => /\/manifest-[0-9a-f]+\.js$/.test(s)),
    ).toBe(true);
    expect(signIn?.scripts.some((s) => /\/entry\.client-.*\.js$/.test(s))).toBe(
      true,
    );
    expect(signIn?.scripts.some((s) => /\/sign-in-.*\.js$/.test(s))).toBe(true);
    // React DOM alone is more than 50 KB gzipped: the sizes are real.
    expect(kilobytes(signIn?.gzipBytes ?? 0)).toBeGreaterThan(50);
  });

  it("leaves the API reference's viewer and the camera reader out of every first load", () => {
    // Both are import()ed after the page runs (decision 051): they may be large,
    // but no page may list them among the scripts it loads at once.
    const deferred = pages.flatMap((page) =>
      page.scripts
        .filter((script) => /\/(swagger-view|camera-reader)-/.test(script))
        .map((script) => `${page.path}: ${script}`),
    );
    expect(deferred).toEqual([]);
  });

  it(`keeps every page within ${firstLoadBudgetKb} KB gzipped`, () => {
    // Issue 23's budget for every page's first load; a new page is held to it too.
    const over = pages
      .filter((page) => kilobytes(page.gzipBytes) >= firstLoadBudgetKb)
      .map((page) => `${page.path}: ${kilobytes(page.gzipBytes)} KB`);
    expect(over).toEqual([]);
    expect(pages.length).toBeGreaterThanOrEqual(50);
  });
});
