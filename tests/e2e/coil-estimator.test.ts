import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";

let browser: Browser;
let page: Page;
beforeAll(async () => {
  browser = await launchBrowser();
  page = await signIn(browser, "builder");
  await page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name: "Coil estimator" })
    .click();
  await page.getByRole("heading", { name: "Coil estimator" }).waitFor();
});
afterAll(async () => {
  await browser?.close();
});

const resultCell = (quantity: string, column: 1 | 2) =>
  page
    .getByRole("table", { name: "Coil estimate per coil and for all coils" })
    .getByRole("row", { name: new RegExp(`^${quantity}`) })
    .getByRole("cell")
    .nth(column - 1);

async function waitForText(
  read: () => Promise<string>,
  expected: RegExp,
  timeoutMs = 10_000,
): Promise<string> {
  const started = Date.now();
  let last = "";
  while (Date.now() - started < timeoutMs) {
    last = await read();
    if (expected.test(last)) return last;
    await page.waitForTimeout(100);
  }
  throw new Error(`expected ${expected}, last saw "${last}"`);
}

describe("coil estimator", () => {
  it("opens with the brief's worked check 4 coil and its figures", async () => {
    // Source: engineering brief, worked check 4 with 150 mm leads and 3 % scrap.
    await waitForText(
      () => resultCell("Conductor wound", 1).innerText(),
      /^6\.700\sm$/,
    );
    expect(await resultCell("Resistance at 20 °C", 1).innerText()).toMatch(
      /^0\.22981\sΩ$/,
    );
    expect(await resultCell("Mass drawn from stock", 1).innerText()).toMatch(
      /^30\.84\sg$/,
    );
    expect(
      await page
        .getByRole("img", { name: /Coil to scale/ })
        .getAttribute("aria-label"),
    ).toContain("62.5 %");
    await saveScreenshot(page, "coil-estimator");
  });

  it("updates as the builder types, without reloading the page", async () => {
    await page.evaluate(
      () => ((window as unknown as { stayedHere: boolean }).stayedHere = true),
    );
    await page.getByLabel("Turns", { exact: true }).fill("80");
    // 80 turns × 160 mm + 2 × 150 mm = 13.100 m.
    await waitForText(
      () => resultCell("Conductor wound", 1).innerText(),
      /^13\.100\sm$/,
    );
    expect(
      await page.evaluate(
        () => (window as unknown as { stayedHere?: boolean }).stayedHere,
      ),
    ).toBe(true);
  });

  it("switches the results to imperial units", async () => {
    await page.getByText("Imperial", { exact: true }).click();
    // 13.100 m / 0.3048 m/ft = 42.98 ft (exact foot, NIST).
    await waitForText(
      () => resultCell("Conductor wound", 1).innerText(),
      /^42\.98\sft$/,
    );
    await page.getByText("Metric", { exact: true }).click();
  });

  it("shows a field message for impossible input and keeps the last good figures", async () => {
    await page.getByLabel("Turns", { exact: true }).fill("0");
    await page.getByText("Turns must be at least 1.").waitFor();
    expect(await resultCell("Conductor wound", 1).innerText()).toMatch(
      /^13\.100\sm$/,
    );
    await saveScreenshot(page, "coil-estimator-bad-input");
    await page.getByLabel("Turns", { exact: true }).fill("40");
  });

  it("hands an end-turn estimate from the lamination to the form", async () => {
    await page
      .getByText("Estimate the end-turn length from the lamination")
      .click();
    await page.getByLabel("Slot pitch τu").fill("12");
    await page.getByLabel("Tooth width wt").fill("6");
    // Bianchi 2006 tooth coil: (π/4)(12 + 6) = 14.137 mm → 14.1 mm.
    await page.getByRole("button", { name: "Use this length" }).click();
    expect(await page.getByLabel("End-turn length").inputValue()).toBe("14.1");
    // 40 × (100 + 28.2) mm + 300 mm = 5.428 m.
    await waitForText(
      () => resultCell("Conductor wound", 1).innerText(),
      /^5\.428\sm$/,
    );
    await saveScreenshot(page, "coil-estimator-end-turn-helper");
  });

  it("prints without the menu and the form's buttons", async () => {
    await page.emulateMedia({ media: "print" });
    expect(
      await page.getByRole("button", { name: "Estimate" }).isVisible(),
    ).toBe(false);
    await saveScreenshot(page, "coil-estimator-print");
    await page.emulateMedia({ media: "screen" });
  });
});
