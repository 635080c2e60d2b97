/**
 * Empty lists tell the next step (issue 21): a link for someone whose roles allow it,
 * leading to the form, and for everyone else who can take it; a search that finds
 * nothing offers the whole list back instead. By keyboard alone, axe-core clean.
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, signInAs } from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { press } from "../support/keyboard";
import { createSupplier } from "../support/price-list-fixtures";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let browser: Browser;
let supplierId = 0;

beforeAll(async () => {
  browser = await launchBrowser();
  // A new supplier: no price list imported for it yet.
  supplierId = await createSupplier(
    await signInAs("buyer"),
    `Empty list supplier ${uniqueCode("S")}`,
  );
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("a supplier without price lists", () => {
  it("offers a buyer the import, and the link leads to the import form", async () => {
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/suppliers/${supplierId}`);
    await waitForHydration(page);
    const empty = page.locator("[data-empty-state]");
    expect(await empty.innerText()).toContain(
      "No price list imported for this supplier yet.",
    );
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.screenshot({
      path: "/work/notes/shots/empty-state-supplier-price-lists.png",
      fullPage: true,
    });
    await saveScreenshot(page, "empty-state-supplier-price-lists");
    await press(page, empty.getByRole("link", { name: "Import a price list" }));
    await page.waitForURL("**/suppliers/import");
    // The new page's heading, not the one still in view while it loads.
    await page
      .getByRole("heading", { level: 1, name: "Import a price list" })
      .waitFor();
    await waitForHydration(page);
  });

  it("tells a manager who can import one, with no link", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/suppliers/${supplierId}`);
    await waitForHydration(page);
    const empty = page.locator("[data-empty-state]");
    expect(await empty.innerText()).toContain(
      "A buyer or an admin can import price lists.",
    );
    expect(await empty.getByRole("link").count()).toBe(0);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });
});

describe("a search that finds nothing", () => {
  it("offers the whole list back, not a next step", async () => {
    const page = await signIn(browser, "buyer");
    await page.goto(
      `${baseUrl()}/stock?search=${encodeURIComponent(uniqueCode("nothing-like-this"))}`,
    );
    await waitForHydration(page);
    const empty = page.locator("[data-empty-state]");
    expect(await empty.innerText()).toContain("No results for this search.");
    expect(
      await empty.getByRole("link", { name: "Add the first item" }).count(),
    ).toBe(0);
    await press(
      page,
      empty.getByRole("link", { name: "Clear the search and filters" }),
    );
    await page.waitForURL(/\/stock$/);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
  });
});
