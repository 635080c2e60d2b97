/** Issue 19, fix 8: a wire item of an IEC size between the R20/R40 steps (0.350 mm). */
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("a wire item between the R20/R40 steps", () => {
  it("is refused at 0.3505 mm beside the field and added at 0.350 mm", async () => {
    const page = await signIn(browser, "buyer");
    const sku = uniqueCode("E2E-035");
    await page.goto(`${baseUrl()}/stock/items/new`);
    await page
      .getByRole("heading", { name: "New catalogue item", level: 1 })
      .waitFor();
    await page.getByRole("radio", { name: /Magnet wire/ }).check();
    await page.getByLabel("SKU", { exact: true }).fill(sku);
    await page
      .getByLabel("Name", { exact: true })
      .fill("Enamelled copper 0.35 mm, grade 2, class 180");
    await page.getByLabel("Conductor").selectOption("copper");
    await page.getByLabel("Sizes").selectOption("IEC");
    const size = page.getByLabel("Nominal diameter (mm)");
    await size.fill("0.3505");
    await page.getByLabel("Insulation").selectOption("grade2");
    await page.getByLabel("Thermal class").selectOption("180");
    await page.getByLabel("Enamel").selectOption("polyesterimide");
    await page.getByRole("button", { name: "Add to catalogue" }).click();
    await page.getByText("Give the nominal diameter to 0.001 mm").waitFor();

    await size.fill("0.350");
    // 0.350 mm copper: π/4 × 0.1225 mm² × 8.89 g/cm³ = 0.8553 g/m
    // (GNU units "8.89*pi/4*0.35^2" → 0.85531823).
    await expect
      .poll(() => page.getByText(/^Bare conductor/).textContent())
      .toContain("0.8553\u00a0g/m");
    await saveScreenshot(page, "stock-new-item-between-steps");
    await page.getByRole("button", { name: "Add to catalogue" }).click();

    await page.waitForURL(`${baseUrl()}/stock/items/${sku}`);
    await expect
      .poll(() => page.locator("main").textContent())
      .toContain("0.350\u00a0mm nominal (between the R20/R40 steps)");
    await saveScreenshot(page, "stock-item-between-steps");
    await page.close();
  });
});

describe("the magnet grades table", () => {
  it("shows each grade's HcJ coefficient and Curie temperature, and the admin's form takes them", async () => {
    const page = await signIn(browser, "admin");
    await page.goto(`${baseUrl()}/reference?table=magnet-grades`);
    await page.getByRole("heading", { name: "Add a magnet grade" }).waitFor();
    await expect(page.locator("main").textContent()).resolves.toContain(
      "HcJ temp. coefficient",
    );
    // A plausible data sheet (values near N45SH) with a Curie point below its rating and
    // an HcJ coefficient of the wrong sign for NdFeB.
    const values: [RegExp, string][] = [
      [/^Grade name/, `N45E2E${uniqueCode("G").slice(-4)}`],
      [/^Br, lowest/, "1.32"],
      [/^Br, highest/, "1.37"],
      [/^HcB, minimum/, "980"],
      [/^HcJ, minimum/, "1600"],
      [/^\(BH\)max, lowest/, "340"],
      [/^\(BH\)max, highest/, "366"],
      [/^Recoil permeability/, "1.05"],
      [/^Max. working temperature/, "150"],
      [/^Br temperature coefficient/, "-0.11"],
      [/^HcJ temperature coefficient/, "0.5"],
      [/^Curie temperature/, "140"],
      [/^Density/, "7.55"],
      [/^Source/, "A browser test's invented data sheet"],
    ];
    for (const [label, value] of values) {
      await page.getByLabel(label).fill(value);
    }
    await page.getByRole("button", { name: "Add grade" }).click();
    await page.getByText("HcJ of NdFeB and SmCo falls as they warm").waitFor();
    await saveScreenshot(page, "magnet-grade-form-temperature-fields");
    await page.close();
  });
});
