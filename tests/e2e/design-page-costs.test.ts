/**
 * The design page's costs and actions in Chromium: cost per N·m over the first-order
 * torque estimate when no rated torque is given (labelled so), the price basis beside
 * each cost (and on the build order made from it), the release confirmation listing the
 * checks still open, a "create build order" action on a released revision, and counts
 * and units in words ("1 motor", "1 piece", "EUR/piece").
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import { createDesign, type FixtureLine } from "../support/design-fixtures";
import { createPricedReleasedDesign } from "../support/insight-fixtures";
import { readable } from "../support/page-text";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let releasedId = 0;
let estimatedId = 0;
let draftId = 0;

beforeAll(async () => {
  browser = await launchBrowser();
  const fixture = await createPricedReleasedDesign();
  releasedId = fixture.designId;
  const lines: FixtureLine[] = [
    {
      kind: "coil",
      itemId: fixture.wire.id,
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      leadLengthMm: 150,
    },
    { kind: "magnet", itemId: fixture.magnet.id, piecesPerMotor: 2 },
    { kind: "part", itemId: fixture.part.id, quantityPerMotor: "1" },
  ];
  // Twelve tooth coils (one per tooth of the fixture's 12-slot, 14-pole stator).
  const estimated = await createDesign(
    lines.map((line) =>
      line.kind === "coil" ? { ...line, coilsPerMotor: 12 } : line,
    ),
    { name: uniqueCode("Estimated outrunner") },
  );
  estimatedId = estimated.designId;
  // No rated torque; r 30 mm, B_g 0.9 T, α_p 0.8, 10 A RMS per phase, 12 coils of 40 turns,
  // 50 mm active, 12 slots / 14 poles double layer, star: T = 3·√2·k_w1·N_ph·B̂₁·r·L·I with
  // k_w1 0.9330 (Libert & Soulard, from memory), N_ph 160, B̂₁ = (4/π)·0.9 T·sin 72° =
  // 1.0898 T → 10.354 N·m (by hand; GNU units → 10.353662; winding-factor and
  // motor-constants tests).
  await testDatabase().query(
    `UPDATE design_revisions SET rated_torque_nm = NULL, air_gap_radius_mm = 30,
       air_gap_flux_density_t = 0.9, pole_coverage = 0.8 WHERE id = ?`,
    [estimated.revisionId],
  );
  draftId = (
    await createDesign(lines, {
      status: "draft",
      name: uniqueCode("Draft outrunner"),
    })
  ).designId;
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function openDesign(page: Page, designId: number): Promise<void> {
  await page.goto(`${baseUrl()}/designs/${designId}/revisions/1`);
  await page.getByRole("heading", { name: "Cost per motor" }).waitFor();
}

const figure = async (page: Page, label: string) =>
  readable(await page.getByRole("group", { name: label }).textContent());

describe("cost per N·m", () => {
  it("is over the first-order estimate when no rated torque is given, labelled so", async () => {
    const page = await signIn(browser, "builder");
    await openDesign(page, estimatedId);
    const perNm = await figure(page, "Cost per N·m");
    expect(perNm).toMatch(/\d+\.\d\d EUR\/N·m/);
    expect(perNm).toContain("per N·m of estimated torque (first-order)");
    expect(perNm).toContain("10.354 N·m");
    await saveScreenshot(page, "h4-design-estimated-torque");
    await page.close();
  });
});

describe("the price basis", () => {
  it("is named beside the costs on the design page", async () => {
    const page = await signIn(browser, "builder");
    await openDesign(page, releasedId);
    expect(await figure(page, "Cost per motor")).toContain(
      "at the best current supplier price",
    );
    expect(await figure(page, "Cost per N·m")).toContain(
      "at the best current supplier price",
    );
    await page.goto(
      `${baseUrl()}/designs/${releasedId}/revisions/1?basis=stock-average`,
    );
    await page.getByRole("heading", { name: "Cost per motor" }).waitFor();
    expect(await figure(page, "Cost per motor")).toContain(
      "at the moving average cost of stock",
    );
    await page.close();
  });
});

describe("releasing a revision", () => {
  it("lists the checks still open before the builder confirms", async () => {
    const page = await signIn(browser, "builder");
    await openDesign(page, draftId);
    await page.getByRole("button", { name: "Release revision 1…" }).click();
    const open = page.getByRole("list", { name: "Checks still open" });
    // 10 A in 0.80 mm copper: 19.9 A/mm², above fan cooling (common practice, from memory).
    expect(readable(await open.textContent())).toContain(
      "Current density, line 1",
    );
    await saveScreenshot(page, "h4-design-release-open-checks");
    await page.close();
  });
});

describe("a released revision", () => {
  it("offers a build order of it, made by the build-order form, with counts in words", async () => {
    const page = await signIn(browser, "builder");
    await openDesign(page, releasedId);
    const prices = readable(
      await page
        .getByRole("table", { name: /Each line's price per motor/ })
        .textContent(),
    );
    expect(prices).toContain("EUR/piece");
    expect(prices).not.toContain("pcs");
    expect(prices).toContain("1 piece");
    expect(await figure(page, "Cost per motor")).toContain("for 1 motor ");
    // Nowhere on the page a unit symbol where a word reads: no "pcs", no "1 motors".
    const whole = readable(await page.locator("main").textContent());
    expect(whole).not.toMatch(/\bpcs\b/);
    expect(whole).not.toMatch(/\b1 motors\b/);
    await saveScreenshot(page, "h4-design-released-actions");

    await page.getByLabel("Motors to build").fill("1");
    await page.getByRole("button", { name: "Create build order" }).click();
    await page.waitForURL(/\/build-orders\/\d+$/);
    // The address changes before the order's page is drawn: wait for its text.
    await page
      .getByText("at the moving average cost of stock when the order was made")
      .first()
      .waitFor();
    const summary = readable(
      await page.locator("main dl").first().textContent(),
    );
    expect(summary).toContain("1 motor");
    expect(summary).not.toContain("1 motors");
    expect(summary).toContain(
      "at the moving average cost of stock when the order was made",
    );
    await saveScreenshot(page, "h4-build-order-basis");
    await page.close();
  });

  it("shows no build-order action to a role that cannot create one", async () => {
    const page = await signIn(browser, "manager");
    await openDesign(page, releasedId);
    expect(
      await page.getByRole("button", { name: "Create build order" }).count(),
    ).toBe(0);
    await page.close();
  });
});
