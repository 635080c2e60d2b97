/**
 * Each person's locale and time zone, in Chromium: a new person's first sign-in
 * takes them from the browser; the account page changes them by keyboard alone;
 * then the stock and design pages write numbers, money, days and times the
 * person's way, number fields take their decimal comma, and the pages hydrate
 * without a mismatch.
 *
 * Expected texts: German marks as CLDR gives them (from memory: decimal comma,
 * point between thousands); Helsinki is UTC+2 in December (GNU date:
 * `TZ=Europe/Helsinki date -d 2026-12-02T14:05:00Z` → 16:05 EET, "OEZ" in German).
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, newPerson, sendJson, signInAs } from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  collectErrors,
  createPricedReleasedDesign,
} from "../support/insight-fixtures";
import { chooseOption, press, typeInto } from "../support/keyboard";
import { readable } from "../support/page-text";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let fixture: Awaited<ReturnType<typeof createPricedReleasedDesign>>;

beforeAll(async () => {
  browser = await launchBrowser();
  fixture = await createPricedReleasedDesign();
  // 1,234.5 kg of the fixture's wire on hand, so the item page has a grouped decimal to show.
  const storekeeper = await signInAs("storekeeper");
  const receipt = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "receipt",
      sku: fixture.wire.sku,
      quantity: 1234.5,
      location: await createLocation(uniqueCode("LC")),
      lot: uniqueCode("SP"),
      unitCost: 14.2,
    },
    storekeeper,
  );
  expect(receipt.status, await receipt.clone().text()).toBe(201);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const pageText = async (page: Page) =>
  readable(await page.locator("main").textContent());

describe("a person's locale and time zone", () => {
  it("come from the browser at the first sign-in", async () => {
    const person = await newPerson("storekeeper");
    const context = await browser.newContext({
      locale: "de-DE",
      timezoneId: "Europe/Berlin",
      viewport: { width: 1280, height: 900 },
    });
    const page = await context.newPage();
    await page.goto(`${baseUrl()}/sign-in`);
    await waitForHydration(page);
    await page.getByLabel("E-mail").fill(person.email);
    await page.getByLabel("Password").fill(person.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL(`${baseUrl()}/`);
    await page.goto(`${baseUrl()}/account`);
    await waitForHydration(page);
    expect(
      await page.getByLabel("Numbers and days written as").inputValue(),
    ).toBe("de-DE");
    expect(await page.getByLabel("Time zone").inputValue()).toBe(
      "Europe/Berlin",
    );
    await context.close();
  });

  it("are chosen on the account page by keyboard and followed on the stock and design pages", async () => {
    const page = await signIn(browser, "admin");
    const errors = collectErrors(page);
    await page.goto(`${baseUrl()}/account`);
    await waitForHydration(page);
    const panel = page.getByRole("region", {
      name: "Numbers, days and times",
    });
    await chooseOption(
      page,
      panel.getByLabel("Numbers and days written as"),
      "Deutsch (Deutschland) — German",
    );
    await chooseOption(page, panel.getByLabel("Time zone"), "Europe/Helsinki");
    await press(page, panel.getByRole("button", { name: "Save" }));
    await expect
      .poll(async () =>
        readable((await page.getByRole("status").allTextContents()).join(" ")),
      )
      .toContain("numbers, days and times now show your way");
    // The panel's own example: money and 2 Dec 2026 14:05 UTC, in German and Helsinki time.
    expect(await pageText(page)).toContain("1.234,50");
    expect(await pageText(page)).toContain("2. Dez. 2026, 16:05 OEZ");
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // The item page: 1,234.5 kg on hand reads with a decimal comma and a point between thousands.
    await page.goto(
      `${baseUrl()}/stock/items/${encodeURIComponent(fixture.wire.sku)}`,
    );
    await waitForHydration(page);
    expect(await pageText(page)).toMatch(/1\.234,5\d*\s?kg/);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "locale-de-item");

    // A number field takes the decimal comma: a reorder point of 12,5 kg.
    const reorder = page.getByRole("region", { name: /Reorder/ });
    await typeInto(page, reorder.getByLabel(/Reorder point/), "12,5");
    await typeInto(page, reorder.getByLabel(/Reorder quantity/), "25");
    await press(page, reorder.getByRole("button", { name: /Save/ }));
    await expect
      .poll(async () =>
        readable((await page.getByRole("status").allTextContents()).join(" ")),
      )
      .toContain("Reorder point and quantity saved.");
    await expect
      .poll(() => reorder.getByLabel(/Reorder point/).inputValue())
      .toBe("12,5");

    await page.goto(`${baseUrl()}/stock`);
    await waitForHydration(page);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "locale-de-stock");

    // The design page: its rated torque 0.5 N·m and its costs with decimal commas.
    await page.goto(`${baseUrl()}/designs/${fixture.designId}/revisions/1`);
    await waitForHydration(page);
    const design = await pageText(page);
    expect(design).toMatch(/0,50*\s?N·m/);
    expect(design).not.toMatch(/\d\.\d{2}\s?EUR/);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "locale-de-design");

    // Server and browser wrote the same texts: no hydration error on any page.
    expect(errors).toEqual([]);
    await page.close();
  });
});
