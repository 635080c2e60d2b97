/**
 * The whole purchasing loop against the real app, MariaDB, mail fake and Chromium:
 * an issue drops a wire below its reorder point (alert) → the buyer's plan suggests whole
 * spools → a draft order from the plan → sent (e-mail with PDF and CSV, outbox, on order)
 * → two spools weighed in on /stock/receive (on order falls, on hand rises at the order's
 * price) → a receipt past the tolerance refused with nothing written → the rest received
 * (order received, on order back, alert closed).
 *
 * Hand-worked figures of the fixture (kg of 0.80 mm copper wire, prices in EUR, the
 * company currency):
 * - 30 received, 24 issued → 6 available; reorder point 20, so the alert opens.
 * - Plan, week 0: 6 < 20, shortfall 14; at least max(14, reorder quantity 18) = 18,
 *   rounded up to whole 5 kg spools = 4 spools = 20 kg at 12.40 (the 50 kg break at 11.80
 *   would cost 590.00 against 20 × 12.40 = 248.00, so it is not taken).
 * - Build order: 10 motors × 12 coils of the engineering brief's worked check 4 (40
 *   turns, MLT 160 mm, 6.400 m of 0.80 mm copper = 28.60 g a coil) = 3.432 kg in week 2.
 *   Week 2 projected: 6 + 20 − 3.432 = 22.568 ≥ 20, so no second suggestion.
 * - Receipt 1: spools 5.62 − 0.60 = 5.02 and 5.48 − 0.60 = 4.88 → 9.90 kg; on order
 *   20 → 10.10, on hand 6 → 15.90 (still below 20: alert stays open).
 * - Refused: one spool of 13.10 − 0.60 = 12.50 kg → 9.90 + 12.50 = 22.40 > 20 × 1.10 =
 *   22.00 (the supplier's 10 % wire tolerance).
 * - Receipt 2: 5.75 − 0.60 = 5.15 and 5.57 − 0.60 = 4.97 → 10.12 kg; received 20.02 ≥ 20
 *   (order received); on order 10.10 − min(10.12, 10.10) = 0; on hand 15.90 + 10.12 =
 *   26.02 ≥ 20 (alert closed).
 */
import fs from "node:fs";
import { count, eq, inArray } from "drizzle-orm";
import Papa from "papaparse";
import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mondayOf } from "~/buying-plan/plan-weeks";
import {
  lots,
  priceLines,
  purchaseOrderEvents,
  purchaseOrderLines,
  purchaseReceiptLines,
  purchaseReceipts,
  settings,
  stockMovements,
  suppliers,
} from "~/db/schema";
import { addDays, dayOf } from "~/lib/calendar-days";
import {
  baseUrl,
  get,
  newPerson,
  sendJson,
  signInAs,
} from "../support/app-client";
import { createWireItem, receive } from "../support/build-order-fixtures";
import {
  launchBrowser,
  saveScreenshot,
  signIn,
  waitForHydration,
} from "../support/browser";
import { createDesign } from "../support/design-fixtures";
import { waitForMessage } from "../support/mail-fake-client";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let browser: Browser;
let buyer = "";
let storekeeper = "";
let admin = "";
let storekeeperPerson: Awaited<ReturnType<typeof newPerson>>;
let wire: { sku: string; id: number };
let bin = "";
let supplierId = 0;
let orderEmail = "";
const today = dayOf(new Date());
const monday = mondayOf(today);

/** What the steps pass on: the order made from the plan. */
const loop = { orderId: 0, number: "", lineId: 0 };

async function json<T>(response: Response, status: number): Promise<T> {
  expect(response.status, await response.clone().text()).toBe(status);
  return (await response.json()) as T;
}

async function itemFigures() {
  return json<{
    onHand: number;
    available: number;
    onOrder: number;
    belowReorder: boolean;
  }>(await get(`/api/v1/items/${wire.sku}`, buyer), 200);
}

async function alertsOfWire() {
  const alerts = await json<
    {
      sku: string;
      status: string;
      coveredBy: { order: string } | null;
    }[]
  >(await get("/api/v1/alerts?status=all&perPage=200", buyer), 200);
  return alerts.filter((alert) => alert.sku === wire.sku);
}

/** Everything a receipt against the order could write. */
async function footprint() {
  const db = testDb();
  const rows = async (query: Promise<{ rows: number }[]>) =>
    (await query)[0]!.rows;
  const receiptIds = (
    await db
      .select({ id: purchaseReceipts.id })
      .from(purchaseReceipts)
      .where(eq(purchaseReceipts.orderId, loop.orderId))
  ).map((row) => row.id);
  return {
    movements: await rows(
      db
        .select({ rows: count() })
        .from(stockMovements)
        .where(eq(stockMovements.itemId, wire.id)),
    ),
    lots: await rows(
      db.select({ rows: count() }).from(lots).where(eq(lots.itemId, wire.id)),
    ),
    receipts: receiptIds.length,
    receiptLines:
      receiptIds.length === 0
        ? 0
        : await rows(
            db
              .select({ rows: count() })
              .from(purchaseReceiptLines)
              .where(inArray(purchaseReceiptLines.receiptId, receiptIds)),
          ),
    events: await rows(
      db
        .select({ rows: count() })
        .from(purchaseOrderEvents)
        .where(eq(purchaseOrderEvents.orderId, loop.orderId)),
    ),
    lineReceived: (
      await db
        .select({ received: purchaseOrderLines.received })
        .from(purchaseOrderLines)
        .where(eq(purchaseOrderLines.id, loop.lineId))
    )[0]!.received,
    item: await itemFigures(),
  };
}

/** Saved beside the other screenshots and in the closing note's folder. */
async function shoot(page: Page, name: string) {
  const file = await saveScreenshot(page, `purchasing-loop-${name}`);
  const notes = "/work/notes/shots";
  if (fs.existsSync(notes))
    fs.copyFileSync(file, `${notes}/r18-loop-${name}.png`);
}

beforeAll(async () => {
  browser = await launchBrowser();
  buyer = await signInAs("buyer");
  storekeeperPerson = await newPerson("storekeeper");
  storekeeper = await signInAs("storekeeper");
  admin = await signInAs("admin");
  const db = testDb();
  const [currency] = await db
    .select({ value: settings.value })
    .from(settings)
    .where(eq(settings.key, "company_currency"));
  // The loop's figures need no conversion: the test database keeps its books in EUR.
  expect(currency?.value ?? "EUR").toBe("EUR");

  bin = await createLocation(uniqueCode("LOOP"), "Loop wire bay");
  wire = await createWireItem(buyer);
  orderEmail = `${uniqueCode("orders").toLowerCase()}@loop-wire.test`;
  const [supplier] = await db
    .insert(suppliers)
    .values({
      name: uniqueCode("Loop Wire Works"),
      currency: "EUR",
      orderEmail,
      leadTimeDays: 14,
    })
    .$returningId();
  supplierId = supplier!.id;
  const line = (unitPrice: string, minQuantity: string) => ({
    supplierId,
    itemId: wire.id,
    supplierSku: "LWW-080-G2",
    currency: "EUR",
    unitPrice,
    minQuantity,
    validFrom: "2020-01-01",
    packQuantity: "5",
    leadTimeDays: 12,
  });
  await db
    .insert(priceLines)
    .values([line("12.4000", "0"), line("11.8000", "50")]);

  // 30 kg in stock; then the reorder figures (available 30 is above 20: no alert yet).
  await receive(storekeeper, {
    sku: wire.sku,
    lot: uniqueCode("LP"),
    location: bin,
    quantity: 30,
    unitCost: 11.5,
  });
  await json(
    await sendJson(
      "PATCH",
      `/api/v1/items/${wire.sku}`,
      { reorderPoint: 20, reorderQuantity: 18 },
      buyer,
    ),
    200,
  );

  // A released design winding the wire, and 10 motors of it starting in two weeks.
  const design = await createDesign([
    {
      kind: "coil",
      itemId: wire.id,
      turns: 40,
      activeLengthMm: 50,
      endTurnLengthMm: 30,
      coilsPerMotor: 12,
    },
  ]);
  await json(
    await sendJson(
      "POST",
      "/api/v1/build-orders",
      {
        designId: design.designId,
        revision: design.revision,
        quantity: 10,
        plannedStart: addDays(today, 14),
      },
      await signInAs("builder"),
    ),
    201,
  );
});
afterAll(async () => {
  await browser?.close();
  await closeTestDatabase();
});

describe("the purchasing loop", () => {
  it("opens a low-stock alert when an issue takes the wire below its reorder point", async () => {
    expect(
      (await alertsOfWire()).filter((alert) => alert.status === "open"),
    ).toEqual([]);
    const lot = (
      await json<{ movements: { lot: string | null }[] }>(
        await get(`/api/v1/stock-movements?sku=${wire.sku}`, storekeeper),
        200,
      )
    ).movements[0]!.lot;
    await json(
      await sendJson(
        "POST",
        "/api/v1/stock-movements",
        { type: "issue", sku: wire.sku, lot, location: bin, quantity: 24 },
        storekeeper,
      ),
      201,
    );
    // Hand-worked: 30 − 24 = 6 < 20.
    expect(await itemFigures()).toMatchObject({
      onHand: 6,
      available: 6,
      onOrder: 0,
      belowReorder: true,
    });
    await expect
      .poll(async () => (await alertsOfWire()).map((alert) => alert.status))
      .toEqual(["open"]);
  });

  it("plans whole spools for it, as worked out by hand", async () => {
    const plan = await json<{
      suggestions: {
        sku: string;
        supplierId: number;
        quantity: number;
        unitPrice: number;
        currency: string;
        packQuantity: number;
        raisedToBreak: boolean;
        needBy: string;
        orderBy: string;
      }[];
      items: {
        sku: string;
        weeks: { needed: number; projected: number; suggested: number }[];
      }[];
    }>(await get("/api/v1/buying-plan?weeks=8", buyer), 200);
    const mine = plan.suggestions.filter((entry) => entry.sku === wire.sku);
    // One suggestion: 18 kg rounded up to 5 kg spools = 20 kg at 12.40, needed this week,
    // ordered the price line's 12 days before.
    expect(mine).toEqual([
      expect.objectContaining({
        supplierId,
        quantity: 20,
        unitPrice: 12.4,
        currency: "EUR",
        packQuantity: 5,
        raisedToBreak: false,
        needBy: monday,
        orderBy: addDays(monday, -12),
      }),
    ]);
    const weeks = plan.items.find((item) => item.sku === wire.sku)!.weeks;
    expect(weeks[0]).toMatchObject({ projected: 6, suggested: 20 });
    // Week 2, by hand: copper area π/4 × 0.80² = 0.50265 mm² × 6.400 m = 3.2170 cm³ ×
    // 8.89 g/cm³ = 28.599 g a coil; × 12 coils × 10 motors = 3.4319 kg → 3.432 kg to the
    // gram; projected 6 + 20 − 3.432 = 22.568 kg, nothing more to buy.
    expect(weeks[2]).toMatchObject({ needed: 3.432, projected: 22.568 });
    expect(
      weeks.every((week, index) => index === 0 || week.suggested === 0),
    ).toBe(true);
  });

  it("lets a buyer make the draft from the plan and send it", async () => {
    const page = await signIn(browser, "buyer");
    await page.goto(`${baseUrl()}/buying-plan?weeks=8&item=${wire.sku}`);
    await waitForHydration(page);
    const row = page.getByRole("row").filter({ hasText: wire.sku });
    await row.first().waitFor();
    const rowText = (await row.first().textContent()) ?? "";
    expect(rowText).toMatch(/20\.000\skg/);
    expect(rowText).toMatch(/packs of 5\.000\skg/);
    expect(rowText).toContain("12.40");
    await shoot(page, "buying-plan");

    // Only this loop's suggestion: the demo data has its own.
    for (const box of await page.getByRole("checkbox").all())
      if (await box.isEnabled()) await box.uncheck();
    await page
      .getByRole("checkbox", {
        name: new RegExp(`^Order ${wire.sku} for the week of`),
      })
      .check();
    await page.getByRole("button", { name: "Make draft orders" }).click();
    const made = page
      .getByRole("status")
      .filter({ hasText: /draft orders? made/i });
    await made.waitFor();
    const link = made.getByRole("link");
    expect(await link.count()).toBe(1);
    loop.number = ((await link.textContent()) ?? "").match(/PO-\d{6}/)![0];
    await link.click();
    await page
      .getByRole("heading", { level: 1 })
      .getByText(loop.number)
      .waitFor();
    loop.orderId = Number(new URL(page.url()).pathname.split("/").pop());
    await waitForHydration(page);

    const order = await json<{
      status: string;
      supplierId: number;
      lines: { id: number; sku: string; quantity: number; unitPrice: number }[];
    }>(await get(`/api/v1/purchase-orders/${loop.orderId}`, buyer), 200);
    expect(order.status).toBe("draft");
    expect(order.lines).toEqual([
      expect.objectContaining({ sku: wire.sku, quantity: 20, unitPrice: 12.4 }),
    ]);
    loop.lineId = order.lines[0]!.id;
    // A draft is not on order yet.
    expect((await itemFigures()).onOrder).toBe(0);

    await page.getByRole("button", { name: "Send to supplier…" }).click();
    await page.getByText(`e-mails ${loop.number} to ${orderEmail}`).waitFor();
    await shoot(page, "order-draft");
    await page
      .getByRole("button", { name: `Yes, send ${loop.number}` })
      .click();
    await page
      .getByRole("status")
      .filter({ hasText: `${loop.number} sent to ${orderEmail}` })
      .waitFor();
    await page.getByRole("heading", { level: 1 }).getByText("Sent").waitFor();
    await shoot(page, "order-sent");
    await page.close();

    // The e-mail at the supplier's order address, with the order as PDF and CSV.
    const mail = await waitForMessage(orderEmail, new RegExp(loop.number));
    const byName = new Map(
      mail.attachments.map((file) => [file.fileName, file]),
    );
    const pdf = byName.get(`${loop.number}.pdf`);
    const csv = byName.get(`${loop.number}.csv`);
    expect(
      Buffer.from(pdf!.contentBase64, "base64").subarray(0, 5).toString(),
    ).toBe("%PDF-");
    const rows = Papa.parse<Record<string, string>>(
      Buffer.from(csv!.contentBase64, "base64")
        .toString("utf8")
        .replace(/^\uFEFF/, "")
        .trim(),
      { header: true },
    ).data;
    expect(
      rows.map((row) => ({
        sku: row.our_sku,
        supplierSku: row.supplier_sku,
        quantity: Number(row.quantity),
        unitPrice: Number(row.unit_price),
        currency: row.currency,
        lineTotal: row.line_total,
      })),
    ).toEqual([
      {
        sku: wire.sku,
        supplierSku: "LWW-080-G2",
        quantity: 20,
        unitPrice: 12.4,
        currency: "EUR",
        // 20 × 12.40 = 248.00.
        lineTotal: "248.00",
      },
    ]);

    // The admin's outbox names both files.
    const outbox = await json<
      { to: string; attachments: { fileName: string }[] }[]
    >(await get("/api/v1/outbox?limit=100", admin), 200);
    expect(
      outbox
        .find((entry) => entry.to === orderEmail)
        ?.attachments.map((file) => file.fileName),
    ).toEqual([`${loop.number}.pdf`, `${loop.number}.csv`]);

    // On order rises by the 20 kg; the open alert is now covered by the order.
    expect(await itemFigures()).toMatchObject({ onHand: 6, onOrder: 20 });
    const [alert] = await alertsOfWire();
    expect(alert).toMatchObject({ status: "open" });
    expect(alert!.coveredBy?.order).toBe(loop.number);
  });

  it("takes two spools in by weight on the receiving page at the order's price", async () => {
    const page = await signIn(browser, storekeeperPerson);
    await page.goto(`${baseUrl()}/stock/receive?order=${loop.number}`);
    await waitForHydration(page);
    const line = page.getByRole("region", { name: `Line 1, ${wire.sku}` });
    await line.waitFor();
    await line.getByRole("button", { name: "Add a spool to line 1" }).click();
    const spools = [
      { lot: uniqueCode("LA"), gross: "5.62", tare: "0.60", net: "5.020" },
      { lot: uniqueCode("LB"), gross: "5.48", tare: "0.60", net: "4.880" },
    ];
    for (const [index, spool] of spools.entries()) {
      const entry = line.getByRole("group", { name: `Spool ${index + 1}` });
      await entry.getByLabel("Spool lot number").fill(spool.lot);
      await entry.getByLabel("Into location").selectOption(bin);
      await entry.getByLabel("Gross weight").fill(spool.gross);
      await entry.getByLabel("Tare weight").fill(spool.tare);
      expect(
        await entry
          .getByRole("status")
          .filter({ hasText: "Net weight" })
          .textContent(),
      ).toContain(spool.net);
    }
    await shoot(page, "receive");
    await page
      .getByRole("button", { name: `Receive against ${loop.number}` })
      .click();
    await page
      .getByText(
        new RegExp(
          `Received 2\\sspools or lots against ${loop.number}\\. The order is now partly received\\.`,
        ),
      )
      .waitFor();
    await shoot(page, "received-part");
    await page.close();

    const order = await json<{ status: string; lines: { received: number }[] }>(
      await get(`/api/v1/purchase-orders/${loop.orderId}`, buyer),
      200,
    );
    expect(order.status).toBe("partly_received");
    // 5.02 + 4.88 = 9.90 kg net; on order 20 − 9.90, on hand 6 + 9.90.
    expect(order.lines[0]!.received).toBe(9.9);
    expect(await itemFigures()).toMatchObject({
      onHand: 15.9,
      onOrder: 10.1,
      belowReorder: true,
    });
    expect((await alertsOfWire())[0]).toMatchObject({ status: "open" });

    const { movements } = await json<{
      movements: {
        type: string;
        quantity: number;
        grossKg: number | null;
        unitCost: number | null;
        purchaseOrder: string | null;
      }[];
    }>(await get(`/api/v1/stock-movements?sku=${wire.sku}`, storekeeper), 200);
    const receipts = movements.filter(
      (movement) => movement.purchaseOrder === loop.number,
    );
    expect(
      receipts.map((movement) => [movement.quantity, movement.grossKg]).sort(),
    ).toEqual([
      [4.88, 5.48],
      [5.02, 5.62],
    ]);
    // At the order line's 12.40 EUR/kg (company currency EUR: no conversion).
    expect(receipts.map((movement) => movement.unitCost)).toEqual([12.4, 12.4]);
    expect(movements.map((movement) => movement.type)).toEqual([
      "receipt",
      "receipt",
      "issue",
      "receipt",
    ]);
  });

  it("refuses a spool past the tolerance and writes nothing", async () => {
    const before = await footprint();
    const refused = await sendJson(
      "POST",
      `/api/v1/purchase-orders/${loop.orderId}/receipts`,
      {
        lines: [
          {
            lineId: loop.lineId,
            lot: uniqueCode("LX"),
            location: bin,
            grossKg: 13.1,
            tareKg: 0.6,
          },
        ],
      },
      storekeeper,
    );
    // 9.90 + 12.50 = 22.40 > 22.00.
    const body = await json<{ error: { message: string } }>(refused, 409);
    expect(body.error.message).toMatch(/22/);
    expect(await footprint()).toEqual(before);
  });

  it("receives the rest: the order is received, on order is back and the alert closes", async () => {
    const answer = await json<{
      receipt: { lines: { quantity: number; unitCost: number }[] };
      order: { status: string; lines: { received: number }[] };
    }>(
      await sendJson(
        "POST",
        `/api/v1/purchase-orders/${loop.orderId}/receipts`,
        {
          lines: [
            {
              lineId: loop.lineId,
              lot: uniqueCode("LC"),
              location: bin,
              grossKg: 5.75,
              tareKg: 0.6,
            },
            {
              lineId: loop.lineId,
              lot: uniqueCode("LD"),
              location: bin,
              grossKg: 5.57,
              tareKg: 0.6,
            },
          ],
        },
        storekeeper,
      ),
      201,
    );
    expect(answer.receipt.lines).toEqual([
      expect.objectContaining({ quantity: 5.15, unitCost: 12.4 }),
      expect.objectContaining({ quantity: 4.97, unitCost: 12.4 }),
    ]);
    // 9.90 + 10.12 = 20.02 ≥ 20 ordered.
    expect(answer.order.status).toBe("received");
    expect(answer.order.lines[0]!.received).toBe(20.02);
    expect(await itemFigures()).toMatchObject({
      onHand: 26.02,
      onOrder: 0,
      belowReorder: false,
    });
    await expect
      .poll(async () => (await alertsOfWire()).map((alert) => alert.status))
      .toEqual(["closed"]);
  });
});
