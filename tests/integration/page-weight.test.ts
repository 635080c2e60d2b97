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

  it(`keeps the pages that are within ${firstLoadBudgetKb} KB gzipped within it`, () => {
    // Issue 23 asks every page to be within the budget; the pages listed here are (the
    // rest are still over, and `npm run bench` reports each one as MISSED). A page that
    // comes within the budget joins this list, so it can never drift back over.
    const over = pages
      .filter((page) => pagesWithinBudget.includes(page.path))
      .filter((page) => kilobytes(page.gzipBytes) >= firstLoadBudgetKb)
      .map((page) => `${page.path}: ${kilobytes(page.gzipBytes)} KB`);
    expect(over).toEqual([]);
    const measured = new Set(pages.map((page) => page.path));
    expect(pagesWithinBudget.filter((path) => !measured.has(path))).toEqual([]);
  });
});

/** The pages within the first-load budget on 2026-12-04 (47 of 50). */
const pagesWithinBudget = [
  "/",
  "/insight",
  "/stock",
  "/stock/journal",
  "/stock/lots/:lotId",
  "/stock/locations/:code/count-sheet",
  "/stock/record",
  "/stock/receive",
  "/stock/items/new",
  "/tools/coil-estimator",
  "/tools/magnet-estimator",
  "/alerts",
  "/purchase-orders",
  "/purchase-orders/late",
  "/purchase-orders/:orderId/print",
  "/suppliers/imports",
  "/best-prices",
  "/admin/outbox",
  "/sign-in",
  "/set-password",
  "/forgot-password",
  "/stocktakes/:stocktakeId",
  "/stocktakes/:stocktakeId/print",
  "/designs/:designId/revisions/:revision/print",
  "/labels/lots",
  "/labels/lots/:lotId",
  "/labels/locations",
  "/labels/locations/:code",
  "/build-orders/:orderId/pick-list",
  "/scan/:code",
  "/api",
  "/*",
  "/purchase-orders/:orderId",
  "/purchase-orders/new",
  "/build-orders",
  "/build-orders/:orderId",
  "/suppliers",
  "/suppliers/:supplierId",
  "/stocktakes",
  "/stocktakes/:stocktakeId/count",
  "/prices",
  "/admin/people",
  "/admin/people/:userId",
  "/account",
  "/designs",
  "/buying-plan",
  "/designs/:designId/revisions/:revision",
];
