/**
 * The record-movement page at the store: an issue to a build order through the order's
 * own issue (picked from the open orders that need the item), the oldest lot offered
 * first, a receipt that starts at the item's usual place and shows the net weight as it
 * is typed, and a count that tells its difference with the sign.
 */
import fs from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { seriousAccessibilityViolations } from "../support/accessibility";
import { get, sendJson, signInAs } from "../support/app-client";
import {
  createPartItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
let baseUrl = "";
let storekeeper = "";
let manager = "";
let wire: { sku: string; id: number };
let part: { sku: string; id: number };
/** Sorts last by code: the oldest spool and most of the wire are here. */
let backRack = "";
/** Sorts first by code: the newest spool is here. */
let frontRack = "";
let orderId = 0;

const shots = "/work/notes/shots";

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
  manager = await signInAs("manager");
  backRack = await createLocation(uniqueCode("ZZ"), "Back rack");
  frontRack = await createLocation(uniqueCode("AA"), "Front rack");
  wire = await createWireItem(buyer);
  part = await createPartItem(buyer);
  // The older spool (received first): 6 kg at the back rack; the newer one 4.80 kg net at the front.
  await receive(storekeeper, {
    sku: wire.sku,
    lot: "SP-OLD",
    location: backRack,
    quantity: 6,
    unitCost: 15,
  });
  await receive(storekeeper, {
    sku: wire.sku,
    lot: "SP-NEW",
    location: frontRack,
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: 14.2,
  });
  await receive(storekeeper, {
    sku: part.sku,
    location: backRack,
    quantity: 20,
    unitCost: 2.5,
  });
  // 0.80 mm copper, 40 turns, active 50 mm, end turn 30 mm, 12 coils, 5 % scrap: 360.348 g per motor; × 5 = 1.802 kg.
  const design = await createDesign([
    {
      kind: "coil",
      itemId: wire.id,
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      coilsPerMotor: 12,
      scrapPercent: 5,
    },
  ]);
  const created = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity: 5 },
    builder,
  );
  expect(created.status).toBe(201);
  orderId = ((await created.json()) as { id: number }).id;
  const reserved = await sendJson(
    "POST",
    `/api/v1/build-orders/${orderId}/reserve`,
    {},
    builder,
  );
  expect(reserved.status, await reserved.clone().text()).toBe(200);
  page = await signIn(browser, "storekeeper");
  baseUrl = new URL(page.url()).origin;
  fs.mkdirSync(shots, { recursive: true });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function openRecord(type: string, sku: string) {
  await page.goto(
    `${baseUrl}/stock/record?type=${type}&sku=${encodeURIComponent(sku)}`,
  );
  await waitForHydration(page);
}

async function wireLine() {
  const response = await get(`/api/v1/build-orders/${orderId}`, manager);
  const order = (await response.json()) as {
    lines: { sku: string; reserved: number; issued: number }[];
  };
  return order.lines.find((line) => line.sku === wire.sku)!;
}

describe("issuing at the store", () => {
  it("offers the oldest lot first, where the order's reservation sits", async () => {
    await openRecord("issue", wire.sku);
    const radios = page.getByRole("radio");
    await expect.poll(() => radios.count()).toBe(2);
    expect(await radios.first().getAttribute("value")).toBe(
      `SP-OLD|${backRack}`,
    );
    expect(
      await page.getByRole("radio", { name: /lot SP-OLD/ }).isChecked(),
    ).toBe(true);
  });

  it("issues to a build order picked from the open orders needing the item, and the order shows it", async () => {
    await openRecord("issue", wire.sku);
    const picker = page.getByLabel("Build order", { exact: true });
    await picker.selectOption(String(orderId));
    const orderLink = page.getByRole("link", { name: `Open BO-${orderId}` });
    expect(await orderLink.getAttribute("href")).toBe(
      `/build-orders/${orderId}`,
    );
    // What the order holds here is named beside the lot it sits on.
    await page
      .getByRole("radio", { name: new RegExp(`held for BO-${orderId}`) })
      .waitFor();
    expect(
      await page.getByRole("radio", { name: /lot SP-OLD/ }).isChecked(),
    ).toBe(true);
    await page.getByLabel("Quantity").fill("0.5");
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.screenshot({
      path: `${shots}/h1-record-build-order-picker.png`,
      fullPage: true,
    });
    await page.getByRole("button", { name: `Issue to BO-${orderId}` }).click();
    const message = page
      .getByRole("status")
      .filter({ hasText: `to BO-${orderId}` });
    await message.waitFor();
    expect(await message.textContent()).toContain("0.500");

    // 1.802 kg held − 0.500 kg issued = 1.302 kg still held.
    expect(await wireLine()).toMatchObject({ reserved: 1.302, issued: 0.5 });
    await page.goto(`${baseUrl}/build-orders/${orderId}`);
    const issued = page.getByRole("table", {
      name: `Stock issued to BO-${orderId}`,
    });
    await issued.waitFor();
    expect(await issued.textContent()).toContain("SP-OLD");
  });

  it("refuses a build-order reference typed as free text, saying how to issue to it", async () => {
    await openRecord("issue", wire.sku);
    await page.getByRole("radio", { name: /lot SP-NEW/ }).check();
    await page.getByLabel("Quantity").fill("0.1");
    await page.getByLabel("Reference").fill(`BO-${orderId}`);
    await page.getByRole("button", { name: "Issue", exact: true }).click();
    const error = page.locator("#movement-reference-error");
    await error.waitFor();
    expect(await error.textContent()).toContain(
      `choose BO-${orderId} under “Build order”`,
    );
    expect(await wireLine()).toMatchObject({ issued: 0.5 });
  });
});

describe("weighing a spool back against a build order", () => {
  it("shows a refused weigh-back beside the gross weight (the form has no quantity then)", async () => {
    await openRecord("issue", wire.sku);
    await page
      .getByLabel("Build order", { exact: true })
      .selectOption(String(orderId));
    // The order holds nothing on the newer spool (its reservation sits on SP-OLD).
    await page.getByRole("radio", { name: /lot SP-NEW/ }).check();
    // SP-NEW: 4.80 kg net; 5.00 kg gross − 0.60 kg tare = 4.40 kg now, so 0.400 kg would leave it.
    await page.getByLabel("Spool gross weight now").fill("5");
    await page
      .getByRole("button", {
        name: new RegExp(`^Issue 0\\.400.* to BO-${orderId}$`),
      })
      .click();
    const error = page.locator("#movement-grossKg-error");
    await error.waitFor();
    expect(await error.textContent()).toContain(`BO-${orderId} holds no`);
    await page.screenshot({
      path: `${shots}/r1-record-weigh-back-refused.png`,
      fullPage: true,
    });
    expect(await wireLine()).toMatchObject({ reserved: 1.302, issued: 0.5 });
  });
});

describe("receiving at the store", () => {
  it("starts at the item's usual location, shows gross − tare as it is typed and names the currency", async () => {
    const [rows] = await testDatabase().query(
      "SELECT value FROM settings WHERE setting_key = 'company_currency'",
    );
    const currency = (rows as { value: string }[])[0]?.value ?? "EUR";
    await openRecord("receipt", wire.sku);
    // Most of the wire on hand is at the back rack (5.5 kg against 4.8 kg).
    expect(await page.getByLabel("Into location").inputValue()).toBe(backRack);
    await page.getByLabel("Gross weight").fill("5.4");
    await page.getByLabel("Tare weight").fill("0.6");
    // Engineering brief, worked check 6: 5.40 kg − 0.60 kg = 4.80 kg net.
    const net = page.getByRole("status").filter({ hasText: "Net weight" });
    await net.waitFor();
    expect(await net.textContent()).toContain("4.800\u00a0kg");
    await page.getByLabel(`Unit cost per kg (${currency})`).waitFor();
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.screenshot({
      path: `${shots}/h1-record-receipt.png`,
      fullPage: true,
    });
  });
});

describe("counting at the store", () => {
  it("tells a count's difference with its sign", async () => {
    await openRecord("count", part.sku);
    await page.getByLabel("Counted").fill("18");
    await page.getByRole("button", { name: "Record count" }).click();
    const message = page
      .getByRole("status")
      .filter({ hasText: "Count recorded" });
    await message.waitFor();
    expect(await message.textContent()).toContain("−2\u00a0pieces");
    await page.screenshot({
      path: `${shots}/h1-record-count.png`,
      fullPage: true,
    });
  });
});
