/**
 * A stock list search with more than 1,000 matches counts only so far (decision
 * 057-trigram-search): the page says "More than 1,000 items", its pager "Page 1 of at least
 * 21", and Next, reached by keyboard alone, goes on to the next full page. Clean for axe-core.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seriousAccessibilityViolations } from "../support/accessibility";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import { tabTo } from "../support/keyboard";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
const word = `many${uniqueCode("Cp")
  .toLowerCase()
  .replace(/[^a-z0-9]/g, "")}`;

beforeAll(async () => {
  await testDatabase().query(
    `INSERT INTO items (sku, name, kind, unit, created_at, updated_at)
     SELECT CONCAT('CP-', ?, '-', LPAD(seq, 4, '0')), CONCAT('Pole piece ', ?), 'part', 'pcs', NOW(3), NOW(3)
     FROM seq_1_to_1100`,
    [word, word],
  );
  browser = await launchBrowser();
  page = await signIn(browser, "storekeeper");
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** What a locator reads, with the non-breaking spaces of formatted numbers made plain. */
async function plainText(locator: ReturnType<Page["locator"]>) {
  return ((await locator.textContent()) ?? "").replace(/\u00a0/g, " ");
}

describe("a search counted only so far", () => {
  it("says more than 1,000 match and goes on to the next page by keyboard", async () => {
    await page.goto(`${page.url()}stock?search=${word}`);
    const status = page.getByRole("status").filter({ hasText: "showing" });
    expect(await plainText(status)).toContain(
      "More than 1,000 items · showing 1–50",
    );
    const pages = page.getByRole("navigation", { name: "Pages" });
    expect(await plainText(pages)).toContain("Page 1 of at least 21");
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "stock-capped-search");

    await tabTo(page, pages.getByRole("link", { name: "Next" }));
    await page.keyboard.press("Enter");
    await page.waitForURL(/page=2/);
    await status.filter({ hasText: "showing 51–100" }).waitFor();
    expect(await plainText(status)).toContain(
      "More than 1,050 items · showing 51–100",
    );
    expect(
      await page.getByRole("link", { name: `CP-${word}-0051` }).count(),
    ).toBe(1);
  });
});
