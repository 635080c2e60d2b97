/**
 * The builder's design screens in Chromium: create a design, add a coil line,
 * watch its copper figures and the cost per motor change as the end-turn
 * length changes (no page reload), release it and find it read-only, then
 * build two motors of it and hold their stock (the storekeeper's issue is in
 * build-order-journey.test.ts).
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import path from "node:path";
import {
  flashAfter,
  launchBrowser,
  saveScreenshot,
  screenshotFolder,
  signIn,
} from "../support/browser";
import { readable, waitForText } from "../support/page-text";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let page: Page;
let wireSku = "";
let magnetSku = "";
const designName = `E2E outrunner ${uniqueCode("D")}`;

beforeAll(async () => {
  browser = await launchBrowser();
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  wireSku = uniqueCode("EW");
  magnetSku = uniqueCode("EM");
  for (const item of [
    {
      kind: "wire",
      sku: wireSku,
      name: "Enamelled copper 0.80 mm grade 2",
      conductor: "copper",
      standard: "IEC",
      size: "0.8",
      insulation: "grade2",
      thermalClass: 155,
      enamel: "polyesterimide",
    },
    {
      kind: "magnet",
      sku: magnetSku,
      name: "N42SH block 20 × 10 × 5",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      coating: "NiCuNi",
      magnetisation: "through 5 mm",
    },
  ]) {
    const response = await sendJson("POST", "/api/v1/items", item, buyer);
    expect(response.status, await response.clone().text()).toBe(201);
  }
  // 5 kg of the wire received at 14.20 per kg: what the stock-average basis prices it at.
  const receipt = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "receipt",
      sku: wireSku,
      quantity: 5,
      location: await createLocation(uniqueCode("ES")),
      lot: uniqueCode("SP"),
      unitCost: 14.2,
    },
    storekeeper,
  );
  expect(receipt.status, await receipt.clone().text()).toBe(201);
  // Magnets on hand too, so the build order at the end can hold everything it needs.
  const magnets = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    {
      type: "receipt",
      sku: magnetSku,
      quantity: 100,
      location: await createLocation(uniqueCode("EM")),
      unitCost: 0.9,
    },
    storekeeper,
  );
  expect(magnets.status, await magnets.clone().text()).toBe(201);
  page = await signIn(browser, "builder");
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const coilCell = (column: number) =>
  page
    .getByRole("table", {
      name: "Coil lines with their copper figures per motor",
    })
    .getByRole("row")
    .nth(1)
    .getByRole("cell")
    .nth(column);
const copperCell = () => coilCell(2);
const torqueEstimate = () =>
  page.getByRole("group", { name: "Torque, first-order estimate" });
const costPerMotor = () =>
  page.getByRole("group", { name: "Cost per motor" }).locator("dd").first();

describe("design editor", () => {
  it("creates a design from the designs page", async () => {
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Designs" })
      .click();
    await page.getByRole("heading", { name: "Designs", level: 1 }).waitFor();
    // A field message first: an odd number of poles.
    await page.getByLabel("Name").fill(designName);
    await page.getByLabel("Motor type").fill("outrunner");
    await page.getByLabel("Poles").fill("13");
    await page.getByLabel("Slots").fill("12");
    await page.getByLabel("Rated current").fill("10");
    await page.getByLabel("Rated torque (N·m)").fill("2");
    await page.getByLabel("Rated torque is").selectOption("measured");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.getByText("A motor has an even number of poles.").waitFor();
    await page.getByLabel("Poles").fill("14");
    await page.getByRole("button", { name: "Create design" }).click();
    await page.waitForURL(/\/designs\/\d+\/revisions\/1$/);
    await page.getByRole("heading", { name: designName, level: 1 }).waitFor();
    expect(await page.getByText("Draft", { exact: true }).isVisible()).toBe(
      true,
    );
  });

  it("adds a coil line and shows its copper figures and cost", async () => {
    // Price the lines at the moving average cost of stock (the wire was received at 14.20 per kg).
    await page.getByLabel("Price lines by").selectOption("stock-average");
    await page.getByRole("button", { name: "Update costs" }).click();
    await page.waitForURL(/basis=stock-average/);

    await page.getByRole("button", { name: "+ Add a coil line" }).click();
    await page.getByRole("heading", { name: "New coil line" }).waitFor();
    const wire = page.getByLabel("Wire (SKU)");
    await wire.fill(wireSku.slice(0, 5));
    // The choices come from the catalogue as the builder types: only wire items.
    await waitForText(
      page,
      () =>
        page
          .locator(`datalist option[value="${wireSku}"]`)
          .evaluate((option) => (option as HTMLOptionElement).value),
      new RegExp(wireSku),
    );
    await wire.fill(wireSku);
    await page.getByLabel("Turns", { exact: true }).fill("40");
    await page.getByLabel("Active length").fill("50");
    await page.getByLabel("End-turn length").fill("30");
    await page.getByLabel("Lead length").fill("150");
    await page.getByLabel("Coils per motor").fill("12");
    await page.getByLabel("Operating temperature").fill("20");
    await page.getByRole("button", { name: "Add line" }).click();

    // Engineering brief, worked check 4: 6.700 m per coil with its leads; 12 coils → 80.400 m.
    await waitForText(page, () => copperCell().innerText(), /^80\.400 m$/);
    // 3 % scrap: 12 × 30.84 g = 370.05 g of bare copper × 14.20 per kg = 5.2548 → 5.25.
    expect(readable(await coilCell(3).innerText())).toMatch(
      /370 g\s+bare conductor/,
    );
    await waitForText(page, () => costPerMotor().innerText(), /^5\.25 EUR$/);
    expect(
      readable(
        await page.getByRole("group", { name: "Cost per N·m" }).innerText(),
      ),
    ).toContain("2.63 EUR/N·m");
    // The line's price says where it comes from.
    expect(
      await page
        .getByRole("table", { name: /where the price comes from/ })
        .innerText(),
    ).toContain("moving average cost of stock");
    // The editor stays open on the new line, now as line 1.
    await page.getByRole("heading", { name: "Change coil line 1" }).waitFor();
  });

  it("saves the motor figures and shows the first-order torque estimate, labelled as such", async () => {
    await page.getByLabel("Air-gap radius").fill("30");
    await page.getByLabel("Air-gap flux density").fill("0.9");
    await flashAfter(page, "Motor figures saved.", () =>
      page.getByRole("button", { name: "Save motor figures" }).click(),
    );
    // T = Kt · I = 3 · √2 · k_w1 · N_ph · B̂₁ · r · L · I: 12 slots / 14 poles double layer,
    // k_w1 0.9330 (Libert & Soulard's table, from memory), N_ph = 12 × 40 ÷ 3 = 160,
    // B̂₁ = (4/π) · 0.9 T · sin(0.8 · 90°) = 1.0898 T, r 30 mm, L 50 mm, 10 A RMS per phase
    //   = 10.354 N·m (by hand; GNU units → 10.353662; α_p = 0.8 by default).
    await waitForText(page, () => torqueEstimate().innerText(), /10\.354 N·m/);
    expect(readable(await torqueEstimate().innerText())).toContain(
      "First-order estimate",
    );
  });

  it("shows the winding panel, and a field message for a winding that cannot be balanced", async () => {
    const panel = page.getByRole("region", {
      name: "Winding and motor constants",
    });
    const figureText = async (label: string) =>
      readable(await panel.getByRole("group", { name: label }).innerText());
    // 12 slots / 14 poles double layer: 0.933 (Libert & Soulard's table, from memory).
    await waitForText(
      page,
      () =>
        panel
          .getByRole("group", { name: "Fundamental winding factor" })
          .innerText(),
      /0\.933/,
    );
    // Kt = 10.353662 N·m ÷ 10 A = 1.035 N·m/A (the torque worked above).
    expect(await figureText("Torque constant Kt")).toContain("1.035 N·m/A");
    // Ke_LL = √3 × Kt ÷ 3 = 0.5978 V·s/rad RMS (motor-constants.test.ts, by hand).
    expect(await figureText("Back-EMF constant Ke, line to line")).toContain(
      "0.5978 V·s/rad",
    );
    // 12 coils of 0.22981 Ω with leads (brief, worked check 4), 4 per phase in series, star:
    // 2 × 4 × 0.22981 = 1.8385 Ω.
    expect(await figureText("Resistance line to line, 20 °C")).toContain(
      "1.8385 Ω",
    );
    expect(readable(await panel.innerText())).toContain(
      "RMS phase currents of a sinusoidal drive",
    );

    // 10 slots and 14 poles cannot make a balanced 3-phase winding: the message stands
    // beside Slots and nothing is saved.
    await page.getByLabel("Slots", { exact: true }).fill("10");
    await page.getByRole("button", { name: "Save motor figures" }).click();
    await page
      .getByText(/10 slots and 14 poles cannot make a balanced 3-phase winding/)
      .waitFor();
    await page.getByLabel("Slots", { exact: true }).fill("12");
    await page.getByLabel("Rated speed (rpm)", { exact: true }).fill("3000");
    await flashAfter(page, "Motor figures saved.", () =>
      page.getByRole("button", { name: "Save motor figures" }).click(),
    );
    // 7 pole pairs × 3000 rpm ÷ 60 = 350 Hz.
    await waitForText(
      page,
      () =>
        panel
          .getByRole("group", { name: "Electrical frequency at rated speed" })
          .innerText(),
      /350\.0 Hz/,
    );
    await panel.scrollIntoViewIfNeeded();
    await saveScreenshot(page, "design-winding-panel");
    await panel.screenshot({
      path: path.join(screenshotFolder, "design-winding-panel-close.png"),
    });
  });

  it("updates the copper figures and the cost as the end-turn length changes, without reloading", async () => {
    await page.evaluate(
      () => ((window as unknown as { stayedHere: boolean }).stayedHere = true),
    );
    await page.getByLabel("End-turn length").fill("60");
    await page.getByRole("button", { name: "Save line" }).click();
    // 40 × (2 × 50 + 2 × 60) mm + 2 × 150 mm = 9.100 m per coil; 12 coils → 109.200 m.
    await waitForText(page, () => copperCell().innerText(), /^109\.200 m$/);
    // 12 × 9.373 m × 0.5027 mm² × 8.89 g/cm³ = 502.61 g × 14.20 per kg = 7.14.
    await waitForText(page, () => costPerMotor().innerText(), /^7\.14 EUR$/);
    // End turns lie outside the field: the torque estimate does not move.
    expect(readable(await torqueEstimate().innerText())).toMatch(/10\.354 N·m/);
    // Longer end turns: a smaller share of each turn in the field, 100 / 220 = 45.5 %.
    expect(readable(await coilCell(5).innerText())).toBe("45.5 %");
    expect(
      await page.evaluate(
        () => (window as unknown as { stayedHere?: boolean }).stayedHere,
      ),
    ).toBe(true);
    await saveScreenshot(page, "design-editor-coil-line");

    // The end-turn estimate from the lamination fills the field: (π/4)(12 + 6) = 14.1 mm.
    await page
      .getByText("Estimate the end-turn length from the lamination")
      .click();
    await page.getByLabel("Slot pitch τu").fill("12");
    await page.getByLabel("Tooth width wt").fill("6");
    await page.getByRole("button", { name: "Use this length" }).click();
    expect(await page.getByLabel("End-turn length").inputValue()).toBe("14.1");
    await page.getByRole("button", { name: "Save line" }).click();
    // 40 × (100 + 28.2) mm + 300 mm = 5.428 m per coil; 12 coils → 65.136 m.
    await waitForText(page, () => copperCell().innerText(), /^65\.136 m$/);
    await waitForText(page, () => costPerMotor().innerText(), /^4\.26 EUR$/);
    expect(
      await page.evaluate(
        () => (window as unknown as { stayedHere?: boolean }).stayedHere,
      ),
    ).toBe(true);
  });

  it("warns beside a magnet line that runs hotter than its grade allows", async () => {
    await page.getByRole("button", { name: "+ Add a magnet line" }).click();
    await page.getByLabel("Magnet (SKU)").fill(magnetSku);
    await page.getByLabel("Pieces per motor").fill("14");
    await page.getByLabel("Magnet temperature").fill("170");
    await page.getByRole("button", { name: "Add line" }).click();
    const magnets = page.getByRole("table", {
      name: "Magnet lines with their mass per motor",
    });
    await waitForText(
      page,
      () => magnets.innerText(),
      /Check: Hotter than the grade's working temperature/,
    );
    expect(
      await page
        .getByRole("note", { name: "Checks of the magnet lines" })
        .innerText(),
    ).toContain("above the grade's 150 °C maximum working temperature");
    await page
      .getByRole("heading", { name: "Handle strong magnets with care" })
      .waitFor();
    await saveScreenshot(page, "design-editor-checks");
  });

  it("fits a phone-width window", async () => {
    await page.setViewportSize({ width: 390, height: 844 });
    await page.getByRole("heading", { name: designName, level: 1 }).waitFor();
    // Wide tables scroll inside their panel; the page's content does not run off the side.
    const overflow = await page.evaluate(() => {
      const main = document.querySelector("main")!;
      return main.scrollWidth - main.clientWidth;
    });
    expect(overflow).toBeLessThanOrEqual(0);
    await saveScreenshot(page, "design-editor-phone");
    await page.setViewportSize({ width: 1280, height: 800 });
  });

  it("releases the revision, which is then read-only", async () => {
    await page.getByRole("button", { name: "Close" }).click();
    await page.getByRole("button", { name: "Release revision 1…" }).click();
    await page.getByRole("button", { name: "Release for good" }).click();
    await page.getByText("This revision is released and read-only").waitFor();
    expect(await page.getByText("Released", { exact: true }).isVisible()).toBe(
      true,
    );
    expect(await page.getByRole("button", { name: /^Edit line/ }).count()).toBe(
      0,
    );
    expect(
      await page.getByRole("button", { name: /^Remove line/ }).count(),
    ).toBe(0);
    expect(
      await page.getByRole("button", { name: "+ Add a coil line" }).count(),
    ).toBe(0);
    expect(
      await page.getByRole("button", { name: "Save motor figures" }).count(),
    ).toBe(0);
    expect(await page.getByLabel("Poles").count()).toBe(0);
    expect(
      await page.getByRole("button", { name: "Start revision 2" }).isVisible(),
    ).toBe(true);
    // The figures stay: read-only is not empty.
    expect(readable(await copperCell().innerText())).toBe("65.136 m");
    await saveScreenshot(page, "design-editor-released");
    await page.setViewportSize({ width: 390, height: 844 });
    await saveScreenshot(page, "design-editor-released-phone");
    await page.setViewportSize({ width: 1280, height: 800 });
  });

  it("opens the printable BOM with the split and every price's source", async () => {
    await page.getByRole("link", { name: "Printable BOM" }).click();
    await page
      .getByRole("heading", { name: /revision 1$/, level: 1 })
      .waitFor();
    const bom = await page
      .getByRole("table", { name: /Bill of materials/ })
      .innerText();
    expect(bom).toContain("moving average cost of stock");
    expect(
      await page.getByText("Where the money of one motor goes").isVisible(),
    ).toBe(true);
    await page.emulateMedia({ media: "print" });
    expect(await page.getByRole("button", { name: "Print" }).isVisible()).toBe(
      false,
    );
    await saveScreenshot(page, "design-bom-print");
    await page.emulateMedia({ media: "screen" });
  });

  it("lists the design with its released revision", async () => {
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Designs" })
      .click();
    await page.getByRole("heading", { name: "Designs", level: 1 }).waitFor();
    // Designs are listed by name, a page at a time: find this one's page.
    for (let shown = 1; ; shown += 1) {
      const link = page.getByRole("link", {
        name: `${designName} revision 1, released`,
      });
      if ((await link.count()) > 0) break;
      await page.getByRole("link", { name: "Next" }).click();
      // The address changes before the next page is drawn: wait for its number.
      await page.getByText(new RegExp(`^Page ${shown + 1} of \\d+$`)).waitFor();
    }
    await saveScreenshot(page, "designs-list");
  });

  it("builds two motors of the released revision and holds their stock", async () => {
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
    await page.getByLabel("Motors to build").fill("2");
    await page.getByRole("button", { name: "Create build order" }).click();
    await page
      .getByRole("heading", { level: 1, name: new RegExp(designName) })
      .waitFor();
    // 14 magnets per motor × 2 motors (the magnet line above).
    expect(
      await page
        .getByRole("row", { name: new RegExp(magnetSku) })
        .textContent(),
    ).toContain("28");
    await page.getByRole("button", { name: "Reserve stock" }).click();
    const held = page.getByRole("status").filter({ hasText: "Held for" });
    await held.waitFor();
    expect(await held.textContent()).toContain(magnetSku);
    expect(await page.getByText("Stock held").first().isVisible()).toBe(true);
    await saveScreenshot(page, "design-editor-build-order");
  });
});
