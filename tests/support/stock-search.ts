/** The stock list's search, used by keyboard alone from a journey (tests/e2e/journey-*.test.ts). */
import type { Page } from "playwright-core";
import { scanPage } from "./accessibility";
import { followLink, mainLink } from "./journey";
import { press, typeInto } from "./keyboard";

/**
 * Opens Stock from the main navigation, searches for `text` with the filter
 * form and waits for the filtered list; scans both views into `found`.
 */
export async function searchStockByKeyboard(
  page: Page,
  text: string,
  found: string[],
): Promise<void> {
  await followLink(page, mainLink(page, "Stock"), "Stock", found);
  const filter = page.getByRole("form", { name: "Filter the stock list" });
  await typeInto(page, filter.getByLabel("Search"), text);
  await press(page, filter.getByRole("button", { name: "Show" }));
  await page.waitForURL(
    (url) =>
      url.pathname === "/stock" && url.searchParams.get("search") === text,
  );
  await page
    .getByRole("status")
    .getByText(/^1\s+item\b/)
    .waitFor();
  await scanPage(page, found);
}

/** Searches the stock list for one SKU and opens its item page by keyboard. */
export async function openItemByKeyboard(
  page: Page,
  sku: string,
  itemName: string,
  found: string[],
): Promise<void> {
  await searchStockByKeyboard(page, sku, found);
  await followLink(
    page,
    page
      .getByRole("table", { name: "Stock items" })
      .getByRole("link", { name: sku, exact: true }),
    itemName,
    found,
  );
}
