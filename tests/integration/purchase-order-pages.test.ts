/**
 * The purchase-order pages over HTTP, as a browser without JavaScript posts their forms:
 * who may write, field messages for bad input with nothing written, the draft's edit as
 * only what changed, send, cancel and close short, the list's filters and the printable
 * order.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import {
  createMagnetItem,
  createPartItem,
} from "../support/build-order-fixtures";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
let storekeeper = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
  storekeeper = await signInAs("storekeeper");
});
afterAll(closeTestDatabase);

async function rows<Row>(sql: string, values: unknown[]): Promise<Row[]> {
  const [found] = await testDatabase().query(sql, values);
  return found as Row[];
}

const ordersOf = (supplierId: number) =>
  rows<{ id: number; status: string; notes: string; currency: string }>(
    "SELECT id, status, notes, currency FROM purchase_orders WHERE supplier_id = ? ORDER BY id",
    [supplierId],
  );

const eventsOf = (orderId: number) =>
  rows<{ kind: string; detail: string }>(
    "SELECT kind, detail FROM purchase_order_events WHERE order_id = ? ORDER BY id",
    [orderId],
  );

/** A supplier with an order address quoting a bearing at 1.50 EUR a piece; a magnet it does not quote. */
async function setting() {
  const name = `Bearing house ${uniqueCode("H")}`;
  const supplierId = await createSupplier(buyer, name, "EUR");
  await testDatabase().query(
    "UPDATE suppliers SET order_email = 'orders@house.example', lead_time_days = 10 WHERE id = ?",
    [supplierId],
  );
  const part = await createPartItem(buyer);
  const magnet = await createMagnetItem(buyer);
  await testDatabase().query(
    `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, min_quantity, valid_from, line)
     VALUES (?, ?, 'BH-6001', 'EUR', 1.5, 1, '2026-01-01', 1)`,
    [supplierId, part.id],
  );
  return { name, supplierId, part, magnet };
}

const line = (index: number, values: Record<string, string>) =>
  Object.fromEntries(
    Object.entries(values).map(([key, value]) => [
      `lines[${index}].${key}`,
      value,
    ]),
  );

/** Posts the new-order form; answers the response and the new order's id when it redirected to one. */
async function createByForm(
  fields: Record<string, string>,
  cookie = buyer,
): Promise<{ response: Response; id: number | null }> {
  const response = await postForm(
    "/purchase-orders/new",
    { intent: "create", ...fields },
    cookie,
  );
  const match = /^\/purchase-orders\/(\d+)$/.exec(
    response.headers.get("location") ?? "",
  );
  return { response, id: match ? Number(match[1]) : null };
}

describe("the purchase-order pages", () => {
  it("refuses a builder's new order and send, writing nothing", async () => {
    const { supplierId, part } = await setting();
    const byBuilder = await createByForm(
      {
        supplierId: String(supplierId),
        ...line(0, { sku: part.sku, quantity: "5" }),
      },
      builder,
    );
    expect(byBuilder.response.status).toBe(403);
    expect(await ordersOf(supplierId)).toEqual([]);
    expect((await get("/purchase-orders/new", builder)).status).toBe(403);

    const { id } = await createByForm({
      supplierId: String(supplierId),
      ...line(0, { sku: part.sku, quantity: "5" }),
    });
    expect(id).not.toBeNull();
    for (const cookie of [builder, storekeeper]) {
      const send = await postForm(
        `/purchase-orders/${id}`,
        { intent: "send" },
        cookie,
      );
      expect(send.status).toBe(403);
    }
    expect((await ordersOf(supplierId)).map((order) => order.status)).toEqual([
      "draft",
    ]);
    // Reading is for everyone signed in.
    const page = await get(`/purchase-orders/${id}`, builder);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain("BH-6001");
    expect(html).not.toContain("Edit the draft");
  });

  it("answers bad input with field messages and keeps what was typed, writing nothing", async () => {
    const { supplierId, part, magnet } = await setting();
    const typed = await createByForm({
      supplierId: "",
      notes: "Keep this note",
      ...line(0, { sku: part.sku, quantity: "0" }),
      ...line(1, { sku: magnet.sku, quantity: "3", unitPrice: "2.5" }),
    });
    expect(typed.response.status).toBe(400);
    const html = await typed.response.text();
    expect(html).toContain("Choose the supplier.");
    expect(html).toContain("The quantity must be more than 0.");
    expect(html).toContain("Say why this price replaces");
    expect(html).toContain("Keep this note");

    // Well-formed, but the magnet has no price from this supplier and none was given.
    const unpriced = await createByForm({
      supplierId: String(supplierId),
      ...line(0, { sku: part.sku, quantity: "4" }),
      ...line(1, { sku: magnet.sku, quantity: "3" }),
    });
    expect(unpriced.response.status).toBeGreaterThanOrEqual(400);
    expect(unpriced.response.status).toBeLessThan(500);
    expect(await unpriced.response.text()).toContain(magnet.sku);

    const unknown = await createByForm({
      supplierId: String(supplierId),
      ...line(0, { sku: `NO-SUCH-${uniqueCode("X")}`, quantity: "4" }),
    });
    expect(unknown.response.status).toBeGreaterThanOrEqual(400);
    expect(unknown.response.status).toBeLessThan(500);
    expect(await ordersOf(supplierId)).toEqual([]);
  });

  it("drafts, edits only what changed, sends and closes short an order, with a message after each", async () => {
    const { name, supplierId, part, magnet } = await setting();
    const created = await createByForm({
      supplierId: String(supplierId),
      currency: "",
      notes: "Gate 2",
      ...line(0, { sku: part.sku, quantity: "100" }),
      ...line(1, {
        sku: magnet.sku,
        quantity: "40",
        unitPrice: "2,10",
        overrideReason: "Quoted by phone",
      }),
    });
    expect(created.response.status).toBe(302);
    const id = created.id!;
    const page = await (await followRedirect(created.response, buyer)).text();
    expect(page).toContain(`drafted for ${name}`);
    const [order] = await ordersOf(supplierId);
    expect(order).toMatchObject({ id, status: "draft", currency: "EUR" });
    const lines = await rows<{
      id: number;
      quantity: string;
      unit_price: string;
      price_source: string;
      override_reason: string | null;
    }>(
      "SELECT id, quantity, unit_price, price_source, override_reason FROM purchase_order_lines WHERE order_id = ? ORDER BY line_number",
      [id],
    );
    expect(lines).toMatchObject([
      { quantity: "100.000", unit_price: "1.5000", price_source: "price_list" },
      {
        quantity: "40.000",
        unit_price: "2.1000",
        price_source: "override",
        override_reason: "Quoted by phone",
      },
    ]);
    const eventsBefore = (await eventsOf(id)).length;

    // The same form again, with only the first quantity changed and the magnets left out.
    const saved = await postForm(
      `/purchase-orders/${id}`,
      {
        intent: "save",
        currency: "EUR",
        notes: "Gate 2",
        ...line(0, {
          id: String(lines[0]!.id),
          sku: part.sku,
          quantity: "120",
        }),
      },
      buyer,
    );
    expect(saved.status).toBe(302);
    expect(await (await followRedirect(saved, buyer)).text()).toContain(
      `saved.`,
    );
    const kinds = (await eventsOf(id)).slice(eventsBefore).map((e) => e.kind);
    expect(kinds.sort()).toEqual(["line-changed", "line-removed"]);

    // Cancelling needs a reason: nothing changes without one.
    const noReason = await postForm(
      `/purchase-orders/${id}`,
      { intent: "cancel", reason: " " },
      buyer,
    );
    expect(noReason.status).toBe(400);
    expect(await noReason.text()).toContain("Say why the order is cancelled.");
    expect((await ordersOf(supplierId))[0]?.status).toBe("draft");

    const sent = await postForm(
      `/purchase-orders/${id}`,
      { intent: "send" },
      buyer,
    );
    expect(sent.status).toBe(302);
    const sentPage = await (await followRedirect(sent, buyer)).text();
    expect(sentPage).toContain("sent to orders@house.example");
    expect((await ordersOf(supplierId))[0]?.status).toBe("sent");
    // Sent: the lines are fixed.
    const late = await postForm(
      `/purchase-orders/${id}`,
      {
        intent: "save",
        currency: "EUR",
        ...line(0, { id: String(lines[0]!.id), sku: part.sku, quantity: "1" }),
      },
      buyer,
    );
    expect(late.status).toBe(409);
    expect(
      (
        await rows<{ quantity: string }>(
          "SELECT quantity FROM purchase_order_lines WHERE order_id = ?",
          [id],
        )
      ).map((row) => row.quantity),
    ).toEqual(["120.000"]);

    const closed = await postForm(
      `/purchase-orders/${id}`,
      { intent: "close", reason: "Mill stopped the size" },
      buyer,
    );
    expect(closed.status).toBe(302);
    expect(await (await followRedirect(closed, buyer)).text()).toContain(
      "closed short",
    );
    expect((await ordersOf(supplierId))[0]?.status).toBe("closed_short");

    // The list filtered by status and supplier, and the printable order.
    const listed = await (
      await get(
        `/purchase-orders?status=closed_short&supplier=${supplierId}`,
        builder,
      )
    ).text();
    expect(listed).toContain(`PO-${String(id).padStart(6, "0")}`);
    const drafts = await (
      await get(`/purchase-orders?status=draft&supplier=${supplierId}`, builder)
    ).text();
    expect(drafts).not.toContain(`PO-${String(id).padStart(6, "0")}`);
    const printed = await get(`/purchase-orders/${id}/print`, builder);
    expect(printed.status).toBe(200);
    const sheet = await printed.text();
    expect(sheet).toContain(`Purchase order PO-${String(id).padStart(6, "0")}`);
    // 120 pieces × 1.50 EUR = 180.00 EUR (by hand).
    expect(sheet).toContain("180.00");
  });

  it("drafts an order from an open low-stock alert through the alerts page's Order button", async () => {
    const { name, supplierId } = await setting();
    // A part with reorder point 10 and reorder quantity 20, quoted by the supplier.
    const sku = uniqueCode("LOW");
    const made = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku,
        name: "Shaft circlip",
        unit: "pcs",
        reorderPoint: 10,
        reorderQuantity: 20,
      },
      buyer,
    );
    expect(made.status, await made.clone().text()).toBe(201);
    const itemId = (
      await rows<{ id: number }>("SELECT id FROM items WHERE sku = ?", [sku])
    )[0]!.id;
    await testDatabase().query(
      `INSERT INTO price_lines (supplier_id, item_id, supplier_sku, currency, unit_price, min_quantity, valid_from, line)
       VALUES (?, ?, 'CL-10', 'EUR', 0.2, 1, '2026-01-01', 1)`,
      [supplierId, itemId],
    );
    const location = await createLocation(uniqueCode("PO"));
    for (const body of [
      { type: "receipt", quantity: 15, unitCost: 0.2 },
      { type: "issue", quantity: 6 },
    ]) {
      const moved = await sendJson(
        "POST",
        "/api/v1/stock-movements",
        { location, sku, ...body },
        storekeeper,
      );
      expect(moved.status, await moved.clone().text()).toBe(201);
    }
    const [alert] = await rows<{ id: number }>(
      "SELECT id FROM stock_alerts WHERE item_id = ? AND closed_at IS NULL",
      [itemId],
    );
    expect(alert).toBeDefined();

    // Buyers see the button on the open alert; builders do not.
    expect(await (await get("/alerts", buyer)).text()).toContain(
      `aria-label="Order ${sku}"`,
    );
    expect(await (await get("/alerts", builder)).text()).not.toContain(
      `aria-label="Order ${sku}"`,
    );

    const response = await postForm(
      "/purchase-orders/new",
      { intent: "from-alert", alertId: String(alert!.id) },
      buyer,
    );
    expect(response.status).toBe(302);
    const page = await (await followRedirect(response, buyer)).text();
    expect(page).toContain(`drafted for ${name} from the low-stock alert`);
    // Available 15 − 6 = 9, 1 below the reorder point of 10: the reorder quantity, 20, is larger (by hand).
    expect(
      await rows<{ quantity: string; status: string }>(
        `SELECT l.quantity, o.status FROM purchase_order_lines l
         JOIN purchase_orders o ON o.id = l.order_id WHERE l.item_id = ?`,
        [itemId],
      ),
    ).toEqual([{ quantity: "20.000", status: "draft" }]);
  });

  it("refuses an order from an alert that is not there, writing nothing", async () => {
    const before = await rows<{ n: number }>(
      "SELECT COUNT(*) AS n FROM purchase_orders",
      [],
    );
    const response = await postForm(
      "/purchase-orders/new",
      { intent: "from-alert", alertId: "999999999" },
      buyer,
    );
    expect(response.status).toBeGreaterThanOrEqual(400);
    expect(response.status).toBeLessThan(500);
    const after = await rows<{ n: number }>(
      "SELECT COUNT(*) AS n FROM purchase_orders",
      [],
    );
    expect(Number(after[0]!.n)).toBe(Number(before[0]!.n));
    const byBuilder = await postForm(
      "/purchase-orders/new",
      { intent: "from-alert", alertId: "1" },
      builder,
    );
    expect(byBuilder.status).toBe(403);
  });
});
