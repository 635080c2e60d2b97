/**
 * Every page of the menu, for every role, loads and hydrates under the
 * production Content-Security-Policy with no violation: each page is opened
 * as a document (React Router's inline scripts must run with the nonce) and
 * left by a menu link (which must navigate on the client, so the app is
 * hydrated). The policy is also shown to bite: an injected inline handler does
 * not run and is reported. See docs/decisions/012.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { roles } from "~/lib/roles";
import {
  cspViolations,
  launchBrowser,
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

declare global {
  interface Window {
    __sameDocument?: boolean;
    __injected?: boolean;
  }
}

async function menuLinks(page: Page): Promise<string[]> {
  const links = page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link");
  const hrefs: string[] = [];
  for (const link of await links.all())
    hrefs.push((await link.getAttribute("href"))!);
  return hrefs;
}

describe("every page of the menu runs under the Content-Security-Policy", () => {
  for (const role of roles) {
    it(`for the ${role}`, async () => {
      const page = await signIn(browser, role);
      const hrefs = await menuLinks(page);
      expect(hrefs.length).toBeGreaterThanOrEqual(11);
      for (const [index, href] of hrefs.entries()) {
        const response = await page.goto(`${inject("baseUrl")}${href}`);
        expect(response?.status(), href).toBe(200);
        const policy = (await response?.headerValue(
          "content-security-policy",
        ))!;
        expect(policy).toMatch(/script-src 'self' 'nonce-[^']+'(;|$)/);
        // React has taken the page over: its scripts ran under the policy, and
        // the menu link below is followed by the client router, not the browser.
        await waitForHydration(page);

        // A menu link followed by the client router keeps this document.
        const next = hrefs[(index + 1) % hrefs.length]!;
        await page.evaluate(() => {
          window.__sameDocument = true;
        });
        await page
          .getByRole("navigation", { name: "Main" })
          .locator(`a[href="${next}"]`)
          .click();
        await page.waitForURL((url) => `${url.pathname}${url.search}` === next);
        await page.getByRole("heading", { level: 1 }).waitFor();
        expect(
          await page.evaluate(() => window.__sameDocument === true),
          `${href} → ${next} on the client`,
        ).toBe(true);
      }
      await page.waitForLoadState("networkidle");
      expect(cspViolations(browser)).toEqual([]);
      await page.close();
    });
  }

  it("for the pages before sign-in", async () => {
    const page = await browser.newPage();
    for (const href of [
      "/sign-in",
      "/forgot-password",
      "/set-password?token=x",
    ]) {
      const response = await page.goto(`${inject("baseUrl")}${href}`);
      expect(response?.status(), href).toBe(200);
      await waitForHydration(page);
    }
    await page.waitForLoadState("networkidle");
    expect(cspViolations(browser)).toEqual([]);
    await page.close();
  });
});

describe("the policy", () => {
  it("stops an injected inline script and reports it", async () => {
    const own = await launchBrowser();
    try {
      const page = await signIn(own, "manager");
      await waitForHydration(page);
      let dialogs = 0;
      page.on("dialog", async (dialog) => {
        dialogs += 1;
        await dialog.dismiss();
      });
      await page.evaluate(() => {
        document.body.insertAdjacentHTML(
          "beforeend",
          '<img src="/no-such-image.png" onerror="window.__injected = true; alert(1)">',
        );
        const script = document.createElement("script");
        script.textContent = "window.__injected = true; alert(2);";
        document.body.append(script);
      });
      // A broken image is complete once its error event has fired: the
      // inline handler has had its chance to run by then.
      await page.waitForFunction(
        () =>
          document.querySelector<HTMLImageElement>(
            'img[src="/no-such-image.png"]',
          )?.complete === true,
      );
      expect(await page.evaluate(() => window.__injected === true)).toBe(false);
      expect(dialogs).toBe(0);
      const seen = cspViolations(own);
      expect(seen.some((line) => /script-src/.test(line))).toBe(true);
      // Expected here; cleared so closing this browser does not fail.
      seen.length = 0;
      await page.close();
    } finally {
      await own.close();
    }
  });
});
