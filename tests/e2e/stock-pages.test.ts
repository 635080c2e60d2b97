import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, sendJson, signInAs } from "../support/app-client";
import { launchBrowser, saveScreenshot, signIn } from "../support/browser";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let storekeeper = "";
let store = "";
beforeAll(async () => {
  browser = await launchBrowser();
  storekeeper = await signInAs("storekeeper");
  store = await createLocation(uniqueCode("BS"), "Main store, rack B");
  await stockSomeItems(await signInAs("buyer"));
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** A few neighbours for the new item, so the list looks like a store's: magnets, a part, wire below its reorder point. */
async function stockSomeItems(buyer: string) {
  const items: Record<string, unknown>[] = [
    {
      kind: "wire",
      sku: uniqueCode("CU-AWG20"),
      name: "Copper AWG 20 heavy build",
      conductor: "copper",
      standard: "AWG",
      size: "20",
      insulation: "heavy",
      thermalClass: 200,
      enamel: "polyamide-imide-overcoat",
      reorderPoint: 10,
      reorderQuantity: 25,
    },
    {
      kind: "wire",
      sku: uniqueCode("AL-1.00"),
      name: "Aluminium 1.00 mm grade 2",
      conductor: "aluminium",
      standard: "IEC",
      size: "1",
      insulation: "grade2",
      thermalClass: 180,
      enamel: "polyesterimide",
      reorderPoint: 5,
      reorderQuantity: 20,
    },
    {
      kind: "magnet",
      sku: uniqueCode("MG-N42SH"),
      name: "Rotor magnet N42SH block",
      grade: "N42SH",
      shape: { kind: "block", lengthMm: 20, widthMm: 10, heightMm: 5 },
      coating: "NiCuNi",
      magnetisation: "through 5 mm",
      reorderPoint: 200,
      reorderQuantity: 1000,
    },
    {
      kind: "part",
      sku: uniqueCode("BRG-6204"),
      name: "Bearing 6204-2RS",
      unit: "pcs",
      reorderPoint: 20,
      reorderQuantity: 100,
    },
  ];
  for (const item of items) {
    const response = await sendJson("POST", "/api/v1/items", item, buyer);
    expect(response.status, await response.clone().text()).toBe(201);
  }
  const [awg20, aluminium, magnet, bearing] = items.map(
    (item) => item.sku as string,
  );
  await move({
    type: "receipt",
    sku: awg20,
    lot: "SP-88",
    location: store,
    grossKg: 12.6,
    tareKg: 1.1,
    unitCost: 15.4,
  });
  await move({
    type: "receipt",
    sku: aluminium,
    lot: "SP-12",
    location: store,
    grossKg: 4.2,
    tareKg: 0.9,
    unitCost: 6.8,
  });
  await move({
    type: "receipt",
    sku: magnet,
    location: store,
    quantity: 480,
    unitCost: 0.92,
  });
  await move({
    type: "receipt",
    sku: bearing,
    location: store,
    quantity: 12,
    unitCost: 3.1,
  });
}

async function move(body: Record<string, unknown>) {
  const response = await sendJson(
    "POST",
    "/api/v1/stock-movements",
    body,
    storekeeper,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

describe("stock pages in the browser", () => {
  it("lets a buyer add a wire item through the form, find it in the list and open its page", async () => {
    const page = await signIn(browser, "buyer");
    const sku = uniqueCode("E2E-CU");

    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Stock", exact: true })
      .click();
    await page.getByRole("heading", { name: "Stock", level: 1 }).waitFor();
    await page.getByRole("link", { name: "New item" }).click();
    await page
      .getByRole("heading", { name: "New catalogue item", level: 1 })
      .waitFor();

    // Sent empty, the form says what each field needs, before anything reaches the server.
    await page.getByRole("button", { name: "Add to catalogue" }).click();
    await page.getByText("Give the SKU.").waitFor();
    await expect(page.getByText("Choose the size.").isVisible()).resolves.toBe(
      true,
    );
    await expect(
      page.getByText("Give the thermal class.").isVisible(),
    ).resolves.toBe(true);
    await saveScreenshot(page, "stock-new-item-errors");

    // A magnet shows the handling caution beside its fields.
    await page.getByRole("radio", { name: /Permanent magnet/ }).check();
    const caution = page.getByRole("complementary", {
      name: "Handle strong magnets with care",
    });
    await expect(caution.textContent()).resolves.toMatch(/pacemakers/);
    await page.getByLabel("Grade", { exact: true }).selectOption("N42SH");
    await page.getByRole("radio", { name: "Disc" }).check();
    await page.getByLabel("Diameter (mm)", { exact: true }).fill("10");
    await page.getByLabel("Thickness (mm)", { exact: true }).fill("2");
    // π/4 · 10² · 2 mm = 157.1 mm³ at 7.5 g/cm³ = 1.18 g.
    await expect
      .poll(() => page.getByText(/Mass per piece about/).textContent())
      .toContain("1.18\u00a0g");
    await saveScreenshot(page, "stock-new-item-magnet");

    await page.getByRole("radio", { name: /Magnet wire/ }).check();
    await page.getByLabel("SKU", { exact: true }).fill(sku);
    await page
      .getByLabel("Name", { exact: true })
      .fill("Enamelled copper 0.50 mm, grade 2, class 155");
    await page.getByLabel("Conductor").selectOption("copper");
    await page.getByLabel("Sizes").selectOption("IEC");
    await page.getByLabel("Nominal diameter (mm)").fill("0.500");
    await page.getByLabel("Insulation").selectOption("grade2");
    await page.getByLabel("Thermal class").selectOption("155");
    await page.getByLabel("Enamel").selectOption("polyesterimide");
    await page.getByLabel("Reorder point (kg)").fill("2");
    await page.getByLabel("Reorder quantity (kg)").fill("10");
    // 0.500 mm copper: 0.1963 mm² × 8.89 g/cm³ = 1.746 g/m.
    await expect
      .poll(() => page.getByText(/^Bare conductor/).textContent())
      .toContain("1.746\u00a0g/m");
    await expect(
      page
        .getByText(
          "The wire's thermal class must be at least the motor's insulation class.",
        )
        .isVisible(),
    ).resolves.toBe(true);
    await saveScreenshot(page, "stock-new-item");
    await page.getByRole("button", { name: "Add to catalogue" }).click();

    await page.waitForURL(`${baseUrl()}/stock/items/${sku}`);
    await page
      .getByRole("status")
      .filter({ hasText: "Added to the catalogue." })
      .waitFor();

    // Stock arrives on two spools, and some is issued by weighing the spool back.
    await move({
      type: "receipt",
      sku,
      lot: "SP-101",
      location: store,
      grossKg: 5.4,
      tareKg: 0.6,
      unitCost: 14.2,
      spoolType: "DIN 250",
    });
    await move({
      type: "receipt",
      sku,
      lot: "SP-102",
      location: store,
      grossKg: 3.1,
      tareKg: 0.6,
      unitCost: 14.8,
      spoolType: "DIN 250",
    });
    await move({
      type: "issue",
      sku,
      lot: "SP-101",
      location: store,
      grossKg: 2.15,
      reference: "JOB-2031",
    });

    await page.getByRole("link", { name: "← Stock" }).click();
    await page.getByRole("heading", { name: "Stock", level: 1 }).waitFor();
    await page.getByLabel("Search").fill(sku);
    await page.getByRole("button", { name: "Show" }).click();
    await page.waitForURL((url) => url.searchParams.get("search") === sku);
    await page
      .getByRole("status")
      .filter({ hasText: /^1\u00a0item ·/ })
      .waitFor();
    const row = page
      .getByRole("row")
      .filter({ has: page.getByRole("link", { name: sku }) });
    await expect(row.textContent()).resolves.toContain("4.050\u00a0kg");
    await expect(row.textContent()).resolves.toContain(
      "Enamelled copper 0.50 mm, grade 2, class 155",
    );

    // Sorting goes through the address, keeping the search.
    await page.getByRole("link", { name: /^On hand/ }).click();
    await page.waitForURL(
      (url) =>
        url.searchParams.get("sort") === "onHand" &&
        url.searchParams.get("search") === sku,
    );
    await page.getByLabel("Search").fill("");
    await page.getByRole("button", { name: "Show" }).click();
    await page.waitForURL((url) => !url.searchParams.has("search"));
    await page
      .getByRole("status")
      .filter({ hasText: /items ·/ })
      .waitFor();
    await saveScreenshot(page, "stock-list");

    await page.getByLabel("Search").fill(sku);
    await page.getByRole("button", { name: "Show" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: /^1\u00a0item ·/ })
      .waitFor();
    await page.getByRole("link", { name: sku }).click();
    await page
      .getByRole("heading", {
        name: "Enamelled copper 0.50 mm, grade 2, class 155",
        level: 1,
      })
      .waitFor();
    const balances = page.getByRole("table", {
      name: `On hand of ${sku} by location and lot`,
    });
    await expect(balances.textContent()).resolves.toContain("SP-102");
    await page
      .getByRole("img", { name: /On hand over the last 3 movements/ })
      .waitFor();
    await saveScreenshot(page, "stock-item");

    // The buyer changes the reorder point on the item page.
    await page.getByLabel("Reorder point (kg)").fill("5");
    await page.getByRole("button", { name: "Save reorder point" }).click();
    await page
      .getByRole("status")
      .filter({ hasText: "Reorder point and quantity saved." })
      .waitFor();
    await page
      .getByText("Below reorder point", { exact: true })
      .first()
      .waitFor();
    await page.close();
  });

  it("keeps a builder to reading: no new-item link, no reorder form", async () => {
    const page = await signIn(browser, "builder");
    await page.goto(`${baseUrl()}/stock`);
    await page.getByRole("heading", { name: "Stock", level: 1 }).waitFor();
    await expect(
      page.getByRole("link", { name: "New item" }).count(),
    ).resolves.toBe(0);
    await expect(
      page.getByRole("link", { name: "Export CSV" }).count(),
    ).resolves.toBe(1);
    await page.close();
  });
});
