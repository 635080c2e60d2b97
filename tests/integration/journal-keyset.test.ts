/**
 * The movement journal paged by cursor (keyset): the API's nextCursor and previousCursor
 * and the page's Older and Newer links give exactly the rows that paging by number does,
 * in the journal's order (time, then id, newest first), ties at one millisecond included;
 * a cursor no answer gave is refused by the API and set aside by the page.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { stockMovements } from "~/db/schema";
import { get, signInAs } from "../support/app-client";
import { createPartItem, receive } from "../support/build-order-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let manager = "";
let sku = "";
/** Every movement of the item, in the journal's order. */
let journalOrder: number[] = [];
const movementCount = 57;

interface JournalPage {
  movements: { id: number }[];
  page: number;
  hasMore: boolean;
  nextCursor: string | null;
  previousCursor: string | null;
}

async function apiPage(query: string): Promise<JournalPage> {
  const response = await get(
    `/api/v1/stock-movements?sku=${sku}&pageSize=10&${query}`,
    manager,
  );
  expect(response.status, await response.clone().text()).toBe(200);
  return (await response.json()) as JournalPage;
}

const idsOf = (page: JournalPage) => page.movements.map((row) => row.id);

/** The table of a journal page's HTML, and its page links. */
async function journalHtml(path: string) {
  const response = await get(path, manager);
  expect(response.status).toBe(200);
  const html = await response.text();
  const table = html.slice(html.indexOf("<tbody"), html.indexOf("</tbody>"));
  const link = (label: "Newer" | "Older") =>
    [...html.matchAll(/<a[^>]*href="([^"]+)"[^>]*>(Newer|Older)<\/a>/g)]
      .find((match) => match[2] === label)?.[1]
      ?.replaceAll("&amp;", "&");
  return { html, table, older: link("Older"), newer: link("Newer") };
}

beforeAll(async () => {
  manager = await signInAs("manager");
  const buyer = await signInAs("buyer");
  const storekeeper = await signInAs("storekeeper");
  const location = await createLocation(uniqueCode("KS"));
  const item = await createPartItem(buyer);
  sku = item.sku;
  for (let index = 0; index < movementCount; index += 1)
    await receive(storekeeper, { sku, location, quantity: 1, unitCost: 2 });
  const rows = await testDb()
    .select({ id: stockMovements.id })
    .from(stockMovements)
    .where(eq(stockMovements.itemId, item.id))
    .orderBy(stockMovements.id);
  // Three movements share each millisecond, so pages end inside a tie: the id decides. In the
  // past, so they neither top other tests' newest-first journals nor fall in their future dates.
  const start = Date.parse("2021-05-01T10:00:00.000Z");
  for (const [index, row] of rows.entries())
    await testDb()
      .update(stockMovements)
      .set({ createdAt: new Date(start + Math.floor(index / 3)) })
      .where(eq(stockMovements.id, row.id));
  journalOrder = rows.map((row) => row.id).reverse();
});

afterAll(closeTestDatabase);

describe("the journal API by cursor", () => {
  it("walks to the end with nextCursor, page by page as paging by number does", async () => {
    const walked: number[] = [];
    let page = await apiPage("");
    expect(page.previousCursor).toBeNull();
    for (let number = 1; ; number += 1) {
      const byNumber = await apiPage(`page=${number}`);
      expect(idsOf(page)).toEqual(idsOf(byNumber));
      expect(page.hasMore).toBe(byNumber.hasMore);
      walked.push(...idsOf(page));
      if (!page.nextCursor) break;
      expect(page.hasMore).toBe(true);
      const next = await apiPage(`page=${number + 1}&after=${page.nextCursor}`);
      expect(next.page).toBe(number + 1);
      expect(next.previousCursor).not.toBeNull();
      page = next;
    }
    expect(walked).toEqual(journalOrder);
    expect(page.hasMore).toBe(false);
  });

  it("walks back to the start with previousCursor", async () => {
    const pages = Math.ceil(movementCount / 10);
    let page = await apiPage(`page=${pages}`);
    for (let number = pages - 1; number >= 1; number -= 1) {
      const previous = await apiPage(
        `page=${number}&before=${page.previousCursor}`,
      );
      expect(idsOf(previous)).toEqual(idsOf(await apiPage(`page=${number}`)));
      expect(previous.hasMore).toBe(true);
      expect(previous.nextCursor).not.toBeNull();
      page = previous;
    }
    expect(page.previousCursor).toBeNull();
  });

  it("refuses a cursor no answer gave with 400 naming it", async () => {
    const response = await get(
      `/api/v1/stock-movements?sku=${sku}&after=page-2`,
      manager,
    );
    expect(response.status).toBe(400);
    const answer = (await response.json()) as {
      error: { fields?: Record<string, string[]> };
    };
    expect(answer.error.fields?.after?.[0]).toMatch(/^after must be a cursor/);
  });
});

describe("the journal page by cursor", () => {
  it("links Older and Newer by cursor, showing what the numbered pages show", async () => {
    const first = await journalHtml(`/stock/journal?sku=${sku}`);
    expect(first.newer).toBeUndefined();
    expect(first.older).toMatch(
      new RegExp(`^/stock/journal\\?sku=${sku}&page=2&after=\\d+-\\d+$`),
    );
    const second = await journalHtml(first.older!);
    expect(second.html).toMatch(/Page (<!-- -->)?2</);
    expect(second.older).toBeUndefined(); // 57 movements: two pages of 50
    expect(second.table).toEqual(
      (await journalHtml(`/stock/journal?sku=${sku}&page=2`)).table,
    );
    // Back to the first page: the plain address, newest first.
    expect(second.newer).toBe(`/stock/journal?sku=${sku}`);
  });

  it("sets aside a cursor it cannot read and says so", async () => {
    const page = await journalHtml(`/stock/journal?sku=${sku}&after=nonsense`);
    expect(page.html).toContain("after");
    expect(page.table).toEqual(
      (await journalHtml(`/stock/journal?sku=${sku}`)).table,
    );
  });
});
