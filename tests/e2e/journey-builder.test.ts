/**
 * The builder's journey in Chromium, by keyboard alone, from sign-in to held
 * stock: create a design, add a coil line and watch the copper and the cost per
 * motor move in place as its end-turn length and turns change, add a magnet
 * line, release the revision, make a build order of it and reserve its stock.
 * Every page is scanned with axe-core in each state it reaches; the figures are
 * checked against the costing and build-order APIs.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { formatQuantity } from "~/lib/format";
import { scanPage } from "../support/accessibility";
import { signInAs } from "../support/app-client";
import { flashAfter, launchBrowser, saveScreenshot } from "../support/browser";
import {
  createMagnetItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import { followLink, mainLink, signInByKeyboard } from "../support/journey";
import { chooseOption, press, typeInto } from "../support/keyboard";
import { readable, waitForText } from "../support/page-text";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
const found: string[] = [];
let wireSku = "";
let magnetSku = "";
const designName = uniqueCode("Journey outrunner");
let revisionPath = "";
let orderPath = "";

/** What the wire was received at: the stock-average basis prices it so. */
const wireCostPerKg = 14.2;
const magnetCostEach = 0.9;

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const wire = await createWireItem(buyer);
  const magnet = await createMagnetItem(buyer);
  wireSku = wire.sku;
  magnetSku = magnet.sku;
  await receive(storekeeper, {
    sku: wireSku,
    lot: uniqueCode("SP"),
    location: await createLocation(uniqueCode("JW"), "Journey wire rack"),
    grossKg: 5.4,
    tareKg: 0.6,
    unitCost: wireCostPerKg,
  });
  await receive(storekeeper, {
    sku: magnetSku,
    location: await createLocation(uniqueCode("JM"), "Journey magnet drawer"),
    quantity: 100,
    unitCost: magnetCostEach,
  });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** GET an API route as the signed-in builder (the page's own session). */
async function api<T>(path: string): Promise<T> {
  const response = await page.request.get(`${inject("baseUrl")}${path}`);
  expect(response.status(), await response.text()).toBe(200);
  return (await response.json()) as T;
}

interface Costing {
  currency: string;
  costPerMotor: number;
  lines: { sku: string; perMotorQuantity: number; cost: number | null }[];
}
const costingNow = () =>
  api<Costing>(
    `${revisionPath.replace("/designs", "/api/v1/designs")}/costing?basis=stock-average`,
  );

/** Money as the page shows it: to the cent, with the currency. */
const shownMoney = (value: number, currency: string) =>
  readable(formatQuantity(value, currency, 2));

const copperPerMotor = () =>
  page
    .getByRole("table", {
      name: "Coil lines with their copper figures per motor",
    })
    .getByRole("row")
    .nth(1)
    .getByRole("cell")
    .nth(2)
    .innerText();
const costPerMotor = () =>
  page
    .getByRole("group", { name: "Cost per motor" })
    .locator("dd")
    .first()
    .innerText();
/** Presses the editor's save button and waits until the page shows the saved line's figures (its message). */
async function saveLine(button: "Add line" | "Save line") {
  await flashAfter(page, "Line saved.", () =>
    press(page, page.getByRole("button", { name: button })),
  );
}

/** The cost per motor on the page is the costing API's, to the cent; returns the API's. */
async function expectPageCostFromApi(): Promise<Costing> {
  const costing = await costingNow();
  expect(readable(await costPerMotor())).toBe(
    shownMoney(costing.costPerMotor, costing.currency),
  );
  return costing;
}

/** Set once on the page: still there later means no reload happened in between. */
const markPage = () =>
  page.evaluate(() => {
    (window as unknown as { stayedHere: boolean }).stayedHere = true;
  });
const pageStayed = () =>
  page.evaluate(
    () => (window as unknown as { stayedHere?: boolean }).stayedHere === true,
  );

describe("the builder's journey", () => {
  it("signs in and creates a design, after a field message", async () => {
    page = await signInByKeyboard(browser, "builder", found);
    await followLink(page, mainLink(page, "Designs"), "Designs", found);

    await typeInto(page, page.getByLabel("Name", { exact: true }), designName);
    await typeInto(page, page.getByLabel("Motor type"), "outrunner");
    await typeInto(page, page.getByLabel("Poles"), "13");
    await typeInto(page, page.getByLabel("Slots"), "12");
    // Leaving the field checks it: an odd number of poles is refused beside it.
    await page.getByText("A motor has an even number of poles.").waitFor();
    await scanPage(page, found);
    await typeInto(page, page.getByLabel("Poles"), "14");
    await typeInto(page, page.getByLabel("Rated current"), "10");
    await typeInto(page, page.getByLabel("Rated torque (N·m)"), "2");
    await chooseOption(page, page.getByLabel("Rated torque is"), "measured");
    await press(page, page.getByRole("button", { name: "Create design" }));

    await page.waitForURL(/\/designs\/\d+\/revisions\/1$/);
    await page.getByRole("heading", { name: designName, level: 1 }).waitFor();
    revisionPath = new URL(page.url()).pathname;
    expect(await page.getByText("Draft", { exact: true }).isVisible()).toBe(
      true,
    );
    await scanPage(page, found);
    await saveScreenshot(page, "journey-builder-new-design");
  });

  it("prices the lines at the moving average cost of stock", async () => {
    await chooseOption(
      page,
      page.getByLabel("Price lines by"),
      "Moving average cost of stock",
    );
    await press(page, page.getByRole("button", { name: "Update costs" }));
    await page.waitForURL(/basis=stock-average/);
    await page.getByRole("group", { name: "Cost per motor" }).waitFor();
    await scanPage(page, found);
  });

  it("adds a coil line and sees its copper and cost", async () => {
    await markPage();
    await press(page, page.getByRole("button", { name: "+ Add a coil line" }));
    await page.getByRole("heading", { name: "New coil line" }).waitFor();
    await scanPage(page, found);
    await typeInto(page, page.getByLabel("Wire (SKU)"), wireSku);
    await typeInto(page, page.getByLabel("Turns", { exact: true }), "40");
    await typeInto(page, page.getByLabel("Active length"), "50");
    await typeInto(page, page.getByLabel("End-turn length"), "30");
    await typeInto(page, page.getByLabel("Lead length"), "150");
    await typeInto(page, page.getByLabel("Coils per motor"), "12");
    await typeInto(page, page.getByLabel("Operating temperature"), "20");
    await saveLine("Add line");

    // Engineering brief, worked check 4: 6.700 m per coil with its leads; 12 coils → 80.400 m.
    await waitForText(page, copperPerMotor, /^80\.400 m$/);
    // Worked check 4 again: 30.84 g drawn per coil with 3 % scrap; × 12 × 14.20 per kg = 5.2548 → 5.25.
    const costing = await expectPageCostFromApi();
    expect(readable(await costPerMotor())).toBe("5.25 EUR");
    expect(costing.lines).toHaveLength(1);
    await page.getByRole("heading", { name: "Change coil line 1" }).waitFor();
    await scanPage(page, found);
  });

  it("watches the cost per motor move as the end-turn length and the turns change, without a reload", async () => {
    const first = await costingNow();

    await typeInto(page, page.getByLabel("End-turn length"), "60");
    await saveLine("Save line");
    // MLT = 2 × 50 + 2 × 60 = 220 mm (brief, Coils); 40 × 220 mm + 2 × 150 mm = 9.100 m; × 12 = 109.200 m.
    await waitForText(page, copperPerMotor, /^109\.200 m$/);
    const longerEnds = await expectPageCostFromApi();
    // Longer end turns: more copper drawn, so more cost.
    expect(longerEnds.costPerMotor).toBeGreaterThan(first.costPerMotor);

    await typeInto(page, page.getByLabel("Turns", { exact: true }), "30");
    await saveLine("Save line");
    // 30 × 220 mm + 2 × 150 mm = 6.900 m per coil; × 12 = 82.800 m.
    await waitForText(page, copperPerMotor, /^82\.800 m$/);
    const fewerTurns = await expectPageCostFromApi();
    expect(fewerTurns.costPerMotor).toBeLessThan(longerEnds.costPerMotor);
    // Priced at the wire's one receipt: cost = kg drawn × 14.20, to 0.0001.
    expect(fewerTurns.lines[0]!.cost).toBeCloseTo(
      fewerTurns.lines[0]!.perMotorQuantity * wireCostPerKg,
      4,
    );

    expect(await pageStayed()).toBe(true);
    await scanPage(page, found);
    await saveScreenshot(page, "journey-builder-coil-costs");
    await press(page, page.getByRole("button", { name: "Close" }));
  });

  it("adds a magnet line, whose pieces add to the cost", async () => {
    const before = await costingNow();
    await press(
      page,
      page.getByRole("button", { name: "+ Add a magnet line" }),
    );
    await page.getByRole("heading", { name: "New magnet line" }).waitFor();
    await typeInto(page, page.getByLabel("Magnet (SKU)"), magnetSku);
    await typeInto(page, page.getByLabel("Pieces per motor"), "14");
    await saveLine("Add line");
    await page
      .getByRole("heading", { name: "Handle strong magnets with care" })
      .waitFor();
    await expect.poll(async () => (await costingNow()).lines.length).toBe(2);
    const after = await expectPageCostFromApi();
    // 14 magnets at the 0.90 each they were received at: 12.60 more per motor.
    expect(after.costPerMotor - before.costPerMotor).toBeCloseTo(
      14 * magnetCostEach,
      4,
    );
    expect(await pageStayed()).toBe(true);
    await scanPage(page, found);
    await press(page, page.getByRole("button", { name: "Close" }));
  });

  it("releases the revision, which is then read-only", async () => {
    await press(
      page,
      page.getByRole("button", { name: "Release revision 1…" }),
    );
    await scanPage(page, found);
    await press(page, page.getByRole("button", { name: "Release for good" }));
    await page.getByText("This revision is released and read-only").waitFor();
    expect(await page.getByText("Released", { exact: true }).isVisible()).toBe(
      true,
    );
    expect(
      await page.getByRole("button", { name: "+ Add a coil line" }).count(),
    ).toBe(0);
    const revision = await api<{ status: string }>(
      revisionPath.replace("/designs", "/api/v1/designs"),
    );
    expect(revision.status).toBe("released");
    await scanPage(page, found);
    await saveScreenshot(page, "journey-builder-released");
  });

  it("makes a build order of two motors and holds their stock", async () => {
    const costing = await costingNow();
    await followLink(
      page,
      mainLink(page, "Build orders"),
      "Build orders",
      found,
    );
    await chooseOption(
      page,
      page.getByLabel("Design revision"),
      `${designName} · rev. 1`,
    );
    await typeInto(page, page.getByLabel("Motors to build"), "2");
    await press(page, page.getByRole("button", { name: "Create build order" }));
    await page
      .getByRole("heading", { level: 1, name: new RegExp(designName) })
      .waitFor();
    orderPath = new URL(page.url()).pathname;
    expect(orderPath).toMatch(/^\/build-orders\/\d+$/);
    await scanPage(page, found);

    const draft = await buildOrderNow();
    expect(draft.status).toBe("draft");
    // What two motors need is the costing's per-motor quantity × 2, wire rounded up to the gram.
    const perMotor = new Map(
      costing.lines.map((line) => [line.sku, line.perMotorQuantity]),
    );
    expect(lineOf(draft, wireSku).required).toBe(
      Math.ceil(Number((perMotor.get(wireSku)! * 2 * 1000).toFixed(4))) / 1000,
    );
    expect(lineOf(draft, magnetSku).required).toBe(28);

    await press(page, page.getByRole("button", { name: "Reserve stock" }));
    const held = page.getByRole("status").filter({ hasText: "Held for" });
    await held.waitFor();
    expect(await page.getByText("Stock held").first().isVisible()).toBe(true);
    await scanPage(page, found);
    await saveScreenshot(page, "journey-builder-stock-held");

    const reserved = await buildOrderNow();
    expect(reserved.status).toBe("reserved");
    for (const line of reserved.lines) {
      expect(line.reserved, line.sku).toBe(line.required);
      expect(line.toReserve, line.sku).toBe(0);
    }
    const wireHeld = lineOf(reserved, wireSku).reserved;
    expect(readable(await held.textContent())).toContain(
      `${readable(formatQuantity(wireHeld, "kg", 3))} of ${wireSku}`,
    );
    // The items' own books: only this order holds them, so reserved = what it holds.
    const wireItem = await api<ItemBooks>(`/api/v1/items/${wireSku}`);
    expect(wireItem.reserved).toBe(wireHeld);
    expect(wireItem.available).toBeCloseTo(wireItem.onHand - wireHeld, 3);
    const magnetItem = await api<ItemBooks>(`/api/v1/items/${magnetSku}`);
    expect(magnetItem.reserved).toBe(28);
    expect(magnetItem.available).toBe(100 - 28);
  });

  it("found no serious or critical accessibility violation on any page", () => {
    expect(found).toEqual([]);
  });
});

interface ItemBooks {
  onHand: number;
  reserved: number;
  available: number;
}
interface BuildOrderBooks {
  status: string;
  lines: {
    sku: string;
    required: number;
    reserved: number;
    toReserve: number;
  }[];
}
const buildOrderNow = () =>
  api<BuildOrderBooks>(
    orderPath.replace("/build-orders", "/api/v1/build-orders"),
  );
function lineOf(order: BuildOrderBooks, sku: string) {
  const line = order.lines.find((candidate) => candidate.sku === sku);
  if (!line) throw new Error(`no line of ${sku} on the order`);
  return line;
}
