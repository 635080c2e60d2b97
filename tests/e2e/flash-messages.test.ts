/**
 * The one-time message after an action, in Chromium: the form is submitted by
 * the client router (a fetch of the route's .data), the message is shown once,
 * a reload or the next page shows it no more, and a crafted link shows no text.
 */
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { scanPage } from "../support/accessibility";
import { baseUrl, signInAs, uniqueEmail } from "../support/app-client";
import { launchBrowser, signIn, waitForHydration } from "../support/browser";
import { createWireItem } from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { chooseRadio, press, toggle, typeInto } from "../support/keyboard";
import { closeTestDatabase, testDatabase } from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

const saved = (page: Page) =>
  page.getByRole("status").filter({ hasText: "Metal base saved." });

async function saveCopperBase(page: Page, price: string) {
  const base = page.getByRole("region", { name: "Set a new base" });
  await base.getByLabel("Conductor").selectOption("copper");
  await base.getByLabel("Currency").fill("EUR");
  await base.getByLabel("Base price").fill(price);
  await base.getByLabel("Valid from (YYYY-MM-DD)").fill("2026-03-01");
  await base.getByRole("button", { name: "Save metal base" }).click();
}

describe("one-time messages in the browser", () => {
  it("appear once after a client-router submission, and not after a reload or on the next page", async () => {
    const page = await signIn(browser, "buyer");
    const dataPosts: string[] = [];
    page.on("request", (request) => {
      if (request.method() === "POST") dataPosts.push(request.url());
    });
    await page.goto(`${baseUrl()}/prices`);
    await waitForHydration(page);

    await saveCopperBase(page, "9.4321");
    await saved(page).waitFor();
    expect(await saved(page).count()).toBe(1);
    // Submitted by the client router, not as a document.
    expect(
      dataPosts.some((url) => new URL(url).pathname === "/prices.data"),
    ).toBe(true);
    expect(new URL(page.url()).search).toBe("");

    await page.reload();
    await waitForHydration(page);
    await page
      .getByRole("table", { name: /Metal base history/ })
      .getByText("9.4321")
      .first()
      .waitFor();
    expect(await saved(page).count()).toBe(0);

    // Shown again after the next save, then gone on the next page reached in the app.
    await saveCopperBase(page, "9.5432");
    await saved(page).waitFor();
    await page
      .getByRole("navigation", { name: "Main" })
      .getByRole("link", { name: "Suppliers" })
      .click();
    await page.getByRole("heading", { level: 1, name: "Suppliers" }).waitFor();
    expect(await saved(page).count()).toBe(0);
    await page.goBack();
    await page.getByRole("heading", { level: 1, name: /Metal base/ }).waitFor();
    expect(await saved(page).count()).toBe(0);
    await page.close();
  });

  it("a crafted link shows none of its words", async () => {
    const crafted = "Your account is locked: call +1 555 0100 now";
    const text = encodeURIComponent(crafted);
    const [orders] = await testDatabase().query(
      "SELECT MIN(id) AS id FROM build_orders",
    );
    const orderId = (orders as { id: number }[])[0]!.id;
    const page = await signIn(browser, "buyer");
    for (const path of [
      `/suppliers?created=${text}`,
      `/prices?saved=metal-base`,
      `/reference?table=magnet-grades&added=${text}`,
      `/build-orders/${orderId}?done=${text}`,
    ]) {
      await page.goto(`${baseUrl()}${path}`);
      await waitForHydration(page);
      const body = await page.locator("body").innerText();
      expect(body, path).not.toContain(crafted);
      expect(body, path).not.toContain("Metal base saved.");
    }
    await page.close();
  });

  it("on several pages come through the one polite live region, once, and the page stays axe-clean", async () => {
    /**
     * The message shows in the shell's status region (a polite live region, so a
     * screen reader announces it), the page with it passes axe, and a reload
     * shows it no more.
     */
    async function shownOnce(page: Page, text: string, found: string[]) {
      const message = page.getByRole("status").filter({ hasText: text });
      await message.waitFor();
      expect(await message.count()).toBe(1);
      expect(await message.getAttribute("aria-live")).toBe("polite");
      await scanPage(page, found);
      await page.reload();
      await waitForHydration(page);
      expect(await page.getByText(text).count()).toBe(0);
    }
    const found: string[] = [];

    // A buyer's choice on the account page (once answered with text in the form).
    const buyerPage = await signIn(browser, "buyer");
    await buyerPage.goto(`${baseUrl()}/account`);
    await waitForHydration(buyerPage);
    await chooseRadio(
      buyerPage,
      buyerPage.getByRole("radio", { name: /once a day, in a digest/ }),
    );
    await press(
      buyerPage,
      buyerPage
        .getByRole("region", { name: "Low-stock e-mails" })
        .getByRole("button", { name: "Save" }),
    );
    await shownOnce(buyerPage, "Low-stock e-mail choice saved.", found);
    expect(
      await buyerPage
        .getByRole("radio", { name: /once a day, in a digest/ })
        .isChecked(),
    ).toBe(true);
    await buyerPage.close();

    // An admin's invitation (once a line of its own above the form).
    const adminPage = await signIn(browser, "admin");
    await adminPage.goto(`${baseUrl()}/admin/people`);
    await waitForHydration(adminPage);
    const email = uniqueEmail("flash-invite");
    const invite = adminPage.getByRole("region", { name: "Invite someone" });
    await typeInto(adminPage, invite.getByLabel("Name"), "Flash Newcomer");
    await typeInto(adminPage, invite.getByLabel("E-mail"), email);
    await toggle(adminPage, invite.getByRole("checkbox", { name: "Builder" }));
    await press(
      adminPage,
      invite.getByRole("button", { name: "Send invitation" }),
    );
    await adminPage
      .getByRole("status")
      .filter({ hasText: `Invitation sent to ${email}.` })
      .waitFor();
    // The form starts afresh for the next person.
    expect(await invite.getByLabel("E-mail").inputValue()).toBe("");
    await shownOnce(adminPage, `Invitation sent to ${email}.`, found);
    await adminPage.close();

    // A builder's save through a fetcher (the page does not move; the shell reloads its data).
    const wire = await createWireItem(await signInAs("buyer"));
    const design = await createDesign(
      [
        {
          kind: "coil",
          itemId: wire.id,
          turns: 20,
          activeLengthMm: 30,
          endTurnLengthMm: 20,
        },
      ],
      { status: "draft" },
    );
    const builderPage = await signIn(browser, "builder");
    await builderPage.goto(
      `${baseUrl()}/designs/${design.designId}/revisions/${design.revision}`,
    );
    await waitForHydration(builderPage);
    const before = builderPage.url();
    await press(
      builderPage,
      builderPage.getByRole("button", { name: "Save motor figures" }),
    );
    await builderPage
      .getByRole("status")
      .filter({ hasText: "Motor figures saved." })
      .waitFor();
    expect(builderPage.url()).toBe(before);
    await shownOnce(builderPage, "Motor figures saved.", found);
    await builderPage.close();

    expect(found).toEqual([]);
  });
});
