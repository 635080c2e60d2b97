/**
 * The buying plan page in Chromium: a buyer reads the suggestions and an item's
 * projected-stock chart, ticks two suggestions and makes draft orders (one per supplier,
 * linked); a manager reads the plan without the checkboxes or the button. A builder sets
 * a build order's planned start on its page.
 */
import fs from "node:fs";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  createBuyingPlanFixture,
  type BuyingPlanFixture,
} from "../support/buying-plan-fixtures";
import { closeTestDatabase } from "../support/test-database";

let browser: Browser;
let fixture: BuyingPlanFixture;

/** Where the closing note's screenshots go. */
async function keepShot(file: string, name: string) {
  const folder = "/work/notes/shots";
  if (!fs.existsSync(folder)) return;
  fs.copyFileSync(file, `${folder}/r18-plan-${name}.png`);
}

beforeAll(async () => {
  browser = await launchBrowser();
  fixture = await createBuyingPlanFixture({
    buyer: await signInAs("buyer"),
    builder: await signInAs("builder"),
    storekeeper: await signInAs("storekeeper"),
  });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("the buying plan page", () => {
  // In the whole `npm test` run (twice, 2026-12-03) the chart after choosing the item once did
  // not appear within 30 s, while this test passed alone, after the tests that ran before it and
  // against that run's database. The page is now hydrated before the item is chosen, and a
  // timeout leaves what the page showed (URL, current item, charts) in
  // .data/buying-plan-page.json for the next look.
  it("shows a buyer the suggestions and chart, and makes draft orders from the ticked ones", async () => {
    const page = await signIn(browser, "buyer");
    await page.getByRole("link", { name: "Buying plan" }).click();
    await page
      .getByRole("heading", { level: 1, name: "Buying plan" })
      .waitFor();
    await page.getByLabel("Weeks ahead").selectOption("4");
    await page.getByRole("button", { name: "Show plan" }).click();
    await page.waitForURL(/weeks=4/);
    await waitForHydration(page);
    await page
      .getByRole("link", { name: fixture.resin, exact: true })
      .first()
      .waitFor();
    // The chart of the item chosen: its summary names it.
    await page
      .getByRole("navigation", { name: "Items in the plan" })
      .getByRole("link", { name: fixture.resin })
      .click();
    await page.waitForURL(new RegExp(`item=${fixture.resin}`));
    const chart = page.getByRole("img", {
      name: new RegExp(`^${fixture.resin}, projected stock over 4 weeks`),
    });
    await chart.waitFor().catch(async (error: unknown) => {
      fs.mkdirSync(".data", { recursive: true });
      fs.writeFileSync(
        ".data/buying-plan-page.json",
        JSON.stringify({
          url: page.url(),
          resin: fixture.resin,
          heading: await page.locator("#projection-heading").textContent(),
          current: await page
            .locator('[aria-current="true"]')
            .allTextContents(),
          charts: await page
            .getByRole("img")
            .evaluateAll((nodes) =>
              nodes.map((node) => node.getAttribute("aria-label")),
            ),
        }),
      );
      throw error;
    });
    expect(await chart.getAttribute("aria-label")).toContain(
      "reorder point 5.000\u00a0kg",
    );
    await keepShot(await saveScreenshot(page, "buying-plan"), "buying-plan");

    // Only this test's two suggestions: untick the rest (the demo data has its own).
    for (const box of await page.getByRole("checkbox").all())
      if (await box.isEnabled()) await box.uncheck();
    await page
      .getByRole("checkbox", {
        name: new RegExp(`^Order ${fixture.resin} for the week of`),
      })
      .check();
    await page
      .getByRole("checkbox", {
        name: new RegExp(`^Order ${fixture.bearing} for the week of`),
      })
      .check();
    await page.getByRole("button", { name: "Make draft orders" }).click();
    const made = page
      .getByRole("status")
      .filter({ hasText: "draft orders made" });
    await made.waitFor();
    expect(await made.getByRole("link").count()).toBe(2);
    expect(await made.textContent()).toMatch(/PO-\d{6}/);
    await keepShot(
      await saveScreenshot(page, "buying-plan-drafts"),
      "buying-plan-drafts",
    );
    await page.close();
  });

  it("lets a manager read the plan without ordering from it", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/buying-plan?weeks=4`);
    await page.getByRole("heading", { name: "Suggested orders" }).waitFor();
    expect(await page.getByRole("checkbox").count()).toBe(0);
    expect(
      await page.getByRole("button", { name: "Make draft orders" }).count(),
    ).toBe(0);
    await page.close();
  });

  it("lets a builder set a build order's planned start on its page", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(`${baseUrl()}/build-orders/${fixture.plannedOrder}`);
    const field = page.getByLabel("Building starts on");
    expect(await field.inputValue()).toBe(fixture.day(16));
    await field.fill(fixture.day(17));
    await page.getByRole("button", { name: "Save planned start" }).click();
    await page.getByText("planned start saved").waitFor();
    expect(await page.getByLabel("Building starts on").inputValue()).toBe(
      fixture.day(17),
    );
    await keepShot(
      await saveScreenshot(page, "build-order-planned-start"),
      "build-order-planned-start",
    );
    await page.close();
  });
});
