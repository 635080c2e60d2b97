/**
 * PATCH /api/v1/suppliers/:id with awkward input: every mistake is a 400 (or 409 for a
 * taken name) naming the field, never a 500, and nothing is written.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { sendJson, signInAs } from "../support/app-client";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
});
afterAll(async () => {
  await closeTestDatabase();
});

async function storedSupplier(id: number) {
  const [rows] = await testDatabase().query(
    "SELECT name, email, currency, lead_time_days AS leadTimeDays, notes FROM suppliers WHERE id = ?",
    [id],
  );
  return (rows as Record<string, unknown>[])[0];
}

describe("PATCH /api/v1/suppliers/:id with awkward input", () => {
  const cases: [string, unknown, number][] = [
    ["null body", null, 400],
    ["array body", [], 400],
    ["string body", "name", 400],
    ["number name", { name: 5 }, 400],
    ["null name", { name: null }, 400],
    ["blank name", { name: "   " }, 400],
    ["huge name", { name: "x".repeat(121) }, 400],
    // 121 characters (code points, as the column counts them), 242 UTF-16 units.
    ["huge name of emoji", { name: "🧲".repeat(121) }, 400],
    ["huge email", { email: `${"a".repeat(250)}@example.com` }, 400],
    ["bad email", { email: "not an e-mail" }, 400],
    ["empty email", { email: "" }, 400],
    ["huge notes", { notes: "n".repeat(1001) }, 400],
    ["huge notes of emoji", { notes: "🧲".repeat(1001) }, 400],
    ["number currency", { currency: 978 }, 400],
    ["null currency", { currency: null }, 400],
    ["four-letter currency", { currency: "EURO" }, 400],
    ["dollar sign", { currency: "$" }, 400],
    ["negative lead time", { leadTimeDays: -1 }, 400],
    ["huge lead time", { leadTimeDays: 1e12 }, 400],
    ["fractional lead time", { leadTimeDays: 1.5 }, 400],
    ["text lead time", { leadTimeDays: "5" }, 400],
    ["boolean notes", { notes: true }, 400],
    ["object name", { name: { first: "A" } }, 400],
  ];
  for (const [label, body, status] of cases)
    it(`answers ${status} to ${label} and changes nothing`, async () => {
      const name = `Patch edge ${uniqueCode("E")}`;
      const id = await createSupplier(buyer, name);
      const before = await storedSupplier(id);
      const response = await sendJson(
        "PATCH",
        `/api/v1/suppliers/${id}`,
        body,
        buyer,
      );
      const text = await response.text();
      expect(response.status, text).toBe(status);
      expect(JSON.parse(text)).toHaveProperty("error.message");
      expect(await storedSupplier(id)).toEqual(before);
    });

  it("reads £ as GBP on a change and € as EUR on a new supplier, and asks for a code for $", async () => {
    const id = await createSupplier(buyer, `Patch edge ${uniqueCode("E")}`);
    const response = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { currency: "£" },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(200);
    expect(await storedSupplier(id)).toMatchObject({ currency: "GBP" });

    const euroName = `Patch edge ${uniqueCode("E")}`;
    const created = await sendJson(
      "POST",
      "/api/v1/suppliers",
      { name: euroName, currency: "€" },
      buyer,
    );
    expect(created.status, await created.clone().text()).toBe(201);
    const [rows] = await testDatabase().query(
      "SELECT currency FROM suppliers WHERE name = ?",
      [euroName],
    );
    expect(rows).toEqual([{ currency: "EUR" }]);

    const dollar = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { currency: "$" },
      buyer,
    );
    expect(dollar.status).toBe(400);
    expect(await dollar.json()).toMatchObject({
      error: {
        fields: {
          currency: [
            expect.stringMatching(/^\$ stands for several currencies/),
          ],
        },
      },
    });
    expect(await storedSupplier(id)).toMatchObject({ currency: "GBP" });
  });

  it("answers 409 on the name when another supplier has it in other capitals", async () => {
    const taken = `Patch edge ${uniqueCode("E")}`;
    await createSupplier(buyer, taken);
    const id = await createSupplier(buyer, `Patch edge ${uniqueCode("E")}`);
    const before = await storedSupplier(id);
    const response = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { name: `  ${taken.toUpperCase()} `, currency: "USD" },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(409);
    expect(await storedSupplier(id)).toEqual(before);
  });
});
