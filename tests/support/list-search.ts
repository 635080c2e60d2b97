/**
 * Searching a list page by keyboard alone, the same way on every list: `/` takes the
 * focus to the page's search box (the shared ListSearchForm), the text is typed and sent
 * with Enter; the address then carries the search and the list shows the row looked for.
 */
import type { Locator, Page } from "playwright-core";
import { inject } from "vitest";
import { scanPage } from "./accessibility";
import { waitForHydration } from "./browser";

export async function searchListByKeyboard(
  page: Page,
  list: {
    path: string;
    /** The search form's accessible name ("Search the designs"). */
    form: string;
    text: string;
    /** The address parameter the search box writes; "search" by default. */
    param?: string;
    /** A row only the narrowed list shows. */
    expected: (page: Page) => Locator;
  },
  found: string[],
): Promise<void> {
  await page.goto(`${inject("baseUrl")}${list.path}`);
  await waitForHydration(page);
  const box = page
    .getByRole("form", { name: list.form })
    .getByRole("searchbox");
  // Nothing has the focus but the page: `/` goes to the search box. The key is listened
  // for from an effect, which may run a moment after the page shows: pressed again until then.
  let focused = false;
  for (let tries = 0; tries < 20 && !focused; tries += 1) {
    if (tries > 0) await page.waitForTimeout(100);
    await page.keyboard.press("/");
    focused = await box.evaluate(
      (element) => element === document.activeElement,
    );
  }
  if (!focused) {
    const active = await page.evaluate(
      () => document.activeElement?.outerHTML.slice(0, 160) ?? "none",
    );
    throw new Error(
      `${list.path}: "/" did not focus the search box; the focus is on ${active}`,
    );
  }
  await page.keyboard.type(list.text);
  await page.keyboard.press("Enter");
  const param = list.param ?? "search";
  await page.waitForURL(
    (url) =>
      url.pathname === list.path && url.searchParams.get(param) === list.text,
  );
  await list.expected(page).waitFor();
  await scanPage(page, found);
}
