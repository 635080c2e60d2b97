/**
 * Hostile text in a real browser: an item name and movement note carrying
 * script and an image with an error handler are shown as text on the pages
 * rendered by the server and by the client (the stock table, the journal, a
 * design's line table); no dialog opens, no element is made from the text,
 * and the Content-Security-Policy reports nothing (checked when the browser
 * closes, see tests/support/browser.ts).
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

const hostile = `<script>alert(1)</script>"><img src=x onerror=alert(2)>'; DROP TABLE items; --`;
const sku = uniqueCode("XSS");
let designId = 0;

let browser: Browser;
beforeAll(async () => {
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const builder = await signInAs("builder");
  const item = await sendJson(
    "POST",
    "/api/v1/items",
    { kind: "part", sku, name: hostile, unit: "pcs" },
    buyer,
  );
  expect(item.status, await item.clone().text()).toBe(201);
  const receipt = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "receipt",
      sku,
      location: await createLocation(uniqueCode("XS")),
      quantity: 2,
      unitCost: 1,
      note: hostile,
    },
    storekeeper,
  );
  expect(receipt.status, await receipt.clone().text()).toBe(201);
  const design = await sendJson(
    "POST",
    "/api/v1/designs",
    {
      name: `Hostile ${uniqueCode("D")}`,
      notes: hostile,
      poles: 14,
      slots: 12,
      ratedCurrentA: 10,
      torqueBasis: "estimated",
      insulationClassC: 155,
    },
    builder,
  );
  expect(design.status, await design.clone().text()).toBe(201);
  designId = ((await design.json()) as { id: number }).id;
  const lines = await sendJson(
    "PUT",
    `/api/v1/designs/${designId}/revisions/1`,
    { lines: [{ kind: "part", sku, quantityPerMotor: 2 }] },
    builder,
  );
  expect(lines.status, await lines.clone().text()).toBe(200);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

declare global {
  interface Window {
    __reactRouterRouteModules?: unknown;
  }
}

/** Opens a page (or follows a client-side link) and checks the text stayed text. */
async function expectShownAsText(page: Page, dialogs: string[]) {
  await page.waitForFunction(
    () => window.__reactRouterRouteModules !== undefined,
  );
  await page.waitForLoadState("networkidle");
  await expect(
    page.getByText(hostile, { exact: false }).first().isVisible(),
  ).resolves.toBe(true);
  expect(await page.locator('img[src="x"]').count()).toBe(0);
  // Every script element is one of React Router's, with the request's nonce.
  expect(
    await page.evaluate(
      () => [...document.scripts].filter((script) => !script.nonce).length,
    ),
  ).toBe(0);
  expect(dialogs).toEqual([]);
}

describe("hostile text in the browser", () => {
  it("stays text on the server-rendered and client-rendered pages", async () => {
    const page = await signIn(browser, "manager");
    const dialogs: string[] = [];
    page.on("dialog", async (dialog) => {
      dialogs.push(dialog.message());
      await dialog.dismiss();
    });
    const base = inject("baseUrl");

    await page.goto(`${base}/stock/items/${sku}`);
    await expectShownAsText(page, dialogs);
    await saveScreenshot(page, "security-hostile-item");

    // The stock list filtered on the client side of the app (a client navigation).
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Stock", exact: true })
      .click();
    await page.waitForURL(`${base}/stock`);
    await page.goto(`${base}/stock?search=${sku}`);
    await expectShownAsText(page, dialogs);

    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Journal" })
      .click();
    await page.waitForURL(`${base}/stock/journal`);
    // The address changes before React draws the journal; the stock list before it shows the text too.
    await page
      .getByRole("heading", { level: 1, name: "Movement journal" })
      .waitFor();
    await expectShownAsText(page, dialogs);

    await page.goto(`${base}/designs/${designId}/revisions/1`);
    await expectShownAsText(page, dialogs);
    await page.close();
  });
});
