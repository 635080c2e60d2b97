/**
 * What is on order, in Chromium: the stock list's column, the item page's figures and
 * open lines, the late order lines page, and a supplier's ordering settings (checked in
 * the browser field by field) with its delivery record.
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
import {
  dayFromToday,
  insertOrder,
  supplierWithLeadTime,
} from "../support/open-order-fixtures";
import {
  closeTestDatabase,
  createPerson,
  uniqueCode,
} from "../support/test-database";
import { demoPassword } from "../../seed/demo-people";
import { purchaseOrderNumber } from "~/purchase-orders/purchase-order-status";

let browser: Browser;
let supplierId = 0;
let supplierName = "";
let sku = "";
let lateOrder = 0;

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const userId = await createPerson({
    email: `po-writer-${uniqueCode("E").toLowerCase()}@turnledger.test`,
    roles: ["buyer"],
    password: demoPassword(),
  });
  supplierName = `Harz Wickeldraht ${uniqueCode("S")}`;
  supplierId = await supplierWithLeadTime(supplierName, 21);
  sku = uniqueCode("CU-0.50");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: "Copper 0.50 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.5",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
      reorderPoint: 20,
      reorderQuantity: 40,
    },
    buyer,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const day = (days: number) => new Date(`${dayFromToday(days)}T09:00:00Z`);
  lateOrder = (
    await insertOrder({
      supplierId,
      userId,
      status: "partly_received",
      lines: [
        {
          sku,
          quantity: "30",
          received: "12.4",
          expectedDate: dayFromToday(-6),
        },
      ],
    })
  ).id;
  await insertOrder({
    supplierId,
    userId,
    status: "sent",
    lines: [{ sku, quantity: "40", expectedDate: dayFromToday(12) }],
  });
  await insertOrder({
    supplierId,
    userId,
    status: "received",
    lines: [
      {
        sku,
        quantity: "25",
        received: "25.6",
        expectedDate: dayFromToday(-60),
        completedAt: day(-62),
      },
      {
        sku,
        quantity: "25",
        received: "25",
        expectedDate: dayFromToday(-45),
        completedAt: day(-40),
      },
    ],
  });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("on order in the browser", () => {
  it("shows on order on the stock list and the item page, with the open lines", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(`${baseUrl()}/stock?search=${encodeURIComponent(sku)}`);
    await waitForHydration(page);
    const table = page.getByRole("table", { name: "Stock items" });
    await expect
      .poll(() => table.getByRole("columnheader").allTextContents())
      .toContain("On order");
    // 30 − 12.4 = 17.6 kg and 40 kg: 57.600 kg on order.
    await expect
      .poll(() => table.getByRole("row").nth(1).textContent())
      .toContain("57.600\u00a0kg");
    await saveScreenshot(page, "on-order-stock-list");

    await page.goto(`${baseUrl()}/stock/items/${encodeURIComponent(sku)}`);
    await waitForHydration(page);
    const panel = page.getByRole("region", { name: "On order" });
    await expect
      .poll(() => panel.textContent())
      .toContain("57.600\u00a0kg still to come on sent orders.");
    const lines = panel.getByRole("table");
    expect(await lines.getByRole("row").count()).toBe(3);
    expect(await lines.getByRole("row").nth(1).textContent()).toContain(
      "6 days late",
    );
    await expect
      .poll(() =>
        panel
          .getByRole("link", { name: purchaseOrderNumber(lateOrder) })
          .getAttribute("href"),
      )
      .toBe(`/purchase-orders/${lateOrder}`);
    await saveScreenshot(page, "on-order-item-page");
    await page.close();
  });

  it("lists the late lines for everyone signed in", async () => {
    const page = await signIn(browser, "storekeeper");
    // From the menu's purchase orders to their late lines.
    await page.getByRole("link", { name: "Purchase orders" }).click();
    await page.waitForURL(`${baseUrl()}/purchase-orders`);
    await waitForHydration(page);
    await page.getByRole("link", { name: "Late lines", exact: true }).click();
    await page.waitForURL(`${baseUrl()}/purchase-orders/late`);
    await waitForHydration(page);
    const row = page
      .getByRole("row")
      .filter({ hasText: purchaseOrderNumber(lateOrder) });
    await expect.poll(() => row.textContent()).toContain("6 days late");
    expect(await row.textContent()).toContain(supplierName);
    expect(await row.textContent()).toContain("17.600\u00a0kg");
    await saveScreenshot(page, "on-order-late-lines");
    await page.close();
  });

  it("keeps a supplier's ordering settings, with messages beside bad fields, and shows its deliveries", async () => {
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/suppliers/${supplierId}`);
    await waitForHydration(page);
    const deliveries = page.getByRole("region", { name: /Deliveries/ });
    // Two finished lines: both in full, one on time.
    await expect
      .poll(() => deliveries.textContent())
      .toContain("50 % (1 of 2 lines)");
    expect(await deliveries.textContent()).toContain("100 % (2 of 2 lines)");

    const form = page.getByRole("region", { name: "Edit supplier" });
    await form.getByLabel("E-mail for orders").fill("orders-at-harz");
    await form.getByLabel("Over-delivery allowed, wire by weight").fill("120");
    await form.getByRole("button", { name: "Save supplier" }).click();
    await expect
      .poll(() => form.textContent())
      .toContain("Give a valid e-mail address for orders.");
    expect(await form.textContent()).toContain(
      "The wire tolerance is at most 100 %.",
    );

    await form.getByLabel("E-mail for orders").fill("orders@harz.example");
    await form.getByLabel("Over-delivery allowed, wire by weight").fill("8");
    await form
      .getByLabel("Wire's metal base is fixed")
      .selectOption("delivery");
    await form.getByRole("button", { name: "Save supplier" }).click();
    await expect
      .poll(() => page.locator("dl").first().textContent())
      .toContain("fixed at delivery");
    expect(await page.locator("dl").first().textContent()).toContain(
      "orders@harz.example",
    );
    expect(await page.locator("dl").first().textContent()).toContain(
      "up to 8\u00a0%",
    );
    await saveScreenshot(page, "on-order-supplier-page");
    await page.close();
  });
});
