import { randomBytes } from "node:crypto";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newPerson } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function openReference(page: Page, table: string) {
  await page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name: "Reference" })
    .click();
  await page
    .getByRole("heading", { name: "Reference tables", level: 1 })
    .waitFor();
  await page
    .getByRole("navigation", { name: "Reference tables" })
    .getByRole("link", { name: table })
    .click();
  await page.getByRole("heading", { name: table, level: 2 }).waitFor();
}

/** The text a person reads, cells apart, spaces plain. */
const text = async (locator: ReturnType<Page["locator"]>) =>
  (await locator.innerText()).replace(/\s+/g, " ").trim();

/** The body rows of a table (the header row has column headers, not cells). */
const bodyRows = (page: Page, table: string) =>
  page
    .getByRole("table", { name: table })
    .getByRole("row")
    .filter({ has: page.getByRole("cell") });

describe("reference tables", () => {
  it("wire sizes sort by diameter and filter by standard and size", async () => {
    const page = await signIn(browser, "buyer");
    await openReference(page, "Wire sizes");
    const rows = bodyRows(page, "Wire sizes");
    expect(await rows.count()).toBeGreaterThan(100);

    await page.getByLabel("Standard", { exact: true }).selectOption("AWG");
    // AWG 0000 to 46 (ASTM B258): 50 sizes.
    await expect.poll(() => rows.count()).toBe(50);
    await page.getByLabel("Find a size").fill("20");
    await expect.poll(() => rows.count()).toBe(1);
    const awg20 = await text(rows.first());
    // ASTM B258 formula (brief, worked check 1): 0.81182 mm = 0.0320 in; area 0.5176 mm².
    expect(awg20).toContain("0.8118 mm");
    expect(awg20).toContain("0.0320 in");
    expect(awg20).toContain("0.5176 mm²");
    await expect(
      page.getByRole("status").filter({ hasText: "rows" }).textContent(),
    ).resolves.toMatch(/^1 of \d+ rows$/);
    await saveScreenshot(page, "reference-wire-sizes-filtered");

    // AWG 18 carries the NEMA MW 1000 overall diameters (brief: heavy build 0.0437 in = 1.1100 mm).
    await page.getByLabel("Find a size").fill("18");
    await expect.poll(() => rows.count()).toBe(1);
    expect(await text(rows.first())).toContain("Heavy build: 1.1100 mm");

    await page.getByLabel("Find a size").fill("");
    await page.getByLabel("Standard", { exact: true }).selectOption("");
    const diameterHeader = page.getByRole("columnheader", {
      name: "Bare diameter, mm",
    });
    await diameterHeader.getByRole("button").click();
    expect(await diameterHeader.getAttribute("aria-sort")).toBe("ascending");
    // Thinnest first: IEC 0.020 mm, below AWG 46 (0.0399 mm).
    expect(await text(rows.first())).toContain("0.020 mm");
    await diameterHeader.getByRole("button").click();
    expect(await diameterHeader.getAttribute("aria-sort")).toBe("descending");
    // Thickest first: AWG 0000 = 0.46 in = 11.684 mm by the formula (n = −3).
    expect(await text(rows.first())).toContain("11.6840 mm");
    expect(await text(rows.first())).toContain("0000 (4/0)");

    // Every row points at a numbered source listed under the table.
    const sources = page.getByRole("region", { name: "Sources" });
    await expect(sources.textContent()).resolves.toContain("ASTM B258");
    await saveScreenshot(page, "reference-wire-sizes");
    await page.close();
  });

  it("magnet grades show every property with its unit, and filter by material", async () => {
    const page = await signIn(browser, "buyer");
    await openReference(page, "Magnet grades");
    const rows = bodyRows(page, "Magnet grades");
    await page.getByLabel("Find a grade").fill("N42SH");
    await expect.poll(() => rows.count()).toBe(1);
    const n42sh = await text(rows.first());
    // Brief: N42 Br 1.28–1.32 T, (BH)max 318–342 kJ/m³; suffix SH → HcJ 1592 kA/m, 150 °C; NdFeB −0.12 %/K, 7.5 g/cm³.
    for (const expected of [
      "1.28–1.32 T",
      "318–342 kJ/m³",
      "1,592 kA/m",
      "150 °C",
      "−0.120 %/K",
      "7.50 g/cm³",
      "Built in",
    ]) {
      expect(n42sh).toContain(expected);
    }
    await page.getByLabel("Find a grade").fill("");
    await page
      .getByLabel("Material", { exact: true })
      .selectOption({ label: "Hard ferrite" });
    await expect.poll(() => rows.count()).toBe(1);
    expect(await text(rows.first())).toContain("Weakest when cold");
    await page.getByLabel("Material", { exact: true }).selectOption("");

    // Sorting by the working temperature puts the hottest grade (Sm2Co17, 300 °C per the brief) first when descending.
    const hottest = page
      .getByRole("columnheader", { name: "Max. working temp." })
      .getByRole("button");
    await hottest.click();
    await hottest.click();
    expect(await text(rows.first())).toContain("Sm2Co17");

    // Buyers read the grades but are not offered the admins' form.
    expect(
      await page.getByRole("heading", { name: "Add a magnet grade" }).count(),
    ).toBe(0);
    await saveScreenshot(page, "reference-magnet-grades");
    await page.close();
  });

  it("thermal classes, insulation and conductors each show their sources", async () => {
    const page = await signIn(browser, "manager");
    await openReference(page, "Thermal classes");
    const classes = bodyRows(page, "Thermal classes");
    expect(await classes.count()).toBe(5);
    await page.getByLabel("Find an enamel or class").fill("polyimide");
    // Brief: polyimide is the typical enamel of class 220 alone.
    await expect.poll(() => classes.count()).toBe(1);
    expect(await text(classes.first())).toMatch(/^220 R 220 °C/);
    await expect(
      page.getByRole("region", { name: "Sources" }).textContent(),
    ).resolves.toContain("IEC 60085");
    await saveScreenshot(page, "reference-thermal-classes");

    await page
      .getByRole("navigation", { name: "Reference tables" })
      .getByRole("link", { name: "Conductors" })
      .click();
    const conductors = bodyRows(page, "Conductor materials");
    await expect.poll(() => conductors.count()).toBe(2);
    const copper = await text(conductors.filter({ hasText: "copper" }));
    // IEC 60028: 1/58 Ω·mm²/m = 100 % IACS, α20 0.00393 /K, 8.89 g/cm³.
    expect(copper).toContain("0.017241 Ω·mm²/m");
    expect(copper).toContain("100.0 % IACS");
    expect(copper).toContain("0.00393 /K");
    await saveScreenshot(page, "reference-conductors");

    await page
      .getByRole("navigation", { name: "Reference tables" })
      .getByRole("link", { name: "Insulation" })
      .click();
    const insulation = bodyRows(page, "Insulation kinds");
    await expect.poll(() => insulation.count()).toBe(6);
    await page.getByLabel("Standard", { exact: true }).selectOption("IEC");
    await expect.poll(() => insulation.count()).toBe(3);
    await page.close();
  });

  it("an admin adds a grade: field messages first, then the row and the estimator offer it", async () => {
    const admin = await newPerson("admin", "Orla Brenning");
    const page = await signIn(browser, admin);
    await openReference(page, "Magnet grades");
    const form = page.getByRole("region", { name: "Add a magnet grade" });
    await expect(form.textContent()).resolves.toContain(
      "The built-in grades come from makers’ published tables",
    );

    // Nothing typed: every required field says what it needs, and nothing is stored.
    await form.getByRole("button", { name: "Add grade" }).click();
    await expect
      .poll(() => form.getByText("Give the grade's name").count())
      .toBe(1);
    expect(
      await form.getByLabel("Br, lowest (T)").getAttribute("aria-invalid"),
    ).toBe("true");

    const name = `N44TL${randomBytes(2).toString("hex").toUpperCase()}`;
    await form.getByLabel("Grade name").fill(name);
    await form.getByLabel("Temperature suffix").selectOption("SH");
    await form.getByLabel("Br, lowest (T)").fill("1.30");
    await form.getByLabel("Br, highest (T)").fill("13.4"); // a slipped decimal point
    await form.getByLabel("HcB, minimum (kA/m)").fill("900");
    await form.getByLabel("HcJ, minimum (kA/m)").fill("1600");
    await form.getByLabel("(BH)max, lowest (kJ/m³)").fill("330");
    await form.getByLabel("(BH)max, highest (kJ/m³)").fill("350");
    await form.getByLabel("Recoil permeability μrec").fill("1.05");
    await form.getByLabel("Max. working temperature (°C)").fill("150");
    await form.getByLabel("Br temperature coefficient (%/K)").fill("-0.11");
    await form.getByLabel("Density (g/cm³)").fill("7.55");
    await form
      .getByLabel("Source")
      .fill("Browser test: an invented data sheet");
    await form.getByRole("button", { name: "Add grade" }).click();
    await expect
      .poll(() =>
        form.getByText("The highest Br must be between 0.1 and 1.6 T.").count(),
      )
      .toBe(1);
    // What was typed is still there.
    expect(await form.getByLabel("Grade name").inputValue()).toBe(name);
    await saveScreenshot(page, "reference-add-grade-errors");

    await form.getByLabel("Br, highest (T)").fill("1.34");
    await form.getByRole("button", { name: "Add grade" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: `Added the grade ${name}.` })
      .waitFor();
    await page.getByLabel("Find a grade").fill(name);
    const row = bodyRows(page, "Magnet grades");
    await expect.poll(() => row.count()).toBe(1);
    const added = await text(row.first());
    expect(added).toContain("1.30–1.34 T");
    expect(added).toContain("−0.110 %/K");
    expect(added).toContain(`Added by ${admin.name}`);
    expect(await form.getByLabel("Grade name").inputValue()).toBe("");
    await saveScreenshot(page, "reference-add-grade-done");

    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Magnet estimator" })
      .click();
    // On the estimator itself before choosing: the navigation has finished.
    await page
      .getByRole("heading", { name: "Magnet estimator", level: 1 })
      .waitFor();
    await page.getByLabel("Grade", { exact: true }).selectOption(name);
    await page.getByLabel("Height (mm)", { exact: true }).fill("5");
    await expect
      .poll(() =>
        page.getByRole("heading", { name: /^Estimate/ }).textContent(),
      )
      .toContain(name);
    await page.close();
  });
});
