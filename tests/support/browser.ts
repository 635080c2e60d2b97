/** Debian's Chromium driven by playwright-core, and signIn(browser, role) for browser tests. */
import fs from "node:fs";
import path from "node:path";
import {
  chromium,
  type Browser,
  type BrowserContext,
  type BrowserContextOptions,
  type Page,
} from "playwright-core";
import { inject } from "vitest";
import type { Role } from "~/lib/roles";
import { demoPassword, demoPeople } from "../../seed/demo-people";
import { newPerson } from "./app-client";

export const screenshotFolder = path.resolve(
  import.meta.dirname,
  "..",
  "e2e",
  "screenshots",
);

/**
 * Content-Security-Policy violations seen in any page of a browser from
 * launchBrowser(): Chromium's console report and the page's
 * `securitypolicyviolation` events. Closing the browser fails when there are
 * any, so every browser test also proves the pages run under the policy.
 */
export function cspViolations(browser: Browser): string[] {
  return violationsByBrowser.get(browser) ?? [];
}

const violationsByBrowser = new WeakMap<Browser, string[]>();

function watchForCspViolations(context: BrowserContext, seen: string[]) {
  const watch = (page: Page) => {
    page.on("console", (message) => {
      if (/Content Security Policy/i.test(message.text()))
        seen.push(`${page.url()}: ${message.text()}`);
    });
  };
  context.on("page", watch);
  for (const page of context.pages()) watch(page);
  return context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (event) => {
      console.error(
        `Content Security Policy violation: ${event.violatedDirective} blocked ${event.blockedURI || "inline code"}`,
      );
    });
  });
}

/**
 * Has every page of the context hand its file choosers to the test from the
 * start. Playwright asks Chromium to intercept file choosers only when a test
 * begins to listen for one, and does not wait for Chromium's answer: a key
 * pressed right after page.waitForEvent("filechooser") can reach the page
 * first, and the chooser it opens is then never reported (13 of 100 new
 * pages in a loop). A listener that lives as long as the page keeps the
 * interception on before any key is pressed.
 */
function interceptFileChoosers(context: BrowserContext) {
  const keepIntercepting = (page: Page) =>
    page.on("filechooser", () => undefined);
  context.on("page", keepIntercepting);
  for (const page of context.pages()) keepIntercepting(page);
}

/** Debian's Chromium, with `extraArgs` besides the usual ones (a fake camera, say). */
export async function launchBrowser(
  extraArgs: string[] = [],
): Promise<Browser> {
  const browser = await launchChromium(extraArgs);
  const seen: string[] = [];
  violationsByBrowser.set(browser, seen);
  const newContext = browser.newContext.bind(browser);
  // Every page reads as a British browser in UTC unless the test says otherwise: a
  // new person takes their locale and time zone from the browser at first sign-in.
  browser.newContext = async (options = {}) => {
    const context = await newContext({
      locale: "en-GB",
      timezoneId: "UTC",
      ...options,
    });
    interceptFileChoosers(context);
    await watchForCspViolations(context, seen);
    return context;
  };
  const close = browser.close.bind(browser);
  browser.close = async (...args) => {
    await close(...args);
    if (seen.length > 0)
      throw new Error(
        `Content-Security-Policy violations in the browser:\n${seen.join("\n")}`,
      );
  };
  return browser;
}

function launchChromium(extraArgs: string[]): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      ...extraArgs,
    ],
  });
}

/**
 * Waits until React has hydrated the page in view: its level-1 heading carries
 * React's props. A page loaded as a document (page.goto, or a link or form
 * used before the page it was on had hydrated) shows the server's HTML at
 * once, but a click, key or file choice made before React has taken the page
 * over is lost, and a value typed or chosen in a field React controls stays
 * unknown to React. From this point on React answers every event (an early
 * one makes it finish hydrating first).
 */
export async function waitForHydration(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const heading = document.querySelector("h1");
    return (
      heading !== null &&
      Object.keys(heading).some((key) => key.startsWith("__reactProps"))
    );
  });
}

/** How the seeded demo person of a role signs in, for a test that checks the demo data's own person. */
export function demoPerson(role: Role): { email: string; password: string } {
  const person = demoPeople.find((candidate) => candidate.roles.includes(role));
  if (!person) throw new Error(`no demo person holds the role ${role}`);
  return { email: person.email, password: demoPassword() };
}

/**
 * Opens a new page signed in, on the start page (hydrated): as a fresh person
 * holding `who` when it is a role (newPerson in app-client.ts), else as the
 * person given (one the test made, or demoPerson(role)). A desktop window
 * unless `device` says otherwise (phoneContext in touch-targets.ts).
 */
export async function signIn(
  browser: Browser,
  who: Role | { email: string; password: string },
  device: BrowserContextOptions = { viewport: { width: 1280, height: 800 } },
): Promise<Page> {
  const person = typeof who === "string" ? await newPerson(who) : who;
  const page = await browser.newPage(device);
  await page.goto(`${inject("baseUrl")}/sign-in`);
  await waitForHydration(page);
  await page.getByLabel("E-mail").fill(person.email);
  await page.getByLabel("Password").fill(person.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${inject("baseUrl")}/`);
  // The menu itself on a wide window; its button on a phone, where it is folded.
  await page
    .getByRole("navigation", { name: "Main" })
    .or(page.getByRole("button", { name: "Menu" }))
    .waitFor();
  await page.getByRole("heading", { level: 1 }).waitFor();
  await waitForHydration(page);
  return page;
}

export async function saveScreenshot(
  page: Page,
  name: string,
): Promise<string> {
  fs.mkdirSync(screenshotFolder, { recursive: true });
  const file = path.join(screenshotFolder, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Runs `act` and waits until the app shell's status region shows a one-time
 * message with `text` that arrived after it: a message already on the page
 * (the previous save's) does not count, so a second save of the same kind
 * waits for its own message.
 */
export async function flashAfter(
  page: Page,
  text: string | RegExp,
  act: () => Promise<void>,
): Promise<void> {
  await page.evaluate(() => {
    for (const shown of document.querySelectorAll('[role="status"] > p'))
      shown.setAttribute("data-shown-before", "");
  });
  await act();
  await page
    .getByRole("status")
    .locator("p:not([data-shown-before])")
    .filter({ hasText: text })
    .waitFor();
}
