/**
 * Changing one's own password on the account page, in Chromium: a wrong
 * current password is a message beside its field; the right one changes the
 * password, keeps this browser signed in and signs out every other session.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  signIn as signInOverHttp,
  uniqueEmail,
} from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  waitForHydration,
} from "../support/browser";
import { closeTestDatabase, createPerson } from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function signInInBrowser(email: string, password: string): Promise<Page> {
  const page = await browser.newPage({
    viewport: { width: 1280, height: 900 },
  });
  await page.goto(`${baseUrl()}/sign-in`);
  await waitForHydration(page);
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`${baseUrl()}/`);
  await waitForHydration(page);
  return page;
}

async function fillPasswordForm(
  page: Page,
  current: string,
  chosen: string,
): Promise<void> {
  const panel = page.getByRole("region", { name: "Password" });
  await panel.getByLabel("Current password").fill(current);
  await panel.getByLabel("New password", { exact: true }).fill(chosen);
  await panel.getByLabel("New password again").fill(chosen);
  await panel.getByRole("button", { name: "Change password" }).click();
}

const meStatus = async (cookie: string) =>
  (await fetch(`${baseUrl()}/api/v1/me`, { headers: { Cookie: cookie } }))
    .status;

describe("the account page's password form", () => {
  it("asks for the current password, then changes it, keeps this browser signed in and ends the other sessions", async () => {
    const email = uniqueEmail("browser-change");
    await createPerson({
      email,
      password: "first-password-1",
      roles: ["builder"],
      name: "Ines Varga",
    });
    const page = await signInInBrowser(email, "first-password-1");
    const elsewhere = await signInOverHttp(email, "first-password-1");
    expect(await meStatus(elsewhere)).toBe(200);

    await page.goto(`${baseUrl()}/account`);
    await waitForHydration(page);
    await fillPasswordForm(page, "not-my-password", "second-password-2");
    const panel = page.getByRole("region", { name: "Password" });
    await panel.getByText("Your current password is wrong.").waitFor();
    // The field says it is the one in error.
    expect(
      await panel.getByLabel("Current password").getAttribute("aria-invalid"),
    ).toBe("true");
    await saveScreenshot(page, "account-password-wrong-current");

    await fillPasswordForm(page, "first-password-1", "second-password-2");
    await page
      .getByRole("status")
      .filter({ hasText: "Password changed." })
      .waitFor();
    expect(new URL(page.url()).pathname).toBe("/account");
    // The form starts empty again.
    expect(await panel.getByLabel("Current password").inputValue()).toBe("");
    await saveScreenshot(page, "account-password-changed");

    // The other session has ended; this browser stays signed in.
    expect(await meStatus(elsewhere)).toBe(401);
    await page.reload();
    await waitForHydration(page);
    expect(await page.getByRole("heading", { level: 1 }).textContent()).toBe(
      "Your account",
    );
    await signInOverHttp(email, "second-password-2");
  });
});
