/**
 * A form over the 64 KB body limit (server/request-size-limits.ts) shows a
 * page that says so, in Chromium: through the error boundary when React
 * sends the form, and as the server's own 413 page without JavaScript.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { launchBrowser, waitForHydration } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Fills the sign-in form and adds a hidden field of 100 KB to it, as a pasted wall of text would. */
async function fillOversizedSignIn(page: Page) {
  await page.getByLabel("E-mail").fill("someone@example.test");
  await page.getByLabel("Password").fill("not-the-password");
  await page.evaluate(() => {
    const extra = document.createElement("input");
    extra.type = "hidden";
    extra.name = "padding";
    extra.value = "x".repeat(100 * 1024);
    document.querySelector("main form")!.append(extra);
  });
}

const message =
  /The form is larger than 64 KB, the most Turnledger takes from one form/;

describe("a form over the size limit", () => {
  it("shows the limit in the error page when React sends it", async () => {
    const page = await browser.newPage();
    await page.goto(`${inject("baseUrl")}/sign-in`);
    await waitForHydration(page);
    // The form's browser checks arrive by import() after hydration (decision 051): the
    // padding goes in once they have, so the form that is sent is the one padded.
    await page.waitForLoadState("networkidle");
    await fillOversizedSignIn(page);
    const answer = page.waitForResponse((response) =>
      response.url().includes("/sign-in.data"),
    );
    await page.getByRole("button", { name: "Sign in" }).click();
    expect((await answer).status()).toBe(413);
    await page.getByRole("heading", { name: "Too much sent" }).waitFor();
    await expect.poll(() => page.getByText(message).count()).toBe(1);
    await page.close();
  });

  it("shows the server's 413 page when sent without JavaScript", async () => {
    const context = await browser.newContext({ javaScriptEnabled: false });
    const page = await context.newPage();
    await page.goto(`${inject("baseUrl")}/sign-in`);
    await fillOversizedSignIn(page);
    await Promise.all([
      page.waitForURL(`${inject("baseUrl")}/sign-in`),
      page.getByRole("button", { name: "Sign in" }).click(),
    ]);
    await page.getByRole("heading", { name: "Too much sent" }).waitFor();
    await expect.poll(() => page.getByText(message).count()).toBe(1);
    await context.close();
  });
});
