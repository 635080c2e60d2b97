/**
 * The lot page in the browser: where the spool came from, where it is, which build orders
 * drew from it (two here), its hold state, and a certificate attached through the form
 * (a file of another type refused beside the file field first). Keyboard-free checks by
 * role and label; no serious axe-core violation; screenshots of the page and of the
 * build order's lots.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { seriousAccessibilityViolations } from "../support/accessibility";
import { sendJson, signInAs } from "../support/app-client";
import { createWireItem, receive } from "../support/build-order-fixtures";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";
import { createDesign } from "../support/design-fixtures";
import { createOrderSupplier } from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

const shots = "/work/notes/screens-r20";
let browser: Browser;
let page: Page;
let baseUrl = "";
let lotId = 0;
let orderA = 0;
const files: string[] = [];

async function ok(response: Response, status = 201) {
  expect(response.status, await response.clone().text()).toBe(status);
  return response.json();
}

beforeAll(async () => {
  browser = await launchBrowser();
  baseUrl = inject("baseUrl");
  const buyer = await signInAs("buyer");
  const builder = await signInAs("builder");
  const storekeeper = await signInAs("storekeeper");
  const rack = await createLocation(uniqueCode("LP"), "Wire rack A");
  const wire = await createWireItem(buyer);
  const heat = uniqueCode("S");
  await receive(storekeeper, {
    sku: wire.sku,
    lot: heat,
    location: rack,
    grossKg: 5.6,
    tareKg: 0.6,
    unitCost: 12.4,
    spoolType: "DIN 250",
    supplierBatch: "H-55102-7",
    supplierId: await createOrderSupplier("EUR"),
  });
  const design = await createDesign(
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
    ],
    { name: uniqueCode("Kestrel test outrunner") },
  );
  const orders: number[] = [];
  for (const [motors, taken] of [
    [2, 0.7],
    [3, 1.0],
  ] as const) {
    const { id } = (await ok(
      await sendJson(
        "POST",
        "/api/v1/build-orders",
        { designId: design.designId, revision: 1, quantity: motors },
        builder,
      ),
    )) as { id: number };
    await ok(
      await sendJson("POST", `/api/v1/build-orders/${id}/reserve`, {}, builder),
      200,
    );
    const issued = (await ok(
      await sendJson(
        "POST",
        "/api/v1/stock-movements",
        {
          type: "issue",
          sku: wire.sku,
          lot: heat,
          location: rack,
          quantity: taken,
          buildOrderId: id,
        },
        storekeeper,
      ),
    )) as { movement: { lot: string } };
    expect(issued.movement.lot).toBe(heat);
    orders.push(id);
  }
  orderA = orders[0]!;
  const where = (await ok(
    await fetch(`${baseUrl}/api/v1/lots/${heat}/where-used?sku=${wire.sku}`, {
      headers: { Cookie: storekeeper },
    }),
    200,
  )) as { lot: { id: number } };
  lotId = where.lot.id;
  page = await signIn(browser, "storekeeper");
  fs.mkdirSync(shots, { recursive: true });
  const scratch = fs.mkdtempSync(path.join(os.tmpdir(), "lot-page-"));
  const html = path.join(scratch, "not-a-certificate.pdf");
  fs.writeFileSync(html, "<!doctype html><p>not a certificate</p>");
  const pdf = path.join(scratch, "mill-certificate.pdf");
  fs.writeFileSync(
    pdf,
    "%PDF-1.4\n1 0 obj << >> endobj\ntrailer << >>\n%%EOF\n",
  );
  files.push(html, pdf, scratch);
});

afterAll(async () => {
  for (const file of files) fs.rmSync(file, { force: true, recursive: true });
  await page?.close();
  await browser?.close();
  await closeTestDatabase();
});

describe("the lot page", () => {
  it("shows origin, balances, both build orders, and takes a certificate", async () => {
    await page.goto(`${baseUrl}/stock/lots/${lotId}`);
    await waitForHydration(page);
    await expect
      .poll(() => page.getByRole("heading", { level: 1 }).textContent())
      .toContain("Lot S-");
    expect(await page.getByText("H-55102-7").count()).toBeGreaterThan(0);
    const uses = page.getByRole("table", { name: /Build orders that drew/ });
    expect(await uses.getByRole("row").count()).toBe(3); // header + two orders
    expect(await uses.getByRole("link", { name: `BO-${orderA}` }).count()).toBe(
      1,
    );

    // Another type named .pdf: refused beside the file field, nothing listed.
    await page.getByLabel("Certificate file").setInputFiles(files[0]!);
    await page.getByRole("button", { name: "Attach certificate" }).click();
    await page
      .getByText("Only PDF, PNG or JPEG files can be attached")
      .waitFor();
    expect(await page.getByText("No certificate attached yet.").count()).toBe(
      1,
    );
    await page.screenshot({
      path: path.join(shots, "lots-refused-upload.png"),
      fullPage: true,
    });

    await page.getByLabel("Certificate file").setInputFiles(files[1]!);
    await page.getByLabel("Title (optional)").fill("Mill certificate 3.1");
    await page.getByRole("button", { name: "Attach certificate" }).click();
    await page.getByText("Certificate attached to the lot.").waitFor();
    const link = page.getByRole("link", { name: "Mill certificate 3.1" });
    expect(await link.getAttribute("href")).toMatch(
      new RegExp(`^/stock/lots/${lotId}/documents/\\d+$`),
    );
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.screenshot({
      path: path.join(shots, "lots-page.png"),
      fullPage: true,
    });
  });

  it("lists the lot on the build order's page", async () => {
    await page.goto(`${baseUrl}/build-orders/${orderA}`);
    await waitForHydration(page);
    const section = page.getByRole("region", { name: "Lots in this build" });
    await section.waitFor();
    expect(await section.getByRole("row").count()).toBe(2);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await section.screenshot({
      path: path.join(shots, "lots-build-order.png"),
    });
  });
});
