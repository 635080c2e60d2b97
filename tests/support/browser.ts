/** Debian's Chromium driven by playwright-core, and a signIn(role) helper for browser tests. */
import fs from "node:fs";
import path from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { inject } from "vitest";
import type { Role } from "~/lib/roles";
import { demoPassword, demoPeople } from "../../seed/demo-people";

export const screenshotFolder = path.resolve(
  import.meta.dirname,
  "..",
  "e2e",
  "screenshots",
);

export function launchBrowser(): Promise<Browser> {
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
    ],
  });
}

/** Opens a new page signed in as the demo person of a role, on the start page. */
export async function signIn(browser: Browser, role: Role): Promise<Page> {
  const person = demoPeople.find((candidate) => candidate.roles.includes(role));
  if (!person) throw new Error(`no demo person holds the role ${role}`);
  const page = await browser.newPage({
    viewport: { width: 1280, height: 800 },
  });
  await page.goto(`${inject("baseUrl")}/sign-in`);
  await page.getByLabel("E-mail").fill(person.email);
  await page.getByLabel("Password").fill(demoPassword());
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${inject("baseUrl")}/`);
  await page.getByRole("navigation", { name: "Main" }).waitFor();
  await page.getByRole("heading", { level: 1 }).waitFor();
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
