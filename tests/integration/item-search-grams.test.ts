/**
 * The stock list's trigram search (decision 057-trigram-search). The postings in
 * item_search_grams are kept by triggers on items: after every kind of change — created
 * through the API, renamed (name through the API; SKU and size in SQL), archived and
 * restored, stock moved, deleted in SQL — they equal the postings made afresh from items.
 * Searches through the items API give exactly the rows the plain `search_text LIKE` gives,
 * in the same order, for short and long terms, % and _, non-ASCII letters and mixed case,
 * with every filter and sort; a search counts its matches only up to 1,000 past the page's
 * first row, and says so (`totalExact`, "More than …" and a pager that goes on).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { containsPattern } from "~/lib/list-filters";
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
/** What this file's items have in common (and no other test's). */
let token = "";

beforeAll(async () => {
  buyer = await signInAs("buyer");
  storekeeper = await signInAs("storekeeper");
  store = await createLocation(uniqueCode("SG"));
  token = uniqueCode("Sg")
    .toLowerCase()
    .replace(/[^a-z0-9]/g, "");
});
afterAll(closeTestDatabase);

async function query<Row>(statement: string, values: unknown[] = []) {
  const [rows] = await testDatabase().query(statement, values);
  return rows as Row[];
}

/** Postings that differ from those made afresh from items (the migration's backfill), both ways. */
async function expectPostingsKept(step: string) {
  // One statement: one consistent view of items and postings, whatever other tests write.
  const [difference] = await query<{ missing: number; extra: number }>(
    `WITH RECURSIVE positions (position) AS (
       SELECT 1 UNION ALL SELECT position + 1 FROM positions WHERE position < 298),
     fresh AS (
       SELECT DISTINCT SUBSTRING(items.search_text, positions.position, 3) AS gram, items.sku, items.id AS item_id, items.active
       FROM items JOIN positions ON positions.position <= CHAR_LENGTH(items.search_text) - 2),
     kept AS (SELECT gram, sku, item_id, active FROM item_search_grams)
     SELECT (SELECT COUNT(*) FROM (SELECT * FROM fresh EXCEPT SELECT * FROM kept) AS d) AS missing,
            (SELECT COUNT(*) FROM (SELECT * FROM kept EXCEPT SELECT * FROM fresh) AS d) AS extra`,
  );
  expect(
    {
      missing: Number(difference!.missing),
      extra: Number(difference!.extra),
    },
    step,
  ).toEqual({ missing: 0, extra: 0 });
}

async function createPart(sku: string, name: string) {
  const response = await sendJson(
    "POST",
    "/api/v1/items",
    { kind: "part", sku, name, unit: "pcs", reorderPoint: 0 },
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(201);
}

async function patchItem(sku: string, body: Record<string, unknown>) {
  const response = await sendJson(
    "PATCH",
    `/api/v1/items/${encodeURIComponent(sku)}`,
    body,
    buyer,
  );
  expect(response.status, await response.clone().text()).toBe(200);
}

interface ApiPage {
  items: { sku: string }[];
  total: number;
  totalExact: boolean;
}

async function apiPage(params: string): Promise<ApiPage> {
  const response = await get(`/api/v1/items?${params}`, buyer);
  expect(response.status, params).toBe(200);
  return (await response.json()) as ApiPage;
}

describe("postings kept by triggers", () => {
  it("follow inserts, renames, archive and restore, movements and deletes", async () => {
    const sku = `SG-${token}`.toUpperCase();
    await createPart(sku, `Spacer ${token} Ölring`);
    await expectPostingsKept("created through the API");
    const [created] = await query<{ grams: number }>(
      "SELECT COUNT(*) AS grams FROM item_search_grams g JOIN items i ON i.id = g.item_id WHERE i.sku = ?",
      [sku],
    );
    expect(Number(created!.grams)).toBeGreaterThan(10);

    await patchItem(sku, { name: `Washer ${token} ẞtahl` });
    await expectPostingsKept("name changed through the API");
    expect((await apiPage(`search=washer ${token}`)).items).toEqual([
      expect.objectContaining({ sku }),
    ]);
    expect((await apiPage(`search=spacer ${token}`)).items).toEqual([]);

    await query("UPDATE items SET size_or_grade = ? WHERE sku = ?", [
      "M8 × 1.25",
      sku,
    ]);
    await expectPostingsKept("size changed in SQL");
    expect((await apiPage(`search=m8 × 1.2&archived=1`)).items).toContainEqual(
      expect.objectContaining({ sku }),
    );

    const renamed = `${sku}-B`;
    await query("UPDATE items SET sku = ? WHERE sku = ?", [renamed, sku]);
    await expectPostingsKept("SKU changed in SQL");
    expect((await apiPage(`search=${token}-b`)).items).toEqual([
      expect.objectContaining({ sku: renamed }),
    ]);

    // Only the SKU's case: search_text stays, the postings must still carry the new SKU.
    const recased = renamed.toLowerCase();
    await query("UPDATE items SET sku = ? WHERE sku = ?", [recased, renamed]);
    await expectPostingsKept("SKU's case changed in SQL");

    await patchItem(recased, { active: false });
    await expectPostingsKept("archived");
    expect((await apiPage(`search=${token}`)).items).toEqual([]);
    expect((await apiPage(`search=${token}&archived=1`)).items).toEqual([
      expect.objectContaining({ sku: recased, active: false }),
    ]);
    await patchItem(recased, { active: true });
    await expectPostingsKept("restored");
    expect((await apiPage(`search=${token}`)).items).toEqual([
      expect.objectContaining({ sku: recased }),
    ]);

    const receipt = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      {
        type: "receipt",
        sku: recased,
        location: store,
        quantity: 5,
        unitCost: 2,
      },
      storekeeper,
    );
    expect(receipt.status, await receipt.clone().text()).toBe(201);
    await expectPostingsKept("stock received");

    await query(
      "INSERT INTO items (sku, name, kind, unit, created_at, updated_at) VALUES (?, ?, 'part', 'pcs', NOW(3), NOW(3))",
      [`SG-${token}-SQL`, "Written in SQL"],
    );
    await expectPostingsKept("inserted in SQL");
    await query("DELETE FROM items WHERE sku = ?", [`SG-${token}-SQL`]);
    await expectPostingsKept("deleted in SQL");
    const [left] = await query<{ n: number }>(
      "SELECT COUNT(*) AS n FROM item_search_grams WHERE sku = ?",
      [`SG-${token}-SQL`],
    );
    expect(Number(left!.n)).toBe(0);
  });
});

describe("searches", () => {
  /** Items whose texts hold what a search must treat literally: %, _, \, non-ASCII, mixed case. */
  const names = [
    "Coil former 100% nylon",
    "Coil former 10_0 nylon",
    "Bobbin Ø12 Übergröße",
    "Bobbin ø12 übergröße spare",
    "Back\\slash clip",
    "Stator lamination 0.35 mm",
    "STATOR LAMINATION 0.5 MM",
    "Sleeve ÉMAIL grade",
  ];
  let skus: string[] = [];

  beforeAll(async () => {
    skus = [];
    for (const [index, name] of names.entries()) {
      const sku = `SQ-${token}-${index}`;
      await createPart(sku, `${name} ${token}`);
      skus.push(sku);
    }
    // One archived, one below its reorder point, one a wire (kind filter).
    await query("UPDATE items SET active = 0 WHERE sku = ?", [skus[1]]);
    await query("UPDATE items SET reorder_point = 5 WHERE sku IN (?, ?)", [
      skus[2],
      skus[5],
    ]);
    await query("UPDATE items SET kind = 'wire' WHERE sku = ?", [skus[6]]);
  });

  /** The SKUs the plain LIKE finds, in the list's order for that query. */
  async function likeSkus(search: string, filters: URLSearchParams) {
    const where = ["search_text LIKE ?"];
    if (filters.get("archived") !== "1") where.push("active = 1");
    if (filters.get("kind")) where.push(`kind = '${filters.get("kind")}'`);
    if (filters.get("belowReorder") === "1") where.push("below_reorder = 1");
    const direction = filters.get("order") === "desc" ? "DESC" : "ASC";
    const order =
      filters.get("sort") === "name"
        ? `name ${direction}, id ${direction}`
        : `sku ${direction}`;
    const rows = await query<{ sku: string }>(
      `SELECT sku FROM items WHERE ${where.join(" AND ")} ORDER BY ${order}`,
      [containsPattern(search.trim().toLowerCase())],
    );
    return rows.map((row) => row.sku);
  }

  const terms = [
    "c",
    "ø",
    "12",
    "%",
    "_",
    "0%",
    "100%",
    "10_0",
    "0_",
    "\\s",
    "back\\slash",
    "ÜBERGRÖSSE",
    "übergröße",
    "Ø12 Ü",
    "STATOR lam",
    "0.5",
    "Émail",
    "émail grade",
    "zzq",
    "former 1",
  ];
  const filterSets = [
    "",
    "archived=1",
    "kind=part",
    "belowReorder=1",
    "order=desc",
    "archived=1&order=desc",
    "sort=name",
    "kind=wire&archived=1",
  ];

  it("give exactly the rows of the plain LIKE, with every filter and sort", async () => {
    for (const term of [...terms, token, `${token.slice(0, 5)}`]) {
      for (const filters of filterSets) {
        const params = new URLSearchParams(filters);
        params.set("search", term);
        params.set("pageSize", "500");
        const page = await apiPage(params.toString());
        const expected = await likeSkus(term, params);
        expect(
          page.items.map((item) => item.sku),
          `${term} ${filters}`,
        ).toEqual(expected.slice(0, 500));
        if (expected.length <= 500) {
          expect(page.total, `${term} ${filters}`).toBe(expected.length);
          expect(page.totalExact).toBe(true);
        }
      }
    }
    // The terms above find this file's items, not only others'.
    expect((await apiPage(`search=100%25 nylon ${token}`)).items).toEqual([
      expect.objectContaining({ sku: skus[0] }),
    ]);
    expect((await apiPage(`search=übergröße ${token}`)).items).toEqual([
      expect.objectContaining({ sku: skus[2] }),
    ]);
  });

  it("page through a search as the LIKE pages it", async () => {
    const term = "sq-";
    const expected = await likeSkus(term, new URLSearchParams());
    const seen: string[] = [];
    for (let page = 1; page <= Math.ceil(expected.length / 3); page += 1) {
      const answer = await apiPage(`search=${term}&pageSize=3&page=${page}`);
      seen.push(...answer.items.map((item) => item.sku));
    }
    expect(seen).toEqual(expected);
  });
});

describe("capped counts", () => {
  const matching = 1_100;
  let word = "";

  beforeAll(async () => {
    word = `cap${token}`;
    await query(
      `INSERT INTO items (sku, name, kind, unit, created_at, updated_at)
       SELECT CONCAT('SC-', ?, '-', LPAD(seq, 4, '0')), CONCAT('Capped ', ?), 'part', 'pcs', NOW(3), NOW(3)
       FROM seq_1_to_${matching}`,
      [token, word],
    );
  });

  it("count a search only up to 1,000 past the page's first row", async () => {
    const first = await apiPage(`search=${word}`);
    expect(first).toMatchObject({ total: 1_000, totalExact: false });
    expect(first.items).toHaveLength(50);
    expect(first.items[0]!.sku).toBe(`SC-${token}-0001`);

    const second = await apiPage(`search=${word}&page=2`);
    expect(second).toMatchObject({ total: 1_050, totalExact: false });
    // From page 3 the count reaches the end: exact again.
    const third = await apiPage(`search=${word}&page=3`);
    expect(third).toMatchObject({ total: matching, totalExact: true });
    // A two-character term counts on the search index, with the same reach.
    expect(await apiPage("search=ca&pageSize=1")).toMatchObject({
      total: 1_000,
      totalExact: false,
    });
    // Without a search the total is exact, always.
    expect((await apiPage("")).totalExact).toBe(true);
  });

  it("let the stock list go on while pages come back full", async () => {
    const text = async (path: string) => {
      const response = await get(path, buyer);
      expect(response.status, path).toBe(200);
      return (await response.text())
        .replace(/<!-- -->/g, "")
        .replace(/\u00a0/g, " ");
    };
    const first = await text(`/stock?search=${word}`);
    expect(first).toContain("More than 1,000 items · showing 1–50");
    expect(first).toContain("Page 1 of at least 21");
    expect(first).toContain(`href="/stock?search=${word}&amp;page=2"`);
    const second = await text(`/stock?search=${word}&page=2`);
    expect(second).toContain("More than 1,050 items · showing 51–100");
    expect(second).toContain("Page 2 of at least 22");
    expect(second).toContain(`href="/stock?search=${word}&amp;page=3"`);
    // Once the count reaches the end it is exact again, and so is the pager.
    const third = await text(`/stock?search=${word}&page=3`);
    expect(third).toContain("1,100 items · showing 101–150");
    expect(third).toContain("Page 3 of 22");
    const last = await text(`/stock?search=${word}&page=22`);
    expect(last).toContain("1,100 items · showing 1,051–1,100");
    expect(last).toContain("Page 22 of 22");
    // Past the real end: the last page, as before.
    const past = await get(`/stock?search=${word}&page=40`, buyer);
    expect(past.status).toBe(302);
    expect(past.headers.get("location")).toBe(`/stock?search=${word}&page=22`);
  });

  it("leave the CSV export its exact count and its own row limit", async () => {
    const response = await get(`/stock/export.csv?search=${word}`, buyer);
    expect(response.status).toBe(200);
    expect(response.headers.get("x-total-count")).toBe(String(matching));
    const lines = (await response.text()).trim().split(/\r?\n/);
    expect(lines).toHaveLength(matching + 1);
  });
});
