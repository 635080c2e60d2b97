/**
 * Ending or destroying something asks once, in the one shared dialog
 * (ConfirmButton): by keyboard alone, each kind of question opens on Enter with
 * the focus inside it, passes axe-core, names what will happen, changes
 * nothing when Escape closes it (the focus goes back to the button), and does
 * the change when its own button is pressed, after which the one-time message
 * says so.
 */
import type { Browser, Locator, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  newPerson,
  postForm,
  sendJson,
  signIn as signInApi,
  signInAs,
  type TestPerson,
} from "../support/app-client";
import { scanPage } from "../support/accessibility";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import {
  createMagnetItem,
  createWireItem,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import { press, tabTo, typeInto } from "../support/keyboard";
import {
  createOrder,
  createOrderSupplier,
} from "../support/purchase-order-fixtures";
import { closeTestDatabase, testDatabase } from "../support/test-database";

let browser: Browser;
let buyer = "";

beforeAll(async () => {
  browser = await launchBrowser();
  buyer = await signInAs("buyer");
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

async function one<T>(sql: string, values: unknown[]): Promise<T> {
  const [rows] = await testDatabase().query(sql, values);
  return (rows as T[])[0]!;
}

const isFocused = (locator: Locator) =>
  locator.evaluate((element) => element === document.activeElement);

/**
 * The whole round by keyboard: Enter on `trigger` opens the dialog named
 * `title` with the focus inside it, axe finds nothing serious; Escape closes it
 * with the focus back on the trigger and `unchanged` still holds; then Enter
 * again, Tab to the dialog's `confirmLabel` button and Enter: the change is
 * made and the message `flash` shows in the status region.
 */
async function askCancelThenConfirm(
  page: Page,
  question: {
    trigger: Locator;
    title: string | RegExp;
    names: string | RegExp;
    confirmLabel: string | RegExp;
    unchanged: () => Promise<void>;
    flash: string | RegExp;
    changed: () => Promise<void>;
    screenshot?: string;
  },
) {
  const dialog = page.getByRole("dialog", { name: question.title });
  expect(await dialog.count()).toBe(0);

  await press(page, question.trigger);
  await dialog.waitFor();
  expect(
    await page.evaluate(
      () => document.activeElement?.closest("dialog[open]") !== null,
    ),
  ).toBe(true);
  expect(await dialog.textContent()).toMatch(question.names);
  const found: string[] = [];
  await scanPage(page, found);
  expect(found).toEqual([]);
  if (question.screenshot) await saveScreenshot(page, question.screenshot);

  // Escape: nothing happens, the focus is back on the button.
  await page.keyboard.press("Escape");
  await dialog.waitFor({ state: "hidden" });
  expect(await isFocused(question.trigger)).toBe(true);
  await question.unchanged();

  // Asked again and confirmed, by keyboard.
  await page.keyboard.press("Enter");
  await dialog.waitFor();
  await tabTo(
    page,
    dialog.getByRole("button", { name: question.confirmLabel }),
  );
  await page.keyboard.press("Enter");
  await page.getByRole("status").filter({ hasText: question.flash }).waitFor();
  await question.changed();
}

describe("confirming what cannot be taken back", () => {
  it("cancels a build order only after the question, which names the order", async () => {
    const builder = await newPerson("builder");
    const builderCookie = await signInApi(builder.email, builder.password);
    const wire = await createWireItem(buyer);
    const design = await createDesign([
      {
        kind: "coil",
        itemId: wire.id,
        turns: 20,
        activeLengthMm: 30,
        endTurnLengthMm: 20,
      },
    ]);
    const created = await sendJson(
      "POST",
      "/api/v1/build-orders",
      { designId: design.designId, revision: design.revision, quantity: 2 },
      builderCookie,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const { id } = (await created.json()) as { id: number };
    const status = async () =>
      (
        await one<{ status: string }>(
          "SELECT status FROM build_orders WHERE id = ?",
          [id],
        )
      ).status;

    const page = await signIn(browser, builder);
    await page.goto(`${baseUrl()}/build-orders/${id}`);
    await waitForHydration(page);
    const reference = new RegExp(`^Cancel BO-0*${id}\\?$`);
    await askCancelThenConfirm(page, {
      trigger: page.getByRole("button", { name: "Cancel build order" }),
      title: reference,
      names: /Nothing is held for it\. A cancelled order cannot be reopened\./,
      confirmLabel: new RegExp(`^Cancel BO-0*${id}$`),
      unchanged: async () => expect(await status()).toBe("draft"),
      flash: /BO-0*\d+ cancelled\. Whatever it held is free again\./,
      changed: async () => expect(await status()).toBe("cancelled"),
      screenshot: "confirm-build-order-cancel",
    });
    await saveScreenshot(page, "flash-build-order-cancelled");
    await page.close();
  });

  it("revokes an API token only after the question, which names the token", async () => {
    const person = await newPerson("storekeeper");
    const cookie = await signInApi(person.email, person.password);
    const made = await postForm(
      "/account",
      {
        intent: "create",
        name: "bench scale",
        lifetimeDays: "90",
        scope: "all",
        currentPassword: person.password,
      },
      cookie,
    );
    expect(made.status).toBe(200);
    const revoked = async () =>
      (
        await one<{ revoked: number }>(
          "SELECT revoked_at IS NOT NULL AS revoked FROM api_tokens WHERE user_id = ?",
          [person.id],
        )
      ).revoked;

    const page = await signIn(browser, person);
    await page.goto(`${baseUrl()}/account`);
    await waitForHydration(page);
    await askCancelThenConfirm(page, {
      trigger: page.getByRole("button", { name: "Revoke bench scale" }),
      title: "Revoke the token bench scale?",
      names: /are refused from now on/,
      confirmLabel: "Revoke the token",
      unchanged: async () => expect(await revoked()).toBe(0),
      flash: "Token revoked: it no longer works.",
      changed: async () => expect(await revoked()).toBe(1),
    });
    expect(await page.getByRole("cell", { name: "revoked" }).count()).toBe(1);
    await page.close();
  });

  it("removes a design line only after the question, which names the line", async () => {
    const wire = await createWireItem(buyer);
    const magnet = await createMagnetItem(buyer);
    const design = await createDesign(
      [
        {
          kind: "coil",
          itemId: wire.id,
          turns: 20,
          activeLengthMm: 30,
          endTurnLengthMm: 20,
        },
        { kind: "magnet", itemId: magnet.id, piecesPerMotor: 14 },
      ],
      { status: "draft" },
    );
    const lines = async () =>
      Number(
        (
          await one<{ count: number }>(
            "SELECT COUNT(*) AS count FROM design_lines WHERE revision_id = ?",
            [design.revisionId],
          )
        ).count,
      );

    const page = await signIn(browser, "builder");
    await page.goto(
      `${baseUrl()}/designs/${design.designId}/revisions/${design.revision}`,
    );
    await waitForHydration(page);
    await askCancelThenConfirm(page, {
      trigger: page.getByRole("button", {
        name: `Remove line 2 (${magnet.sku})`,
      }),
      title: `Remove line 2 (${magnet.sku})?`,
      names: /leaves this draft revision/,
      confirmLabel: "Remove line 2",
      unchanged: async () => expect(await lines()).toBe(2),
      flash: "Line removed: the lines after it moved up one place.",
      changed: async () => expect(await lines()).toBe(1),
    });
    await page
      .getByRole("button", { name: `Remove line 2 (${magnet.sku})` })
      .waitFor({ state: "detached" });
    await page.close();
  });

  it("closes a purchase order short only after the question, which names the order", async () => {
    const buyerPerson: TestPerson = await newPerson("buyer");
    const wire = await createWireItem(buyer);
    const order = await createOrder({
      supplierId: await createOrderSupplier("EUR"),
      userId: buyerPerson.id,
      status: "partly_received",
      lines: [{ itemId: wire.id, quantity: "20.000", received: "12.000" }],
    });
    const status = async () =>
      (
        await one<{ status: string }>(
          "SELECT status FROM purchase_orders WHERE id = ?",
          [order.id],
        )
      ).status;

    const page = await signIn(browser, buyerPerson);
    await page.goto(`${baseUrl()}/purchase-orders/${order.id}`);
    await waitForHydration(page);
    await typeInto(
      page,
      page.getByLabel("Why close it short"),
      "The mill stopped drawing this size.",
    );
    await askCancelThenConfirm(page, {
      trigger: page.getByRole("button", { name: "Close short" }),
      title: /^Close PO-\d+ short\?$/,
      names: /nothing more can be received against it/,
      confirmLabel: /^Close PO-\d+ short$/,
      unchanged: async () => expect(await status()).toBe("partly_received"),
      flash: /PO-\d+ closed short: what was still open is no longer on order\./,
      changed: async () => expect(await status()).toBe("closed_short"),
    });
    await page.close();
  });

  it("deactivates a person only after the question, which names them", async () => {
    const target = await newPerson("storekeeper", "Rhea Spooler");
    const active = async () =>
      Number(
        (
          await one<{ active: number }>(
            "SELECT active FROM users WHERE id = ?",
            [target.id],
          )
        ).active,
      );

    const page = await signIn(browser, "admin");
    await page.goto(`${baseUrl()}/admin/people/${target.id}`);
    await waitForHydration(page);
    await askCancelThenConfirm(page, {
      trigger: page.getByRole("button", { name: "Deactivate" }),
      title: "Deactivate Rhea Spooler?",
      names: /signed out everywhere at once/,
      confirmLabel: "Deactivate Rhea Spooler",
      unchanged: async () => expect(await active()).toBe(1),
      flash:
        "Rhea Spooler is deactivated, signed out everywhere, and their API tokens are revoked.",
      changed: async () => expect(await active()).toBe(0),
    });
    await page.getByRole("button", { name: "Reactivate" }).waitFor();
    await page.close();
  });
});
