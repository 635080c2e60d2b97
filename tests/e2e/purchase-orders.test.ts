/**
 * A buyer's purchase order in Chromium: written by hand on the new-order page (one line
 * at the price list's price, one at a price of the buyer's own with its reason), edited
 * while draft, sent after the confirmation, then seen sent with its history, in the list
 * and on the printable page; each page scanned with axe-core on the way.
 */
import fs from "node:fs";
import path from "node:path";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { scanPage } from "../support/accessibility";
import { baseUrl, signInAs } from "../support/app-client";
import {
  createMagnetItem,
  createPartItem,
} from "../support/build-order-fixtures";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

/** Serious or critical axe-core findings on the pages shot below (none expected). */
const found: string[] = [];

/** The page's screenshot (after an accessibility scan), also where the notes of this work keep them. */
async function shoot(page: Page, name: string) {
  await scanPage(page, found);
  const file = await saveScreenshot(page, `purchase-orders-${name}`);
  const notes = "/work/notes/shots";
  if (fs.existsSync(notes))
    fs.copyFileSync(file, path.join(notes, `r18-pages-${name}.png`));
}

/** A supplier with an address for orders, quoting the part at 1.50 EUR a piece from 1 piece. */
async function supplierQuotingPart(buyer: string) {
  const name = `Bearing house ${uniqueCode("B")}`;
  const supplierId = await createSupplier(buyer, name, "EUR");
  const database = testDatabase();
  await database.query(
    "UPDATE suppliers SET order_email = 'orders@bearing-house.example', lead_time_days = 14 WHERE id = ?",
    [supplierId],
  );
  const part = await createPartItem(buyer);
  const magnet = await createMagnetItem(buyer);
  await database.query(
    `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, min_quantity, valid_from, line)
     VALUES (?, ?, 'BH-6001', 'EUR', 1.5, 1, '2026-01-01', 1)`,
    [supplierId, part.id],
  );
  return { name, supplierId, part, magnet };
}

const flash = (page: Page, text: string | RegExp) =>
  page.getByRole("status").filter({ hasText: text });

describe("purchase orders in the browser", () => {
  it("a buyer writes an order by hand, edits the draft, sends it and sees it sent with its history", async () => {
    const fixtures = await supplierQuotingPart(await signInAs("buyer"));
    const page = await signIn(browser, "buyer");

    await page.goto(`${baseUrl()}/purchase-orders`);
    await page
      .getByRole("heading", { name: "Purchase orders", level: 1 })
      .waitFor();
    await waitForHydration(page);
    await page.getByRole("link", { name: "New order" }).click();
    await page.getByRole("heading", { name: "New purchase order" }).waitFor();
    await waitForHydration(page);

    const form = page.getByRole("form", { name: "New purchase order" });
    // Nothing chosen: field messages, nothing written.
    await form.getByRole("button", { name: "Save draft order" }).click();
    await form.getByText("Choose the supplier.").waitFor();
    await form.getByText("Give the item's SKU.").waitFor();

    await form
      .getByLabel("Supplier", { exact: true })
      .selectOption(fixtures.name);
    await form
      .getByText("Orders go to orders@bearing-house.example.")
      .waitFor();
    await form.getByLabel("Notes for the supplier").fill("Deliver to gate 2.");
    const first = form.getByRole("group", { name: "Line 1" });
    await first
      .getByRole("combobox", { name: "Item (SKU)" })
      .fill(fixtures.part.sku);
    await first.getByLabel("Quantity").fill("120");
    await form.getByRole("button", { name: "Add a line" }).click();
    const second = form.getByRole("group", { name: "Line 2" });
    await second
      .getByRole("combobox", { name: "Item (SKU)" })
      .fill(fixtures.magnet.sku);
    await second.getByLabel("Quantity").fill("40");
    await second.getByText("Price of your own", { exact: true }).click();
    await second.getByLabel("Unit price").fill("2,10");
    // A price of one's own needs its reason.
    await form.getByRole("button", { name: "Save draft order" }).click();
    await second.getByText(/^Say why this price replaces/).waitFor();
    await second.getByLabel("Why this price").fill("Quoted by phone");
    // The supplier's list price shows beside its line, and says when there is none.
    await first
      .getByText("Price list: 1.50 EUR/piece (break from 1)")
      .waitFor();
    await second
      .getByText("This supplier's price list does not have this item", {
        exact: false,
      })
      .waitFor();
    await shoot(page, "new");
    await form.getByRole("button", { name: "Save draft order" }).click();

    await flash(page, /drafted for Bearing house/).waitFor();
    const number = (
      await page.getByRole("heading", { level: 1 }).textContent()
    )?.match(/PO-\d{6}/)?.[0];
    expect(number).toBeTruthy();
    await waitForHydration(page);
    const lines = page.getByRole("table", { name: /Lines of/ });
    await expect.poll(() => lines.textContent()).toContain("BH-6001");
    expect(await lines.textContent()).toContain("Quoted by phone");
    await page
      .getByRole("form", { name: "Edit the draft" })
      .getByText("Price list: 1.50 EUR/piece (break from 1)")
      .waitFor();
    await shoot(page, "detail-draft");

    // Edit the draft: more bearings, and the magnets go.
    const edit = page.getByRole("form", { name: "Edit the draft" });
    await edit
      .getByRole("group", { name: "Line 1" })
      .getByLabel("Quantity")
      .fill("150");
    await edit.getByRole("button", { name: "Remove line 2" }).click();
    await edit.getByRole("button", { name: "Save changes" }).click();
    await flash(page, `${number} saved.`).waitFor();
    await expect.poll(() => lines.getByRole("row").count()).toBe(2);
    expect(await lines.textContent()).toContain("150");

    // Send, after saying where it goes.
    await page.getByRole("button", { name: "Send to supplier…" }).click();
    await page
      .getByText(/e-mails PO-\d{6} to orders@bearing-house\.example/)
      .waitFor();
    await page.getByRole("button", { name: `Yes, send ${number}` }).click();
    await flash(
      page,
      `${number} sent to orders@bearing-house.example`,
    ).waitFor();
    await page.getByRole("heading", { level: 1 }).getByText("Sent").waitFor();
    expect(
      await page.getByRole("form", { name: "Edit the draft" }).count(),
    ).toBe(0);
    const history = page.getByRole("region", { name: "History" });
    for (const step of ["Drafted", "Line changed", "Line removed", "Sent"])
      await history.getByText(step, { exact: true }).first().waitFor();
    await shoot(page, "detail-sent");

    // The e-mail waits in the outbox with the PDF and the CSV.
    const [attachments] = await testDatabase().query(
      `SELECT a.file_name AS fileName FROM mail_attachments a
       JOIN mail_outbox o ON o.id = a.outbox_id
       WHERE o.to_address = 'orders@bearing-house.example' AND a.file_name LIKE ?`,
      [`${number}%`],
    );
    expect(
      (attachments as { fileName: string }[])
        .map((row) => path.extname(row.fileName))
        .sort(),
    ).toEqual([".csv", ".pdf"]);

    await page.getByRole("link", { name: "Printable order" }).click();
    await page.getByRole("heading", { name: new RegExp(number!) }).waitFor();
    await shoot(page, "print");

    await page.goto(
      `${baseUrl()}/purchase-orders?status=sent&supplier=${fixtures.supplierId}`,
    );
    await waitForHydration(page);
    const row = page.getByRole("row", { name: new RegExp(number!) });
    await row.waitFor();
    expect(await row.textContent()).toContain(fixtures.name);
    await shoot(page, "list");
    expect(found).toEqual([]);
  });
});
