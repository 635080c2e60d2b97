import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let sku = "";
let bin = "";
beforeAll(async () => {
  browser = await launchBrowser();
  bin = await createLocation(
    uniqueCode("RACK"),
    "Test rack for the spool journey",
  );
  sku = uniqueCode("CU");
  const buyer = await signInAs("buyer");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    {
      kind: "wire",
      sku,
      name: "Enamelled copper 0.50 mm",
      conductor: "copper",
      standard: "IEC",
      size: "0.5",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
    },
    buyer,
  );
  expect(created.status).toBe(201);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("storekeeper at the bench", () => {
  it("receives a spool, issues by weighing it back and sees the balance", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.setViewportSize({ width: 1024, height: 1366 }); // the store's tablet, upright
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Record movement" })
      .click();
    await page.getByRole("link", { name: "Receipt" }).click();
    await page.getByLabel("Item SKU").fill(sku);
    await page.getByRole("button", { name: "Find item" }).click();
    await page.getByLabel("Spool lot number").waitFor();
    await page.getByLabel("Into location").selectOption(bin);
    await page.getByLabel("Spool lot number").fill("SP-900");
    // Engineering brief, worked check 6: gross 5.40 kg, tare 0.60 kg → net 4.80 kg.
    await page.getByLabel("Gross weight").fill("5.4");
    await page.getByLabel("Tare weight").fill("0.6");
    await page.getByLabel("Unit cost per kg").fill("14.2");
    await saveScreenshot(page, "storekeeper-receipt");
    await page.getByRole("button", { name: "Receive" }).click();
    const receipt = page
      .getByRole("status")
      .filter({ hasText: "Receipt recorded" });
    await receipt.waitFor();
    expect(await receipt.textContent()).toContain("4.800");

    await page.getByRole("link", { name: "Issue" }).click();
    await page.getByRole("radio", { name: /lot SP-900/ }).check();
    await page.getByLabel("Spool gross weight now").fill("4.15");
    // Net now 3.55 kg, so 1.250 kg left the spool. 0.50 mm copper: 0.19635 mm² × 8.89 g/cm³ (IEC 60028)
    // = 1.7455 g/m bare, so 1.250 kg is at most 716 m.
    const preview = await page
      .getByRole("status")
      .filter({ hasText: "the spool held" })
      .textContent();
    expect(preview).toContain("1.250");
    expect(preview).toMatch(/≈ up to 716\s?m/);
    await saveScreenshot(page, "storekeeper-weigh-back");
    await page.getByRole("button", { name: /Issue 1\.250/ }).click();
    const issued = page
      .getByRole("status")
      .filter({ hasText: "Issue recorded" });
    await issued.waitFor();
    expect(await issued.textContent()).toContain("On hand now 3.550");
    await page.getByRole("radio", { name: /lot SP-900/ }).waitFor();
    expect(
      await page
        .getByRole("radio", { name: /lot SP-900/ })
        .locator("xpath=..")
        .textContent(),
    ).toContain("3.550");
    await page.close();
  });
});
