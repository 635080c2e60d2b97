/**
 * The manager's start page in Chromium: the cost per N·m of a released design, moved by
 * the what-if copper base and end-turn factor without a full page load and without
 * writing anything; the insight page with its charts; screenshots on screen and in print.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  collectErrors,
  createPricedReleasedDesign,
  designCounts,
  designRowText as designRowIn,
  waitForWhatIfHydration,
} from "../support/insight-fixtures";
import { closeTestDatabase } from "../support/test-database";

let browser: Browser;
let designName = "";
let designId = 0;

beforeAll(async () => {
  browser = await launchBrowser();
  ({ designName, designId } = await createPricedReleasedDesign());
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** The design's row in the table of cost per motor and per N·m. */
const designRowText = (page: Page) => designRowIn(page, designName);

describe("the manager's cost insight", () => {
  it("shows cost per N·m on the start page and moves it with the what-if", async () => {
    const page = await signIn(browser, "manager");
    const errors = collectErrors(page);
    await page.reload(); // the console is watched from here: the start page hydrates cleanly
    await page
      .getByRole("heading", { name: "Cost per N·m of released designs" })
      .waitFor();
    await page.getByRole("img", { name: /Cost per N·m by design/ }).waitFor();
    await waitForWhatIfHydration(page, errors);
    expect(await designRowText(page)).toMatch(/EUR\/N·m|no rated torque/);
    await page.evaluate(() => {
      (window as unknown as { stayed: boolean }).stayed = true;
    });
    const before = await designCounts();

    // Copper at 9.00/kg: 0.3742 + 4.00 + 1.50 = 5.8742 a motor, ÷ 0.5 N·m = 11.7484 →
    // 11.75 per N·m at display (worked in cost-insight.test.ts).
    await page.getByLabel("Copper base (EUR/kg)").fill("9");
    await page.getByRole("button", { name: "Work out the what-if" }).click();
    await page.waitForURL(/copperBase=9/);
    await expect.poll(() => designRowText(page)).toContain("11.75 EUR/N·m");
    await expect.poll(() => designRowText(page)).toContain("5.87 EUR");
    // The chart came drawn by the server and was kept through hydration; with new
    // figures it is drawn again, never left at the old ones.
    await expect
      .poll(() =>
        page.getByRole("img", { name: /Cost per N·m by design/ }).textContent(),
      )
      .toContain("11.75");

    // Copper at 10.00/kg: the coil's 29.94 g cost 0.0300 more → 5.9042, 11.8084 per N·m.
    await page.getByLabel("Copper base (EUR/kg)").fill("10");
    await page.getByRole("button", { name: "Work out the what-if" }).click();
    await expect.poll(() => designRowText(page)).toContain("11.81 EUR/N·m");
    // The what-if's own status line (the shell's flash line is a status region too).
    expect(
      (await page.getByRole("status").allTextContents()).join(" "),
    ).toContain("What-if, not saved");

    // End turns doubled on top (copper back at 9.00): 9.1 m of wire, 40.66 g at 12.50/kg
    // = 0.5083 → 6.0083 a motor, 12.0166 → 12.02 per N·m.
    await page.getByLabel("Copper base (EUR/kg)").fill("9");
    await page.getByLabel(`End-turn factor for ${designName}`).fill("2");
    await page.getByRole("button", { name: "Work out the what-if" }).click();
    await expect.poll(() => designRowText(page)).toContain("12.02 EUR/N·m");
    expect(page.url()).toContain(`endTurn.${designId}=2`);

    // No full page load happened, and nothing was written.
    expect(
      await page.evaluate(
        () => (window as unknown as { stayed?: boolean }).stayed,
      ),
    ).toBe(true);
    expect(await designCounts()).toEqual(before);

    await page.setViewportSize({ width: 1280, height: 900 });
    await saveScreenshot(page, "manager-insight-start");
    await page.emulateMedia({ media: "print" });
    await saveScreenshot(page, "manager-insight-start-print");
    await page.emulateMedia({ media: "screen" });
    expect(errors).toEqual([]);
    await page.close();
  });

  it("shows the insight page with its charts and figures, on screen and in print", async () => {
    const page = await signIn(browser, "manager");
    const errors = collectErrors(page);
    await page.goto(`${baseUrl()}/insight?copperBase=9`);
    await page
      .getByRole("heading", { level: 1, name: "Cost insight" })
      .waitFor();
    await page
      .getByRole("img", { name: /Stock value at the end of each week/ })
      .waitFor();
    await waitForWhatIfHydration(page, errors);
    for (const chart of [
      /Cost per N·m by design/,
      /Cost per motor by month/,
      /Stock value by kind of item/,
    ])
      expect(await page.getByRole("img", { name: chart }).count()).toBe(1);
    expect(await designRowText(page)).toContain("11.75 EUR/N·m");
    await page.setViewportSize({ width: 1280, height: 900 });
    await saveScreenshot(page, "manager-insight-page");
    await page.emulateMedia({ media: "print" });
    await saveScreenshot(page, "manager-insight-page-print");
    expect(errors).toEqual([]);
    await page.close();
  });
});
