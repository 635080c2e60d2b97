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
import { lots, stockMovements } from "~/db/schema";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
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
/** Where the notes of this work keep the screenshots looked at (outside the repository). */
const notesScreens = "/work/notes/screens-r20";

async function screenshot(page: Page, name: string) {
  const file = await saveScreenshot(page, name);
  if (fs.existsSync(notesScreens))
    fs.copyFileSync(file, path.join(notesScreens, `${name}.png`));
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
    await page.getByLabel("Supplier batch").fill("HEAT-4410");
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
    await page.emulateMedia({ media: "print" });
    await screenshot(page, "labels-lot-62x100");
    await page.emulateMedia({ media: "screen" });

    const qr = label.getByRole("img", { name: /QR code of lot/ });
    qrText = await readQrCodeIn(qr);
    expect(qrText).toBe(`${baseUrl()}/scan/L${lotId}`);

    await page.getByRole("link", { name: "A4 sheet, 6 labels" }).click();
    await page.waitForURL(/size=a4/);
    await label.waitFor();
    expect(await readQrCodeIn(qr)).toBe(qrText);
    await page.emulateMedia({ media: "print" });
    await screenshot(page, "labels-lot-a4");
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

  it("reads the QR code through a camera (Chromium's fake camera playing the label)", async () => {
    const video = qrCodeVideoFile(qrText);
    const withCamera = await launchBrowser([
      "--use-fake-ui-for-media-stream",
      "--use-fake-device-for-media-stream",
      `--use-file-for-fake-video-capture=${video}`,
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
        .waitFor({ timeout: 20_000 });
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
