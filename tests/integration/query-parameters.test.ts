/**
 * Numbers read from the address: every page, page size, limit, quantity, id and day in
 * a query string is bounded. A bad one is a 400 in the JSON error shape from the API and
 * a corrected page (the last page, or the value left out) from the pages; never a 500.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createDesign } from "../support/design-fixtures";
import { baseUrl, sendJson, signIn, uniqueEmail } from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

/** Numbers no page or page size may be, each for its own reason. */
const badNumbers = [
  "1e300", // a number, but far past any page
  "99999999999999999999", // digits, but more than a safe integer
  "-1",
  "0",
  "1.5",
  "abc",
  "Infinity",
  "0x10",
  "1000000000",
];
/** Quantities of an item (up to 3 decimals, above 0, at most 1,000,000,000) that are none. */
const badQuantities = [
  "1e300",
  "99999999999999999999",
  "-1",
  "0",
  "1.2345",
  "abc",
  "Infinity",
  "0x10",
  "1000000001",
];
const badDays = ["1e300", "2025-13-01", "2025-02-30", "99999-01-01", "today"];

let cookie = "";
let sku = "";
let designPath = "";
let designCount = 0;

beforeAll(async () => {
  const email = uniqueEmail("query-parameters");
  const password = "query-parameters-password";
  await createPerson({ email, password, roles: ["admin", "manager"] });
  cookie = await signIn(email, password);

  // An item with 21 movements: two pages of 20 on its page.
  sku = uniqueCode("QP");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    { kind: "part", sku, name: "Query-parameter bearing", unit: "pcs" },
    cookie,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  const location = await createLocation(uniqueCode("QP"));
  for (let receipt = 0; receipt < 21; receipt += 1) {
    const response = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      { type: "receipt", sku, location, quantity: 1, unitCost: 1 },
      cookie,
    );
    expect(response.status, await response.clone().text()).toBe(201);
  }

  // More designs than fit on one page of the designs list (25 a page).
  const { designId } = await createDesign([]);
  designPath = `/designs/${designId}/revisions/1`;
  const countDesigns = async () => {
    const [rows] = await testDatabase().query(
      "SELECT COUNT(*) AS n FROM designs",
    );
    return Number((rows as { n: number }[])[0]!.n);
  };
  for (let count = await countDesigns(); count <= 25; count += 1)
    await createDesign([]);
  designCount = await countDesigns();
});
afterAll(closeTestDatabase);

function get(path: string, redirect: RequestRedirect = "manual") {
  return fetch(`${baseUrl()}${path}`, {
    redirect,
    headers: { Cookie: cookie },
  });
}

/** Every API path with a numeric or day parameter, with each bad value in its place. */
function apiCases(): [string, string][] {
  const prices = `/api/v1/items/${sku}/prices`;
  const costing = `${designPath.replace("/designs", "/api/v1/designs")}/costing`;
  const numbered: [string, string][] = [
    ["/api/v1/items", "page"],
    ["/api/v1/items", "pageSize"],
    ["/api/v1/stock-movements", "page"],
    ["/api/v1/stock-movements", "pageSize"],
    ["/api/v1/build-orders", "page"],
    ["/api/v1/build-orders", "pageSize"],
    ["/api/v1/alerts", "page"],
    ["/api/v1/alerts", "perPage"],
    ["/api/v1/designs", "page"],
    ["/api/v1/designs", "perPage"],
    ["/api/v1/insight/designs", "page"],
    ["/api/v1/insight/designs", "perPage"],
    ["/api/v1/insight/designs?history=1", "quantity"],
    ["/api/v1/outbox", "limit"],
    [costing, "quantity"],
  ];
  const dated: [string, string][] = [
    ["/api/v1/stock-movements", "from"],
    ["/api/v1/stock-movements", "to"],
    ["/api/v1/insight/designs", "date"],
    [`${prices}?history=1`, "date"],
    [costing, "date"],
  ];
  const withValue = (path: string, name: string, value: string) =>
    `${path}${path.includes("?") ? "&" : "?"}${name}=${encodeURIComponent(value)}`;
  return [
    ...numbered.flatMap(([path, name]) =>
      badNumbers.map(
        (value) => [withValue(path, name, value), name] as [string, string],
      ),
    ),
    ...badQuantities.map(
      (value) =>
        [withValue(`${prices}?history=1`, "quantity", value), "quantity"] as [
          string,
          string,
        ],
    ),
    ...dated.flatMap(([path, name]) =>
      badDays.map(
        (value) => [withValue(path, name, value), name] as [string, string],
      ),
    ),
  ];
}

describe("query parameters of the API", () => {
  it("answers every bad number or day with 400 in the JSON error shape, naming the parameter", async () => {
    const wrong: string[] = [];
    for (const [path, name] of apiCases()) {
      const response = await get(path);
      const body = (await response.json().catch(() => null)) as {
        error?: { message?: string; fields?: Record<string, string[]> };
      } | null;
      const named = Object.keys(body?.error?.fields ?? {}).includes(name);
      if (response.status !== 400 || !body?.error?.message || !named)
        wrong.push(`${path} → ${response.status} ${JSON.stringify(body)}`);
    }
    expect(wrong).toEqual([]);
  });

  it("answers ids in the path that are no ids with 404 in the JSON error shape", async () => {
    for (const path of [
      "/api/v1/build-orders/1e300",
      "/api/v1/build-orders/99999999999999999999",
      "/api/v1/designs/1e300",
      "/api/v1/designs/1/revisions/1e300",
      "/api/v1/designs/1/revisions/1e300/costing",
    ]) {
      const response = await get(path);
      expect(response.status, path).toBe(404);
      expect(((await response.json()) as { error: object }).error).toEqual({
        message: expect.any(String),
      });
    }
  });

  it("still reads good values", async () => {
    for (const path of [
      "/api/v1/items?page=2&pageSize=500",
      "/api/v1/stock-movements?page=1000000&pageSize=1&from=2025-01-01",
      "/api/v1/outbox?limit=500",
      `/api/v1/items/${sku}/prices?quantity=2.5&history=1&date=2030-01-31`,
    ]) {
      const response = await get(path);
      expect(response.status, path).toBe(200);
    }
  });
});

describe("the work of the expensive reads", () => {
  it("is bounded whatever the address asks: 50 designs of 12 monthly costs, 365 days of prices", async () => {
    const tooMany = await get("/api/v1/insight/designs?history=1&perPage=51");
    expect(tooMany.status).toBe(400);
    expect(await tooMany.json()).toMatchObject({
      error: {
        fields: { perPage: ["perPage must be a whole number from 1 to 50."] },
      },
    });

    const insight = await get(
      "/api/v1/insight/designs?history=1&perPage=50&date=2030-01-31",
    );
    expect(insight.status).toBe(200);
    const designs = (await insight.json()) as { costHistory: unknown[] }[];
    expect(designs.length).toBeGreaterThan(0);
    expect(designs.length).toBeLessThanOrEqual(50);
    for (const design of designs) expect(design.costHistory).toHaveLength(12);

    const prices = await get(
      `/api/v1/items/${sku}/prices?history=1&date=9999-12-31`,
    );
    expect(prices.status).toBe(200);
    expect(
      ((await prices.json()) as { history: { from: string; to: string } })
        .history,
    ).toMatchObject({ from: "9998-12-31", to: "9999-12-31" });
  });
});

describe("query parameters of the pages", () => {
  const pages = () => [
    "/admin/people",
    "/admin/outbox",
    "/alerts",
    "/build-orders",
    "/designs",
    "/suppliers/imports",
    "/stock",
    `/stock/items/${sku}`,
    "/stock/journal",
    "/insight",
    "/",
    designPath,
    `${designPath}/print`,
  ];
  const parameters = [
    "page",
    "pageSize",
    "perPage",
    "quantity",
    "from",
    "to",
    "date",
  ];

  it("answers every bad number or day with the page, corrected (200), never an error", async () => {
    const wrong: string[] = [];
    for (const page of pages())
      for (const value of [...badNumbers, ...badDays]) {
        const query = parameters
          .map((name) => `${name}=${encodeURIComponent(value)}`)
          .join("&");
        const path = `${page}?${query}`;
        const response = await get(path, "follow");
        const type = response.headers.get("Content-Type") ?? "";
        if (response.status !== 200 || !type.startsWith("text/html"))
          wrong.push(`${path} → ${response.status}`);
        await response.arrayBuffer();
      }
    expect(wrong).toEqual([]);
  }, 300_000);

  it("shows the last page for a page past the end", async () => {
    const item = await (
      await get(`/stock/items/${sku}?page=1e300`, "follow")
    ).text();
    expect(item).toContain("Page <!-- -->2<!-- --> of <!-- -->2");
    const lastDesignPage = Math.ceil(designCount / 25);
    const designs = await (await get("/designs?page=1e300", "follow")).text();
    expect(designs).toContain(
      `Page <!-- -->${lastDesignPage}<!-- --> of <!-- -->${lastDesignPage}`,
    );
    const far = await (
      await get(`/stock/items/${sku}?page=99999999999999999999`, "follow")
    ).text();
    expect(far).toContain("Page <!-- -->2<!-- --> of <!-- -->2");
  });

  it("answers ids that are no ids with 404, not an error", async () => {
    for (const value of ["1e300", "99999999999999999999", "-1", "abc"]) {
      for (const path of [
        `/suppliers/imports?import=${value}`,
        `/build-orders/${value}`,
        `/designs/${value}/revisions/1`,
        `/designs/1/revisions/${value}`,
      ]) {
        const response = await get(path);
        expect(response.status, path).toBe(404);
      }
    }
  });
});
