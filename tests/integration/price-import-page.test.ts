/**
 * The price-list import page over HTTP: who may open it, what its loader
 * hands the browser (suppliers, each supplier's saved column choices), and
 * that a plain form post changes nothing.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

const cookies: Record<string, string> = {};
let supplier = "";

beforeAll(async () => {
  for (const role of [
    "buyer",
    "admin",
    "storekeeper",
    "builder",
    "manager",
  ] as const)
    cookies[role] = await signInAs(role);
  supplier = `Page test winding wire ${uniqueCode("PI")}`;
  const created = await sendJson(
    "POST",
    "/api/v1/suppliers",
    { name: supplier, currency: "EUR" },
    cookies.buyer,
  );
  expect(created.status).toBe(201);
});
afterAll(closeTestDatabase);

async function importThroughApi(csv: string, mapping: Record<string, string>) {
  const form = new FormData();
  form.append("supplier", supplier);
  form.append("mapping", JSON.stringify(mapping));
  form.append("file", new Blob([csv], { type: "text/csv" }), "list.csv");
  return fetch(`${baseUrl()}/api/v1/price-lists`, {
    method: "POST",
    headers: { Cookie: cookies.buyer!, Origin: baseUrl() },
    body: form,
  });
}

describe("GET /suppliers/import", () => {
  it.each(["buyer", "admin"])("opens for the %s", async (role) => {
    const response = await get("/suppliers/import", cookies[role]);
    expect(response.status).toBe(200);
    const html = await response.text();
    expect(html).toContain("Import a price list");
    expect(html).toContain("Supplier and file");
    expect(html).toContain("Match the columns");
    expect(html).toContain(supplier);
  });

  it.each(["storekeeper", "builder", "manager"])(
    "refuses the %s with 403",
    async (role) => {
      const response = await get("/suppliers/import", cookies[role]);
      expect(response.status).toBe(403);
      expect(await response.text()).not.toContain(supplier);
    },
  );

  it("sends an anonymous visitor to sign in", async () => {
    const response = await get("/suppliers/import");
    expect(response.status).toBe(302);
    expect(response.headers.get("Location")).toBe(
      `/sign-in?redirectTo=${encodeURIComponent("/suppliers/import")}`,
    );
  });

  it("hands the browser the supplier's saved column choices after an import", async () => {
    const header = "Ref code XY,Unit price,Currency";
    const imported = await importThroughApi(
      `${header}\n${uniqueCode("P")},3.50,EUR\n`,
      { supplierSku: "Ref code XY", price: "Unit price", currency: "Currency" },
    );
    expect(imported.status).toBe(201);
    const html = await (await get("/suppliers/import", cookies.buyer)).text();
    expect(html).toContain("Ref code XY");
  });
});

describe("POST /suppliers/import", () => {
  it("answers 405 to a plain form post from a buyer and changes nothing", async () => {
    const response = await postForm(
      "/suppliers/import",
      { supplier },
      cookies.buyer,
    );
    expect(response.status).toBe(405);
  });

  it("refuses a storekeeper with 403", async () => {
    const response = await postForm(
      "/suppliers/import",
      { supplier },
      cookies.storekeeper,
    );
    expect(response.status).toBe(403);
  });
});
