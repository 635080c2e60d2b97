/**
 * A supplier opened and changed after it was made: GET and PATCH /api/v1/suppliers/:id
 * (400 for bad fields, 404 for no such supplier, 409 for a name another supplier has,
 * nothing half-written) and the supplier page's edit form (a taken name is a field message
 * with 409, never a 500).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  followRedirect,
  get,
  postForm,
  sendJson,
  signInAs,
} from "../support/app-client";
import { createSupplier } from "../support/price-list-fixtures";
import {
  closeTestDatabase,
  testDatabase,
  uniqueCode,
} from "../support/test-database";

let buyer = "";
let builder = "";
beforeAll(async () => {
  buyer = await signInAs("buyer");
  builder = await signInAs("builder");
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

describe("PATCH /api/v1/suppliers/:id", () => {
  it("changes only the fields sent and answers the supplier", async () => {
    const name = `Coil mill ${uniqueCode("P")}`;
    const id = await createSupplier(buyer, name);
    const listed = (await (await get("/api/v1/suppliers", buyer)).json()) as {
      id: number;
      name: string;
    }[];
    expect(listed.find((supplier) => supplier.name === name)?.id).toBe(id);

    const response = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { currency: "usd", leadTimeDays: 21, email: "orders@coil.example" },
      buyer,
    );
    expect(response.status, await response.clone().text()).toBe(200);
    expect(await response.json()).toEqual({
      id,
      name,
      email: "orders@coil.example",
      currency: "USD",
      leadTimeDays: 21,
      notes: null,
      // Untouched ordering settings keep the database's starting values.
      orderEmail: null,
      metalBaseFixedAt: "order",
      wireTolerancePercent: 10,
      pieceTolerancePercent: 0,
    });
    const read = await get(`/api/v1/suppliers/${id}`, builder);
    expect(read.status).toBe(200);
    expect(await read.json()).toMatchObject({
      currency: "USD",
      leadTimeDays: 21,
    });

    // null clears an optional field.
    const cleared = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { email: null },
      buyer,
    );
    expect(cleared.status).toBe(200);
    expect(await storedSupplier(id)).toMatchObject({
      email: null,
      currency: "USD",
      leadTimeDays: 21,
    });
  });

  it("answers 400 naming each bad field and changes nothing", async () => {
    const name = `Coil mill ${uniqueCode("B")}`;
    const id = await createSupplier(buyer, name);
    const response = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { name: "Renamed", currency: "EURO", leadTimeDays: -2 },
      buyer,
    );
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { message: string; fields: Record<string, string[]> };
    };
    expect(Object.keys(body.error.fields).sort()).toEqual([
      "currency",
      "leadTimeDays",
    ]);
    expect(await storedSupplier(id)).toMatchObject({ name, currency: "EUR" });

    const empty = await sendJson("PATCH", `/api/v1/suppliers/${id}`, {}, buyer);
    expect(empty.status).toBe(400);
    const unknown = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { colour: "red" },
      buyer,
    );
    expect(unknown.status).toBe(400);
  });

  it("answers 409 on the name when another supplier has it, 404 for no such supplier, 403 to a builder", async () => {
    const taken = `Coil mill ${uniqueCode("T")}`;
    await createSupplier(buyer, taken);
    const name = `Coil mill ${uniqueCode("R")}`;
    const id = await createSupplier(buyer, name);
    const response = await sendJson(
      "PATCH",
      `/api/v1/suppliers/${id}`,
      { name: taken, leadTimeDays: 9 },
      buyer,
    );
    expect(response.status).toBe(409);
    expect(await response.json()).toEqual({
      error: {
        message: `There is already a supplier named "${taken}".`,
        fields: { name: [`There is already a supplier named "${taken}".`] },
      },
    });
    // Nothing half-written: the lead time sent with the taken name is not kept.
    expect(await storedSupplier(id)).toMatchObject({
      name,
      leadTimeDays: null,
    });

    expect(
      (
        await sendJson(
          "PATCH",
          "/api/v1/suppliers/2147483647",
          { notes: "x" },
          buyer,
        )
      ).status,
    ).toBe(404);
    expect(
      (
        await sendJson(
          "PATCH",
          `/api/v1/suppliers/${id}`,
          { notes: "x" },
          builder,
        )
      ).status,
    ).toBe(403);
    expect(await storedSupplier(id)).toMatchObject({ notes: null });
  });
});

describe("the supplier page", () => {
  it("shows the supplier and saves the edit form, with a taken name as a field message", async () => {
    const taken = `Magnet house ${uniqueCode("T")}`;
    await createSupplier(buyer, taken);
    const name = `Magnet house ${uniqueCode("S")}`;
    const id = await createSupplier(buyer, name);

    const page = await get(`/suppliers/${id}`, builder);
    expect(page.status).toBe(200);
    const html = await page.text();
    expect(html).toContain(name);
    expect(html).not.toContain("Save supplier");

    const fields = {
      name: taken,
      email: "",
      currency: "EUR",
      leadTimeDays: "14",
      notes: "",
    };
    const refused = await postForm(`/suppliers/${id}`, fields, buyer);
    expect(refused.status).toBe(409);
    expect(await refused.text()).toContain(
      `There is already a supplier named &quot;${taken}&quot;.`,
    );
    expect(await storedSupplier(id)).toMatchObject({
      name,
      leadTimeDays: null,
    });

    const saved = await postForm(
      `/suppliers/${id}`,
      { ...fields, name: `${name} GmbH` },
      buyer,
    );
    expect(saved.status).toBe(302);
    expect(saved.headers.get("location")).toBe(`/suppliers/${id}`);
    const after = await (await followRedirect(saved, buyer)).text();
    expect(after).toContain(`Saved the supplier ${name} GmbH.`);
    expect(await storedSupplier(id)).toMatchObject({
      name: `${name} GmbH`,
      leadTimeDays: 14,
    });

    expect((await postForm(`/suppliers/${id}`, fields, builder)).status).toBe(
      403,
    );
    expect((await get("/suppliers/not-a-number", buyer)).status).toBe(404);
  });
});
