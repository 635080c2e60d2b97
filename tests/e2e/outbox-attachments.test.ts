/**
 * A purchase order sent by e-mail, seen by an admin in Chromium: the outbox page names
 * the order's PDF and CSV beside the message.
 */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { priceLines, suppliers } from "~/db/schema";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import { createPartItem } from "../support/build-order-fixtures";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  closeTestDatabase,
  testDb,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("the admin's outbox", () => {
  it("names the files sent with a purchase order", async () => {
    const buyer = await signInAs("buyer");
    const item = await createPartItem(buyer, "pcs", "Shaft collar 8 mm");
    const orderEmail = `${uniqueCode("po").toLowerCase()}@supplier.test`;
    const [supplier] = await testDb()
      .insert(suppliers)
      .values({ name: uniqueCode("Collar Works"), currency: "EUR", orderEmail })
      .$returningId();
    await testDb().insert(priceLines).values({
      supplierId: supplier!.id,
      itemId: item.id,
      supplierSku: "CW-8",
      currency: "EUR",
      unitPrice: "0.8500",
      minQuantity: "0.000",
      validFrom: "2020-01-01",
    });
    const created = await sendJson(
      "POST",
      "/api/v1/purchase-orders",
      { supplierId: supplier!.id, lines: [{ sku: item.sku, quantity: 200 }] },
      buyer,
    );
    expect(created.status).toBe(201);
    const { id, number } = (await created.json()) as {
      id: number;
      number: string;
    };
    const sent = await sendJson(
      "POST",
      `/api/v1/purchase-orders/${id}/send`,
      undefined,
      buyer,
    );
    expect(sent.status).toBe(200);

    const page = await signIn(browser, "admin");
    await page.goto(`${baseUrl()}/admin/outbox`);
    await waitForHydration(page);
    const row = page.getByRole("row").filter({ hasText: orderEmail });
    await expect
      .poll(() => row.getByText(/^Attached:/).textContent())
      .toMatch(
        new RegExp(
          `Attached: ${number}\\.pdf \\([\\d.,]+\\sKB\\), ${number}\\.csv`,
        ),
      );
    await row.scrollIntoViewIfNeeded();
    await saveScreenshot(page, "admin-outbox-attachments");
    await page.close();
  });
});
