import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";

let browser: Browser;
let page: Page;
beforeAll(async () => {
  browser = await launchBrowser();
  page = await signIn(browser, "builder");
  await page.goto(new URL("/tools/coil-estimator", page.url()).toString());
  await page.getByRole("heading", { name: "Coil estimator" }).waitFor();
});
afterAll(async () => {
  await browser?.close();
});

const figure = (label: string) =>
  page
    .getByRole("region", { name: "Current density and AC resistance" })
    .locator("div", { has: page.getByText(label, { exact: true }) })
    .locator("dd")
    .first();

async function waitForText(
  read: () => Promise<string>,
  expected: RegExp,
  timeoutMs = 10_000,
): Promise<string> {
  const started = Date.now();
  let last = "";
  while (Date.now() - started < timeoutMs) {
    last = await read().catch(() => "");
    if (expected.test(last)) return last;
    await page.waitForTimeout(100);
  }
  throw new Error(`expected ${expected}, last saw "${last}"`);
}

describe("coil estimator: current density, AC resistance and heat", () => {
  it("shows the current density of the starting coil with the common-practice ranges", async () => {
    // 10 A in 0.80 mm: 10 / (π/4 · 0.64) = 19.89 A/mm², above fan cooling (10 A/mm²).
    await waitForText(
      () => figure("Current density").innerText(),
      /^19\.89\sA\/mm²$/,
    );
    await page.getByText("needs liquid cooling or short duty").waitFor();
    await page
      .getByText(/Common practice|common practice/)
      .first()
      .waitFor();
    expect(await figure("Skin depth").innerText()).toBe("give a frequency");
  });

  it("gives skin depth and AC resistance once a frequency is typed", async () => {
    await page.getByLabel("Frequency").fill("10000");
    await page.getByLabel("Layers per coil").fill("4");
    // Skin depth of copper at 10 kHz and 120 °C: 0.66085 mm · √1.393 = 0.780 mm (GNU units
    // gives 0.66085493 mm at 20 °C; ρ(120 °C) = 1.393 ρ20 by IEC 60028's α 0.00393).
    await waitForText(() => figure("Skin depth").innerText(), /^0\.780\smm$/);
    const ratio = Number(await figure("AC / DC resistance").innerText());
    expect(ratio).toBeGreaterThan(1.5);
    await page
      .getByRole("table", { name: "Loss at the fundamental and harmonics" })
      .waitFor();
    await page.getByText(/hot enough to burn/).waitFor();
    await saveScreenshot(page, "coil-estimator-ac");
  });

  it("finds the operating temperature from a given rise", async () => {
    await page.getByLabel("Ambient").fill("40");
    await page.getByLabel("Temperature rise").fill("60");
    // 40 °C + 60 K = 100.0 °C.
    await waitForText(
      () => figure("Operating temperature").innerText(),
      /^100\.0\s°C$/,
    );
    await saveScreenshot(page, "coil-estimator-operating-temperature");
  });

  it("names the field when both a thermal resistance and a rise are given", async () => {
    await page.getByLabel("Thermal resistance").fill("2");
    await page
      .getByText(
        "Give either the thermal resistance or the temperature rise, not both.",
      )
      .waitFor();
    await page.getByLabel("Thermal resistance").fill("");
  });

  it("estimates litz and flat wire", async () => {
    await page.getByLabel("Wire form").selectOption("litz");
    await page
      .getByLabel("Nominal diameter of each strand")
      .selectOption("0.100");
    await page.getByLabel("Insulation").selectOption("grade1");
    await page.getByLabel("Strands in the litz").fill("100");
    await page.getByText(/^Litz: 100 strands of 0\.100\smm/).waitFor();
    // 10 A over 100 · π/4 · 0.1² = 0.7854 mm²: 12.73 A/mm².
    await waitForText(
      () => figure("Current density").innerText(),
      /^12\.73\sA\/mm²$/,
    );
    await saveScreenshot(page, "coil-estimator-litz");

    await page.getByLabel("Wire form").selectOption("rectangular");
    await page.getByLabel("Thickness (mm)", { exact: true }).fill("2");
    await page.getByLabel("Width (mm)", { exact: true }).fill("8");
    // IEC 60317-0-2 corner radius 0.65 mm: 2·8 − (4 − π)·0.65² = 15.6373 mm².
    await page.getByText(/15\.6373\smm² of copper/).waitFor();
    await page.getByLabel("Width (mm)", { exact: true }).fill("30");
    await page
      .getByText(/at most 16|covers widths/)
      .first()
      .waitFor();
    await saveScreenshot(page, "coil-estimator-flat-bad-width");
  });
});
