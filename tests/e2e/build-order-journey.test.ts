import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { signInAs } from "../support/app-client";
import {
  createMagnetItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let designName = "";
let wireSku = "";
let magnetSku = "";
beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const rack = await createLocation(uniqueCode("WR"), "Wire rack for builds");
  const drawer = await createLocation(uniqueCode("MD"), "Magnet drawer");
  const wire = await createWireItem(buyer);
  const magnet = await createMagnetItem(buyer);
  wireSku = wire.sku;
  magnetSku = magnet.sku;
  // Spool gross 5.40 kg, tare 0.60 kg → 4.80 kg net (engineering brief, worked check 6).
  await receive(storekeeper, {
    sku: wire.sku,
    lot: "SP-710",
    location: rack,
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: 14.2,
    spoolType: "DIN 250",
  });
  await receive(storekeeper, {
    sku: magnet.sku,
    location: drawer,
    quantity: 120,
    unitCost: 0.85,
  });
  designName = uniqueCode("Hub motor 12N14P");
  await createDesign(
    [
      {
        kind: "coil",
        itemId: wire.id,
        turns: 40,
        activeLengthMm: 50,
        endTurnLengthMm: 30,
        coilsPerMotor: 12,
        scrapPercent: 5,
      },
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 14 },
    ],
    { name: designName },
  );
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("a build order from the builder to the store", () => {
  let orderPath = "";

  it("the builder creates a build order and reserves its stock", async () => {
    const page = await signIn(browser, "builder");
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Build orders" })
      .click();
    await page
      .getByRole("heading", { name: "Build orders", level: 1 })
      .waitFor();
    await page
      .getByLabel("Design revision")
      .selectOption({ label: `${designName} · rev. 1` });
    await page.getByLabel("Motors to build").fill("4");
    await saveScreenshot(page, "build-orders-list");
    await page.getByRole("button", { name: "Create build order" }).click();
    // The new order's page, headed with the design.
    await page
      .getByRole("heading", { level: 1, name: new RegExp(designName) })
      .waitFor();
    orderPath = new URL(page.url()).pathname;
    expect(orderPath).toMatch(/^\/build-orders\/\d+$/);
    // 12 coils of worked check 4 with 5 % scrap: 360.348 g per motor × 4 = 1.441392 kg → 1.442 kg.
    const wireRow = page.getByRole("row", { name: new RegExp(wireSku) });
    expect(await wireRow.textContent()).toContain("1.442");
    expect(
      await page
        .getByRole("row", { name: new RegExp(magnetSku) })
        .textContent(),
    ).toContain("56");
    await saveScreenshot(page, "build-order-draft");

    await page.getByRole("button", { name: "Reserve stock" }).click();
    const held = page.getByRole("status").filter({ hasText: "Held for" });
    await held.waitFor();
    expect(await held.textContent()).toContain(`1.442\u00a0kg of ${wireSku}`);
    expect(await page.getByText("Stock held").first().isVisible()).toBe(true);
    await saveScreenshot(page, "build-order-reserved");
    await page.close();
  });

  it("the storekeeper issues against it, weighing the spool back", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.setViewportSize({ width: 1280, height: 1000 });
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Build orders" })
      .click();
    await page.getByRole("link", { name: /^BO-/ }).first().waitFor();
    await page.locator(`a[href="${orderPath}"]`).click();
    await page.getByRole("heading", { name: "Issue to the bench" }).waitFor();
    // The storekeeper cannot reserve or cancel: those are the builder's.
    expect(
      await page.getByRole("button", { name: "Reserve stock" }).count(),
    ).toBe(0);
    // The oldest lot of the first item held is suggested.
    const spool = page.getByRole("radio", { name: /lot SP-710/ });
    expect(await spool.isChecked()).toBe(true);
    // Net 4.80 kg; weighed at 4.60 kg gross − 0.60 kg tare = 4.00 kg: 0.800 kg left the spool.
    await page.getByLabel("Spool gross weight now").fill("4.6");
    const preview = page
      .getByRole("status")
      .filter({ hasText: "the spool held" });
    expect(await preview.textContent()).toContain("0.800");
    await saveScreenshot(page, "build-order-weigh-back");
    await page.getByRole("button", { name: /Issue 0\.800/ }).click();
    const issued = page.getByRole("status").filter({ hasText: "Issued 0.800" });
    await issued.waitFor();
    expect(await issued.textContent()).toContain("lot SP-710");
    expect(await page.getByText("Being built").first().isVisible()).toBe(true);

    // Magnets by count.
    await page.getByRole("radio", { name: new RegExp(magnetSku) }).check();
    await page.getByLabel(/^Quantity/).fill("56");
    await page.getByRole("button", { name: /^Issue to BO-/ }).click();
    const magnets = page.getByRole("status").filter({ hasText: "Issued 56" });
    await magnets.waitFor();
    expect(
      await page
        .getByRole("row", { name: new RegExp(magnetSku) })
        .first()
        .textContent(),
    ).toContain("56");
    await page.getByRole("heading", { name: "Issued to the build" }).waitFor();
    await saveScreenshot(page, "build-order-issued");
    await page.close();
  });

  it("the builder completes the build and sees planned against used", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(new URL(orderPath, page.url()).toString());
    await waitForHydration(page);
    await page.getByRole("button", { name: "Complete build" }).click();
    await page.getByRole("status").filter({ hasText: "built" }).waitFor();
    await page.getByRole("heading", { name: "Planned and used" }).waitFor();
    expect(await page.getByText("Actual cost per motor").isVisible()).toBe(
      true,
    );
    await saveScreenshot(page, "build-order-complete");
    await page.close();
  });

  it("a builder sees what is short, nothing is held, and cancels", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(new URL("/build-orders", page.url()).toString());
    await waitForHydration(page);
    await page
      .getByLabel("Design revision")
      .selectOption({ label: `${designName} · rev. 1` });
    // 10 motors need 140 magnets; 120 came in and 56 went to the first build: 64 are free.
    await page.getByLabel("Motors to build").fill("10");
    await page.getByRole("button", { name: "Create build order" }).click();
    await page.getByRole("button", { name: "Reserve stock" }).waitFor();
    await page.getByRole("button", { name: "Reserve stock" }).click();
    const alert = page.getByRole("alert");
    await alert.waitFor();
    expect(await alert.textContent()).toContain("Nothing was reserved");
    const shortRow = page
      .getByRole("table", { name: "Short" })
      .getByRole("row", { name: new RegExp(magnetSku) });
    expect(await shortRow.textContent()).toContain("76\u00a0pieces");
    await saveScreenshot(page, "build-order-short");
    await page.getByRole("button", { name: "Cancel build order" }).click();
    // The shared confirmation dialog asks once before the order is cancelled.
    await page
      .getByRole("dialog", { name: /^Cancel BO-\d+\?$/ })
      .getByRole("button", { name: /^Cancel BO-\d+$/ })
      .click();
    await page.getByRole("status").filter({ hasText: "cancelled" }).waitFor();
    expect(await page.getByText("Cancelled").first().isVisible()).toBe(true);
    const cancelledId = new URL(page.url()).pathname.split("/").pop();
    const builtId = orderPath.split("/").pop();
    await page.getByRole("link", { name: "← Build orders" }).click();
    await page
      .getByRole("row", { name: new RegExp(`BO-${cancelledId}\\b`) })
      .waitFor();
    expect(
      await page
        .getByRole("row", { name: new RegExp(`BO-${builtId}\\b`) })
        .textContent(),
    ).toContain("Built");
    await saveScreenshot(page, "build-orders-list-filled");
    await page.close();
  });
});
