/**
 * A lot on hold as people see it: the item page marks the held spool with its reason and
 * shows the held quantity beside reserved; the stock list has it in its own column.
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import { createWireItem, receive } from "../support/build-order-fixtures";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let wire: { sku: string; id: number };
const heldSpool = uniqueCode("SP");
const reason = "Pinholes found on the high-voltage test of the first coil";

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const rack = await createLocation(uniqueCode("RACK"), "Wire rack");
  wire = await createWireItem(buyer);
  // Two spools: 4.80 kg net (5.40 gross − 0.60 tare) and 6.00 kg net; the first is held.
  await receive(storekeeper, {
    sku: wire.sku,
    lot: heldSpool,
    location: rack,
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: 14.2,
  });
  await receive(storekeeper, {
    sku: wire.sku,
    lot: uniqueCode("SP"),
    location: rack,
    quantity: 6,
    unitCost: 14.2,
  });
  const held = await sendJson(
    "POST",
    `/api/v1/lots/${heldSpool}/hold?sku=${wire.sku}`,
    { reason },
    storekeeper,
  );
  expect(held.status, await held.clone().text()).toBe(200);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("a lot on hold on the pages", () => {
  it("is marked on the item page with its reason, and held beside reserved", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${inject("baseUrl")}/stock/items/${wire.sku}`);
    const balances = page.getByRole("table", {
      name: `On hand of ${wire.sku} by location and lot`,
    });
    const heldRow = balances.getByRole("row").filter({ hasText: heldSpool });
    await heldRow.getByText("On hold", { exact: true }).waitFor();
    expect(await heldRow.textContent()).toContain(reason);
    expect(
      await heldRow.getByText("On hold", { exact: true }).getAttribute("title"),
    ).toBe(reason);
    // 10.8 kg on hand, 4.8 kg of it on hold: 6.0 kg available (worked by hand).
    const figures = page.locator("dl").first();
    expect(await figures.textContent()).toMatch(/On hold\s*4\.800/);
    expect(await figures.textContent()).toMatch(/Available\s*6\.000/);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "lot-hold-item-page");

    await page.goto(`${inject("baseUrl")}/stock?search=${wire.sku}`);
    const list = page.getByRole("row").filter({ hasText: wire.sku });
    expect(await list.textContent()).toContain("4.800");
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await saveScreenshot(page, "lot-hold-stock-list");
  });
});
