import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("a missing build order", () => {
  it("shows its 404 inside the shell, whose menu still leads on", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(new URL("/build-orders/2147483647", page.url()).toString());
    await waitForHydration(page);
    await page.getByRole("heading", { name: "Page not found" }).waitFor();
    expect(
      await page.getByText("No build order BO-2147483647.").isVisible(),
    ).toBe(true);
    const menu = page.getByRole("navigation", { name: "Main" });
    expect(await menu.isVisible()).toBe(true);
    await saveScreenshot(page, "build-order-missing");
    await menu.getByRole("link", { name: "Build orders" }).click();
    await page
      .getByRole("heading", { level: 1, name: "Build orders" })
      .waitFor();
    expect(new URL(page.url()).pathname).toBe("/build-orders");
    await page.close();
  });
});
