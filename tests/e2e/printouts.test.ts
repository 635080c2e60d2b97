/**
 * The printed pick list of a build order and the count sheet of a location (issue 21):
 * reached from the order's page and the location's label by keyboard alone, what they
 * list checked against the fixture's lots and bins (a lot on hold never on a pick list,
 * on the count sheet with no book quantity), printable (the app's header left off the
 * paper), axe-core clean. Screenshots in print media to /work/notes/shots.
 */
import { eq } from "drizzle-orm";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { lots } from "~/db/schema";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  createMagnetItem,
  createPartItem,
  receive,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { press } from "../support/keyboard";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let orderId = 0;
const bins = {
  a: uniqueCode("PICK-A"),
  b: uniqueCode("PICK-B"),
  c: uniqueCode("PICK-C"),
};
const lot = {
  held: uniqueCode("MOLD"),
  first: uniqueCode("MA"),
  second: uniqueCode("MB"),
  late: uniqueCode("MC"),
};
let magnetSku = "";
let partSku = "";

async function receivedOn(number: string, day: string) {
  await testDb()
    .update(lots)
    .set({ receivedOn: day })
    .where(eq(lots.lotNumber, number));
}

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const builder = await signInAs("builder");
  for (const code of Object.values(bins)) await createLocation(code);
  const magnet = await createMagnetItem(buyer);
  const part = await createPartItem(buyer);
  magnetSku = magnet.sku;
  partSku = part.sku;
  // The oldest magnet batch, at C, goes on hold: never on the pick list.
  for (const [number, location, quantity] of [
    [lot.held, bins.c, 20],
    [lot.first, bins.a, 4],
    [lot.second, bins.b, 3],
  ] as const)
    await receive(storekeeper, {
      sku: magnet.sku,
      lot: number,
      location,
      quantity,
      unitCost: 2,
    });
  await receive(storekeeper, {
    sku: part.sku,
    location: bins.a,
    quantity: 12,
    unitCost: 1.5,
  });
  await receivedOn(lot.held, "2025-11-03");
  await receivedOn(lot.first, "2026-01-05");
  await receivedOn(lot.second, "2026-02-05");
  const held = await sendJson(
    "POST",
    `/api/v1/lots/${lot.held}/hold?sku=${magnet.sku}`,
    { reason: "Coating flaking on two pieces" },
    storekeeper,
  );
  expect(held.status, await held.clone().text()).toBe(200);

  // 5 motors × 2 magnets = 10 pieces, 5 bearings.
  const design = await createDesign([
    { kind: "magnet", itemId: magnet.id, piecesPerMotor: 2 },
    { kind: "part", itemId: part.id, quantityPerMotor: "1" },
  ]);
  const created = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity: 5 },
    builder,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  orderId = ((await created.json()) as { id: number }).id;
  // Partial: 4 (first) + 3 (second) of 10 magnets are free to hold; the held lot is not.
  const reserved = await sendJson(
    "POST",
    `/api/v1/build-orders/${orderId}/reserve`,
    { partial: true },
    builder,
  );
  expect(reserved.status, await reserved.clone().text()).toBe(200);
  // A later delivery at A: free stock for the 3 magnets still not held.
  await receive(storekeeper, {
    sku: magnet.sku,
    lot: lot.late,
    location: bins.a,
    quantity: 10,
    unitCost: 2,
  });
  await receivedOn(lot.late, "2026-03-02");
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** The text of each row of the printed table, blanks squeezed. */
async function rowTexts(page: Page): Promise<string[]> {
  return (await page.locator("article table tbody tr").allInnerTexts()).map(
    (text) => text.replace(/\s+/g, " ").trim(),
  );
}

async function expectPrintable(page: Page) {
  await page.emulateMedia({ media: "print" });
  await expect
    .poll(() => page.locator("body > div > header").isVisible())
    .toBe(false);
  expect(await page.getByRole("navigation").first().isVisible()).toBe(false);
  expect(await page.getByRole("button", { name: "Print" }).isVisible()).toBe(
    false,
  );
  expect(await page.locator("article h1").isVisible()).toBe(true);
}

async function keepShot(page: Page, name: string) {
  await saveScreenshot(page, name);
  await page.screenshot({
    path: `/work/notes/shots/${name}.png`,
    fullPage: true,
  });
}

describe("the pick list of a build order", () => {
  it("is reached by keyboard from the order and lists held lots first, then free stock oldest first, never a lot on hold", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.goto(`${baseUrl()}/build-orders/${orderId}`);
    await waitForHydration(page);
    await press(page, page.getByRole("link", { name: "Print pick list" }));
    await page.waitForURL(`**/build-orders/${orderId}/pick-list`);
    await waitForHydration(page);

    // The address changes a moment before the new page is drawn: wait for its heading.
    const heading = page.getByRole("heading", { level: 1 });
    await expect
      .poll(() => heading.innerText())
      .toBe(`Pick list BO-${orderId}`);
    const facts = (await page.locator("article header dl").innerText()).replace(
      /\u00a0/g,
      " ",
    );
    expect(facts).toContain("Motors");
    expect(facts).toContain("5 motors");
    expect(facts).toContain("Revision");
    expect(facts).toContain("Printed");

    const rows = await rowTexts(page);
    const magnetRows = rows.filter(
      (row) =>
        row.includes(lot.first) ||
        row.includes(lot.second) ||
        row.includes(lot.late),
    );
    expect(magnetRows).toEqual([
      expect.stringMatching(
        new RegExp(`^${bins.a} ${lot.first} .* held for the order 4 pieces$`),
      ),
      expect.stringMatching(
        new RegExp(`^${bins.b} ${lot.second} .* held for the order 3 pieces$`),
      ),
      expect.stringMatching(
        new RegExp(`^${bins.a} ${lot.late} .* not held 3 pieces$`),
      ),
    ]);
    // The bearings: 5 from A, held for the order (not kept in lots).
    expect(rows).toContain(`${partSku} Bearing 6001-2RS 5 pieces`);
    expect(rows.some((row) => row.startsWith(`${bins.a} —`))).toBe(true);
    expect(rows.find((row) => row.includes(magnetSku))).toContain("10 pieces");
    // The lot on hold is nowhere on the page, nor its bin.
    const text = await page.locator("article").innerText();
    expect(text).not.toContain(lot.held);
    expect(text).not.toContain(bins.c);

    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await expectPrintable(page);
    await keepShot(page, "pick-list-print");
  });
});

describe("the count sheet of a location", () => {
  it("is reached from the location's label and lists every item and lot there, blind, with the scan code", async () => {
    const page = await signIn(browser, "storekeeper");
    await page.goto(`${baseUrl()}/labels/locations/${bins.c}`);
    await waitForHydration(page);
    await press(
      page,
      page.getByRole("link", { name: `Count sheet of ${bins.c}` }),
    );
    await page.waitForURL(`**/stock/locations/${bins.c}/count-sheet`);
    await waitForHydration(page);
    // The address changes a moment before the new page is drawn: wait for its heading.
    await expect
      .poll(() => page.getByRole("heading", { level: 1 }).innerText())
      .toBe(`Count sheet ${bins.c}`);
    const facts = await page.locator("article header dl").innerText();
    expect(facts).toContain(`B${bins.c}`);
    expect(facts).toContain("Printed");
    await expect
      .poll(() =>
        page
          .getByRole("img", {
            name: new RegExp(`QR code of location ${bins.c}`),
          })
          .count(),
      )
      .toBe(1);
    // C holds the lot on hold: it is on the shelf and is counted.
    const rows = (await rowTexts(page)).filter((row) => row !== "");
    expect(rows).toEqual([
      expect.stringMatching(
        new RegExp(`^${magnetSku} N42SH block .* ${lot.held} pcs$`),
      ),
    ]);
    // Blind: the book quantity (20) is not on the sheet.
    for (const cell of await page.locator("article td").allInnerTexts())
      expect(cell.trim()).not.toBe("20");

    await page.goto(`${baseUrl()}/stock/locations/${bins.a}/count-sheet`);
    await waitForHydration(page);
    const atA = (await rowTexts(page)).filter((row) => row !== "");
    expect(atA).toEqual(
      [
        expect.stringContaining(`${partSku} Bearing 6001-2RS —`),
        expect.stringContaining(lot.first),
        expect.stringContaining(lot.late),
      ].sort(() => 0),
    );
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await expectPrintable(page);
    await keepShot(page, "location-count-sheet-print");
  });

  it("is refused to a buyer, who counts nothing", async () => {
    const page = await signIn(browser, "buyer");
    const response = await page.goto(
      `${baseUrl()}/stock/locations/${bins.a}/count-sheet`,
    );
    expect(response?.status()).toBe(403);
  });
});
