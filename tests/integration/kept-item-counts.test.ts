/**
 * The stock list's total without a search comes from item_counts, kept by
 * triggers on items (decision 050-kept-item-counts). After every kind of change
 * to an item — created, archived, restored, moved across its reorder point by
 * movements, its reorder point changed, its kind changed by hand in SQL, deleted —
 * the list's totals (items API and the page's loader) equal COUNT(*) over items,
 * and the kept rows equal a fresh recount.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { formatQuantity } from "~/lib/format";
import { get, sendJson, signInAs } from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let storekeeper = "";
let store = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  store = await createLocation(uniqueCode("KC"));
});
afterAll(closeTestDatabase);

/** The list's filters, each with the WHERE that counts the same items in SQL. */
const filterSets: { query: string; where: string }[] = [
  { query: "", where: "active = 1" },
  { query: "archived=1", where: "TRUE" },
  { query: "kind=part", where: "active = 1 AND kind = 'part'" },
  { query: "kind=magnet", where: "active = 1 AND kind = 'magnet'" },
  { query: "belowReorder=1", where: "active = 1 AND below_reorder = 1" },
  {
    query: "kind=part&belowReorder=1",
    where: "active = 1 AND kind = 'part' AND below_reorder = 1",
  },
  {
    query: "kind=part&belowReorder=1&archived=1",
    where: "kind = 'part' AND below_reorder = 1",
  },
];

async function countedInSql(where: string): Promise<number> {
  const [rows] = await testDatabase().query(
    `SELECT COUNT(*) AS total FROM items WHERE ${where}`,
  );
  return Number((rows as { total: number }[])[0]!.total);
}

async function apiTotal(query: string): Promise<number> {
  const response = await get(`/api/v1/items?pageSize=1&${query}`, buyer);
  expect(response.status).toBe(200);
  return ((await response.json()) as { total: number }).total;
}

/** A page's HTML as searchable text (React's markers and non-breaking spaces made plain). */
async function pageText(path: string): Promise<string> {
  const response = await get(path, buyer);
  expect(response.status).toBe(200);
  return (await response.text())
    .replace(/<!-- -->/g, "")
    .replace(/\u00a0/g, " ");
}

/** Every filter's total equals COUNT(*), and the kept rows equal a recount of items. */
async function expectTotalsExact(step: string) {
  for (const { query, where } of filterSets) {
    expect(await apiTotal(query), `${step}: ?${query}`).toBe(
      await countedInSql(where),
    );
  }
  const [kept] = await testDatabase().query(
    `SELECT active, kind, below_reorder, items FROM item_counts WHERE items <> 0
     ORDER BY active, kind, below_reorder`,
  );
  const [recounted] = await testDatabase().query(
    `SELECT active, kind, below_reorder, COUNT(*) AS items FROM items
     GROUP BY active, kind, below_reorder ORDER BY active, kind, below_reorder`,
  );
  expect(kept, `${step}: kept rows`).toEqual(
    (recounted as Record<string, unknown>[]).map((row) => ({
      ...row,
      items: Number(row.items),
    })),
  );
}

async function patchItem(sku: string, change: Record<string, unknown>) {
  const response = await sendJson(
    "PATCH",
    `/api/v1/items/${sku}`,
    change,
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(200);
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

describe("kept item counts", () => {
  it("keep the list's totals exact through every change to an item", async () => {
    await expectTotalsExact("before");
    const sku = uniqueCode("KC-PART");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      {
        kind: "part",
        sku,
        name: "Slot wedge, glass laminate",
        unit: "pcs",
        reorderPoint: 10,
        reorderQuantity: 20,
      },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    // New, with nothing on hand against a reorder point of 10: below it.
    await expectTotalsExact("created");
    const belowBefore = await apiTotal("kind=part&belowReorder=1");

    await move({
      type: "receipt",
      sku,
      location: store,
      quantity: 25,
      unitCost: 1.5,
    });
    await expectTotalsExact("received above the reorder point");
    expect(await apiTotal("kind=part&belowReorder=1")).toBe(belowBefore - 1);

    await move({ type: "issue", sku, location: store, quantity: 20 });
    await expectTotalsExact("issued below the reorder point");
    expect(await apiTotal("kind=part&belowReorder=1")).toBe(belowBefore);

    // A movement that stays below the reorder point changes no kept row.
    await move({ type: "issue", sku, location: store, quantity: 1 });
    await expectTotalsExact("issued, still below");

    await patchItem(sku, { reorderPoint: 2 });
    await expectTotalsExact("reorder point lowered under the stock");
    expect(await apiTotal("kind=part&belowReorder=1")).toBe(belowBefore - 1);

    const activeBefore = await apiTotal("");
    const allBefore = await apiTotal("archived=1");
    await patchItem(sku, { active: false });
    await expectTotalsExact("archived");
    expect(await apiTotal("")).toBe(activeBefore - 1);
    expect(await apiTotal("archived=1")).toBe(allBefore);

    await patchItem(sku, { active: true });
    await expectTotalsExact("restored");
    expect(await apiTotal("")).toBe(activeBefore);

    // The app has no way to change an item's kind; the triggers keep any writer's change.
    await testDatabase().query(
      "UPDATE items SET kind = 'magnet' WHERE sku = ?",
      [sku],
    );
    await expectTotalsExact("kind changed in SQL");
    await testDatabase().query(
      "UPDATE items SET kind = 'part', reorder_point = 100 WHERE sku = ?",
      [sku],
    );
    await expectTotalsExact("kind and reorder point changed together");

    // The stock page says the same total.
    const below = await countedInSql(filterSets[5]!.where);
    expect(below).toBeGreaterThan(0);
    expect(await pageText("/stock?kind=part&belowReorder=1")).toContain(
      `${formatQuantity(below, below === 1 ? "item" : "items").replace(/\u00a0/g, " ")} · showing`,
    );
  });

  it("counts an item inserted and deleted in SQL", async () => {
    const sku = uniqueCode("KC-SQL");
    await testDatabase().query(
      `INSERT INTO items (sku, name, kind, unit, reorder_point, created_at, updated_at)
       VALUES (?, 'Phase insulation paper', 'part', 'pcs', 5, NOW(), NOW())`,
      [sku],
    );
    await expectTotalsExact("inserted in SQL");
    await testDatabase().query("DELETE FROM items WHERE sku = ?", [sku]);
    await expectTotalsExact("deleted in SQL");
  });

  it("keeps counting a search's own matches", async () => {
    const sku = uniqueCode("KC-FIND");
    const created = await sendJson(
      "POST",
      "/api/v1/items",
      { kind: "part", sku, name: "End lamination", unit: "pcs" },
      buyer,
    );
    expect(created.status).toBe(201);
    expect(await apiTotal(`search=${sku}`)).toBe(1);
    expect(await apiTotal(`search=${sku}&kind=magnet`)).toBe(0);
  });
});
