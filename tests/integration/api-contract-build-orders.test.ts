/**
 * The build-order operations answer as the contract says (docs/decisions/046): each
 * status one the operation documents, each body matching its documented schema; every
 * step of POST /api/v1/build-orders/{orderId}/{step} with its own body and answer.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  baseUrl,
  bearerTokenAs,
  sendWithToken,
  signInAs,
} from "../support/app-client";
import { expectConforming } from "../support/api-contract";
import { expectAnswersConforming } from "../support/api-contract-answers";
import {
  createPartItem,
  createWireItem,
  receive,
} from "../support/build-order-fixtures";
import { createDesign } from "../support/design-fixtures";
import {
  closeTestDatabase,
  createLocation,
  uniqueCode,
} from "../support/test-database";

const list = "/api/v1/build-orders";
const one = "/api/v1/build-orders/{orderId}";
const step = "/api/v1/build-orders/{orderId}/{step}";
const lots = "/api/v1/build-orders/{orderId}/lots";
const missingOrder = 2_000_000_000;

let builder = "";
let storekeeper = "";
let manager = "";
let rack = "";
/** A wire kept in lots (one spool) and a part of which there are only 5. */
let wire = { sku: "", id: 0 };
let part = { sku: "", id: 0 };
let design = { designId: 0, revision: 0 };

beforeAll(async () => {
  const buyerCookie = await signInAs("buyer");
  const storekeeperCookie = await signInAs("storekeeper");
  builder = await bearerTokenAs("builder");
  storekeeper = await bearerTokenAs("storekeeper");
  manager = await bearerTokenAs("manager");
  rack = await createLocation(uniqueCode("CB"));
  wire = await createWireItem(buyerCookie);
  part = await createPartItem(buyerCookie);
  await receive(storekeeperCookie, {
    sku: wire.sku,
    lot: "CT-SPOOL-1",
    location: rack,
    quantity: 6,
    unitCost: 14.2,
  });
  await receive(storekeeperCookie, {
    sku: part.sku,
    location: rack,
    quantity: 5,
    unitCost: 2.5,
  });
  design = await createDesign([
    { kind: "part", itemId: wire.id, quantityPerMotor: "0.5" },
    { kind: "part", itemId: part.id, quantityPerMotor: "2" },
  ]);
});
afterAll(closeTestDatabase);

/** Creates an order of `motors` motors of the fixture design; its id. */
async function createOrder(motors: number): Promise<number> {
  const response = await sendWithToken("POST", list, builder, {
    designId: design.designId,
    revision: design.revision,
    quantity: motors,
    note: "Contract test batch",
  });
  expect(response.status, await response.clone().text()).toBe(201);
  const body = (await expectConforming(response, "POST", list)) as {
    id: number;
  };
  return body.id;
}

const takeStep = (
  id: number,
  name: string,
  token: string,
  body?: unknown,
): Promise<Response> =>
  sendWithToken("POST", `${list}/${id}/${name}`, token, body);

describe("the build-order operations against the contract", () => {
  it("lists, creates, reads and changes an order as documented", async () => {
    const id = await createOrder(4);

    const page = await sendWithToken(
      "GET",
      `${list}?search=BO-${id}&pageSize=10`,
      manager,
    );
    expect(page.status).toBe(200);
    expect(await expectConforming(page, "GET", list)).toMatchObject({
      total: 1,
      buildOrders: [{ id, status: "draft" }],
    });

    const read = await sendWithToken("GET", `${list}/${id}`, storekeeper);
    expect(read.status).toBe(200);
    expect(await expectConforming(read, "GET", one)).toMatchObject({
      id,
      reference: `BO-${id}`,
      quantity: 4,
    });

    const planned = await sendWithToken("PATCH", `${list}/${id}`, builder, {
      plannedStart: "2026-12-21",
    });
    expect(planned.status, await planned.clone().text()).toBe(200);
    expect(await expectConforming(planned, "PATCH", one)).toEqual({
      id,
      status: "draft",
      released: [],
      plannedStart: "2026-12-21",
    });

    const resized = await sendWithToken("PATCH", `${list}/${id}`, builder, {
      quantity: 2,
      plannedStart: null,
    });
    expect(resized.status, await resized.clone().text()).toBe(200);
    expect(await expectConforming(resized, "PATCH", one)).toMatchObject({
      plannedStart: null,
    });
  });

  it("takes every step with its own body and answer, and lists the lots issued", async () => {
    // 3 motors need 6 of the part; there are 5.
    const id = await createOrder(3);

    const short = await takeStep(id, "reserve", builder);
    expect(short.status, await short.clone().text()).toBe(409);
    const refusal = (await expectConforming(short, "POST", step)) as {
      error: { shortages: { sku: string; short: number }[] };
    };
    expect(refusal.error.shortages).toEqual([
      expect.objectContaining({ sku: part.sku, short: 1 }),
    ]);

    const partial = await takeStep(id, "reserve", builder, { partial: true });
    expect(partial.status, await partial.clone().text()).toBe(200);
    expect(await expectConforming(partial, "POST", step)).toMatchObject({
      id,
      status: "reserved",
      shortages: [{ sku: part.sku, short: 1 }],
    });

    const issued = await takeStep(id, "issue", storekeeper, {
      sku: wire.sku,
      lot: "CT-SPOOL-1",
      location: rack,
      quantity: 1.5,
    });
    expect(issued.status, await issued.clone().text()).toBe(201);
    expect(await expectConforming(issued, "POST", step)).toMatchObject({
      id,
      status: "in_progress",
      movement: { type: "issue", sku: wire.sku, lot: "CT-SPOOL-1" },
    });

    const traced = await sendWithToken("GET", `${list}/${id}/lots`, manager);
    expect(traced.status).toBe(200);
    expect(await expectConforming(traced, "GET", lots)).toMatchObject({
      buildOrderId: id,
      lots: [{ lot: "CT-SPOOL-1", sku: wire.sku, issued: 1.5, net: 1.5 }],
    });

    const completed = await takeStep(id, "complete", builder, {
      note: "Three built, the part short by one.",
    });
    expect(completed.status, await completed.clone().text()).toBe(200);
    expect(await expectConforming(completed, "POST", step)).toMatchObject({
      id,
      status: "complete",
    });

    const other = await createOrder(1);
    const reserved = await takeStep(other, "reserve", builder, {});
    expect(reserved.status, await reserved.clone().text()).toBe(200);
    await expectConforming(reserved, "POST", step);
    const cancelled = await takeStep(other, "cancel", builder);
    expect(cancelled.status, await cancelled.clone().text()).toBe(200);
    const body = (await expectConforming(cancelled, "POST", step)) as {
      status: string;
      released: unknown[];
    };
    expect(body.status).toBe("cancelled");
    expect(body.released.length).toBeGreaterThan(0);

    // The demo's pilot batch (BO-1) was built from the demo's wire spools.
    const demo = await sendWithToken("GET", `${list}/1/lots`, manager);
    expect(demo.status).toBe(200);
    await expectConforming(demo, "GET", lots);
  });

  it("refuses as documented: bad bodies and queries, roles, missing orders and steps, the order's state", async () => {
    const id = await createOrder(1);
    await expectAnswersConforming([
      // Creating
      [
        await sendWithToken("POST", list, builder, {
          designId: design.designId,
        }),
        "POST",
        list,
        400,
      ],
      [
        await sendWithToken("POST", list, storekeeper, {
          designId: design.designId,
          revision: design.revision,
          quantity: 1,
        }),
        "POST",
        list,
        403,
      ],
      [
        await sendWithToken("POST", list, builder, {
          designId: design.designId,
          revision: 9,
          quantity: 1,
        }),
        "POST",
        list,
        404,
      ],
      [
        await sendWithToken("GET", `${list}?status=finished`, manager),
        "GET",
        list,
        400,
      ],
      [await fetch(`${baseUrl()}${list}`), "GET", list, 401],
      // One order
      [
        await sendWithToken("GET", `${list}/${missingOrder}`, manager),
        "GET",
        one,
        404,
      ],
      [await sendWithToken("GET", `${list}/BO-x`, manager), "GET", one, 404],
      [
        await sendWithToken("PATCH", `${list}/${id}`, builder, {}),
        "PATCH",
        one,
        400,
      ],
      [
        await sendWithToken("PATCH", `${list}/${id}`, manager, {
          quantity: 2,
        }),
        "PATCH",
        one,
        403,
      ],
      [
        await sendWithToken("PATCH", `${list}/${missingOrder}`, builder, {
          quantity: 2,
        }),
        "PATCH",
        one,
        404,
      ],
      // Steps
      [await takeStep(id, "polish", builder), "POST", step, 404],
      [await takeStep(missingOrder, "reserve", builder), "POST", step, 404],
      [await takeStep(id, "reserve", storekeeper), "POST", step, 403],
      [
        await takeStep(id, "issue", builder, {
          sku: wire.sku,
          location: rack,
          quantity: 1,
        }),
        "POST",
        step,
        403,
      ],
      [
        await takeStep(id, "issue", storekeeper, { sku: wire.sku }),
        "POST",
        step,
        400,
      ],
      // Issuing to a draft: nothing is held for it yet.
      [
        await takeStep(id, "issue", storekeeper, {
          sku: wire.sku,
          lot: "CT-SPOOL-1",
          location: rack,
          quantity: 0.1,
        }),
        "POST",
        step,
        409,
      ],
      [await takeStep(id, "complete", builder), "POST", step, 409],
      // Lots
      [
        await sendWithToken("GET", `${list}/${missingOrder}/lots`, manager),
        "GET",
        lots,
        404,
      ],
      [await fetch(`${baseUrl()}${list}/${id}/lots`), "GET", lots, 401],
    ]);

    await takeStep(id, "cancel", builder);
    const closed = await sendWithToken("PATCH", `${list}/${id}`, builder, {
      quantity: 2,
    });
    expect(closed.status).toBe(409);
    await expectConforming(closed, "PATCH", one);
  });
});
