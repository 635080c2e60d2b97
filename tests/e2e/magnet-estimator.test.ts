import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const estimate = (page: Page) => page.getByLabel("Estimate", { exact: true });

/** The value shown beside a result's label in the estimate panel. */
async function resultValue(
  page: Page,
  label: string | RegExp,
): Promise<string> {
  const row = estimate(page)
    .locator("div")
    .filter({ has: page.locator("dt", { hasText: label }) });
  return (
    (await row.locator("dd").first().textContent())?.replace(/\u00a0/g, " ") ??
    ""
  );
}

async function openEstimator(page: Page) {
  await page
    .getByRole("navigation", { name: "Main" })
    .getByRole("link", { name: "Magnet estimator" })
    .click();
  await page
    .getByRole("heading", { name: "Magnet estimator", level: 1 })
    .waitFor();
}

describe("magnet estimator", () => {
  it("updates mass and Br as the person types, warns past the working temperature, and marks bad dimensions", async () => {
    const page = await signIn(browser, "builder");
    await openEstimator(page);
    // A marker on the window survives only if the page is never reloaded.
    await page.evaluate(
      () =>
        ((window as unknown as { stillTheSamePage: boolean }).stillTheSamePage =
          true),
    );

    // The handling caution is on the page before anything is typed.
    const caution = page.getByRole("complementary", {
      name: "Handle strong magnets with care",
    });
    await expect(caution.textContent()).resolves.toMatch(/pacemakers/);
    await expect(caution.textContent()).resolves.toMatch(
      /demagnetises it for good/,
    );

    // The page opens on the brief's worked check 7: N42, Br 1.30 T, l_m 4 mm, g 1 mm → B_g 1.0297 T.
    await expect
      .poll(() => resultValue(page, /^Air-gap flux density/))
      .toBe("1.030 T");

    await page.getByLabel("Grade", { exact: true }).selectOption("N42SH");
    await page.getByRole("radio", { name: "Block" }).check();
    await page.getByLabel("Length (mm)", { exact: true }).fill("20");
    await page.getByLabel("Width (mm)", { exact: true }).fill("10");
    await page.getByLabel("Height (mm)", { exact: true }).fill("5");

    // 20 × 10 × 5 mm = 1000 mm³ at 7.5 g/cm³ (brief, NdFeB) = 7.50 g.
    await expect.poll(() => resultValue(page, "Mass per piece")).toBe("7.50 g");
    await expect
      .poll(() =>
        page.getByRole("heading", { name: /^Estimate/ }).textContent(),
      )
      .toContain("N42SH");
    // N42SH Br 1.28–1.32 T (brief): the middle, 1.300 T, at 20 °C.
    expect(await resultValue(page, "Br at 20 °C used")).toBe("1.300 T");
    await expect(estimate(page).textContent()).resolves.toContain(
      "The middle of N42SH's range",
    );

    await page.getByLabel("Pieces", { exact: true }).fill("8");
    await expect.poll(() => resultValue(page, /^Total mass/)).toBe("60.0 g");

    // Worked check 7: Br 1.30 T at 100 °C is 1.1752 T; N42SH works up to 150 °C, so no warning.
    await page
      .getByLabel("Magnet temperature (°C)", { exact: true })
      .fill("100");
    await expect
      .poll(() => resultValue(page, "Br at the magnet temperature, 100 °C"))
      .toBe("1.175 T");
    expect(await page.getByRole("list", { name: "Warnings" }).count()).toBe(0);
    await saveScreenshot(page, "magnet-estimator");

    // 200 °C is past N42SH's 150 °C rating and the 150 °C top of sintered NdFeB's linear
    // Br model (decision 038): the API refuses it, and the message stands beside the field.
    const temperature = page.getByLabel("Magnet temperature (°C)", {
      exact: true,
    });
    await temperature.fill("200");
    await expect
      .poll(() => page.getByRole("form", { name: "Magnet" }).textContent())
      .toContain("200 °C is above 150 °C");
    await saveScreenshot(page, "magnet-estimator-out-of-range");

    // N42 at 140 °C is past its 80 °C rating (brief: no suffix → 80 °C) but inside the model.
    await page.getByLabel("Grade", { exact: true }).selectOption("N42");
    await temperature.fill("140");
    const warnings = page.getByRole("list", { name: "Warnings" });
    await warnings.waitFor();
    await expect(warnings.textContent()).resolves.toContain(
      "above the 80 °C maximum working temperature of N42",
    );
    await saveScreenshot(page, "magnet-estimator-too-hot");

    // A negative dimension: the message stands beside the field, the typed value stays.
    const height = page.getByLabel("Height (mm)", { exact: true });
    await height.fill("-5");
    await expect.poll(() => height.getAttribute("aria-invalid")).toBe("true");
    const messageId = (await height.getAttribute("aria-describedby"))!.split(
      " ",
    )[0]!;
    await expect(
      page.locator(`[id="${messageId}"]`).textContent(),
    ).resolves.toBe("The height must be more than 0 mm.");
    expect(await height.inputValue()).toBe("-5");
    await expect
      .poll(() =>
        page
          .getByRole("status")
          .filter({ hasText: "Waiting for" })
          .textContent(),
      )
      .toContain("height");
    await saveScreenshot(page, "magnet-estimator-bad-height");

    expect(
      await page.evaluate(
        () =>
          (window as unknown as { stillTheSamePage?: boolean })
            .stillTheSamePage,
      ),
    ).toBe(true);
    expect(new URL(page.url()).pathname).toBe("/tools/magnet-estimator");
    await page.close();
  });

  it("shows HcJ at temperature and warns when a thin magnet over a large gap passes its knee", async () => {
    const page = await signIn(browser, "builder");
    await openEstimator(page);
    await page.getByLabel("Grade", { exact: true }).selectOption("N42");
    await page.getByLabel("Height (mm)", { exact: true }).fill("1");
    await page
      .getByLabel("Magnet temperature (°C)", { exact: true })
      .fill("150");
    await page
      .getByLabel("Magnet length along magnetisation (mm)", { exact: true })
      .fill("1");
    await page.getByLabel("Air gap (mm)", { exact: true }).fill("5");
    // Hand-worked (app/engineering/magnet-estimate.test.ts): HcJ 955 × 0.22 = 210 kA/m;
    // H_m 698 kA/m against a knee of 0.9 × 210.1 = 189 kA/m.
    await expect
      .poll(() => resultValue(page, "HcJ at 150 °C"))
      .toBe("210 kA/m");
    await expect
      .poll(() => resultValue(page, "Field in the magnet against its knee"))
      .toBe("698 kA/m of 189 kA/m");
    const warnings = page.getByRole("list", { name: "Warnings" });
    await expect(warnings.textContent()).resolves.toContain(
      "passes the knee of N42 at 150 °C",
    );
    await saveScreenshot(page, "magnet-estimator-past-knee");
    await page.close();
  });

  it("shows the API's own refusal beside the field (a ring whose hole is wider than the ring)", async () => {
    const page = await signIn(browser, "manager");
    await openEstimator(page);
    await page.getByRole("radio", { name: "Ring" }).check();
    await page.getByLabel("Outer diameter (mm)", { exact: true }).fill("10");
    await page.getByLabel("Inner diameter (mm)", { exact: true }).fill("12");
    await page.getByLabel("Thickness (mm)", { exact: true }).fill("3");
    const inner = page.getByLabel("Inner diameter (mm)", { exact: true });
    await expect.poll(() => inner.getAttribute("aria-invalid")).toBe("true");
    await expect(
      page
        .getByText(
          "The inner diameter must be smaller than the outer diameter.",
        )
        .first()
        .isVisible(),
    ).resolves.toBe(true);
    // The page itself is still there: the refusal did not replace it with an error page.
    await page
      .getByRole("heading", { name: "Magnet estimator", level: 1 })
      .waitFor();
    // Fixing the value clears the message and brings the estimate back: π/4 · (10² − 8²) · 3 mm³ = 84.82 mm³.
    await inner.fill("8");
    await expect
      .poll(() => resultValue(page, "Volume per piece"))
      .toBe("84.82 mm³");
    expect(await inner.getAttribute("aria-invalid")).toBeNull();
    await page.close();
  });

  it("prints the inputs and results without the menu or the form", async () => {
    const page = await signIn(browser, "storekeeper");
    await openEstimator(page);
    await expect.poll(() => resultValue(page, "Mass per piece")).toBe("6.00 g");
    await page.emulateMedia({ media: "print" });
    expect(
      await page.getByRole("navigation", { name: "Main" }).isVisible(),
    ).toBe(false);
    expect(await page.getByLabel("Grade", { exact: true }).isVisible()).toBe(
      false,
    );
    expect(
      await page.getByRole("button", { name: "Print estimate" }).isVisible(),
    ).toBe(false);
    const inputs = page.getByRole("term").filter({ hasText: "Shape" });
    expect(await inputs.isVisible()).toBe(true);
    expect(
      (await page.getByLabel("Inputs").innerText()).replace(/\s+/g, " "),
    ).toContain("Shape Block 20 × 10 × 4 mm");
    expect(
      await page
        .getByRole("complementary", { name: "Handle strong magnets with care" })
        .isVisible(),
    ).toBe(true);
    await saveScreenshot(page, "magnet-estimator-print");
    await page.close();
  });
});
