/**
 * A number field far longer than any number, posted to a page's form: the answer is
 * the form again with the field's message (400), as quick as for a short wrong value.
 * (Reading such a field once took time in the square of its length: 60,000 digits
 * held the server for seconds.)
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { postForm, sendJson, signIn, uniqueEmail } from "../support/app-client";
import {
  closeTestDatabase,
  createLocation,
  createPerson,
  uniqueCode,
} from "../support/test-database";

let storekeeper = "";
let sku = "";
let location = "";

beforeAll(async () => {
  const email = uniqueEmail("long-number-fields");
  const password = "long-number-fields-password";
  await createPerson({ email, password, roles: ["storekeeper", "buyer"] });
  storekeeper = await signIn(email, password);
  sku = uniqueCode("LN");
  const created = await sendJson(
    "POST",
    "/api/v1/items",
    { kind: "part", sku, name: "Long-field bearing", unit: "pcs" },
    storekeeper,
  );
  expect(created.status, await created.clone().text()).toBe(201);
  location = await createLocation(uniqueCode("LN"));
});
afterAll(closeTestDatabase);

/** Digits that end in a letter: a backtracking number pattern tries every split of them. */
const longField = `${"1".repeat(60_000)}x`;

async function postReceipt(quantity: string) {
  const started = performance.now();
  const response = await postForm(
    "/stock/record",
    { type: "receipt", sku, location, quantity, unitCost: "1" },
    storekeeper,
  );
  const html = await response.text();
  return { response, html, ms: performance.now() - started };
}

describe("a number field of 60,000 characters", () => {
  it("is refused with the field's message, as quickly as a short wrong value", async () => {
    // Warm the route, then time a short wrong value as the yardstick.
    await postReceipt("lots");
    const short = await postReceipt("lots");
    expect(short.response.status).toBe(400);

    const long = await postReceipt(longField);
    expect(long.response.status).toBe(400);
    expect(long.html).toContain("The quantity must be a number.");
    expect(
      long.ms,
      `${long.ms.toFixed(0)} ms against ${short.ms.toFixed(0)} ms for a short value`,
    ).toBeLessThan(short.ms + 750);
  });

  it("is refused by the API without reading it as a number", async () => {
    const started = performance.now();
    const response = await sendJson(
      "POST",
      "/api/v1/stock-movements",
      { type: "receipt", sku, location, quantity: longField, unitCost: 1 },
      storekeeper,
    );
    expect(response.status).toBe(400);
    const body = (await response.json()) as {
      error: { fields: Record<string, string[]> };
    };
    expect(body.error.fields.quantity).toEqual([
      "The quantity must be a number.",
    ]);
    expect(performance.now() - started).toBeLessThan(2_000);
  });
});
