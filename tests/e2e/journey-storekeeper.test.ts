/**
 * The storekeeper's journey in Chromium, by keyboard alone, from sign-in to the
 * balances: receive two spools of magnet wire (gross and tare on the scale) and
 * a lot of magnets, issue to a build order by weighing its spool back, count a
 * bin and record the difference, then read the balances on the stock pages.
 * Every page is scanned with axe-core in each state it reaches; the figures are
 * checked against the stock and build-order APIs.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { formatStockQuantity } from "~/stock/stock-quantity-text";
import { scanPage } from "../support/accessibility";
import { sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot } from "../support/browser";
import {
  createMagnetItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { followLink, mainLink, signInByKeyboard } from "../support/journey";
import {
  chooseOption,
  chooseRadio,
  press,
  typeInto,
} from "../support/keyboard";
import { readable } from "../support/page-text";
import { searchStockByKeyboard } from "../support/stock-search";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
const found: string[] = [];
let builder = "";
let wireSku = "";
let magnetSku = "";
let rack = "";
let drawer = "";
let orderId = 0;
/** What the count found in the magnet bin. */
let countedMagnets = 0;
const firstSpool = uniqueCode("SP");
const secondSpool = uniqueCode("SP");
const magnetLot = uniqueCode("MB");
const designName = uniqueCode("Journey hub motor");

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  rack = await createLocation(uniqueCode("JR"), "Journey wire rack");
  drawer = await createLocation(uniqueCode("JD"), "Journey magnet drawer");
  const wire = await createWireItem(buyer);
  const magnet = await createMagnetItem(buyer);
  wireSku = wire.sku;
  magnetSku = magnet.sku;
  // A released design the builder has ordered four motors of; its stock is held once it arrives.
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
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 14 },
    ],
    { name: designName },
  );
  const order = await sendJson(
    "POST",
    "/api/v1/build-orders",
    { designId: design.designId, revision: design.revision, quantity: 4 },
    builder,
  );
  expect(order.status, await order.clone().text()).toBe(201);
  orderId = ((await order.json()) as { id: number }).id;
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** GET an API route as the signed-in storekeeper (the page's own session). */
async function api<T>(path: string): Promise<T> {
  const response = await page.request.get(`${inject("baseUrl")}${path}`);
  expect(response.status(), await response.text()).toBe(200);
  return (await response.json()) as T;
}

interface ItemBooks {
  onHand: number;
  reserved: number;
  available: number;
  averageCost: number;
  balances: {
    lot: string | null;
    location: string;
    tareKg: number | null;
    onHand: number;
    reserved: number;
  }[];
}
const itemNow = (sku: string) => api<ItemBooks>(`/api/v1/items/${sku}`);

interface OrderBooks {
  status: string;
  lines: { sku: string; required: number; reserved: number; issued: number }[];
}
const orderNow = () => api<OrderBooks>(`/api/v1/build-orders/${orderId}`);
async function orderLine(sku: string) {
  const line = (await orderNow()).lines.find(
    (candidate) => candidate.sku === sku,
  );
  if (!line) throw new Error(`no line of ${sku} on BO-${orderId}`);
  return line;
}

/** The on-hand figure of one lot at one location. */
function lotOnHand(item: ItemBooks, lot: string | null, location: string) {
  const balance = item.balances.find(
    (candidate) => candidate.lot === lot && candidate.location === location,
  );
  if (!balance) throw new Error(`no balance of lot ${lot} at ${location}`);
  return balance.onHand;
}

const statusSaying = (text: string) =>
  page.getByRole("status").filter({ hasText: text });

/** On the record page: finds an item by SKU with the GET form, by keyboard. */
async function findItem(sku: string) {
  await typeInto(page, page.getByLabel("Item SKU"), sku);
  await press(page, page.getByRole("button", { name: "Find item" }));
  await page.getByRole("link", { name: sku, exact: true }).waitFor();
  await scanPage(page, found);
}

/** Types a wire spool's receipt into the open receipt form and records it. */
async function receiveSpool(spool: {
  lot: string;
  grossKg: string;
  tareKg: string;
  unitCost: string;
}) {
  await chooseOption(
    page,
    page.getByLabel("Into location"),
    `${rack} · Journey wire rack`,
  );
  await typeInto(page, page.getByLabel("Spool lot number"), spool.lot);
  await typeInto(page, page.getByLabel("Gross weight"), spool.grossKg);
  await typeInto(page, page.getByLabel("Tare weight"), spool.tareKg);
  await typeInto(page, page.getByLabel("Spool type"), "DIN 250");
  await typeInto(page, page.getByLabel("Unit cost per kg"), spool.unitCost);
  await typeInto(page, page.getByLabel("Delivery note"), "DN-4471");
  await press(page, page.getByRole("button", { name: "Receive" }));
}

describe("the storekeeper's journey", () => {
  it("signs in and receives the first spool, after a missing weight is named", async () => {
    page = await signInByKeyboard(browser, "storekeeper", found);
    await page.setViewportSize({ width: 1024, height: 1366 }); // the store's tablet, upright
    await followLink(
      page,
      mainLink(page, "Record movement"),
      "Record movement",
      found,
    );
    await findItem(wireSku);

    // Sent without the gross weight: the field says what it needs, nothing is recorded.
    await receiveSpool({
      lot: firstSpool,
      grossKg: "",
      tareKg: "0.6",
      unitCost: "14.2",
    });
    await page.getByText("Give the spool's gross weight.").waitFor();
    expect(
      await page.getByLabel("Gross weight").getAttribute("aria-invalid"),
    ).toBe("true");
    await scanPage(page, found);
    expect((await itemNow(wireSku)).onHand).toBe(0);

    // Engineering brief, worked check 6: gross 5.40 kg, tare 0.60 kg → net 4.80 kg.
    await typeInto(page, page.getByLabel("Gross weight"), "5.4");
    await press(page, page.getByRole("button", { name: "Receive" }));
    const receipt = statusSaying("Receipt recorded");
    await receipt.waitFor();
    expect(readable(await receipt.textContent())).toContain(
      `4.800 kg of ${wireSku} lot ${firstSpool} at ${rack}. On hand now 4.800 kg.`,
    );
    await scanPage(page, found);
    await saveScreenshot(page, "journey-storekeeper-receipt");
  });

  it("receives the second spool and a lot of magnets", async () => {
    // 3.10 kg gross − 0.60 kg tare = 2.50 kg net.
    await receiveSpool({
      lot: secondSpool,
      grossKg: "3.1",
      tareKg: "0.6",
      unitCost: "14.8",
    });
    await statusSaying(`lot ${secondSpool}`).waitFor();
    expect(
      readable(await statusSaying("Receipt recorded").textContent()),
    ).toContain("On hand now 7.300 kg.");
    await scanPage(page, found);

    const wire = await itemNow(wireSku);
    expect(lotOnHand(wire, firstSpool, rack)).toBe(4.8);
    expect(lotOnHand(wire, secondSpool, rack)).toBe(2.5);
    expect(wire.onHand).toBe(7.3);
    // Moving average per item (product brief): (4.80 × 14.20 + 2.50 × 14.80) / 7.30 = 14.4055 per kg.
    expect(wire.averageCost).toBeCloseTo(14.4055, 4);

    await findItem(magnetSku);
    await chooseOption(
      page,
      page.getByLabel("Into location"),
      `${drawer} · Journey magnet drawer`,
    );
    await typeInto(page, page.getByLabel("Lot (optional)"), magnetLot);
    await typeInto(page, page.getByLabel(/^Quantity/), "120");
    await typeInto(page, page.getByLabel("Unit cost per piece"), "0.85");
    await typeInto(page, page.getByLabel("Supplier's lot or heat"), "B-2291");
    await press(page, page.getByRole("button", { name: "Receive" }));
    const magnets = statusSaying(`120 pieces of ${magnetSku}`);
    await magnets.waitFor();
    expect(readable(await magnets.textContent())).toContain(
      "On hand now 120 pieces.",
    );
    await scanPage(page, found);
    expect(lotOnHand(await itemNow(magnetSku), magnetLot, drawer)).toBe(120);
  });

  it("issues to the build order by weighing the spool back", async () => {
    // The builder holds the order's stock now that it has arrived.
    const reserved = await sendJson(
      "POST",
      `/api/v1/build-orders/${orderId}/reserve`,
      {},
      builder,
    );
    expect(reserved.status, await reserved.clone().text()).toBe(200);
    const wireLine = await orderLine(wireSku);
    expect(wireLine.reserved).toBe(wireLine.required);

    await followLink(
      page,
      mainLink(page, "Build orders"),
      "Build orders",
      found,
    );
    await followLink(
      page,
      page.getByRole("link", { name: `BO-${orderId}`, exact: true }),
      new RegExp(designName),
      found,
    );
    await page.getByRole("heading", { name: "Issue to the bench" }).waitFor();
    // The oldest spool is suggested: the first one received.
    expect(
      await page
        .getByRole("radio", { name: new RegExp(`lot ${firstSpool}`) })
        .isChecked(),
    ).toBe(true);

    // Net 4.80 kg; weighed now at 4.60 kg gross − 0.60 kg tare = 4.00 kg: 0.800 kg left the spool.
    await typeInto(page, page.getByLabel("Spool gross weight now"), "4.6");
    const preview = statusSaying("the spool held");
    expect(readable(await preview.textContent())).toContain(
      "Issue 0.800 kg: the spool held 4.800 kg net and now holds 4.000 kg.",
    );
    await scanPage(page, found);
    await saveScreenshot(page, "journey-storekeeper-weigh-back");
    await press(
      page,
      page.getByRole("button", { name: `Issue 0.800 kg to BO-${orderId}` }),
    );
    const issued = statusSaying("Issued 0.800 kg");
    await issued.waitFor();
    expect(readable(await issued.textContent())).toContain(
      `of ${wireSku} lot ${firstSpool} at ${rack} to BO-${orderId}.`,
    );
    await scanPage(page, found);

    const afterIssue = await orderLine(wireSku);
    expect(afterIssue.issued).toBe(0.8);
    // What was issued is no longer held: the rest of what the order needs still is.
    expect(afterIssue.reserved).toBeCloseTo(wireLine.required - 0.8, 3);
    const wire = await itemNow(wireSku);
    expect(lotOnHand(wire, firstSpool, rack)).toBe(4);
    expect(wire.onHand).toBeCloseTo(7.3 - 0.8, 3);
    expect((await orderNow()).status).toBe("in_progress");
  });

  it("issues the order's magnets by count", async () => {
    const magnetLine = await orderLine(magnetSku);
    await chooseRadio(
      page,
      page.getByRole("radio", { name: new RegExp(magnetSku) }),
    );
    await typeInto(
      page,
      page.getByLabel(/^Quantity/),
      String(magnetLine.reserved),
    );
    await press(
      page,
      page.getByRole("button", { name: `Issue to BO-${orderId}` }),
    );
    await statusSaying(`Issued ${magnetLine.reserved} pieces`).waitFor();
    await page.getByRole("heading", { name: "Issued to the build" }).waitFor();
    await scanPage(page, found);
    await saveScreenshot(page, "journey-storekeeper-issued");
    expect((await orderLine(magnetSku)).issued).toBe(magnetLine.reserved);
    expect((await itemNow(magnetSku)).onHand).toBe(120 - magnetLine.reserved);
  });

  it("counts the magnet bin and records the difference", async () => {
    const books = (await itemNow(magnetSku)).onHand;
    const counted = books - 2;
    countedMagnets = counted;
    await followLink(
      page,
      mainLink(page, "Record movement"),
      "Record movement",
      found,
    );
    await press(
      page,
      page
        .getByRole("navigation", { name: "Movement type" })
        .getByRole("link", { name: "Count" }),
    );
    await page.waitForURL(/type=count/);
    // The address changes before React draws the count form: wait for its help.
    await page
      .getByText("What you found in a bin; the difference is recorded.")
      .waitFor();
    await scanPage(page, found);
    await findItem(magnetSku);
    // The bin's one balance is chosen; the storekeeper types what is in it.
    expect(
      await page
        .getByRole("radio", { name: new RegExp(`lot ${magnetLot}`) })
        .isChecked(),
    ).toBe(true);
    await typeInto(page, page.getByLabel("Counted"), String(counted));
    const difference = statusSaying("Difference to the books");
    expect(readable(await difference.textContent())).toMatch(
      /^Difference to the books: −2 pieces$/,
    );
    await scanPage(page, found);
    await saveScreenshot(page, "journey-storekeeper-count");
    await typeInto(
      page,
      page.getByLabel("Note (optional)"),
      "Two chipped, set aside",
    );
    await press(page, page.getByRole("button", { name: "Record count" }));
    const recorded = statusSaying("Count recorded");
    await recorded.waitFor();
    expect(readable(await recorded.textContent())).toContain(
      `On hand now ${counted} pieces.`,
    );
    await scanPage(page, found);

    expect((await itemNow(magnetSku)).onHand).toBe(counted);
    const journal = await api<{
      movements: { type: string; quantity: number; countedQuantity: number }[];
    }>(`/api/v1/stock-movements?sku=${magnetSku}&type=count`);
    expect(journal.movements).toHaveLength(1);
    expect(journal.movements[0]).toMatchObject({
      quantity: -2,
      countedQuantity: counted,
    });
  });

  it("sees the balances on the stock list and the item pages", async () => {
    const wire = await itemNow(wireSku);
    // 4.000 kg left on the weighed spool + 2.500 kg on the other.
    expect(wire.onHand).toBeCloseTo(6.5, 3);
    await searchStockByKeyboard(page, wireSku, found);
    const row = readable(
      await page
        .getByRole("row")
        .filter({ has: page.getByRole("link", { name: wireSku }) })
        .textContent(),
    );
    for (const figure of [wire.onHand, wire.reserved, wire.available])
      expect(row).toContain(readable(formatStockQuantity(figure, "kg")));

    await followLink(
      page,
      page.getByRole("link", { name: wireSku, exact: true }),
      "Enamelled copper 0.80 mm grade 2",
      found,
    );
    const balances = page.getByRole("table", {
      name: `On hand of ${wireSku} by location and lot`,
    });
    for (const lot of [firstSpool, secondSpool])
      expect(
        readable(
          await balances
            .getByRole("row", { name: new RegExp(lot) })
            .textContent(),
        ),
      ).toContain(
        readable(formatStockQuantity(lotOnHand(wire, lot, rack), "kg")),
      );
    await saveScreenshot(page, "journey-storekeeper-wire-balances");

    await searchStockByKeyboard(page, magnetSku, found);
    await followLink(
      page,
      page.getByRole("link", { name: magnetSku, exact: true }),
      "N42SH block 20×10×5",
      found,
    );
    const magnetBalance = page
      .getByRole("table", {
        name: `On hand of ${magnetSku} by location and lot`,
      })
      .getByRole("row", { name: new RegExp(magnetLot) });
    expect(readable(await magnetBalance.textContent())).toContain(
      `${countedMagnets} pieces`,
    );
    const lastMovement = page
      .getByRole("table", { name: `Movements of ${magnetSku}, newest first` })
      .getByRole("row")
      .nth(1);
    expect(readable(await lastMovement.textContent())).toMatch(
      /Count.*−2 pieces/,
    );
    await saveScreenshot(page, "journey-storekeeper-magnet-balances");
  });

  it("found no serious or critical accessibility violation on any page", () => {
    expect(found).toEqual([]);
  });
});
