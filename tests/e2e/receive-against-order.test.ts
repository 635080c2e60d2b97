/**
 * A storekeeper receives one spool of a sent purchase order on /stock/receive: from the
 * record page's link, by typing the order's number, weighing the spool (net shown), a
 * refusal past the tolerance that keeps what was typed, then the receipt and its message,
 * and the journal naming the order.
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newPerson, signInAs } from "../support/app-client";
import { createWireItem } from "../support/build-order-fixtures";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  addRates,
  createOrder,
  createOrderSupplier,
  uniqueCurrency,
} from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let wire: { sku: string; id: number };
let bin = "";
let order: { id: number; lineIds: number[] };
let person: Awaited<ReturnType<typeof newPerson>>;

beforeAll(async () => {
  browser = await launchBrowser();
  person = await newPerson("storekeeper");
  bin = await createLocation(uniqueCode("BAY"), "Wire bay");
  wire = await createWireItem(await signInAs("buyer"));
  const currency = uniqueCurrency();
  await addRates(currency, [{ validFrom: "2020-01-01", rate: "0.920000" }]);
  order = await createOrder({
    supplierId: await createOrderSupplier(currency),
    currency,
    userId: person.id,
    lines: [{ itemId: wire.id, quantity: "20.000", unitPrice: "12.5000" }],
  });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("receiving against an order", () => {
  it("weighs one spool in against the order's line", async () => {
    const number = `PO-${String(order.id).padStart(6, "0")}`;
    const page = await signIn(browser, person);
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Record movement" })
      .click();
    await page.getByRole("link", { name: "Receipt" }).click();
    await page
      .getByRole("link", { name: "Receive against an order" })
      .waitFor();
    await saveScreenshot(page, "record-receipt-order-link");
    await page.getByRole("link", { name: "Receive against an order" }).click();
    await page
      .getByRole("heading", { name: "Receive against an order" })
      .waitFor();
    // The order is listed; typing its bare number finds it too.
    await page.getByRole("link", { name: number }).waitFor();
    await page.getByLabel("Order number").fill(String(order.id));
    await page.getByRole("button", { name: "Show the order" }).click();
    const line = page.getByRole("region", { name: `Line 1, ${wire.sku}` });
    await line.waitFor();
    // 12.5000 in the order's currency × 0.920000 = 11.50 per kg in the company currency.
    expect(await line.textContent()).toMatch(/Unit cost11\.50\s[A-Z]{3}\/kg/);
    expect(await line.textContent()).toContain("at most 22.000");

    await page.getByLabel("Spool lot number").fill("SP-PO-1");
    await page.getByLabel("Into location").selectOption(bin);
    // Past the tolerance first: 30.0 − 0.6 = 29.4 kg against at most 20 × 1.10 = 22 kg.
    await page.getByLabel("Gross weight").fill("30");
    await page.getByLabel("Tare weight").fill("0.6");
    await page
      .getByRole("button", { name: `Receive against ${number}` })
      .click();
    await page.getByText("at most 22 kg may be received").waitFor();
    expect(await page.getByLabel("Spool lot number").inputValue()).toBe(
      "SP-PO-1",
    );

    // Engineering brief, worked check 6: gross 5.40 kg, tare 0.60 kg → net 4.80 kg.
    await page.getByLabel("Gross weight").fill("5.4");
    const net = page.getByRole("status").filter({ hasText: "Net weight" });
    expect(await net.textContent()).toContain("4.800");
    await saveScreenshot(page, "receive-against-order");
    await page
      .getByRole("button", { name: `Receive against ${number}` })
      .click();
    await page
      .getByText(
        `Received 1\u00a0spool or lot against ${number}. The order is now partly received.`,
      )
      .waitFor();
    const after = page.getByRole("region", { name: `Line 1, ${wire.sku}` });
    expect(await after.textContent()).toMatch(/Received4\.800/);

    await page.goto(
      page
        .url()
        .replace(/\/stock\/receive.*$/, `/stock/journal?sku=${wire.sku}`),
    );
    const link = page.getByRole("link", { name: number });
    await link.waitFor();
    expect(await link.getAttribute("href")).toBe(
      `/purchase-orders/${order.id}`,
    );
    await saveScreenshot(page, "journal-receipt-order");
  });
});
