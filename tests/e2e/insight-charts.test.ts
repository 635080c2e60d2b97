/**
 * The cost insight's charts and rankings in Chromium: every label lies inside its chart
 * (nothing cut off at the edges), a design priced in only two months reads as a series
 * (its points valued and its line named), the price basis switches through the address
 * and is named beside the costs, and a design with unpriced lines is set apart instead
 * of ranked as the cheapest. Also the stock list names the currency of its Value column.
 */
import path from "node:path";
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, signInAs } from "../support/app-client";
import {
  launchBrowser,
  saveScreenshot,
  screenshotFolder,
  signIn,
} from "../support/browser";
import {
  createMagnetItem,
  createPartItem,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { createPricedReleasedDesign } from "../support/insight-fixtures";
import { readable } from "../support/page-text";
import {
  createSupplier,
  importPriceList,
} from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let pricedName = "";
/** Priced only from 40 days ago: two months of its year are priced. */
const recentName = uniqueCode("Recent fan motor with a long name");
/** One line without any price. */
const incompleteName = uniqueCode("Half-priced pump");

function daysAgo(days: number): string {
  return new Date(Date.now() - days * 86_400_000).toISOString().slice(0, 10);
}

beforeAll(async () => {
  browser = await launchBrowser();
  ({ designName: pricedName } = await createPricedReleasedDesign());
  const buyer = await signInAs("buyer");
  const magnet = await createMagnetItem(buyer);
  const part = await createPartItem(buyer);
  const unpriced = await createPartItem(buyer, "pcs", "Shaft seal, no quote");
  const supplier = `Recent supplier ${uniqueCode("S")}`;
  const supplierId = await createSupplier(buyer, supplier);
  for (const item of [magnet, part])
    await testDatabase().query(
      "INSERT INTO supplier_items (supplier_id, supplier_sku, item_id) VALUES (?, ?, ?)",
      [supplierId, `R-${item.sku}`, item.id],
    );
  const validFrom = daysAgo(40);
  await importPriceList(buyer, {
    supplier,
    fileName: "recent.csv",
    lines: [
      "Art. no,Kind,Grade,Price,Currency,Valid from",
      `R-${magnet.sku},magnet,N42SH,2.00,EUR,${validFrom}`,
      `R-${part.sku},part,,1.50,EUR,${validFrom}`,
    ],
    mapping: {
      supplierSku: "Art. no",
      kind: "Kind",
      grade: "Grade",
      price: "Price",
      currency: "Currency",
      validFrom: "Valid from",
    },
  });
  const recent = await createDesign(
    [
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 4 },
      { kind: "part", itemId: part.id, quantityPerMotor: "2" },
    ],
    { name: recentName },
  );
  const incomplete = await createDesign(
    [
      { kind: "magnet", itemId: magnet.id, piecesPerMotor: 1 },
      { kind: "part", itemId: unpriced.id, quantityPerMotor: "1" },
    ],
    { name: incompleteName },
  );
  // Rated torques so both have a cost per N·m; the incomplete one would be the cheapest.
  await testDatabase().query(
    "UPDATE design_revisions SET rated_torque_nm = CASE id WHEN ? THEN 0.4 ELSE 5 END, torque_basis = 'measured' WHERE id IN (?, ?)",
    [recent.revisionId, recent.revisionId, incomplete.revisionId],
  );
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function openInsight(page: Page, query = ""): Promise<void> {
  await page.goto(`${baseUrl()}/insight${query}`);
  await page.getByRole("heading", { level: 1, name: "Cost insight" }).waitFor();
  await page.getByRole("img", { name: /Cost per motor by month/ }).waitFor();
}

/** Every text of the page's charts whose box reaches outside its SVG's box, as "label: text". */
function textsOutsideCharts(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const outside: string[] = [];
    for (const svg of document.querySelectorAll<SVGSVGElement>(
      "svg[role=img]",
    )) {
      const box = svg.getBoundingClientRect();
      for (const text of svg.querySelectorAll("text")) {
        const own = text.getBoundingClientRect();
        if (own.width === 0) continue;
        if (
          own.left < box.left - 0.5 ||
          own.right > box.right + 0.5 ||
          own.top < box.top - 0.5 ||
          own.bottom > box.bottom + 0.5
        )
          outside.push(
            `${svg.getAttribute("aria-label")}: ${text.textContent ?? ""}`,
          );
      }
    }
    return outside;
  });
}

/** The text a chart draws, label by label (a hover title, which is not drawn, left out). */
async function drawnText(chart: Locator): Promise<string> {
  return readable(
    await chart.evaluate((svg) =>
      [...svg.querySelectorAll("text")]
        .map((text) =>
          [...text.childNodes]
            .filter((node) => node.nodeName !== "title")
            .map((node) => node.textContent ?? "")
            .join(""),
        )
        .join("\n"),
    ),
  );
}

describe("the insight's charts", () => {
  it("keeps every label inside its chart, at a wide and a narrow window", async () => {
    const page = await signIn(browser, "manager");
    await openInsight(page);
    await page.getByRole("img", { name: /Stock value at the end/ }).waitFor();
    // Whole names, not shortened with an ellipsis: a long design name reads in full.
    const full = `${recentName} · rev 1`;
    const costChart = page.getByRole("img", { name: /Cost per N·m by design/ });
    expect(await drawnText(costChart)).toContain(full);
    const trendChart = page.getByRole("img", {
      name: /Cost per motor by month/,
    });
    expect(await drawnText(trendChart)).toContain(full);
    expect(await textsOutsideCharts(page)).toEqual([]);
    await page.setViewportSize({ width: 800, height: 900 });
    expect(await textsOutsideCharts(page)).toEqual([]);
    await page.setViewportSize({ width: 1280, height: 900 });
    await saveScreenshot(page, "h4-insight-charts");
    for (const [chart, name] of [
      [costChart, "h4-insight-cost-chart"],
      [trendChart, "h4-insight-trend-chart"],
    ] as const)
      await chart.screenshot({
        path: path.join(screenshotFolder, `${name}.png`),
      });
    await page.close();
  });

  it("draws a design priced in two months as a series: both points valued, the line named", async () => {
    const page = await signIn(browser, "manager");
    await openInsight(page);
    const series = page
      .getByRole("img", { name: /Cost per motor by month/ })
      .locator(`g[data-series="${recentName} · rev 1"]`);
    // 4 magnets at 2.00 + 2 parts at 1.50 = 11.00 a motor (by hand).
    const values = await series
      .locator("text[data-point-value]")
      .allTextContents();
    expect(values.map(readable)).toEqual(["11.00", "11.00"]);
    expect(
      readable(await series.locator("text[data-series-name]").textContent()),
    ).toContain("Recent fan motor");
    await page.close();
  });
});

describe("the insight's price basis and ranking", () => {
  it("names the basis beside the costs and switches it through the address", async () => {
    const page = await signIn(browser, "manager");
    await openInsight(page);
    const table = page.getByRole("table", {
      name: /Released designs: cost per motor/,
    });
    expect(readable(await table.locator("thead").textContent())).toContain(
      "at the best current supplier price",
    );
    await page.getByLabel("Price basis").selectOption("stock-average");
    await page.getByRole("button", { name: "Work out the what-if" }).click();
    await page.waitForURL(/basis=stock-average/);
    await expect
      .poll(async () => readable(await table.locator("thead").textContent()))
      .toContain("at the moving average cost of stock");
    await openInsight(page, "?basis=stock-average");
    expect(await page.getByLabel("Price basis").inputValue()).toBe(
      "stock-average",
    );
    await page.close();
  });

  it("sets a design with unpriced lines apart instead of ranking it cheapest", async () => {
    const page = await signIn(browser, "manager");
    await openInsight(page, "?perPage=50");
    const notRanked = readable(
      await page
        .getByRole("list", { name: "Designs not ranked" })
        .textContent(),
    );
    expect(notRanked).toContain(incompleteName);
    expect(notRanked).toContain("incomplete — 1 line unpriced");
    const chart = page.getByRole("img", { name: /Cost per N·m by design/ });
    const chartText = readable(await chart.textContent());
    expect(chartText).not.toContain("Half-priced");
    expect(chartText).toContain(pricedName.slice(0, 12));
    await saveScreenshot(page, "h4-insight-ranking");
    await page.close();
  });
});

describe("the stock list", () => {
  it("names the currency of the Value column", async () => {
    const page = await signIn(browser, "manager");
    await page.goto(`${baseUrl()}/stock`);
    await page.getByRole("table", { name: "Stock items" }).waitFor();
    expect(
      await page.getByRole("columnheader", { name: /^Value \(EUR\)/ }).count(),
    ).toBe(1);
    await page.close();
  });
});
