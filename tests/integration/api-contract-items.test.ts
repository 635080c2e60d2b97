/**
 * The catalogue's item operations answer as the contract says (docs/decisions/046):
 * each status one the operation documents, each body matching its documented schema.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, bearerTokenAs, sendWithToken } from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import { closeTestDatabase, uniqueCode } from "../support/test-database";

let buyer = "";
let storekeeper = "";
const sku = uniqueCode("CT-PART");

beforeAll(async () => {
  buyer = await bearerTokenAs("buyer");
  storekeeper = await bearerTokenAs("storekeeper");
});
afterAll(closeTestDatabase);

describe("the items operations against the contract", () => {
  it("creates, reads, lists and changes an item as documented", async () => {
    const created = await sendWithToken("POST", "/api/v1/items", buyer, {
      kind: "part",
      sku,
      name: "Contract test bearing",
      unit: "pcs",
      reorderPoint: 4,
      reorderQuantity: 10,
    });
    expect(created.status).toBe(201);
    await expectConforming(created, "POST", "/api/v1/items");

    const one = await sendWithToken("GET", `/api/v1/items/${sku}`, storekeeper);
    expect(one.status).toBe(200);
    expect(
      await expectConforming(one, "GET", "/api/v1/items/{sku}"),
    ).toMatchObject({ sku });

    const page = await sendWithToken(
      "GET",
      `/api/v1/items?search=${sku}`,
      storekeeper,
    );
    expect(await expectConforming(page, "GET", "/api/v1/items")).toMatchObject({
      total: 1,
    });

    const changed = await sendWithToken(
      "PATCH",
      `/api/v1/items/${sku}`,
      storekeeper,
      { reorderPoint: 6 },
    );
    expect(changed.status).toBe(200);
    await expectConforming(changed, "PATCH", "/api/v1/items/{sku}");
  });

  it("refuses as documented: a duplicate, a bad body, a role, a missing item, no sign-in", async () => {
    const duplicate = await sendWithToken("POST", "/api/v1/items", buyer, {
      kind: "part",
      sku,
      name: "Again",
      unit: "pcs",
    });
    expect(duplicate.status, await duplicate.clone().text()).toBe(409);
    await expectConforming(duplicate, "POST", "/api/v1/items");

    const bad = await sendWithToken("POST", "/api/v1/items", buyer, {
      kind: "part",
    });
    expect(bad.status).toBe(400);
    await expectConforming(bad, "POST", "/api/v1/items");

    const role = await sendWithToken("POST", "/api/v1/items", storekeeper, {
      kind: "part",
      sku: uniqueCode("X"),
      name: "No",
    });
    expect(role.status).toBe(403);
    await expectConforming(role, "POST", "/api/v1/items");

    const missing = await sendWithToken(
      "GET",
      "/api/v1/items/NO-SUCH-SKU-0",
      buyer,
    );
    expect(missing.status).toBe(404);
    await expectConforming(missing, "GET", "/api/v1/items/{sku}");

    const anonymous = await fetch(`${baseUrl()}/api/v1/items`);
    expect(anonymous.status).toBe(401);
    await expectConforming(anonymous, "GET", "/api/v1/items");

    const badQuery = await sendWithToken("GET", "/api/v1/items?page=0", buyer);
    expect(badQuery.status).toBe(400);
    await expectConforming(badQuery, "GET", "/api/v1/items");
  });
});
