import fs from "node:fs";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { roles } from "~/lib/roles";
import { newPerson } from "../support/app-client";
import {
  demoPerson,
  launchBrowser,
  saveScreenshot,
  signIn,
} from "../support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe("each demo role signs in and sees its own navigation", () => {
  for (const role of roles) {
    it(role, async () => {
      // The seeded demo people: the ones a first `npm start` offers.
      const page = await signIn(browser, demoPerson(role));
      const navigation = page.getByRole("navigation", { name: "Main" });
      const links = await navigation.getByRole("link").allTextContents();
      if (role === "admin") {
        expect(links).toEqual([
          "Start",
          "Stock",
          "Record movement",
          "Journal",
          "Stocktakes",
          "Suppliers",
          "Best prices",
          "Metal base & rates",
          "Purchase orders",
          "Buying plan",
          "Alerts",
          "Cost insight",
          "Designs",
          "Build orders",
          "Coil estimator",
          "Magnet estimator",
          "Reference",
          "People",
          "Outbox",
        ]);
      } else if (role === "storekeeper") {
        expect(links).toEqual([
          "Start",
          "Stock",
          "Record movement",
          "Journal",
          "Stocktakes",
          "Suppliers",
          "Best prices",
          "Metal base & rates",
          "Purchase orders",
          "Buying plan",
          "Alerts",
          "Cost insight",
          "Designs",
          "Build orders",
          "Coil estimator",
          "Magnet estimator",
          "Reference",
        ]);
      } else {
        // Managers review stocktakes; buyers and builders have no part in them.
        expect(links).toEqual([
          "Start",
          "Stock",
          "Journal",
          ...(role === "manager" ? ["Stocktakes"] : []),
          "Suppliers",
          "Best prices",
          "Metal base & rates",
          "Purchase orders",
          "Buying plan",
          "Alerts",
          "Cost insight",
          "Designs",
          "Build orders",
          "Coil estimator",
          "Magnet estimator",
          "Reference",
        ]);
      }
      // The start page speaks to the role held.
      await expect(
        page.getByRole("heading", { level: 1 }).textContent(),
      ).resolves.toMatch(/^Good to see you/);
      expect(await page.locator("li[aria-label$=' work']").count()).toBe(1);
      const file = await saveScreenshot(page, `home-${role}`);
      expect(fs.statSync(file).size).toBeGreaterThan(10_000);
      await page.close();
    });
  }

  it("a wrong password shows the one message and keeps the e-mail typed", async () => {
    const buyer = await newPerson("buyer");
    const page = await browser.newPage();
    await page.goto(`${(await import("vitest")).inject("baseUrl")}/sign-in`);
    await page.getByLabel("E-mail").fill(buyer.email);
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await expect(page.getByRole("alert").textContent()).resolves.toContain(
      "E-mail or password is wrong.",
    );
    expect(await page.getByLabel("E-mail").inputValue()).toBe(buyer.email);
    await saveScreenshot(page, "sign-in-wrong-password");
    await page.close();
  });
});

describe("admin pages", () => {
  it("people list and outbox render their tables", async () => {
    const page = await signIn(browser, "admin");
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "People" })
      .click();
    await page.getByRole("heading", { name: "People" }).waitFor();
    // After a navigation in the browser the table's code arrives just after the page.
    await page
      .getByRole("table", { name: "People with an account" })
      .getByRole("row")
      .nth(1)
      .waitFor();
    expect(
      await page
        .getByRole("table", { name: "People with an account" })
        .getByRole("row")
        .count(),
    ).toBeGreaterThan(5);
    await saveScreenshot(page, "admin-people");
    await page.getByRole("link", { name: "Selma Odueke" }).click();
    await page.getByRole("heading", { name: "Selma Odueke" }).waitFor();
    expect(
      await page.getByRole("checkbox", { name: "Manager" }).isChecked(),
    ).toBe(true);
    await saveScreenshot(page, "admin-person");
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Outbox" })
      .click();
    await page.getByRole("heading", { name: "Outbox" }).waitFor();
    await saveScreenshot(page, "admin-outbox");
    await page.close();
  });
});
