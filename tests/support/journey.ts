/**
 * What the role journeys (tests/e2e/journey-*.test.ts) share: signing in and
 * following links by keyboard alone, with an accessibility scan of each page
 * reached.
 */
import type { Browser, Locator, Page } from "playwright-core";
import { inject } from "vitest";
import type { Role } from "~/lib/roles";
import { demoPassword, demoPeople } from "../../seed/demo-people";
import { scanPage } from "./accessibility";
import { waitForHydration } from "./browser";
import { press, typeInto } from "./keyboard";

/**
 * Signs the demo person of a role in through the sign-in form, by keyboard
 * alone, scanning the sign-in page and the start page into `found`.
 */
export async function signInByKeyboard(
  browser: Browser,
  role: Role,
  found: string[],
): Promise<Page> {
  const person = demoPeople.find((candidate) => candidate.roles.includes(role));
  if (!person) throw new Error(`no demo person holds the role ${role}`);
  const page = await browser.newPage({
    viewport: { width: 1280, height: 800 },
  });
  await page.goto(`${inject("baseUrl")}/sign-in`);
  await page.getByRole("heading", { level: 1 }).waitFor();
  await waitForHydration(page);
  await scanPage(page, found);
  await typeInto(page, page.getByLabel("E-mail"), person.email);
  await typeInto(page, page.getByLabel("Password"), demoPassword());
  await press(page, page.getByRole("button", { name: "Sign in" }));
  await page.waitForURL(`${inject("baseUrl")}/`);
  await page.getByRole("navigation", { name: "Main" }).waitFor();
  await page.getByRole("heading", { level: 1 }).waitFor();
  await waitForHydration(page);
  await scanPage(page, found);
  return page;
}

/** The link of the main navigation with this name. */
export function mainLink(page: Page, name: string): Locator {
  return page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name, exact: true });
}

/**
 * Follows a link by keyboard (Tab to it, Enter), waits for the address it
 * leads to and for that page's level-1 heading (a text heading is matched
 * whole, so the page before cannot pass for it), lets the page finish
 * hydrating, and scans it into `found`.
 */
export async function followLink(
  page: Page,
  link: Locator,
  heading: string | RegExp,
  found: string[],
): Promise<void> {
  const href = await link.evaluate(
    (element) => (element as HTMLAnchorElement).href,
  );
  await press(page, link);
  await page.waitForURL(href);
  await page
    .getByRole("heading", { level: 1, name: heading, exact: true })
    .waitFor();
  await waitForHydration(page);
  await scanPage(page, found);
}
