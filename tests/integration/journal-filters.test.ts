/**
 * The movement journal's filters (item, lot, reference, person, type, a range of days)
 * on the page, the API and the CSV export, each alone and together, with the day range's
 * bounds at the millisecond; and the build-order list's CSV export with its search.
 * Days are UTC (dayRangeBounds).
 */
import { eq, inArray } from "drizzle-orm";
import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { stockMovements } from "~/db/schema";
import {
  get,
  newPerson,
  sendJson,
  signIn,
  signInAs,
} from "../support/app-client";
import { createPartItem, receive } from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  testDb,
  uniqueCode,
} from "../support/test-database";

let manager = "";
let builder = "";
let alma = { email: "", name: "" };
let bruno = { email: "", name: "" };
let itemA = { sku: "", id: 0 };
let itemB = { sku: "", id: 0 };
let shared = "";
let other = "";
let reference = "";
/** Movement ids by name, each at its own moment around 1 and 2 March 2031 (UTC). */
const moved: Record<string, number> = {};

const moments = {
  beforeFrom: "2031-02-28T23:59:59.999Z",
  fromStart: "2031-03-01T00:00:00.000Z",
  toEnd: "2031-03-02T23:59:59.999Z",
  afterTo: "2031-03-03T00:00:00.000Z",
} as const;

/** The ids the API's journal lists for a query string (one page of 500). */
async function journalIds(query: string): Promise<number[]> {
  const response = await get(
    `/api/v1/stock-movements?pageSize=500&${query}`,
    manager,
  );
  expect(response.status, await response.clone().text()).toBe(200);
  const answer = (await response.json()) as { movements: { id: number }[] };
  return answer.movements.map((movement) => movement.id).sort((a, b) => a - b);
}

const ids = (...names: string[]) =>
  names.map((name) => moved[name]!).sort((a, b) => a - b);

/** The rows of a CSV answer; it starts with the UTF-8 byte-order mark (which text() drops). */
async function parseCsv(response: Response) {
  const bytes = new Uint8Array(await response.arrayBuffer());
  expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
  const text = new TextDecoder("utf-8", { ignoreBOM: true }).decode(bytes);
  return Papa.parse<string[]>(text.slice(1).trimEnd(), { newline: "\r\n" })
    .data;
}

beforeAll(async () => {
  manager = await signInAs("manager");
  builder = await signInAs("builder");
  const buyer = await signInAs("buyer");
  const code = uniqueCode("J");
  const almaPerson = await newPerson(
    "storekeeper",
    `Alma Journalfilter ${code}`,
  );
  const brunoPerson = await newPerson(
    "storekeeper",
    `Bruno Journalfilter ${code}`,
  );
  alma = almaPerson;
  bruno = brunoPerson;
  const almaCookie = await signIn(alma.email, almaPerson.password);
  const brunoCookie = await signIn(bruno.email, brunoPerson.password);
  const rack = await createLocation(uniqueCode("JR"));
  itemA = await createPartItem(buyer);
  itemB = await createPartItem(buyer);
  shared = uniqueCode("LOT");
  other = uniqueCode("LOT");
  reference = uniqueCode("DN");
  const plan: [string, string, Record<string, unknown>, string][] = [
    // name, who, receipt, moment
    [
      "aSharedAlma",
      almaCookie,
      { sku: itemA.sku, lot: shared, reference },
      moments.beforeFrom,
    ],
    [
      "aSharedBruno",
      brunoCookie,
      { sku: itemA.sku, lot: shared },
      moments.fromStart,
    ],
    [
      "aOtherAlma",
      almaCookie,
      { sku: itemA.sku, lot: other, reference },
      moments.toEnd,
    ],
    [
      "bSharedBruno",
      brunoCookie,
      { sku: itemB.sku, lot: shared, reference },
      moments.afterTo,
    ],
  ];
  for (const [name, cookie, body, moment] of plan) {
    await receive(cookie, {
      location: rack,
      quantity: 2,
      unitCost: 1.5,
      ...body,
    });
    const [last] = await testDb()
      .select({ id: stockMovements.id })
      .from(stockMovements)
      .where(inArray(stockMovements.itemId, [itemA.id, itemB.id]))
      .orderBy(stockMovements.id)
      .then((rows) => rows.slice(-1));
    moved[name] = last!.id;
    // The fixture dates each receipt; the journal's filters read created_at.
    await testDb()
      .update(stockMovements)
      .set({ createdAt: new Date(moment) })
      .where(eq(stockMovements.id, last!.id));
  }
});

afterAll(closeTestDatabase);

describe("the journal's filters", () => {
  it("by item SKU", async () => {
    expect(await journalIds(`sku=${itemA.sku}`)).toEqual(
      ids("aSharedAlma", "aSharedBruno", "aOtherAlma"),
    );
    expect(await journalIds(`sku=${itemB.sku}`)).toEqual(ids("bSharedBruno"));
    expect(await journalIds(`sku=NO-SUCH-${shared}`)).toEqual([]);
  });

  it("by lot, across items and within one", async () => {
    expect(await journalIds(`lot=${shared}`)).toEqual(
      ids("aSharedAlma", "aSharedBruno", "bSharedBruno"),
    );
    expect(await journalIds(`lot=${shared}&sku=${itemB.sku}`)).toEqual(
      ids("bSharedBruno"),
    );
    expect(await journalIds(`lot=NOPE-${shared}`)).toEqual([]);
  });

  it("by reference, exactly", async () => {
    expect(await journalIds(`reference=${reference}`)).toEqual(
      ids("aSharedAlma", "aOtherAlma", "bSharedBruno"),
    );
    expect(await journalIds(`reference=${reference.slice(0, -1)}`)).toEqual([]);
  });

  it("by person: e-mail, or part of the name", async () => {
    expect(await journalIds(`user=${encodeURIComponent(alma.email)}`)).toEqual(
      ids("aSharedAlma", "aOtherAlma"),
    );
    expect(await journalIds(`user=${encodeURIComponent(bruno.name)}`)).toEqual(
      ids("aSharedBruno", "bSharedBruno"),
    );
    expect(await journalIds(`user=Journalfilter&sku=${itemA.sku}`)).toEqual(
      ids("aSharedAlma", "aSharedBruno", "aOtherAlma"),
    );
  });

  it("by type", async () => {
    expect(await journalIds(`type=receipt&sku=${itemA.sku}`)).toEqual(
      ids("aSharedAlma", "aSharedBruno", "aOtherAlma"),
    );
    expect(await journalIds(`type=scrap&sku=${itemA.sku}`)).toEqual([]);
  });

  it("by a range of UTC days: from 00:00 of the first to the end of the last, both kept", async () => {
    expect(await journalIds("from=2031-03-01&to=2031-03-02")).toEqual(
      ids("aSharedBruno", "aOtherAlma"),
    );
    // One millisecond before the first day, one at the start of the day after the last.
    expect(await journalIds("from=2031-02-28&to=2031-02-28")).toEqual(
      ids("aSharedAlma"),
    );
    expect(await journalIds("from=2031-03-03")).toEqual(ids("bSharedBruno"));
    expect(await journalIds(`to=2031-02-28&sku=${itemA.sku}`)).toEqual(
      ids("aSharedAlma"),
    );
  });

  it("all together", async () => {
    expect(
      await journalIds(
        `sku=${itemA.sku}&lot=${shared}&user=Alma&reference=${reference}&type=receipt&from=2031-02-28&to=2031-03-02`,
      ),
    ).toEqual(ids("aSharedAlma"));
    expect(
      await journalIds(
        `sku=${itemA.sku}&lot=${shared}&user=Alma&from=2031-03-01&to=2031-03-02`,
      ),
    ).toEqual([]);
  });

  it("on the page: the filtered rows, the CSV link carrying the filters, and the no-results state", async () => {
    const page = await get(
      `/stock/journal?lot=${shared}&sku=${itemB.sku}`,
      manager,
    );
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(itemB.sku);
    expect(html).not.toContain(`>${itemA.sku}<`);
    expect(html).toContain(
      `href="/stock/journal.csv?sku=${itemB.sku}&amp;lot=${shared}"`,
    );
    const none = await (
      await get(`/stock/journal?lot=NOPE-${shared}`, manager)
    ).text();
    expect(none).toContain("No results for this search");
    expect(none).toContain("Clear the search and filters");
  });
});

describe("the journal's CSV export", () => {
  it("holds the filtered movements, machine-neutral, newest first", async () => {
    const response = await get(
      `/stock/journal.csv?lot=${shared}&from=2031-02-28&to=2031-03-02`,
      manager,
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toBe(
      "text/csv; charset=utf-8",
    );
    expect(response.headers.get("content-disposition")).toMatch(
      /^attachment; filename="turnledger-journal-\d{4}-\d{2}-\d{2}\.csv"$/,
    );
    expect(response.headers.get("cache-control")).toBe("no-store");
    const [header, ...rows] = await parseCsv(response);
    expect(header).toEqual([
      "movement",
      "time (UTC)",
      "type",
      "sku",
      "item",
      "lot",
      "location",
      "change",
      "unit",
      "item on hand after",
      "unit cost (company currency)",
      "counted",
      "gross kg",
      "reference",
      "purchase order id",
      "note",
      "by",
    ]);
    expect(rows.map((row) => Number(row[0]))).toEqual([
      moved.aSharedBruno,
      moved.aSharedAlma,
    ]);
    const [first, second] = rows as [string[], string[]];
    expect(first[1]).toBe(moments.fromStart);
    expect(second[1]).toBe(moments.beforeFrom);
    expect(first.slice(2, 4)).toEqual(["receipt", itemA.sku]);
    expect(first[5]).toBe(shared);
    expect(first[7]).toBe("2");
    expect(first[8]).toBe("pcs");
    expect(first[10]).toBe("1.5");
    expect(second[13]).toBe(reference);
    expect(first[16]).toBe(bruno.name);
  });

  it("streams every row past one batch (more than a page of the list)", async () => {
    const response = await get(`/stock/journal.csv?sku=${itemA.sku}`, manager);
    const rows = (await parseCsv(response)).slice(1);
    expect(rows).toHaveLength(3);
  });

  it("refuses filters it cannot read with 400, and someone signed out", async () => {
    const bad = await get("/stock/journal.csv?from=2031-02-30", manager);
    expect(bad.status).toBe(400);
    expect(await bad.text()).toContain(
      "from must be a day written YYYY-MM-DD.",
    );
    const anonymous = await get(`/stock/journal.csv?sku=${itemA.sku}`);
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get("location")).toMatch(/^\/sign-in/);
  });
});

describe("the build-order list's CSV export", () => {
  let first = 0;
  let second = 0;
  let designName = "";

  beforeAll(async () => {
    designName = uniqueCode("Export motor");
    const part = await createPartItem(await signInAs("buyer"));
    const design = await createDesign(
      [{ kind: "part", itemId: part.id, quantityPerMotor: "1" }],
      { name: designName },
    );
    for (const quantity of [3, 5]) {
      const response = await sendJson(
        "POST",
        "/api/v1/build-orders",
        { designId: design.designId, revision: 1, quantity, note: "=SUM(A1)" },
        builder,
      );
      expect(response.status, await response.clone().text()).toBe(201);
      const { id } = (await response.json()) as { id: number };
      if (quantity === 3) first = id;
      else second = id;
    }
  });

  it("holds the orders of the searched design, newest first, machine-neutral", async () => {
    const response = await get(
      `/build-orders/export.csv?search=${encodeURIComponent(designName)}`,
      manager,
    );
    expect(response.status).toBe(200);
    expect(response.headers.get("content-disposition")).toMatch(
      /^attachment; filename="turnledger-build-orders-\d{4}-\d{2}-\d{2}\.csv"$/,
    );
    const [header, ...rows] = await parseCsv(response);
    expect(header).toEqual([
      "order",
      "design",
      "revision",
      "motors",
      "status",
      "planned start",
      "made by",
      "made (UTC)",
      "note",
    ]);
    expect(rows.map((row) => row[0])).toEqual([`BO-${second}`, `BO-${first}`]);
    const [newest] = rows as [string[]];
    expect(newest.slice(1, 5)).toEqual([designName, "1", "5", "draft"]);
    expect(newest[7]).toMatch(/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}\.\d{3}Z$/);
    // A formula in a note is written as text.
    expect(newest[8]).toBe("'=SUM(A1)");
  });

  it("applies the status and an order reference", async () => {
    const byReference = (
      await parseCsv(
        await get(`/build-orders/export.csv?search=BO-${first}`, manager),
      )
    ).slice(1);
    expect(byReference.map((row) => row[0])).toEqual([`BO-${first}`]);
    const cancelled = (
      await parseCsv(
        await get(
          `/build-orders/export.csv?search=${encodeURIComponent(designName)}&status=cancelled`,
          manager,
        ),
      )
    ).slice(1);
    expect(cancelled).toEqual([]);
  });

  it("the list page links to it with its filters", async () => {
    const html = await (
      await get(
        `/build-orders?search=${encodeURIComponent(designName)}&status=draft`,
        manager,
      )
    ).text();
    expect(html).toContain(`BO-${second}`);
    expect(html).toContain(
      `href="/build-orders/export.csv?search=${encodeURIComponent(designName).replace(/%20/g, "+")}&amp;status=draft"`,
    );
  });

  it("refuses a status it does not know with 400, and someone signed out", async () => {
    expect(
      (await get("/build-orders/export.csv?status=lost", manager)).status,
    ).toBe(400);
    const anonymous = await get("/build-orders/export.csv");
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get("location")).toMatch(/^\/sign-in/);
  });
});
