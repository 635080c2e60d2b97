/**
 * The storekeeper's pages on a phone (390 px wide, touch, three device pixels per
 * CSS pixel): the record page (recording a count there), receiving against a
 * purchase order, the stocktake's count sheet, the stocktakes page (with its start
 * form), the purchase orders and an order, and the item page. On each: the page
 * never scrolls sideways, every control is big enough to touch, the folded main
 * menu opens and is used by keyboard alone, and axe-core finds nothing serious.
 * Then a wide table scrolled inside its own region with its first column pinned,
 * and the screenshots for the notes.
 */
import fs from "node:fs";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  newPerson,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { seriousAccessibilityViolations } from "../support/accessibility";
import {
  createMagnetItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";
import { press, tabTo } from "../support/keyboard";
import {
  addRates,
  createOrder,
  createOrderSupplier,
  uniqueCurrency,
} from "../support/purchase-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";
import {
  pageOverflow,
  phoneContext,
  undersizedTargets,
} from "../support/touch-targets";

let browser: Browser;
let person: Awaited<ReturnType<typeof newPerson>>;
let wire: { sku: string; id: number };
let magnet: { sku: string; id: number };
let orderNumber = "";
let orderId = 0;
let stocktakeId = 0;

const shotsFolder = "/work/notes/shots";

beforeAll(async () => {
  browser = await launchBrowser();
  person = await newPerson("storekeeper");
  const storekeeper = await signInAs("storekeeper");
  const buyer = await signInAs("buyer");
  const bin = await createLocation(uniqueCode("BAY"), "Wire and magnet bay");
  wire = await createWireItem(buyer);
  magnet = await createMagnetItem(buyer);
  // Two spools and a batch of magnets on the book, so the item page has lots and
  // movements and the record page has balances to count.
  for (const body of [
    {
      type: "receipt",
      sku: wire.sku,
      lot: uniqueCode("SP"),
      location: bin,
      quantity: 14.2,
      tareKg: 0.6,
      unitCost: 12,
    },
    {
      type: "receipt",
      sku: wire.sku,
      lot: uniqueCode("SP"),
      location: bin,
      quantity: 9.85,
      tareKg: 0.6,
      unitCost: 12.4,
    },
    {
      type: "receipt",
      sku: magnet.sku,
      location: bin,
      quantity: 120,
      unitCost: 2.5,
    },
  ]) {
    const moved = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      body,
      storekeeper,
    );
    expect(moved.status).toBe(201);
  }
  const currency = uniqueCurrency();
  await addRates(currency, [{ validFrom: "2020-01-01", rate: "0.920000" }]);
  const order = await createOrder({
    supplierId: await createOrderSupplier(currency),
    currency,
    userId: person.id,
    lines: [
      { itemId: wire.id, quantity: "20.000", unitPrice: "12.5000" },
      { itemId: magnet.id, quantity: "200", unitPrice: "2.4000" },
    ],
  });
  orderId = order.id;
  orderNumber = `PO-${String(order.id).padStart(6, "0")}`;
  const started = await postForm(
    "/stocktakes",
    { intent: "start", locations: [bin], note: "Bay check on a phone" },
    storekeeper,
  );
  expect(started.status).toBe(302);
  stocktakeId = Number(/(\d+)$/.exec(started.headers.get("location")!)![1]);
  fs.mkdirSync(shotsFolder, { recursive: true });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function phonePage(): Promise<Page> {
  return signIn(browser, person, phoneContext);
}

async function open(page: Page, path: string): Promise<void> {
  await page.goto(`${baseUrl()}${path}`);
  await waitForHydration(page);
  await page.evaluate(() => document.fonts.ready);
}

/** No sideways scrolling, every control touch-sized, nothing serious for axe-core. */
async function expectPhoneReady(page: Page): Promise<void> {
  expect(await pageOverflow(page), "the page scrolls sideways").toBe(0);
  expect(await undersizedTargets(page)).toEqual([]);
  expect(await seriousAccessibilityViolations(page)).toEqual([]);
}

/**
 * The main menu is folded behind its button: Tab to it and Enter opens it (the
 * person and sign-out inside, every link touch-sized), Escape closes it and gives
 * the focus back to the button.
 */
async function expectMenuByKeyboard(page: Page): Promise<void> {
  const button = page.getByRole("button", { name: "Menu" });
  const menu = page.getByRole("navigation", { name: "Main" });
  expect(await menu.isVisible()).toBe(false);
  expect(await button.getAttribute("aria-expanded")).toBe("false");
  const panelId = await button.getAttribute("aria-controls");
  expect(panelId).toBeTruthy();

  await page.evaluate(() => window.scrollTo(0, 0));
  await page.locator("body").evaluate((body) => body.focus());
  await press(page, button);
  expect(await button.getAttribute("aria-expanded")).toBe("true");
  await menu.waitFor();
  const panel = page.locator(`[id="${panelId}"]`);
  expect(await panel.isVisible()).toBe(true);
  expect(
    await panel.getByRole("button", { name: "Sign out" }).isVisible(),
  ).toBe(true);
  expect(
    await panel
      .getByRole("link", { name: new RegExp(person.name) })
      .isVisible(),
  ).toBe(true);
  await expectPhoneReady(page);

  // Tab goes into the open menu; Escape from there closes it and returns to the button.
  await tabTo(page, menu.getByRole("link", { name: "Journal", exact: true }));
  await page.keyboard.press("Escape");
  expect(await button.getAttribute("aria-expanded")).toBe("false");
  expect(await menu.isVisible()).toBe(false);
  expect(
    await button.evaluate((element) => element === document.activeElement),
  ).toBe(true);
}

describe("the storekeeper's pages on a phone", () => {
  it("records a count on the record page, by touch", async () => {
    const page = await phonePage();
    await open(page, "/stock/record");
    await expectPhoneReady(page);
    await expectMenuByKeyboard(page);

    await open(page, `/stock/record?type=count&sku=${magnet.sku}`);
    await expectPhoneReady(page);
    await page.getByRole("radio").first().tap();
    await page.getByLabel("Counted").fill("118");
    await page.getByRole("button", { name: "Record count" }).tap();
    await page.getByText(new RegExp(`recorded: .* of ${magnet.sku}`)).waitFor();
    await waitForHydration(page);
    await expectPhoneReady(page);
    await page.close();
  });

  it("receives against a purchase order", async () => {
    const page = await phonePage();
    await open(page, "/stock/receive");
    await expectPhoneReady(page);
    await open(page, `/stock/receive?order=${orderNumber}`);
    await page
      .getByRole("heading", { name: new RegExp(orderNumber) })
      .waitFor();
    await expectPhoneReady(page);
    await expectMenuByKeyboard(page);
    await page.close();
  });

  it("counts on the stocktake's count sheet", async () => {
    const page = await phonePage();
    await open(page, `/stocktakes/${stocktakeId}/count`);
    await expectPhoneReady(page);
    await expectMenuByKeyboard(page);
    await page.close();
  });

  it("starts a stocktake from the stocktakes page, which fits the phone", async () => {
    const page = await phonePage();
    await open(page, "/stocktakes");
    // The start form sits under the list, as wide as the phone.
    const form = page.getByRole("region", { name: "Start a stocktake" });
    await form.waitFor();
    await expectPhoneReady(page);
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth),
    ).toBeLessThanOrEqual(390);
    const formBox = (await form.boundingBox())!;
    expect(formBox.x + formBox.width).toBeLessThanOrEqual(390);
    await expectMenuByKeyboard(page);
    await page.close();
  });

  it("shows the purchase orders and an order, with touch-sized status links", async () => {
    const page = await phonePage();
    await open(page, "/purchase-orders");
    const statuses = page
      .getByRole("navigation", { name: "Filter by status" })
      .getByRole("link");
    expect(await statuses.count()).toBeGreaterThan(1);
    for (const link of await statuses.all()) {
      const box = (await link.boundingBox())!;
      expect(box.height).toBeGreaterThanOrEqual(44);
      expect(box.width).toBeGreaterThanOrEqual(44);
    }
    await expectPhoneReady(page);

    await open(page, `/purchase-orders/${orderId}`);
    await expectPhoneReady(page);
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth),
    ).toBeLessThanOrEqual(390);

    // The printable order: its lines scroll in their own region, reached by Tab.
    await open(page, `/purchase-orders/${orderId}/print`);
    const lines = page.getByRole("region", { name: `Lines of ${orderNumber}` });
    await lines.waitFor();
    await expectPhoneReady(page);
    await tabTo(page, lines);
    await page.close();
  });

  it("shows an item, and its menu takes the person elsewhere by keyboard", async () => {
    const page = await phonePage();
    await open(page, `/stock/items/${wire.sku}`);
    await expectPhoneReady(page);
    await expectMenuByKeyboard(page);
    await page.screenshot({
      path: `${shotsFolder}/item-page-390.png`,
      fullPage: true,
    });

    // Open by keyboard, pick "Journal": the journal opens and the menu is folded again.
    const button = page.getByRole("button", { name: "Menu" });
    await page.keyboard.press("Enter");
    expect(await button.getAttribute("aria-expanded")).toBe("true");
    await press(
      page,
      page
        .getByRole("navigation", { name: "Main" })
        .getByRole("link", { name: "Journal", exact: true }),
    );
    await page.waitForURL(/\/stock\/journal$/);
    await page
      .getByRole("heading", { level: 1, name: "Movement journal" })
      .waitFor();
    expect(await button.getAttribute("aria-expanded")).toBe("false");
    expect(
      await page.getByRole("navigation", { name: "Main" }).isVisible(),
    ).toBe(false);
    await page.close();
  });

  it("keeps the menu as it was on a wide window", async () => {
    const page = await signIn(browser, person);
    expect(await page.getByRole("button", { name: "Menu" }).isVisible()).toBe(
      false,
    );
    const menu = page.getByRole("navigation", { name: "Main" });
    expect(await menu.isVisible()).toBe(true);
    expect(
      await page.getByRole("button", { name: "Sign out" }).isVisible(),
    ).toBe(true);
    // The menu sits under the name and the person, across the header.
    const [name, nav] = await Promise.all([
      page.getByRole("link", { name: "Turnledger" }).boundingBox(),
      menu.boundingBox(),
    ]);
    expect(nav!.y).toBeGreaterThan(name!.y + name!.height - 1);
    await page.close();
  });

  it("saves the record page with its menu folded and open", async () => {
    const page = await phonePage();
    await open(page, "/stock/record");
    // From the top: the SKU field takes the focus and scrolls the page to itself.
    await page.evaluate(() => window.scrollTo(0, 0));
    await page.screenshot({
      path: `${shotsFolder}/record-menu-closed-390.png`,
    });
    await page.getByRole("button", { name: "Menu" }).tap();
    await page.getByRole("navigation", { name: "Main" }).waitFor();
    await page.screenshot({
      path: `${shotsFolder}/record-menu-open-390.png`,
      fullPage: true,
    });
    await page.close();
  });
});

describe("a wide table on a phone", () => {
  it("scrolls inside its own region with the first column pinned", async () => {
    const page = await phonePage();
    // The stock list: eight columns, far wider than a phone.
    await open(page, `/stock?search=${wire.sku}`);
    const region = page.getByRole("region", { name: "Stock items" });
    await region.waitFor();
    expect(await region.getAttribute("tabindex")).toBe("0");
    expect(await pageOverflow(page)).toBe(0);
    const widths = await region.evaluate((element) => ({
      scroll: element.scrollWidth,
      client: element.clientWidth,
    }));
    expect(widths.scroll).toBeGreaterThan(widths.client);

    // Reached by Tab, with a visible focus ring, and scrolled with the arrow keys.
    await tabTo(page, region);
    expect(
      await region.evaluate((element) => {
        const style = getComputedStyle(element);
        return (
          style.outlineStyle !== "none" && parseFloat(style.outlineWidth) >= 2
        );
      }),
    ).toBe(true);
    for (let step = 0; step < 10; step += 1)
      await page.keyboard.press("ArrowRight");
    await expect
      .poll(() => region.evaluate((element) => element.scrollLeft))
      .toBeGreaterThan(200);
    // Scrolling has come to rest before anything is measured.
    await page.waitForFunction(
      (name) =>
        new Promise<boolean>((done) => {
          const box = document.querySelector(`[aria-label="${name}"]`)!;
          const before = box.scrollLeft;
          requestAnimationFrame(() =>
            requestAnimationFrame(() => done(box.scrollLeft === before)),
          );
        }),
      "Stock items",
    );

    const regionBox = (await region.boundingBox())!;
    const firstCell = region.locator("tbody tr").first().locator("td").first();
    const secondCell = region.locator("tbody tr").first().locator("td").nth(1);
    const firstBox = (await firstCell.boundingBox())!;
    const secondBox = (await secondCell.boundingBox())!;
    // The first cell stays at the region's left edge; the next one went under it.
    expect(Math.abs(firstBox.x - regionBox.x)).toBeLessThanOrEqual(1);
    expect(secondBox.x).toBeLessThan(firstBox.x + firstBox.width);
    // And it hides what scrolls under it: its background is not transparent.
    expect(
      await firstCell.evaluate(
        (cell) => getComputedStyle(cell).backgroundColor,
      ),
    ).not.toBe("rgba(0, 0, 0, 0)");
    // The header's first cell too.
    const firstHeader = (await region
      .locator("thead th")
      .first()
      .boundingBox())!;
    expect(Math.abs(firstHeader.x - regionBox.x)).toBeLessThanOrEqual(1);
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.close();
  });
});
