/**
 * Labels and scanning in Chromium: a spool received on the record page → its label (62 ×
 * 100 mm and A4) → the label's QR code, read from the page's pixels, holds the lot's code →
 * typed by a keyboard-wedge scanner (keys and Enter) into the record page's scan field, it
 * fills item, lot and location without submitting anything; a foreign code fills nothing
 * and says so; the camera reads the same QR code from a fake camera (a Y4M file), and a
 * browser without a camera is told so plainly. axe-core finds no serious violation.
 */
import fs from "node:fs";
import path from "node:path";
import { and, count, eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { items, lots, stockMovements } from "~/db/schema";
import { baseUrl, newPerson, sendJson, signInAs } from "../support/app-client";
import { createMagnetItem, receive } from "../support/build-order-fixtures";
import {
  addRates,
  createOrder,
  createOrderSupplier,
  uniqueCurrency,
} from "../support/purchase-order-fixtures";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { qrCodeVideoFile, readQrCodeIn } from "../support/qr-camera";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let sku = "";
let bin = "";
const lot = uniqueCode("SP");
let lotId = 0;
let magnetLotId = 0;
let buyer = "";
/** Where the notes of this work keep the screenshots looked at (outside the repository). */
const notesScreens = "/work/notes/screens-r20";

async function screenshot(page: Page, name: string) {
  const file = await saveScreenshot(page, name);
  if (fs.existsSync(notesScreens))
    fs.copyFileSync(file, path.join(notesScreens, `${name}.png`));
}

async function itemIdOfSku(itemSku: string): Promise<number> {
  const [row] = await testDb()
    .select({ id: items.id })
    .from(items)
    .where(eq(items.sku, itemSku));
  return row!.id;
}

async function movementsOfLot(): Promise<number> {
  const [row] = await testDb()
    .select({ rows: count() })
    .from(stockMovements)
    .where(and(eq(stockMovements.lotId, lotId)));
  return row!.rows;
}

beforeAll(async () => {
  browser = await launchBrowser();
  bin = await createLocation(uniqueCode("RACK"), "Wire rack by the door");
  sku = uniqueCode("CU");
  buyer = await signInAs("buyer");
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
  // A magnet batch beside the spool, for the A4 sheet.
  const magnet = await createMagnetItem(buyer);
  const magnetLot = uniqueCode("MB");
  const storekeeper = await signInAs("storekeeper");
  await receive(storekeeper, {
    sku: magnet.sku,
    lot: magnetLot,
    location: bin,
    quantity: 120,
    unitCost: 0.85,
    supplierBatch: "MB-2026-118",
  });
  const [row] = await testDb()
    .select({ id: lots.id })
    .from(lots)
    .where(eq(lots.lotNumber, magnetLot));
  magnetLotId = row!.id;
});

/** The same page at twice the pixels, signed in as the page's person: a legible screenshot of a small label. */
async function sharpScreenshot(
  page: Page,
  name: string,
  media: "print" | "screen",
) {
  const context = await browser.newContext({
    deviceScaleFactor: 2,
    viewport: { width: 900, height: 800 },
    storageState: await page.context().storageState(),
  });
  const sharp = await context.newPage();
  await sharp.goto(page.url());
  await sharp.emulateMedia({ media });
  await screenshot(sharp, name);
  await context.close();
}
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("labels and scanning", () => {
  let qrText = "";

  it("receives a spool, prints its label and reads the label's QR code back to the lot", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.goto(`${baseUrl()}/stock/record?type=receipt&sku=${sku}`);
    await waitForHydration(page);
    await page.getByLabel("Into location").selectOption(bin);
    await page.getByLabel("Spool lot number").fill(lot);
    // Worked by hand: gross 5.40 kg − tare 0.60 kg = 4.80 kg net.
    await page.getByLabel("Gross weight").fill("5.4");
    await page.getByLabel("Tare weight").fill("0.6");
    await page.getByLabel("Unit cost per kg").fill("14.2");
    await page.getByLabel("Supplier's lot or heat").fill("HEAT-4410");
    await page.getByRole("button", { name: "Receive" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "Receipt recorded" })
      .waitFor();
    const [row] = await testDb()
      .select({ id: lots.id })
      .from(lots)
      .where(eq(lots.lotNumber, lot));
    lotId = row!.id;

    await page
      .getByRole("region", { name: "Print labels" })
      .getByRole("link", { name: `Label of lot ${lot} (${sku})` })
      .click();
    await page.getByRole("heading", { name: `Label of lot ${lot}` }).waitFor();
    await waitForHydration(page);
    const label = page.getByRole("article", {
      name: `Label of lot ${lot} of ${sku}`,
    });
    await expect(label.textContent()).resolves.toMatch(
      /Net on hand\s*4\.800\s*kg/,
    );
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await sharpScreenshot(page, "labels-lot-62x100", "screen");

    const qr = label.getByRole("img", { name: /QR code of lot/ });
    qrText = await readQrCodeIn(qr);
    expect(qrText).toBe(`${baseUrl()}/scan/L${lotId}`);

    await page.getByRole("link", { name: "A4 sheet, 6 labels" }).click();
    await page.waitForURL(/size=a4/);
    await label.waitFor();
    expect(await readQrCodeIn(qr)).toBe(qrText);

    // An A4 sheet of the spool, a magnet batch (with its caution) and the bin.
    await page.goto(
      `${baseUrl()}/labels/lots?ids=${lotId},${magnetLotId}&size=a4`,
    );
    await waitForHydration(page);
    expect(
      await page
        .getByRole("article", { name: /Label of lot .* of N42SH/ })
        .textContent(),
    ).toContain("Strong magnets: pinch, crush and shatter");
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await sharpScreenshot(page, "labels-lots-a4", "screen");
    await page.goto(`${baseUrl()}/labels/locations/${bin}`);
    await waitForHydration(page);
    const binQr = page.getByRole("img", { name: /QR code of location/ });
    expect(await readQrCodeIn(binQr)).toBe(`${baseUrl()}/scan/B${bin}`);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await sharpScreenshot(page, "labels-location-62x100", "screen");
    await page.close();
  });

  it("fills item, lot and location from a keyboard-wedge scan, and never submits the form", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.goto(`${baseUrl()}/stock/record?type=issue`);
    await waitForHydration(page);
    const before = await movementsOfLot();
    await page.getByLabel("Scanned code").focus();
    // A wedge scanner types what the QR code holds, then Enter.
    await page.keyboard.type(qrText);
    await page.keyboard.press("Enter");
    await page.waitForURL(/sku=/);
    await page
      .getByText(
        `Lot ${lot} of ${sku} Enamelled copper 0.50 mm at ${bin}: item, lot and location filled.`,
      )
      .waitFor();
    // The page follows the scan: the item's form, with the scanned lot and location chosen.
    const scannedBalance = page.getByRole("radio", {
      name: new RegExp(`lot ${lot} at ${bin}`),
    });
    await scannedBalance.waitFor();
    await expect(page.getByLabel("Item SKU").inputValue()).resolves.toBe(sku);
    await expect(scannedBalance.isChecked()).resolves.toBe(true);
    expect(await movementsOfLot()).toBe(before);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await screenshot(page, "labels-record-after-scan");

    // On a receipt the lot number and location fields take the scan (the bare code typed).
    await page.getByRole("link", { name: "Receipt" }).click();
    await page.waitForURL(/type=receipt/);
    await waitForHydration(page);
    await page.getByLabel("Scanned code").fill("");
    await page.getByLabel("Scanned code").focus();
    await page.keyboard.type(`l${lotId}`);
    await page.keyboard.press("Enter");
    await page.waitForURL(new RegExp(`lot=${lot}`));
    await page.getByLabel("Spool lot number").waitFor();
    await expect
      .poll(() => page.getByLabel("Spool lot number").inputValue())
      .toBe(lot);
    await expect(
      page.getByLabel("Spool lot number").inputValue(),
    ).resolves.toBe(lot);
    await expect
      .poll(() => page.getByLabel("Into location").inputValue())
      .toBe(bin);
    expect(await movementsOfLot()).toBe(before);

    // Another company's barcode (an EAN-13) fills nothing and says so.
    const address = page.url();
    await page.getByLabel("Scanned code").focus();
    await page.keyboard.type("4006381333931");
    await page.keyboard.press("Enter");
    await page
      .getByText("This is not a Turnledger code. Nothing was filled.")
      .waitFor();
    expect(page.url()).toBe(address);
    // An unknown lot of ours: the server says so, nothing changes.
    await page.keyboard.type("L2147483646");
    await page.keyboard.press("Enter");
    await page
      .getByText(
        "Unknown code L2147483646: there is no such lot. Nothing was filled.",
      )
      .waitFor();
    expect(page.url()).toBe(address);
    await page.close();
  });

  it("fills the receive-against-order form from scans and offers the new spool's label", async () => {
    const person = await newPerson("storekeeper");
    const currency = uniqueCurrency();
    await addRates(currency, [{ validFrom: "2020-01-01", rate: "1.000000" }]);
    const order = await createOrder({
      supplierId: await createOrderSupplier(currency),
      currency,
      userId: person.id,
      lines: [{ itemId: await itemIdOfSku(sku), quantity: "20.000" }],
    });
    const other = await createLocation(uniqueCode("BAY"), "Receiving bay");
    const page = await signIn(browser, person);
    await page.goto(`${baseUrl()}/stock/receive?order=${order.id}`);
    await waitForHydration(page);
    // A bin label scanned (typed by the wedge, Enter) sets where the spool goes; nothing is sent.
    await page.getByLabel("Scanned code").focus();
    await page.keyboard.type(`${baseUrl()}/scan/B${other}`);
    await page.keyboard.press("Enter");
    await page
      .getByText(
        `Location ${other} (Receiving bay) filled for spool 1 of line 1.`,
      )
      .waitFor();
    await expect(page.getByLabel("Into location").inputValue()).resolves.toBe(
      other,
    );
    // The existing spool's label: its lot number (and its rack) go into the spool's fields.
    await page.keyboard.type(`L${lotId}`);
    await page.keyboard.press("Enter");
    await page
      .getByText(`Lot ${lot} of ${sku} filled for spool 1 of line 1 at ${bin}.`)
      .waitFor();
    await expect(
      page.getByLabel("Spool lot number").inputValue(),
    ).resolves.toBe(lot);
    await expect(page.getByLabel("Into location").inputValue()).resolves.toBe(
      bin,
    );
    // A magnet batch's label is of an item the order does not have: nothing is filled.
    await page.keyboard.type(`L${magnetLotId}`);
    await page.keyboard.press("Enter");
    await page.getByText(/does not order\. Nothing was filled\./).waitFor();
    await expect(
      page.getByLabel("Spool lot number").inputValue(),
    ).resolves.toBe(lot);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    const newLot = uniqueCode("SP");
    await page.getByLabel("Spool lot number").fill(newLot);
    await page.getByLabel("Gross weight").fill("6.15");
    await page.getByLabel("Tare weight").fill("0.65");
    await page.getByRole("button", { name: /Receive against/ }).click();
    const print = page.getByRole("region", { name: "Print labels" });
    await print.waitFor();
    await print
      .getByRole("link", { name: `Label of lot ${newLot} (${sku})` })
      .click();
    await page
      .getByRole("heading", { name: `Label of lot ${newLot}` })
      .waitFor();
    // Worked by hand: 6.15 − 0.65 = 5.50 kg net.
    expect(
      await page
        .getByRole("article", { name: `Label of lot ${newLot} of ${sku}` })
        .textContent(),
    ).toMatch(/Net on hand\s*5\.500\s*kg/);
    await page.close();
  });

  it("reads the QR code through a camera (Chromium's fake camera playing the label)", async () => {
    const cameraFile = qrCodeVideoFile(qrText);
    const withCamera = await launchBrowser([
      "--use-fake-ui-for-media-stream",
      "--use-fake-device-for-media-stream",
      `--use-file-for-fake-video-capture=${cameraFile}`,
    ]);
    try {
      const page = await signIn(withCamera, "storekeeper");
      await page.goto(`${baseUrl()}/stock/record?type=issue`);
      await waitForHydration(page);
      await page.getByRole("button", { name: "Use camera" }).click();
      await page
        .getByText(
          `Lot ${lot} of ${sku} Enamelled copper 0.50 mm at ${bin}: item, lot and location filled.`,
        )
        .waitFor({ timeout: 30_000 })
        .catch(async (error: unknown) => {
          await screenshot(page, "labels-camera-failed");
          throw new Error(
            `The scan panel says: ${await page.locator("#scan-result").textContent()}; the camera view: ${await page
              .getByLabel("Camera view")
              .evaluate(
                (viewfinder: HTMLVideoElement) =>
                  `${viewfinder.videoWidth}×${viewfinder.videoHeight}, ready state ${viewfinder.readyState}, ${viewfinder.paused ? "paused" : "playing"}`,
              )}`,
            { cause: error },
          );
        });
      await expect
        .poll(() =>
          page
            .getByRole("radio", { name: new RegExp(`lot ${lot} at ${bin}`) })
            .isChecked(),
        )
        .toBe(true);
      // The camera is off again once the code was read.
      await page.getByRole("button", { name: "Use camera" }).waitFor();
      await page.close();
    } finally {
      await withCamera.close();
    }
  });

  it("says plainly when there is no camera, and fills nothing", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.goto(`${baseUrl()}/stock/record?type=issue`);
    await waitForHydration(page);
    await page.getByRole("button", { name: "Use camera" }).click();
    await page
      .getByText(/No camera was found on this device|permission was refused/)
      .waitFor();
    await page.getByRole("button", { name: "Use camera" }).waitFor();
    expect(page.url()).toBe(`${baseUrl()}/stock/record?type=issue`);
    await page.close();
  });
});
