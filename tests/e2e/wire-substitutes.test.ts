/**
 * Substitutes from stock on the design page in Chromium (issue 19): the panel opens by
 * itself with a sentence when the line's wire is short for an open build order, lists the
 * proposals with their units, and "Use this" starts a new draft revision with a one-time
 * message. Screenshots of both.
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { readable } from "../support/page-text";
import { createSubstituteScene } from "../support/substitute-fixtures";
import { closeTestDatabase } from "../support/test-database";

let browser: Browser;
let scene: Awaited<ReturnType<typeof createSubstituteScene>>;

beforeAll(async () => {
  browser = await launchBrowser();
  scene = await createSubstituteScene();
  // 200 motors need about 8.9 kg of the 1.00 mm wire; 5 kg is on hand.
  const order = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: scene.design.designId, revision: 1, quantity: 200 },
    await signInAs("builder"),
  );
  expect(order.status, await order.clone().text()).toBe(201);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("substitutes from stock", () => {
  it("opens by itself when the wire is short, and Use this starts a new draft revision", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(
      `${baseUrl()}/designs/${scene.design.designId}/revisions/1`,
    );
    await waitForHydration(page);
    const panel = page.getByRole("region", { name: "Substitutes from stock" });
    await panel.waitFor();
    const shortage = panel.getByText(`${scene.original.sku} is short`);
    await shortage.waitFor();
    expect(await shortage.isVisible()).toBe(true);
    const row = panel.getByRole("row", {
      name: new RegExp(`2 × ${scene.twoOf071.sku}`),
    });
    expect(readable(await row.textContent())).toContain("+0.82 %");
    await panel.scrollIntoViewIfNeeded();
    await saveScreenshot(page, "wire-substitutes-short");

    await row
      .getByRole("button", {
        name: `Use 2 × ${scene.twoOf071.sku} on line 1`,
      })
      .click();
    await page.waitForURL(
      `${baseUrl()}/designs/${scene.design.designId}/revisions/2`,
    );
    const flash = page.getByText(
      `Line 1 of revision 2 now winds 2 × ${scene.twoOf071.sku} in hand.`,
    );
    await flash.waitFor();
    await saveScreenshot(page, "wire-substitutes-applied");
  });
});
