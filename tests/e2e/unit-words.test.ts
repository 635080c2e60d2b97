/**
 * Counts and units as a person reads them on the stock and build-order pages: one magnet
 * on the shelf reads "1 piece", its cost "per piece", a build of one "1 motor" — never
 * "1 pcs", "per pcs" or "1 motors" (English singular for exactly 1, CLDR plural rules).
 */
import fs from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import { createMagnetItem, receive } from "../support/build-order-fixtures";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";
import { createDesign } from "../support/design-fixtures";
import { readable } from "../support/page-text";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
let baseUrl = "";
let magnet: { sku: string; id: number };
let orderId = 0;

const shots = "/work/notes/shots";

/** The slips: a unit symbol or a plural where a word in the singular reads. */
const slips = [/\b1 pcs\b/, /\bper pcs\b/, /\/pcs\b/, /\b1 motors\b/];

function expectNoSlips(text: string) {
  for (const slip of slips) expect(text).not.toMatch(slip);
}

async function open(path: string, shot: string): Promise<string> {
  await page.goto(`${baseUrl}${path}`);
  await waitForHydration(page);
  await page.screenshot({ path: `${shots}/h6-${shot}.png`, fullPage: true });
  return readable(await page.locator("main").textContent());
}

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const builder = await signInAs("builder");
  const storekeeper = await signInAs("storekeeper");
  const shelf = await createLocation(uniqueCode("PW"), "Magnet shelf");
  magnet = await createMagnetItem(buyer);
  // One magnet on the shelf at 0.85 a piece.
  await receive(storekeeper, {
    sku: magnet.sku,
    location: shelf,
    quantity: 1,
    unitCost: 0.85,
  });
  // A build of one motor with one magnet: the order needs and holds 1 piece.
  const design = await createDesign([
    { kind: "magnet", itemId: magnet.id, piecesPerMotor: 1 },
  ]);
  const created = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity: 1 },
    builder,
  );
  expect(created.status, await created.clone().text()).toBe(201);
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

describe("pieces and motors in words", () => {
  it("the stock list shows one magnet as 1 piece", async () => {
    const text = await open(
      `/stock?search=${encodeURIComponent(magnet.sku)}`,
      "stock-list-1-piece",
    );
    const row = readable(
      await page.getByRole("row").filter({ hasText: magnet.sku }).textContent(),
    );
    expect(row).toContain("1 piece");
    expectNoSlips(text);
  });

  it("the item page shows 1 piece on hand and its cost per piece", async () => {
    const text = await open(
      `/stock/items/${encodeURIComponent(magnet.sku)}`,
      "item-1-piece",
    );
    expect(text).toContain("1 piece");
    expect(text).toContain("0.8500 per piece");
    // The mass of the magnets on hand, "for 1 piece".
    expect(text).toContain("for 1 piece");
    expectNoSlips(text);
  });

  it("the record page asks for the unit cost per piece", async () => {
    const text = await open(
      `/stock/record?type=receipt&sku=${encodeURIComponent(magnet.sku)}`,
      "record-unit-cost-per-piece",
    );
    await page.getByLabel("Unit cost per piece").waitFor();
    expectNoSlips(text);
  });

  it("the journal tells the receipt's cost per piece", async () => {
    const text = await open(
      `/stock/journal?sku=${encodeURIComponent(magnet.sku)}`,
      "journal-per-piece",
    );
    expect(text).toContain("at 0.8500 per piece");
    expectNoSlips(text);
  });

  it("a build order of one motor reads 1 motor and 1 piece", async () => {
    const text = await open(`/build-orders/${orderId}`, "build-order-1-motor");
    expect(text).toContain("1 motor");
    const line = readable(
      await page
        .getByRole("row")
        .filter({ hasText: magnet.sku })
        .first()
        .textContent(),
    );
    expect(line).toContain("1 piece");
    expectNoSlips(text);

    const list = await open("/build-orders", "build-orders-1-motor");
    const row = readable(
      await page
        .getByRole("row")
        .filter({
          has: page.getByRole("link", { name: `BO-${orderId}`, exact: true }),
        })
        .textContent(),
    );
    expect(row).toContain("1 motor");
    expectNoSlips(list);
  });
});
