/**
 * The API reference page (/api): reached from the account page, it renders
 * the contract with Swagger UI under the app's Content-Security-Policy (the
 * browser from launchBrowser() fails on any violation), and "Try it out"
 * calls the API with the person's own session, driven by keyboard.
 */
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  cspViolations,
  launchBrowser,
  saveScreenshot,
  screenshotFolder,
  signIn,
  waitForHydration,
} from "../support/browser";
import { press } from "../support/keyboard";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** One operation's block in Swagger UI (its class names the method; its summary, the path). */
function operation(page: Page, method: string, path: string) {
  return page.locator(`.opblock-${method.toLowerCase()}`).filter({
    has: page.locator(`.opblock-summary-path[data-path="${path}"]`),
  });
}

async function openReferenceFromAccount(page: Page) {
  await page.goto(`${inject("baseUrl")}/account`);
  await waitForHydration(page);
  await press(page, page.getByRole("link", { name: "The API reference" }));
  await page.waitForURL(`${inject("baseUrl")}/api`);
  await page
    .getByRole("heading", { name: "API reference", level: 1 })
    .waitFor();
}

describe("the API reference page", () => {
  it("shows the operations and tries one with the person's own session, by keyboard", async () => {
    const page = await signIn(browser, "builder");
    await openReferenceFromAccount(page);
    // Inside the app shell, with how to sign in.
    await page.getByRole("navigation", { name: "Main" }).waitFor();
    await page
      .getByRole("main")
      .getByText("Authorization: Bearer <token>", { exact: true })
      .first()
      .waitFor();

    const items = operation(page, "GET", "/api/v1/items");
    await items.waitFor();
    expect(
      await page.locator(".opblock .opblock-summary-path").count(),
    ).toBeGreaterThanOrEqual(3);
    await saveScreenshot(page, "api-reference-list");

    // Open GET /api/v1/items, then Try it out → Execute, all by keyboard.
    await press(page, items.locator("button.opblock-summary-control"));
    await press(page, items.getByRole("button", { name: "Try it out" }));
    await press(page, items.getByRole("button", { name: "Execute" }));

    const answer = items.locator(".live-responses-table .response").first();
    await answer.waitFor();
    expect(
      (await answer.locator(".response-col_status").innerText()).trim(),
    ).toBe("200");
    const shown = JSON.parse(
      await answer.locator(".response-col_description pre").first().innerText(),
    ) as unknown;
    // The same answer the API gives this person's session directly.
    const direct = await page.evaluate(async () => {
      const response = await fetch("/api/v1/items");
      return {
        status: response.status,
        body: (await response.json()) as unknown,
      };
    });
    expect(direct.status).toBe(200);
    expect(shown).toEqual(direct.body);
    // The answer as the person sees it (the page itself grows with the list).
    await answer.locator(".response-col_status").scrollIntoViewIfNeeded();
    await page.screenshot({
      path: path.join(screenshotFolder, "api-reference-answer.png"),
    });

    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.waitForLoadState("networkidle");
    expect(cspViolations(browser)).toEqual([]);
    await page.close();
  }, 180_000);
});
